package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import java.util.List;
import java.util.Optional;

/**
 * The advisor's answer for one case: recommendations best first (demoted ones last), conflicts
 * between equally ranked rules, and warnings about rules that could not apply.
 *
 * @param designCase the case advised on
 * @param recommendations best first
 * @param conflicts equal-score recommendations of different controls, in words; the order shown is
 *     by rule id and is not a decision
 * @param warnings rules skipped and why, and anything else the engineer should know
 */
public record Advice(DesignCase designCase, List<Recommendation> recommendations, List<String> conflicts,
                     List<String> warnings) {

    public Advice {
        recommendations = List.copyOf(recommendations);
        conflicts = List.copyOf(conflicts);
        warnings = List.copyOf(warnings);
    }

    /** The best recommendation, if any rule fired. */
    public Optional<Recommendation> first() {
        return recommendations.isEmpty() ? Optional.empty() : Optional.of(recommendations.get(0));
    }
}
