package org.arcwright.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
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
            if (fillet != null && r.crescent() != null) m.put("unequalProfile", unequal(r.crescent(), fillet));
            out.println(new JsonFiles().write(m));
        } else {
            printText(out, r, fillet);
        }
        return Cli.OK;
    }

    private static boolean parseBlend(String text) {
        if (text.equalsIgnoreCase("fillet")) return true;
        if (text.equalsIgnoreCase("round")) return false;
        throw org.arcwright.io.InputProblem.ofField("--blend", "use round or fillet, got '" + text + "'");
    }

    /** The unequally disposed profile zone that holds the crescent exactly, ASME and ISO forms. */
    private static Map<String, Object> unequal(CrescentZone c, boolean fillet) {
        Map<String, Object> m = new LinkedHashMap<>();
        double outward = c.outwardPortion(fillet);
        m.put("blend", fillet ? "fillet" : "round");
        m.put("zone", c.width());
        m.put("outward", outward);
        m.put("isoOffset", outward - c.width() / 2);
        return m;
    }

    static Map<String, Object> toJson(LimitsReport r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("input", r.callout().kind().symbol());
        m.put("kind", r.callout().kind().symbol());
        m.put("units", r.callout().units().symbol());
        m.put("form", r.callout().form().formName());
        m.put("angle", r.includedAngleDeg());
        m.put("min", r.min());
        m.put("max", r.max());
        m.put("nominal", r.nominal());
        m.put("mean", r.callout().mean().isPresent() ? r.callout().mean().getAsDouble() : null);
        m.put("band", r.band());
        CrescentZone c = r.crescent();
        m.put("crescentWidth", c == null ? null : c.width());
        m.put("crescent", c == null ? null : Map.of(
                "width", c.width(), "towardVertex", c.towardVertex(), "awayFromVertex", c.awayFromVertex(),
                "bisectorFactor", c.factor()));
        m.put("profileZone", c == null ? null : c.equalBilateralProfile());
        m.put("profileZoneShortcut", c == null ? null : c.shortcutProfile());
        Map<String, Object> text = new LinkedHashMap<>();
        text.put("asme", r.asme());
        text.put("iso", r.iso());
        m.put("callout", text);
        m.put("remarks", r.remarks());
        m.remove("input");
        return m;
    }

    private static void printText(PrintWriter out, LimitsReport r, Boolean fillet) {
        RadiusCallout c = r.callout();
        int p = Math.max(2, c.places());
        String u = c.units().symbol();
        out.printf("%s   (%s, surfaces at %s°)%n", r.asme(), u, Numbers.plain(r.includedAngleDeg()));
        String min = r.min() == null ? "—" : Numbers.fixed(r.min(), p);
        String max = r.max() == null ? "—" : Numbers.fixed(r.max(), p);
        out.printf("  limits         min %s   max %s%n", min, max);
        out.printf("  nominal        %s%s%n", Numbers.fixed(r.nominal(), p),
                c.nominal().isPresent() ? "" : " (mean of the limits)");
        if (r.band() != null) out.printf("  band           %s%n", Numbers.fixed(r.band(), p));
        out.printf("  ASME Y14.5     %s%n", r.asme());
        out.printf("  ISO 129-1      %s%n", r.iso());
        CrescentZone z = r.crescent();
        if (z != null) {
            out.printf("  crescent       %s wide on the bisector: %s toward the vertex, %s away from it%n",
                    Numbers.fixed(z.width(), 4), Numbers.fixed(z.towardVertex(), 4), Numbers.fixed(z.awayFromVertex(), 4));
            out.printf("  profile zone   %s  geometric: the equal-bilateral zone about the nominal arc that holds the crescent%n",
                    Numbers.fixed(z.equalBilateralProfile(), 4));
            out.printf("                 %s  common shortcut (2 × the larger deviation): looser, allows that much along the whole blend%n",
                    Numbers.fixed(z.shortcutProfile(), 4));
            if (fillet != null) {
                double outward = z.outwardPortion(fillet);
                out.printf("  unequal zone   %s total, %s outward (add-material side) for a %s: ASME unequally disposed %s, ISO offset UZ%s%s%n",
                        Numbers.fixed(z.width(), 4), Numbers.fixed(outward, 4), fillet ? "fillet" : "round",
                        Numbers.fixed(outward, 4), outward - z.width() / 2 >= 0 ? "+" : "",
                        Numbers.fixed(outward - z.width() / 2, 4));
            }
        }
        for (String remark : r.remarks()) out.println("  note: " + remark);
    }
}
