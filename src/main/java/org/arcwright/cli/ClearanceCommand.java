package org.arcwright.cli;

import java.io.PrintWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.DecimalText;
import org.arcwright.io.JsonFiles;
import org.arcwright.mechanics.ClearanceCase;
import org.arcwright.mechanics.CornerClearance;
import org.arcwright.mechanics.FilletMechanics;
import org.arcwright.mechanics.MechanicsFiles;
import org.arcwright.mechanics.PetersonFits;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.Units;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright clearance FILE}: does the largest fillet let the mating part seat against the shoulder. */
@Command(name = "clearance", mixinStandardHelpOptions = true,
        description = {"Whether a shoulder fillet at its largest still lets the mating part seat flush, "
                + "the margin, and the shoulder flat left to carry it.",
                "FILE (JSON): units, fillet {r | rMin, rMax | callout}, mating {type: chamfer, leg, angle} | {type: radius, rMin} "
                        + "| {type: bearing, chamferMin, bore}, optional shoulderHeight, shoulderEdgeBreak, requiredSupport.",
                "Exit 1 when the part does not seat or the shoulder gives less support than required."})
final class ClearanceCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "The fillet and the mating corner (JSON).")
    Path file;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Mixin
    PackOptions packs;

    @Override
    public Integer call() {
        ClearanceCase c = new MechanicsFiles(new JsonFiles(), PetersonFits.published()).readClearance(file);
        PackStack stack = packs.load("clearance", spec.commandLine().getErr());
        if (!stack.problems().isEmpty()) throw stack.problems().get(0);
        CornerClearance result = FilletMechanics.load(stack).clearance().check(c);
        PrintWriter out = spec.commandLine().getOut();
        if (format == OutputFormat.json) {
            out.println(new JsonFiles().write(toJson(result)));
        } else {
            printText(out, result);
        }
        return result.passes() ? Cli.OK : Cli.FAIL;
    }

    static Map<String, Object> toJson(CornerClearance r) {
        ClearanceCase c = r.input();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("units", c.units().symbol());
        m.put("filletMin", c.filletMin());
        m.put("filletMax", c.filletMax());
        m.put("mating", c.corner().describe(c.units()));
        m.put("seats", r.seats());
        m.put("margin", r.margin());
        m.put("allowedFilletMax", r.allowedFilletMax());
        m.put("governing", r.governing());
        m.put("reliefAlongSeat", r.reliefAlongSeat());
        m.put("reliefAlongShoulder", r.reliefAlongShoulder());
        if (r.support() != null) {
            Map<String, Object> s = new LinkedHashMap<>();
            s.put("contactFrom", r.support().contactFrom());
            s.put("contactTo", r.support().contactTo());
            s.put("flat", r.support().flat());
            s.put("required", r.support().required());
            s.put("sufficient", r.support().sufficient());
            m.put("support", s);
            if (r.support().required() == null) m.put("notChecked", "support: no requiredSupport given");
        } else {
            m.put("notChecked", "support: no shoulderHeight given");
        }
        m.put("passes", r.passes());
        m.put("notes", r.notes());
        m.put("cautions", r.cautions());
        return m;
    }

    private static void printText(PrintWriter out, CornerClearance r) {
        ClearanceCase c = r.input();
        String u = c.units().symbol();
        int d = c.units() == Units.INCH ? 4 : 3;
        int places = Math.max(1, Math.max(scale(c.filletMin()), scale(c.filletMax())));
        String fillet = c.filletMin() == c.filletMax() ? "R " + DecimalText.significant(c.filletMax(), 4)
                : "R " + DecimalText.fixed(c.filletMin(), places) + "–" + DecimalText.fixed(c.filletMax(), places);
        out.printf("Fillet %s %s against the mating part's %s%n", fillet, u, c.corner().describe(c.units()));
        out.printf("  relief     %s along the seat, %s up the shoulder%n", DecimalText.fixed(r.reliefAlongSeat(), d),
                DecimalText.fixed(r.reliefAlongShoulder(), d));
        out.printf("  admits     fillets up to %s %s (%s)%n", DecimalText.fixed(r.allowedFilletMax(), d), u, r.governing());
        if (r.seats()) {
            out.printf("  verdict    SEATS: margin %s %s at the largest fillet%n", DecimalText.fixed(r.margin(), d), u);
        } else {
            out.printf("  verdict    INTERFERES: the largest fillet exceeds what the corner admits by %s %s; the part will not seat flush%n",
                    atLeastOneDigit(-r.margin(), d), u);
        }
        CornerClearance.ShoulderSupport s = r.support();
        if (s != null) {
            out.printf("  support    flat %s %s on the shoulder (from %s to %s)%s%n", DecimalText.fixed(s.flat(), d), u,
                    DecimalText.fixed(s.contactFrom(), d), DecimalText.fixed(s.contactTo(), d),
                    s.required() == null ? "" : (s.sufficient() ? ": meets" : ": LESS THAN") + " the required "
                            + DecimalText.significant(s.required(), 4) + " " + u);
        }
        if (s == null) {
            out.println("  support    not checked: no shoulderHeight given");
        } else if (s.required() == null) {
            out.println("  support    not judged: no requiredSupport given");
        }
        for (String n : r.notes()) out.println("  note: " + n);
        for (String n : r.cautions()) out.println("  caution: " + n);
    }

    /**
     * {@code v} at {@code places} decimals, or, when that would print as zero (an interference of 0.76 µm in an inch
     * file), to one significant digit: an interference is never written as 0.
     */
    private static String atLeastOneDigit(double v, int places) {
        String s = DecimalText.fixed(v, places);
        return v > 0 && new BigDecimal(s).signum() == 0 ? DecimalText.significant(v, 1) : s;
    }

    private static int scale(double v) {
        return Math.max(0, new BigDecimal(DecimalText.significant(v, 4)).scale());
    }
}
