package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.List;
import org.arcwright.io.DecimalText;
import org.arcwright.model.BlendKind;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;

/**
 * The Zone view's drawing in part coordinates (drawing units): the vertex at the origin, the corner's
 * bisector at 45°, the nominal contour (surface, blend, surface) and the zone boundaries with their
 * deviation from nominal multiplied by the magnification, so a 0.04 mm crescent can be seen on a
 * 2 mm fillet. Pure geometry for display; conformance is the core's job.
 *
 * <p>The blends, their centres and tangent points and the nearest point of the nominal all come from
 * the zone package's {@link Corner} and {@link org.arcwright.zone.Contour}, the geometry the
 * inspection judges with; the crescent's width from {@link CrescentZone}.
 *
 * @param nominal the nominal contour
 * @param lower the boundary toward the vertex (smaller radius, or the profile band's vertex side)
 * @param upper the boundary away from the vertex
 * @param crescentWidth the true zone width on the bisector (not magnified), or NaN without a zone
 * @param magnification the factor applied to deviations from nominal
 * @param caption what is drawn, in words, with the units
 * @param spec the zone drawn, which {@link #place} follows so that measured points and the zone are
 *     magnified alike
 * @param distortion empty, or in words how the magnification misdraws a boundary: a limit arc or band
 *     edge magnified below radius zero is drawn as a sharp corner, which the part does not have
 */
public record ZonePicture(List<Point2> nominal, List<Point2> lower, List<Point2> upper, double crescentWidth,
                          double magnification, String caption, ZoneSpec spec, String distortion) {

    private static final int ARC_STEPS = 72;
    /** Direction of the view's bisector, radians. */
    private static final double BISECTOR = Math.PI / 4;

    public static ZonePicture of(ZoneSpec spec, double magnification) {
        return of(spec, magnification, "");
    }

    /** The picture of {@code spec} at {@code magnification}, its figures in {@code units} (a symbol, e.g. mm). */
    public static ZonePicture of(ZoneSpec spec, double magnification, String units) {
        String u = units.isEmpty() ? "" : " " + units;
        if (!(magnification >= 1)) throw new IllegalArgumentException("magnification must be at least 1, got " + DecimalText.exact(magnification));
        Corner k = viewCorner(spec.angleDeg(), spec.kind());
        double r = spec.nominal();
        double reach = 1.35 * k.tangentDistance(extentRadius(spec, magnification)) + 0.5 * r;
        List<Point2> nominal = contour(k, r, reach);
        if (spec instanceof ZoneSpec.LimitArcs a) {
            double lo = Math.max(1e-9, r + magnification * (a.min() - r));
            double hi = r + magnification * (a.max() - r);
            double w = CrescentZone.of(a.min(), Math.min(Math.max(r, a.min()), a.max()), a.max(), spec.angleDeg()).width();
            String what = (a.controlled() ? "CR" : "R") + " limits " + Numbers.trim(a.min()) + " to " + Numbers.trim(a.max()) + u;
            double drawn = r + magnification * (a.min() - r);
            String distortion = "";
            if (a.min() < r && drawn <= 1e-9 * r) {
                // the magnified radius r + M(min - r) is zero or less: no arc is left to draw
                distortion = "At ×" + Numbers.trim(magnification) + " the smaller limit arc R" + Numbers.trim(a.min()) + u
                        + " would need a radius of " + Numbers.trim(r) + " + " + Numbers.trim(magnification) + " × ("
                        + Numbers.trim(a.min()) + " − " + Numbers.trim(r) + ") = " + Numbers.fixed(drawn, 3) + u
                        + ", so it is drawn as a sharp corner. The part has no sharp corner: its smallest radius is "
                        + Numbers.trim(a.min()) + u + ". At ×" + Numbers.trim(maxArcMagnification(r, r - a.min()))
                        + " or less the limit is drawn as an arc.";
            }
            return new ZonePicture(nominal, contour(k, lo, reach), contour(k, hi, reach), w, magnification, what, spec,
                    distortion);
        }
        if (spec instanceof ZoneSpec.Band b) {
            double addMaterial = b.outward();
            double removeMaterial = b.zone() - b.outward();
            // Vertex side is the add-material side of a round, the remove-material side of a fillet.
            boolean round = b.kind() == BlendKind.ROUND;
            double towardVertex = round ? addMaterial : removeMaterial;
            double away = round ? removeMaterial : addMaterial;
            List<Point2> lower = boundary(k, r, reach, magnification * towardVertex);
            List<Point2> upper = boundary(k, r, reach, -magnification * away);
            String distortion = "";
            if (r - magnification * away <= 1e-9 * r) {
                // the boundary on the centre side is the blend offset by M × its share of the zone toward the centre
                distortion = "At ×" + Numbers.trim(magnification) + " the zone's boundary on the centre side of the blend"
                        + " would need a radius of " + Numbers.trim(r) + " − " + Numbers.trim(magnification) + " × "
                        + Numbers.trim(away) + " = " + Numbers.fixed(r - magnification * away, 3) + u
                        + ", so it folds over and looks like a sharp corner. The zone itself is "
                        + Numbers.trim(b.zone()) + u + " wide. At ×" + Numbers.trim(maxArcMagnification(r, away))
                        + " or less it is drawn as an arc.";
            }
            return new ZonePicture(nominal, lower, upper, b.zone(), magnification,
                    "profile zone " + Numbers.trim(b.zone()) + u + (Math.abs(b.outward() - b.zone() / 2) > 1e-12
                            ? " (" + Numbers.trim(b.outward()) + u + " add-material side)" : " equally disposed"), spec, distortion);
        }
        return new ZonePicture(nominal, List.of(), List.of(), Double.NaN, magnification, "nominal only: no tolerance yet",
                spec, "");
    }

    /** The largest whole magnification M at which an arc of radius r shrunk by M × shrink keeps a radius. */
    private static double maxArcMagnification(double r, double shrink) {
        return Math.max(1, Math.floor(r / shrink - 1e-9));
    }

    /**
     * The corner as the view draws it: the vertex at the origin, the bisector at 45°, leg A at
     * {@code 45° - θ/2} and leg B at {@code 45° + θ/2}. Every blend, centre and tangent point of the
     * picture comes from this {@link Corner}, so the view and the inspection share one geometry.
     */
    public static Corner viewCorner(double angleDeg, BlendKind kind) {
        double half = Math.toRadians(angleDeg) / 2;
        return new Corner(new Point2(0, 0), new Point2(Math.cos(BISECTOR - half), Math.sin(BISECTOR - half)),
                new Point2(Math.cos(BISECTOR + half), Math.sin(BISECTOR + half)), kind);
    }

    private Corner corner() { return viewCorner(spec.angleDeg(), spec.kind()); }

    /**
     * Where a measured point at true size {@code p} is drawn, magnified as the zone is. Under limit
     * arcs a point on the blend of radius ρ is drawn at the same place along the blend of radius
     * {@code r + M(ρ - r)}, so a point on a limit arc is drawn on that limit arc; about a profile
     * band, and beside the legs, its distance from the nominal along the normal is multiplied by M,
     * as the band's boundaries are (and so is a point whose magnified blend would have no radius left).
     */
    public Point2 place(Point2 p) {
        Corner k = corner();
        double r = spec.nominal();
        double m = magnification;
        if (spec instanceof ZoneSpec.LimitArcs && m != 1 && insideAngle(k, p)) {
            double rho = k.blendRadiusThrough(p.x(), p.y());
            Point2 c = k.centre(rho);
            if (onArc(k, p, c)) {
                // a blend magnified below radius 0 has no arc to lie on: such a point falls back on the
                // normal below, which meets the arc mapping at the vertex on the bisector
                double drawn = r + m * (rho - r);
                double d = p.distance(c);
                if (drawn > 1e-9 && d > 0) return k.centre(drawn).plus(p.minus(c).times(drawn / d));
            }
        }
        Foot f = foot(k, p, r);
        return f.at().plus(f.towardVertex().times(m * f.distance()));
    }

    /**
     * Signed distance of {@code p} (true size) from the nominal contour: positive on the air side,
     * negative in the material (as the inspection core signs profile deviations).
     */
    public double deviationTowardAir(Point2 p) {
        double[] out = new double[4];
        Corner k = corner();
        k.contour(spec.nominal(), reach(k, p, spec.nominal())).measure(p.x(), p.y(), out, new double[5]);
        return out[0];
    }

    /**
     * The nearest point of the nominal contour, the unit normal there toward the vertex side, and the
     * distance of {@code p} along it (negative on the far side).
     */
    private record Foot(Point2 at, Point2 towardVertex, double distance) {}

    /**
     * The foot on the nominal contour, measured by {@link org.arcwright.zone.Contour#measure}: a
     * round's air is on the vertex side of its blend and legs, a fillet's on the far side.
     */
    private static Foot foot(Corner k, Point2 p, double r) {
        double[] out = new double[4];
        k.contour(r, reach(k, p, r)).measure(p.x(), p.y(), out, new double[5]);
        Point2 towardAir = new Point2(out[1], out[2]);
        Point2 at = p.minus(towardAir.times(out[0]));
        double side = k.kind() == BlendKind.ROUND ? 1 : -1;
        return new Foot(at, towardAir.times(side), side * out[0]);
    }

    /** Legs long enough that the nearest point of {@code p} on them is its perpendicular foot. */
    private static double reach(Corner k, Point2 p, double r) {
        return 2 * (p.distance(k.vertex()) + k.tangentDistance(r)) + 1;
    }

    private static boolean insideAngle(Corner k, Point2 p) {
        Point2 q = p.minus(k.vertex());
        return q.length() > 0 && q.dot(k.inwardNormalA()) > 0 && q.dot(k.inwardNormalB()) > 0;
    }

    /** Whether {@code p} lies beside the arc of centre {@code c}, between its tangent points, not beside a leg. */
    private static boolean onArc(Corner k, Point2 p, Point2 c) {
        Point2 q = p.minus(c);
        return q.dot(k.legA()) <= 0 && q.dot(k.legB()) <= 0;
    }

    /** Shortest distance from {@code p} to the nominal contour, in drawing units. */
    public double distanceToNominal(Point2 p) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 1; i < nominal.size(); i++) best = Math.min(best, segmentDistance(p, nominal.get(i - 1), nominal.get(i)));
        return best;
    }

    /**
     * The part's material near the corner as a closed outline, for shading: inside the corner for a
     * round, outside it (with the fillet's added material) for a fillet.
     */
    public List<Point2> material(BlendKind kind, double angleDeg) {
        List<Point2> out = new ArrayList<>(nominal);
        Point2 first = nominal.get(0);
        Point2 last = nominal.get(nominal.size() - 1);
        if (kind == BlendKind.ROUND) {
            out.add(last.plus(first));
            return out;
        }
        Corner k = viewCorner(angleDeg, kind);
        double m = 0.2 * first.length();
        // a strip of width m behind each leg; the strips' edges meet where the centre of the blend of
        // radius m lies, mirrored through the vertex
        out.add(last.minus(k.inwardNormalB().times(m)));
        out.add(k.vertex().times(2).minus(k.centre(m)));
        out.add(first.minus(k.inwardNormalA().times(m)));
        return out;
    }

    /** All points drawn, for fitting the view. */
    public List<Point2> allPoints() {
        List<Point2> all = new ArrayList<>(nominal);
        all.addAll(lower);
        all.addAll(upper);
        return all;
    }

    private static double extentRadius(ZoneSpec spec, double m) {
        if (spec instanceof ZoneSpec.LimitArcs a) return spec.nominal() + m * (a.max() - spec.nominal());
        if (spec instanceof ZoneSpec.Band b) return spec.nominal() + m * b.zone();
        return spec.nominal();
    }

    /** Surface 1, the blend of radius r, surface 2, as the polyline drawn. */
    static List<Point2> contour(Corner k, double r, double reach) {
        return boundary(k, r, reach, 0);
    }

    /**
     * The nominal of radius {@code r} moved {@code d} toward the vertex side along its normal
     * (negative: away): the legs moved out of the angle by d, the blend's radius grown by d about
     * the same centre (a radius below zero folds the arc over, as the distortion warning says).
     */
    static List<Point2> boundary(Corner k, double r, double reach, double d) {
        double far = Math.max(reach, k.tangentDistance(r) * 1.2);
        Point2 c = k.centre(r);
        Point2 ta = k.tangentA(r).minus(c), tb = k.tangentB(r).minus(c);
        double start = Math.atan2(ta.y(), ta.x());
        double sweep = Math.IEEEremainder(Math.atan2(tb.y(), tb.x()) - start, 2 * Math.PI);
        List<Point2> pts = new ArrayList<>(ARC_STEPS + 3);
        pts.add(k.vertex().plus(k.legA().times(far)).minus(k.inwardNormalA().times(d)));
        for (int i = 0; i <= ARC_STEPS; i++) {
            double a = start + sweep * i / ARC_STEPS;
            pts.add(c.plus(new Point2(Math.cos(a), Math.sin(a)).times(r + d)));
        }
        pts.add(k.vertex().plus(k.legB().times(far)).minus(k.inwardNormalB().times(d)));
        return pts;
    }

    private static double segmentDistance(Point2 p, Point2 a, Point2 b) {
        Point2 ab = b.minus(a);
        double len2 = ab.dot(ab);
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, p.minus(a).dot(ab) / len2));
        return p.distance(a.plus(ab.times(t)));
    }
}
