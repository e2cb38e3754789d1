package org.arcwright.inspect;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;

/**
 * Everything an inspection needs: what the shoulds are and what was measured. Built by
 * {@link InspectionFiles} from a file, or directly by the desktop app.
 *
 * <p>Refused here, as input no verdict can be given on: for R and CR, a resolution above
 * {@value #RESOLUTION_SHARE} of the radius band (the rule of ten, common practice: the slack at the
 * tangent points must not widen the zone a verdict reads; a profile's verdict does not use it), a CR window below its least length
 * ({@link ControlledRadiusCheck#minWindow}), a nominal radius farther outside the R or CR limits than the band is
 * wide (one just outside them is a same-sign tolerance, judged), and a
 * negative or non-finite uncertainty.
 *
 * @param units drawing units of every length
 * @param nominal the nominal contour
 * @param callout what the section is judged against
 * @param points the measured points, in the nominal's coordinates
 * @param resolution distance below which a point counts as on an adjacent surface where a radius zone
 *     narrows to nothing (its tangent points), and nothing else (a profile's verdict has no slack);
 *     default {@link Units#resolution()}
 * @param window CR window length along the contour; NaN for the default
 * @param compare whether to judge the same points under every applicable callout as well
 * @param uncertainty expanded measurement uncertainty U of a point (drawing units, coverage about
 *     95 %); 0 when not stated. When above zero every verdict follows the ISO 14253-1 default rule.
 */
public record InspectionRequest(Units units, Nominal nominal, InspectionCallout callout, PointSet points,
                                double resolution, double window, boolean compare, double uncertainty) {
    /** Largest resolution accepted, as a share of the tolerance. */
    public static final double RESOLUTION_SHARE = 0.1;

    public InspectionRequest {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(nominal, "nominal");
        Objects.requireNonNull(callout, "callout");
        Objects.requireNonNull(points, "points");
        if (!(resolution > 0) || !Double.isFinite(resolution)) {
            throw InputProblem.ofField("resolution", "must be above zero, got " + DecimalText.exact(resolution));
        }
        if (!Double.isNaN(window) && !(window > 0 && Double.isFinite(window))) {
            throw InputProblem.ofField("window", "must be above zero, got " + DecimalText.exact(window));
        }
        if (!(uncertainty >= 0) || !Double.isFinite(uncertainty)) {
            throw InputProblem.ofField("uncertainty", "must be zero or more (the expanded uncertainty U, in "
                    + units.symbol() + "), got " + DecimalText.exact(uncertainty));
        }
        double tol = tolerance(callout);
        if (callout instanceof InspectionCallout.RadiusLimits && resolution > RESOLUTION_SHARE * tol) {
            throw InputProblem.ofField("resolution", "is " + DecimalText.exact(resolution) + " " + units.symbol() + ", more than a tenth of the tolerance ("
                    + Inspector.fmt(tol) + " " + units.symbol() + "); the resolution is only the slack at the tangent points, "
                    + "where the radius zone narrows to nothing, and must not widen the zone: give at most "
                    + Inspector.fmt(RESOLUTION_SHARE * tol));
        }
        if (nominal instanceof Nominal.CornerBlend cb) {
            if (callout instanceof InspectionCallout.RadiusLimits rl) requireNominalNear(cb.radius(), rl, units);
            ControlledRadiusCheck.requireWindow(cb.corner(), cb.radius(), window);
        }
    }

    /**
     * Refuses a nominal radius farther outside its R or CR limits than the band is wide. A nominal
     * outside its limits is how deviations of the same sign are drawn ({@code R3 +0.3/+0.1}: limit
     * arcs R3.1 and R3.3, nominal R3), and the radius zone reads only the limits, so it is judged.
     * A nearer deviation larger than the band itself ({@code 5} with limits 1.9 to 2.1) is read as a
     * slip, since such a band would be drawn about a nominal inside it: a judgement of this tool, not
     * a rule of ASME Y14.5 or ISO 129-1.
     */
    private static void requireNominalNear(double nominal, InspectionCallout.RadiusLimits rl, Units units) {
        double band = rl.max() - rl.min();
        double nearer = nominal < rl.min() ? rl.min() - nominal : nominal > rl.max() ? nominal - rl.max() : 0;
        if (nearer > band * (1 + 1e-9)) {
            throw InputProblem.ofField("nominalRadius", "is " + DecimalText.exact(nominal) + " " + units.symbol() + ", "
                    + Inspector.fmt(nearer) + " " + units.symbol() + " outside the callout's limits " + DecimalText.exact(rl.min()) + " to "
                    + DecimalText.exact(rl.max()) + ", farther than the band is wide (" + Inspector.fmt(band) + " " + units.symbol()
                    + "); deviations of the same sign (R3 +0.3/+0.1) are accepted, a nominal this far from its band is taken for a slip");
        }
    }

    /** The form without an uncertainty (none stated). */
    public InspectionRequest(Units units, Nominal nominal, InspectionCallout callout, PointSet points,
                             double resolution, double window, boolean compare) {
        this(units, nominal, callout, points, resolution, window, compare, 0);
    }

    /** The tolerance of a callout: the radius band, the zone, the tightest tier. */
    static double tolerance(InspectionCallout c) {
        if (c instanceof InspectionCallout.RadiusLimits rl) return rl.max() - rl.min();
        if (c instanceof InspectionCallout.ProfileTolerance pt) return pt.zone().width();
        double t = Double.POSITIVE_INFINITY;
        for (InspectionCallout.Tier tier : ((InspectionCallout.CompositeProfile) c).tiers()) t = Math.min(t, tier.zone());
        return t;
    }

    /** The same request, with or without the comparison. */
    public InspectionRequest withCompare(boolean c) {
        return new InspectionRequest(units, nominal, callout, points, resolution, window, c, uncertainty);
    }

    /** The same request with another CR window. */
    public InspectionRequest withWindow(double w) {
        return new InspectionRequest(units, nominal, callout, points, resolution, w, compare, uncertainty);
    }

    /** The same request with a stated expanded uncertainty U (0: none). */
    public InspectionRequest withUncertainty(double u) {
        return new InspectionRequest(units, nominal, callout, points, resolution, window, compare, u);
    }

    /** The same request judged against another callout. */
    public InspectionRequest withCallout(InspectionCallout c) {
        return new InspectionRequest(units, nominal, c, points, resolution, window, false, uncertainty);
    }
}
