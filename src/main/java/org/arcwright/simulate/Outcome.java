package org.arcwright.simulate;

/**
 * How a part fared under a callout, true function against inspection verdict.
 */
public enum Outcome {
    /** Accepted and functionally good. */
    ACCEPTED_GOOD("accepted, good"),
    /** Accepted but functionally bad: a bad part the callout lets through. */
    ESCAPE("escape"),
    /** Rejected (or no verdict) but functionally good: scrap or rework the callout causes. */
    FALSE_REJECT("false reject"),
    /** Rejected (or no verdict) and functionally bad. */
    REJECTED_BAD("rejected, bad");

    private final String label;

    Outcome(String label) { this.label = label; }

    public String label() { return label; }

    static Outcome of(boolean accepted, boolean good) {
        if (accepted) return good ? ACCEPTED_GOOD : ESCAPE;
        return good ? FALSE_REJECT : REJECTED_BAD;
    }
}
