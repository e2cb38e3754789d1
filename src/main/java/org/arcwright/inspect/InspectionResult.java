package org.arcwright.inspect;

import java.util.List;
import org.arcwright.zone.RadiusEnvelope;

/**
 * The verdict on a measured section and the reasons for it. Only the parts that apply are present
 * (others are null): {@code radius} for R and CR, {@code controlled} for CR, {@code profile} for a
 * profile, {@code tiers} for a composite profile; {@code fits} for a corner.
 *
 * @param request what was asked
 * @param pass the verdict
 * @param radius radius-zone envelope
 * @param controlled controlled-radius checks
 * @param profile profile verdict
 * @param tiers composite-profile tier verdicts, upper tier first
 * @param fits circle fits of the blend
 * @param worst the point exceeding the callout most
 * @param notes conventions and cautions that apply to this result
 * @param comparisons the same points under every applicable callout (empty unless asked)
 */
public record InspectionResult(InspectionRequest request, boolean pass, RadiusEnvelope radius,
                               ControlledRadiusOutcome controlled, ProfileOutcome profile, List<ProfileOutcome> tiers,
                               Fits fits, Worst worst, List<String> notes, List<Comparison> comparisons) {
}
