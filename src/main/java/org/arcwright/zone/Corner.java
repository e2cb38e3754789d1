package org.arcwright.zone;

import java.util.List;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.model.BlendKind;

/**
 * Two straight adjacent surfaces meeting at a vertex, seen in a section perpendicular to the edge,
 * and the family of blends (arcs) tangent to both.
 *
 * <p>With half the included angle {@code α}, an arc of radius {@code ρ} tangent to both legs has
 * its centre on the bisector at {@code ρ / sin α} from the vertex and touches each leg at
 * {@code ρ · cot α} from it (plane geometry). Every point strictly inside the angle lies on exactly
 * one such blend: by the homothety about the vertex, each ray from the vertex meets the unit blend
 * once. Solving {@code |q - u ρ/sin α| = ρ} for {@code q = p - V} gives
 * {@code ρ = (s·(q·u) + √(s²(q·u)² - cot²α |q|²)) / cot²α} with {@code s = 1/sin α}, the larger
 * root (the smaller one is the far side of a smaller circle).
 *
 * @param vertex where the two surfaces meet (the sharp corner)
 * @param legA unit direction along the first surface, away from the vertex
 * @param legB unit direction along the second surface, away from the vertex
 * @param kind which side the material is on
 */
public record Corner(Point2 vertex, Point2 legA, Point2 legB, BlendKind kind) {
    /** Smallest and largest included angle accepted, degrees: outside this the zone degenerates. */
    public static final double MIN_ANGLE_DEG = 1, MAX_ANGLE_DEG = 179;

    public Corner {
        if (vertex == null) throw InputProblem.ofField("vertex", "missing");
        if (legA == null) throw InputProblem.ofField("legA", "missing");
        if (legB == null) throw InputProblem.ofField("legB", "missing");
        if (kind == null) throw InputProblem.ofField("kind", "missing; use round or fillet");
        if (!(legA.length() > 0)) throw InputProblem.ofField("legA", "must not be zero");
        if (!(legB.length() > 0)) throw InputProblem.ofField("legB", "must not be zero");
        legA = legA.unit();
        legB = legB.unit();
        double deg = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, legA.dot(legB)))));
        if (deg < MIN_ANGLE_DEG || deg > MAX_ANGLE_DEG) {
            throw InputProblem.ofField("legB", "the legs are parallel or nearly so (included angle "
                    + DecimalText.places(deg, 3) + "°); need " + DecimalText.exact(MIN_ANGLE_DEG) + "° to "
                    + DecimalText.exact(MAX_ANGLE_DEG) + "°");
        }
    }

    /** Included angle between the surfaces, degrees. */
    public double includedAngleDeg() { return Math.toDegrees(2 * halfAngle()); }

    /** Half the included angle, radians. */
    public double halfAngle() { return Math.acos(cosIncluded()) / 2; }

    /**
     * The sine of half the included angle, from {@code cos 2α = legA·legB} by the half-angle identity
     * {@code sin α = √((1 - cos 2α)/2)}: the blend's lengths need only this and the cosine, and the
     * identities spare an inverse cosine and a tangent on every call (a simulation makes several per
     * part).
     */
    private double sinHalf() { return Math.sqrt((1 - cosIncluded()) / 2); }

    /** The cosine of half the included angle, {@code √((1 + cos 2α)/2)}. */
    private double cosHalf() { return Math.sqrt((1 + cosIncluded()) / 2); }

    private double cosIncluded() { return Math.max(-1, Math.min(1, legA.dot(legB))); }

    /** Unit bisector, pointing into the angle. */
    public Point2 bisector() { return legA.plus(legB).unit(); }

    /** Unit normal of leg A pointing into the angle (toward leg B). */
    public Point2 inwardNormalA() {
        Point2 n = legA.left();
        return n.dot(legB) > 0 ? n : n.times(-1);
    }

    /** Unit normal of leg B pointing into the angle (toward leg A). */
    public Point2 inwardNormalB() {
        Point2 n = legB.left();
        return n.dot(legA) > 0 ? n : n.times(-1);
    }

    /** Centre of the blend of radius {@code r}. */
    public Point2 centre(double r) { return vertex.plus(bisector().times(r / sinHalf())); }

    /** Where the blend of radius {@code r} touches leg A. */
    public Point2 tangentA(double r) { return vertex.plus(legA.times(tangentDistance(r))); }

    /** Where the blend of radius {@code r} touches leg B. */
    public Point2 tangentB(double r) { return vertex.plus(legB.times(tangentDistance(r))); }

    /** Distance from the vertex to the tangent points of the blend of radius {@code r}. */
    public double tangentDistance(double r) { return r * cosHalf() / sinHalf(); }

    /**
     * Radius of the blend through the point {@code (x, y)}, which must lie strictly inside the angle
     * (see the class comment for the formula).
     */
    public double blendRadiusThrough(double x, double y) {
        double sin = sinHalf(), cos = cosHalf();
        double s = 1 / sin;
        double cot2 = cos * cos / (sin * sin);
        Point2 u = bisector();
        double qx = x - vertex.x(), qy = y - vertex.y();
        double qu = qx * u.x() + qy * u.y();
        double q2 = qx * qx + qy * qy;
        double disc = Math.max(0, s * s * qu * qu - cot2 * q2);
        return (s * qu + Math.sqrt(disc)) / cot2;
    }

    /**
     * The nominal contour with a blend of radius {@code r}: leg A from {@code reach} out to its
     * tangent point, the arc, then leg B out to {@code reach}, with the air side set by the kind.
     *
     * @param reach distance from the vertex at which the legs are cut off; must exceed the tangent
     *     distance
     */
    public Contour contour(double r, double reach) {
        if (!(r >= 0) || !Double.isFinite(r)) throw InputProblem.ofField("nominalRadius", "must be zero or more, got " + DecimalText.exact(r));
        double t = tangentDistance(r);
        double far = Math.max(reach, 2 * t + 1e-9);
        Point2 farA = vertex.plus(legA.times(far));
        Point2 farB = vertex.plus(legB.times(far));
        Point2 ta = tangentA(r);
        Point2 tb = tangentB(r);
        Point2 travelA = legA.times(-1);
        // Air is outside the angle for a round, inside it for a fillet.
        boolean leftIsInside = travelA.left().dot(inwardNormalA()) > 0;
        Side air = (kind == BlendKind.FILLET) == leftIsInside ? Side.LEFT : Side.RIGHT;
        if (r == 0) {
            return new Contour(List.of(new Segment.Line(farA, vertex), new Segment.Line(vertex, farB)), air);
        }
        Point2 c = centre(r);
        double start = Math.atan2(ta.y() - c.y(), ta.x() - c.x());
        double end = Math.atan2(tb.y() - c.y(), tb.x() - c.x());
        double sweep = Math.PI - 2 * halfAngle();
        Point2 ccwTangent = new Point2(-Math.sin(start), Math.cos(start));
        if (ccwTangent.dot(travelA) < 0) sweep = -sweep;
        double expectEnd = start + sweep;
        if (Math.abs(Math.IEEEremainder(expectEnd - end, 2 * Math.PI)) > 1e-6) {
            throw new IllegalStateException("blend arc does not reach the second tangent point");
        }
        return new Contour(List.of(new Segment.Line(farA, ta), new Segment.Arc(c, r, start, sweep),
                new Segment.Line(tb, farB)), air);
    }
}
