package org.arcwright.tolerance;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Everything an engineer wants to know about one radius callout at one corner: limits, the crescent
 * it really allows, the profile zones that would hold the same band, and the text in both styles.
 *
 * @param callout the callout as parsed
 * @param min smallest radius allowed, or null when unbounded below (a MAX-only radius: any radius up to max)
 * @param max largest radius allowed, or null when unbounded (a MIN-only radius)
 * @param nominal nominal as drawn, the mean of the limits for a limit form, or null for a single
 *     limit (a MAX or MIN radius has no nominal)
 * @param band {@code max - min}, or null
 * @param crescent the crescent at this corner angle, or null when a limit is open; for a MAX-only
 *     radius it is measured against the largest arc, from a sharp corner
 * @param profileZone the equal-bilateral profile zone about the nominal arc that holds the crescent,
 *     or null where the form has no nominal (the remarks say why)
 * @param shortcutProfile twice the larger deviation, or null where the form has no deviation (the
 *     remarks say why)
 * @param asme the ASME Y14.5 text
 * @param iso the ISO 129-1 text
 * @param remarks what a reader must be told beyond the text
 */
public record LimitsReport(RadiusCallout callout, double includedAngleDeg, Double min, Double max, Double nominal,
                           Double band, CrescentZone crescent, Double profileZone, Double shortcutProfile,
                           String asme, String iso, List<String> remarks) {

    public LimitsReport {
        Objects.requireNonNull(callout, "callout");
        remarks = List.copyOf(remarks);
    }

    /** The report for {@code callout} at a corner of {@code includedAngleDeg} degrees. */
    public static LimitsReport of(RadiusCallout callout, double includedAngleDeg) {
        CrescentZone.checkAngle(includedAngleDeg);
        Double min = callout.min().isPresent() ? callout.min().getAsDouble() : null;
        Double max = callout.max().isPresent() ? callout.max().getAsDouble() : null;
        Double nominal = callout.nominal().isPresent() ? Double.valueOf(callout.nominal().getAsDouble())
                : callout.mean().isPresent() ? Double.valueOf(callout.mean().getAsDouble()) : null;
        Double band = callout.band().isPresent() ? callout.band().getAsDouble() : null;
        CrescentZone crescent = null;
        if (max != null) {
            double lo = min == null ? 0.0 : min;
            crescent = CrescentZone.of(lo, nominal == null ? max : nominal, max, includedAngleDeg);
        }
        Double profileZone = crescent == null || nominal == null ? null : crescent.equalBilateralProfile();
        Double shortcut = crescent == null || nominal == null ? null : shortcut(callout.form(), crescent);
        List<String> remarks = new ArrayList<>();
        remarks.add(callout.kind() == RadiusKind.CR
                ? "A controlled radius (CR) bounds size and requires a fair curve: no flats, no reversals, every local radius within the limits."
                : "A ± or limit radius bounds size only: flats, dips and a step at the tangent point can still pass. Use CR or a profile tolerance where form or location matters.");
        if (min == null && max != null) {
            remarks.add("MAX only: any radius up to the maximum is allowed; the crescent is measured from a sharp corner.");
            remarks.add("MAX only: there is no nominal arc and no deviation, so no profile zone about a nominal and no "
                    + "shortcut (twice the larger deviation) can be given; a profile tolerance for this corner needs a "
                    + "basic radius the designer chooses.");
        }
        if (max == null && min != null) {
            remarks.add("MIN only: there is no upper limit, so no crescent width can be given.");
        }
        if (callout.form() instanceof ToleranceForm.Deviations d) {
            BigDecimal larger = d.plus().abs().max(d.minus().abs());
            if (larger.compareTo(d.nominalValue()) > 0) {
                remarks.add("Check the callout: a deviation of " + larger.toPlainString() + " is larger than the radius "
                        + d.nominalValue().toPlainString() + " itself, which is most often a typo.");
            }
        }
        if (crescent != null && nominal != null && !crescent.holdsNominal()) {
            remarks.add("Both deviations have the same sign: the crescent lies wholly "
                    + (crescent.minArcOffset() > 0 ? "beyond the nominal arc, away from the vertex" : "between the nominal arc and the vertex")
                    + ", so the nominal arc itself is not a conforming contour.");
        }
        if (crescent != null && !crescent.widestOnBisector()) {
            remarks.add("At this sharp corner the limit arcs come closest through the adjacent surfaces: the crescent width on the bisector is an upper bound of the true gap.");
        }
        for (DrawingStyle s : DrawingStyle.values()) {
            for (String r : s.remarks(callout)) remarks.add(s.name() + ": " + r);
        }
        return new LimitsReport(callout, includedAngleDeg, min, max, nominal, band, crescent, profileZone, shortcut,
                DrawingStyle.ASME.format(callout), DrawingStyle.ISO.format(callout), remarks);
    }

    /**
     * Twice the larger deviation, from the deviations as written (2 × 0.3 = 0.6, where 3.3 − 3 in doubles gives
     * 0.29999999999999982); for limits written without a nominal, the band (twice the half-band about the mean).
     */
    private static double shortcut(ToleranceForm form, CrescentZone crescent) {
        BigDecimal two = BigDecimal.valueOf(2);
        if (form instanceof ToleranceForm.Deviations d) return two.multiply(d.plus().abs().max(d.minus().abs())).doubleValue();
        if (form instanceof ToleranceForm.EqualBilateral e) return two.multiply(e.plusMinus().abs()).doubleValue();
        if (form instanceof ToleranceForm.Limits l) return l.max().subtract(l.min()).doubleValue();
        return crescent.shortcutProfile();
    }
}
