package org.arcwright.rules;

import java.util.List;
import java.util.Optional;
import org.arcwright.model.DesignCase;

/**
 * The advisor's answer for one case: the needs it derived, recommendations best first (every need met first,
 * demoted ones last), the design changes that would help when nothing meets every need, conflicts between
 * equally ranked rules, and warnings.
 *
 * @param designCase the case advised on
 * @param needs what the feature needs, with numbers and sources
 * @param recommendations best first
 * @param designChanges non-empty when no recommendation meets every need
 * @param conflicts equal-score recommendations of different controls, in words; the order shown is
 *     by rule id and is not a decision
 * @param warnings first the statement that nothing meets every need, when so; then rules skipped and why, and
 *     anything else the engineer should know
 */
public record Advice(DesignCase designCase, List<Need> needs, List<Recommendation> recommendations,
                     List<DesignChange> designChanges, List<String> conflicts, List<String> warnings) {

    public Advice {
        needs = List.copyOf(needs);
        recommendations = List.copyOf(recommendations);
        designChanges = List.copyOf(designChanges);
        conflicts = List.copyOf(conflicts);
        warnings = List.copyOf(warnings);
    }

    /** Advice without needs or design changes. */
    public Advice(DesignCase designCase, List<Recommendation> recommendations, List<String> conflicts,
                  List<String> warnings) {
        this(designCase, List.of(), recommendations, List.of(), conflicts, warnings);
    }

    /** The best recommendation, if any rule fired. */
    public Optional<Recommendation> first() {
        return recommendations.isEmpty() ? Optional.empty() : Optional.of(recommendations.get(0));
    }

    /** True when some recommendation meets every need and passes its checks. */
    public boolean anyUsable() {
        return recommendations.stream().anyMatch(Recommendation::usable);
    }
}
