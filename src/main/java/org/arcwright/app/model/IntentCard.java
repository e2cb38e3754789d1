package org.arcwright.app.model;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.callout.Callout;
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
        Callout callout = rc.kind() == RadiusKind.CR ? new Callout.ControlledRadius(min, max, nominal)
                : new Callout.Radius(min, max, nominal);
        Map<String, Object> numbers = new LinkedHashMap<>();
        numbers.put("min", min);
        numbers.put("max", max);
        if (report.crescent() != null) {
            numbers.put("crescentWidth", report.crescent().width());
            numbers.put("equalBilateralProfile", report.crescent().equalBilateralProfile());
        }
        String text = c.standard().format(rc);
        return Optional.of(new Recommendation(RULE_ID, callout, text, 0, List.of(
                "Your tolerance intent as written; no practice rule has reviewed it."),
                report.remarks(), List.of(), numbers, List.of(RULE_ID), List.of(), false));
    }
}
