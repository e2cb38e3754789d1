package org.arcwright.zone;

/**
 * What a measured contour allows of a radius tolerance.
 *
 * @param smallest the largest minimum radius the contour would still meet; NaN when a point lies
 *     beyond the sharp corner, so that no minimum is met
 * @param largest the smallest maximum radius the contour would still meet
 * @param judged points within the zone's extent (between the largest arc's tangent points)
 * @param onLegs judged points lying on a leg within the resolution
 * @param outside judged points beyond a leg (outside the sharp corner) by more than the resolution
 * @param beyond points past the tangent points of the largest arc, left to the adjacent surfaces
 * @param pass min <= smallest and largest <= max (with the resolution as slack) and none outside
 * @param worst index of the point that exceeds the limits most, or -1
 * @param worstExcess how far that point's radius lies beyond a limit (radius units; negative: inside)
 * @param resolution the distance below which a point counted as on a leg
 */
public record RadiusEnvelope(double smallest, double largest, int judged, int onLegs, int outside, int beyond,
                             boolean pass, int worst, double worstExcess, double resolution) {
}
