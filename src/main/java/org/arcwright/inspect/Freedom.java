package org.arcwright.inspect;

import java.util.EnumSet;
import java.util.Set;

/**
 * A degree of freedom of the section plane that the datum reference frame leaves free, so that a
 * profile zone may be moved along it to fit the points (ASME Y14.5-2018 datum reference frames;
 * ISO 5459). Empty set: fully located; all three: no datums (form only, with size).
 */
public enum Freedom {
    X("x"),
    Y("y"),
    ROTATION("rotation");

    private final String key;

    Freedom(String key) { this.key = key; }

    /** The word used in files. */
    public String key() { return key; }

    /** Reads {@code x}, {@code y} or {@code rotation}; null for anything else. */
    public static Freedom fromKey(String s) {
        for (Freedom f : values()) if (f.key.equalsIgnoreCase(s)) return f;
        return null;
    }

    /** All three: no datum constrains the zone. */
    public static Set<Freedom> all() { return EnumSet.allOf(Freedom.class); }

    /** None: the zone is fully located. */
    public static Set<Freedom> none() { return EnumSet.noneOf(Freedom.class); }
}
