package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.callout.Callout;
import org.arcwright.io.DecimalText;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.LimitsReport;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.RadiusKind;

/**
 * The engineer's own tolerance intent as a card beside the advisor's, so it can go on the worksheet
 * as written. It carries the figures the tolerance core computes and says plainly that no rule
 * reviewed it.
 */
public final class IntentCard {
    /** The rule id recorded for a callout taken as written. */
    public static final String RULE_ID = "as-written";

    private IntentCard() {}

    /** A card for the case's tolerance intent when it has both limits; empty otherwise. */
    public static Optional<Recommendation> of(DesignCase c, double angleDeg) {
        if (c.tolerance() == null) return Optional.empty();
        RadiusCallout rc;
        try {
            rc = CalloutParser.parse(c.tolerance(), c.units());
        } catch (RuntimeException e) {
            return Optional.empty();
        }
        if (!rc.isFullyToleranced()) return Optional.empty();
        LimitsReport report = LimitsReport.of(rc, angleDeg);
        double min = report.min();
        double max = report.max();
        Double nominal = rc.nominal().isPresent() ? rc.nominal().getAsDouble() : null;
        // deviations of the same sign (R3 +0.3/+0.1) draw a nominal outside the limits, which a chosen
        // callout does not hold: the card keeps the limits it allows and says how it was drawn
        boolean outside = nominal != null && (nominal < min || nominal > max);
        Double kept = outside ? null : nominal;
        Callout callout = rc.kind() == RadiusKind.CR ? new Callout.ControlledRadius(min, max, kept)
                : new Callout.Radius(min, max, kept);
        Map<String, Object> numbers = new LinkedHashMap<>();
        numbers.put("min", min);
        numbers.put("max", max);
        // what the zone figures are about: the drawn nominal, which same-sign deviations put outside the limits
        if (report.nominal() != null) numbers.put("nominal", report.nominal());
        if (report.crescent() != null) {
            numbers.put("crescentWidth", report.crescent().width());
            numbers.put("equalBilateralProfile", report.crescent().equalBilateralProfile());
        }
        String text = c.standard().format(rc);
        List<String> because = new ArrayList<>(List.of("Your tolerance intent as written; no practice rule has reviewed it."));
        if (outside) {
            because.add("Drawn as " + text + ": both deviations have the same sign, so the nominal R"
                    + DecimalText.exact(nominal) + " lies outside the limits; chosen, it is kept as its limits "
                    + DecimalText.places(min, 6) + " to " + DecimalText.places(max, 6) + " " + c.units().symbol()
                    + ", the same zone.");
        }
        return Optional.of(new Recommendation(RULE_ID, callout, text, 0, List.copyOf(because),
                report.remarks(), List.of(), numbers, List.of(RULE_ID), List.of(), false));
    }
}
