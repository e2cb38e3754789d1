package org.arcwright.mechanics;

/**
 * The answer to "how small may the fillet be?".
 *
 * @param target the limit asked for
 * @param found true when some radius up to the step height meets the target
 * @param radius the smallest such radius (NaN when not found), in the case's units
 * @param valueAtRadius the factor at that radius (at the step height when not found)
 * @param searchFrom smallest radius searched: the sharp end of the fit's range
 * @param searchTo largest radius searched: the step height h
 * @param limitedByFit true when the target holds even at {@code searchFrom}, so the answer is the
 *     end of the fit, not a root; a smaller radius might do but the fit cannot say
 * @param message the answer in words
 */
public record MinimumRadius(StressTarget target, boolean found, double radius, double valueAtRadius,
                            double searchFrom, double searchTo, boolean limitedByFit, String message) {}
