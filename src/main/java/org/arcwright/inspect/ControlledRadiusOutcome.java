package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.List;
import org.arcwright.zone.RadiusEnvelope;

/**
 * The verdict of a controlled radius (CR): the radius zone, plus a fair curve without reversals
 * whose local radius stays within the limits everywhere (ASME Y14.5-2018 controlled radius, from
 * memory). Each local radius carries its expanded uncertainty, and a window whose interval straddles
 * a limit makes the verdict {@link Verdict#INDETERMINATE} (ISO 14253-1 default rule).
 *
 * @param envelope the radius-zone part
 * @param localMin smallest local radius over the windows (the expected curvature sense)
 * @param localMax largest local radius; infinite where a window is flat
 * @param uncertainty the largest expanded uncertainty (k = 2) of a window's local radius, radius units
 * @param reversals runs of windows whose curvature turns the wrong way beyond their uncertainty
 * @param flats windows too flat to have a centre (radius above 1000 × the largest limit)
 * @param windowLength length of each window along the contour
 * @param windows number of windows fitted
 * @param verdict envelope, reversals, flats and every window's local radius together
 * @param worst the window whose local radius lies farthest beyond (or nearest to) a limit, or null
 * @param worstIndex index (in the full point set) of the middle point of {@code worst}, or -1
 * @param worstExcess how far beyond the limit {@code worst}'s local radius lies (radius units; the
 *     largest limit for a flat or reversed window; negative: within)
 * @param worstLimit the limit {@code worst} is read against
 * @param indeterminate windows whose interval straddles a limit
 */
public record ControlledRadiusOutcome(RadiusEnvelope envelope, double localMin, double localMax, double uncertainty,
                                      List<Reversal> reversals, int flats, double windowLength, int windows,
                                      Verdict verdict, LocalWindow worst, int worstIndex, double worstExcess,
                                      double worstLimit, List<LocalWindow> indeterminate) {
    public ControlledRadiusOutcome {
        reversals = List.copyOf(reversals);
        indeterminate = List.copyOf(indeterminate);
    }

    /** True when conformance is proven. */
    public boolean pass() { return verdict == Verdict.PASS; }

    /**
     * A run of windows curving against the blend.
     *
     * @param fromStation start of the run along the contour
     * @param toStation end of the run
     * @param x x of the middle of the run
     * @param y y of the middle
     */
    public record Reversal(double fromStation, double toStation, double x, double y) {}

    /**
     * One window's local radius.
     *
     * @param number 1-based window number along the blend from surface a
     * @param fromStation start of the window along the contour
     * @param toStation end of the window
     * @param radius local radius (infinite for a flat window), radius units
     * @param uncertainty its expanded uncertainty (k = 2), radius units
     * @param reversed true when the window curves against the blend
     * @param verdict this window's verdict against the limits
     */
    public record LocalWindow(int number, double fromStation, double toStation, double radius, double uncertainty,
                              boolean reversed, Verdict verdict) {
        /**
         * The limits among {@code min} and {@code max} that this window's interval reaches across,
         * read in curvature as its verdict is: {@code κ ± Uκ} with {@code κ = 1/r} and
         * {@code Uκ = U/r²} (first-order propagation, GUM JCGM 100:2008 clause 5), against
         * {@code 1/max} and {@code 1/min}. Empty for a window whose interval lies on one side of both.
         */
        public List<Double> limitsStraddled(double min, double max) {
            if (!(radius > 0) || !Double.isFinite(radius)) return List.of();
            double k = (reversed ? -1 : 1) / radius, uk = uncertainty / (radius * radius);
            ArrayList<Double> out = new ArrayList<>(2);
            if (min > 0 && k - uk <= 1 / min && k + uk >= 1 / min) out.add(min);
            if (k - uk <= 1 / max && k + uk >= 1 / max) out.add(max);
            return List.copyOf(out);
        }
    }
}
