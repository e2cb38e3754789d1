package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.arcwright.inspect.Comparison;
import org.arcwright.inspect.ControlledRadiusOutcome;
import org.arcwright.inspect.Fits;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionJson;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.ProfileOutcome;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.render.ContourPlot;
import org.arcwright.zone.RadiusEnvelope;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code arcwright inspect FILE}: does a measured section pass its callout, and why. */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = {"Judges a measured section of a fillet or round against its callout and says why.",
                "Callouts: radius, controlled radius, profile (located, floating, dynamic,",
                "unequal), composite profile. Exit 0 pass, 1 fail, 2 bad input."})
final class InspectCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Inspection file (JSON): units, corner (or contour), nominalRadius, callout, points or pointsFile (CSV).")
    Path file;

    @Option(names = "--compare", description = "Also judge the points under every applicable callout, side by side.")
    boolean compare;

    @Option(names = "--plot", paramLabel = "OUT.png|OUT.svg", description = "Draw the contour, zone and points to a PNG or SVG file.")
    Path plot;

    @Option(names = "--window", paramLabel = "L", description = "CR window length along the contour (default: a fifth of the nominal blend).")
    Double window;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Override
    public Integer call() {
        if (plot != null) {
            String name = plot.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
            if (!name.endsWith(".png") && !name.endsWith(".svg")) throw InputProblem.ofField("--plot", "give a .png or .svg file name");
            org.arcwright.io.OutputFiles.requireWritable(plot, "--plot", file);
        }
        InspectionRequest req = new InspectionFiles(new JsonFiles()).read(file).withCompare(compare);
        if (window != null) req = req.withWindow(window);
        InspectionResult r;
        try {
            r = new Inspector().inspect(req);
        } catch (InputProblem p) {
            throw p.source() == null || "points".equals(p.source()) ? p.in(file.toString()) : p;
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format == OutputFormat.json) {
            out.println(new JsonFiles().write(InspectionJson.tree(r)));
        } else {
            printText(out, r);
        }
        if (plot != null) {
            new ContourPlot().write(r, plot);
            if (format == OutputFormat.text) out.println("plot written to " + plot);
        }
        return r.pass() ? Cli.OK : Cli.FAIL;
    }

    private static String n(double v) {
        if (Double.isNaN(v)) return "none";
        if (Double.isInfinite(v)) return "infinite";
        return Numbers.plain(v);
    }

    private static void printText(PrintWriter out, InspectionResult r) {
        InspectionRequest q = r.request();
        String u = q.units().symbol();
        out.printf("%s   %s, %d points (%s)%n", r.pass() ? "PASS" : "FAIL", q.callout().describe(), q.points().size(), u);
        RadiusEnvelope e = r.radius();
        if (e != null) {
            out.printf("  envelope       smallest %s   largest %s   (the tightest limits these points meet)%n",
                    n(e.smallest()), n(e.largest()));
            out.printf("  judged         %d points between the tangent points of the largest arc, %d on the legs, %d beyond%n",
                    e.judged(), e.onLegs(), e.beyond());
            if (e.outside() > 0) out.printf("  outside        %d points beyond the adjacent surfaces: no radius allows them%n", e.outside());
        }
        ControlledRadiusOutcome c = r.controlled();
        if (c != null) {
            out.printf("  local radius   %s to %s over %d windows of %s%n", n(c.localMin()), n(c.localMax()), c.windows(),
                    Numbers.plain(c.windowLength()));
            out.printf("  reversals      %d%s%n", c.reversals().size(), c.flats() > 0 ? "   flat windows " + c.flats() : "");
            for (ControlledRadiusOutcome.Reversal v : c.reversals()) {
                out.printf("                 stations %s to %s, near [%s, %s]%n", n(v.fromStation()), n(v.toStation()), n(v.x()), n(v.y()));
            }
        }
        if (r.profile() != null) printProfile(out, "", r.profile(), u);
        if (r.tiers() != null) {
            for (int i = 0; i < r.tiers().size(); i++) {
                ProfileOutcome t = r.tiers().get(i);
                out.printf("  tier %d         %s   zone %s%s%n", i + 1, t.pass() ? "pass" : "FAIL", n(t.zone().width()), freeText(t));
                printProfile(out, "  ", t, u);
            }
        }
        Fits f = r.fits();
        if (f != null) {
            out.printf("  least squares  R %s at [%s, %s], rms %s  (%d blend points)%n", n(f.leastSquares().circle().r()),
                    n(f.leastSquares().circle().cx()), n(f.leastSquares().circle().cy()), n(f.leastSquares().rms()), f.blendPoints());
            out.printf("  minimum zone   R %s to %s (width %s) at [%s, %s]%n", n(f.minimumZone().inner()), n(f.minimumZone().outer()),
                    n(f.minimumZone().width()), n(f.minimumZone().cx()), n(f.minimumZone().cy()));
            out.printf("  tangency       step at leg A %s, at leg B %s  (a radius gauge does not see these)%n", n(f.stepA()), n(f.stepB()));
        }
        if (r.worst() != null) {
            out.printf("  worst point    #%d [%s, %s], %s %s%s%n", r.worst().index(), n(r.worst().x()), n(r.worst().y()),
                    r.worst().excess() > 0 ? "outside by" : "inside by", n(Math.abs(r.worst().excess())),
                    "distance".equals(r.worst().measure()) ? "" : " (" + r.worst().measure() + ")");
        }
        if (!r.comparisons().isEmpty()) {
            out.println();
            out.println("  compare (same points; * = limits derived from the file's callout)");
            for (Comparison cmp : r.comparisons()) {
                out.printf("    %-5s %-19s %-44s %s%n", cmp.pass() ? "pass" : "FAIL", cmp.name(), cmp.callout() + (cmp.derived() ? " *" : ""),
                        cmp.figure());
            }
        }
        List<String> notes = r.notes();
        for (String s : notes) out.println("  note: " + s);
        out.println("  Check the verdict against the governing standard and your company's inspection practice.");
    }

    private static String freeText(ProfileOutcome t) {
        if (t.free().isEmpty() && !t.dynamic()) return ", located";
        StringBuilder sb = new StringBuilder(", free:");
        for (org.arcwright.inspect.Freedom fr : org.arcwright.inspect.Freedom.values()) if (t.free().contains(fr)) sb.append(' ').append(fr.key());
        if (t.dynamic()) sb.append(" offset");
        return sb.toString();
    }

    private static void printProfile(PrintWriter out, String indent, ProfileOutcome p, String u) {
        out.printf("%s  needs zone     %s (same disposition and freedom)%n", indent, n(p.requiredZone()));
        out.printf("%s  deviation      %s outward, %s inward (after registration)%n", indent, n(p.maxOutward()), n(p.maxInward()));
        if (!p.free().isEmpty() || p.dynamic()) {
            out.printf("%s  registration   x %s, y %s, rotation %s° about [%s, %s], offset %s%n", indent, n(p.registration().x()),
                    n(p.registration().y()), n(p.registration().rotationDeg()), n(p.registration().pivotX()),
                    n(p.registration().pivotY()), n(p.registration().offset()));
        }
    }
}
