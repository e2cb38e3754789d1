package org.arcwright.bench;

import java.util.Random;
import org.arcwright.inspect.PointSet;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;

/**
 * Synthetic measured sections for benchmarks (invented data, fixed seed): a 90° round of nominal
 * radius 2 mm, a tenth of the points on each leg and the rest on a blend of radius 2.03 with a
 * three-lobed 0.004 mm form error and 0.001 mm noise, in order along the contour.
 */
public final class SectionData {
    public static final Corner CORNER = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.ROUND);
    public static final double NOMINAL = 2.0;

    private SectionData() {}

    /** Writes point {@code i} of {@code n} into {@code xy}. */
    static void point(int i, int n, Random rnd, double[] xy) {
        int leg = n / 10;
        double r = 2.03, noise = 0.001 * rnd.nextGaussian();
        if (i < leg) {
            xy[0] = 6 - (6 - r) * i / leg;
            xy[1] = noise;
        } else if (i >= n - leg) {
            xy[0] = noise;
            xy[1] = r + (6 - r) * (i - (n - leg) + 1) / leg;
        } else {
            double f = (i - leg + 0.5) / (n - 2 * leg);
            double t = -Math.PI / 2 - Math.PI / 2 * f;
            double rr = r + 0.004 * Math.sin(3 * Math.PI * f) + noise;
            xy[0] = r + rr * Math.cos(t);
            xy[1] = r + rr * Math.sin(t);
        }
    }

    /** {@code n} points in memory. */
    public static PointSet section(int n, long seed) {
        Random rnd = new Random(seed);
        double[] xs = new double[n], ys = new double[n], xy = new double[2];
        for (int i = 0; i < n; i++) {
            point(i, n, rnd, xy);
            xs[i] = xy[0];
            ys[i] = xy[1];
        }
        return new PointSet(xs, ys, n, "bench");
    }

    /** Only the blend points (for circle fits). */
    public static PointSet blend(int n, long seed) {
        PointSet all = section(n, seed);
        int leg = n / 10, m = n - 2 * leg;
        int[] idx = new int[m];
        for (int k = 0; k < m; k++) idx[k] = leg + k;
        return all.subset(idx, m);
    }
}
