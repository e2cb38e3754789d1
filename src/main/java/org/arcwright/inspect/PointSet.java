package org.arcwright.inspect;

import java.util.Arrays;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * Measured points of a section, in drawing units, held in two primitive arrays so that a million
 * points take 16 MB. The arrays may be longer than {@link #size()}; only the first {@code size}
 * entries count. Treat the arrays as read-only.
 *
 * @param xs x coordinates
 * @param ys y coordinates
 * @param size number of points
 * @param source where the points came from (a file, or {@code points}), for messages
 */
public record PointSet(double[] xs, double[] ys, int size, String source) {
    public PointSet {
        if (xs.length < size || ys.length < size) throw new IllegalArgumentException("arrays shorter than size");
        for (int i = 0; i < size; i++) {
            if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                throw new InputProblem(source, 0, 0, "points[" + i + "]", "not a finite number: [" + DecimalText.exact(xs[i]) + ", " + DecimalText.exact(ys[i]) + "]");
            }
        }
    }

    /** Points from {@code [[x, y], ...]}. */
    public static PointSet of(double[][] xy) {
        double[] xs = new double[xy.length], ys = new double[xy.length];
        for (int i = 0; i < xy.length; i++) {
            xs[i] = xy[i][0];
            ys[i] = xy[i][1];
        }
        return new PointSet(xs, ys, xy.length, "points");
    }

    /** The points at the given indices, in that order. */
    public PointSet subset(int[] idx, int count) {
        double[] x = new double[count], y = new double[count];
        for (int k = 0; k < count; k++) {
            x[k] = xs[idx[k]];
            y[k] = ys[idx[k]];
        }
        return new PointSet(x, y, count, source);
    }

    /** Copies trimmed to {@link #size()}. */
    public double[] x() { return Arrays.copyOf(xs, size); }

    public double[] y() { return Arrays.copyOf(ys, size); }
}
