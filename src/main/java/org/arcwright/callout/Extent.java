package org.arcwright.callout;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonValue;

/**
 * How far along the part a profile tolerance applies.
 *
 * @param kind one of the extents below
 * @param from first point label for {@code between} (e.g. {@code J}), else null
 * @param to last point label for {@code between} (e.g. {@code K}), else null
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Extent(Kind kind, String from, String to) {

    /** The extents a drawing can indicate. */
    public enum Kind {
        /** The blend alone, tangent point to tangent point. */
        THIS_RADIUS("this-radius"),
        /** The blend and the adjacent surfaces it joins, so the blend is located by them. */
        WITH_ADJACENT("with-adjacent"),
        /** Between two labelled points, ASME's between symbol (ISO 1101: a from-to indication). */
        BETWEEN("between"),
        /** All around the profile of the section (ASME all-around symbol). */
        ALL_AROUND("all-around"),
        /** All over the part's surfaces (ASME all-over symbol). */
        ALL_OVER("all-over");

        private final String key;

        Kind(String key) { this.key = key; }

        @JsonValue
        public String key() { return key; }

        @JsonCreator
        public static Kind fromKey(String key) {
            for (Kind k : values()) if (k.key.equals(key)) return k;
            throw new IllegalArgumentException("unknown extent '" + key
                    + "'; use this-radius, with-adjacent, between, all-around or all-over");
        }
    }

    public static final Extent THIS_RADIUS = new Extent(Kind.THIS_RADIUS, null, null);
    public static final Extent WITH_ADJACENT = new Extent(Kind.WITH_ADJACENT, null, null);
    public static final Extent ALL_AROUND = new Extent(Kind.ALL_AROUND, null, null);

    @JsonCreator
    public Extent(@JsonProperty("kind") Kind kind, @JsonProperty("from") String from, @JsonProperty("to") String to) {
        if (kind == null) throw new IllegalArgumentException("extent needs a kind");
        if (kind == Kind.BETWEEN && (from == null || to == null || from.isBlank() || to.isBlank())) {
            throw new IllegalArgumentException("a 'between' extent needs 'from' and 'to' point labels");
        }
        if (kind != Kind.BETWEEN && (from != null || to != null)) {
            throw new IllegalArgumentException("only a 'between' extent takes 'from' and 'to'");
        }
        this.kind = kind;
        this.from = from;
        this.to = to;
    }

    /** Between two labelled points. */
    public static Extent between(String from, String to) { return new Extent(Kind.BETWEEN, from, to); }
}
