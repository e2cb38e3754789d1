package org.arcwright.inspect;

import java.util.Arrays;
import java.util.Objects;
import java.util.Set;
import org.arcwright.zone.Contour;
import org.arcwright.zone.ProfileZone;

/**
 * Places a profile zone on measured points by Chebyshev (minimax) registration over the degrees of
 * freedom the datums leave free, and judges the points.
 *
 * <p>The zone of width {@code w} with fraction {@code f} on the air side holds a point of deviation
 * {@code d} when {@code -(1-f)·w <= d <= f·w}. The smallest such {@code w} over the free moves is a
 * minimax problem; it is solved by successive linear programmes: the deviations are linearised in
 * the moves ({@code d + n·(Δt + Δθ × (p - o)) - Δoffset}, with {@code n} the normal toward air at
 * the nearest nominal point), {@code min w} subject to both bounds for every point is solved with an
 * active set ({@link ActiveSetLp}), the move is applied exactly, and the deviations are measured
 * afresh, inside a trust region, until the move vanishes (ADR 0301).
 */
public final class ProfileCheck {
    private final Contour contour;
    private final double pivotX, pivotY;
    private final double resolution;

    /**
     * @param contour the nominal contour, air side set
     * @param pivotX x of the point registration turns are reported about
     * @param pivotY y of that point
     * @param resolution slack in the verdict, drawing units
     */
    public ProfileCheck(Contour contour, double pivotX, double pivotY, double resolution) {
        this.contour = Objects.requireNonNull(contour, "contour");
        this.pivotX = pivotX;
        this.pivotY = pivotY;
        this.resolution = resolution;
    }

    /** Judges {@code points} against {@code zone}, moving it in {@code free} (and offsetting it if dynamic). */
    public ProfileOutcome evaluate(PointSet points, ProfileZone zone, Set<Freedom> free, boolean dynamic) {
        return evaluate(points, zone, free, dynamic, Double.NEGATIVE_INFINITY);
    }

    /**
     * As {@link #evaluate(PointSet, ProfileZone, Set, boolean)}, but the registration stops at the
     * first placement whose required zone is at most {@code stopAt}: the start (the points as
     * measured) or an accepted step. The successive programmes only ever accept a placement that
     * needs no wider zone than the last, so the minimax needs at most {@code stopAt} too: a caller
     * that reads only the verdict gets the same verdict sooner. The outcome then describes that
     * placement, not the minimax one. {@code -∞}: the full registration. Sections of more than
     * 20,000 points (thinned, then screened) always register fully.
     */
    ProfileOutcome evaluate(PointSet points, ProfileZone zone, Set<Freedom> free, boolean dynamic, double stopAt) {
        int n = points.size();
        double[] xs = points.xs(), ys = points.ys();
        double f = zone.fraction();
        double[] dev = new double[n];
        Registration reg;
        if (free.isEmpty() && !dynamic) {
            contour.measureAll(xs, ys, n, dev, null, null, null);
            reg = Registration.none(pivotX, pivotY);
        } else {
            reg = register(points, f, free, dynamic, dev, stopAt);
        }
        double required = requiredZone(dev, n, f);
        double maxOut = Double.NEGATIVE_INFINITY, maxIn = Double.NEGATIVE_INFINITY, worstEx = Double.NEGATIVE_INFINITY;
        int worst = -1;
        for (int i = 0; i < n; i++) {
            maxOut = Math.max(maxOut, dev[i]);
            maxIn = Math.max(maxIn, -dev[i]);
            double e = zone.excess(dev[i]);
            if (e > worstEx) { worstEx = e; worst = i; }
        }
        boolean pass = worstEx <= resolution;
        return new ProfileOutcome(zone, Set.copyOf(free), dynamic, required, reg, maxOut, maxIn, pass, worst, worstEx, dev);
    }

    /** {@code max(d/f, -d/(1-f))} over the points; NaN when a one-sided zone is crossed. */
    static double requiredZone(double[] dev, int n, double f) {
        double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) { hi = Math.max(hi, dev[i]); lo = Math.min(lo, dev[i]); }
        double w = 0;
        if (hi > 0) w = f > 0 ? Math.max(w, hi / f) : Double.NaN;
        if (lo < 0 && !Double.isNaN(w)) w = f < 1 ? Math.max(w, -lo / (1 - f)) : Double.NaN;
        return w;
    }

    /** Above this many points, the registration first converges on an evenly thinned subset. */
    private static final int COARSE_LIMIT = 20_000;

    private Registration register(PointSet points, double f, Set<Freedom> free, boolean dynamic, double[] dev, double stopAt) {
        int n = points.size();
        double[] xs = points.xs(), ys = points.ys();
        double ox = 0, oy = 0, minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY,
                minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            ox += xs[i]; oy += ys[i];
            minX = Math.min(minX, xs[i]); maxX = Math.max(maxX, xs[i]);
            minY = Math.min(minY, ys[i]); maxY = Math.max(maxY, ys[i]);
        }
        ox /= n; oy /= n;
        double spread = Math.max(Math.hypot(maxX - minX, maxY - minY), 1e-300);
        double[] start = new double[4];
        if (n > COARSE_LIMIT) {
            // converge on every k-th point first; the full set then needs a pass or two (ADR 0301)
            int k = n / COARSE_LIMIT + 1, m = (n + k - 1) / k;
            double[] sx = new double[m], sy = new double[m];
            for (int i = 0, j = 0; i < n; i += k, j++) { sx[j] = xs[i]; sy[j] = ys[i]; }
            State coarse = converge(sx, sy, m, ox, oy, spread, spread / 10, f, free, dynamic, start, Double.NEGATIVE_INFINITY);
            start = new double[] {coarse.tx, coarse.ty, coarse.theta, coarse.offset};
        }
        State s = n > COARSE_LIMIT ? screened(xs, ys, n, ox, oy, spread, f, free, dynamic, start)
                : converge(xs, ys, n, ox, oy, spread, spread / 10, f, free, dynamic, start, stopAt);
        System.arraycopy(s.dev, 0, dev, 0, n);
        double c = Math.cos(s.theta), sn = Math.sin(s.theta);
        // report the move as a turn about the pivot: t_P = t + (I - R)(o - P)
        double qx = ox - pivotX, qy = oy - pivotY;
        double rx = s.tx + qx - (c * qx - sn * qy), ry = s.ty + qy - (sn * qx + c * qy);
        return new Registration(rx, ry, Math.toDegrees(s.theta), s.offset, pivotX, pivotY);
    }

    /**
     * Polishes the thinned start on all points while measuring most of them only twice: at the
     * start, only points whose deviation lies within a band of the extremes can become extreme
     * after the small remaining move, so the successive LPs run on those; one full measurement at
     * the answer then checks that no other point needs a wider zone. If one does, the full set is
     * polished from there, so the answer is the full set's minimax either way (the optimum of a
     * subset is never wider than the full set's, and here it is attained by the full set).
     */
    private State screened(double[] xs, double[] ys, int n, double ox, double oy, double spread, double f,
                           Set<Freedom> free, boolean dynamic, double[] start) {
        State full = new State(n, ox, oy);
        full.tx = start[0];
        full.ty = start[1];
        full.theta = start[2];
        full.offset = start[3];
        full.measure(xs, ys, contour);
        double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) { hi = Math.max(hi, full.dev[i]); lo = Math.min(lo, full.dev[i]); }
        double band = (hi - lo) / SCREEN_BAND;
        int m = 0;
        for (int i = 0; i < n; i++) if (full.dev[i] >= hi - band || full.dev[i] <= lo + band) m++;
        double[] cx = new double[m], cy = new double[m];
        for (int i = 0, j = 0; i < n; i++) {
            if (full.dev[i] >= hi - band || full.dev[i] <= lo + band) { cx[j] = xs[i]; cy[j] = ys[i]; j++; }
        }
        State sub = converge(cx, cy, m, ox, oy, spread, spread / 1000, f, free, dynamic, start, Double.NEGATIVE_INFINITY);
        full.tx = sub.tx;
        full.ty = sub.ty;
        full.theta = sub.theta;
        full.offset = sub.offset;
        full.measure(xs, ys, contour);
        double subObj = objective(sub.dev, m, f);
        if (objective(full.dev, n, f) <= subObj + 1e-15 * spread) return full;
        return converge(xs, ys, n, ox, oy, spread, spread / 1000, f, free, dynamic,
                new double[] {sub.tx, sub.ty, sub.theta, sub.offset}, Double.NEGATIVE_INFINITY);
    }

    /** The band beside each extreme screened in is the spread of the deviations at the start divided by this. */
    private static final double SCREEN_BAND = 8;

    /**
     * Successive linear programmes from {@code start} (tx, ty, θ, offset) until the move vanishes, or
     * until a placement needs a zone of at most {@code stopAt}.
     */
    private State converge(double[] xs, double[] ys, int n, double ox, double oy, double spread, double trust, double f,
                           Set<Freedom> free, boolean dynamic, double[] start, double stopAt) {
        boolean fx = free.contains(Freedom.X), fy = free.contains(Freedom.Y), fr = free.contains(Freedom.ROTATION);
        State s = new State(n, ox, oy);
        s.tx = start[0];
        s.ty = start[1];
        s.theta = start[2];
        s.offset = start[3];
        s.measure(xs, ys, contour);
        State spare = new State(n, ox, oy);
        double best = objective(s.dev, n, f);
        if (best <= stopAt) return s;
        int pass = 0;
        int[] working = new int[0];
        while (pass++ < 200) {
            Lin lp = new Lin(s, n, f, fx, fy, fr, dynamic, trust, spread);
            int[] init = initial(lp, s, n, working);
            ActiveSetLp.Result res = ActiveSetLp.solve(lp, init, 1e-14 * spread);
            if (res.z() == null) break;
            working = pointConstraints(res.working(), 2 * n);
            double[] step = lp.moves(res.z());
            State t = s.moved(step, xs, ys, contour, spare);
            double obj = objective(t.dev, n, f);
            double size = Math.abs(step[0]) + Math.abs(step[1]) + Math.abs(step[2]) * spread + Math.abs(step[3]);
            if (obj <= best) {
                spare = s;
                // quadratic convergence once the extreme points settle: after a step of 1e-7 of the
                // spread the next would be ~1e-14 of it
                boolean done = size <= 1e-7 * spread || (best - obj) <= 1e-15 * spread;
                s = t;
                best = obj;
                if (done || best <= stopAt) break;
                trust = Math.max(trust, 4 * size);
            } else {
                trust = size / 4;
                if (trust < 1e-15 * spread) break;
            }
        }
        return s;
    }

    /** The constraints of {@code working} below {@code limit} (the points', not the box's), in order. */
    private static int[] pointConstraints(int[] working, int limit) {
        int k = 0;
        for (int j : working) if (j < limit) k++;
        int[] out = new int[k];
        k = 0;
        for (int j : working) if (j < limit) out[k++] = j;
        return out;
    }

    /** The minimax objective (the zone width needed), NaN-safe. */
    private static double objective(double[] dev, int n, double f) {
        double w = requiredZone(dev, n, f);
        return Double.isNaN(w) ? Double.POSITIVE_INFINITY : w;
    }

    /** Box constraints, the previous working set, and the extremes of 64 runs of points. */
    private static int[] initial(Lin lp, State s, int n, int[] working) {
        int free = lp.k;
        int bins = Math.min(64, n);
        int[] out = new int[2 * free + working.length + 2 * bins];
        int m = 0;
        for (int j = 0; j < 2 * free; j++) out[m++] = 2 * n + j;
        for (int w : working) out[m++] = w;
        for (int b = 0; b < bins; b++) {
            int from = (int) ((long) n * b / bins), to = (int) ((long) n * (b + 1) / bins);
            int hi = from, lo = from;
            for (int i = from; i < to; i++) {
                if (s.dev[i] > s.dev[hi]) hi = i;
                if (s.dev[i] < s.dev[lo]) lo = i;
            }
            out[m++] = hi;
            out[m++] = n + lo;
        }
        // first occurrences in order, as Stream.distinct() would give, without boxing every index
        boolean[] seen = new boolean[2 * n + 2 * free];
        int k = 0;
        for (int i = 0; i < m; i++) {
            if (!seen[out[i]]) {
                seen[out[i]] = true;
                out[k++] = out[i];
            }
        }
        return Arrays.copyOf(out, k);
    }

    /** Current registration and the measured deviations under it. */
    private static final class State {
        final int n;
        final double ox, oy;
        double theta, tx, ty, offset;
        double[] dev, nx, ny, lever;

        State(int n, double ox, double oy) {
            this.n = n;
            this.ox = ox;
            this.oy = oy;
        }

        void measure(double[] xs, double[] ys, Contour contour) {
            if (dev == null) {
                dev = new double[n];
                nx = new double[n];
                ny = new double[n];
                lever = new double[n];
            }
            double c = Math.cos(theta), s = Math.sin(theta);
            double[] out = new double[4], work = new double[5];
            double px = ox + tx, py = oy + ty;
            for (int i = 0; i < n; i++) {
                double dx = xs[i] - ox, dy = ys[i] - oy;
                double x = ox + c * dx - s * dy + tx, y = oy + s * dx + c * dy + ty;
                contour.measureDeviation(x, y, out, work);
                dev[i] = out[0] - offset;
                nx[i] = out[1];
                ny[i] = out[2];
                // d(deviation)/dθ for a turn about the moved pivot: n · perp(p' - o')
                lever[i] = out[1] * -(y - py) + out[2] * (x - px);
            }
        }

        /** This placement moved by {@code step}, measured into {@code t} (whose arrays are reused). */
        State moved(double[] step, double[] xs, double[] ys, Contour contour, State t) {
            t.theta = theta + step[2];
            t.tx = tx + step[0];
            t.ty = ty + step[1];
            t.offset = offset + step[3];
            t.measure(xs, ys, contour);
            return t;
        }
    }

    /**
     * The linearised registration: variables (free moves..., w); minimise w subject to
     * {@code d + g·Δ <= f·w} (constraints 0..n-1), {@code -(d + g·Δ) <= (1-f)·w} (n..2n-1), and a
     * trust-region box on each move (2n..).
     */
    private static final class Lin implements ActiveSetLp.Problem {
        final State s;
        final int n, k;
        final double f, trust, spread;
        final boolean fx, fy, fr, fo;
        final double[] objective;

        Lin(State s, int n, double f, boolean fx, boolean fy, boolean fr, boolean fo, double trust, double spread) {
            this.s = s; this.n = n; this.f = f; this.trust = trust; this.spread = spread;
            this.fx = fx; this.fy = fy; this.fr = fr; this.fo = fo;
            this.k = (fx ? 1 : 0) + (fy ? 1 : 0) + (fr ? 1 : 0) + (fo ? 1 : 0);
            this.objective = new double[k + 1];
            objective[k] = 1;
        }

        @Override public int variables() { return k + 1; }
        @Override public int constraints() { return 2 * n + 2 * k; }
        @Override public double[] objective() { return objective; }

        /** Gradient of point i's deviation in the free moves; rotation scaled by the spread. */
        private void gradient(int i, double[] g) {
            int m = 0;
            if (fx) g[m++] = s.nx[i];
            if (fy) g[m++] = s.ny[i];
            if (fr) g[m++] = s.lever[i] / spread;
            if (fo) g[m++] = -1;
        }

        @Override
        public double row(int j, double[] row) {
            Arrays.fill(row, 0);
            if (j < 2 * n) {
                int i = j < n ? j : j - n;
                gradient(i, row);
                if (j < n) {
                    row[k] = -f;
                    return -s.dev[i];
                }
                for (int m = 0; m < k; m++) row[m] = -row[m];
                row[k] = -(1 - f);
                return s.dev[i];
            }
            int b = j - 2 * n;
            row[b / 2] = b % 2 == 0 ? 1 : -1;
            return trust;
        }

        @Override
        public double violation(int j, double[] z) {
            if (j < 2 * n) {
                int i = j < n ? j : j - n;
                double lin = s.dev[i];
                int m = 0;
                if (fx) lin += s.nx[i] * z[m++];
                if (fy) lin += s.ny[i] * z[m++];
                if (fr) lin += s.lever[i] / spread * z[m++];
                if (fo) lin -= z[m++];
                return j < n ? lin - f * z[k] : -lin - (1 - f) * z[k];
            }
            int b = j - 2 * n;
            return (b % 2 == 0 ? z[b / 2] : -z[b / 2]) - trust;
        }

        /** The LP solution as (Δx, Δy, Δθ, Δoffset). */
        double[] moves(double[] z) {
            double[] out = new double[4];
            int m = 0;
            if (fx) out[0] = z[m++];
            if (fy) out[1] = z[m++];
            if (fr) out[2] = z[m++] / spread;
            if (fo) out[3] = z[m++];
            return out;
        }
    }
}
