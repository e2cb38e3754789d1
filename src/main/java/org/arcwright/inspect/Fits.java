package org.arcwright.inspect;

/**
 * Circle fits of the blend points and the steps at its tangent points.
 *
 * <p>A radius gauge reads size and misses a step where the blend meets a surface; the step is the
 * gap between the least-squares circle and each leg, {@code |distance(centre, leg) - r|}.
 *
 * @param leastSquares geometric least-squares circle
 * @param minimumZone minimum-zone circle
 * @param stepA step at the tangent point on leg A
 * @param stepB step at the tangent point on leg B
 * @param blendPoints how many points were taken as the blend
 */
public record Fits(LeastSquaresCircle leastSquares, MinimumZoneCircle minimumZone, double stepA, double stepB,
                   int blendPoints) {}
