package org.arcwright.inspect;

/** Gaussian elimination with partial pivoting for the tiny dense systems of the fits. */
final class Gauss {
    private Gauss() {}

    /**
     * Solves the augmented system {@code m} ({@code n × (n+1)}), destroying it.
     *
     * @throws IllegalStateException when the matrix is singular
     */
    static double[] solve(double[][] m) {
        int n = m.length;
        for (int col = 0; col < n; col++) {
            int p = col;
            for (int r = col + 1; r < n; r++) if (Math.abs(m[r][col]) > Math.abs(m[p][col])) p = r;
            if (Math.abs(m[p][col]) < 1e-300) throw new IllegalStateException("singular system");
            double[] tmp = m[p]; m[p] = m[col]; m[col] = tmp;
            for (int r = col + 1; r < n; r++) {
                double f = m[r][col] / m[col][col];
                if (f == 0) continue;
                for (int c = col; c <= n; c++) m[r][c] -= f * m[col][c];
            }
        }
        double[] x = new double[n];
        for (int r = n - 1; r >= 0; r--) {
            double s = m[r][n];
            for (int c = r + 1; c < n; c++) s -= m[r][c] * x[c];
            x[r] = s / m[r][r];
        }
        return x;
    }
}
