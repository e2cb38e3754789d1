package org.arcwright.inspect;

import java.util.List;
import org.arcwright.zone.RadiusEnvelope;

/**
 * The verdict of a controlled radius (CR): the radius zone, plus a fair curve without reversals
 * whose local radius stays within the limits everywhere (ASME Y14.5-2018 controlled radius, from
 * memory).
 *
 * @param envelope the radius-zone part
 * @param localMin smallest local radius over the windows (the expected curvature sense)
 * @param localMax largest local radius; infinite where a window is flat
 * @param reversals runs of windows whose curvature turns the wrong way
 * @param flats windows with no measurable curvature (radius above 1000 × the largest limit)
 * @param windowLength length of each window along the nominal contour
 * @param windows number of windows fitted
 * @param pass envelope passes, no reversal, no flat, local radii within the limits
 * @param worstIndex index (in the full point set) of the middle point of the window whose local
 *     radius lies farthest beyond a limit, or -1
 * @param worstExcess how far beyond (radius units; the largest limit for a flat or reversed window)
 */
public record ControlledRadiusOutcome(RadiusEnvelope envelope, double localMin, double localMax,
                                      List<Reversal> reversals, int flats, double windowLength, int windows,
                                      boolean pass, int worstIndex, double worstExcess) {
    /**
     * A run of windows curving against the blend.
     *
     * @param fromStation start of the run along the nominal contour
     * @param toStation end of the run
     * @param x x of the middle of the run
     * @param y y of the middle
     */
    public record Reversal(double fromStation, double toStation, double x, double y) {}
}
