package org.arcwright.inspect;

/**
 * How the measured points were moved onto the zone: turned by {@code rotationDeg} about the
 * {@code pivot}, then shifted by {@code (x, y)}; and the uniform offset of the nominal toward air
 * that a dynamic profile allows. All zero for a fully located zone.
 *
 * @param x shift along x, drawing units
 * @param y shift along y, drawing units
 * @param rotationDeg counter-clockwise turn about the pivot, degrees
 * @param offset uniform offset of the nominal contour, positive toward air, drawing units
 * @param pivotX x of the point turned about (the corner's vertex, or the contour's start)
 * @param pivotY y of that point
 */
public record Registration(double x, double y, double rotationDeg, double offset, double pivotX, double pivotY) {
    /** No movement. */
    public static Registration none(double pivotX, double pivotY) {
        return new Registration(0, 0, 0, 0, pivotX, pivotY);
    }

    /** Where a measured point lands after the registration: writes x, y into {@code out}. */
    public void apply(double px, double py, double[] out) {
        double t = Math.toRadians(rotationDeg);
        double c = Math.cos(t), s = Math.sin(t);
        double dx = px - pivotX, dy = py - pivotY;
        out[0] = pivotX + c * dx - s * dy + x;
        out[1] = pivotY + s * dx + c * dy + y;
    }
}
