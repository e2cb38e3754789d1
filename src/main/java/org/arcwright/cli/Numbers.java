package org.arcwright.cli;

import org.arcwright.io.DecimalText;

/**
 * The advise and simulate commands' names for {@link DecimalText}'s rules, kept while those commands are
 * changed on other branches; every other command calls {@code DecimalText} directly. JSON output carries
 * full doubles.
 */
final class Numbers {
    private Numbers() {}

    /** {@link DecimalText#fixed}. */
    static String fixed(double v, int places) {
        return DecimalText.fixed(v, places);
    }

    /** {@link DecimalText#significant} to 4 digits. */
    static String plain(double v) {
        return DecimalText.significant(v, 4);
    }
}
