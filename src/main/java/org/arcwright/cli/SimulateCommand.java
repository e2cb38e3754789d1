package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.simulate.CalloutResult;
import org.arcwright.simulate.Share;
import org.arcwright.simulate.Simulation;
import org.arcwright.simulate.SimulationFiles;
import org.arcwright.simulate.SimulationJson;
import org.arcwright.simulate.SimulationResult;
import org.arcwright.simulate.SimulationRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright simulate FILE}: what each candidate callout lets through, on a simulated population. */
@Command(name = "simulate", mixinStandardHelpOptions = true,
        description = {"Simulates parts from a process model, measures each as a CMM would and judges it",
                "by every candidate callout (the inspect engine) and by the function (true geometry).",
                "Reports per callout the shares accepted, escapes and false rejects, with 95 %% intervals.",
                "Exit 0 done, 2 bad input."})
final class SimulateCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Process file (JSON): units, corner, nominalRadius, process, needs, callouts.")
    Path file;

    @Option(names = "--parts", paramLabel = "N", description = "Parts to simulate (default: the file's, else 10000).")
    Integer parts;

    @Option(names = "--seed", paramLabel = "S", description = "Random seed (default: the file's, else 1). Same seed, same result.")
    Long seed;

    @Option(names = "--points", paramLabel = "N", description = "Points per measured section (default: the file's, else 200).")
    Integer points;

    @Option(names = "--threads", paramLabel = "T", description = "Worker threads (default: all cores). The result does not depend on it.")
    Integer threads;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Override
    public Integer call() {
        Simulation sim = new SimulationFiles(new JsonFiles()).read(file);
        if (parts != null) {
            if (parts < 1) throw InputProblem.ofField("--parts", "must be at least 1, got " + parts);
            sim = sim.withParts(parts);
        }
        if (seed != null) sim = sim.withSeed(seed);
        if (points != null) {
            if (points < 3) throw InputProblem.ofField("--points", "need at least 3 points per section, got " + points);
            sim = sim.withModel(sim.model().withPoints(points));
        }
        if (threads != null && threads < 1) throw InputProblem.ofField("--threads", "must be at least 1, got " + threads);
        SimulationRunner runner = threads == null ? SimulationRunner.allCores() : new SimulationRunner(threads);
        PrintWriter err = spec.commandLine().getErr();
        ProgressBar bar = System.console() != null ? new ProgressBar(err) : null;
        SimulationResult r;
        try {
            r = runner.run(sim, bar == null ? SimulationRunner.Progress.NONE : bar, () -> false);
        } catch (InputProblem p) {
            throw p.source() == null ? p.in(file.toString()) : p;
        } finally {
            if (bar != null) bar.finish();
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format == OutputFormat.json) {
            out.println(new JsonFiles().write(SimulationJson.tree(r)));
        } else {
            printText(out, r);
        }
        return Cli.OK;
    }

    /** A share as a percentage to 2 places: a tie (16,633 of 20,000) rounds half to even, as every figure does. */
    static String pct(double v) {
        return DecimalText.percent(v, 2) + " %";
    }

    /** A share and its 95 % interval in one column, the share right-aligned so the columns line up. */
    static String cell(Share s) {
        return String.format(Locale.ROOT, "%6s %% (%s-%s)", DecimalText.percent(s.share(), 2), DecimalText.percent(s.low(), 2),
                DecimalText.percent(s.high(), 2));
    }

    static void printText(PrintWriter out, SimulationResult r) {
        Simulation s = r.simulation();
        String u = s.model().units().symbol();
        out.printf("simulated %d parts, seed %d, %d points per section (lengths in %s)%n", s.parts(), s.seed(),
                s.model().points(), u);
        out.printf("  needs          %s%n", s.needs().describe(u));
        Share g = r.goodShare();
        out.printf("  good parts     %d, %s (%s to %s)%n", r.good(), pct(g.share()), pct(g.low()), pct(g.high()));
        out.println();
        int w = 24;
        for (CalloutResult c : r.callouts()) w = Math.max(w, c.text().length() + 2);
        String row = "  %-" + w + "s %-26s %-26s %-26s%s%n";
        boolean anyIndeterminate = r.callouts().stream().anyMatch(c -> c.indeterminate() > 0);
        out.printf(row, "callout", "accepted", "escapes", "false rejects", anyIndeterminate ? "   no verdict" : "");
        for (CalloutResult c : r.callouts()) {
            out.printf(row, c.text(), cell(c.acceptedShare()), cell(c.escapeShare()), cell(c.falseRejectShare()),
                    anyIndeterminate ? "   " + cell(c.indeterminateShare()) : "");
        }
        out.println();
        out.println("  note: shares of all parts; in brackets the 95 % Wilson score interval, in %");
        out.println("  note: escape = accepted but functionally bad; false reject = not accepted but functionally good");
        out.println("  note: function judged on each part's true geometry; callouts judged on its measured section by the inspect engine");
        out.println("  note: " + slack(s, u));
        out.println("  caution: " + SimulationResult.CAUTION);
    }

    /** The slack at the tangent points each callout was judged with, and where it came from. */
    private static String slack(Simulation s, String u) {
        if (!Double.isNaN(s.resolution())) {
            return "points within " + DecimalText.significant(s.resolution(), 3) + " " + u + " of a surface taken as on it (the file's resolution)";
        }
        Set<String> values = new LinkedHashSet<>();
        for (InspectionCallout c : s.callouts()) values.add(DecimalText.significant(s.resolutionFor(c), 3));
        return "points within " + String.join(" / ", values) + " " + u + " of a surface taken as on it (the default: measuring noise "
                + "alone puts a point of a perfect part beyond it with at most " + DecimalText.significant(100 * Simulation.NOISE_ALONE_REJECTS, 2)
                + " % probability; never more than a tenth of a radius band)";
    }

    /** A one-line progress bar on the terminal's error stream. */
    private static final class ProgressBar implements SimulationRunner.Progress {
        private final PrintWriter err;
        private int shown = -1;

        ProgressBar(PrintWriter err) { this.err = err; }

        @Override
        public synchronized void partsDone(long done, long total) {
            int pct = (int) (100 * done / total);
            if (pct == shown) return;
            shown = pct;
            int filled = pct * 30 / 100;
            err.print("\rsimulating [" + "#".repeat(filled) + " ".repeat(30 - filled) + "] " + pct + " % (" + done + " of " + total + " parts)");
            err.flush();
        }

        synchronized void finish() {
            if (shown >= 0) {
                err.print("\r" + " ".repeat(72) + "\r");
                err.flush();
            }
        }
    }
}
