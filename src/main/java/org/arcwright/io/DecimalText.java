package org.arcwright.io;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.regex.Pattern;

/**
 * The one syntax of a number in the user's files and on the command line, read and written: an optional
 * sign, decimal digits with an optional point, and an optional exponent ({@code 0.25}, {@code -.5},
 * {@code 1e-3}).
 *
 * <p>Reading: Java's own {@link Double#parseDouble} also takes {@code 1.5f}, {@code 2d}, {@code 0x1p1},
 * {@code NaN} and {@code Infinity}: source-code forms that in a drawing's numbers are typos (a stray
 * letter) or not sizes at all. Every reader of numbers checks the text here first, so a typo is
 * refused rather than read as a value.
 *
 * <p>Writing: every number a report, a message or a drawing file shows comes from one of five methods,
 * chosen by what the number is, so the same value reads the same everywhere and can be typed back:
 * <table>
 * <caption>Which method for which number</caption>
 * <tr><th>number</th><th>method</th><th>why</th></tr>
 * <tr><td>a value the user or a table gave (a limit, a range bound, an angle echoed in a message)</td>
 *     <td>{@link #exact}</td><td>the reader must recognise what they typed: every digit, no more</td></tr>
 * <tr><td>a computed quantity in a report (K_t, a clearance, a stress, a reach)</td>
 *     <td>{@link #significant}, 4 digits unless stated</td><td>a fit or a chart reading carries about
 *     three figures; the fourth keeps two close values apart, more would claim a precision the method
 *     does not have</td></tr>
 * <tr><td>coordinates in a drawing file (SVG user units, mm)</td><td>{@link #places}, 3</td>
 *     <td>1 µm is far below a line's width; trimmed so files stay small and stable</td></tr>
 * <tr><td>a figure whose places are part of a layout: a column, limits at the drawing's places, a
 *     chart label</td><td>{@link #fixed}</td><td>figures side by side read alike</td></tr>
 * <tr><td>a share shown as a percentage (simulated acceptance, escapes)</td><td>{@link #percent}</td>
 *     <td>as {@code fixed}, with the point moved rather than the share multiplied by 100 in binary</td></tr>
 * </table>
 * Trailing zeros are trimmed except by {@code fixed}: on a report a trailing zero claims a precision.
 * No method writes an exponent ({@code 1E-5}); non-finite values are written as Java names them
 * ({@code NaN}, {@code Infinity}), which the reader above refuses, as it should.
 * Rounding is half to even on the decimal the double prints as (ISO 80000-1:2009 Annex B, rule A:
 * from memory), so {@code 0.125} to two places is {@code 0.12} and a typed {@code 2.675} is
 * {@code 2.68}, not the {@code 2.67} its binary value would give.
 *
 * <p>Callout text on a drawing is not written here: its places follow the drawing standard and units
 * ({@code tolerance.DrawingStyle}, through {@code callout.CalloutFormatter}).
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

    /** Every digit of {@code v} that {@link Double#toString} gives, trailing zeros trimmed, no exponent: 0.550 → "0.55", 2.0 → "2". */
    public static String exact(double v) {
        if (!Double.isFinite(v)) return Double.toString(v);
        return plain(BigDecimal.valueOf(v).stripTrailingZeros());
    }

    /** {@code v} to {@code digits} significant digits, trailing zeros trimmed: 1.23456 to 4 → "1.235", 12345 → "12340". */
    public static String significant(double v, int digits) {
        if (digits < 1) throw new IllegalArgumentException("significant digits must be at least 1, got " + digits);
        if (!Double.isFinite(v)) return Double.toString(v);
        return plain(BigDecimal.valueOf(v).round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros());
    }

    /** {@code v} to at most {@code places} decimals, trailing zeros trimmed: 1.2004 to 3 → "1.2". */
    public static String places(double v, int places) {
        if (places < 0) throw new IllegalArgumentException("places must not be negative, got " + places);
        if (!Double.isFinite(v)) return Double.toString(v);
        return plain(BigDecimal.valueOf(v).setScale(places, RoundingMode.HALF_EVEN).stripTrailingZeros());
    }

    /** {@code v} to exactly {@code places} decimals, trailing zeros kept: 1.2 to 3 → "1.200". */
    public static String fixed(double v, int places) {
        if (places < 0) throw new IllegalArgumentException("places must not be negative, got " + places);
        if (!Double.isFinite(v)) return Double.toString(v);
        return fixedPlaces(BigDecimal.valueOf(v), places);
    }

    /**
     * The share {@code share} (0.0725) as a percentage to exactly {@code places} decimals, without the
     * sign: "7.25" at 2, "7.2" at 1 (a tie, half to even). The decimal point is moved rather than the
     * share multiplied by 100, which in binary makes 0.0725 into 7.249999999999999 and hides a tie.
     */
    public static String percent(double share, int places) {
        if (places < 0) throw new IllegalArgumentException("places must not be negative, got " + places);
        if (!Double.isFinite(share)) return Double.toString(share);
        return fixedPlaces(BigDecimal.valueOf(share).movePointRight(2), places);
    }

    private static String fixedPlaces(BigDecimal v, int places) {
        BigDecimal b = v.setScale(places, RoundingMode.HALF_EVEN);
        return b.signum() == 0 ? BigDecimal.ZERO.setScale(places).toPlainString() : b.toPlainString();
    }

    private static String plain(BigDecimal b) {
        if (b.signum() == 0) return "0";
        return b.toPlainString();
    }

    private static String clip(String s) {
        if (s == null) return "";
        return s.length() > 40 ? s.substring(0, 40) + "..." : s;
    }
}
