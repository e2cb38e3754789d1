package org.arcwright.inspect;

import java.util.List;
import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.zone.RadiusEnvelope;

/**
 * The verdict on a measured section and the reasons for it. Only the parts that apply are present
 * (others are null): {@code radius} for R and CR, {@code controlled} for CR, {@code profile} for a
 * profile, {@code tiers} for a composite profile; {@code fits} and {@code surfaces} for a corner.
 *
 * <p>A verdict never contradicts its own worst point: a pass whose worst point lies beyond the
 * limits by more than the resolution is refused here, as a defect of the inspection, not of the part.
 *
 * @param request what was asked
 * @param verdict pass, fail or indeterminate (ISO 14253-1 default rule when an uncertainty is stated;
 *     indeterminate also when a CR window's local radius straddles a limit)
 * @param radius radius-zone envelope (on the fitted adjacent surfaces)
 * @param controlled controlled-radius checks
 * @param profile profile verdict
 * @param tiers composite-profile tier verdicts, upper tier first
 * @param fits circle fits of the blend and the steps at its tangent points
 * @param surfaces the adjacent surfaces fitted to the points (the radius zone is built on them)
 * @param worst the point exceeding the callout most
 * @param notes conventions and cautions that apply to this result
 * @param comparisons the same points under every applicable callout (empty unless asked)
 */
public record InspectionResult(InspectionRequest request, Verdict verdict, RadiusEnvelope radius,
                               ControlledRadiusOutcome controlled, ProfileOutcome profile, List<ProfileOutcome> tiers,
                               Fits fits, AdjacentSurfaces surfaces, Worst worst, List<String> notes,
                               List<Comparison> comparisons) {
    /**
     * What every verdict carries wherever it is shown (text, JSON, plot): it reads the standard's
     * zone definitions and is not an acceptance.
     */
    public static final String CAUTION = "The verdict reads the standard's zone definitions; it is not an acceptance. Check it against the governing "
            + "standard, your company's inspection practice and the responsible engineer's judgement.";

    public InspectionResult {
        Objects.requireNonNull(verdict, "verdict");
        if (verdict == Verdict.PASS && worst != null && worst.excess() > request.resolution()) {
            throw new IllegalStateException("a pass whose worst point lies " + DecimalText.significant(worst.excess(), 4) + " beyond the limits ("
                    + worst.measure() + ")");
        }
    }

    /** The form before verdicts could be indeterminate and surfaces were fitted. */
    public InspectionResult(InspectionRequest request, boolean pass, RadiusEnvelope radius,
                            ControlledRadiusOutcome controlled, ProfileOutcome profile, List<ProfileOutcome> tiers,
                            Fits fits, Worst worst, List<String> notes, List<Comparison> comparisons) {
        this(request, pass ? Verdict.PASS : Verdict.FAIL, radius, controlled, profile, tiers, fits, null, worst, notes,
                comparisons);
    }

    /** True when conformance is proven. */
    public boolean pass() { return verdict == Verdict.PASS; }
}
