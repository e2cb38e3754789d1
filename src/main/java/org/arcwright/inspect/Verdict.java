package org.arcwright.inspect;

/**
 * A verdict under the ISO 14253-1 default decision rule: conformance is proven only inside the zone
 * reduced by the measurement uncertainty, non-conformance only outside the zone enlarged by it, and
 * anything between is neither (ISO 14253-1:2017, clauses 5.2 and 5.3, from memory).
 */
public enum Verdict {
    /** Conformance proven. */
    PASS("pass"),
    /** Non-conformance proven. */
    FAIL("fail"),
    /** Neither can be proven with this data: the uncertainty straddles a limit. */
    INDETERMINATE("indeterminate");

    private final String key;

    Verdict(String key) { this.key = key; }

    /** The word in JSON and text output. */
    public String key() { return key; }

    /** The worse of two verdicts: a failure anywhere fails, else an open question stays open. */
    public Verdict and(Verdict o) {
        if (this == FAIL || o == FAIL) return FAIL;
        if (this == INDETERMINATE || o == INDETERMINATE) return INDETERMINATE;
        return PASS;
    }

    /** The verdict of a figure whose expanded uncertainty interval is {@code [lo, hi]} against the bound {@code <= limit}. */
    public static Verdict atMost(double value, double u, double limit) {
        if (value + u <= limit) return PASS;
        if (value - u > limit) return FAIL;
        return INDETERMINATE;
    }
}
