package org.arcwright.mechanics;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;

/**
 * A fillet's limits and the corner of the part that must seat against its shoulder.
 *
 * @param units length unit of every size here (a bearing's r_s min is converted from mm)
 * @param filletMin smallest fillet radius allowed
 * @param filletMax largest fillet radius allowed: the one that must still clear
 * @param corner the mating part's corner
 * @param shoulderHeight radial height of the shoulder face above the seat, or null when support is not checked
 * @param shoulderEdgeBreak chamfer or radius on the shoulder's outer edge, taken off the top of the face (0 for none)
 * @param requiredSupport the flat the mating part needs on the shoulder face, or null
 */
public record ClearanceCase(Units units, double filletMin, double filletMax, MatingCorner corner, Double shoulderHeight,
                            double shoulderEdgeBreak, Double requiredSupport) {
    public ClearanceCase {
        Objects.requireNonNull(units, "units");
        if (corner == null) throw InputProblem.ofField("mating", "missing: the mating part's corner (chamfer, radius or bearing)");
        StressConcentration.positive("fillet.rMin", filletMin);
        StressConcentration.positive("fillet.rMax", filletMax);
        if (filletMin > filletMax) {
            throw InputProblem.ofField("fillet.rMin", "rMin = " + DecimalText.exact(filletMin) + " exceeds rMax = " + DecimalText.exact(filletMax));
        }
        if (shoulderHeight != null) StressConcentration.positive("shoulderHeight", shoulderHeight);
        if (!Double.isFinite(shoulderEdgeBreak) || shoulderEdgeBreak < 0) {
            throw InputProblem.ofField("shoulderEdgeBreak", "must be zero or more, got " + DecimalText.exact(shoulderEdgeBreak));
        }
        if (requiredSupport != null) {
            StressConcentration.positive("requiredSupport", requiredSupport);
            if (shoulderHeight == null) {
                throw InputProblem.ofField("requiredSupport", "needs shoulderHeight to check the flat left on the shoulder");
            }
        }
        if (shoulderHeight != null && filletMax > shoulderHeight) {
            throw InputProblem.ofField("fillet.rMax", "fillet radius " + DecimalText.exact(filletMax) + " is larger than the shoulder height "
                    + DecimalText.exact(shoulderHeight));
        }
    }
}
