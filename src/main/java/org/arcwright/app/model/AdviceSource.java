package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Recommendation;

/**
 * Where the Decide panel gets its ranked recommendations. The window passes in the rules engine
 * when the practice packs have loaded; runs off the UI thread.
 */
@FunctionalInterface
public interface AdviceSource {
    /** The advice for {@code c}: needs, design changes and recommendations, best first. */
    Advice advise(DesignCase c);

    /**
     * The advisor's ranked recommendations, followed by the engineer's own tolerance intent as
     * written when no recommendation already proposes that callout.
     */
    static AdviceSource advisor(Function<DesignCase, Advice> advise, double angleDeg) {
        return c -> {
            Advice a = advise.apply(c);
            List<Recommendation> out = new ArrayList<>(a.recommendations());
            IntentCard.of(c, angleDeg).ifPresent(intent -> {
                boolean proposed = out.stream().anyMatch(r -> r.callout().equals(intent.callout()));
                if (!proposed) out.add(intent);
            });
            return new Advice(a.designCase(), a.needs(), out, a.designChanges(), a.conflicts(), a.warnings());
        };
    }

    /** Only the engineer's own tolerance intent, as written. */
    static AdviceSource intentOnly(double angleDeg) {
        return c -> new Advice(c, IntentCard.of(c, angleDeg).map(List::of).orElse(List.of()), List.of(), List.of());
    }
}
