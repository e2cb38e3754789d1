package org.arcwright.inspect;

/**
 * Minimum-zone (Chebyshev) circle: the two concentric circles closest together that hold every
 * point (ISO 12181-1 minimum zone reference for roundness, from memory).
 *
 * @param cx centre x
 * @param cy centre y
 * @param inner radius of the inner circle
 * @param outer radius of the outer circle
 * @param passes re-linearisations taken
 */
public record MinimumZoneCircle(double cx, double cy, double inner, double outer, int passes) {
    /** Radial width of the zone, {@code outer - inner}. */
    public double width() { return outer - inner; }
}
