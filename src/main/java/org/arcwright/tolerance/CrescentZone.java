package org.arcwright.tolerance;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.OptionalDouble;
import org.arcwright.io.DecimalText;
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
 * larger deviation (0.1 here, common practice): it is easier to state but allows a contour up to 0.05
 * from nominal along its whole length, including the straight portions near the tangent points,
 * which the radius tolerance does not.
 *
 * <h2>Deviations of the same sign</h2>
 * The nominal arc need not lie inside the crescent. {@code R3 +0.3/+0.1} has limit arcs R3.1 and
 * R3.3, so at 90° the crescent runs from {@code 0.1·k = 0.0414} to {@code 0.3·k = 0.1243} beyond the
 * nominal arc, wholly away from the vertex. The offsets of the limit arcs are therefore kept signed
 * ({@link #minArcOffset()}, {@link #maxArcOffset()}), and every derived figure follows from them:
 * the equal-bilateral zone about the nominal that holds the crescent is {@code 2·0.3·k = 0.2485},
 * the shortcut {@code 2 × 0.3 = 0.6}, and the zone's centre sits {@code (0.0414 + 0.1243)/2 =
 * 0.0828} beyond the nominal arc (the offset of an ISO 1101:2017 UZ indication, from memory).
 *
 * @param includedAngleDeg the angle between the adjacent surfaces, degrees, in [{@value #MIN_ANGLE_DEG}, 180)
 * @param factor {@code k = 1/sin(θ/2) - 1}
 * @param width widest separation of the limit arcs, on the bisector: {@code (rMax - rMin)·k}
 * @param minArcOffset where the smallest arc crosses the bisector, measured from the nominal arc,
 *     positive away from the vertex: {@code (rMin - rNominal)·k}
 * @param maxArcOffset the same for the largest arc: {@code (rMax - rNominal)·k}
 * @param equalBilateralProfile smallest equal-bilateral profile zone about the nominal arc holding
 *     the crescent: {@code 2·max(|minArcOffset|, |maxArcOffset|)}
 * @param shortcutProfile the common shortcut: twice the larger deviation of the size tolerance,
 *     {@code 2·max(|rMin - rNominal|, |rMax - rNominal|)}
 * @param widestOnBisector true when the bisector value is the true widest gap; false when it is an
 *     upper bound (sharp corner, wide band)
 */
public record CrescentZone(double includedAngleDeg, double factor, double width, double minArcOffset,
                           double maxArcOffset, double equalBilateralProfile, double shortcutProfile,
                           boolean widestOnBisector) {

    /**
     * The sharpest corner a crescent is given for, degrees. Below it the surfaces are nearly parallel:
     * the crescent grows as {@code 1/sin(θ/2)} (over 100 times the band at 1°, 2.3e301 times at
     * 1e-300°), and what is drawn there is a slot whose width a radius does not control.
     */
    public static final double MIN_ANGLE_DEG = 1.0;

    /**
     * The crescent of a tolerance {@code rMin..rMax} against the nominal arc {@code rNominal} between
     * surfaces at {@code includedAngleDeg}. The nominal may lie outside the limits (deviations of the
     * same sign).
     *
     * @throws InputProblem for a non-finite value, radii out of order, or an angle outside
     *     [{@value #MIN_ANGLE_DEG}, 180)
     */
    public static CrescentZone of(double rMin, double rNominal, double rMax, double includedAngleDeg) {
        checkAngle(includedAngleDeg);
        if (!(Double.isFinite(rMin) && Double.isFinite(rMax) && Double.isFinite(rNominal))) {
            throw InputProblem.ofField("radius", "radii must be finite numbers");
        }
        if (rMin < 0 || rNominal < 0 || rMin > rMax) {
            throw InputProblem.ofField("radius", "need 0 <= min <= max and a nominal of 0 or more, got " + DecimalText.exact(rMin)
                    + ", " + DecimalText.exact(rNominal) + ", " + DecimalText.exact(rMax));
        }
        double k = factor(includedAngleDeg);
        double lo = (rMin - rNominal) * k;
        double hi = (rMax - rNominal) * k;
        double shortcut = 2 * Math.max(Math.abs(rNominal - rMin), Math.abs(rMax - rNominal));
        boolean onBisector = rMax == 0 || Math.sin(Math.toRadians(includedAngleDeg) / 2) >= 1 - rMin / rMax;
        return new CrescentZone(includedAngleDeg, k, (rMax - rMin) * k, lo, hi,
                2 * Math.max(Math.abs(lo), Math.abs(hi)), shortcut, onBisector);
    }

    /**
     * Refuses an angle a crescent cannot be given for, with the reason.
     *
     * @throws InputProblem (field {@code angle}) outside [{@value #MIN_ANGLE_DEG}, 180)
     */
    public static void checkAngle(double includedAngleDeg) {
        if (!Double.isFinite(includedAngleDeg) || includedAngleDeg <= 0 || includedAngleDeg >= 180) {
            throw InputProblem.ofField("angle", "the included angle must be between 0 and 180 degrees (exclusive), got "
                    + degrees(includedAngleDeg));
        }
        if (includedAngleDeg < MIN_ANGLE_DEG) {
            throw InputProblem.ofField("angle", "an included angle below " + degrees(MIN_ANGLE_DEG)
                    + "° is not a corner a radius controls: the surfaces are nearly parallel and the crescent grows as "
                    + "1/sin(θ/2) without bound; got " + degrees(includedAngleDeg) + "°");
        }
    }

    /** An angle as typed: every digit it has, no exponent, never rounded up to 180. */
    public static String degrees(double angleDeg) {
        String s = DecimalText.exact(angleDeg);
        return s.length() > 24 ? new BigDecimal(Double.toString(angleDeg))
                .round(new MathContext(10)).toString() : s;
    }

    /** {@code k = 1/sin(θ/2) - 1}: bisector distance from the vertex to an arc, per unit radius. */
    public static double factor(double includedAngleDeg) {
        return 1.0 / Math.sin(Math.toRadians(includedAngleDeg) / 2) - 1.0;
    }

    /** Part of the crescent on the vertex side of the nominal arc (zero when it lies wholly beyond it). */
    public double towardVertex() {
        return Math.max(0, Math.min(maxArcOffset, 0) - minArcOffset);
    }

    /** Part of the crescent beyond the nominal arc, away from the vertex (zero when it lies wholly nearer). */
    public double awayFromVertex() {
        return Math.max(0, maxArcOffset - Math.max(minArcOffset, 0));
    }

    /** True when the nominal arc lies inside the crescent (or on its edge): deviations of opposite sign or one zero. */
    public boolean holdsNominal() {
        return minArcOffset <= 0 && maxArcOffset >= 0;
    }

    /** Where the middle of the crescent lies, from the nominal arc, positive away from the vertex. */
    public double centreOffset() {
        return (minArcOffset + maxArcOffset) / 2;
    }

    /**
     * The add-material (outward) side's sign: for a fillet the larger arcs, away from the vertex,
     * fill more of the corner; for a round the smaller arcs, toward it, leave more material.
     */
    private static double outwardSign(boolean fillet) {
        return fillet ? 1 : -1;
    }

    /**
     * Offset of the zone's centre from the nominal arc, positive toward the add-material side: the
     * value of an ISO 1101:2017 UZ indication for a zone of {@link #width()} that holds the crescent
     * exactly. It may exceed half the width (a zone that does not touch the nominal).
     */
    public double isoOffset(boolean fillet) {
        return outwardSign(fillet) * centreOffset();
    }

    /**
     * Unequally disposed profile zone that holds the crescent exactly about the nominal arc: total
     * {@link #width()}, with this much on the add-material (outward) side. Empty when the nominal arc
     * lies outside the crescent, since the outward amount of an ASME unequally disposed zone lies
     * between zero and the zone's value (ASME Y14.5-2018, from memory): the true profile must then be
     * drawn at a limit arc instead.
     */
    public OptionalDouble outwardPortion(boolean fillet) {
        if (!holdsNominal()) return OptionalDouble.empty();
        return OptionalDouble.of(fillet ? maxArcOffset : -minArcOffset);
    }
}
