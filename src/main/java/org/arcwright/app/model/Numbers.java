package org.arcwright.app.model;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Optional;

/** Reading and showing numbers the way an engineer types and reads them. */
public final class Numbers {
    private Numbers() {}

    /** A value without trailing zeros: 2.0 → "2", 0.550 → "0.55". */
    public static String trim(double v) {
        if (!Double.isFinite(v)) return String.valueOf(v);
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** A figure to {@code places} decimals. */
    public static String fixed(double v, int places) {
        return String.format(Locale.ROOT, "%." + places + "f", v);
    }

    /** Parses a decimal typed with a point or a comma; empty when the text is not a finite number. */
    public static Optional<Double> parse(String text) {
        if (text == null) return Optional.empty();
        String t = text.trim().replace(',', '.');
        if (t.isEmpty()) return Optional.empty();
        try {
            double v = Double.parseDouble(t);
            return Double.isFinite(v) ? Optional.of(v) : Optional.empty();
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }
}
