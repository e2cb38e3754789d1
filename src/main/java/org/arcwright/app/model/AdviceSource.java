package org.arcwright.app.model;

import java.util.List;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Recommendation;

/**
 * Where the Decide panel gets its ranked recommendations. The window passes in the rules engine
 * when the practice packs have loaded; runs off the UI thread.
 */
@FunctionalInterface
public interface AdviceSource {
    /** Recommendations for {@code c}, best first. */
    List<Recommendation> advise(DesignCase c);

    /**
     * The advisor's ranked recommendations, followed by the engineer's own tolerance intent as
     * written when no recommendation already proposes that callout.
     */
    static AdviceSource advisor(java.util.function.Function<DesignCase, List<Recommendation>> advise, double angleDeg) {
        return c -> {
            List<Recommendation> out = new java.util.ArrayList<>(advise.apply(c));
            IntentCard.of(c, angleDeg).ifPresent(intent -> {
                boolean proposed = out.stream().anyMatch(r -> r.callout().equals(intent.callout()));
                if (!proposed) out.add(intent);
            });
            return out;
        };
    }

    /** Only the engineer's own tolerance intent, as written. */
    static AdviceSource intentOnly(double angleDeg) {
        return c -> IntentCard.of(c, angleDeg).map(List::of).orElse(List.of());
    }
}
