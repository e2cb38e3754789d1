package org.arcwright.callout;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;

/**
 * Every callout's text, in one place: the advisor's one-line text, the frame lines of drawing notes (plain ASCII or
 * with the GD&amp;T code points) and the callout in words. Every number goes through the drawing style
 * ({@link DrawingStyle#format}/{@link DrawingStyle#formatLimits} for radii, {@link DrawingStyle#formatValue} for
 * zones and offsets), so an inch ASME zone reads {@code .004}; each standard gets its own marks and an ISO callout
 * never carries an ASME-only one:
 * <ul>
 *   <li>unequally disposed zone: ASME Y14.5-2018 {@code Ⓤ} (ASCII {@code (U)}) with the outward value; ISO 1101:2017
 *       {@code UZ} with the signed offset of the zone's centre (+ toward the outside of the material);</li>
 *   <li>dynamic profile: ASME's modifier (the triangle, ASCII {@code (DYN)}, in frames; the word {@code dynamic} in
 *       the advisor's line); ISO 1101:2017 has no dynamic profile, and its unspecified offset zone {@code OZ} is
 *       written instead (from memory of the 2017 edition);</li>
 *   <li>controlled radius: ASME only; the ISO form is an R with limits ({@link DrawingStyle#format} does it).</li>
 * </ul>
 *
 * <p>Code points used (Unicode charts, Miscellaneous Technical and Enclosed Alphanumerics): U+2313 SEGMENT (profile
 * of a surface), U+24C2 CIRCLED LATIN CAPITAL LETTER M (MMB), U+24C1 CIRCLED L (LMB), U+24CA CIRCLED U (unequally
 * disposed). From memory, not from a chart at hand: U+25B3 WHITE UP-POINTING TRIANGLE for the dynamic profile
 * modifier and U+2194 LEFT RIGHT ARROW for the between indication, both as commonly pasted (common practice).
 */
public final class CalloutFormatter {
    /** Profile of a surface, U+2313. */
    public static final String PROFILE = "\u2313";
    /** Circled M, U+24C2: maximum material boundary. */
    public static final String CIRCLED_M = "\u24C2";
    /** Circled L, U+24C1: least material boundary. */
    public static final String CIRCLED_L = "\u24C1";
    /** Circled U, U+24CA: unequally disposed profile (ASME Y14.5-2018). */
    public static final String CIRCLED_U = "\u24CA";
    /** Triangle for the dynamic profile modifier (from memory). */
    public static final String DYNAMIC = "\u25B3";
    /** Left-right arrow for between (from memory). */
    public static final String BETWEEN = "\u2194";
    /** ISO 1101:2017's modifier for a zone offset by an unspecified amount. */
    public static final String ISO_UNSPECIFIED_OFFSET = "OZ";

    private final DrawingStyle style;
    private final Units units;

    public CalloutFormatter(DrawingStyle style, Units units) {
        this.style = Objects.requireNonNull(style, "style");
        this.units = Objects.requireNonNull(units, "units");
    }

    /** The drawing style numbers and marks follow. */
    public DrawingStyle style() { return style; }

    /** The units of every length. */
    public Units units() { return units; }

    /** A radius callout as drawn. */
    public String radius(RadiusCallout rc) { return style.format(rc); }

    /** A zone, offset or length as the style writes it (at most four places). */
    public String value(double v) { return style.formatValue(v, units, 4); }

    /** Two limits of one size with the same number of places. */
    public String[] limits(double min, double max) { return style.formatLimitPair(min, max, units, 4); }

    /** A signed value: {@code +0.02}, {@code -0.03}, {@code 0}. */
    public String signed(double v) {
        String s = value(v);
        return v > 0 && Double.parseDouble(s) != 0 ? "+" + s : s;
    }

    // ---- the advisor's one-line text

    /**
     * One profile frame on the advisor's line: {@code |⌓|zone[ modifier]|A|B|}, datums with their symbols ({@code BⓂ})
     * as the zone cell has its own, ASME's
     * dynamic modifier as the word after the frame.
     *
     * @param outward the ASME unequally disposed value, or null for an equal-bilateral zone
     */
    public String frame(double zone, Double outward, List<DatumReference> datums, boolean dynamic) {
        StringBuilder sb = new StringBuilder("|").append(PROFILE).append('|')
                .append(zoneCell(zone, outward, dynamic && style == DrawingStyle.ISO, true)).append('|');
        for (DatumReference r : datums) sb.append(datum(r, true)).append('|');
        if (dynamic && style == DrawingStyle.ASME) sb.append(" dynamic");
        return sb.toString();
    }

    /** A profile or composite profile on one line, with its extent in words. */
    public String profile(Callout c) {
        if (c instanceof Callout.Profile p) return frame(p.zone(), p.outward(), p.datums(), p.dynamic()) + extent(p.extent());
        if (c instanceof Callout.CompositeProfile cp) {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < cp.tiers().size(); i++) {
                if (i > 0) sb.append(" over ");
                sb.append(frame(cp.tiers().get(i).zone(), null, cp.tiers().get(i).datums(), false));
            }
            sb.append(style == DrawingStyle.ISO ? " stacked" : " composite").append(extent(cp.extent()));
            return sb.toString();
        }
        throw new IllegalArgumentException("not a profile: " + c.typeName());
    }

    /** Where a profile applies, in words, with a leading space. */
    public static String extent(Extent e) {
        return switch (e.kind()) {
            case THIS_RADIUS -> " on the radius, tangent to tangent";
            case WITH_ADJACENT -> " on the radius and its adjacent surfaces";
            case BETWEEN -> " between " + e.from() + " and " + e.to();
            case ALL_AROUND -> " all around";
            case ALL_OVER -> " all over";
        };
    }

    // ---- drawing-note text: frames, cells, words

    /** The name of the control, in the trade's words. */
    public static String controlName(Callout c) {
        if (c instanceof Callout.Radius) return "radius";
        if (c instanceof Callout.ControlledRadius) return "controlled radius";
        if (c instanceof Callout.Profile) return "profile of a surface";
        if (c instanceof Callout.CompositeProfile) return "composite profile of a surface";
        return "general tolerance";
    }

    /**
     * The name of the control in the words of {@code style}: ISO defines neither a controlled radius
     * nor a composite frame, so under ISO those are named for what the drawing then shows.
     */
    public static String controlName(Callout c, DrawingStyle style) {
        if (style == DrawingStyle.ISO && c instanceof Callout.ControlledRadius) return "radius, smooth blend by company note";
        if (style == DrawingStyle.ISO && c instanceof Callout.CompositeProfile) return "profile of a surface, stacked frames";
        return controlName(c);
    }

    /** The text of an R or CR dimension as drawn, e.g. {@code R2 ±0.2} or {@code CR1.8-2.2} (R under ISO). */
    public String radius(Callout c) {
        if (c instanceof Callout.Radius r) return style.formatLimits(RadiusKind.R, units, r.min(), r.max(), r.nominal());
        if (c instanceof Callout.ControlledRadius r) {
            return style.formatLimits(RadiusKind.CR, units, r.min(), r.max(), r.nominal());
        }
        throw new IllegalArgumentException("not a radius callout: " + c.typeName());
    }

    /** The title-block text of a general callout, e.g. {@code ISO 2768-m}, and its edge note. */
    public String general(Callout.General g) {
        List<String> parts = new ArrayList<>();
        if (g.table() != null) parts.add(tableText(g.table(), g.toleranceClass()));
        if (g.edgeNote() != null) parts.add(g.edgeNote());
        return parts.isEmpty() ? "GENERAL TOLERANCE OF THE TITLE BLOCK" : String.join("; ", parts);
    }

    /** A general-tolerance table as written in a title block. */
    public static String tableText(String table, String toleranceClass) {
        String cls = toleranceClass == null ? "" : toleranceClass;
        if (table != null && table.startsWith("iso2768-1")) return "ISO 2768-" + cls;
        return (table == null ? "" : table) + (cls.isEmpty() ? "" : " class " + cls);
    }

    /**
     * The zone cell of a profile frame without its symbol: {@code 0.1}, {@code 0.1 (U) 0.07}, {@code 0.08 UZ+0.02}...
     * with each standard's own marks (see the class comment).
     *
     * @param unicode the GD&amp;T code points, else plain ASCII
     * @throws InputProblem when the style cannot write the profile ({@link #checkMarks})
     */
    public String zoneCell(Callout.Profile p, boolean unicode) {
        checkMarks(p, style);
        return zoneCell(p.zone(), p.outward(), p.dynamic(), unicode);
    }

    private String zoneCell(double zone, Double outward, boolean dynamic, boolean unicode) {
        StringBuilder sb = new StringBuilder(value(zone));
        if (outward != null && Math.abs(outward - zone / 2) > 1e-12) {
            if (style == DrawingStyle.ISO) {
                sb.append(" UZ").append(signed(outward - zone / 2));
            } else {
                sb.append(unicode ? " " + CIRCLED_U + " " : " (U) ").append(value(outward));
            }
        }
        if (dynamic) sb.append(style == DrawingStyle.ISO ? " " + ISO_UNSPECIFIED_OFFSET : unicode ? " " + DYNAMIC : " (DYN)");
        return sb.toString();
    }

    /**
     * Refuses a profile the style cannot write: under ISO a zone's offset is either stated (UZ) or
     * unspecified (OZ), not both.
     *
     * @throws InputProblem on field {@code callout.dynamic}
     */
    public static void checkMarks(Callout.Profile p, DrawingStyle style) {
        if (style == DrawingStyle.ISO && p.isUnequal() && p.dynamic()) {
            throw InputProblem.ofField("callout.dynamic", "under ISO 1101 a profile zone has either a stated "
                    + "offset (UZ) or an unspecified one (OZ, the ISO form of a dynamic profile), not both: drop the unequal "
                    + "disposition or the dynamic modifier, or draw to ASME Y14.5");
        }
    }

    /** A datum reference cell: {@code A}, {@code B(M)} or {@code BⓂ}. */
    public static String datum(DatumReference d, boolean unicode) {
        if (d.modifier() == null) return d.label();
        if (!unicode) return d.text();
        return d.label() + ("MMB".equals(d.modifier()) ? CIRCLED_M : CIRCLED_L);
    }

    /** The extent label written next to the frame, or empty. */
    public static String extentLabel(Extent e, boolean unicode) {
        return switch (e.kind()) {
            case ALL_AROUND -> "ALL AROUND";
            case ALL_OVER -> "ALL OVER";
            case BETWEEN -> e.from() + (unicode ? " " + BETWEEN + " " : " <-> ") + e.to();
            case WITH_ADJACENT -> "BLEND AND ADJACENT SURFACES";
            default -> "";
        };
    }

    /**
     * The callout on one line per frame tier, cells separated by {@code |}: plain ASCII when
     * {@code unicode} is false, else with the GD&amp;T code points.
     */
    public String line(Callout c, boolean unicode) {
        if (c instanceof Callout.Radius || c instanceof Callout.ControlledRadius) return radius(c);
        if (c instanceof Callout.General g) return general(g);
        String symbol = unicode ? PROFILE : "PROFILE";
        if (c instanceof Callout.Profile p) {
            StringBuilder sb = new StringBuilder("|").append(symbol).append('|').append(zoneCell(p, unicode)).append('|');
            for (DatumReference d : p.datums()) sb.append(datum(d, unicode)).append('|');
            return withExtent(sb.toString(), p.extent(), unicode);
        }
        Callout.CompositeProfile cp = (Callout.CompositeProfile) c;
        List<String> lines = new ArrayList<>();
        for (int t = 0; t < cp.tiers().size(); t++) {
            ProfileTier tier = cp.tiers().get(t);
            // ISO 1101 stacks whole frames, each with its symbol; ASME shares one symbol (common practice)
            String sym = t == 0 || style == DrawingStyle.ISO ? symbol : " ".repeat(unicode ? 1 : symbol.length());
            StringBuilder sb = new StringBuilder("|").append(sym).append('|').append(value(tier.zone())).append('|');
            for (DatumReference d : tier.datums()) sb.append(datum(d, unicode)).append('|');
            lines.add(sb.toString());
        }
        lines.set(0, withExtent(lines.get(0), cp.extent(), unicode));
        return String.join("\n", lines);
    }

    private static String withExtent(String frame, Extent e, boolean unicode) {
        String label = extentLabel(e, unicode);
        return label.isEmpty() ? frame : frame + " " + label;
    }

    /** The callout in words, for reasoning and reviews. */
    public String words(Callout c) {
        if (c instanceof Callout.Radius || c instanceof Callout.ControlledRadius) {
            String kind = c instanceof Callout.Radius ? "radius"
                    : style == DrawingStyle.ISO ? "radius (smooth, without flats or reversals, by a company note that ISO does not define)"
                    : "controlled radius (fair curve, no flats or reversals)";
            double min = c instanceof Callout.Radius r ? r.min() : ((Callout.ControlledRadius) c).min();
            double max = c instanceof Callout.Radius r ? r.max() : ((Callout.ControlledRadius) c).max();
            String[] pair = limits(min, max);
            return kind + " " + radius(c) + ", between " + pair[0] + " and " + pair[1] + " " + units.symbol();
        }
        if (c instanceof Callout.General g) return "general tolerance of the title block: " + general(g);
        if (c instanceof Callout.Profile p) {
            StringBuilder sb = new StringBuilder("profile of a surface, zone ").append(value(p.zone())).append(' ')
                    .append(units.symbol());
            if (p.isUnequal()) {
                sb.append(style == DrawingStyle.ISO ? ", offset zone with " : ", unequally disposed with ")
                        .append(value(p.outward())).append(" outside the material")
                        .append(style == DrawingStyle.ISO ? " (UZ" + signed(p.isoOffset()) + ")" : "");
            }
            if (p.dynamic()) {
                sb.append(style == DrawingStyle.ISO ? ", offset not specified (OZ: form only, size left to the radius tolerance)"
                        : ", dynamic (form only, size left to the radius tolerance)");
            }
            sb.append(datumWords(p.datums()));
            String extent = extentWords(p.extent());
            if (!extent.isEmpty()) sb.append(", ").append(extent);
            return sb.toString();
        }
        Callout.CompositeProfile cp = (Callout.CompositeProfile) c;
        StringBuilder sb = new StringBuilder(style == DrawingStyle.ISO ? "profile of a surface in stacked frames"
                : "composite profile of a surface");
        for (int t = 0; t < cp.tiers().size(); t++) {
            ProfileTier tier = cp.tiers().get(t);
            sb.append(t == 0 ? ": " : "; ").append(t == 0 ? "locating zone " : "refining zone ")
                    .append(value(tier.zone())).append(datumWords(tier.datums()));
        }
        String extent = extentWords(cp.extent());
        if (!extent.isEmpty()) sb.append(", ").append(extent);
        return sb.toString();
    }

    private static String datumWords(List<DatumReference> datums) {
        if (datums.isEmpty()) return ", no datums (size and form only)";
        List<String> parts = new ArrayList<>();
        for (DatumReference d : datums) {
            parts.add(d.label() + (d.modifier() == null ? "" : " at " + d.modifier()));
        }
        return ", relative to datum" + (datums.size() > 1 ? "s " : " ") + String.join(", ", parts);
    }

    /** The extent in words, or empty for the blend alone. */
    public static String extentWords(Extent e) {
        return switch (e.kind()) {
            case ALL_AROUND -> "all around the profile";
            case ALL_OVER -> "all over the part";
            case BETWEEN -> "between " + e.from() + " and " + e.to();
            case WITH_ADJACENT -> "over the blend and the adjacent surfaces";
            default -> "";
        };
    }

    /** Datum references joined for a note: {@code A, B(M)}. */
    public static String datumList(List<DatumReference> datums) {
        List<String> parts = new ArrayList<>();
        for (DatumReference d : datums) parts.add(d.text());
        return String.join(", ", parts);
    }
}
