package org.arcwright.inspect;

import java.util.Locale;

/**
 * The point (or CR window) that exceeds its callout most, or, on a pass, comes nearest to doing so.
 *
 * @param index 0-based index in the point set
 * @param x measured x
 * @param y measured y
 * @param excess how far beyond the limit, in {@code unit}: radius for R and CR (how much larger or
 *     smaller than a limit the radius through the point, or the window's local radius, is), distance
 *     for a profile and for a point beyond an adjacent surface (negative: within by that much)
 * @param measure what {@code excess} measures: {@code radius} (the blend radius through the point),
 *     {@code local radius} (of the CR window centred on the point), {@code distance} (from the
 *     profile zone) or {@code distance beyond surface} (outside the sharp corner)
 * @param unit the drawing unit's symbol ({@code mm}, {@code in}); empty when not known
 * @param text the whole finding in words, with units and where it lies, e.g.
 *     {@code 0.0009 mm beyond surface a (outside the sharp corner) at point #41, s = 2.31 mm along the contour}
 */
public record Worst(int index, double x, double y, double excess, String measure, String unit, String text) {
    /** {@link #measure()} of a point judged by the radius through it (R and CR zones). */
    public static final String RADIUS = "radius";
    /** {@link #measure()} of a CR window judged by its local radius. */
    public static final String LOCAL_RADIUS = "local radius";
    /** {@link #measure()} of a point judged by its distance from a profile zone. */
    public static final String DISTANCE = "distance";
    /** {@link #measure()} of a point beyond an adjacent surface (outside the sharp corner): a distance, not a radius. */
    public static final String BEYOND_SURFACE = "distance beyond surface";

    /** A worst point without unit or text (described from its fields). */
    public Worst(int index, double x, double y, double excess, String measure) {
        this(index, x, y, excess, measure, "", String.format(Locale.ROOT, "point #%d: %s %s (%s)", index,
                excess > 0 ? "outside by" : "inside by", Inspector.fmt(Math.abs(excess)), measure));
    }
}
