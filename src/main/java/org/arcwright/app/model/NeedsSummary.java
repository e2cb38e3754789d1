package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.arcwright.io.DecimalText;
import org.arcwright.rules.Advice;
import org.arcwright.rules.DesignChange;
import org.arcwright.rules.Need;
import org.arcwright.rules.Recommendation;

/**
 * What the Decide panel shows above the cards, the same as the text output of {@code advise}: when no
 * card meets every need, the statement saying so and the design changes that would; then the needs
 * table with a tick or cross per card. Built from the advice alone, so the window and the command line
 * cannot disagree.
 *
 * @param nothingMeets true when there are needs and no card meets every one of them
 * @param statement the advisor's "nothing meets every need" statement (its first warning), or empty
 * @param changesTitle the heading of the design-change block, or empty when there is none
 * @param changes the design changes, each "kind: text" with its numbers and units
 * @param rows the needs, in the advisor's order
 * @param cards how many cards the table has a column for
 */
public record NeedsSummary(boolean nothingMeets, String statement, String changesTitle, List<String> changes,
                           List<Row> rows, int cards) {

    /** The heading of the block when nothing meets every need, as in the text output. */
    public static final String CHANGES_WHEN_NOTHING = "What would work (design changes):";
    /** The heading when a card meets every need but changes are still worth weighing. */
    public static final String CHANGES_WORTH_WEIGHING = "Design changes worth weighing:";

    public NeedsSummary {
        changes = List.copyOf(changes);
        rows = List.copyOf(rows);
    }

    /** Met, not met, or not proven (the engineer's own card) for one card and need. */
    public enum Mark {
        MET("✓", "met"), NOT_MET("✗", "not met"), NOT_PROVEN("?", "not proven");

        private final String symbol;
        private final String words;

        Mark(String symbol, String words) {
            this.symbol = symbol;
            this.words = words;
        }

        public String symbol() { return symbol; }

        public String words() { return words; }
    }

    /**
     * One need: its key, its limit with units, why and where it came from, and a mark per card.
     *
     * @param key the need's id, e.g. {@code radius-floor}
     * @param limit "r ≥ 2.79 mm", "r ≤ 2.1 mm", empty for form and location, "none reaches it" when unreachable
     * @param why the need in words with its numbers, and its source in brackets
     * @param marks one per card, in card order
     */
    public record Row(String key, String limit, String why, List<Mark> marks) {
        public Row {
            marks = List.copyOf(marks);
        }
    }

    /** The summary for {@code advice} shown with {@code shown} cards (the advisor's, plus any intent card). */
    public static NeedsSummary of(Advice advice, List<Recommendation> shown) {
        String u = advice.designCase().units().symbol();
        List<Row> rows = new ArrayList<>();
        for (Need n : advice.needs()) {
            String limit = n.min() != null ? "r ≥ " + fourDigits(n.min()) + " " + u
                    : n.max() != null ? "r ≤ " + fourDigits(n.max()) + " " + u
                    : n.reachable() ? "" : "none reaches it";
            List<Mark> marks = new ArrayList<>();
            for (Recommendation r : shown) marks.add(mark(r, n));
            rows.add(new Row(n.key(), limit, n.why() + " [" + n.source() + "]", marks));
        }
        boolean nothing = !advice.needs().isEmpty() && shown.stream().noneMatch(Recommendation::usable);
        String statement = "";
        if (nothing) {
            statement = advice.warnings().stream().filter(w -> w.startsWith("Nothing meets every need")).findFirst()
                    .orElse("Nothing meets every need of this feature as it stands.");
        }
        List<String> changes = new ArrayList<>();
        for (DesignChange d : advice.designChanges()) changes.add(d.kind().key() + ": " + d.text());
        String title = changes.isEmpty() ? "" : advice.anyUsable() ? CHANGES_WORTH_WEIGHING : CHANGES_WHEN_NOTHING;
        return new NeedsSummary(nothing, statement, title, changes, rows, shown.size());
    }

    /** The mark of one card for one need: not proven when the card was not proven (an engineer's own card). */
    public static Mark mark(Recommendation r, Need n) {
        Boolean ok = r.meets().get(n.key());
        return ok == null ? Mark.NOT_PROVEN : ok ? Mark.MET : Mark.NOT_MET;
    }

    /**
     * The line a card shows under its headline when it does not meet every need: which needs it misses,
     * or that it was not proven; empty when it meets every need or there are none.
     */
    public static String cardVerdict(Recommendation r, List<Need> needs) {
        if (needs.isEmpty()) return "";
        if (r.meetsAll() == null) {
            return "Not proven against the needs: taken as written; check it against every need below.";
        }
        if (r.meetsAll()) return "Meets every need (" + needs.size() + " of " + needs.size() + ").";
        Set<String> missed = new LinkedHashSet<>();
        for (Need n : needs) if (mark(r, n) != Mark.MET) missed.add(n.key());
        return "Does not meet every need: misses " + String.join(", ", missed) + ". Not a usable answer as it stands.";
    }

    /** Four significant digits, as the text output of {@code advise} prints a need's limit. */
    static String fourDigits(double v) {
        return DecimalText.significant(v, 4);
    }
}
