package org.arcwright.app.model;

import java.util.Optional;
import org.arcwright.io.DecimalText;

/** Reading and showing numbers the way an engineer types and reads them. */
public final class Numbers {
    private Numbers() {}

    /** A value without trailing zeros: 2.0 → "2", 0.550 → "0.55" ({@link DecimalText#exact}, the one rule for this). */
    public static String trim(double v) {
        return DecimalText.exact(v);
    }

    /** A figure to {@code places} decimals ({@link DecimalText#fixed}: half to even, never "-0.00"). */
    public static String fixed(double v, int places) {
        return DecimalText.fixed(v, places);
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
