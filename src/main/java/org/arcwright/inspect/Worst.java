package org.arcwright.inspect;

/**
 * The point that exceeds its callout most (or, on a pass, comes nearest to doing so).
 *
 * @param index 0-based index in the point set
 * @param x measured x
 * @param y measured y
 * @param excess how far beyond the limit: radius units for R and CR, distance for profile
 *     (negative: within by that much)
 * @param measure what {@code excess} measures: {@code radius} (the blend radius through the point),
 *     {@code local radius} (of the CR window centred on the point) or {@code distance}
 */
public record Worst(int index, double x, double y, double excess, String measure) {}
