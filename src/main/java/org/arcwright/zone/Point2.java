package org.arcwright.zone;

import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/** A point or vector of the section plane, in drawing units. Immutable. */
public record Point2(double x, double y) {
    public Point2 {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw InputProblem.ofField(null, "coordinates must be finite numbers, got [" + DecimalText.exact(x) + ", " + DecimalText.exact(y) + "]");
        }
    }

    public Point2 plus(Point2 o) { return new Point2(x + o.x, y + o.y); }

    public Point2 minus(Point2 o) { return new Point2(x - o.x, y - o.y); }

    public Point2 times(double k) { return new Point2(x * k, y * k); }

    public double dot(Point2 o) { return x * o.x + y * o.y; }

    /** z component of the cross product: positive when {@code o} lies counter-clockwise of this. */
    public double cross(Point2 o) { return x * o.y - y * o.x; }

    public double length() { return Math.hypot(x, y); }

    /** This vector turned a quarter counter-clockwise (its left normal). */
    public Point2 left() { return new Point2(-y, x); }

    /** Unit vector in this direction; throws for a zero vector. */
    public Point2 unit() {
        double l = length();
        if (!(l > 0)) throw InputProblem.ofField(null, "a direction must not be zero");
        return new Point2(x / l, y / l);
    }

    public double distance(Point2 o) { return Math.hypot(x - o.x, y - o.y); }

    @Override
    public String toString() { return "[" + DecimalText.exact(x) + ", " + DecimalText.exact(y) + "]"; }
}
