package org.arcwright.inspect;

/**
 * One row of the side-by-side comparison: the same points under another callout.
 *
 * @param name what kind of control (R, CR, profile located, ...)
 * @param callout the callout judged, as text
 * @param derived true when the callout was derived from the file's one rather than stated
 * @param verdict the verdict
 * @param figure the deciding figure, as text with units (envelope, local radii, zone needed)
 * @param required the smallest zone or tightest limits the points would meet, as a number where one
 *     exists (NaN otherwise)
 */
public record Comparison(String name, String callout, boolean derived, Verdict verdict, String figure, double required) {
    /** A row with a pass/fail verdict. */
    public Comparison(String name, String callout, boolean derived, boolean pass, String figure, double required) {
        this(name, callout, derived, pass ? Verdict.PASS : Verdict.FAIL, figure, required);
    }

    /** True when conformance is proven. */
    public boolean pass() { return verdict == Verdict.PASS; }
}
