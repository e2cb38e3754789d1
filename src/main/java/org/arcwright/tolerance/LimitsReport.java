package org.arcwright.tolerance;

import java.util.List;
import java.util.Objects;

/**
 * Everything an engineer wants to know about one radius callout at one corner: limits, the crescent
 * it really allows, the profile zones that would hold the same band, and the text in both styles.
 *
 * @param callout the callout as parsed
 * @param min smallest radius allowed, or null when unbounded below (a MAX-only radius: any radius up to max)
 * @param max largest radius allowed, or null when unbounded (a MIN-only radius)
 * @param nominal nominal as drawn, or the mean where the form has none
 * @param band {@code max - min}, or null
 * @param crescent the crescent at this corner angle, or null when a limit is open
 * @param asme the ASME Y14.5 text
 * @param iso the ISO 129-1 text
 * @param remarks what a reader must be told beyond the text
 */
public record LimitsReport(RadiusCallout callout, double includedAngleDeg, Double min, Double max, double nominal,
                           Double band, CrescentZone crescent, String asme, String iso, List<String> remarks) {

    public LimitsReport {
        Objects.requireNonNull(callout, "callout");
        remarks = List.copyOf(remarks);
    }

    /** The report for {@code callout} at a corner of {@code includedAngleDeg} degrees. */
    public static LimitsReport of(RadiusCallout callout, double includedAngleDeg) {
        Double min = callout.min().isPresent() ? callout.min().getAsDouble() : null;
        Double max = callout.max().isPresent() ? callout.max().getAsDouble() : null;
        double nominal = callout.nominalOrMean();
        Double band = callout.band().isPresent() ? callout.band().getAsDouble() : null;
        CrescentZone crescent = null;
        if (max != null) {
            double lo = min == null ? 0.0 : min;
            double nom = Math.min(Math.max(nominal, lo), max);
            crescent = CrescentZone.of(lo, nom, max, includedAngleDeg);
        } else {
            CrescentZone.factor(includedAngleDeg);
            if (!(includedAngleDeg > 0 && includedAngleDeg < 180)) CrescentZone.of(0, 0, 0, includedAngleDeg);
        }
        List<String> remarks = new java.util.ArrayList<>();
        remarks.add(callout.kind() == RadiusKind.CR
                ? "A controlled radius (CR) bounds size and requires a fair curve: no flats, no reversals, every local radius within the limits."
                : "A ± or limit radius bounds size only: flats, dips and a step at the tangent point can still pass. Use CR or a profile tolerance where form or location matters.");
        if (min == null && max != null) {
            remarks.add("MAX only: any radius up to the maximum is allowed; the crescent is measured from a sharp corner.");
        }
        if (max == null && min != null) {
            remarks.add("MIN only: there is no upper limit, so no crescent width can be given.");
        }
        if (crescent != null && !crescent.widestOnBisector()) {
            remarks.add("At this sharp corner the limit arcs come closest through the adjacent surfaces: the crescent width on the bisector is an upper bound of the true gap.");
        }
        for (DrawingStyle s : DrawingStyle.values()) {
            for (String r : s.remarks(callout)) remarks.add(s.name() + ": " + r);
        }
        return new LimitsReport(callout, includedAngleDeg, min, max, nominal, band, crescent,
                DrawingStyle.ASME.format(callout), DrawingStyle.ISO.format(callout), remarks);
    }
}
