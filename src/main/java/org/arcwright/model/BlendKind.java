package org.arcwright.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;

/**
 * A round blends an outside (convex) corner: material inside the angle between the surfaces. A
 * fillet blends an inside (concave) corner: material outside it.
 */
public enum BlendKind {
    ROUND("round"),
    FILLET("fillet");

    private final String key;

    BlendKind(String key) { this.key = key; }

    @JsonValue
    public String key() { return key; }

    @JsonCreator
    public static BlendKind fromKey(String key) { return Keys.fromKey(BlendKind.class, values(), key, BlendKind::key); }
}
