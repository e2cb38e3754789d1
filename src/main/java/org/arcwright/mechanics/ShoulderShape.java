package org.arcwright.mechanics;

import java.util.Locale;
import org.arcwright.io.InputProblem;

/**
 * The body a shoulder fillet sits on. For a shaft D and d are diameters; for a flat bar they are
 * the widths (Peterson's H and d), the thickness playing no part in K<sub>t</sub>.
 */
public enum ShoulderShape {
    /** A stepped round shaft (diameters D and d). */
    STEPPED_SHAFT("stepped-shaft", "stepped round shaft"),
    /** A stepped flat bar (widths D and d), fillets on both sides of the step. */
    STEPPED_BAR("stepped-bar", "stepped flat bar");

    private final String key;
    private final String description;

    ShoulderShape(String key, String description) {
        this.key = key;
        this.description = description;
    }

    /** The name used in files and on the command line. */
    public String key() { return key; }

    /** Words for a report. */
    public String description() { return description; }

    /** Reads {@code stepped-shaft} or {@code stepped-bar}. */
    public static ShoulderShape parse(String text) {
        if (text == null) throw InputProblem.ofField("shape", "missing; use stepped-shaft or stepped-bar");
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (ShoulderShape s : values()) if (s.key.equals(t)) return s;
        throw InputProblem.ofField("shape", "unknown shape '" + text + "'; use stepped-shaft or stepped-bar");
    }

    @Override
    public String toString() { return key; }
}
