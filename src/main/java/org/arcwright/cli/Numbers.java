package org.arcwright.cli;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Number formatting for human-readable output. JSON output carries full doubles instead. */
final class Numbers {
    private Numbers() {}

    /** {@code v} to {@code places} decimals, trailing zeros kept. */
    static String fixed(double v, int places) {
        return BigDecimal.valueOf(v).setScale(places, RoundingMode.HALF_EVEN).toPlainString();
    }

    /** {@code v} with at least {@code minPlaces} decimals and at most 4 significant digits past them. */
    static String plain(double v) {
        if (v == 0) return "0";
        BigDecimal b = new BigDecimal(v).round(new java.math.MathContext(4, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0).toPlainString() : b.toPlainString();
    }
}
