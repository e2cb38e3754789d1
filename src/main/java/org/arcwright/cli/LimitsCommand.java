package org.arcwright.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.tolerance.LimitsReport;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.Units;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code arcwright limits TEXT}: limits, crescent and equivalent profile zone of a radius callout. */
@Command(name = "limits", mixinStandardHelpOptions = true,
        description = {"Limits, crescent width and equivalent profile zone of a radius callout.",
                "TEXT forms: R0.55 ±0.05, R0.55 +/-0.05, R3 +0.2/-0.1, CR 1.5-2.0, R .060 MAX, CR .25 MIN, R 2.5"})
final class LimitsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "TEXT", description = "The radius callout as drawn (quote it).")
    String text;

    @Option(names = "--angle", paramLabel = "DEG", defaultValue = "90",
            description = "Included angle between the adjacent surfaces, degrees (default: ${DEFAULT-VALUE}).")
    double angle;

    @Option(names = "--units", paramLabel = "mm|in", defaultValue = "mm",
            description = "Units when the text names none (default: ${DEFAULT-VALUE}).")
    String units;

    @Option(names = "--blend", paramLabel = "round|fillet",
            description = "The blend's kind, to give the unequally disposed profile zone that holds the crescent exactly.")
    String blend;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Override
    public Integer call() {
        RadiusCallout callout = CalloutParser.parse(text, Units.parse(units), "TEXT");
        Boolean fillet = blend == null ? null : parseBlend(blend);
        LimitsReport r = LimitsReport.of(callout, angle);
        PrintWriter out = spec.commandLine().getOut();
        if (format == OutputFormat.json) {
            Map<String, Object> m = toJson(r);
            if (fillet != null && r.crescent() != null && r.nominal() != null) m.put("unequalProfile", unequal(r, fillet));
            out.println(new JsonFiles().write(m));
        } else {
            printText(out, r, fillet);
        }
        return Cli.OK;
    }

    private static boolean parseBlend(String text) {
        if (text.equalsIgnoreCase("fillet")) return true;
        if (text.equalsIgnoreCase("round")) return false;
        throw InputProblem.ofField("--blend", "use round or fillet, got '" + text + "'");
    }

    /** Why a figure is omitted for this form, or null when it is given. */
    private static String omitted(LimitsReport r) {
        if (r.max() == null && r.min() != null) return "a MIN-only radius has no upper limit, so no crescent and no deviation";
        if (r.crescent() == null || r.nominal() != null) return null;
        return "a MAX-only radius has no nominal arc and no deviation";
    }

    /**
     * A centred zone's offset as 0.0: the two half-widths cancel only to rounding (2.4E-17, or -0.0), which a reader of
     * the JSON would take for an offset.
     */
    private static double centred(double offset, double width) {
        return Math.abs(offset) <= 1e-12 * Math.max(1, width) ? 0.0 : offset;
    }

    /** The limit arc nearest the nominal: where the true profile is drawn when the zone does not reach the nominal. */
    private static double nearestLimit(LimitsReport r) {
        return Math.abs(r.min() - r.nominal()) <= Math.abs(r.max() - r.nominal()) ? r.min() : r.max();
    }

    /** The unequally disposed profile zone that holds the crescent exactly, ASME and ISO forms. */
    private static Map<String, Object> unequal(LimitsReport r, boolean fillet) {
        CrescentZone c = r.crescent();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("blend", fillet ? "fillet" : "round");
        m.put("zone", c.width());
        m.put("isoOffset", centred(c.isoOffset(fillet), c.width()));
        if (c.holdsNominal()) {
            m.put("outward", c.outwardPortion(fillet).getAsDouble());
            m.put("asmeBasicRadius", r.nominal());
        } else {
            double at = nearestLimit(r);
            m.put("outward", CrescentZone.of(r.min(), at, r.max(), r.includedAngleDeg()).outwardPortion(fillet).getAsDouble());
            m.put("asmeBasicRadius", at);
        }
        return m;
    }

    static Map<String, Object> toJson(LimitsReport r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("kind", r.callout().kind().symbol());
        m.put("units", r.callout().units().symbol());
        m.put("form", r.callout().form().formName());
        m.put("angle", r.includedAngleDeg());
        m.put("min", r.min());
        m.put("max", r.max());
        m.put("nominal", r.nominal());
        m.put("nominalDrawn", r.callout().nominal().isPresent());
        m.put("mean", r.callout().mean().isPresent() ? r.callout().mean().getAsDouble() : null);
        m.put("band", r.band());
        CrescentZone c = r.crescent();
        m.put("crescentWidth", c == null ? null : c.width());
        if (c == null) {
            m.put("crescent", null);
        } else {
            Map<String, Object> cm = new LinkedHashMap<>();
            cm.put("width", c.width());
            cm.put("minArcOffset", c.minArcOffset());
            cm.put("maxArcOffset", c.maxArcOffset());
            cm.put("towardVertex", c.towardVertex());
            cm.put("awayFromVertex", c.awayFromVertex());
            cm.put("bisectorFactor", c.factor());
            cm.put("measuredFrom", r.nominal() == null ? "largest arc" : "nominal arc");
            m.put("crescent", cm);
        }
        m.put("profileZone", r.profileZone());
        m.put("profileZoneShortcut", r.shortcutProfile());
        if (omitted(r) != null) m.put("profileZoneOmitted", omitted(r));
        Map<String, Object> text = new LinkedHashMap<>();
        text.put("asme", r.asme());
        text.put("iso", r.iso());
        m.put("callout", text);
        m.put("remarks", r.remarks());
        return m;
    }

    /** Where the crescent lies about the nominal arc, in words. */
    private static String span(CrescentZone z) {
        String lo = DecimalText.fixed(Math.abs(z.minArcOffset()), 4);
        String hi = DecimalText.fixed(Math.abs(z.maxArcOffset()), 4);
        if (z.minArcOffset() >= 0) {
            return (lo.equals("0.0000") ? "from the nominal arc" : "from " + lo) + " to " + hi + " away from the vertex";
        }
        if (z.maxArcOffset() <= 0) {
            return (hi.equals("0.0000") ? "from the nominal arc" : "from " + hi) + " to " + lo + " toward the vertex";
        }
        return lo + " toward the vertex and " + hi + " away from it";
    }

    private static void printText(PrintWriter out, LimitsReport r, Boolean fillet) {
        RadiusCallout c = r.callout();
        int p = Math.max(2, c.places());
        String u = c.units().symbol();
        out.printf("%s   (%s, surfaces at %s°)%n", r.asme(), u, CrescentZone.degrees(r.includedAngleDeg()));
        String min = r.min() == null ? "—" : DecimalText.fixed(r.min(), p);
        String max = r.max() == null ? "—" : DecimalText.fixed(r.max(), p);
        out.printf("  limits         min %s   max %s%n", min, max);
        if (r.nominal() == null) {
            out.printf("  nominal        — (none drawn: a %s-only radius)%n", r.max() == null ? "MIN" : "MAX");
        } else {
            out.printf("  nominal        %s%s%n", DecimalText.fixed(r.nominal(), p),
                    c.nominal().isPresent() ? "" : " (mean of the limits)");
        }
        if (r.band() != null) out.printf("  band           %s%n", DecimalText.fixed(r.band(), p));
        out.printf("  ASME Y14.5     %s%n", r.asme());
        out.printf("  ISO 129-1      %s%n", r.iso());
        CrescentZone z = r.crescent();
        if (z == null && omitted(r) != null) out.printf("  profile zone   —  omitted: %s%n", omitted(r));
        if (z != null) {
            if (r.nominal() == null) {
                out.printf("  crescent       %s wide on the bisector, between the sharp corner and the R%s arc%n",
                        DecimalText.fixed(z.width(), 4), DecimalText.fixed(r.max(), p));
                out.printf("  profile zone   —  omitted: %s, so there is no zone about a nominal and no shortcut%n", omitted(r));
            } else {
                out.printf("  crescent       %s wide on the bisector, %s (measured from the nominal arc)%n",
                        DecimalText.fixed(z.width(), 4), span(z));
                out.printf("  profile zone   %s  geometric: the equal-bilateral zone about the nominal arc that holds the crescent%n",
                        DecimalText.fixed(r.profileZone(), 4));
                out.printf("                 %s  common shortcut (2 × the larger deviation): looser, allows that much along the whole blend%n",
                        DecimalText.fixed(r.shortcutProfile(), 4));
            }
            if (fillet != null && r.nominal() != null) printUnequal(out, r, fillet, p);
        }
        for (String remark : r.remarks()) out.println("  note: " + remark);
    }

    private static void printUnequal(PrintWriter out, LimitsReport r, boolean fillet, int p) {
        CrescentZone z = r.crescent();
        String uz = DecimalText.fixed(z.isoOffset(fillet), 4);
        String iso = uz.equals("0.0000") || uz.equals("-0.0000")
                ? "ISO: equal-bilateral about the nominal, no UZ offset"
                : "ISO offset UZ" + (z.isoOffset(fillet) > 0 ? "+" : "") + uz;
        String asme;
        if (z.holdsNominal()) {
            asme = "ASME unequally disposed " + DecimalText.fixed(z.outwardPortion(fillet).getAsDouble(), 4) + " outward";
        } else {
            double at = nearestLimit(r);
            double outward = CrescentZone.of(r.min(), at, r.max(), r.includedAngleDeg()).outwardPortion(fillet).getAsDouble();
            asme = "ASME unequally disposed: not about R" + DecimalText.fixed(r.nominal(), p)
                    + " (the zone does not reach the nominal arc); with the true profile drawn at R" + DecimalText.fixed(at, p)
                    + ", " + DecimalText.fixed(outward, 4) + " outward";
        }
        String centre = uz.equals("0.0000") || uz.equals("-0.0000") ? "centred on the nominal arc"
                : "its centre " + DecimalText.fixed(Math.abs(z.isoOffset(fillet)), 4) + " from the nominal arc toward the "
                + (z.isoOffset(fillet) > 0 ? "add-material" : "remove-material") + " side";
        out.printf("  unequal zone   %s total for a %s, %s: %s; %s%n",
                DecimalText.fixed(z.width(), 4), fillet ? "fillet" : "round", centre, iso, asme);
    }
}
