package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointExcesses;
import org.arcwright.inspect.Registration;
import org.arcwright.io.InputProblem;
import org.arcwright.model.BlendKind;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;

/**
 * The measured points of an inspection as the Zone view plots them: moved into the view's frame
 * (vertex at the origin, bisector at 45°; a rigid move, so distances stay true) from the corner the
 * verdict read (for R and CR the one the fitted adjacent surfaces make), placed as the
 * inspection placed them (after any registration of a profile zone), each with its excess over the
 * limits the inspection judged (as {@code ContourPlot} colours them) and a grade for its colour.
 *
 * <p>The worksheet keeps only an inspection's verdict and figures, not its points, so these live in
 * the window's session, per feature, for the inspections run since the worksheet was opened.
 *
 * @param points the points drawn (at most {@link #MAX_DRAWN}, the worst always among them)
 * @param total how many points the inspection had
 * @param angleDeg included angle of the measured corner; the view draws the zone at this angle
 * @param kind fillet or round, as the inspection's corner says
 * @param nominalRadius the nominal radius the inspection judged against
 * @param callout the callout the inspection judged against
 * @param band the width the grades are measured in: the radius band for R and CR, the zone for a profile
 * @param source the file the points came from
 */
public record MeasuredPoints(List<Point> points, int total, double angleDeg, BlendKind kind, double nominalRadius,
                             InspectionCallout callout, double band, String source) {
    /** More points than this are thinned evenly for drawing. */
    public static final int MAX_DRAWN = 20_000;
    /** Inside, but closer than this share of the band to a limit: {@link Grade#NEAR_LIMIT} (as the contour plot). */
    public static final double NEAR_SHARE = PointExcesses.NEAR_SHARE;
    /** Outside by more than this share of the band: {@link Grade#FAR_OUTSIDE}. */
    public static final double FAR_SHARE = 0.5;

    public MeasuredPoints {
        points = List.copyOf(points);
    }

    /** How a point stands against its limits, from comfortably inside to far outside. */
    public enum Grade {
        WITHIN("within"),
        NEAR_LIMIT("near a limit (inside by under 15 % of the band)"),
        OUTSIDE("outside"),
        FAR_OUTSIDE("far outside (by over half the band)"),
        NOT_JUDGED("not judged (beyond the zone's extent)");

        private final String words;

        Grade(String words) { this.words = words; }

        /** For the legend. */
        public String words() { return words; }
    }

    /**
     * One measured point.
     *
     * @param index its place in the measured file, from 0
     * @param x where it lies in the view's frame, true size
     * @param y where it lies in the view's frame, true size
     * @param excess how far beyond the limits (negative: inside by that much), NaN when not judged
     * @param grade its grade
     * @param measure what the excess measures ({@code radius}, {@code distance beyond surface},
     *     {@code distance}), so that it is never read as a length it is not
     */
    public record Point(int index, double x, double y, double excess, Grade grade, String measure) {
        public Point2 at() { return new Point2(x, y); }
    }

    /** The grade of a point {@code excess} beyond limits {@code band} apart. */
    public static Grade grade(double excess, double band) {
        if (Double.isNaN(excess)) return Grade.NOT_JUDGED;
        if (excess > FAR_SHARE * band) return Grade.FAR_OUTSIDE;
        if (excess > 0) return Grade.OUTSIDE;
        if (excess > -NEAR_SHARE * band) return Grade.NEAR_LIMIT;
        return Grade.WITHIN;
    }

    /** The points of {@code r}, or empty when its nominal is not a corner blend (the view draws only corners). */
    public static Optional<MeasuredPoints> of(InspectionResult r, String source) {
        InspectionRequest q = r.request();
        if (!(q.nominal() instanceof Nominal.CornerBlend)) return Optional.empty();
        Nominal.CornerBlend cb = (Nominal.CornerBlend) q.nominal();
        PointExcesses excesses = PointExcesses.of(r);
        // R and CR are judged on the adjacent surfaces fitted to the points, not on the nominal corner:
        // the view's zone is drawn tangent to its legs, so the points go into the frame of the fitted corner
        Corner corner = excesses.radiusZone() != null ? excesses.radiusZone().corner() : cb.corner();
        Registration reg = excesses.registration();
        double band = excesses.allowance();
        Frame frame = new Frame(corner);
        int n = q.points().size();
        int stride = Math.max(1, (n + MAX_DRAWN - 1) / MAX_DRAWN);
        int worst = r.worst() == null ? -1 : r.worst().index();
        double[] xs = q.points().xs(), ys = q.points().ys();
        double[] moved = new double[2];
        // a dynamic profile also moves the nominal toward air by the offset; the view draws the zone
        // about the unmoved nominal, so each point goes back along its normal by the same amount
        double offset = reg == null ? 0 : reg.offset();
        Contour nominal = offset != 0 ? Inspector.nominalContour(q) : null;
        double[] measured = new double[4], work = new double[5];
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (i % stride != 0 && i != worst) continue;
            double x = xs[i], y = ys[i];
            if (reg != null) {
                reg.apply(x, y, moved);
                x = moved[0];
                y = moved[1];
            }
            if (nominal != null) {
                nominal.measure(x, y, measured, work);
                x -= offset * measured[1];
                y -= offset * measured[2];
            }
            double excess = excesses.excess(i);
            Point2 p = frame.toView(x, y);
            out.add(new Point(i, p.x(), p.y(), excess, grade(excess, band), excesses.measure(i)));
        }
        BlendKind kind = corner.kind();
        return Optional.of(new MeasuredPoints(out, n, corner.includedAngleDeg(), kind, cb.radius(), q.callout(), band, source));
    }

    /** The points in each grade, for the caption. */
    public int count(Grade g) {
        int c = 0;
        for (Point p : points) if (p.grade() == g) c++;
        return c;
    }

    /**
     * What the view must say about drawing these points over {@code spec}, the zone of the feature's
     * chosen callout judged by {@code chosen}; empty when they agree. The grades are the
     * inspection's, so a changed callout or nominal makes them stale.
     */
    public String mismatch(ZoneSpec spec, RadiusFeature feature) {
        InspectionCallout chosen;
        try {
            chosen = CheckRequests.callout(feature);
        } catch (InputProblem e) {
            chosen = null;
        }
        return mismatch(spec, chosen);
    }

    /** As {@link #mismatch(ZoneSpec, org.arcwright.worksheet.RadiusFeature)}, for the callout {@code chosen} (null: none). */
    public String mismatch(ZoneSpec spec, InspectionCallout chosen) {
        if (chosen == null || !chosen.equals(callout)) {
            return "points judged against " + callout.describe() + ", not the chosen callout: check them again";
        }
        if (Math.abs(spec.nominal() - nominalRadius) > 1e-9 * Math.max(1, nominalRadius)) {
            return "points measured about nominal R" + Numbers.trim(nominalRadius) + ", the view's nominal is R"
                    + Numbers.trim(spec.nominal());
        }
        if (spec.kind() != kind) return "points measured on a " + kind.key() + ", the feature is a " + spec.kind().key();
        return "";
    }

    /**
     * The rigid move from the inspection's corner to the view's ({@link ZonePicture#viewCorner}):
     * bisector onto bisector, leg A onto leg A (a reflection when leg A lies counter-clockwise of leg B).
     */
    private static final class Frame {
        private final Point2 vertex, u, w, bigU, bigW;

        Frame(Corner c) {
            vertex = c.vertex();
            u = c.bisector();
            w = across(c);
            Corner view = ZonePicture.viewCorner(c.includedAngleDeg(), c.kind());
            bigU = view.bisector();
            bigW = across(view);
        }

        /** Unit direction across the bisector toward leg A. */
        private static Point2 across(Corner c) {
            Point2 a = c.legA(), u = c.bisector();
            return a.minus(u.times(a.dot(u))).unit();
        }

        Point2 toView(double x, double y) {
            Point2 q = new Point2(x - vertex.x(), y - vertex.y());
            return bigU.times(q.dot(u)).plus(bigW.times(q.dot(w)));
        }
    }
}
