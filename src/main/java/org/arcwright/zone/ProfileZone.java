package org.arcwright.zone;

import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * A profile of a surface zone about a nominal contour: total width, and how much of it lies on the
 * add-material (air) side.
 *
 * <p>ASME Y14.5-2018 states an unequally disposed zone by the amount on the side that adds material
 * (the value after the circled U); ISO 1101:2017 states it as an offset of the zone's centre from
 * the nominal, positive out of the material (UZ). The two are related by
 * {@code outward = offset + width/2}. Equal-bilateral: {@code outward = width/2}, offset 0 (both from
 * memory of the standards' figures).
 *
 * @param width total zone width, > 0
 * @param outward part of the width on the air side, 0..width
 */
public record ProfileZone(double width, double outward) {
    public ProfileZone {
        if (!Double.isFinite(width) || width <= 0) throw InputProblem.ofField("zone", "must be above zero, got " + DecimalText.exact(width));
        if (!Double.isFinite(outward) || outward < 0 || outward > width) {
            throw InputProblem.ofField("outward", "must be between 0 and the zone (" + DecimalText.exact(width) + "), got " + DecimalText.exact(outward));
        }
    }

    /** An equal-bilateral zone. */
    public static ProfileZone bilateral(double width) { return new ProfileZone(width, width / 2); }

    /** From the ISO offset-zone form: centre offset {@code offset}, positive out of the material. */
    public static ProfileZone isoOffset(double width, double offset) {
        if (!Double.isFinite(offset) || Math.abs(offset) > width / 2) {
            throw InputProblem.ofField("offset", "must lie within ±half the zone (" + DecimalText.exact(width / 2) + "), got " + DecimalText.exact(offset));
        }
        return new ProfileZone(width, offset + width / 2);
    }

    /** ISO 1101 offset of the zone centre, positive out of the material. */
    public double isoOffset() { return outward - width / 2; }

    /** Part of the width inside the material. */
    public double inward() { return width - outward; }

    /** The fraction {@code outward / width}, the disposition kept when the zone is scaled. */
    public double fraction() { return outward / width; }

    /** True when the zone lies equally on both sides. */
    public boolean equalBilateral() { return Math.abs(outward - width / 2) <= 1e-12 * width; }

    /**
     * How far a deviation lies outside this zone (positive: outside; negative: inside by that much).
     */
    public double excess(double deviation) { return Math.max(deviation - outward, -deviation - inward()); }
}
