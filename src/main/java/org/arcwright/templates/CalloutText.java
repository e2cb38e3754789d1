package org.arcwright.templates;

import java.util.List;
import java.util.Objects;
import org.arcwright.callout.Callout;
import org.arcwright.callout.CalloutFormatter;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * A callout as text for notes, sheets and frames: in words, as one plain ASCII line, and as one line with the
 * Unicode GD&amp;T code points for pasting into CAD notes. Every text comes from {@link CalloutFormatter}, the one
 * formatter the advisor uses too, so numbers go through {@link DrawingStyle} and each standard gets its own marks;
 * this class only keeps the names the templates and the renderer call.
 */
public final class CalloutText {
    /** Profile of a surface, U+2313. */
    public static final String PROFILE = CalloutFormatter.PROFILE;
    /** Circled M, U+24C2: maximum material boundary. */
    public static final String CIRCLED_M = CalloutFormatter.CIRCLED_M;
    /** Circled L, U+24C1: least material boundary. */
    public static final String CIRCLED_L = CalloutFormatter.CIRCLED_L;
    /** Circled U, U+24CA: unequally disposed profile (ASME Y14.5-2018). */
    public static final String CIRCLED_U = CalloutFormatter.CIRCLED_U;
    /** Triangle for the dynamic profile modifier (from memory). */
    public static final String DYNAMIC = CalloutFormatter.DYNAMIC;
    /** Left-right arrow for between (from memory). */
    public static final String BETWEEN = CalloutFormatter.BETWEEN;
    /** ISO 1101:2017's modifier for a zone offset by an unspecified amount. */
    public static final String ISO_UNSPECIFIED_OFFSET = CalloutFormatter.ISO_UNSPECIFIED_OFFSET;

    private final CalloutFormatter format;

    public CalloutText(DrawingStyle style, Units units) {
        this.format = new CalloutFormatter(Objects.requireNonNull(style, "style"), Objects.requireNonNull(units, "units"));
    }

    /** The units symbol, {@code mm} or {@code in}. */
    public String unitsSymbol() { return format.units().symbol(); }

    /** A tolerance value as this style writes it. */
    public String value(double v) { return format.value(v); }

    /** Two limits of one size with the same number of places. */
    public String[] limits(double min, double max) { return format.limits(min, max); }

    /** The ISO offset value, signed: {@code +0.02}, {@code -0.03}, {@code 0}. */
    public String signed(double v) { return format.signed(v); }

    /** The name of the control, in the trade's words. */
    public static String controlName(Callout c) { return CalloutFormatter.controlName(c); }

    /** The name of the control in the words of {@code style} ({@link CalloutFormatter#controlName(Callout, DrawingStyle)}). */
    public static String controlName(Callout c, DrawingStyle style) { return CalloutFormatter.controlName(c, style); }

    /** The text of an R or CR dimension as drawn, e.g. {@code R2 ±0.2} or {@code CR1.8-2.2}. */
    public String radius(Callout c) { return format.radius(c); }

    /** The title-block text of a general callout, e.g. {@code ISO 2768-m}, and its edge note. */
    public String general(Callout.General g) { return format.general(g); }

    /** A general-tolerance table as written in a title block. */
    public static String tableText(String table, String toleranceClass) {
        return CalloutFormatter.tableText(table, toleranceClass);
    }

    /** The zone cell of a profile frame without its symbol ({@link CalloutFormatter#zoneCell}). */
    public String zoneCell(Callout.Profile p, boolean unicode) { return format.zoneCell(p, unicode); }

    /**
     * Refuses a profile the style cannot write ({@link CalloutFormatter#checkMarks}).
     *
     * @throws org.arcwright.io.InputProblem on field {@code callout.dynamic}
     */
    public static void checkMarks(Callout.Profile p, DrawingStyle style) { CalloutFormatter.checkMarks(p, style); }

    /** A datum reference cell: {@code A}, {@code B(M)} or {@code BⓂ}. */
    public static String datum(DatumReference d, boolean unicode) { return CalloutFormatter.datum(d, unicode); }

    /** The extent label written next to the frame, or empty. */
    public static String extentLabel(Extent e, boolean unicode) { return CalloutFormatter.extentLabel(e, unicode); }

    /** The callout on one line per frame tier ({@link CalloutFormatter#line}). */
    public String line(Callout c, boolean unicode) { return format.line(c, unicode); }

    /** The callout in words, for reasoning and reviews. */
    public String words(Callout c) { return format.words(c); }

    /** The extent in words, or empty for the blend alone. */
    public static String extentWords(Extent e) { return CalloutFormatter.extentWords(e); }

    /** Datum references joined for a note: {@code A, B(M)}. */
    public static String datumList(List<DatumReference> datums) { return CalloutFormatter.datumList(datums); }
}
