package org.arcwright.inspect;

import org.arcwright.io.InputProblem;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;

/**
 * The measured points of the blend itself, separated from those of the adjacent surfaces, in order
 * along the contour.
 *
 * <p>A radius gauge or a circle fit must not see the flats: a window straddling a tangent point
 * mixes a line with an arc and reports a radius that is neither. The separation is iterative
 * (common practice): start from the points more than {@value #START_FRACTION} of the nominal radius
 * inside both legs, fit a circle (Taubin), take as the blend the points between the feet of the
 * perpendiculars from its centre to the legs (its tangent points), and repeat until the set settles.
 *
 * @param points the blend points, ordered by station
 * @param stations station of each blend point along the nominal contour
 * @param indices index of each blend point in the full point set
 * @param circle the Taubin circle of the final blend
 */
public record Blend(PointSet points, double[] stations, int[] indices, Circle circle) {
    /** Fraction of the nominal radius a point must lie inside both legs to seed the first fit. */
    public static final double START_FRACTION = 0.02;

    /**
     * Separates the blend.
     *
     * @param stations station of every point along the nominal contour
     * @param reach distance from the vertex along each leg beyond which points are ignored
     * @throws InputProblem when fewer than three points lie on the blend
     */
    public static Blend of(Corner corner, double nominalRadius, PointSet all, double[] stations, double reach) {
        return of(corner, nominalRadius, all, (idx, count) -> {
            double[] st = new double[count];
            for (int k = 0; k < count; k++) st[k] = stations[idx[k]];
            return st;
        }, reach);
    }

    /** The stations of some of a section's points, asked for once the blend's points are known. */
    @FunctionalInterface
    public interface Stations {
        /** The station of each of the points {@code indices[0..count-1]}, in that order. */
        double[] of(int[] indices, int count);
    }

    /**
     * As {@link #of(Corner, double, PointSet, double[], double)}, with the stations worked out for the
     * blend's points only: a verdict needs no station of a point on the legs.
     */
    public static Blend of(Corner corner, double nominalRadius, PointSet all, Stations stations, double reach) {
        int n = all.size();
        double[] xs = all.xs(), ys = all.ys();
        Point2 v = corner.vertex(), a = corner.legA(), b = corner.legB();
        Point2 na = corner.inwardNormalA(), nb = corner.inwardNormalB();
        boolean[] in = new boolean[n];
        int count = seed(xs, ys, n, v, a, b, na, nb, START_FRACTION * nominalRadius, reach, in);
        // the blend's points gathered in order, reused from round to round
        double[] bx = new double[n], by = new double[n];
        Circle c = null;
        for (int round = 0; round < 6; round++) {
            if (count < 3) {
                throw InputProblem.ofField("points", "only " + count + " point(s) lie on the blend between the legs; need at least 3");
            }
            gather(xs, ys, n, in, bx, by);
            CircleFits.requireCircular(bx, by, count, "points (blend)");
            c = CircleFits.taubin(bx, by, count);
            double lim = (c.cx() - v.x()) * a.x() + (c.cy() - v.y()) * a.y();
            double limB = (c.cx() - v.x()) * b.x() + (c.cy() - v.y()) * b.y();
            int next = between(xs, ys, n, v, a, b, lim, limB, reach, in);
            boolean changed = next < 0;
            count = changed ? -next - 1 : next;
            if (!changed) break;
        }
        if (count < 3) throw InputProblem.ofField("points", "only " + count + " point(s) lie on the blend; need at least 3");
        int[] idx = indexes(in, count);
        double[] st = stations.of(idx, count);
        int[] order = Sorting.order(st, count);
        int[] sortedIdx = new int[count];
        double[] sortedSt = new double[count];
        for (int k = 0; k < count; k++) {
            sortedIdx[k] = idx[order[k]];
            sortedSt[k] = st[order[k]];
        }
        return new Blend(all.subset(sortedIdx, count), sortedSt, sortedIdx, c);
    }

    /** Marks the points more than {@code tau} inside both legs and within {@code reach} of the vertex; returns how many. */
    private static int seed(double[] xs, double[] ys, int n, Point2 v, Point2 a, Point2 b, Point2 na, Point2 nb,
                            double tau, double reach, boolean[] in) {
        int count = 0;
        for (int i = 0; i < n; i++) {
            double qx = xs[i] - v.x(), qy = ys[i] - v.y();
            double xa = qx * a.x() + qy * a.y(), xb = qx * b.x() + qy * b.y();
            double ha = qx * na.x() + qy * na.y(), hb = qx * nb.x() + qy * nb.y();
            in[i] = xa <= reach && xb <= reach && ha > tau && hb > tau;
            if (in[i]) count++;
        }
        return count;
    }

    /** Copies the marked points, in order, to the front of {@code bx}, {@code by}. */
    private static void gather(double[] xs, double[] ys, int n, boolean[] in, double[] bx, double[] by) {
        int k = 0;
        for (int i = 0; i < n; i++) {
            if (in[i]) {
                bx[k] = xs[i];
                by[k++] = ys[i];
            }
        }
    }

    /**
     * Marks the points between the feet of the circle's perpendiculars on the legs ({@code lim},
     * {@code limB} along them) and within {@code reach}; returns how many, or {@code -(how many) - 1}
     * when the marks changed.
     */
    private static int between(double[] xs, double[] ys, int n, Point2 v, Point2 a, Point2 b, double lim, double limB,
                               double reach, boolean[] in) {
        int next = 0;
        boolean changed = false;
        for (int i = 0; i < n; i++) {
            double qx = xs[i] - v.x(), qy = ys[i] - v.y();
            double xa = qx * a.x() + qy * a.y(), xb = qx * b.x() + qy * b.y();
            boolean now = xa <= lim && xb <= limB && xa <= reach && xb <= reach;
            if (now != in[i]) changed = true;
            in[i] = now;
            if (now) next++;
        }
        return changed ? -next - 1 : next;
    }

    private static int[] indexes(boolean[] in, int count) {
        int[] idx = new int[count];
        int k = 0;
        for (int i = 0; i < in.length; i++) if (in[i]) idx[k++] = i;
        return idx;
    }
}
