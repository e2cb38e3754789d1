package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.List;
import org.arcwright.tolerance.CrescentZone;

/**
 * The Zone view's drawing in part coordinates (drawing units): the vertex at the origin, the corner's
 * bisector at 45°, the nominal contour (surface, blend, surface) and the zone boundaries with their
 * deviation from nominal multiplied by the magnification, so a 0.04 mm crescent can be seen on a
 * 2 mm fillet. Pure geometry for display; conformance is the core's job.
 *
 * <p>An arc of radius r tangent to both surfaces has its centre on the bisector at {@code r/sin(θ/2)}
 * from the vertex and touches the surfaces {@code r/tan(θ/2)} from it (see {@link CrescentZone}).
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
public record ZonePicture(List<Pt> nominal, List<Pt> lower, List<Pt> upper, double crescentWidth,
                          double magnification, String caption, ZoneSpec spec, String distortion) {

    /** A point in drawing units. */
    public record Pt(double x, double y) {}

    private static final int ARC_STEPS = 72;

    public static ZonePicture of(ZoneSpec spec, double magnification) {
        return of(spec, magnification, "");
    }

    /** The picture of {@code spec} at {@code magnification}, its figures in {@code units} (a symbol, e.g. mm). */
    public static ZonePicture of(ZoneSpec spec, double magnification, String units) {
        String u = units.isEmpty() ? "" : " " + units;
        if (!(magnification >= 1)) throw new IllegalArgumentException("magnification must be at least 1, got " + magnification);
        double th = Math.toRadians(spec.angleDeg());
        double r = spec.nominal();
        double reach = 1.35 * extentRadius(spec, magnification) / Math.tan(th / 2) + 0.5 * r;
        List<Pt> nominal = contour(r, th, reach);
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
            return new ZonePicture(nominal, contour(lo, th, reach), contour(hi, th, reach), w, magnification, what, spec,
                    distortion);
        }
        if (spec instanceof ZoneSpec.Band b) {
            double addMaterial = b.outward();
            double removeMaterial = b.zone() - b.outward();
            // Vertex side is the add-material side of a round, the remove-material side of a fillet.
            boolean round = b.kind() == org.arcwright.model.BlendKind.ROUND;
            double towardVertex = round ? addMaterial : removeMaterial;
            double away = round ? removeMaterial : addMaterial;
            List<Pt> lower = offset(nominal, r, th, reach, magnification * towardVertex);
            List<Pt> upper = offset(nominal, r, th, reach, -magnification * away);
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
     * Where a measured point at true size {@code p} is drawn, magnified as the zone is. Under limit
     * arcs a point on the blend of radius ρ is drawn at the same place along the blend of radius
     * {@code r + M(ρ - r)}, so a point on a limit arc is drawn on that limit arc; about a profile
     * band, and beside the legs, its distance from the nominal along the normal is multiplied by M,
     * as the band's boundaries are (and so is a point whose magnified blend would have no radius left).
     */
    public Pt place(Pt p) {
        double th = Math.toRadians(spec.angleDeg());
        double r = spec.nominal();
        double m = magnification;
        if (spec instanceof ZoneSpec.LimitArcs && m != 1 && insideAngle(p, th)) {
            double rho = blendRadiusThrough(p, th);
            Pt c = centre(rho, th);
            if (onArc(p, c, th)) {
                // a blend magnified below radius 0 has no arc to lie on: such a point falls back on the
                // normal below, which meets the arc mapping at the vertex on the bisector
                double k = r + m * (rho - r);
                double d = Math.hypot(p.x() - c.x(), p.y() - c.y());
                if (k > 1e-9 && d > 0) {
                    Pt c2 = centre(k, th);
                    return new Pt(c2.x() + k * (p.x() - c.x()) / d, c2.y() + k * (p.y() - c.y()) / d);
                }
            }
        }
        Foot f = foot(p, r, th);
        return new Pt(f.x() + m * f.toward() * f.nx(), f.y() + m * f.toward() * f.ny());
    }

    /**
     * Signed distance of {@code p} (true size) from the nominal contour: positive on the air side,
     * negative in the material (as the inspection core signs profile deviations). A round's air is
     * on the vertex side of its blend, a fillet's on the far side.
     */
    public double deviationTowardAir(Pt p) {
        double d = foot(p, spec.nominal(), Math.toRadians(spec.angleDeg())).toward();
        return spec.kind() == org.arcwright.model.BlendKind.ROUND ? d : -d;
    }

    /**
     * The nearest point of the nominal contour, the unit normal there toward the vertex side, and the
     * distance of {@code p} along it (negative on the far side).
     */
    private record Foot(double x, double y, double nx, double ny, double toward) {}

    private static Foot foot(Pt p, double r, double th) {
        double beta = Math.PI / 4;
        Pt c = centre(r, th);
        double l1x = Math.cos(beta - th / 2), l1y = Math.sin(beta - th / 2);
        double l2x = Math.cos(beta + th / 2), l2y = Math.sin(beta + th / 2);
        double along1 = (p.x() - c.x()) * l1x + (p.y() - c.y()) * l1y;
        double along2 = (p.x() - c.x()) * l2x + (p.y() - c.y()) * l2y;
        if (along1 > 0 || along2 > 0) {
            // beside a leg: the normal toward the vertex side is the leg's outward normal
            boolean first = along1 > 0 && (along2 <= 0 || legDistance(p, l1x, l1y) <= legDistance(p, l2x, l2y));
            double lx = first ? l1x : l2x, ly = first ? l1y : l2y;
            double nx = first ? ly : -ly, ny = first ? -lx : lx;
            double t = p.x() * lx + p.y() * ly;
            double h = p.x() * nx + p.y() * ny;
            return new Foot(t * lx, t * ly, nx, ny, h);
        }
        double d = Math.hypot(p.x() - c.x(), p.y() - c.y());
        if (d == 0) return new Foot(c.x() - r * Math.cos(beta), c.y() - r * Math.sin(beta), -Math.cos(beta), -Math.sin(beta), -r);
        double nx = (p.x() - c.x()) / d, ny = (p.y() - c.y()) / d;
        return new Foot(c.x() + r * nx, c.y() + r * ny, nx, ny, d - r);
    }

    private static double legDistance(Pt p, double lx, double ly) { return Math.abs(p.x() * ly - p.y() * lx); }

    /** Centre of the blend of radius {@code r} tangent to both legs: on the bisector at r/sin(θ/2). */
    private static Pt centre(double r, double th) {
        double dc = r / Math.sin(th / 2);
        return new Pt(dc * Math.cos(Math.PI / 4), dc * Math.sin(Math.PI / 4));
    }

    private static boolean insideAngle(Pt p, double th) {
        double a = Math.atan2(p.y(), p.x());
        return Math.abs(a - Math.PI / 4) < th / 2 && Math.hypot(p.x(), p.y()) > 0;
    }

    private static boolean onArc(Pt p, Pt c, double th) {
        double beta = Math.PI / 4;
        double along1 = (p.x() - c.x()) * Math.cos(beta - th / 2) + (p.y() - c.y()) * Math.sin(beta - th / 2);
        double along2 = (p.x() - c.x()) * Math.cos(beta + th / 2) + (p.y() - c.y()) * Math.sin(beta + th / 2);
        return along1 <= 0 && along2 <= 0;
    }

    /**
     * Radius of the blend tangent to both legs through {@code p} inside the angle, the larger root of
     * {@code |p - u ρ/sin α| = ρ} (as {@code org.arcwright.zone.Corner#blendRadiusThrough}).
     */
    private static double blendRadiusThrough(Pt p, double th) {
        double a = th / 2;
        double s = 1 / Math.sin(a);
        double cot2 = 1 / (Math.tan(a) * Math.tan(a));
        double qu = (p.x() + p.y()) * Math.cos(Math.PI / 4);
        double q2 = p.x() * p.x() + p.y() * p.y();
        return (s * qu + Math.sqrt(Math.max(0, s * s * qu * qu - cot2 * q2))) / cot2;
    }

    /** Shortest distance from {@code p} to the nominal contour, in drawing units. */
    public double distanceToNominal(Pt p) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 1; i < nominal.size(); i++) best = Math.min(best, segmentDistance(p, nominal.get(i - 1), nominal.get(i)));
        return best;
    }

    /**
     * The part's material near the corner as a closed outline, for shading: inside the corner for a
     * round, outside it (with the fillet's added material) for a fillet.
     */
    public List<Pt> material(org.arcwright.model.BlendKind kind, double angleDeg) {
        List<Pt> out = new ArrayList<>(nominal);
        Pt first = nominal.get(0);
        Pt last = nominal.get(nominal.size() - 1);
        if (kind == org.arcwright.model.BlendKind.ROUND) {
            out.add(new Pt(last.x() + first.x(), last.y() + first.y()));
            return out;
        }
        double th = Math.toRadians(angleDeg);
        double beta = Math.PI / 4;
        double m = 0.2 * Math.hypot(first.x(), first.y());
        double n1 = beta - th / 2 - Math.PI / 2;
        double n2 = beta + th / 2 + Math.PI / 2;
        double d = m / Math.sin(th / 2);
        out.add(new Pt(last.x() + m * Math.cos(n2), last.y() + m * Math.sin(n2)));
        out.add(new Pt(-d * Math.cos(beta), -d * Math.sin(beta)));
        out.add(new Pt(first.x() + m * Math.cos(n1), first.y() + m * Math.sin(n1)));
        return out;
    }

    /** All points drawn, for fitting the view. */
    public List<Pt> allPoints() {
        List<Pt> all = new ArrayList<>(nominal);
        all.addAll(lower);
        all.addAll(upper);
        return all;
    }

    private static double extentRadius(ZoneSpec spec, double m) {
        if (spec instanceof ZoneSpec.LimitArcs a) return spec.nominal() + m * (a.max() - spec.nominal());
        if (spec instanceof ZoneSpec.Band b) return spec.nominal() + m * b.zone();
        return spec.nominal();
    }

    /** Surface 1, the blend of radius r, surface 2; the bisector points at 45°. */
    static List<Pt> contour(double r, double th, double reach) {
        double beta = Math.PI / 4;
        double a1 = beta - th / 2;
        double a2 = beta + th / 2;
        double dc = r / Math.sin(th / 2);
        double dt = r / Math.tan(th / 2);
        double cx = dc * Math.cos(beta);
        double cy = dc * Math.sin(beta);
        List<Pt> pts = new ArrayList<>();
        double far = Math.max(reach, dt * 1.2);
        pts.add(new Pt(far * Math.cos(a1), far * Math.sin(a1)));
        for (int i = 0; i <= ARC_STEPS; i++) {
            double t = (double) i / ARC_STEPS;
            double phi = beta + Math.PI - (t - 0.5) * (Math.PI - th);
            pts.add(new Pt(cx + r * Math.cos(phi), cy + r * Math.sin(phi)));
        }
        pts.add(new Pt(far * Math.cos(a2), far * Math.sin(a2)));
        return pts;
    }

    /** The contour moved {@code d} toward the vertex side along its normal (negative: away). */
    static List<Pt> offset(List<Pt> contour, double r, double th, double reach, double d) {
        double beta = Math.PI / 4;
        double dc = r / Math.sin(th / 2);
        double cx = dc * Math.cos(beta);
        double cy = dc * Math.sin(beta);
        List<Pt> out = new ArrayList<>();
        double n1 = beta - th / 2 - Math.PI / 2;
        double n2 = beta + th / 2 + Math.PI / 2;
        Pt first = contour.get(0);
        out.add(new Pt(first.x() + d * Math.cos(n1), first.y() + d * Math.sin(n1)));
        for (int i = 1; i < contour.size() - 1; i++) {
            Pt p = contour.get(i);
            double nx = (p.x() - cx) / r;
            double ny = (p.y() - cy) / r;
            out.add(new Pt(p.x() + d * nx, p.y() + d * ny));
        }
        Pt last = contour.get(contour.size() - 1);
        out.add(new Pt(last.x() + d * Math.cos(n2), last.y() + d * Math.sin(n2)));
        return out;
    }

    private static double segmentDistance(Pt p, Pt a, Pt b) {
        double dx = b.x() - a.x();
        double dy = b.y() - a.y();
        double len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p.x() - a.x()) * dx + (p.y() - a.y()) * dy) / len2));
        return Math.hypot(p.x() - (a.x() + t * dx), p.y() - (a.y() + t * dy));
    }
}
