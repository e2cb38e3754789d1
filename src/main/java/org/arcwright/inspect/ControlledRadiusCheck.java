package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.List;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.RadiusEnvelope;

/**
 * Judges a controlled radius: the radius zone, then the local radius of the blend, estimated by
 * Taubin circle fits over a window sliding along the blend in quarter-window steps. Windows never
 * reach past the blend's tangent points ({@link Blend}). A window whose centre lies on the wrong side
 * of the contour is a reversal; one too flat to have a centre (radius above 1000 × the largest limit)
 * is a flat.
 *
 * <p>Default window: a fifth of the nominal blend's arc length, {@code r·(π - θ)/5} for included
 * angle {@code θ}, and never fewer than {@value #MIN_POINTS} points (common practice for sliding
 * fits: long enough to average noise, short enough to see a flat).
 */
public final class ControlledRadiusCheck {
    /** Fewest points a window fit uses. */
    public static final int MIN_POINTS = 5;

    private ControlledRadiusCheck() {}

    /** The default window length for a blend of nominal radius {@code r} at {@code corner}. */
    public static double defaultWindow(Corner corner, double r) {
        return r * (Math.PI - 2 * corner.halfAngle()) / 5;
    }

    /**
     * @param window window length along the nominal contour (NaN: the default)
     */
    public static ControlledRadiusOutcome evaluate(Corner corner, double nominalRadius, double min, double max,
                                                   RadiusEnvelope envelope, Blend blend, double window,
                                                   double resolution) {
        double w = Double.isNaN(window) ? defaultWindow(corner, nominalRadius) : window;
        double[] xs = blend.points().xs(), ys = blend.points().ys(), st = blend.stations();
        int n = blend.points().size();
        Point2 c0 = corner.centre(nominalRadius);
        double flatRadius = 1000 * max;
        double localMin = Double.POSITIVE_INFINITY, localMax = 0;
        int flats = 0, windows = 0;
        List<ControlledRadiusOutcome.Reversal> reversals = new ArrayList<>();
        double revFrom = Double.NaN, revTo = 0, revX = 0, revY = 0;
        double s0 = st[0], sEnd = st[n - 1];
        double step = w / 4;
        int lo = 0;
        boolean last = false;
        int worstMid = -1;
        double worstEx = Double.NEGATIVE_INFINITY;
        for (double start = s0; !last; start += step) {
            if (start + w >= sEnd) {
                start = Math.max(s0, sEnd - w);
                last = true;
            }
            while (lo < n && st[lo] < start) lo++;
            int hi = lo;
            while (hi < n && st[hi] <= start + w) hi++;
            if (hi - lo < MIN_POINTS) {
                hi = Math.min(n, lo + MIN_POINTS);
                int from = Math.max(0, hi - MIN_POINTS);
                if (hi - from < 3) continue;
                lo = from;
            }
            windows++;
            Circle c = CircleFits.taubin(xs, ys, lo, hi);
            int mid = (lo + hi - 1) >>> 1;
            double mx = xs[mid], my = ys[mid];
            boolean sameSense = (c.cx() - mx) * (c0.x() - mx) + (c.cy() - my) * (c0.y() - my) > 0;
            boolean flat = !Double.isFinite(c.r()) || c.r() > flatRadius;
            if (flat) {
                flats++;
                localMax = Double.POSITIVE_INFINITY;
            } else if (sameSense) {
                localMin = Math.min(localMin, c.r());
                localMax = Math.max(localMax, c.r());
            }
            boolean reversed = !flat && !sameSense;
            double ex = flat || reversed ? max : Math.max(min - c.r(), c.r() - max);
            if (ex > worstEx) {
                worstEx = ex;
                worstMid = blend.indices()[mid];
            }
            if (reversed) {
                if (Double.isNaN(revFrom)) {
                    revFrom = st[lo];
                    revX = mx;
                    revY = my;
                }
                revTo = st[hi - 1];
            } else if (!Double.isNaN(revFrom)) {
                reversals.add(new ControlledRadiusOutcome.Reversal(revFrom, revTo, revX, revY));
                revFrom = Double.NaN;
            }
        }
        if (!Double.isNaN(revFrom)) reversals.add(new ControlledRadiusOutcome.Reversal(revFrom, revTo, revX, revY));
        if (localMin == Double.POSITIVE_INFINITY) localMin = Double.NaN;
        boolean pass = envelope.pass() && reversals.isEmpty() && flats == 0
                && localMin >= min - resolution && localMax <= max + resolution;
        return new ControlledRadiusOutcome(envelope, localMin, localMax, List.copyOf(reversals), flats, w, windows, pass,
                worstMid, worstEx);
    }
}
