package org.arcwright.tolerance;

import java.math.BigDecimal;
import java.util.Locale;
import org.arcwright.io.InputProblem;

/**
 * Reads a radius callout in the forms engineers type and drawings show.
 *
 * <pre>
 *   R0.55 ±0.05     R0.55 +/-0.05    R0.55 +-0.05     equal bilateral
 *   R3 +0.2/-0.1    R3 +0.2 -0.1     R3 +0.2/0        unequal bilateral / unilateral
 *   R3 +0.3/+0.1    R3 -0.1/-0.3                      deviations of the same sign
 *   CR 1.5-2.0                                        limits, written min-max
 *   R .060 MAX      CR .25 MIN                        single limit
 *   R 2.5                                             untoleranced (general tolerance applies)
 * </pre>
 *
 * A trailing {@code mm} or {@code in} sets the units, otherwise the caller's default holds. A comma
 * A deviation other than zero carries its sign ({@code R3 +0.2/31} is refused as a likely typo).
 * A comma
 * is read as a decimal sign ({@code R0,55}, as ISO drawings in many countries write it). Errors are
 * {@link InputProblem}s whose column points at the character where reading stopped.
 */
public final class CalloutParser {
    private final String text;
    private final String source;
    private int pos;

    private CalloutParser(String text, String source) {
        this.text = text;
        this.source = source;
    }

    /** Parses {@code text} with {@code defaultUnits} unless the text names its own. */
    public static RadiusCallout parse(String text, Units defaultUnits) {
        return parse(text, defaultUnits, null);
    }

    /** As {@link #parse(String, Units)}, naming {@code source} (a file or field) in errors. */
    public static RadiusCallout parse(String text, Units defaultUnits, String source) {
        if (text == null || text.isBlank()) {
            throw new InputProblem(source, 0, 1, "callout", "empty radius callout; expected e.g. R0.55 ±0.05");
        }
        return new CalloutParser(text, source).callout(defaultUnits);
    }

    private RadiusCallout callout(Units defaultUnits) {
        skipSpace();
        RadiusKind kind = kind();
        skipSpace();
        BigDecimal first = number("radius");
        skipSpace();
        ToleranceForm form;
        if (peekWord("MAX")) {
            pos += 3;
            form = new ToleranceForm.SingleLimit(first, LimitSide.MAX);
        } else if (peekWord("MIN")) {
            pos += 3;
            form = new ToleranceForm.SingleLimit(first, LimitSide.MIN);
        } else if (peek("±") || peek("+/-") || peek("+-")) {
            pos += peek("±") ? 1 : peek("+/-") ? 3 : 2;
            skipSpace();
            form = new ToleranceForm.EqualBilateral(first, number("tolerance"));
        } else if (peek("+") || peek("-") || peek("−") || startsZeroDeviation()) {
            form = deviations(first);
        } else if (peek("/") || peek("..") || peek("…") || peek("–") || peek("to ")) {
            throw fail("limits are written min-max, e.g. CR 1.5-2.0");
        } else {
            form = new ToleranceForm.Untoleranced(first);
        }
        skipSpace();
        Units units = units(defaultUnits);
        skipSpace();
        if (pos < text.length()) {
            throw fail("unexpected '" + text.substring(pos) + "' after the callout");
        }
        try {
            return new RadiusCallout(kind, units, form);
        } catch (InputProblem p) {
            throw new InputProblem(source, 0, 0, p.field(), p.problem() + " in '" + text.trim() + "'");
        }
    }

    private ToleranceForm deviations(BigDecimal nominal) {
        int start = pos;
        BigDecimal a = signedDeviation("upper deviation");
        skipSpace();
        if (peek("/")) {
            pos++;
            skipSpace();
        }
        if (pos >= text.length() || !(peek("+") || peek("-") || peek("−") || Character.isDigit(text.charAt(pos))
                || text.charAt(pos) == '.')) {
            // A lone "-x" after a number is a limit pair (min-max), e.g. "1.5-2.0".
            if (a.signum() < 0 && text.charAt(start) != '+') {
                return new ToleranceForm.Limits(nominal, a.negate());
            }
            throw fail("expected the second deviation, e.g. +0.2/-0.1");
        }
        boolean signed = peek("+") || peek("-") || peek("−");
        int second = pos;
        BigDecimal b = signedDeviation("lower deviation");
        if (!signed && b.signum() != 0) {
            // "R3 +0.2/31" is a typo far more often than a deviation of +31: only zero may go without a sign.
            pos = second;
            throw fail("the second deviation " + b.toPlainString() + " has no sign: write +" + b.toPlainString()
                    + " or -" + b.toPlainString() + " (only a zero deviation may be written without one)");
        }
        BigDecimal plus = a.max(b);
        BigDecimal minus = a.min(b);
        return new ToleranceForm.Deviations(nominal, plus, minus);
    }

    private boolean startsZeroDeviation() {
        // "R3 0/-0.1": a bare zero followed by a slash
        int p = pos;
        if (p < text.length() && text.charAt(p) == '0') {
            int q = p + 1;
            while (q < text.length() && (text.charAt(q) == '0' || text.charAt(q) == '.')) q++;
            while (q < text.length() && text.charAt(q) == ' ') q++;
            return q < text.length() && text.charAt(q) == '/';
        }
        return false;
    }

    private BigDecimal signedDeviation(String field) {
        int sign = 1;
        if (peek("+")) {
            pos++;
        } else if (peek("-") || peek("−")) {
            sign = -1;
            pos++;
        }
        skipSpace();
        BigDecimal v = number(field);
        return sign < 0 ? v.negate() : v;
    }

    private RadiusKind kind() {
        if (peekIgnoreCase("CR")) {
            pos += 2;
            return RadiusKind.CR;
        }
        if (peekIgnoreCase("R")) {
            pos += 1;
            return RadiusKind.R;
        }
        throw fail("a radius callout starts with R or CR");
    }

    private Units units(Units defaultUnits) {
        if (peekWord("mm")) {
            pos += 2;
            return Units.MM;
        }
        if (peekWord("in")) {
            pos += 2;
            return Units.INCH;
        }
        if (peek("\"")) {
            pos += 1;
            return Units.INCH;
        }
        return defaultUnits;
    }

    private BigDecimal number(String field) {
        int start = pos;
        boolean digits = false;
        boolean point = false;
        StringBuilder sb = new StringBuilder();
        while (pos < text.length()) {
            char c = text.charAt(pos);
            if (Character.isDigit(c)) {
                digits = true;
                sb.append(c);
            } else if ((c == '.' || c == ',') && !point
                    && (pos + 1 < text.length() && Character.isDigit(text.charAt(pos + 1)) || digits)) {
                if (c == '.' && pos + 1 < text.length() && text.charAt(pos + 1) == '.') break;
                point = true;
                sb.append('.');
            } else {
                break;
            }
            pos++;
        }
        if (!digits) {
            pos = start;
            if (pos < text.length() && text.startsWith("NaN", pos)) throw fail(field + " is not a number (NaN)");
            throw fail("expected a number for the " + field);
        }
        if (sb.charAt(sb.length() - 1) == '.') sb.setLength(sb.length() - 1);
        return new BigDecimal(sb.toString());
    }

    private void skipSpace() {
        while (pos < text.length() && Character.isWhitespace(text.charAt(pos))) pos++;
    }

    private boolean peek(String s) {
        return text.startsWith(s, pos);
    }

    private boolean peekIgnoreCase(String s) {
        return text.regionMatches(true, pos, s, 0, s.length());
    }

    private boolean peekWord(String w) {
        if (!text.regionMatches(true, pos, w, 0, w.length())) return false;
        int end = pos + w.length();
        return end >= text.length() || !Character.isLetterOrDigit(text.charAt(end));
    }

    private InputProblem fail(String message) {
        String caret = text + "\n" + " ".repeat(Math.min(pos, text.length())) + "^";
        return new InputProblem(source, 0, pos + 1, "callout",
                message + " (column " + (pos + 1) + ")\n  " + caret.replace("\n", "\n  "));
    }

    @Override
    public String toString() {
        return "CalloutParser[" + text.toUpperCase(Locale.ROOT) + "]";
    }
}
