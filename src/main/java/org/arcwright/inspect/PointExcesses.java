package org.arcwright.inspect;

import org.arcwright.zone.Corner;
import org.arcwright.zone.RadiusZone;

/**
 * How far each measured point of an inspection lies beyond its callout's limits, and the allowance
 * that distance is read against: what a plot or a view colours the points by. One place for it, so
 * the command line's plot and the window's Zone view grade a point alike.
 *
 * <p>For R and CR the excess is the radius zone's ({@link RadiusZone#excess}), on the adjacent
 * surfaces fitted to the points, and the allowance the radius band; for a profile, the deviation beyond the (first tier's) zone after its registration,
 * and the allowance the zone's width.
 */
public final class PointExcesses {
    /** Inside, but closer to a limit than this share of the allowance: near a limit. */
    public static final double NEAR_SHARE = 0.15;

    private final InspectionRequest request;
    private final RadiusZone radiusZone;
    private final ProfileOutcome profile;

    private PointExcesses(InspectionRequest request, RadiusZone radiusZone, ProfileOutcome profile) {
        this.request = request;
        this.radiusZone = radiusZone;
        this.profile = profile;
    }

    /** The excesses of the points of {@code r}. */
    public static PointExcesses of(InspectionResult r) {
        InspectionRequest q = r.request();
        ProfileOutcome po = r.profile() != null ? r.profile()
                : r.tiers() != null && !r.tiers().isEmpty() ? r.tiers().get(0) : null;
        RadiusZone rz = null;
        if (q.callout() instanceof InspectionCallout.RadiusLimits && q.nominal() instanceof Nominal.CornerBlend) {
            InspectionCallout.RadiusLimits rl = (InspectionCallout.RadiusLimits) q.callout();
            // the zone the verdict read: tangent to the fitted adjacent surfaces
            Corner corner = r.surfaces() != null ? r.surfaces().corner() : ((Nominal.CornerBlend) q.nominal()).corner();
            rz = new RadiusZone(corner, rl.min(), rl.max(), q.resolution());
        }
        return new PointExcesses(q, rz, po);
    }

    /** How far point {@code i} lies beyond the limits (negative: inside by that much); NaN where not judged. */
    public double excess(int i) {
        if (radiusZone != null) return radiusZone.excess(request.points().xs()[i], request.points().ys()[i]);
        if (profile != null) return profile.zone().excess(profile.deviations()[i]);
        return Double.NaN;
    }

    /**
     * What {@link #excess} measures at point {@code i}, as a {@link Worst} names it: {@code radius} for
     * R and CR, {@code distance beyond surface} for a point outside the sharp corner, {@code distance}
     * for a profile.
     */
    public String measure(int i) {
        if (radiusZone != null) {
            return radiusZone.beyondSurface(request.points().xs()[i], request.points().ys()[i]) ? Worst.BEYOND_SURFACE : Worst.RADIUS;
        }
        return Worst.DISTANCE;
    }

    /** The width the excess is read against: the radius band for R and CR, the zone for a profile. */
    public double allowance() {
        if (request.callout() instanceof InspectionCallout.RadiusLimits) {
            InspectionCallout.RadiusLimits rl = (InspectionCallout.RadiusLimits) request.callout();
            return Math.max(rl.max() - rl.min(), 1e-12);
        }
        return profile == null ? 1 : profile.zone().width();
    }

    /** The radius zone the points were judged against; null for a profile callout. */
    public RadiusZone radiusZone() {
        return radiusZone;
    }

    /** The profile (first tier of a composite) the points were judged against; null for R and CR. */
    public ProfileOutcome profile() {
        return profile;
    }

    /** Where the profile placed the zone (points move by it onto the nominal); null when nothing moved them. */
    public Registration registration() {
        return profile == null ? null : profile.registration();
    }
}
