package org.arcwright.zone;

import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/** One piece of a nominal contour: a straight line or a circular arc, traversed in a direction. */
public sealed interface Segment permits Segment.Line, Segment.Arc {
    Point2 start();

    Point2 end();

    double length();

    /**
     * Finds the point of this segment nearest to {@code (x, y)} and writes into {@code out}:
     * [0] distance along this segment (0..length), [1] x and [2] y of the nearest point,
     * [3] x and [4] y of the unit left normal there (left of the direction of travel).
     */
    void nearest(double x, double y, double[] out);

    /** A straight segment from {@code from} to {@code to}. */
    record Line(Point2 from, Point2 to) implements Segment {
        public Line {
            if (from.distance(to) == 0) throw InputProblem.ofField("segment", "a line must have two distinct ends");
        }

        @Override public Point2 start() { return from; }
        @Override public Point2 end() { return to; }
        @Override public double length() { return from.distance(to); }

        @Override
        public void nearest(double x, double y, double[] out) {
            double dx = to.x() - from.x(), dy = to.y() - from.y();
            double len = Math.sqrt(dx * dx + dy * dy);
            double ux = dx / len, uy = dy / len;
            double t = (x - from.x()) * ux + (y - from.y()) * uy;
            if (t < 0) t = 0;
            else if (t > len) t = len;
            out[0] = t;
            out[1] = from.x() + ux * t;
            out[2] = from.y() + uy * t;
            out[3] = -uy;
            out[4] = ux;
        }
    }

    /**
     * A circular arc about {@code centre}, starting at angle {@code startAngle} (radians from +x) and
     * turning through {@code sweep} (positive counter-clockwise, |sweep| &lt; 2π).
     */
    record Arc(Point2 centre, double radius, double startAngle, double sweep) implements Segment {
        public Arc {
            if (!(radius > 0) || !Double.isFinite(radius)) throw InputProblem.ofField("radius", "an arc needs a radius above zero, got " + DecimalText.exact(radius));
            if (!(Math.abs(sweep) > 0) || Math.abs(sweep) >= 2 * Math.PI) throw InputProblem.ofField("segment", "arc sweep must be non-zero and below a full turn");
        }

        @Override public Point2 start() { return at(startAngle); }
        @Override public Point2 end() { return at(startAngle + sweep); }
        @Override public double length() { return radius * Math.abs(sweep); }

        private Point2 at(double angle) {
            return new Point2(centre.x() + radius * Math.cos(angle), centre.y() + radius * Math.sin(angle));
        }

        @Override
        public void nearest(double x, double y, double[] out) {
            double dx = x - centre.x(), dy = y - centre.y();
            double phi = Math.atan2(dy, dx);
            // angle travelled from the start in the direction of the sweep, in [0, 2π)
            double rel = sweep > 0 ? phi - startAngle : startAngle - phi;
            rel = rel - 2 * Math.PI * Math.floor(rel / (2 * Math.PI));
            double abs = Math.abs(sweep);
            double along;
            if (rel <= abs) {
                along = rel;
            } else {
                // beyond either end: the nearer end wins
                along = (rel - abs) < (2 * Math.PI - rel) ? abs : 0;
            }
            double ang = startAngle + Math.signum(sweep) * along;
            double c = Math.cos(ang), s = Math.sin(ang);
            out[0] = along * radius;
            out[1] = centre.x() + radius * c;
            out[2] = centre.y() + radius * s;
            // counter-clockwise travel has the centre on its left
            double k = sweep > 0 ? -1 : 1;
            out[3] = k * c;
            out[4] = k * s;
        }
    }
}
