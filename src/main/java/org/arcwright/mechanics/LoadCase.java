package org.arcwright.mechanics;

import java.util.Locale;
import org.arcwright.io.InputProblem;

/**
 * How the section is loaded. K<sub>t</sub> is referred to the nominal stress in the smaller
 * section d (Peterson's convention): P/A for tension, Mc/I for bending, Tc/J for torsion.
 */
public enum LoadCase {
    TENSION("tension"),
    BENDING("bending"),
    TORSION("torsion");

    private final String key;

    LoadCase(String key) { this.key = key; }

    /** The name used in files and on the command line. */
    public String key() { return key; }

    /** True for shear loading, which uses the torsion fit of Neuber's constant. */
    public boolean isShear() { return this == TORSION; }

    /** Reads {@code tension}, {@code bending} or {@code torsion} ({@code axial} is read as tension). */
    public static LoadCase parse(String text) {
        if (text == null) throw InputProblem.ofField("load", "missing; use tension, bending or torsion");
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("axial")) return TENSION;
        for (LoadCase l : values()) if (l.key.equals(t)) return l;
        throw InputProblem.ofField("load", "unknown load '" + text + "'; use tension, bending or torsion");
    }

    @Override
    public String toString() { return key; }
}
