package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.arcwright.inspect.Comparison;
import org.arcwright.inspect.ControlledRadiusOutcome;
import org.arcwright.inspect.Fits;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionJson;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.ProfileOutcome;
import org.arcwright.inspect.AdjacentSurfaces;
import org.arcwright.inspect.Verdict;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.io.OutputFiles;
import org.arcwright.render.ContourPlot;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Point2;
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
                "unequal), composite profile. Exit 0 pass, 1 fail, 2 bad input,",
                "3 indeterminate (the measurement cannot prove either)."})
final class InspectCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Inspection file (JSON): units, corner (or contour), nominalRadius, callout, points or pointsFile (CSV).")
    Path file;

    @Option(names = "--compare", description = "Also judge the points under every applicable callout, side by side.")
    boolean compare;

    @Option(names = "--plot", paramLabel = "OUT.png|OUT.svg", description = "Draw the contour, zone and points to a PNG or SVG file.")
    Path plot;

    @Option(names = "--window", paramLabel = "L", description = "CR window length along the contour (default: a fifth of the nominal blend; at least the blend / 250).")
    Double window;

    @Option(names = "--uncertainty", paramLabel = "U", description = "Expanded measurement uncertainty U in the file's units; verdicts then follow the ISO 14253-1 default rule (overrides the file's).")
    Double uncertainty;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Override
    public Integer call() {
        if (plot != null) {
            String name = plot.getFileName().toString().toLowerCase(Locale.ROOT);
            if (!name.endsWith(".png") && !name.endsWith(".svg")) throw InputProblem.ofField("--plot", "give a .png or .svg file name");
            OutputFiles.requireWritable(plot, "--plot", file);
        }
        if (window != null && !Double.isFinite(window)) throw InputProblem.ofField("--window", "must be a finite length, got " + DecimalText.exact(window));
        if (uncertainty != null && !Double.isFinite(uncertainty)) throw InputProblem.ofField("--uncertainty", "must be a finite length, got " + DecimalText.exact(uncertainty));
        InspectionRequest req = new InspectionFiles(new JsonFiles()).read(file).withCompare(compare);
        if (plot != null && !"points".equals(req.points().source())) {
            // the points came from a pointsFile: the plot must not replace it either
            OutputFiles.requireWritable(plot, "--plot", file, Path.of(req.points().source()));
        }
        try {
            if (window != null) req = req.withWindow(window);
            if (uncertainty != null) req = req.withUncertainty(uncertainty);
        } catch (InputProblem p) {
            throw InputProblem.ofField("--" + p.field(), p.problem());
        }
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
        return r.verdict() == Verdict.PASS ? Cli.OK : r.verdict() == Verdict.FAIL ? Cli.FAIL : Cli.INDETERMINATE;
    }

    private static String n(double v) {
        if (Double.isNaN(v)) return "none";
        if (Double.isInfinite(v)) return "infinite";
        return DecimalText.significant(v, 4);
    }

    /**
     * A rotation of a registration, degrees: 4 significant digits, and 0 below a millionth of a
     * degree (the round-off of a registration that needed none; 0.0001 mm across a 100 mm part is
     * 0.00006°).
     */
    private static String degrees(double v) {
        return Math.abs(v) < 1e-6 ? "0" : n(v);
    }

    /** Which limit an undecided window's interval reaches across, in words with the unit. */
    private static String straddled(ControlledRadiusOutcome.LocalWindow w, InspectionCallout.RadiusLimits limits, String unit) {
        List<Double> l = w.limitsStraddled(limits.min(), limits.max());
        if (l.size() == 2) return "both limits, " + n(l.get(0)) + " and " + n(l.get(1)) + " " + unit;
        if (l.size() == 1) return "the " + n(l.get(0)) + " " + unit + " limit";
        return "a limit";
    }

    private static void printText(PrintWriter out, InspectionResult r) {
        InspectionRequest q = r.request();
        String u = q.units().symbol();
        out.printf("%s   %s, %d points (%s)%s%n", r.verdict().key().toUpperCase(Locale.ROOT), q.callout().describe(),
                q.points().size(), u, q.uncertainty() > 0 ? ", U = " + n(q.uncertainty()) + " " + u : "");
        AdjacentSurfaces sf = r.surfaces();
        if (sf != null) {
            String beside = "";
            if (q.nominal() instanceof Nominal.CornerBlend cb) {
                Point2 v = sf.corner().vertex(), nv = cb.corner().vertex();
                beside = String.format(Locale.ROOT, " (nominal %s°), corner at %s (nominal %s)", n(cb.corner().includedAngleDeg()),
                        at(v.x(), v.y(), q.units()), at(nv.x(), nv.y(), q.units()));
            }
            out.printf("  surfaces       a %s, b %s; angle %s°%s%n", surface(sf.a(), q.units()), surface(sf.b(), q.units()), n(sf.includedAngleDeg()), beside);
        }
        RadiusEnvelope e = r.radius();
        if (e != null) {
            out.printf("  envelope       radius smallest %s   largest %s %s   (the tightest limits these points meet, rounded outward)%n",
                    Inspector.down(e.smallest(), q.resolution()), Inspector.up(e.largest(), q.resolution()), u);
            out.printf("  judged         %d points between the tangent points of the largest arc, %d on the legs, %d beyond%n",
                    e.judged(), e.onLegs(), e.beyond());
            if (e.outside() > 0) out.printf("  outside        %d points beyond the adjacent surfaces: no radius allows them%n", e.outside());
        }
        ControlledRadiusOutcome c = r.controlled();
        if (c != null) {
            out.printf("  local radius   %s to %s %s (expanded uncertainty up to %s %s, k = 2) over %d windows of %s %s%n", n(c.localMin()),
                    n(c.localMax()), u, len(c.uncertainty(), q.units()), u, c.windows(), DecimalText.significant(c.windowLength(), 4), u);
            int shown = 0;
            for (ControlledRadiusOutcome.LocalWindow w : c.indeterminate()) {
                if (++shown > 4) {
                    out.printf("                 and %d more window(s) undecided (all in --format json)%n", c.indeterminate().size() - 4);
                    break;
                }
                out.printf("  undecided      window %d (s = %s to %s %s): local radius %s ± %s %s straddles %s%n", w.number(),
                        Inspector.coordinate(w.fromStation(), q.units()), Inspector.coordinate(w.toStation(), q.units()), u, n(w.radius()),
                        len(w.uncertainty(), q.units()), u, straddled(w, (InspectionCallout.RadiusLimits) q.callout(), u));
            }
            out.printf("  reversals      %d%s%n", c.reversals().size(), c.flats() > 0 ? "   flat windows " + c.flats() : "");
            for (ControlledRadiusOutcome.Reversal v : c.reversals()) {
                out.printf("                 s = %s to %s, near %s%n", Inspector.coordinate(v.fromStation(), q.units()),
                        Inspector.coordinate(v.toStation(), q.units()), at(v.x(), v.y(), q.units()));
            }
        }
        if (r.profile() != null) printProfile(out, "", r.profile(), q.units());
        if (r.tiers() != null) {
            for (int i = 0; i < r.tiers().size(); i++) {
                ProfileOutcome t = r.tiers().get(i);
                out.printf("  tier %d         %s   zone %s %s%s%n", i + 1, Inspector.profileVerdict(t, q.uncertainty()).key(), n(t.zone().width()), u, freeText(t));
                printProfile(out, "  ", t, q.units());
            }
        }
        Fits f = r.fits();
        if (f != null) {
            out.printf("  least squares  R %s at %s, rms %s " + u + "  (%d blend points)%n", n(f.leastSquares().circle().r()),
                    at(f.leastSquares().circle().cx(), f.leastSquares().circle().cy(), q.units()), len(f.leastSquares().rms(), q.units()), f.blendPoints());
            out.printf("  minimum zone   R %s to %s (width %s) at %s%n", n(f.minimumZone().inner()), n(f.minimumZone().outer()),
                    len(f.minimumZone().width(), q.units()), at(f.minimumZone().cx(), f.minimumZone().cy(), q.units()));
            out.printf("  tangency       step at surface a %s %s, at surface b %s %s  (gap between each fitted surface and the arc; a radius gauge does not see these)%n",
                    len(f.stepA(), q.units()), u, len(f.stepB(), q.units()), u);
        }
        if (r.worst() != null) {
            out.printf("  worst          %s, at %s%n", r.worst().text(), at(r.worst().x(), r.worst().y(), q.units()));
        }
        if (!r.comparisons().isEmpty()) {
            out.println();
            out.println("  compare (same points; * = limits derived from the file's callout)");
            for (Comparison cmp : r.comparisons()) {
                out.printf("    %-13s %-19s %-44s %s%n", cmp.verdict() == Verdict.FAIL ? "FAIL" : cmp.verdict().key(),
                        cmp.name(), cmp.callout() + (cmp.derived() ? " *" : ""),
                        cmp.figure());
            }
        }
        List<String> notes = r.notes();
        for (String s : notes) out.println("  note: " + s);
        for (String line : InspectionResult.CAUTION.replace("governing standard", "governing\nstandard").split("\n")) out.println("  " + line);
    }

    private static String surface(AdjacentSurfaces.Surface s, Units units) {
        if (!s.fitted()) return "nominal (not fitted)";
        return String.format(Locale.ROOT, "through %s along [%s, %s] (%d points, rms %s %s)", at(s.point().x(), s.point().y(), units),
                DecimalText.fixed(s.direction().x(), 6), DecimalText.fixed(s.direction().y(), 6), s.points(), rms(s.rms(), units),
                units.symbol());
    }

    /** A computed length to 4 significant digits, as the report's other figures, and zero below its last place ({@link Inspector#length}). */
    private static String len(double v, Units units) {
        return Inspector.length(v, units, 4);
    }

    /** A surface's rms: three significant digits are enough for a scatter, and zero below the report's last place. */
    private static String rms(double v, Units units) {
        String zero = Inspector.length(0, units);
        return Inspector.length(v, units).equals(zero) ? zero : DecimalText.significant(v, 3);
    }

    /** A point as {@code [x, y]}, both coordinates at the report's one resolution ({@link Inspector#coordinate}). */
    private static String at(double x, double y, Units units) {
        return "[" + Inspector.coordinate(x, units) + ", " + Inspector.coordinate(y, units) + "]";
    }

    private static String freeText(ProfileOutcome t) {
        if (t.free().isEmpty() && !t.dynamic()) return ", located";
        StringBuilder sb = new StringBuilder(", free:");
        for (Freedom fr : Freedom.values()) if (t.free().contains(fr)) sb.append(' ').append(fr.key());
        if (t.dynamic()) sb.append(" offset");
        return sb.toString();
    }

    private static void printProfile(PrintWriter out, String indent, ProfileOutcome p, Units units) {
        String u = units.symbol();
        out.printf("%s  needs zone     %s %s (same disposition and freedom)%n", indent, Inspector.lengthUp(p.requiredZone(), Inspector.PROFILE_SLACK, units), u);
        out.printf("%s  deviation      %s %s outward, %s %s inward (after registration)%n", indent, len(p.maxOutward(), units), u, len(p.maxInward(), units), u);
        if (!p.free().isEmpty() || p.dynamic()) {
            out.printf("%s  registration   x %s, y %s, rotation %s° about %s, offset %s%n", indent,
                    Inspector.coordinate(p.registration().x(), units), Inspector.coordinate(p.registration().y(), units),
                    degrees(p.registration().rotationDeg()), at(p.registration().pivotX(), p.registration().pivotY(), units),
                    len(p.registration().offset(), units));
        }
    }
}
