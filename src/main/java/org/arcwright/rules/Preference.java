package org.arcwright.rules;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.rules.CalloutPlan.CalloutKind;

/**
 * The controls the company prefers, as the pack rules firing on a case state them ({@code "prefer"}): one order
 * over callout kinds, built from the rules by weight (a heavier rule's order first, a lighter rule only adding the
 * kinds it names that are not yet placed). {@link Ranking} applies it among cards of the same needs class, so a
 * preference never lifts a card that misses a need above one that meets them all.
 *
 * @param order preferred kinds, most preferred first
 * @param by for each kind, the rule that placed it
 */
record Preference(List<CalloutKind> order, Map<CalloutKind, String> by) {
    /** No rule states a preference. */
    static final Preference NONE = new Preference(List.of(), Map.of());
    /** The rank of a kind no rule names: after every named one. */
    static final int UNLISTED = Integer.MAX_VALUE;

    Preference {
        order = List.copyOf(order);
        by = Collections.unmodifiableMap(new LinkedHashMap<>(by));
    }

    boolean isEmpty() { return order.isEmpty(); }

    /** This order with {@code rule}'s kinds added after those already placed (rules come heaviest first). */
    Preference with(Rule rule) {
        List<CalloutKind> o = new ArrayList<>(order);
        Map<CalloutKind, String> b = new LinkedHashMap<>(by);
        for (CalloutKind k : rule.prefer()) {
            if (!b.containsKey(k)) {
                o.add(k);
                b.put(k, rule.id());
            }
        }
        return new Preference(o, b);
    }

    /** 0 for the most preferred kind, {@link #UNLISTED} for a kind no rule names. */
    int rank(CalloutKind kind) {
        int i = order.indexOf(kind);
        return i < 0 ? UNLISTED : i;
    }

    /** 0 for the most preferred kind, by the callout's type name; {@link #UNLISTED} when none is named. */
    int rank(String typeName) {
        for (int i = 0; i < order.size(); i++) if (order.get(i).key().equals(typeName)) return i;
        return UNLISTED;
    }

    /** The trace line for a card of {@code kind}, when a rule prefers it. */
    Optional<String> explain(CalloutKind kind) {
        if (order.isEmpty()) return Optional.empty();
        String rule = by.get(kind);
        if (rule == null) return Optional.empty();
        int rank = order.indexOf(kind) + 1;
        return Optional.of("preferred control: " + kind.key() + " (choice " + rank + " of " + order.size()
                + ", rule " + rule + "); ranked ahead of other controls that meet the same needs");
    }
}
