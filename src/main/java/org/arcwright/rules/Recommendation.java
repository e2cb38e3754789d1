package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;

/**
 * One way to tolerance the radius, with everything a reviewer needs to accept or reject it.
 *
 * @param ruleId the rule that proposed it ({@code needs.*} for a candidate the advisor built from the needs)
 * @param callout the control, in the case's units
 * @param refinement a radius refinement drawn with a located profile, or null
 * @param text the callout as it would be drawn, in the case's drawing style
 * @param score ranking score (the pack weight, reduced when demoted); higher is better among equals
 * @param because the reasoning, in the engineer's words
 * @param cautions what to watch, including every need not met and why it was demoted if it was
 * @param references standards and handbooks the reasoning leans on (topic, never copied text)
 * @param numbers the figures behind it, lengths with their units
 * @param trace rule ids and the facts that fired them, for review
 * @param notes linked practice notes
 * @param demoted true when the rule fired but its numbers failed a check
 * @param meets per need id ({@link Need.Kind#key()}), whether this control meets it; empty when not proven
 * @param meetsAll true when it meets every need; null when it was not proven (an engineer's own card)
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Recommendation(String ruleId, Callout callout, Callout.Radius refinement, String text, double score,
                             List<String> because, List<String> cautions, List<String> references,
                             AdviceFigures numbers, List<String> trace, List<NoteLink> notes, boolean demoted,
                             Map<String, Boolean> meets, Boolean meetsAll) {

    @JsonCreator
    public Recommendation {
        // a saved worksheet may have lost a field: say which, rather than fail later on a null
        if (callout == null) throw new IllegalArgumentException("callout is missing; a chosen control needs its callout");
        if (because == null || cautions == null || references == null || numbers == null || trace == null
                || notes == null) {
            throw new IllegalArgumentException("because, cautions, references, numbers, trace and notes must be "
                    + "present (they may be empty: [] or {})");
        }
        for (int i = 0; i < notes.size(); i++) {
            if (notes.get(i) == null) throw new IllegalArgumentException("notes[" + i + "] is null; expected a note link");
        }
        because = List.copyOf(because);
        cautions = List.copyOf(cautions);
        references = List.copyOf(references);
        numbers = numbers == null ? AdviceFigures.NONE : numbers;
        trace = List.copyOf(trace);
        notes = List.copyOf(notes);
        meets = meets == null ? Map.of() : Collections.unmodifiableMap(new LinkedHashMap<>(meets));
    }

    /** A card not proven against needs (an engineer's own callout), figures given by key. */
    public Recommendation(String ruleId, Callout callout, String text, double score, List<String> because,
                          List<String> cautions, List<String> references, Map<String, Object> numbers,
                          List<String> trace, List<NoteLink> notes, boolean demoted) {
        this(ruleId, callout, null, text, score, because, cautions, references, AdviceFigures.fromMap(numbers), trace,
                notes, demoted, Map.of(), null);
    }

    /** True when proven to meet every need and not demoted: a card that can go on the drawing as it stands. */
    public boolean usable() { return Boolean.TRUE.equals(meetsAll) && !demoted; }
}
