package org.arcwright.zone;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * The zone of a radius tolerance at a corner: bounded by the arcs of the smallest and the largest
 * radius, each tangent to both adjacent surfaces (ASME Y14.5-2018, radius definition; clause number
 * from memory). It extends between the tangent points of the largest arc; points beyond them belong
 * to the adjacent surfaces and are not judged here.
 *
 * <h2>What a point allows</h2>
 * Every point strictly inside the angle lies on exactly one blend tangent to both legs
 * ({@link Corner#blendRadiusThrough}), and the blends are nested, so the point lies between the limit
 * arcs exactly when {@code min <= ρ <= max}. A point on a leg (within the resolution) lies on every
 * contour whose tangent point is beyond it, so it allows {@code 0 <= ρ <= x·tan α}, with {@code x}
 * its distance from the vertex along the leg. A point outside a leg by more than the resolution lies
 * beyond even the sharp corner: no radius allows it.
 *
 * <h2>Resolution</h2>
 * The zone narrows to nothing at the tangent points, so points are classified against the leg lines
 * with a stated resolution (default 1e-6 of the drawing unit): within it a point may be taken as on
 * the leg or where it lies, whichever allows more. Limits are compared with the same slack.
 *
 * @param corner the adjacent surfaces
 * @param min smallest radius allowed, >= 0
 * @param max largest radius allowed, >= min
 * @param resolution distance below which a point counts as on a leg, > 0
 */
public final class RadiusZone {
    private final Corner corner;
    private final double min, max, resolution;
    private final double vx, vy, bisX, bisY, s1, s2, cot2;

    public RadiusZone(Corner corner, double min, double max, double resolution) {
        Objects.requireNonNull(corner, "corner");
        if (!Double.isFinite(min) || min < 0) throw InputProblem.ofField("callout.min", "must be zero or more, got " + DecimalText.exact(min));
        if (!Double.isFinite(max) || max <= 0) throw InputProblem.ofField("callout.max", "must be above zero, got " + DecimalText.exact(max));
        if (max < min) throw InputProblem.ofField("callout.max", "is smaller than min (" + DecimalText.exact(max) + " < " + DecimalText.exact(min) + ")");
        if (!(resolution > 0)) throw InputProblem.ofField("resolution", "must be above zero");
        this.corner = corner;
        this.min = min;
        this.max = max;
        this.resolution = resolution;
        double a = corner.halfAngle();
        this.vx = corner.vertex().x();
        this.vy = corner.vertex().y();
        this.bisX = corner.bisector().x();
        this.bisY = corner.bisector().y();
        this.s1 = 1 / Math.sin(a);
        this.s2 = s1 * s1;
        this.cot2 = 1 / (Math.tan(a) * Math.tan(a));
    }

    public Corner corner() { return corner; }

    /** Smallest radius allowed. */
    public double min() { return min; }

    /** Largest radius allowed. */
    public double max() { return max; }

    /** Distance below which a point counts as on a leg. */
    public double resolution() { return resolution; }

    /**
     * Evaluates points against the zone.
     *
     * @throws InputProblem when no point lies within the zone's extent
     */
    public RadiusEnvelope evaluate(double[] xs, double[] ys, int n) {
        double alpha = corner.halfAngle();
        double tanA = Math.tan(alpha);
        double reach = max / tanA + resolution;
        Point2 a = corner.legA(), b = corner.legB();
        Point2 na = corner.inwardNormalA(), nb = corner.inwardNormalB();
        // one loop over the primitive arrays, the corner's constants in locals (what allowed() does, inlined)
        double ox = vx, oy = vy, axx = a.x(), axy = a.y(), bxx = b.x(), bxy = b.y();
        double nax = na.x(), nay = na.y(), nbx = nb.x(), nby = nb.y();
        double bx = bisX, by = bisY, k1 = s1, k2 = s2, kc = cot2, res = resolution, lowest = min, highest = max;
        double smallest = Double.POSITIVE_INFINITY, largest = 0;
        int inside = 0, outside = 0, onLegs = 0, worst = -1;
        double worstExcess = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double qx = xs[i] - ox, qy = ys[i] - oy;
            double xa = qx * axx + qy * axy, xb = qx * bxx + qy * bxy;
            if (xa > reach || xb > reach) continue;
            inside++;
            double ha = qx * nax + qy * nay, hb = qx * nbx + qy * nby;
            double excess;
            if (ha < -res || hb < -res) {
                outside++;
                // beyond the sharp corner: counted as a radius below zero by the depth outside
                excess = lowest - Math.min(ha, hb);
                smallest = Double.NaN;
            } else {
                double qu = qx * bx + qy * by;
                double r = (k1 * qu + Math.sqrt(Math.max(0, k2 * qu * qu - kc * (qx * qx + qy * qy)))) / kc;
                double lo, hi;
                if (ha <= res || hb <= res) {
                    lo = 0;
                    hi = nearLeg(qx, qy, ha, hb, xa, xb, tanA, res);
                } else {
                    lo = r;
                    hi = r;
                }
                if (lo == 0 && hi != lo) onLegs++;
                if (!Double.isNaN(smallest)) smallest = Math.min(smallest, hi);
                largest = Math.max(largest, lo);
                excess = Math.max(lowest - hi, lo - highest);
            }
            if (excess > worstExcess) {
                worstExcess = excess;
                worst = i;
            }
        }
        if (inside == 0) {
            throw InputProblem.ofField("points", "no point lies within the radius zone's extent (between the tangent points of the "
                    + DecimalText.exact(max) + " arc, " + DecimalText.significant(reach, 4) + " from the vertex along each leg)");
        }
        boolean pass = outside == 0 && smallest >= min - resolution && largest <= max + resolution;
        return new RadiusEnvelope(smallest, largest, inside, onLegs, outside, n - inside, pass, worst, worstExcess,
                resolution);
    }

    /**
     * The ISO 14253-1 default decision rule on the zone (from memory): conformance is proven only
     * when every judged point lies inside the zone reduced by the expanded measurement uncertainty
     * {@code u}, non-conformance only when a point lies outside the zone enlarged by it.
     *
     * <p>The reduction applies to the limit arcs, measured as distances: a point between the arcs
     * must lie at least {@code u} from each arc whose span it is in. The adjacent surfaces are not a
     * boundary here: they are the datum the zone is built on (fitted from these very points), and
     * within the resolution a point counts as on them, where it allows every radius whose tangent
     * point lies beyond it, read with its position along the surface uncertain by {@code u}. A point
     * beyond a surface by more than the resolution fails only when beyond it by more than
     * {@code resolution + u}.
     *
     * @param u expanded uncertainty U of a measured point, drawing units, >= 0
     * @param counts if not null, receives [0] points proven inside, [1] indeterminate, [2] proven outside
     * @return true, false or null: conformance proven, non-conformance proven, neither
     */
    public Boolean decide(double[] xs, double[] ys, int n, double u, int[] counts) {
        double tanA = Math.tan(corner.halfAngle());
        double reach = max / tanA + resolution, tMin = min / tanA;
        Point2 a = corner.legA(), b = corner.legB();
        Point2 na = corner.inwardNormalA(), nb = corner.inwardNormalB();
        Point2 cMax = corner.centre(max), cMin = corner.centre(min);
        int in = 0, open = 0, out = 0;
        for (int i = 0; i < n; i++) {
            double qx = xs[i] - vx, qy = ys[i] - vy;
            double xa = qx * a.x() + qy * a.y(), xb = qx * b.x() + qy * b.y();
            if (xa > reach || xb > reach) continue;
            double ha = qx * na.x() + qy * na.y(), hb = qx * nb.x() + qy * nb.y();
            int state; // 1 in, 0 open, -1 out
            if (ha < -resolution || hb < -resolution) {
                state = -Math.min(ha, hb) > resolution + u ? -1 : 0;
            } else if (ha <= resolution || hb <= resolution) {
                double hiLow = Double.POSITIVE_INFINITY, hiHigh = Double.POSITIVE_INFINITY;
                if (ha <= resolution) {
                    hiLow = Math.min(hiLow, Math.max(0, xa - u) * tanA);
                    hiHigh = Math.min(hiHigh, Math.max(0, xa + u) * tanA);
                }
                if (hb <= resolution) {
                    hiLow = Math.min(hiLow, Math.max(0, xb - u) * tanA);
                    hiHigh = Math.min(hiHigh, Math.max(0, xb + u) * tanA);
                }
                // or anywhere within the resolution of where it lies, the resolution read within u
                hiLow = Math.max(hiLow, nearLeg(qx, qy, ha, hb, xa, xb, tanA, Math.max(0, resolution - u)));
                hiHigh = Math.max(hiHigh, nearLeg(qx, qy, ha, hb, xa, xb, tanA, resolution + u));
                state = min <= hiLow ? 1 : min > hiHigh ? -1 : 0;
            } else {
                double d = Math.hypot(xs[i] - cMax.x(), ys[i] - cMax.y()) - max;
                if (xa <= tMin && xb <= tMin && min > 0) d = Math.min(d, min - Math.hypot(xs[i] - cMin.x(), ys[i] - cMin.y()));
                state = d >= u ? 1 : d < -u ? -1 : 0;
            }
            if (state > 0) in++;
            else if (state == 0) open++;
            else out++;
        }
        if (counts != null) {
            counts[0] = in;
            counts[1] = open;
            counts[2] = out;
        }
        return out > 0 ? Boolean.FALSE : open > 0 ? null : Boolean.TRUE;
    }


    /**
     * How far one point's radius lies beyond the limits (radius units; negative: inside by that
     * much); for a point beyond an adjacent surface (outside the sharp corner, which no radius
     * allows), how far beyond that surface it lies, a distance (see {@link #beyondSurface}); NaN for
     * a point beyond the zone's extent.
     */
    public double excess(double x, double y) {
        double tanA = Math.tan(corner.halfAngle());
        double reach = max / tanA + resolution;
        Point2 v = corner.vertex(), a = corner.legA(), b = corner.legB();
        Point2 na = corner.inwardNormalA(), nb = corner.inwardNormalB();
        double qx = x - v.x(), qy = y - v.y();
        double xa = qx * a.x() + qy * a.y(), xb = qx * b.x() + qy * b.y();
        if (xa > reach || xb > reach) return Double.NaN;
        double ha = qx * na.x() + qy * na.y(), hb = qx * nb.x() + qy * nb.y();
        if (ha < -resolution || hb < -resolution) return -Math.min(ha, hb);
        double[] lo = new double[1], hi = new double[1];
        allowed(x, y, ha, hb, xa, xb, tanA, lo, hi);
        return Math.max(min - hi[0], lo[0] - max);
    }

    /**
     * Whether a point lies beyond an adjacent surface by more than the resolution (outside the sharp
     * corner), where {@link #excess} is a distance beyond that surface rather than a radius.
     */
    public boolean beyondSurface(double x, double y) {
        double qx = x - corner.vertex().x(), qy = y - corner.vertex().y();
        Point2 na = corner.inwardNormalA(), nb = corner.inwardNormalB();
        return qx * na.x() + qy * na.y() < -resolution || qx * nb.x() + qy * nb.y() < -resolution;
    }

    private void allowed(double x, double y, double ha, double hb, double xa, double xb, double tanA,
                         double[] lo, double[] hi) {
        if (ha <= resolution || hb <= resolution) {
            lo[0] = 0;
            hi[0] = nearLeg(x - vx, y - vy, ha, hb, xa, xb, tanA, resolution);
        } else {
            double r = blend(x, y);
            lo[0] = r;
            hi[0] = r;
        }
    }

    /**
     * The largest radius a point within the resolution of a leg allows (it allows every smaller one):
     * the point may be taken as on the leg, where every contour whose tangent point lies beyond it
     * passes through it ({@code x·tan α}), or as anywhere within the resolution of where it lies. The
     * contours passing within the resolution of it are those through the point moved the resolution
     * away from the leg, into the angle; the largest of them is the blend through that moved point.
     * Reading the point only as on the leg, or only where it lies, rejected a perfect blend whose
     * measured point beside a tangent point fell a fraction of a micrometre on the material side of
     * the fitted leg (the blend through it then ended before the smallest limit arc's tangent point).
     *
     * @param qx the point's position from the vertex, x
     * @param qy the point's position from the vertex, y
     * @param slack how far from where it lies the point may be read (the resolution)
     */
    private double nearLeg(double qx, double qy, double ha, double hb, double xa, double xb, double tanA, double slack) {
        double h = Double.POSITIVE_INFINITY;
        if (ha <= resolution) h = Math.min(h, Math.max(0, xa) * tanA);
        if (hb <= resolution) h = Math.min(h, Math.max(0, xb) * tanA);
        Point2 na = corner.inwardNormalA(), nb = corner.inwardNormalB();
        double mx = qx, my = qy;
        if (ha <= resolution) {
            mx += na.x() * slack;
            my += na.y() * slack;
        }
        if (hb <= resolution) {
            mx += nb.x() * slack;
            my += nb.y() * slack;
        }
        return Math.max(h, blend(vx + mx, vy + my));
    }

    /** {@link Corner#blendRadiusThrough} with the corner's constants computed once. */
    private double blend(double x, double y) {
        double qx = x - vx, qy = y - vy;
        double qu = qx * bisX + qy * bisY;
        double q2 = qx * qx + qy * qy;
        double disc = Math.max(0, s2 * qu * qu - cot2 * q2);
        return (s1 * qu + Math.sqrt(disc)) / cot2;
    }
}
