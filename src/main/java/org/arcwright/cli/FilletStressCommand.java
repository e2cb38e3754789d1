package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.DecimalText;
import org.arcwright.io.JsonFiles;
import org.arcwright.io.OutputFiles;
import org.arcwright.mechanics.FilletStressAnalysis;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.FilletStressReport;
import org.arcwright.mechanics.MechanicsFiles;
import org.arcwright.mechanics.MinimumRadius;
import org.arcwright.mechanics.NotchSensitivity;
import org.arcwright.mechanics.PetersonFits;
import org.arcwright.mechanics.StressConcentration;
import org.arcwright.mechanics.StressPoint;
import org.arcwright.mechanics.StressTarget;
import org.arcwright.render.plot.StressPlot;
import org.arcwright.tolerance.Units;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright fillet-stress FILE}: K<sub>t</sub>/K<sub>f</sub> of a shoulder fillet across its tolerance. */
@Command(name = "fillet-stress", mixinStandardHelpOptions = true,
        description = {"Stress concentration of a shoulder fillet at its smallest, nominal and largest radius "
                + "(Peterson's fits; Neuber/Shigley notch sensitivity for steels), and the smallest radius for a target.",
                "FILE (JSON): units, shape (stepped-shaft|stepped-bar), load (tension|bending|torsion), D, d, "
                        + "r or rMin/rMax or callout (\"R1 +0.2/-0.1\"), optional ultimateStrength {value, units: MPa|ksi}, targetKt, targetKf.",
                "Exit 1 when a target is given and the smallest radius allowed does not meet it."})
final class FilletStressCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "The fillet to assess (JSON).")
    Path file;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Option(names = "--plot", paramLabel = "OUT.png|OUT.svg", description = "Also draw Kt (and Kf) against r with the tolerance band.")
    Path plot;

    @Override
    public Integer call() {
        if (plot != null) OutputFiles.requireWritable(plot, "--plot", file);
        PetersonFits fits = PetersonFits.published();
        FilletStressAnalysis analysis = new FilletStressAnalysis(new StressConcentration(fits), new NotchSensitivity());
        MechanicsFiles.FilletStressJob job = new MechanicsFiles(new JsonFiles(), fits).readFilletStress(file);
        FilletStressReport report = analysis.report(job.stressCase());
        List<MinimumRadius> minima = new ArrayList<>();
        for (StressTarget t : job.targets()) minima.add(analysis.minimumRadius(job.stressCase(), t));
        MinimumRadius governing = governing(minima);
        if (plot != null) {
            StressPlot p = new StressPlot(analysis);
            StressTarget t = job.targets().isEmpty() ? null : governing.target();
            p.write(plot, p.chart(job.stressCase(), t, governing));
        }
        Boolean meets = governing == null ? null : governing.found() && job.stressCase().rMin() >= governing.radius() - 1e-12;
        PrintWriter out = spec.commandLine().getOut();
        if (format == OutputFormat.json) {
            out.println(new JsonFiles().write(toJson(report, minima, governing, meets)));
        } else {
            printText(out, report, minima, meets);
        }
        return meets == null || meets ? Cli.OK : Cli.FAIL;
    }

    /** The radius that meets every target: the largest of the per-target minima (null when none asked). */
    static MinimumRadius governing(List<MinimumRadius> minima) {
        MinimumRadius g = null;
        for (MinimumRadius m : minima) {
            if (!m.found()) return m;
            if (g == null || m.radius() > g.radius()) g = m;
        }
        return g;
    }

    static Map<String, Object> toJson(FilletStressReport r, List<MinimumRadius> minima, MinimumRadius governing, Boolean meets) {
        FilletStressCase c = r.input();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("shape", c.shape().key());
        m.put("load", c.load().key());
        m.put("units", c.units().symbol());
        m.put("D", c.bigD());
        m.put("d", c.smallD());
        m.put("h", c.stepHeight());
        m.put("fit", r.atNominal().kt().fitName());
        m.put("fitSource", r.atNominal().kt().source());
        m.put("r", c.rNominal());
        m.put("hOverR", r.atNominal().kt().hOverR());
        m.put("kt", r.atNominal().kt().kt());
        m.put("withinFit", r.withinFit());
        if (c.strength() != null) {
            m.put("ultimateStrengthMPa", c.strength().mpa());
            m.put("q", r.atNominal().q());
            m.put("kf", r.atNominal().kf());
        }
        if (c.hasTolerance()) {
            m.put("atMin", point(r.atMin()));
            m.put("atNominal", point(r.atNominal()));
            m.put("atMax", point(r.atMax()));
            m.put("ktCostOfMinimum", r.ktCostOfMinimum());
            if (r.kfCostOfMinimum() != null) m.put("kfCostOfMinimum", r.kfCostOfMinimum());
            m.put("costOfMinimumPercent", r.costPercent());
        }
        if (governing != null) {
            m.put("minimumRadius", governing.found() ? governing.radius() : null);
            m.put("rMinMeetsTarget", meets);
            List<Map<String, Object>> detail = new ArrayList<>();
            for (MinimumRadius mr : minima) {
                Map<String, Object> d = new LinkedHashMap<>();
                d.put("factor", mr.target().factor().symbol());
                d.put("target", mr.target().value());
                d.put("found", mr.found());
                d.put("r", mr.found() ? mr.radius() : null);
                d.put("valueAtR", mr.valueAtRadius());
                d.put("limitedByFit", mr.limitedByFit());
                d.put("message", mr.message());
                detail.add(d);
            }
            m.put("minimumRadiusDetail", detail);
        } else {
            m.put("notChecked", NO_TARGET);
        }
        m.put("notes", r.notes());
        m.put("cautions", r.cautions());
        return m;
    }

    private static Map<String, Object> point(StressPoint p) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("r", p.r());
        m.put("hOverR", p.kt().hOverR());
        m.put("kt", p.kt().kt());
        if (p.q() != null) m.put("q", p.q());
        if (p.kf() != null) m.put("kf", p.kf());
        m.put("withinFit", p.withinFit());
        return m;
    }

    /** Said whenever no target is given, so that exit 0 is not read as "meets its target". */
    static final String NO_TARGET = "not checked: no targetKt or targetKf given, so no limit on K_t or K_f was judged; "
            + "exit 0 says only that the figures were computed";

    private static void printText(PrintWriter out, FilletStressReport r, List<MinimumRadius> minima, Boolean meets) {
        FilletStressCase c = r.input();
        String u = c.units().symbol();
        boolean kf = c.strength() != null;
        out.printf("%s in %s, D %s / d %s %s, step h %s %s%n", capital(c.shape().description()), c.load().key(),
                DecimalText.significant(c.bigD(), 4), DecimalText.significant(c.smallD(), 4), u, DecimalText.significant(c.stepHeight(), 4), u);
        out.printf("  fit        %s — %s%n", r.atNominal().kt().fitName(), r.atNominal().kt().source());
        if (kf) {
            out.printf("  material   S_ut %s MPa (%s ksi), Neuber's constant for steels (Shigley)%n",
                    DecimalText.significant(c.strength().mpa(), 4), DecimalText.significant(c.strength().ksi(), 4));
        }
        out.printf("  %-10s %8s %7s %7s%s%n", "", "r (" + u + ")", "h/r", "Kt", kf ? String.format("%7s %7s", "q", "Kf") : "");
        if (c.hasTolerance()) {
            row(out, "r min", r.atMin(), kf, places(c));
            row(out, "nominal", r.atNominal(), kf, places(c));
            row(out, "r max", r.atMax(), kf, places(c));
            out.printf("  r min costs Kt %s%s against nominal (%s %s%%)%n", signed(r.ktCostOfMinimum(), 3),
                    kf ? " and Kf " + signed(r.kfCostOfMinimum(), 3) : "", kf ? "Kf" : "Kt", signed(r.costPercent(), 1));
        } else {
            row(out, "r", r.atNominal(), kf, places(c));
        }
        for (MinimumRadius m : minima) out.println("  target     " + m.message());
        if (minima.isEmpty()) out.println("  " + NO_TARGET);
        MinimumRadius g = governing(minima);
        if (meets != null) {
            if (meets) {
                out.printf("  verdict    PASS: r min %s %s is at or above %s %s, the smallest radius that meets %s%n",
                        DecimalText.significant(c.rMin(), 4), u, DecimalText.significant(g.radius(), 4), u, minima.size() > 1 ? "every target" : "the target");
            } else if (g.limitedByFit()) {
                out.printf("  verdict    FAIL: r min %s %s is below %s %s, the sharpest fillet the fit covers; "
                        + "below it the target cannot be confirmed%n", DecimalText.significant(c.rMin(), 4), u, DecimalText.significant(g.radius(), 4), u);
            } else if (g.found()) {
                out.printf("  verdict    FAIL: r min %s %s is below %s %s, the smallest radius that meets %s%n",
                        DecimalText.significant(c.rMin(), 4), u, DecimalText.significant(g.radius(), 4), u, minima.size() > 1 ? "every target" : "the target");
            } else {
                out.println("  verdict    FAIL: no fillet that fits the step meets the target");
            }
        }
        for (String n : r.notes()) out.println("  note: " + n);
        for (String n : r.cautions()) out.println("  caution: " + n);
    }

    /** Places for a radius in the file's units: an inch radius needs one more than a millimetre one. */
    private static int places(FilletStressCase c) {
        return c.units() == Units.INCH ? 4 : 3;
    }

    private static void row(PrintWriter out, String label, StressPoint p, boolean kf, int places) {
        out.printf("  %-10s %8s %7s %7s%s%s%n", label, DecimalText.fixed(p.r(), places), DecimalText.fixed(p.kt().hOverR(), 2),
                DecimalText.fixed(p.kt().kt(), 3), kf ? String.format("%7s %7s", DecimalText.fixed(p.q(), 3), DecimalText.fixed(p.kf(), 3)) : "",
                p.withinFit() ? "" : "   (extrapolated)");
    }

    private static String capital(String s) { return Character.toUpperCase(s.charAt(0)) + s.substring(1); }

    /** A change at fixed places with its sign, as a cost reads: +0.157, -0.020 ({@link DecimalText#fixed} writes no "-0.000"). */
    private static String signed(double v, int places) {
        String f = DecimalText.fixed(v, places);
        return f.startsWith("-") ? f : "+" + f;
    }
}
