package org.arcwright.tolerance;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;

/**
 * What a general-tolerance table applies to. ISO 2768-1 has one table for each: linear sizes,
 * broken edges (external radii and chamfer heights), and angles by the length of the shorter side.
 */
public enum ToleranceQuantity {
    /** Linear sizes other than broken edges. */
    LINEAR("linear"),
    /** External radii and chamfer heights (broken edges). */
    RADIUS_CHAMFER("radius-chamfer"),
    /** Angular sizes, looked up by the length of the shorter side; tolerances in degrees. */
    ANGULAR("angular");

    private final String key;

    ToleranceQuantity(String key) { this.key = key; }

    /** The name used in table files. */
    public String key() { return key; }

    @JsonCreator
    public static ToleranceQuantity fromKey(String key) {
        for (ToleranceQuantity q : values()) {
            if (q.key.equals(key)) return q;
        }
        throw new IllegalArgumentException("unknown quantity '" + key + "'; use linear, radius-chamfer or angular");
    }

    @JsonValue
    public String toJson() { return key; }
}
