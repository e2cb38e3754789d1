package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;

/**
 * One way to tolerance the radius, with everything a reviewer needs to accept or reject it.
 *
 * @param ruleId the rule that proposed it
 * @param callout the control, in the case's units
 * @param text the callout as it would be drawn, in the case's drawing style
 * @param score ranking score; higher is better
 * @param because the reasoning, in the engineer's words
 * @param cautions what to watch, including why it was demoted if it was
 * @param references standards and handbooks the reasoning leans on (topic, never copied text)
 * @param numbers the figures behind it (limits, crescent width, profile zone, Kt/Kf, seating margin...)
 * @param trace rule ids and the facts that fired them, for review
 * @param notes linked practice notes
 * @param demoted true when the rule fired but its numbers failed a check
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Recommendation(String ruleId, Callout callout, String text, double score, List<String> because,
                             List<String> cautions, List<String> references, Map<String, Object> numbers,
                             List<String> trace, List<NoteLink> notes, boolean demoted) {

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
        numbers = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(numbers));
        trace = List.copyOf(trace);
        notes = List.copyOf(notes);
    }
}
