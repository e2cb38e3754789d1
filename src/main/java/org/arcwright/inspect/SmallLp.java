package org.arcwright.inspect;

/**
 * A dense simplex solver for the small linear programmes of Chebyshev (minimax) fitting:
 * minimise {@code c·z} subject to {@code A z <= b}, with a handful of free variables {@code z}
 * (at most about six) and up to a few thousand constraints.
 *
 * <p>It solves the dual, {@code min b·λ} subject to {@code Aᵀλ = -c}, {@code λ >= 0}, by the
 * two-phase tableau simplex (Dantzig's rule, Bland's rule after a run of degenerate pivots to rule
 * out cycling; Chvátal, <i>Linear Programming</i>, 1983, ch. 2-3). The dual has only as many rows as
 * the primal has variables, so each pivot costs a few operations per constraint. The primal
 * optimum is recovered exactly by solving the basic constraints {@code a_j·z = b_j} as equalities.
 */
final class SmallLp {
    /** Outcome of a solve. {@code z} is null when the constraints cannot all hold. */
    record Solution(double[] z, int[] basis) {}

    private SmallLp() {}

    /**
     * @param n number of variables
     * @param m number of constraints
     * @param a constraint rows, row-major {@code m × n}
     * @param b right-hand sides
     * @param c objective
     * @return the optimum; {@code z == null} when infeasible
     * @throws IllegalStateException when the objective is unbounded below
     */
    static Solution solve(int n, int m, double[] a, double[] b, double[] c) {
        int cols = m + n;
        double[][] t = new double[n][cols + 1];
        double[] flip = new double[n];
        double scaleB = 0;
        for (int j = 0; j < m; j++) scaleB = Math.max(scaleB, Math.abs(b[j]));
        double scaleC = 0;
        for (int k = 0; k < n; k++) scaleC = Math.max(scaleC, Math.abs(c[k]));
        for (int k = 0; k < n; k++) {
            double g = -c[k];
            flip[k] = g < 0 ? -1 : 1;
            for (int j = 0; j < m; j++) t[k][j] = flip[k] * a[j * n + k];
            t[k][m + k] = 1;
            t[k][cols] = flip[k] * g;
        }
        int[] basis = new int[n];
        for (int k = 0; k < n; k++) basis[k] = m + k;
        double eps = 1e-11;
        // Phase 1: minimise the sum of the artificials.
        double[] cost = new double[cols];
        for (int k = 0; k < n; k++) cost[m + k] = 1;
        int status = iterate(t, basis, cost, cols, cols, eps * Math.max(1, scaleC));
        double infeas = 0;
        for (int k = 0; k < n; k++) if (basis[k] >= m) infeas += t[k][cols];
        if (infeas > 1e-9 * Math.max(1, scaleC) || status != 0) {
            throw new IllegalStateException("the minimax problem is unbounded (too few or degenerate points)");
        }
        // Drive artificials at zero level out of the basis where possible.
        for (int k = 0; k < n; k++) {
            if (basis[k] < m) continue;
            int best = -1;
            double bv = 1e-9;
            for (int j = 0; j < m; j++) if (Math.abs(t[k][j]) > bv) { bv = Math.abs(t[k][j]); best = j; }
            if (best >= 0) pivot(t, basis, k, best, cols);
        }
        // Phase 2: the real costs; artificials may not re-enter.
        double[] cost2 = new double[cols];
        System.arraycopy(b, 0, cost2, 0, m);
        status = iterate(t, basis, cost2, m, cols, eps * Math.max(1, scaleB));
        if (status == 1) return new Solution(null, basis.clone());
        return new Solution(primal(n, m, a, b, basis), basis.clone());
    }

    /** Simplex iterations on columns {@code [0, enterLimit)}; 0 optimal, 1 unbounded. */
    private static int iterate(double[][] t, int[] basis, double[] cost, int enterLimit, int cols, double eps) {
        int n = t.length;
        boolean[] basic = new boolean[cols];
        for (int v : basis) basic[v] = true;
        double[] cb = new double[n];
        int degenerate = 0;
        for (int iter = 0; iter < 50_000; iter++) {
            for (int k = 0; k < n; k++) cb[k] = cost[basis[k]];
            // the entering column: the most negative reduced cost (Dantzig), or the first negative one (Bland)
            int enter = -1;
            boolean bland = degenerate > 30;
            double most = -eps;
            for (int j = 0; j < enterLimit; j++) {
                if (basic[j]) continue;
                double r = cost[j];
                for (int k = 0; k < n; k++) r -= cb[k] * t[k][j];
                if (r < most) {
                    enter = j;
                    if (bland) break;
                    most = r;
                }
            }
            if (enter < 0) return 0;
            int leave = -1;
            double ratio = Double.POSITIVE_INFINITY;
            for (int k = 0; k < n; k++) {
                double v = t[k][enter];
                if (v > 1e-12) {
                    double q = t[k][cols] / v;
                    if (q < ratio - 1e-15 || (q <= ratio + 1e-15 && leave >= 0 && basis[k] < basis[leave])) {
                        ratio = q;
                        leave = k;
                    }
                }
            }
            if (leave < 0) return 1;
            degenerate = ratio <= 1e-15 ? degenerate + 1 : 0;
            basic[basis[leave]] = false;
            basic[enter] = true;
            pivot(t, basis, leave, enter, cols);
        }
        throw new IllegalStateException("simplex did not converge");
    }

    private static void pivot(double[][] t, int[] basis, int row, int col, int cols) {
        double[] pr = t[row];
        double p = pr[col];
        for (int j = 0; j <= cols; j++) pr[j] /= p;
        for (int k = 0; k < t.length; k++) {
            if (k == row) continue;
            double f = t[k][col];
            if (f == 0) continue;
            double[] rk = t[k];
            for (int j = 0; j <= cols; j++) rk[j] -= f * pr[j];
        }
        basis[row] = col;
    }

    /** Solves the basic constraints as equalities (artificial columns pin their variable to 0). */
    private static double[] primal(int n, int m, double[] a, double[] b, int[] basis) {
        double[][] mat = new double[n][n + 1];
        for (int k = 0; k < n; k++) {
            int j = basis[k];
            if (j < m) {
                for (int i = 0; i < n; i++) mat[k][i] = a[j * n + i];
                mat[k][n] = b[j];
            } else {
                mat[k][j - m] = 1;
            }
        }
        return Gauss.solve(mat);
    }
}
