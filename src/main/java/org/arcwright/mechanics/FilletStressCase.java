package org.arcwright.mechanics;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;

/**
 * A shoulder fillet to assess: the body, its load, its sizes and the radius limits.
 *
 * @param shape stepped shaft or flat bar
 * @param load tension, bending or torsion
 * @param units length unit of D, d and the radii
 * @param bigD larger diameter or width
 * @param smallD smaller diameter or width
 * @param rMin smallest radius the tolerance allows
 * @param rNominal nominal radius (the mean of the limits when none is drawn)
 * @param rMax largest radius the tolerance allows
 * @param strength ultimate strength for notch sensitivity, or null for K<sub>t</sub> only
 */
public record FilletStressCase(ShoulderShape shape, LoadCase load, Units units, double bigD, double smallD,
                               double rMin, double rNominal, double rMax, UltimateStrength strength) {

    public FilletStressCase {
        if (shape == null) throw InputProblem.ofField("shape", "missing; use stepped-shaft or stepped-bar");
        if (load == null) throw InputProblem.ofField("load", "missing; use tension, bending or torsion");
        Objects.requireNonNull(units, "units");
        StressConcentration.checkGeometry(bigD, smallD);
        boolean single = rMin == rNominal && rNominal == rMax;
        StressConcentration.positive(single ? "r" : "rMin", rMin);
        StressConcentration.positive("r", rNominal);
        StressConcentration.positive(single ? "r" : "rMax", rMax);
        if (rMin > rMax) throw InputProblem.ofField("rMin", "rMin = " + DecimalText.exact(rMin) + " exceeds rMax = " + DecimalText.exact(rMax));
        if (rNominal < rMin || rNominal > rMax) {
            throw InputProblem.ofField("r", "nominal r = " + DecimalText.exact(rNominal) + " lies outside the limits " + DecimalText.exact(rMin) + ".." + DecimalText.exact(rMax));
        }
        double h = (bigD - smallD) / 2;
        if (rMax > h * (1 + 1e-12)) {
            throw InputProblem.ofField(rMax == rMin ? "r" : "rMax", "fillet radius " + DecimalText.exact(rMax)
                    + " is larger than the step h = (D - d)/2 = " + DecimalText.significant(h, 6) + "; a fillet tangent to both the diameter and "
                    + "the shoulder face needs r <= h");
        }
    }

    /** A single radius with no tolerance. */
    public static FilletStressCase of(ShoulderShape shape, LoadCase load, Units units, double bigD, double smallD,
                                      double r, UltimateStrength strength) {
        return new FilletStressCase(shape, load, units, bigD, smallD, r, r, r, strength);
    }

    /** Radius limits, nominal at their mean. */
    public static FilletStressCase ofLimits(ShoulderShape shape, LoadCase load, Units units, double bigD, double smallD,
                                            double rMin, double rMax, UltimateStrength strength) {
        return new FilletStressCase(shape, load, units, bigD, smallD, rMin, (rMin + rMax) / 2, rMax, strength);
    }

    /** True when the limits differ. */
    public boolean hasTolerance() { return rMax > rMin; }

    /** h = (D - d)/2, the largest radius that still meets the shoulder face tangentially. */
    public double stepHeight() { return (bigD - smallD) / 2; }
}
