package org.arcwright.app.model;

import java.util.List;
import org.arcwright.rules.DesignCase;
import org.arcwright.rules.Recommendation;

/**
 * Where the Decide panel gets its ranked recommendations. The window passes in the rules engine
 * when the practice packs have loaded; runs off the UI thread.
 */
@FunctionalInterface
public interface AdviceSource {
    /** Recommendations for {@code c}, best first. */
    List<Recommendation> advise(DesignCase c);

    /** Only the engineer's own tolerance intent, as written. */
    static AdviceSource intentOnly(double angleDeg) {
        return c -> IntentCard.of(c, angleDeg).map(List::of).orElse(List.of());
    }
}
