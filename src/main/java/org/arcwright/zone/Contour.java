package org.arcwright.zone;

import java.util.List;
import org.arcwright.io.DecimalText;
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
 * <p>The chain is compiled once into primitive arrays, so that measuring a million points costs
 * tens of milliseconds. Immutable.
 */
public final class Contour {
    private final List<Segment> segments;
    private final Side air;
    private final boolean closed;
    // compiled form: per segment
    private final int count;
    private final boolean[] isArc;
    private final double[] ax, ay, bx, by, ux, uy, len, cx, cy, rad, start, sweep, station0;
    // pseudo-normal at the start joint of each segment (index i: joint between i-1 and i; n: end of chain)
    private final double[] jnx, jny;
    // per arc: unit radii to its start and end, and the turn (+1 counter-clockwise), for the span test
    private final double[] sxr, syr, exr, eyr, turn;

    /**
     * @param segments the chain, each starting where the previous ends (within 1e-9 of the scale)
     * @param air the side of the direction of travel where the air is
     */
    public Contour(List<Segment> segments, Side air) {
        segments = List.copyOf(segments);
        if (segments.isEmpty()) throw InputProblem.ofField("contour", "needs at least one segment");
        if (air == null) throw InputProblem.ofField("air", "missing; use left or right");
        double scale = 0;
        for (Segment s : segments) scale = Math.max(scale, s.length());
        for (int i = 1; i < segments.size(); i++) {
            if (segments.get(i - 1).end().distance(segments.get(i).start()) > 1e-9 * Math.max(1, scale)) {
                throw InputProblem.ofField("contour.segments[" + i + "]", "does not start where the previous segment ends ("
                        + where(segments.get(i - 1).end()) + ")");
            }
        }
        this.segments = segments;
        this.air = air;
        int n = segments.size();
        this.count = n;
        isArc = new boolean[n];
        ax = new double[n]; ay = new double[n]; bx = new double[n]; by = new double[n];
        ux = new double[n]; uy = new double[n]; len = new double[n];
        cx = new double[n]; cy = new double[n]; rad = new double[n]; start = new double[n]; sweep = new double[n];
        station0 = new double[n];
        sxr = new double[n]; syr = new double[n]; exr = new double[n]; eyr = new double[n]; turn = new double[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            Segment s = segments.get(i);
            Point2 a = s.start(), b = s.end();
            ax[i] = a.x(); ay[i] = a.y(); bx[i] = b.x(); by[i] = b.y();
            len[i] = s.length();
            station0[i] = total;
            total += len[i];
            if (s instanceof Segment.Arc arc) {
                isArc[i] = true;
                cx[i] = arc.centre().x(); cy[i] = arc.centre().y(); rad[i] = arc.radius();
                start[i] = arc.startAngle(); sweep[i] = arc.sweep();
                sxr[i] = (ax[i] - cx[i]) / rad[i]; syr[i] = (ay[i] - cy[i]) / rad[i];
                exr[i] = (bx[i] - cx[i]) / rad[i]; eyr[i] = (by[i] - cy[i]) / rad[i];
                turn[i] = sweep[i] > 0 ? 1 : -1;
            } else {
                ux[i] = (bx[i] - ax[i]) / len[i];
                uy[i] = (by[i] - ay[i]) / len[i];
            }
        }
        Segment first = segments.get(0), last = segments.get(n - 1);
        this.closed = n > 1 && last.end().distance(first.start()) <= 1e-9 * Math.max(1, total);
        jnx = new double[n + 1];
        jny = new double[n + 1];
        double[] w = new double[5];
        for (int i = 0; i <= n; i++) {
            int before = i - 1, after = i;
            if (i == 0) before = closed ? n - 1 : -1;
            if (i == n) after = closed ? 0 : -1;
            double px = 0, py = 0;
            double jx = i < n ? ax[i] : bx[n - 1], jy = i < n ? ay[i] : by[n - 1];
            if (before >= 0) { nearestOn(before, jx, jy, w); px += w[3]; py += w[4]; }
            if (after >= 0) { nearestOn(after, jx, jy, w); px += w[3]; py += w[4]; }
            double pl = Math.sqrt(px * px + py * py);
            jnx[i] = pl > 1e-12 ? px / pl : 0;
            jny[i] = pl > 1e-12 ? py / pl : 0;
        }
    }

    /** The chain. */
    public List<Segment> segments() { return segments; }

    /** The side of the direction of travel where the air is. */
    public Side air() { return air; }

    /** True when the chain ends where it starts. */
    public boolean closed() { return closed; }

    /** Total length of the chain. */
    public double length() { return station0[count - 1] + len[count - 1]; }

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
        measure(x, y, out, work, true);
    }

    private void measure(double x, double y, double[] out, double[] work, boolean wantStation) {
        double sign = air == Side.LEFT ? 1 : -1;
        double best = Double.POSITIVE_INFINITY;
        int bestSeg = 0;
        double bAlong = 0, bnx = 0, bny = 0, bpx = 0, bpy = 0;
        for (int i = 0; i < count; i++) {
            nearestOn(i, x, y, work);
            double ex = x - work[1], ey = y - work[2];
            double d2 = ex * ex + ey * ey;
            if (d2 < best) {
                best = d2;
                bestSeg = i;
                bAlong = work[0];
                bpx = work[1]; bpy = work[2];
                bnx = work[3]; bny = work[4];
            }
        }
        double ex = x - bpx, ey = y - bpy;
        double dist = Math.sqrt(best);
        boolean interiorArc = bAlong == INTERIOR;
        int joint = interiorArc ? -1 : bAlong <= 0 ? bestSeg : bAlong >= len[bestSeg] ? bestSeg + 1 : -1;
        double gx, gy, sgn;
        if (joint >= 0) {
            // at an end: side from the joint's pseudo-normal (or the segment's normal at an open end)
            boolean open = (joint == 0 || joint == count) && !closed;
            double px = open ? bnx : jnx[joint], py = open ? bny : jny[joint];
            sgn = ex * px + ey * py >= 0 ? 1 : -1;
            if (dist > 1e-12) { gx = sgn * ex / dist; gy = sgn * ey / dist; } else { gx = px; gy = py; }
        } else {
            sgn = ex * bnx + ey * bny >= 0 ? 1 : -1;
            gx = bnx;
            gy = bny;
        }
        out[0] = sign * sgn * dist;
        out[1] = sign * gx;
        out[2] = sign * gy;
        out[3] = station0[bestSeg] + (interiorArc ? (wantStation ? alongArc(bestSeg, x, y) : Double.NaN) : bAlong);
    }

    /** As {@link #measure(double, double, double[], double[])} without the station ([3] is NaN on arcs): faster. */
    public void measureDeviation(double x, double y, double[] out, double[] work) {
        measure(x, y, out, work, false);
    }

    /**
     * Measures {@code n} points at once: signed deviations, normals toward air and stations into the
     * given arrays (any may be null).
     */
    public void measureAll(double[] xs, double[] ys, int n, double[] dev, double[] nx, double[] ny, double[] station) {
        double[] out = new double[4], work = new double[5];
        for (int i = 0; i < n; i++) {
            measure(xs[i], ys[i], out, work, station != null);
            if (dev != null) dev[i] = out[0];
            if (nx != null) nx[i] = out[1];
            if (ny != null) ny[i] = out[2];
            if (station != null) station[i] = out[3];
        }
    }

    /** Marks a nearest point strictly inside an arc, whose distance along is found only if needed. */
    private static final double INTERIOR = -1;

    /** Distance along arc i of a point inside its span. */
    private double alongArc(int i, double x, double y) {
        double phi = Math.atan2(y - cy[i], x - cx[i]);
        double rel = sweep[i] > 0 ? phi - start[i] : start[i] - phi;
        rel = rel - 2 * Math.PI * Math.floor(rel / (2 * Math.PI));
        return Math.min(rel, Math.abs(sweep[i])) * rad[i];
    }

    /** Nearest point of segment i: [0] along, [1] x, [2] y, [3] x and [4] y of the left normal. */
    private void nearestOn(int i, double x, double y, double[] out) {
        if (!isArc[i]) {
            double t = (x - ax[i]) * ux[i] + (y - ay[i]) * uy[i];
            if (t < 0) t = 0;
            else if (t > len[i]) t = len[i];
            out[0] = t;
            out[1] = ax[i] + ux[i] * t;
            out[2] = ay[i] + uy[i] * t;
            out[3] = -uy[i];
            out[4] = ux[i];
            return;
        }
        double dx = x - cx[i], dy = y - cy[i];
        double sw = sweep[i], r = rad[i];
        double k = sw > 0 ? -1 : 1; // counter-clockwise travel has the centre on its left
        // within the arc's angular span? (cross products against the end radii; no trigonometry)
        double sxr = this.sxr[i], syr = this.syr[i], exr = this.exr[i], eyr = this.eyr[i], turn = this.turn[i];
        double c1 = turn * (sxr * dy - syr * dx), c2 = turn * (dx * eyr - dy * exr);
        boolean inside = Math.abs(sw) <= Math.PI ? c1 >= 0 && c2 >= 0 : c1 >= 0 || c2 >= 0;
        if (inside) {
            double d = Math.sqrt(dx * dx + dy * dy);
            double c = d > 0 ? dx / d : sxr, s = d > 0 ? dy / d : syr;
            out[0] = INTERIOR;
            out[1] = cx[i] + r * c;
            out[2] = cy[i] + r * s;
            out[3] = k * c;
            out[4] = k * s;
        } else {
            // beyond the span: the nearer end point
            double ds = (x - ax[i]) * (x - ax[i]) + (y - ay[i]) * (y - ay[i]);
            double de = (x - bx[i]) * (x - bx[i]) + (y - by[i]) * (y - by[i]);
            boolean atEnd = de < ds;
            double px = atEnd ? bx[i] : ax[i], py = atEnd ? by[i] : ay[i];
            out[0] = atEnd ? len[i] : 0;
            out[1] = px;
            out[2] = py;
            out[3] = k * (px - cx[i]) / r;
            out[4] = k * (py - cy[i]) / r;
        }
    }

    /** A computed point in a message: at most 6 places, so an arc's end reads 2, not 2.0000000000000004 or 1.2E-16. */
    private static String where(Point2 p) {
        return "[" + DecimalText.places(p.x(), 6) + ", " + DecimalText.places(p.y(), 6) + "]";
    }
}
