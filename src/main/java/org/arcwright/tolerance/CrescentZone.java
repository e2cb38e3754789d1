package org.arcwright.tolerance;

import org.arcwright.io.InputProblem;

/**
 * The zone a radius tolerance really allows at a corner, and the profile zones that hold it.
 *
 * <h2>Derivation</h2>
 * Two straight surfaces meet at a vertex V with included angle θ. An arc of radius r tangent to both
 * has its centre on the bisector at distance {@code r / sin(θ/2)} from V, so the arc crosses the
 * bisector at distance {@code r / sin(θ/2) - r = r·k} from V, with {@code k = 1/sin(θ/2) - 1}. The
 * zone of a radius tolerance is bounded by the arcs of the smallest and largest radius, each tangent
 * to both surfaces (ASME Y14.5-2018 radius definition, from memory), so along the bisector, where all
 * three arcs share a normal, the zone is {@code (rmax - rmin)·k} wide. Away from the bisector the two
 * boundaries close in, and beyond the tangent points of the largest arc both are the same straight
 * surface: the crescent is widest on the bisector and zero at its tips. The smaller arcs lie nearer
 * to V, so the nominal arc splits the width into {@code (rnom - rmin)·k} toward the vertex and
 * {@code (rmax - rnom)·k} away from it.
 *
 * <p>The bisector governs while the foot of the normal from the largest arc's midpoint to a surface
 * falls on the smallest arc rather than on the surface beyond it, that is while
 * {@code sin(θ/2) >= 1 - rmin/rmax} (true for every usual tolerance at 60° and wider). At sharper
 * corners with wide bands the two boundaries come closer through the adjacent surfaces, and the
 * bisector value is an upper bound of the true gap: {@link #widestOnBisector()} says which holds.
 *
 * <p>For {@code R0.55 ±0.05} at 90° that gives {@code 0.1 × (√2 - 1) = 0.0414}, not the 0.1 a reader
 * might guess from the tolerance. The common shortcut for the equivalent profile zone is twice the
 * ± value (0.1 here, common practice): it is easier to state but allows a contour up to 0.05 from
 * nominal along its whole length, including the straight portions near the tangent points, which
 * the radius tolerance does not.
 *
 * @param includedAngleDeg the angle between the adjacent surfaces, degrees, in (0, 180)
 * @param factor {@code k = 1/sin(θ/2) - 1}
 * @param width widest separation of the limit arcs, on the bisector
 * @param towardVertex part of {@code width} between the nominal arc and the vertex
 * @param awayFromVertex part of {@code width} beyond the nominal arc, away from the vertex
 * @param equalBilateralProfile smallest equal-bilateral profile zone about the nominal arc holding
 *     the crescent: {@code 2·max(towardVertex, awayFromVertex)}
 * @param shortcutProfile the common shortcut: twice the larger deviation of the size tolerance
 * @param widestOnBisector true when the bisector value is the true widest gap; false when it is an
 *     upper bound (sharp corner, wide band)
 */
public record CrescentZone(double includedAngleDeg, double factor, double width, double towardVertex,
                           double awayFromVertex, double equalBilateralProfile, double shortcutProfile,
                           boolean widestOnBisector) {

    /**
     * The crescent of a tolerance {@code rMin..rMax} about {@code rNominal} between surfaces at
     * {@code includedAngleDeg}.
     *
     * @throws InputProblem for a non-finite value, radii out of order, or an angle outside (0, 180)
     */
    public static CrescentZone of(double rMin, double rNominal, double rMax, double includedAngleDeg) {
        if (!Double.isFinite(includedAngleDeg) || includedAngleDeg <= 0 || includedAngleDeg >= 180) {
            throw InputProblem.ofField("angle", "the included angle must be between 0 and 180 degrees (exclusive), got "
                    + includedAngleDeg);
        }
        if (!(Double.isFinite(rMin) && Double.isFinite(rMax) && Double.isFinite(rNominal))) {
            throw InputProblem.ofField("radius", "radii must be finite numbers");
        }
        if (rMin < 0 || rMin > rNominal || rNominal > rMax) {
            throw InputProblem.ofField("radius", "need 0 <= min <= nominal <= max, got " + rMin + ", " + rNominal
                    + ", " + rMax);
        }
        double k = factor(includedAngleDeg);
        double toward = (rNominal - rMin) * k;
        double away = (rMax - rNominal) * k;
        double shortcut = 2 * Math.max(rNominal - rMin, rMax - rNominal);
        boolean onBisector = rMax == 0 || Math.sin(Math.toRadians(includedAngleDeg) / 2) >= 1 - rMin / rMax;
        return new CrescentZone(includedAngleDeg, k, (rMax - rMin) * k, toward, away, 2 * Math.max(toward, away),
                shortcut, onBisector);
    }

    /** {@code k = 1/sin(θ/2) - 1}: bisector distance from the vertex to an arc, per unit radius. */
    public static double factor(double includedAngleDeg) {
        return 1.0 / Math.sin(Math.toRadians(includedAngleDeg) / 2) - 1.0;
    }

    /**
     * Unequally disposed profile zone that holds the crescent exactly: total {@link #width()}, with
     * this much on the add-material (outward) side. For a round the smaller arcs lie toward the vertex
     * and add material; for a fillet the larger arcs, away from it, do.
     */
    public double outwardPortion(boolean fillet) {
        return fillet ? awayFromVertex : towardVertex;
    }
}
