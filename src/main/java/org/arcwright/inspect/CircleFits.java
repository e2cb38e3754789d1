package org.arcwright.inspect;

import java.util.Arrays;
import org.arcwright.io.InputProblem;

/**
 * Circle fits to measured points.
 *
 * <ul>
 *   <li>{@link #taubin}: algebraic fit of G. Taubin (IEEE PAMI 13, 1991), computed by Newton's
 *       method on its characteristic polynomial as in N. Chernov, <i>Circular and Linear Regression</i>
 *       (CRC, 2010), §5; one pass of moments about a point of the set, turned into centred moments
 *       algebraically. Nearly unbiased on short arcs, unlike Kåsa's.</li>
 *   <li>{@link #leastSquares}: the geometric fit, minimising {@code Σ(|pᵢ - c| - r)²} by
 *       Levenberg-Marquardt from the Taubin start (W. Gander, G. H. Golub, R. Strebel, BIT 34, 1994),
 *       one pass over the points per step; usually two steps after the start.</li>
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
        Circle c = taubinOnePass(xs, ys, from, to, null);
        return c != null ? c : new Circle(Double.NaN, Double.NaN, Double.POSITIVE_INFINITY);
    }

    /**
     * Taubin's fit from one pass of raw moments about the middle point of the range, turned into
     * moments about the centroid algebraically (no separate pass for the centroid). The conversion
     * subtracts terms of the size of the origin's offset from the centroid, so when that offset
     * exceeds twice the spread of the points, or the points are nearly collinear, the fit is redone
     * in two passes from the centroid, which also decides collinearity exactly as before. Null when
     * the points are collinear or coincide. When {@code offsets} is given, it receives
     * {@code Σ(xᵢ - x0)} and {@code Σ(yᵢ - y0)} about that middle point.
     */
    private static Circle taubinOnePass(double[] xs, double[] ys, int from, int to, double[] offsets) {
        int n = to - from;
        double x0 = xs[from + n / 2], y0 = ys[from + n / 2];
        // two interleaved chains of sums so the additions overlap
        double su0 = 0, su1 = 0, sv0 = 0, sv1 = 0, suu0 = 0, suu1 = 0, svv0 = 0, svv1 = 0, suv0 = 0, suv1 = 0;
        double suz0 = 0, suz1 = 0, svz0 = 0, svz1 = 0, szz0 = 0, szz1 = 0;
        int i = from;
        for (; i + 1 < to; i += 2) {
            double u0 = xs[i] - x0, v0 = ys[i] - y0, u1 = xs[i + 1] - x0, v1 = ys[i + 1] - y0;
            double uu0 = u0 * u0, vv0 = v0 * v0, uu1 = u1 * u1, vv1 = v1 * v1;
            double z0 = uu0 + vv0, z1 = uu1 + vv1;
            su0 += u0; su1 += u1; sv0 += v0; sv1 += v1;
            suu0 += uu0; suu1 += uu1; svv0 += vv0; svv1 += vv1;
            suv0 = Math.fma(u0, v0, suv0); suv1 = Math.fma(u1, v1, suv1);
            suz0 = Math.fma(u0, z0, suz0); suz1 = Math.fma(u1, z1, suz1);
            svz0 = Math.fma(v0, z0, svz0); svz1 = Math.fma(v1, z1, svz1);
            szz0 = Math.fma(z0, z0, szz0); szz1 = Math.fma(z1, z1, szz1);
        }
        if (i < to) {
            double u0 = xs[i] - x0, v0 = ys[i] - y0, uu0 = u0 * u0, vv0 = v0 * v0, z0 = uu0 + vv0;
            su0 += u0; sv0 += v0; suu0 += uu0; svv0 += vv0;
            suv0 = Math.fma(u0, v0, suv0); suz0 = Math.fma(u0, z0, suz0);
            svz0 = Math.fma(v0, z0, svz0); szz0 = Math.fma(z0, z0, szz0);
        }
        // (u, v) = (X + ū, Y + v̄) with (X, Y) about the centroid; expand E[u z] and E[z²] and solve
        if (offsets != null) { offsets[0] = su0 + su1; offsets[1] = sv0 + sv1; }
        double mu = (su0 + su1) / n, mv = (sv0 + sv1) / n, m2 = mu * mu + mv * mv;
        double mxx = (suu0 + suu1) / n - mu * mu, myy = (svv0 + svv1) / n - mv * mv;
        double mxy = (suv0 + suv1) / n - mu * mv, mz = mxx + myy;
        double mxz = (suz0 + suz1) / n - mu * (3 * mxx + myy) - 2 * mv * mxy - mu * m2;
        double myz = (svz0 + svz1) / n - mv * (3 * myy + mxx) - 2 * mu * mxy - mv * m2;
        double mzz = (szz0 + szz1) / n - 4 * (mu * mxz + mv * myz)
                - 4 * (mu * mu * mxx + 2 * mu * mv * mxy + mv * mv * myy) - m2 * (2 * mz + m2);
        double covXY = mxx * myy - mxy * mxy;
        double lmin = mz / 2 - Math.sqrt(Math.max(0, mz * mz / 4 - covXY));
        if (!(m2 <= 4 * mz) || !(lmin > 1e-12 * mz)) {
            double mx = 0, my = 0;
            for (int k = from; k < to; k++) { mx += xs[k]; my += ys[k]; }
            if (offsets != null) {
                double ox = 0, oy = 0;
                for (int k = from; k < to; k++) { ox += xs[k] - x0; oy += ys[k] - y0; }
                offsets[0] = ox; offsets[1] = oy;
            }
            return taubinCentred(xs, ys, from, to, mx / n, my / n);
        }
        return taubinSolve(mxx, myy, mxy, mxz, myz, mzz, x0 + mu, y0 + mv);
    }

    /** Taubin's fit given the centroid, in two passes; null when the points are collinear or coincide. */
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
        return taubinSolve(mxx, myy, mxy, mxz, myz, mzz, mx, my);
    }

    /** Taubin's circle from the moments about the centroid {@code (mx, my)} (Chernov 2010, §5). */
    private static Circle taubinSolve(double mxx, double myy, double mxy, double mxz, double myz, double mzz,
                                      double mx, double my) {
        double mz = mxx + myy;
        double covXY = mxx * myy - mxy * mxy;
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

    /**
     * The geometric least-squares circle (see the class comment).
     *
     * <p>Passes: one over the points for Taubin's start, then one per Levenberg-Marquardt step. Each
     * step's pass is two loops: an element-wise loop writing the unit vector from the centre and the
     * residual of every point into three scratch arrays (allocated once per fit), which HotSpot's C2
     * compiles to SIMD square roots and divisions, then a loop summing {@code JᵀJ}, {@code Σeᵢ} and
     * the cost with fused multiply-adds in three interleaved chains, so that each sum waits on its
     * own last addition only every third point (measured against two chains: docs/benchmarks/inspect.md;
     * sums stop a loop from being vectorised, so they are kept out of the first loop). The other entries of {@code Jᵀe} need no
     * sum of their own: {@code Σuᵢeᵢ = Σ(xᵢ - x0) - n·a - r·Σuᵢ}, the first sum kept from Taubin's
     * pass.
     *
     * <p>Stopping rule: stop when a step is below 1e-15 of the scale ({@code |r|} plus the centre's
     * distance from the middle point of the set), i.e. at rounding. Gauss-Newton converges linearly
     * at about rate = this step / the last one; when that rate is below 0.1 and rate × step (what
     * remains after this step) is below 1e-11 of the scale, a hundredth of the 1e-9 agreement with
     * the reference solver that its tests hold it to, the step is taken without a trial pass and the cost
     * comes from the linear model (exact to second order in the step).
     */
    public static LeastSquaresCircle leastSquares(double[] xs, double[] ys, int n) {
        if (n < 3) throw InputProblem.ofField("points", "a circle needs at least 3 points, got " + n);
        double[] offsets = new double[2];
        Circle start = taubinOnePass(xs, ys, 0, n, offsets);
        if (start == null) {
            requireCircular(xs, ys, n, "points");
            throw InputProblem.ofField("points", "the points are collinear; no circle fits them");
        }
        // work about a point of the set: xᵢ - x0 is exact for nearby points, however far the origin
        double x0 = xs[n / 2], y0 = ys[n / 2];
        double a = start.cx() - x0, b = start.cy() - y0, r = start.r();
        double[] ne = new double[9], trial = new double[9], d = new double[3];
        double[] ux = new double[n], uy = new double[n], res = new double[n];
        double cost = normal(xs, ys, n, x0, y0, a, b, r, offsets[0], offsets[1], ne, ux, uy, res);
        double lambda = 1e-6; // the Taubin start is close: begin nearly Gauss-Newton
        double lastStep = Double.POSITIVE_INFINITY;
        int it = 0;
        for (; it < 200; it++) {
            if (!solve3(ne, lambda, d)) break;
            double stepSize = Math.abs(d[0]) + Math.abs(d[1]) + Math.abs(d[2]);
            double scale = Math.abs(r) + Math.sqrt(a * a + b * b);
            if (stepSize <= 1e-15 * scale) break; // converged to rounding
            double rate = stepSize / lastStep; // see the stopping rule above
            if (lastStep < Double.POSITIVE_INFINITY && rate < 0.1 && rate * stepSize <= 1e-11 * scale) {
                cost = Math.max(0, predictedCost(ne, cost, d));
                a += d[0]; b += d[1]; r += d[2];
                it++;
                break;
            }
            // a step this small changes JᵀJ by about step / r: keep it and sum only what the gradient and cost need
            double tc = stepSize <= 1e-4 * scale
                    ? gradient(xs, ys, n, x0, y0, a + d[0], b + d[1], r + d[2], offsets[0], offsets[1], ne, trial, ux, uy, res)
                    : normal(xs, ys, n, x0, y0, a + d[0], b + d[1], r + d[2], offsets[0], offsets[1], trial, ux, uy, res);
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
        return new LeastSquaresCircle(new Circle(a + x0, b + y0, Math.abs(r)), Math.sqrt(cost / n), it);
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

    /**
     * Sum of squared residuals; fills JᵀJ (upper: 0..5) and Jᵀe (6..8), given {@code sx}, {@code sy},
     * the sums of {@code xᵢ - x0} and {@code yᵢ - y0}. Row i of J is
     * {@code (-uᵢ, -vᵢ, -1)} with {@code (uᵢ, vᵢ)} the unit vector from the centre to point i
     * (zero for a point at the centre), so the b-b entry {@code Σvᵢ² = n - Σuᵢ²} and r-r is n.
     * {@code ux}, {@code uy}, {@code res} are scratch of at least {@code n} entries, written first in
     * an element-wise loop (SIMD), then summed. Their index must be the points' index: C2 in JDK 17
     * does not vectorise a loop that reads {@code xs[from + k]} and writes {@code ux[k]}.
     */
    private static double normal(double[] xs, double[] ys, int n, double x0, double y0, double a, double b, double r,
                                 double sx, double sy, double[] ne, double[] ux, double[] uy, double[] res) {
        directions(xs, ys, n, x0, y0, a, b, r, ux, uy, res);
        double su0 = 0, su1 = 0, su2 = 0, sv0 = 0, sv1 = 0, sv2 = 0, suu0 = 0, suu1 = 0, suu2 = 0;
        double suv0 = 0, suv1 = 0, suv2 = 0, se0 = 0, se1 = 0, se2 = 0, see0 = 0, see1 = 0, see2 = 0;
        int k = 0;
        for (; k + 2 < n; k += 3) {
            double u0 = ux[k], v0 = uy[k], e0 = res[k];
            double u1 = ux[k + 1], v1 = uy[k + 1], e1 = res[k + 1];
            double u2 = ux[k + 2], v2 = uy[k + 2], e2 = res[k + 2];
            su0 += u0; su1 += u1; su2 += u2;
            sv0 += v0; sv1 += v1; sv2 += v2;
            suu0 = Math.fma(u0, u0, suu0); suu1 = Math.fma(u1, u1, suu1); suu2 = Math.fma(u2, u2, suu2);
            suv0 = Math.fma(u0, v0, suv0); suv1 = Math.fma(u1, v1, suv1); suv2 = Math.fma(u2, v2, suv2);
            se0 += e0; se1 += e1; se2 += e2;
            see0 = Math.fma(e0, e0, see0); see1 = Math.fma(e1, e1, see1); see2 = Math.fma(e2, e2, see2);
        }
        for (; k < n; k++) {
            double u0 = ux[k], v0 = uy[k], e0 = res[k];
            su0 += u0; sv0 += v0;
            suu0 = Math.fma(u0, u0, suu0); suv0 = Math.fma(u0, v0, suv0);
            se0 += e0; see0 = Math.fma(e0, e0, see0);
        }
        suu0 += suu2; su0 += su2; sv0 += sv2; suv0 += suv2; se0 += se2; see0 += see2;
        double suu = suu0 + suu1, su = su0 + su1, sv = sv0 + sv1;
        ne[0] = suu; ne[1] = suv0 + suv1; ne[2] = su; ne[3] = n - suu; ne[4] = sv; ne[5] = n;
        // Σuᵢeᵢ = Σuᵢ(distᵢ - r) = Σdxᵢ - rΣuᵢ, and Σdxᵢ = Σ(xᵢ - x0) - n·a needs no pass
        ne[6] = -((sx - n * a) - r * su); ne[7] = -((sy - n * b) - r * sv); ne[8] = -(se0 + se1);
        return see0 + see1;
    }

    /**
     * As {@link #normal}, but keeps {@code JᵀJ} from {@code last} (copied into {@code ne}) and sums
     * only {@code Σuᵢ}, {@code Σvᵢ}, {@code Σeᵢ} and the cost: for a step small against the radius,
     * where {@code JᵀJ} moves by about step / r, so that the next step is off by that fraction of
     * itself (the gradient, which decides where the fit ends, stays exact).
     */
    private static double gradient(double[] xs, double[] ys, int n, double x0, double y0, double a, double b, double r,
                                   double sx, double sy, double[] last, double[] ne, double[] ux, double[] uy, double[] res) {
        directions(xs, ys, n, x0, y0, a, b, r, ux, uy, res);
        double su0 = 0, su1 = 0, su2 = 0, sv0 = 0, sv1 = 0, sv2 = 0;
        double se0 = 0, se1 = 0, se2 = 0, see0 = 0, see1 = 0, see2 = 0;
        int k = 0;
        for (; k + 2 < n; k += 3) {
            double e0 = res[k], e1 = res[k + 1], e2 = res[k + 2];
            su0 += ux[k]; su1 += ux[k + 1]; su2 += ux[k + 2];
            sv0 += uy[k]; sv1 += uy[k + 1]; sv2 += uy[k + 2];
            se0 += e0; se1 += e1; se2 += e2;
            see0 = Math.fma(e0, e0, see0); see1 = Math.fma(e1, e1, see1); see2 = Math.fma(e2, e2, see2);
        }
        for (; k < n; k++) {
            double e0 = res[k];
            su0 += ux[k]; sv0 += uy[k]; se0 += e0; see0 = Math.fma(e0, e0, see0);
        }
        double su = su0 + su1 + su2, sv = sv0 + sv1 + sv2;
        System.arraycopy(last, 0, ne, 0, 6);
        ne[6] = -((sx - n * a) - r * su); ne[7] = -((sy - n * b) - r * sv); ne[8] = -(se0 + se1 + se2);
        return see0 + see1 + see2;
    }

    /**
     * The element-wise half of a pass: unit vector from the centre {@code (x0 + a, y0 + b)} to each
     * point (zero for a point at the centre) and its residual. {@code xᵢ - x0} first, exact for
     * points near {@code x0} however far the origin. No sums here, so C2 compiles it to SIMD square
     * roots and divisions.
     */
    private static void directions(double[] xs, double[] ys, int n, double x0, double y0, double a, double b, double r,
                                   double[] ux, double[] uy, double[] res) {
        for (int k = 0; k < n; k++) {
            double dx = xs[k] - x0 - a, dy = ys[k] - y0 - b;
            double dist = Math.sqrt(dx * dx + dy * dy);
            double inv = 1 / Math.max(dist, Double.MIN_NORMAL);
            ux[k] = dx * inv;
            uy[k] = dy * inv;
            res[k] = dist - r;
        }
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
        return Arrays.stream(v).distinct().toArray();
    }

    /** Keeps the point constraints of a working set, dropping the box. */
    private static int[] pointConstraints(int[] working, int n) {
        return Arrays.stream(working).filter(j -> j < 2 * n).toArray();
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
        Arrays.fill(far, -1);
        Arrays.fill(near, -1);
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
        return Arrays.copyOf(out, k);
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
            Arrays.fill(row, 0);
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
