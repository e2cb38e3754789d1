package org.arcwright.zone;

/**
 * Which side of a corner the material is on (common practice terms).
 * <ul>
 *   <li>{@link #ROUND}: material inside the angle between the legs (an external edge, broken by an
 *       arc that removes material);</li>
 *   <li>{@link #FILLET}: material outside it (an internal corner, filled by an arc that adds
 *       material).</li>
 * </ul>
 */
public enum CornerKind {
    ROUND("round"),
    FILLET("fillet");

    private final String key;

    CornerKind(String key) { this.key = key; }

    /** The word used in files: {@code round} or {@code fillet}. */
    public String key() { return key; }

    /** Reads {@code round} or {@code fillet}; null for anything else. */
    public static CornerKind fromKey(String s) {
        for (CornerKind k : values()) if (k.key.equalsIgnoreCase(s)) return k;
        return null;
    }
}
