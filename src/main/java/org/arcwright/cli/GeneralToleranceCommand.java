package org.arcwright.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.GeneralTolerance;
import org.arcwright.tolerance.GeneralToleranceTable;
import org.arcwright.tolerance.GeneralToleranceTables;
import org.arcwright.tolerance.ToleranceQuantity;
import org.arcwright.tolerance.Units;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code arcwright general-tolerance}: the title-block (ISO 2768-1 or company) tolerance of a size. */
@Command(name = "general-tolerance", mixinStandardHelpOptions = true,
        description = "The general tolerance a title block grants a radius, a linear size or an angle (ISO 2768-1 or a company table).")
final class GeneralToleranceCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--class", required = true, paramLabel = "f|m|c|v", description = "Tolerance class.")
    String toleranceClass;

    @ArgGroup(exclusive = true, multiplicity = "1")
    What what;

    static final class What {
        @Option(names = "--radius", paramLabel = "X", description = "A radius or chamfer height; --blend says which "
                + "ISO 2768-1 table applies (without it, both readings are given).")
        Double radius;
        @Option(names = "--linear", paramLabel = "X", description = "A linear size.")
        Double linear;
        @Option(names = "--angle-side", paramLabel = "X", description = "Length of the shorter side of an angle.")
        Double angleSide;
    }

    @Option(names = "--units", paramLabel = "mm|in", defaultValue = "mm",
            description = "Units of the size given (default: ${DEFAULT-VALUE}); tables are in mm.")
    String units;

    @Option(names = "--blend", paramLabel = "fillet|round", description = "With --radius: an internal fillet radius is a "
            + "linear size (ISO 2768-1 Table 1); an external round or chamfer height is a broken edge (Table 2).")
    String blend;

    @Option(names = "--table", paramLabel = "ID", description = "A table id other than ISO 2768-1 (from a practice pack).")
    String tableId;

    @Mixin
    PackOptions packs;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    @Override
    public Integer call() {
        Units u = Units.parse(units);
        ToleranceQuantity q0 = what.radius != null ? ToleranceQuantity.RADIUS_CHAMFER
                : what.linear != null ? ToleranceQuantity.LINEAR : ToleranceQuantity.ANGULAR;
        ToleranceQuantity q = q0;
        double size = what.radius != null ? what.radius : what.linear != null ? what.linear : what.angleSide;
        String field = what.radius != null ? "--radius" : what.linear != null ? "--linear" : "--angle-side";
        if (!Double.isFinite(size)) throw InputProblem.ofField(field, "not a finite number");
        if (size <= 0) throw InputProblem.ofField(field, "must be greater than zero, got " + DecimalText.exact(size));
        if (blend != null && !List.of("fillet", "round").contains(blend)) {
            throw InputProblem.ofField("--blend", "use fillet or round, got '" + blend + "'");
        }
        if (blend != null && what.radius == null) {
            throw InputProblem.ofField("--blend", "applies to --radius only");
        }
        // ISO 2768-1:1989: an internal fillet radius is a linear size (Table 1); broken edges are Table 2
        if ("fillet".equals(blend)) q = ToleranceQuantity.LINEAR;
        PackStack stack = packs.load("general-tolerance", spec.commandLine().getErr());
        if (!stack.problems().isEmpty()) throw stack.problems().get(0);
        GeneralToleranceTables tables = GeneralToleranceTables.load(stack.files("tables", ".json").stream().map(f -> new GeneralToleranceTables.TableFile(f.path(), f.pack().root())).toList());
        GeneralToleranceTable table = tableId == null ? tables.iso(q) : tables.require(tableId);
        double sizeMm = size * u.millimetres();
        GeneralTolerance t = lookup(table, sizeMm, field);
        // without --blend, a radius gets both readings: the other one is the internal-fillet (Table 1) value
        GeneralTolerance asFillet = null;
        GeneralToleranceTable linear = null;
        if (what.radius != null && blend == null && tableId == null) {
            linear = tables.iso(ToleranceQuantity.LINEAR);
            try {
                asFillet = linear.lookup(toleranceClass, sizeMm);
            } catch (InputProblem p) {
                asFillet = null;
            }
        }
        double tol = q == ToleranceQuantity.ANGULAR ? t.plusMinus() : t.plusMinus() / u.millimetres();
        PrintWriter out = spec.commandLine().getOut();
        if (format == OutputFormat.json) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("tolerance", tol);
            m.put("toleranceUnits", q == ToleranceQuantity.ANGULAR ? "deg" : u.symbol());
            // in the file's units, with its unit: a bare "±1" beside an inch tolerance reads as inches
            m.put("formatted", q == ToleranceQuantity.ANGULAR ? t.formatted() : "±" + DecimalText.significant(tol, 4) + " " + u.symbol());
            m.put("class", t.toleranceClass());
            m.put("className", table.classNames().getOrDefault(t.toleranceClass(), t.toleranceClass()));
            m.put("range", t.range() + " mm");
            m.put("quantity", tableId == null ? q.key() : table.quantity().key());
            m.put("size", size);
            m.put("units", u.symbol());
            m.put("table", table.id());
            m.put("source", table.source());
            if (blend != null) m.put("blend", blend);
            if (asFillet != null) {
                m.put("reading", "external round or chamfer height (broken edge, ISO 2768-1 Table 2)");
                Map<String, Object> other = new LinkedHashMap<>();
                other.put("reading", "internal fillet radius (linear size, ISO 2768-1 Table 1)");
                other.put("tolerance", asFillet.plusMinus() / u.millimetres());
                other.put("toleranceUnits", u.symbol());
                other.put("range", asFillet.range() + " mm");
                other.put("table", linear.id());
                other.put("source", linear.source());
                m.put("asInternalFillet", other);
            }
            out.println(new JsonFiles().write(m));
        } else {
            String reading = switch (q) {
                case RADIUS_CHAMFER -> blend == null ? "radius/chamfer (read as an external round or chamfer height)"
                        : "external round/chamfer";
                case LINEAR -> "fillet".equals(blend) ? "internal fillet radius (a linear size)" : "linear size";
                case ANGULAR -> "angle, shorter side";
            };
            // a table named by --table (a castings, mouldings or company table) is read as it is: ISO 2768-1's two
            // readings of a radius do not apply to it
            if (tableId != null && what.radius != null) {
                reading = blend == null ? "radius" : "fillet".equals(blend) ? "internal fillet radius" : "external round";
            }
            out.printf("%s %s %s, class %s (%s): %s%s%n", reading, DecimalText.significant(size, 4), u.symbol(), t.toleranceClass(),
                    table.classNames().getOrDefault(t.toleranceClass(), t.toleranceClass()),
                    q == ToleranceQuantity.ANGULAR ? t.formatted() : "±" + DecimalText.significant(tol, 4),
                    q == ToleranceQuantity.ANGULAR ? "" : " " + u.symbol());
            out.printf("  range   %s mm%n", t.range());
            out.printf("  table   %s — %s%n", table.title(), table.source());
            if (asFillet != null) {
                out.printf("  as an internal fillet radius it is a linear size: ±%s %s (range %s mm; %s — %s)%n",
                        DecimalText.significant(asFillet.plusMinus() / u.millimetres(), 4), u.symbol(), asFillet.range(), linear.title(),
                        linear.source());
                out.println("  --blend fillet|round picks one; a title block should say which table applies to radii.");
            }
        }
        return Cli.OK;
    }

    private GeneralTolerance lookup(GeneralToleranceTable table, double sizeMm, String field) {
        try {
            return table.lookup(toleranceClass, sizeMm);
        } catch (InputProblem p) {
            throw "size".equals(p.field()) ? InputProblem.ofField(field, p.problem()) : p;
        }
    }
}
