package org.arcwright.simulate;

import java.util.Objects;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.NormalizedGaussianSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;

/**
 * Draws parts from a {@link ProcessModel} and measures them as a CMM scanning a section would.
 *
 * <h2>Geometry</h2>
 * The part's adjacent surfaces are the nominal ones moved by the position offset {@code (dx, dy)};
 * the blend is an arc of the true radius tangent to both (plane geometry: centre at {@code r/sin α}
 * along the bisector, α half the included angle). A step of size {@code s} at leg A makes the arc
 * tangent to the line parallel to A offset by {@code s} into the angle instead, with a wall joining
 * it to A; the centre {@code q} then solves {@code nA·q = r + s, nB·q = r} (unit inward normals).
 * A flat replaces the arc between two sweep fractions by its chord.
 *
 * <h2>Measurement</h2>
 * The section runs along leg A from {@code 1.5×} the nominal tangent distance (or further for a
 * large true radius), across the blend and out along leg B as far; {@code points} points are spaced
 * evenly by arc length over that path (both ends included), each moved along the local surface
 * normal by normal noise. Geometry and noise come from separate random streams, so changing the scan
 * density keeps the same population of parts.
 */
public final class PartGenerator {
    private final ProcessModel model;
    private final double vx, vy, ax, ay, bx, by, nax, nay, nbx, nby, nominalTangent;

    public PartGenerator(ProcessModel model) {
        this.model = Objects.requireNonNull(model, "model");
        Corner c = model.corner();
        vx = c.vertex().x();
        vy = c.vertex().y();
        ax = c.legA().x();
        ay = c.legA().y();
        bx = c.legB().x();
        by = c.legB().y();
        Point2 na = c.inwardNormalA(), nb = c.inwardNormalB();
        nax = na.x();
        nay = na.y();
        nbx = nb.x();
        nby = nb.y();
        nominalTangent = c.tangentDistance(model.nominalRadius());
    }

    public ProcessModel model() { return model; }

    /** Draws part {@code index}'s true geometry from {@code rng}, always taking the same number of draws. */
    public Part draw(int index, UniformRandomProvider rng, NormalizedGaussianSampler gauss) {
        ProcessModel m = model;
        double r = m.radius().mean() + m.radius().sd() * gauss.sample();
        double dx = m.positionSd() * gauss.sample();
        double dy = m.positionSd() * gauss.sample();
        double uFlat = rng.nextDouble(), uWidth = rng.nextDouble(), uCentre = rng.nextDouble();
        double uStep = rng.nextDouble(), uSize = rng.nextDouble(), uLeg = rng.nextDouble();
        // A radius drawn at or below zero has no blend to judge; the smallest positive double keeps the
        // geometry defined, and the need for a minimum radius rejects it.
        r = Math.max(r, 1e-9 * m.nominalRadius());
        double from = Double.NaN, to = Double.NaN;
        ProcessModel.Flats f = m.flat();
        if (uFlat < f.rate()) {
            double w = f.widthMin() + (f.widthMax() - f.widthMin()) * uWidth;
            double c = f.centreMin() + (f.centreMax() - f.centreMin()) * uCentre;
            from = Math.max(0, c - w / 2);
            to = Math.min(1, c + w / 2);
            if (!(to > from)) {
                from = Double.NaN;
                to = Double.NaN;
            }
        }
        double step = 0;
        ProcessModel.Steps s = m.step();
        if (uStep < s.rate()) step = s.sizeMin() + (s.sizeMax() - s.sizeMin()) * uSize;
        return new Part(index, r, dx, dy, from, to, step, uLeg >= 0.5);
    }

    /** A fresh buffer for {@link #measure}; one per thread. */
    public Scan newScan() { return new Scan(model.points()); }

    /**
     * Measures {@code part} into {@code scan}'s arrays ({@code points} points).
     *
     * @param noise the measuring-noise stream
     */
    public void measure(Part part, NormalizedGaussianSampler noise, Scan scan) {
        scan.clear();
        double r = part.radius();
        double px = vx + part.dx(), py = vy + part.dy();
        double sA = part.step() > 0 && !part.stepOnB() ? part.step() : 0;
        double sB = part.step() > 0 && part.stepOnB() ? part.step() : 0;
        double hA = r + sA, hB = r + sB;
        double det = nax * nby - nay * nbx;
        double qx = (hA * nby - nay * hB) / det, qy = (nax * hB - hA * nbx) / det;
        double cx = px + qx, cy = py + qy;
        double eAx = cx - nax * r, eAy = cy - nay * r;
        double eBx = cx - nbx * r, eBy = cy - nby * r;
        double fAx = eAx - nax * sA, fAy = eAy - nay * sA;
        double fBx = eBx - nbx * sB, fBy = eBy - nby * sB;
        double reachA = (fAx - px) * ax + (fAy - py) * ay, reachB = (fBx - px) * bx + (fBy - py) * by;
        double reach = Math.max(1.5 * nominalTangent, 1.25 * Math.max(reachA, reachB));
        scan.line(px + ax * reach, py + ay * reach, fAx, fAy);
        if (sA > 0) scan.line(fAx, fAy, eAx, eAy);
        double t0 = Math.atan2(eAy - cy, eAx - cx);
        double sweep = Math.IEEEremainder(Math.atan2(eBy - cy, eBx - cx) - t0, 2 * Math.PI);
        if (part.hasFlat()) {
            double a = t0 + part.flatFrom() * sweep, b = t0 + part.flatTo() * sweep;
            scan.arc(cx, cy, r, t0, part.flatFrom() * sweep);
            scan.line(cx + r * Math.cos(a), cy + r * Math.sin(a), cx + r * Math.cos(b), cy + r * Math.sin(b));
            scan.arc(cx, cy, r, b, (1 - part.flatTo()) * sweep);
        } else {
            scan.arc(cx, cy, r, t0, sweep);
        }
        if (sB > 0) scan.line(eBx, eBy, fBx, fBy);
        scan.line(fBx, fBy, px + bx * reach, py + by * reach);
        scan.sample(model.noise(), noise);
    }

    /** A section's path (lines and arcs) and its measured points; reused from part to part. */
    public static final class Scan {
        private static final int MAX_PIECES = 8;
        private final boolean[] isArc = new boolean[MAX_PIECES];
        private final double[][] p = new double[MAX_PIECES][5];
        private final double[] len = new double[MAX_PIECES];
        private int pieces;
        final double[] xs, ys;

        Scan(int points) {
            xs = new double[points];
            ys = new double[points];
        }

        /** Measured x coordinates (the buffer itself: copy before keeping). */
        public double[] xs() { return xs; }

        /** Measured y coordinates (the buffer itself: copy before keeping). */
        public double[] ys() { return ys; }

        public int size() { return xs.length; }

        void clear() { pieces = 0; }

        void line(double x0, double y0, double x1, double y1) {
            double l = Math.hypot(x1 - x0, y1 - y0);
            if (!(l > 0)) return;
            double[] q = p[pieces];
            q[0] = x0;
            q[1] = y0;
            q[2] = x1;
            q[3] = y1;
            isArc[pieces] = false;
            len[pieces++] = l;
        }

        void arc(double cx, double cy, double r, double start, double sweep) {
            double l = Math.abs(r * sweep);
            if (!(l > 0)) return;
            double[] q = p[pieces];
            q[0] = cx;
            q[1] = cy;
            q[2] = r;
            q[3] = start;
            q[4] = sweep;
            isArc[pieces] = true;
            len[pieces++] = l;
        }

        void sample(double sd, NormalizedGaussianSampler noise) {
            double total = 0;
            for (int k = 0; k < pieces; k++) total += len[k];
            int n = xs.length;
            int k = 0;
            double before = 0;
            for (int i = 0; i < n; i++) {
                double s = total * i / (n - 1);
                while (k < pieces - 1 && s > before + len[k]) before += len[k++];
                double u = Math.max(0, Math.min(1, (s - before) / len[k]));
                double[] q = p[k];
                double x, y, nx, ny;
                if (isArc[k]) {
                    double t = q[3] + q[4] * u;
                    nx = Math.cos(t);
                    ny = Math.sin(t);
                    x = q[0] + q[2] * nx;
                    y = q[1] + q[2] * ny;
                } else {
                    x = q[0] + (q[2] - q[0]) * u;
                    y = q[1] + (q[3] - q[1]) * u;
                    nx = -(q[3] - q[1]) / len[k];
                    ny = (q[2] - q[0]) / len[k];
                }
                if (sd > 0) {
                    double e = sd * noise.sample();
                    x += e * nx;
                    y += e * ny;
                }
                xs[i] = x;
                ys[i] = y;
            }
        }
    }

    /** A standard normal sampler on {@code rng} (Marsaglia and Tsang's ziggurat, Commons RNG). */
    public static NormalizedGaussianSampler gaussian(UniformRandomProvider rng) {
        return ZigguratSampler.NormalizedGaussian.of(rng);
    }
}
