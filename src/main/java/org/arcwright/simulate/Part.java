package org.arcwright.simulate;

import org.arcwright.io.DecimalText;

/**
 * One simulated part's true geometry: the truth the function is judged on.
 *
 * @param index the part's number in the run (0-based)
 * @param radius the blend's true radius
 * @param dx the blend's (and its adjacent surfaces') offset from the nominal place, x
 * @param dy the same, y
 * @param flatFrom where a flat starts, as a fraction of the sweep from leg A; NaN: no flat
 * @param flatTo where it ends; NaN: no flat
 * @param step the step where the blend meets a surface; 0: none
 * @param stepOnB whether the step is at leg B (else at leg A)
 */
public record Part(int index, double radius, double dx, double dy, double flatFrom, double flatTo, double step,
                   boolean stepOnB) {
    /** Whether a chord replaces part of the arc. */
    public boolean hasFlat() { return !Double.isNaN(flatFrom); }

    /** Smallest local radius on the blend: 0 at the corners of a flat, else the arc's radius. */
    public double minLocalRadius() { return hasFlat() ? 0 : radius; }

    /** Distance of the blend from its nominal place. */
    public double positionError() { return Math.hypot(dx, dy); }

    /** A short description for example lists, in the given unit. */
    public String describe(String unit) {
        StringBuilder sb = new StringBuilder("part ").append(index + 1).append(": R ")
                .append(DecimalText.fixed(radius, 4)).append(' ').append(unit);
        if (hasFlat()) sb.append(", flat ").append(DecimalText.percent(flatFrom, 0)).append('-').append(DecimalText.percent(flatTo, 0)).append(" % of the sweep");
        if (step > 0) sb.append(", step ").append(DecimalText.fixed(step, 4)).append(' ').append(unit).append(" at leg ").append(stepOnB ? "B" : "A");
        if (positionError() > 0) sb.append(", off place ").append(DecimalText.fixed(positionError(), 4)).append(' ').append(unit);
        return sb.toString();
    }
}
