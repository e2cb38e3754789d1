package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Objects;
import org.arcwright.model.Keys;

/**
 * One thing the feature needs from its tolerance, with its numbers and where it came from. The advisor
 * derives these from the case before it looks at any control, then proves every candidate against each.
 *
 * @param id what kind of need
 * @param min radius-floor: the smallest radius the function allows, in the case's units; else null
 * @param max radius-ceiling: the largest radius the function allows, in the case's units; else null
 * @param why the need in words, with its numbers
 * @param source where it came from: the case field, the mechanics (with the published method), the pack table
 * @param reachable false when no radius at all can meet it (a stress target beyond the step height); every
 *     candidate then fails it
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Need(Kind id, Double min, Double max, String why, String source, @JsonIgnore boolean reachable) {

    public Need {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(why, "why");
        Objects.requireNonNull(source, "source");
        if (id == Kind.RADIUS_FLOOR && reachable && min == null) throw new IllegalArgumentException("a floor needs min");
        if (id == Kind.RADIUS_CEILING && max == null) throw new IllegalArgumentException("a ceiling needs max");
    }

    /** The key used in JSON ({@code meets}) and tables, e.g. {@code radius-floor}. */
    @JsonIgnore
    public String key() { return id.key(); }

    /** The kinds of need, as the JSON contract names them. */
    public enum Kind {
        /** The smallest radius the function allows (stress target, clearing a mating fillet). */
        RADIUS_FLOOR("radius-floor"),
        /** The largest radius that still seats under a mating corner or fits under the step. */
        RADIUS_CEILING("radius-ceiling"),
        /** No flats, reversals or steps: when form matters or the loading is fatigue. */
        FORM("form"),
        /** The blend located to the datums: when location matters and datums exist. */
        LOCATION("location");

        private final String key;

        Kind(String key) { this.key = key; }

        @JsonValue
        public String key() { return key; }

        @JsonCreator
        public static Kind fromKey(String key) {
            return Keys.fromKey(Kind.class, values(), key, Kind::key);
        }
    }
}
