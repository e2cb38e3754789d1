package org.arcwright.simulate;

import java.util.List;
import java.util.Map;
import org.arcwright.inspect.InspectionCallout;

/**
 * One candidate callout's record over the simulated population. Every share is of all parts.
 *
 * @param callout the callout
 * @param parts all parts
 * @param accepted parts the inspection passed
 * @param escapes accepted but functionally bad
 * @param falseRejects not accepted but functionally good
 * @param indeterminate parts with no verdict (counted as not accepted)
 * @param examples the first few parts of each outcome, by part number, among the first 16,384 parts
 */
public record CalloutResult(InspectionCallout callout, long parts, long accepted, long escapes, long falseRejects,
                            long indeterminate, Map<Outcome, List<Example>> examples) {
    public CalloutResult {
        examples = Map.copyOf(examples);
    }

    public Share acceptedShare() { return Share.of(accepted, parts); }

    public Share escapeShare() { return Share.of(escapes, parts); }

    public Share falseRejectShare() { return Share.of(falseRejects, parts); }

    public Share indeterminateShare() { return Share.of(indeterminate, parts); }

    /** The callout as a drawing would state it, e.g. {@code CR 1.95-2.15}. */
    public String text() { return callout.describe(); }

    /** The examples of one outcome (possibly empty). */
    public List<Example> examples(Outcome o) { return examples.getOrDefault(o, List.of()); }
}
