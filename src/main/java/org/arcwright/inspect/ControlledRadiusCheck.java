package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.RadiusEnvelope;

/**
 * Judges a controlled radius: the radius zone, then the local radius of the blend (ADR 0302).
 *
 * <h2>Local radius</h2>
 * Circle fits over windows of a stated length sliding along the blend in quarter-window steps (75 %
 * overlap), each fit by Taubin's algebraic method (Taubin, IEEE PAMI 13(11), 1991), which agrees
 * with the geometric fit to first order in the noise (Chernov, Circular and Linear Regression, 2010,
 * ch. 7). Windows never reach past the blend's tangent points ({@link Blend}). Default length: a
 * fifth of the nominal blend, {@code r·(π - θ)/5} for included angle {@code θ}, and never fewer than
 * {@value #MIN_POINTS} points (common practice for sliding fits: long enough to average noise,
 * short enough to see a flat). Shortest window accepted: {@link #minWindow}.
 *
 * <h2>Uncertainty of a local radius</h2>
 * The first-order covariance of a geometric circle fit, {@code σ² (JᵀJ)⁻¹} with Jacobian rows
 * {@code (uₓ, u_y, 1)} (the unit vector from the centre to each point), evaluated at the window's
 * circle (Chernov 2010, ch. 6; GUM, JCGM 100:2008, clause 5, for the propagation). {@code σ} is the
 * largest of the scatter seen in the window, {@code √(Σe²/(m - 3))}, the scatter pooled over all
 * windows (a window of few points cannot claim less noise than the scan shows), and the stated
 * measurement uncertainty taken as a per-point standard uncertainty {@code U/2}; the largest, not a
 * sum, so that noise is not counted twice. The expanded uncertainty uses {@code k = 2} (GUM clause 6.3). The window's length enters
 * through {@code JᵀJ}: a short arc leaves the radius poorly determined.
 *
 * <h2>Verdict per window</h2>
 * In curvature {@code κ = ±1/r} (sign + for the blend's sense), with {@code Uκ = U_r/r²}: the window
 * passes when {@code [κ - Uκ, κ + Uκ]} lies within {@code [1/max, 1/min]}, fails when it lies wholly
 * outside, and is indeterminate otherwise (ISO 14253-1 default rule). A window whose interval lies
 * wholly below zero curvature is a reversal; one whose radius exceeds 1000 × the largest limit is
 * flat. Both are thus found only when larger than the noise can explain.
 */
public final class ControlledRadiusCheck {
    /** Fewest points a window fit uses. */
    public static final int MIN_POINTS = 5;
    /** Coverage factor of the expanded uncertainty (GUM, about 95 %). */
    public static final double COVERAGE = 2;
    /** Most windows a blend is cut into: the shortest window is 4/this of the blend (quarter steps). */
    public static final int MAX_WINDOWS = 1000;

    private ControlledRadiusCheck() {}

    /** The default window length for a blend of nominal radius {@code r} at {@code corner}. */
    public static double defaultWindow(Corner corner, double r) {
        return r * (Math.PI - 2 * corner.halfAngle()) / 5;
    }

    /**
     * The shortest window accepted: the nominal blend's length over {@value #MAX_WINDOWS}/4, so that a
     * blend is cut into at most {@value #MAX_WINDOWS} quarter-stepped windows. Shorter windows see
     * little but noise and cost time without bound.
     */
    public static double minWindow(Corner corner, double r) {
        return r * (Math.PI - 2 * corner.halfAngle()) * 4 / MAX_WINDOWS;
    }

    /** Refuses a window below {@link #minWindow} (field {@code window}). */
    public static void requireWindow(Corner corner, double r, double window) {
        if (Double.isNaN(window)) return;
        double least = minWindow(corner, r);
        if (!(window >= least)) {
            throw InputProblem.ofField("window", "must be at least " + Inspector.fmt(least)
                    + " (the nominal blend's length / " + (MAX_WINDOWS / 4) + "), got " + DecimalText.exact(window)
                    + "; a shorter window sees little but measurement noise");
        }
    }

    /** As {@link #evaluate(Corner, double, double, double, RadiusEnvelope, Blend, double, double, double)} with no stated uncertainty. */
    public static ControlledRadiusOutcome evaluate(Corner corner, double nominalRadius, double min, double max,
                                                   RadiusEnvelope envelope, Blend blend, double window,
                                                   double resolution) {
        return evaluate(corner, nominalRadius, min, max, envelope, blend, window, resolution, 0);
    }

    /**
     * @param corner the corner the blend is judged at (the fitted surfaces)
     * @param window window length along the contour (NaN: the default)
     * @param uncertainty the stated expanded measurement uncertainty U of a point (0: none stated)
     */
    public static ControlledRadiusOutcome evaluate(Corner corner, double nominalRadius, double min, double max,
                                                   RadiusEnvelope envelope, Blend blend, double window,
                                                   double resolution, double uncertainty) {
        double w = Double.isNaN(window) ? defaultWindow(corner, nominalRadius) : window;
        double[] xs = blend.points().xs(), ys = blend.points().ys(), st = blend.stations();
        int n = blend.points().size();
        Point2 c0 = corner.centre(nominalRadius);
        double flatRadius = 1000 * max;
        double kMin = 1 / max, kMax = min > 0 ? 1 / min : Double.POSITIVE_INFINITY;
        double localMin = Double.POSITIVE_INFINITY, localMax = 0, largestU = 0;
        int flats = 0, windows = 0;
        List<ControlledRadiusOutcome.Reversal> reversals = new ArrayList<>();
        List<ControlledRadiusOutcome.LocalWindow> open = new ArrayList<>();
        double revFrom = Double.NaN, revTo = 0, revX = 0, revY = 0;
        int worstMid = -1;
        double worstEx = Double.NEGATIVE_INFINITY, worstLimit = Double.NaN;
        ControlledRadiusOutcome.LocalWindow worst = null;
        Verdict verdict = Verdict.PASS;
        // first pass: the windows' circles and scatter; the second decides with the pooled scatter as a floor
        Windows fitted = Windows.fit(xs, ys, st, n, w);
        int count = fitted.count;
        int[] los = fitted.los, his = fitted.his;
        Circle[] circles = fitted.circles;
        double[] scatter = fitted.scatter, spread = fitted.spread;
        double pooled = fitted.pooled;
        for (int k = 0; k < count; k++) {
            int lo = los[k];
            int hi = his[k];
            windows++;
            Circle c = circles[k];
            int mid = (lo + hi - 1) >>> 1;
            double mx = xs[mid], my = ys[mid];
            boolean sameSense = (c.cx() - mx) * (c0.x() - mx) + (c.cy() - my) * (c0.y() - my) > 0;
            boolean finite = Double.isFinite(c.r()) && Double.isFinite(c.cx()) && Double.isFinite(c.cy());
            double ur = 0;
            if (finite) {
                double sigma = Math.max(Math.max(scatter[k], pooled), uncertainty / COVERAGE);
                ur = sigma == 0 ? 0 : COVERAGE * sigma * spread[k];
            }
            double r = finite ? c.r() : Double.POSITIVE_INFINITY;
            double kappa = finite ? (sameSense ? 1 : -1) / r : 0;
            double uk = finite ? ur / (r * r) : 0;
            if (!Double.isFinite(uk)) uk = Double.POSITIVE_INFINITY;
            Verdict v;
            if (kappa - uk >= kMin && kappa + uk <= kMax) v = Verdict.PASS;
            else if (kappa + uk < kMin || kappa - uk > kMax) v = Verdict.FAIL;
            else v = Verdict.INDETERMINATE;
            boolean reversed = kappa + uk < 0;
            boolean flat = !reversed && (!finite || r > flatRadius);
            if (flat) {
                flats++;
                localMax = Double.POSITIVE_INFINITY;
            } else if (sameSense) {
                localMin = Math.min(localMin, r);
                localMax = Math.max(localMax, r);
            }
            if (Double.isFinite(ur) && sameSense && !flat) largestU = Math.max(largestU, ur);
            ControlledRadiusOutcome.LocalWindow lw = new ControlledRadiusOutcome.LocalWindow(windows, st[lo], st[hi - 1],
                    sameSense ? r : -r, ur, reversed, v);
            if (v == Verdict.INDETERMINATE) open.add(lw);
            verdict = verdict.and(v);
            double ex, limit;
            if (flat || !sameSense) {
                ex = max;
                limit = max;
            } else if (min - r > r - max) {
                ex = min - r;
                limit = min;
            } else {
                ex = r - max;
                limit = max;
            }
            if (ex > worstEx) {
                worstEx = ex;
                worstMid = blend.indices()[mid];
                worst = lw;
                worstLimit = limit;
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
        return new ControlledRadiusOutcome(envelope, localMin, localMax, largestU, reversals, flats, w, windows, verdict,
                worst, worst == null ? -1 : worstMid, worst == null ? Double.NaN : worstEx, worstLimit, open);
    }

    /** The windows along the blend and their circles: the first pass, before any decision. */
    private static final class Windows {
        int count;
        int[] los, his;
        Circle[] circles;
        double[] scatter, spread;
        /** The scatter pooled over all windows, {@code √(Σe²/Σ(m - 3))}. */
        double pooled;

        /** Windows of length {@code w} stepped by a quarter along the stations {@code st}, each with its Taubin circle. */
        static Windows fit(double[] xs, double[] ys, double[] st, int n, double w) {
            double s0 = st[0], sEnd = st[n - 1];
            double step = w / 4;
            int lo = 0;
            boolean last = false;
            int cap = (int) Math.min(Integer.MAX_VALUE - 8, Math.ceil((sEnd - s0) / step) + 2);
            int[] los = new int[Math.min(cap, 64)], his = new int[los.length];
            Circle[] circles = new Circle[los.length];
            double[] scatter = new double[los.length], spread = new double[los.length];
            double pooledEe = 0;
            int pooledDf = 0, count = 0;
            double[] cov = new double[3];
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
                if (count == los.length) {
                    int grown = count * 2;
                    los = Arrays.copyOf(los, grown);
                    his = Arrays.copyOf(his, grown);
                    circles = Arrays.copyOf(circles, grown);
                    scatter = Arrays.copyOf(scatter, grown);
                    spread = Arrays.copyOf(spread, grown);
                }
                Circle c = CircleFits.taubin(xs, ys, lo, hi);
                los[count] = lo;
                his[count] = hi;
                circles[count] = c;
                if (Double.isFinite(c.r()) && Double.isFinite(c.cx()) && Double.isFinite(c.cy())) {
                    radiusUncertainty(xs, ys, lo, hi, c, cov);
                    scatter[count] = cov[0];
                    spread[count] = cov[1];
                    if (hi - lo > 3) {
                        pooledEe += cov[2];
                        pooledDf += hi - lo - 3;
                    }
                }
                count++;
            }
            Windows out = new Windows();
            out.count = count;
            out.los = los;
            out.his = his;
            out.circles = circles;
            out.scatter = scatter;
            out.spread = spread;
            out.pooled = pooledDf > 0 ? Math.sqrt(pooledEe / pooledDf) : 0;
            return out;
        }
    }

    /**
     * Writes {@code out[0] = √(Σe²/(m - 3))} (infinite for m ≤ 3),
     * {@code out[1] = √[(JᵀJ)⁻¹]ᵣᵣ} and {@code out[2] = Σe²} for the points {@code from..to-1} about
     * circle {@code c}.
     */
    static void radiusUncertainty(double[] xs, double[] ys, int from, int to, Circle c, double[] out) {
        double a11 = 0, a12 = 0, a13 = 0, a22 = 0, a23 = 0, ee = 0;
        int m = to - from;
        for (int i = from; i < to; i++) {
            double dx = xs[i] - c.cx(), dy = ys[i] - c.cy();
            double d = Math.sqrt(dx * dx + dy * dy);
            double ux = dx / d, uy = dy / d, e = d - c.r();
            a11 += ux * ux;
            a12 += ux * uy;
            a13 += ux;
            a22 += uy * uy;
            a23 += uy;
            ee += e * e;
        }
        double a33 = m;
        double det = a11 * (a22 * a33 - a23 * a23) - a12 * (a12 * a33 - a23 * a13) + a13 * (a12 * a23 - a22 * a13);
        double rr = (a11 * a22 - a12 * a12) / det;
        out[0] = m > 3 ? Math.sqrt(ee / (m - 3)) : Double.POSITIVE_INFINITY;
        out[1] = rr > 0 && Double.isFinite(rr) ? Math.sqrt(rr) : Double.POSITIVE_INFINITY;
        out[2] = ee;
    }
}
