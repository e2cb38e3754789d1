package org.arcwright.tolerance;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;
import org.arcwright.io.InputProblem;

/**
 * Length units of a drawing. Each unit carries the smallest length that still means something at
 * the scale of a radius tolerance (the resolution used where zones narrow to nothing).
 */
public enum Units {
    MM("mm", 1e-6),
    INCH("in", 1e-6);

    private final String symbol;
    private final double resolution;

    Units(String symbol, double resolution) {
        this.symbol = symbol;
        this.resolution = resolution;
    }

    /** The short symbol used in files and on the command line: {@code mm} or {@code in}. */
    @JsonValue
    public String symbol() { return symbol; }

    /** Default resolution for geometric tests where a zone narrows to nothing, in this unit. */
    public double resolution() { return resolution; }

    /** Millimetres per one of this unit. */
    public double millimetres() { return this == MM ? 1.0 : 25.4; }

    /** Reads {@code mm}, {@code in} or {@code inch} (any case). */
    @JsonCreator
    public static Units parse(String text) {
        if (text == null) throw InputProblem.ofField("units", "missing; use mm or in");
        return switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "mm", "millimetre", "millimeter", "millimetres", "millimeters" -> MM;
            case "in", "inch", "inches" -> INCH;
            default -> throw InputProblem.ofField("units", "unknown units '" + text + "'; use mm or in");
        };
    }

    @Override
    public String toString() { return symbol; }
}
