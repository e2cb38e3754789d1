package org.arcwright.inspect;

/** A circle of the section plane: centre and radius in drawing units. */
public record Circle(double cx, double cy, double r) {
    /** Signed distance of a point from the circle, positive outside. */
    public double residual(double x, double y) { return Math.hypot(x - cx, y - cy) - r; }
}
