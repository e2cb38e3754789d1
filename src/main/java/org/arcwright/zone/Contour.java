package org.arcwright.zone;

import java.util.List;
import org.arcwright.io.InputProblem;

/**
 * A nominal contour in a section: a chain of line and arc segments, open or closed, with the air
 * on one side of its direction of travel.
 *
 * <p>The signed deviation of a point is its distance to the nearest point of the chain, positive on
 * the air side (where added material would put the surface), as profile of a surface measures it
 * (ASME Y14.5-2018 profile, ISO 1101:2017 line/surface profile; from memory). At a sharp joint the
 * side is taken from the pseudo-normal (the mean of the two segment normals), which gives the right
 * sign on both the convex and the concave side.
 *
 * @param segments the chain, each starting where the previous ends (within 1e-9 of the scale)
 * @param air the side of the direction of travel where the air is
 */
public record Contour(List<Segment> segments, Side air) {
    public Contour {
        segments = List.copyOf(segments);
        if (segments.isEmpty()) throw InputProblem.ofField("contour", "needs at least one segment");
        if (air == null) throw InputProblem.ofField("air", "missing; use left or right");
        double scale = 0;
        for (Segment s : segments) scale = Math.max(scale, s.length());
        for (int i = 1; i < segments.size(); i++) {
            if (segments.get(i - 1).end().distance(segments.get(i).start()) > 1e-9 * Math.max(1, scale)) {
                throw InputProblem.ofField("contour.segments[" + i + "]", "does not start where the previous segment ends ("
                        + segments.get(i - 1).end() + ")");
            }
        }
    }

    /** True when the chain ends where it starts. */
    public boolean closed() {
        Segment first = segments.get(0), last = segments.get(segments.size() - 1);
        return segments.size() > 1 && last.end().distance(first.start()) <= 1e-9 * Math.max(1, length());
    }

    /** Total length of the chain. */
    public double length() {
        double l = 0;
        for (Segment s : segments) l += s.length();
        return l;
    }

    /** The same chain with the air side swapped. */
    public Contour flipped() { return new Contour(segments, air == Side.LEFT ? Side.RIGHT : Side.LEFT); }

    /**
     * Measures one point: writes [0] the signed deviation (positive toward air), [1] x and [2] y of
     * the unit normal toward air at the nearest point (the gradient of the deviation), [3] the
     * station (distance along the chain from its start) of the nearest point.
     *
     * @param work scratch array of at least 5 doubles
     */
    public void measure(double x, double y, double[] out, double[] work) {
        measure(x, y, out, work, closed());
    }

    /**
     * Measures {@code n} points at once: signed deviations, normals toward air and stations into the
     * given arrays (any may be null).
     */
    public void measureAll(double[] xs, double[] ys, int n, double[] dev, double[] nx, double[] ny, double[] station) {
        boolean closed = closed();
        double[] out = new double[4], work = new double[5];
        for (int i = 0; i < n; i++) {
            measure(xs[i], ys[i], out, work, closed);
            if (dev != null) dev[i] = out[0];
            if (nx != null) nx[i] = out[1];
            if (ny != null) ny[i] = out[2];
            if (station != null) station[i] = out[3];
        }
    }

    private void measure(double x, double y, double[] out, double[] work, boolean closed) {
        double sign = air == Side.LEFT ? 1 : -1;
        double best = Double.POSITIVE_INFINITY;
        double bestDev = 0, bnx = 0, bny = 0, bestStation = 0;
        double station0 = 0;
        int n = segments.size();
        for (int i = 0; i < n; i++) {
            Segment s = segments.get(i);
            s.nearest(x, y, work);
            double ex = x - work[1], ey = y - work[2];
            double dist = Math.sqrt(ex * ex + ey * ey);
            if (dist < best) {
                double along = work[0];
                double nx = work[3], ny = work[4];
                double len = s.length();
                boolean atStart = along <= 0, atEnd = along >= len;
                // pseudo-normal at a joint with the neighbour segment
                if ((atStart && (i > 0 || closed)) || (atEnd && (i < n - 1 || closed))) {
                    Segment other = atStart ? segments.get(i > 0 ? i - 1 : n - 1) : segments.get(i < n - 1 ? i + 1 : 0);
                    double[] w2 = work;
                    Point2 joint = atStart ? s.start() : s.end();
                    other.nearest(joint.x(), joint.y(), w2);
                    double px = nx + w2[3], py = ny + w2[4];
                    double pl = Math.hypot(px, py);
                    if (pl > 1e-12) { px /= pl; py /= pl; } else { px = nx; py = ny; }
                    double side = ex * px + ey * py;
                    double sgn = side >= 0 ? 1 : -1;
                    if (dist > 1e-12) {
                        // gradient of the signed distance points away from the joint on the air side
                        bnx = sign * sgn * (ex / dist);
                        bny = sign * sgn * (ey / dist);
                    } else {
                        bnx = sign * px;
                        bny = sign * py;
                    }
                    bestDev = sign * sgn * dist;
                } else {
                    double side = ex * nx + ey * ny;
                    double sgn = side >= 0 ? 1 : -1;
                    if (atStart || atEnd) {
                        // open end: the deviation is the distance to the end point, signed by the end's normal
                        bnx = dist > 1e-12 ? sign * sgn * ex / dist : sign * nx;
                        bny = dist > 1e-12 ? sign * sgn * ey / dist : sign * ny;
                    } else {
                        bnx = sign * nx;
                        bny = sign * ny;
                    }
                    bestDev = sign * sgn * dist;
                }
                best = dist;
                bestStation = station0 + along;
            }
            station0 += s.length();
        }
        out[0] = bestDev;
        out[1] = bnx;
        out[2] = bny;
        out[3] = bestStation;
    }
}
