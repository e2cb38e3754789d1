package org.arcwright.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;

/** What a radius does on the part; the first question in choosing its control. */
public enum BlendFunction {
    /** Reduces the stress concentration at a change of section. */
    STRESS_RELIEF("stress-relief"),
    /** Forms or borders a sealing surface (O-ring groove, sealing land). */
    SEALING("sealing"),
    /** Only finishes an edge: handling, appearance, deburring. */
    COSMETIC("cosmetic"),
    /** Sits under a mating part's corner: a shoulder fillet under a bearing, hub or flange. */
    MATING("mating");

    private final String key;

    BlendFunction(String key) { this.key = key; }

    @JsonValue
    public String key() { return key; }

    @JsonCreator
    public static BlendFunction fromKey(String key) {
        return Keys.fromKey(BlendFunction.class, values(), key, BlendFunction::key);
    }
}
