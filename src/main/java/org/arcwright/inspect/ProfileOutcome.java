package org.arcwright.inspect;

import java.util.Set;
import org.arcwright.zone.ProfileZone;

/**
 * The verdict of one profile zone on the measured points.
 *
 * @param zone the zone as toleranced
 * @param free degrees of freedom the zone could move in (text form)
 * @param dynamic whether a uniform offset was also free
 * @param requiredZone smallest zone of the same disposition and freedom that holds every point; NaN
 *     when none does (a one-sided zone the points cross)
 * @param registration where the zone was placed
 * @param maxOutward largest deviation toward air after registration (negative when all lie inside)
 * @param maxInward largest deviation into the material after registration, as a positive depth
 * @param pass whether every point lies within the zone (resolution as slack)
 * @param worst index of the point farthest outside (or least inside) the zone
 * @param worstExcess how far it lies outside (negative: inside by that much)
 * @param deviations signed deviation of each point after registration (positive toward air)
 */
public record ProfileOutcome(ProfileZone zone, Set<Freedom> free, boolean dynamic, double requiredZone,
                             Registration registration, double maxOutward, double maxInward, boolean pass, int worst,
                             double worstExcess, double[] deviations) {
}
