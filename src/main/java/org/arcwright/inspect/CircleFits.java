package org.arcwright.inspect;

import org.arcwright.io.InputProblem;

/**
 * Circle fits to measured points.
 *
 * <ul>
 *   <li>{@link #taubin}: algebraic fit of G. Taubin (IEEE PAMI 13, 1991), computed by Newton's
 *       method on its characteristic polynomial as in N. Chernov, <i>Circular and Linear Regression</i>
 *       (CRC, 2010), §5; one pass over centred moments. Nearly unbiased on short arcs, unlike Kåsa's.</li>
 *   <li>{@link #leastSquares}: the geometric fit, minimising {@code Σ(|pᵢ - c| - r)²} by
 *       Levenberg-Marquardt from the Taubin start (W. Gander, G. H. Golub, R. Strebel, BIT 34, 1994).</li>
 *   <li>{@link #minimumZone}: the minimum-zone circle, by successive linear programmes: linearise the
 *       distances about the current centre, solve {@code min (R - r)} subject to
 *       {@code r <= dᵢ - uᵢ·δ <= R} with an active set ({@link ActiveSetLp}), move, repeat. The
 *       linearisation is exact to first order, so the passes converge quadratically once the set of
 *       extreme points settles (Chebyshev's alternation; see ADR 0301).</li>
 * </ul>
 *
 * <p>All methods read the first {@code n} entries of {@code xs} and {@code ys}.
 */
public final class CircleFits {
    private CircleFits() {}

    /**
     * Rejects point sets no circle can be fitted to: fewer than three distinct points, or all on a line.
     *
     * @throws InputProblem naming {@code field}
     */
    public static void requireCircular(double[] xs, double[] ys, int n, String field) {
        if (n < 3) throw InputProblem.ofField(field, "a circle needs at least 3 points, got " + n);
        int second = -1;
        for (int i = 1; i < n && second < 0; i++) if (xs[i] != xs[0] || ys[i] != ys[0]) second = i;
        if (second < 0) throw InputProblem.ofField(field, "all " + n + " points are the same point (duplicates); a circle needs 3 distinct points");
        double mx = 0, my = 0;
        for (int i = 0; i < n; i++) { mx += xs[i]; my += ys[i]; }
        mx /= n; my /= n;
        double sxx = 0, syy = 0, sxy = 0;
        for (int i = 0; i < n; i++) {
            double dx = xs[i] - mx, dy = ys[i] - my;
            sxx += dx * dx; syy += dy * dy; sxy += dx * dy;
        }
        double tr = sxx + syy, det = sxx * syy - sxy * sxy;
        double lmin = tr / 2 - Math.sqrt(Math.max(0, tr * tr / 4 - det));
        if (lmin <= 1e-24 * tr) {
            boolean dup = true;
            for (int i = 0; i < n && dup; i++) {
                if ((xs[i] != xs[0] || ys[i] != ys[0]) && (xs[i] != xs[second] || ys[i] != ys[second])) dup = false;
            }
            throw InputProblem.ofField(field, dup ? "only 2 distinct points (the rest are duplicates); a circle needs 3"
                    : "the points are collinear; no circle fits them");
        }
    }

    /** Taubin's algebraic circle (see the class comment). */
    public static Circle taubin(double[] xs, double[] ys, int n) {
        return taubin(xs, ys, 0, n);
    }

    /** Taubin's fit to the points {@code from..to-1}. */
    public static Circle taubin(double[] xs, double[] ys, int from, int to) {
        int n = to - from;
        double mx = 0, my = 0;
        for (int i = from; i < to; i++) { mx += xs[i]; my += ys[i]; }
        mx /= n; my /= n;
        Circle c = taubinCentred(xs, ys, from, to, mx, my);
        return c != null ? c : new Circle(Double.NaN, Double.NaN, Double.POSITIVE_INFINITY);
    }

    /** Taubin's fit given the centroid; null when the points are collinear or coincide. */
    private static Circle taubinCentred(double[] xs, double[] ys, int from, int to, double mx, double my) {
        int n = to - from;
        double mxx = 0, myy = 0, mxy = 0, mxz = 0, myz = 0, mzz = 0;
        for (int i = from; i < to; i++) {
            double xi = xs[i] - mx, yi = ys[i] - my;
            double zi = xi * xi + yi * yi;
            mxy += xi * yi; mxx += xi * xi; myy += yi * yi;
            mxz += xi * zi; myz += yi * zi; mzz += zi * zi;
        }
        mxx /= n; myy /= n; mxy /= n; mxz /= n; myz /= n; mzz /= n;
        double mz = mxx + myy;
        double covXY = mxx * myy - mxy * mxy;
        // collinear (or all one point): the smaller eigenvalue of the scatter vanishes
        double lmin = mz / 2 - Math.sqrt(Math.max(0, mz * mz / 4 - covXY));
        if (!(lmin > 1e-24 * mz)) return null;
        double varZ = mzz - mz * mz;
        double a3 = 4 * mz;
        double a2 = -3 * mz * mz - mzz;
        double a1 = varZ * mz + 4 * covXY * mz - mxz * mxz - myz * myz;
        double a0 = mxz * (mxz * myy - myz * mxy) + myz * (myz * mxx - mxz * mxy) - varZ * covXY;
        double a22 = a2 + a2, a33 = a3 + a3 + a3;
        double x = 0, y = a0;
        for (int iter = 0; iter < 99; iter++) {
            double dy = a1 + x * (a22 + a33 * x);
            double xnew = x - y / dy;
            if (xnew == x || !Double.isFinite(xnew)) break;
            double ynew = a0 + xnew * (a1 + xnew * (a2 + xnew * a3));
            if (Math.abs(ynew) >= Math.abs(y)) break;
            x = xnew;
            y = ynew;
        }
        double det = x * x - x * mz + covXY;
        double xc = (mxz * (myy - x) - myz * mxy) / det / 2;
        double yc = (myz * (mxx - x) - mxz * mxy) / det / 2;
        return new Circle(xc + mx, yc + my, Math.sqrt(xc * xc + yc * yc + mz));
    }

    /** The geometric least-squares circle (see the class comment). */
    public static LeastSquaresCircle leastSquares(double[] xs, double[] ys, int n) {
        if (n < 3) throw InputProblem.ofField("points", "a circle needs at least 3 points, got " + n);
        double mx = 0, my = 0;
        for (int i = 0; i < n; i++) { mx += xs[i]; my += ys[i]; }
        mx /= n; my /= n;
        Circle start = taubinCentred(xs, ys, 0, n, mx, my);
        if (start == null) {
            requireCircular(xs, ys, n, "points");
            throw InputProblem.ofField("points", "the points are collinear; no circle fits them");
        }
        double a = start.cx() - mx, b = start.cy() - my, r = start.r();
        double[] ne = new double[9], trial = new double[9], d = new double[3];
        double cost = normal(xs, ys, n, mx, my, a, b, r, ne);
        double lambda = 1e-6; // the Taubin start is close: begin nearly Gauss-Newton
        double lastStep = Double.POSITIVE_INFINITY;
        int it = 0;
        for (; it < 200; it++) {
            if (!solve3(ne, lambda, d)) break;
            double stepSize = Math.abs(d[0]) + Math.abs(d[1]) + Math.abs(d[2]);
            double scale = Math.abs(r) + Math.sqrt(a * a + b * b);
            if (stepSize <= 1e-15 * scale) break; // converged to rounding
            // Gauss-Newton converges linearly at about rate = this step / the last one; when what
            // remains after this step (rate × step) is below 1e-11 of the scale, a hundredth of the
            // 1e-9 agreement issue 3 asks for, take the step untested: checking it costs a pass
            double rate = stepSize / lastStep;
            if (lastStep < Double.POSITIVE_INFINITY && rate < 0.1 && rate * stepSize <= 1e-11 * scale) {
                cost = Math.max(0, predictedCost(ne, cost, d));
                a += d[0]; b += d[1]; r += d[2];
                it++;
                break;
            }
            double tc = normal(xs, ys, n, mx, my, a + d[0], b + d[1], r + d[2], trial);
            // accept within the rounding of the sum (near the optimum the cost is flat to 1e-15)
            if (tc <= cost * (1 + 1e-15)) {
                a += d[0]; b += d[1]; r += d[2];
                cost = tc;
                double[] t = ne; ne = trial; trial = t;
                lambda = Math.max(lambda / 10, 1e-12);
                lastStep = stepSize;
            } else {
                lambda *= 10;
                if (lambda > 1e12) break;
            }
        }
        return new LeastSquaresCircle(new Circle(a + mx, b + my, Math.abs(r)), Math.sqrt(cost / n), it);
    }

    /**
     * The Levenberg-Marquardt step: solves {@code (JᵀJ + λ·diag(JᵀJ)) d = -Jᵀe} for the symmetric
     * 3×3 system held in {@code ne} by Cholesky factorisation in closed form; false when the
     * matrix is not positive definite (the points are degenerate).
     */
    private static boolean solve3(double[] ne, double lambda, double[] d) {
        double a00 = ne[0] * (1 + lambda), a01 = ne[1], a02 = ne[2];
        double a11 = ne[3] * (1 + lambda), a12 = ne[4], a22 = ne[5] * (1 + lambda);
        if (!(a00 > 0)) return false;
        double l00 = Math.sqrt(a00);
        double l10 = a01 / l00, l20 = a02 / l00;
        double q11 = a11 - l10 * l10;
        if (!(q11 > 0)) return false;
        double l11 = Math.sqrt(q11);
        double l21 = (a12 - l20 * l10) / l11;
        double q22 = a22 - l20 * l20 - l21 * l21;
        if (!(q22 > 0)) return false;
        double l22 = Math.sqrt(q22);
        // forward: L y = -g; back: Lᵀ d = y
        double y0 = -ne[6] / l00;
        double y1 = (-ne[7] - l10 * y0) / l11;
        double y2 = (-ne[8] - l20 * y0 - l21 * y1) / l22;
        d[2] = y2 / l22;
        d[1] = (y1 - l21 * d[2]) / l11;
        d[0] = (y0 - l10 * d[1] - l20 * d[2]) / l00;
        return Double.isFinite(d[0]) && Double.isFinite(d[1]) && Double.isFinite(d[2]);
    }

    /**
     * The linear model's cost after step {@code d}: {@code Σ(eᵢ + Jᵢd)² = cost + 2dᵀJᵀe + dᵀJᵀJd};
     * exact to second order in the step.
     */
    private static double predictedCost(double[] ne, double cost, double[] d) {
        double d0 = d[0], d1 = d[1], d2 = d[2];
        double quad = ne[0] * d0 * d0 + ne[3] * d1 * d1 + ne[5] * d2 * d2
                + 2 * (ne[1] * d0 * d1 + ne[2] * d0 * d2 + ne[4] * d1 * d2);
        return cost + 2 * (ne[6] * d0 + ne[7] * d1 + ne[8] * d2) + quad;
    }

    /** Sum of squared residuals; fills JᵀJ (upper: 0..5) and Jᵀe (6..8). */
    private static double normal(double[] xs, double[] ys, int n, double mx, double my, double a, double b, double r,
                                 double[] ne) {
        double s00 = 0, s01 = 0, s02 = 0, s11 = 0, s12 = 0, g0 = 0, g1 = 0, g2 = 0, cost = 0;
        for (int i = 0; i < n; i++) {
            double dx = xs[i] - mx - a, dy = ys[i] - my - b;
            double d = Math.sqrt(dx * dx + dy * dy);
            double e = d - r;
            double inv = d > 0 ? -1 / d : 0;
            double j0 = dx * inv, j1 = dy * inv;
            s00 += j0 * j0; s01 += j0 * j1; s02 -= j0; s11 += j1 * j1; s12 -= j1;
            g0 += j0 * e; g1 += j1 * e; g2 -= e;
            cost += e * e;
        }
        ne[0] = s00; ne[1] = s01; ne[2] = s02; ne[3] = s11; ne[4] = s12; ne[5] = n;
        ne[6] = g0; ne[7] = g1; ne[8] = g2;
        return cost;
    }

    /** Above this many points, the minimum zone first converges on an evenly thinned subset. */
    private static final int COARSE_LIMIT = 20_000;

    /** The minimum-zone circle, started from the least-squares centre. */
    public static MinimumZoneCircle minimumZone(double[] xs, double[] ys, int n) {
        requireCircular(xs, ys, n, "points");
        return minimumZone(xs, ys, n, leastSquares(xs, ys, n).circle());
    }

    /** The minimum-zone circle, started from {@code start}. */
    public static MinimumZoneCircle minimumZone(double[] xs, double[] ys, int n, Circle start) {
        requireCircular(xs, ys, n, "points");
        if (n > COARSE_LIMIT) {
            // converge on every k-th point first; the full set then needs a pass or two
            int k = n / COARSE_LIMIT + 1, m = (n + k - 1) / k;
            double[] sx = new double[m], sy = new double[m];
            for (int i = 0, j = 0; i < n; i += k, j++) { sx[j] = xs[i]; sy[j] = ys[i]; }
            MinimumZoneCircle coarse = minimumZone(sx, sy, m, start);
            start = new Circle(coarse.cx(), coarse.cy(), (coarse.inner() + coarse.outer()) / 2);
        }
        double cx = start.cx(), cy = start.cy();
        double scale = Math.max(start.r(), 1e-300);
        double[] d = new double[n], ux = new double[n], uy = new double[n];
        double trust = n > COARSE_LIMIT ? scale / 1000 : scale;
        double width = distances(xs, ys, n, cx, cy, d, ux, uy);
        int[] working = initialSectors(xs, ys, n, cx, cy, d);
        int pass = 0;
        double[] nd = null, nux = null, nuy = null;
        while (pass < 100) {
            pass++;
            ZoneLp lp = new ZoneLp(n, d, ux, uy, trust);
            int[] init = new int[working.length + 4];
            for (int k = 0; k < 4; k++) init[k] = 2 * n + k;
            System.arraycopy(working, 0, init, 4, working.length);
            ActiveSetLp.Result res = ActiveSetLp.solve(lp, dedupe(init), 1e-14 * scale);
            double dx = res.z()[0], dy = res.z()[1];
            if (nd == null) { nd = new double[n]; nux = new double[n]; nuy = new double[n]; }
            double nw = distances(xs, ys, n, cx + dx, cy + dy, nd, nux, nuy);
            working = pointConstraints(res.working(), n);
            double step = Math.hypot(dx, dy);
            if (nw <= width || step <= 1e-14 * scale) {
                cx += dx; cy += dy;
                boolean done = step <= 1e-7 * scale || width - nw <= 1e-15 * scale;
                width = Math.min(width, nw);
                // swap buffers: the old distances become scratch for the next trial
                double[] t1 = d, t2 = ux, t3 = uy;
                d = nd; ux = nux; uy = nuy;
                nd = t1; nux = t2; nuy = t3;
                if (done) break;
                trust = Math.max(trust, 4 * step);
            } else {
                trust = step / 4;
            }
        }
        double lo = Double.POSITIVE_INFINITY, hi = 0;
        for (int i = 0; i < n; i++) {
            double r = Math.hypot(xs[i] - cx, ys[i] - cy);
            lo = Math.min(lo, r);
            hi = Math.max(hi, r);
        }
        return new MinimumZoneCircle(cx, cy, lo, hi, pass);
    }

    private static int[] dedupe(int[] v) {
        return java.util.Arrays.stream(v).distinct().toArray();
    }

    /** Keeps the point constraints of a working set, dropping the box. */
    private static int[] pointConstraints(int[] working, int n) {
        return java.util.Arrays.stream(working).filter(j -> j < 2 * n).toArray();
    }

    private static double distances(double[] xs, double[] ys, int n, double cx, double cy, double[] d, double[] ux,
                                     double[] uy) {
        double lo = Double.POSITIVE_INFINITY, hi = 0;
        for (int i = 0; i < n; i++) {
            double dx = xs[i] - cx, dy = ys[i] - cy;
            double r = Math.sqrt(dx * dx + dy * dy);
            d[i] = r;
            ux[i] = r > 0 ? dx / r : 0;
            uy[i] = r > 0 ? dy / r : 0;
            if (r < lo) lo = r;
            if (r > hi) hi = r;
        }
        return hi - lo;
    }

    /** The nearest and farthest point in each of 16 angular sectors about the centre. */
    private static int[] initialSectors(double[] xs, double[] ys, int n, double cx, double cy, double[] d) {
        int sectors = 16;
        int[] far = new int[sectors], near = new int[sectors];
        java.util.Arrays.fill(far, -1);
        java.util.Arrays.fill(near, -1);
        for (int i = 0; i < n; i++) {
            // pseudo-angle in [0, 4), monotonic in the true angle, without trigonometry
            double dx = xs[i] - cx, dy = ys[i] - cy;
            double sum = Math.abs(dx) + Math.abs(dy);
            double t = sum == 0 ? 0 : dy / sum;
            double ang = dx >= 0 ? (dy >= 0 ? t : 4 + t) : 2 - t;
            int s = (int) (ang / 4 * sectors);
            if (s >= sectors) s = sectors - 1;
            if (far[s] < 0 || d[i] > d[far[s]]) far[s] = i;
            if (near[s] < 0 || d[i] < d[near[s]]) near[s] = i;
        }
        int[] out = new int[2 * sectors];
        int k = 0;
        for (int s = 0; s < sectors; s++) {
            if (far[s] >= 0) out[k++] = far[s];
            if (near[s] >= 0) out[k++] = n + near[s];
        }
        return java.util.Arrays.copyOf(out, k);
    }

    /**
     * The linearised minimum-zone problem: variables (δx, δy, r, R), minimise R - r, subject to
     * {@code dᵢ - uᵢ·δ <= R} (constraints 0..n-1), {@code r <= dᵢ - uᵢ·δ} (n..2n-1), and a box
     * {@code |δ| <= trust} (2n..2n+3).
     */
    private static final class ZoneLp implements ActiveSetLp.Problem {
        private final int n;
        private final double[] d, ux, uy;
        private final double trust;
        private static final double[] OBJECTIVE = {0, 0, -1, 1};

        ZoneLp(int n, double[] d, double[] ux, double[] uy, double trust) {
            this.n = n; this.d = d; this.ux = ux; this.uy = uy; this.trust = trust;
        }

        @Override public int variables() { return 4; }
        @Override public int constraints() { return 2 * n + 4; }
        @Override public double[] objective() { return OBJECTIVE; }

        @Override
        public double row(int j, double[] row) {
            java.util.Arrays.fill(row, 0);
            if (j < n) {
                row[0] = -ux[j]; row[1] = -uy[j]; row[3] = -1;
                return -d[j];
            }
            if (j < 2 * n) {
                int i = j - n;
                row[0] = ux[i]; row[1] = uy[i]; row[2] = 1;
                return d[i];
            }
            int k = j - 2 * n;
            row[k / 2] = (k % 2 == 0) ? 1 : -1;
            return trust;
        }

        @Override
        public double violation(int j, double[] z) {
            if (j < n) return -ux[j] * z[0] - uy[j] * z[1] - z[3] + d[j];
            if (j < 2 * n) {
                int i = j - n;
                return ux[i] * z[0] + uy[i] * z[1] + z[2] - d[i];
            }
            int k = j - 2 * n;
            return ((k % 2 == 0) ? z[k / 2] : -z[k / 2]) - trust;
        }
    }
}
