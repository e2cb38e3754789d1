package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;

/**
 * The two surfaces adjacent to a blend, established from the measured points on them: what a
 * radius zone is built on. A ± radius locates nothing; its zone is two arcs tangent to the part's
 * actual adjacent surfaces (ASME Y14.5-2018 radius and controlled radius definitions, clause
 * numbers from memory), so a corner moved as a whole still meets its radius. The nominal corner
 * only seeds the fit and decides which points belong to which surface (ADR 0302).
 *
 * <h2>Method</h2>
 * For each leg, the points beyond the tangent point of the largest arc (with a margin of
 * {@value #MARGIN} of that distance) and nearer to that leg's line than to the other's are fitted
 * with a straight line by total least squares (orthogonal regression: the line through the
 * weighted centroid along the major eigenvector of the 2 × 2 scatter matrix; Pearson 1901, and the
 * least-squares associated line of ISO 14405-1 / ISO 12780-1 terminology). The fit is made robust
 * to the blend's own points, burrs and steps by iteratively reweighted least squares with Tukey's
 * biweight, {@code w = (1 - (e / (c·s))²)²} for {@code |e| < c·s}, else 0, with
 * {@code c = }{@value #TUKEY_C} and the scale {@code s = 1.4826 · median |e|} (Beaton and Tukey
 * 1974; Huber, Robust Statistics, 1981, for the MAD scale), until the line moves by less than 1e-6
 * of that scale. The selection is made twice: once from the nominal corner (on a section of more than
 * {@value #COARSE_POINTS} points, from an evenly thinned subset), once from the corner the first fits
 * define.
 *
 * <p>A leg with fewer than {@value #MIN_POINTS} points beyond the tangent point, or whose points
 * span less than {@value #MIN_SPAN} of the tangent distance along it, keeps its nominal line and
 * the result says so ({@link Surface#fitted()} false, and a note).
 *
 * @param a the surface along leg A
 * @param b the surface along leg B
 * @param corner the corner the two surfaces make (the nominal's kind), on which the radius zone is
 *     built
 * @param notes what the fit could not do (a leg left at its nominal), empty when both were fitted
 */
public record AdjacentSurfaces(Surface a, Surface b, Corner corner, List<String> notes) {
    /** Fewest points a leg's line is fitted to. */
    public static final int MIN_POINTS = 5;
    /** Least span of a leg's points along it, as a share of the largest arc's tangent distance. */
    public static final double MIN_SPAN = 0.1;
    /** Margin beyond the largest arc's tangent point, as a share of its tangent distance. */
    public static final double MARGIN = 0.05;
    /** Tukey's biweight tuning constant (95 % efficiency at the normal distribution). */
    public static final double TUKEY_C = 4.685;
    private static final int ROBUST_ROUNDS = 6;
    /** Above this many points the first selection runs on an evenly thinned subset. */
    private static final int COARSE_POINTS = 20_000;

    public AdjacentSurfaces {
        notes = List.copyOf(notes);
    }

    /**
     * One adjacent surface in the section: a line.
     *
     * @param point a point on the line (the weighted centroid of the points fitted)
     * @param direction unit direction, away from the vertex
     * @param points how many points carried weight in the fit (0 when not fitted)
     * @param rms root mean square of the orthogonal residuals of the weighted points (0 when not fitted)
     * @param fitted true when fitted to the points; false when the nominal line was kept
     */
    public record Surface(Point2 point, Point2 direction, int points, double rms, boolean fitted) {}

    /** Included angle between the surfaces, degrees. */
    public double includedAngleDeg() { return corner.includedAngleDeg(); }

    /** The nominal surfaces, unfitted (for a section with no leg points at all). */
    public static AdjacentSurfaces nominal(Corner nominal) {
        return new AdjacentSurfaces(new Surface(nominal.vertex(), nominal.legA(), 0, 0, false),
                new Surface(nominal.vertex(), nominal.legB(), 0, 0, false), nominal, List.of());
    }

    /**
     * Fits both surfaces.
     *
     * @param nominal the nominal corner: seeds the fit and sorts the points between the legs
     * @param largestRadius the largest radius the callout allows; points beyond its tangent point are
     *     taken as the legs'
     */
    public static AdjacentSurfaces fit(Corner nominal, double largestRadius, double[] xs, double[] ys, int n) {
        int size = Math.max(16, Math.min(n, 1024));
        Workspace wa = new Workspace(size), wb = new Workspace(size);
        Corner work = nominal;
        LineFit fa = null, fb = null;
        // the first selection only places the second: on a large section, every stride-th point will do
        int coarse = Math.max(1, n / COARSE_POINTS);
        for (int pass = 0; pass < 2; pass++) {
            double t = work.tangentDistance(largestRadius);
            fa = new LineFit();
            fb = new LineFit();
            gather(work, t, xs, ys, n, pass == 0 ? coarse : 1, wa, wb, fa, fb);
            fa.solve(wa, pass == 1, work.legA());
            fb.solve(wb, pass == 1, work.legB());
            Corner next = cornerOf(nominal, fa, fb);
            if (next == null) break;
            work = next;
        }
        double t = nominal.tangentDistance(largestRadius);
        ArrayList<String> notes = new ArrayList<>();
        Surface sa = surface(fa, nominal.vertex(), nominal.legA(), nominal.legA(), t, "a", notes);
        Surface sb = surface(fb, nominal.vertex(), nominal.legB(), nominal.legB(), t, "b", notes);
        Corner c = cornerOf(nominal, sa, sb);
        if (c == null) {
            notes.add("the fitted surfaces make an angle outside " + DecimalText.exact(Corner.MIN_ANGLE_DEG) + "° to " + DecimalText.exact(Corner.MAX_ANGLE_DEG)
                    + "°: the nominal surfaces are used instead");
            return new AdjacentSurfaces(new Surface(nominal.vertex(), nominal.legA(), 0, 0, false),
                    new Surface(nominal.vertex(), nominal.legB(), 0, 0, false), nominal, notes);
        }
        return new AdjacentSurfaces(sa, sb, c, notes);
    }

    private static Surface surface(LineFit f, Point2 vertex, Point2 nominalDir, Point2 orient, double t, String name,
                                   List<String> notes) {
        if (f == null || !f.usable(t)) {
            int k = f == null ? 0 : f.count;
            notes.add(String.format(Locale.ROOT, "surface %s: %d point(s) on it beyond the tangent point of the largest arc (a line is fitted to "
                            + "at least %d, spanning at least a tenth of that arc's tangent distance): judged against the nominal surface %s, "
                            + "so a corner moved or turned as a whole reads as a step there; measure further along surface %s",
                    name, k, MIN_POINTS, name, name));
            return new Surface(vertex, nominalDir, 0, 0, false);
        }
        Point2 d = new Point2(f.dx, f.dy);
        if (d.dot(orient) < 0) d = d.times(-1);
        return new Surface(new Point2(f.cx, f.cy), d, f.weighted, f.rms, true);
    }

    /** The corner two lines make, oriented as the nominal; null when they are (nearly) parallel. */
    private static Corner cornerOf(Corner nominal, Surface a, Surface b) {
        return corner(nominal, a.point().x(), a.point().y(), a.direction().x(), a.direction().y(),
                b.point().x(), b.point().y(), b.direction().x(), b.direction().y());
    }

    private static Corner cornerOf(Corner nominal, LineFit a, LineFit b) {
        Point2 v = nominal.vertex();
        double ax = v.x(), ay = v.y(), adx = nominal.legA().x(), ady = nominal.legA().y();
        double bx = v.x(), by = v.y(), bdx = nominal.legB().x(), bdy = nominal.legB().y();
        if (a.count >= MIN_POINTS) {
            ax = a.cx; ay = a.cy; adx = a.dx; ady = a.dy;
        }
        if (b.count >= MIN_POINTS) {
            bx = b.cx; by = b.cy; bdx = b.dx; bdy = b.dy;
        }
        return corner(nominal, ax, ay, adx, ady, bx, by, bdx, bdy);
    }

    private static Corner corner(Corner nominal, double ax, double ay, double adx, double ady,
                                 double bx, double by, double bdx, double bdy) {
        if (adx * nominal.legA().x() + ady * nominal.legA().y() < 0) {
            adx = -adx;
            ady = -ady;
        }
        if (bdx * nominal.legB().x() + bdy * nominal.legB().y() < 0) {
            bdx = -bdx;
            bdy = -bdy;
        }
        double den = adx * bdy - ady * bdx;
        if (!(Math.abs(den) > 1e-12)) return null;
        // a + s·da = b + u·db, solved for s by Cramer's rule
        double s = ((bx - ax) * bdy - (by - ay) * bdx) / den;
        double vx = ax + s * adx, vy = ay + s * ady;
        if (!Double.isFinite(vx) || !Double.isFinite(vy)) return null;
        try {
            return new Corner(new Point2(vx, vy), new Point2(adx, ady), new Point2(bdx, bdy), nominal.kind());
        } catch (InputProblem p) {
            return null;
        }
    }

    /** Scratch arrays shared by the two legs' fits of one call: the selected points and their residuals. */
    private static final class Workspace {
        double[] x, y, r;

        Workspace(int size) {
            x = new double[size];
            y = new double[size];
            r = new double[size];
        }

        void ensure(int size) {
            if (x.length >= size) return;
            int grown = Math.max(size, 2 * x.length);
            x = Arrays.copyOf(x, grown);
            y = Arrays.copyOf(y, grown);
            r = new double[grown];
        }
    }

    /**
     * Gathers the points of leg A and of leg B of {@code work} in one pass: beyond the tangent
     * distance {@code t} (plus the margin) along a leg, and nearer that leg's line than the other's.
     */
    private static void gather(Corner work, double t, double[] xs, double[] ys, int n, int stride, Workspace wa,
                               Workspace wb, LineFit fa, LineFit fb) {
        Point2 v = work.vertex(), da = work.legA(), db = work.legB(), na = work.inwardNormalA(), nb = work.inwardNormalB();
        double vx = v.x(), vy = v.y(), ax = da.x(), ay = da.y(), bx = db.x(), by = db.y();
        double nax = na.x(), nay = na.y(), nbx = nb.x(), nby = nb.y();
        double from = t * (1 + MARGIN);
        int ka = 0, kb = 0;
        for (int i = 0; i < n; i += stride) {
            double qx = xs[i] - vx, qy = ys[i] - vy;
            double ha = Math.abs(qx * nax + qy * nay), hb = Math.abs(qx * nbx + qy * nby);
            if (ha < hb) {
                double along = qx * ax + qy * ay;
                if (along <= from) continue;
                if (ka == wa.x.length) wa.ensure(ka + 1);
                wa.x[ka] = xs[i];
                wa.y[ka++] = ys[i];
                fa.span(along);
            } else if (hb < ha) {
                double along = qx * bx + qy * by;
                if (along <= from) continue;
                if (kb == wb.x.length) wb.ensure(kb + 1);
                wb.x[kb] = xs[i];
                wb.y[kb++] = ys[i];
                fb.span(along);
            }
        }
        fa.count = ka;
        fb.count = kb;
    }

    /** A robust orthogonal line fit to one leg's points; fields, not a record, to keep it cheap. */
    private static final class LineFit {
        int count, weighted;
        double cx, cy, dx, dy, rms, spanLo = Double.POSITIVE_INFINITY, spanHi = Double.NEGATIVE_INFINITY;

        boolean usable(double t) {
            return count >= MIN_POINTS && weighted >= MIN_POINTS && spanHi - spanLo >= MIN_SPAN * t;
        }

        void span(double along) {
            if (along < spanLo) spanLo = along;
            if (along > spanHi) spanHi = along;
        }

        /**
         * Fits the {@link #count} points gathered in {@code ws}; {@code leg} orients the direction.
         * On more than {@value #COARSE_POINTS} points the reweighting runs on an evenly thinned
         * subset, and one last reweighted pass over all points places the line.
         */
        void solve(Workspace ws, boolean robust, Point2 leg) {
            int k = count;
            weighted = k;
            if (k < 2) return;
            double[] px = ws.x, py = ws.y;
            double hx = leg.x(), hy = leg.y(), lo = spanLo, hi = spanHi;
            // plain total least squares: centroid and the major axis of the scatter matrix
            double sx = 0, sy = 0;
            for (int i = 0; i < k; i++) {
                sx += px[i];
                sy += py[i];
            }
            cx = sx / k;
            cy = sy / k;
            double sxx = 0, syy = 0, sxy = 0;
            for (int i = 0; i < k; i++) {
                double ex = px[i] - cx, ey = py[i] - cy;
                sxx += ex * ex;
                syy += ey * ey;
                sxy += ex * ey;
            }
            direction(sxx, syy, sxy, hx, hy);
            rms = Math.sqrt(Math.max(0, orthogonal(sxx, syy, sxy, dx, dy) / k));
            if (!robust || k < MIN_POINTS) return;
            int every = Math.max(1, k / COARSE_POINTS);
            double floor = 1e-12 * Math.max(1, Math.abs(cx) + Math.abs(cy) + (hi - lo));
            double cut = Double.NaN;
            for (int round = 0; round < ROBUST_ROUNDS; round++) {
                double mad = scale(ws, k, every);
                cut = TUKEY_C * Math.max(mad, floor);
                double odx = dx, ody = dy, ocx = cx, ocy = cy;
                if (!reweight(px, py, k, every, cut, hx, hy)) break;
                // settled when the line moves at either end by less than 1e-6 of the scatter, or 1e-10 of its span
                double moved = Math.abs((cx - ocx) * -ody + (cy - ocy) * odx) + Math.abs(odx * dy - ody * dx) * (hi - lo);
                if (moved <= Math.max(1e-6 * mad, 1e-10 * Math.max(1e-9, hi - lo))) break;
            }
            if (every > 1 && !Double.isNaN(cut)) reweight(px, py, k, 1, TUKEY_C * Math.max(scale(ws, k, every), floor), hx, hy);
        }

        /** 1.4826 × the median absolute orthogonal residual of every {@code every}-th point (MAD scale). */
        private double scale(Workspace ws, int k, int every) {
            double nxl = -dy, nyl = dx;
            double[] px = ws.x, py = ws.y, r = ws.r;
            int m = 0;
            for (int i = 0; i < k; i += every) r[m++] = Math.abs((px[i] - cx) * nxl + (py[i] - cy) * nyl);
            return 1.4826 * Select.median(r, m);
        }

        /**
         * One reweighting with Tukey's biweight at cut-off {@code cut}, over every {@code every}-th
         * point: the weighted moments about the current centre, shifted to the new one. False when too
         * few points keep weight.
         */
        private boolean reweight(double[] px, double[] py, int k, int every, double cut, double hx, double hy) {
            double nxl = -dy, nyl = dx;
            double sw = 0, wx = 0, wy = 0, wxx = 0, wyy = 0, wxy = 0;
            int w = 0;
            for (int i = 0; i < k; i += every) {
                double ex = px[i] - cx, ey = py[i] - cy;
                double e = (ex * nxl + ey * nyl) / cut;
                if (Math.abs(e) >= 1) continue;
                double wt = (1 - e * e) * (1 - e * e);
                sw += wt;
                wx += wt * ex;
                wy += wt * ey;
                wxx += wt * ex * ex;
                wyy += wt * ey * ey;
                wxy += wt * ex * ey;
                w++;
            }
            if (w < 2 || !(sw > 0)) return false;
            double mx = wx / sw, my = wy / sw;
            cx += mx;
            cy += my;
            double sxx = wxx - sw * mx * mx, syy = wyy - sw * my * my, sxy = wxy - sw * mx * my;
            direction(sxx, syy, sxy, hx, hy);
            weighted = every == 1 ? w : Math.min(count, w * every);
            rms = Math.sqrt(Math.max(0, orthogonal(sxx, syy, sxy, dx, dy) / sw));
            return true;
        }

        /** Major eigenvector of {@code [[sxx, sxy], [sxy, syy]]}, turned to point along {@code (hx, hy)}. */
        private void direction(double sxx, double syy, double sxy, double hx, double hy) {
            // the angle of the major axis: tan 2θ = 2 sxy / (sxx - syy) (principal axes of a 2 × 2 tensor)
            double th = 0.5 * Math.atan2(2 * sxy, sxx - syy);
            double ux = Math.cos(th), uy = Math.sin(th);
            if (ux * hx + uy * hy < 0) {
                ux = -ux;
                uy = -uy;
            }
            dx = ux;
            dy = uy;
        }

        /** {@code Σ w ((p - c)·n)²} with {@code n = (-dy, dx)}, from the (weighted) scatter sums. */
        private static double orthogonal(double sxx, double syy, double sxy, double dx, double dy) {
            return dy * dy * sxx - 2 * dx * dy * sxy + dx * dx * syy;
        }
    }

    /** Median by quickselect (Hoare's FIND, Comm. ACM 4(7), 1961), in place on the first {@code m} entries. */
    static final class Select {
        private Select() {}

        static double median(double[] a, int m) {
            if (m == 0) return 0;
            int k = m / 2;
            double hi = select(a, 0, m - 1, k);
            if ((m & 1) == 1) return hi;
            double lo = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < k; i++) lo = Math.max(lo, a[i]);
            return 0.5 * (lo + hi);
        }

        private static double select(double[] a, int lo, int hi, int k) {
            while (lo < hi) {
                double pivot = a[(lo + hi) >>> 1];
                int i = lo, j = hi;
                while (i <= j) {
                    while (a[i] < pivot) i++;
                    while (a[j] > pivot) j--;
                    if (i <= j) {
                        double tmp = a[i];
                        a[i] = a[j];
                        a[j] = tmp;
                        i++;
                        j--;
                    }
                }
                if (k <= j) hi = j;
                else if (k >= i) lo = i;
                else return a[k];
            }
            return a[k];
        }
    }
}
