package org.arcwright.mechanics;

/**
 * K<sub>t</sub> and, with a strength, q and K<sub>f</sub> at one radius.
 *
 * @param r the radius, in the case's units
 * @param kt the estimate of K<sub>t</sub>, with its fit flags
 * @param q notch sensitivity, or null without a strength
 * @param kf fatigue factor, or null without a strength
 * @param notchWithinFit false when the strength lay outside the notch-sensitivity fit
 */
public record StressPoint(double r, KtEstimate kt, Double q, Double kf, boolean notchWithinFit) {
    /** True when neither K<sub>t</sub> nor q was extrapolated. */
    public boolean withinFit() { return kt.withinFit() && notchWithinFit; }

    /** K<sub>f</sub> when known, else K<sub>t</sub> (the conservative figure). */
    public double governing() { return kf != null ? kf : kt.kt(); }
}
