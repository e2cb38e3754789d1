package org.arcwright.testing;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.arcwright.tolerance.DrawingStyle;

/**
 * The marks and terms one drawing standard has and the other does not, for sweeps over every output. From ASME
 * Y14.5-2018 and ISO 1101:2017 (from memory): ASME alone has the controlled radius (CR), the circled U, the
 * dynamic-profile triangle and the composite frame; ISO alone has the UZ and OZ zone modifiers.
 */
public final class StandardMarks {
    private static final Map<String, Pattern> ASME_ONLY;
    private static final Map<String, Pattern> ISO_ONLY;

    static {
        Map<String, Pattern> asme = new LinkedHashMap<>();
        Map<String, Pattern> iso = new LinkedHashMap<>();
        asme.put("CR callout", Pattern.compile("\\bCR\\s?[0-9.]"));
        asme.put("controlled radius", Pattern.compile("(?i)controlled radius"));
        asme.put("circled U", Pattern.compile("\\(U\\)|\u24CA"));
        asme.put("dynamic triangle", Pattern.compile("\\(DYN\\)|\u25B3|(?i)\\bdynamic\\b"));
        asme.put("composite frame", Pattern.compile("(?i)composite"));
        asme.put("unequally disposed", Pattern.compile("(?i)unequally disposed"));
        iso.put("UZ", Pattern.compile("\\bUZ[+-]?[0-9.]"));
        iso.put("OZ", Pattern.compile("\\bOZ\\b"));
        iso.put("ISO 129-1 dimensioning", Pattern.compile("ISO 129-1"));
        iso.put("stacked ISO frames", Pattern.compile("(?i)stacked frames"));
        ASME_ONLY = Collections.unmodifiableMap(asme);
        ISO_ONLY = Collections.unmodifiableMap(iso);
    }

    /**
     * Sentences that name the other standard to warn about it or to say it does not apply, which is what they are
     * for; they are taken out before the sweep looks.
     */
    private static final List<Pattern> EXPLANATIONS = List.of(
            Pattern.compile(Pattern.quote("Controlled radius (CR) is an ASME Y14.5 concept with no ISO equivalent")),
            Pattern.compile(Pattern.quote("Arcwright's readings of ASME Y14.5 and ISO 1101 are summaries")),
            Pattern.compile(Pattern.quote("(ASME Y14.5-2018 or ISO 1101 as the drawing states)")),
            Pattern.compile("ISO (drawings )?ha(s|ve) no controlled radius"),
            // the advisor skipping a team rule that asks for CR on an ISO drawing, and saying why
            Pattern.compile("Rule '[^']+' recommends a controlled radius, an ASME Y14.5 concept with no ISO equivalent"));

    private StandardMarks() {}

    /**
     * Fails when {@code output}, made for a drawing to {@code style}, carries a mark or term of the other standard;
     * the message names the mark and quotes the text around it.
     */
    public static void assertOwnMarks(String what, DrawingStyle style, String output) {
        String text = output;
        for (Pattern e : EXPLANATIONS) text = e.matcher(text).replaceAll("");
        Map<String, Pattern> forbidden = style == DrawingStyle.ISO ? ASME_ONLY : ISO_ONLY;
        for (Map.Entry<String, Pattern> m : forbidden.entrySet()) {
            Matcher found = m.getValue().matcher(text);
            if (found.find()) {
                int at = found.start();
                throw new AssertionError(what + ": " + m.getKey() + " in a " + style + " output near '"
                        + text.substring(Math.max(0, at - 60), Math.min(text.length(), at + 60)) + "'");
            }
        }
    }
}
