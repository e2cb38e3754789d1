package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * A change to the design (not to the tolerance) that would let a control meet every need, with its numbers.
 * Proposed only when no recommendation meets every need.
 *
 * @param kind what to change
 * @param text the proposal in words, numbers and units included
 * @param numbers the deciding figures by name (lengths in the case's units, factors dimensionless)
 */
public record DesignChange(Kind kind, String text, Map<String, Double> numbers) {

    public DesignChange {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(text, "text");
        numbers = Collections.unmodifiableMap(new LinkedHashMap<>(numbers));
    }

    /** The design changes the advisor can propose, as the JSON contract names them. */
    public enum Kind {
        RELIEF_GROOVE("relief-groove"),
        UNDERCUT("undercut"),
        SPACER("spacer"),
        LARGER_MATING_CHAMFER("larger-mating-chamfer"),
        LARGER_STEP("larger-step"),
        STRONGER_MATERIAL("stronger-material"),
        CHANGE_NOMINAL("change-nominal");

        private final String key;

        Kind(String key) { this.key = key; }

        @JsonValue
        public String key() { return key; }
    }
}
