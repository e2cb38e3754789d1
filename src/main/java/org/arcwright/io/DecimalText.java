package org.arcwright.io;

import java.util.regex.Pattern;

/**
 * The one syntax of a number in the user's files and on the command line: an optional sign, decimal
 * digits with an optional point, and an optional exponent ({@code 0.25}, {@code -.5}, {@code 1e-3}).
 *
 * <p>Java's own {@link Double#parseDouble} also takes {@code 1.5f}, {@code 2d}, {@code 0x1p1},
 * {@code NaN} and {@code Infinity}: source-code forms that in a drawing's numbers are typos (a stray
 * letter) or not sizes at all. Every reader of numbers checks the text here first, so a typo is
 * refused rather than read as a value.
 */
public final class DecimalText {
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private DecimalText() {}

    /** True when {@code text} (surrounding spaces ignored) is a decimal number in the syntax above. */
    public static boolean isDecimal(String text) {
        return text != null && DECIMAL.matcher(text.strip()).matches();
    }

    /**
     * The finite value of {@code text}.
     *
     * @throws NumberFormatException naming what was wrong: not decimal syntax, or too large to be finite
     */
    public static double parseFinite(String text) {
        if (!isDecimal(text)) {
            throw new NumberFormatException("not a number: '" + clip(text) + "' (expected decimal digits such as 0.25 or 1e-3)");
        }
        double v = Double.parseDouble(text.strip());
        if (!Double.isFinite(v)) throw new NumberFormatException("not a finite number: '" + clip(text) + "' is too large");
        return v;
    }

    private static String clip(String s) {
        if (s == null) return "";
        return s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
