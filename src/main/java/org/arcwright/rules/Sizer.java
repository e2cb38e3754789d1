package org.arcwright.rules;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Process;
import org.arcwright.rules.CalloutPlan.CalloutKind;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.GeneralTolerance;
import org.arcwright.tolerance.GeneralToleranceTable;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.Units;

/**
 * Sizes a candidate's radius band: from the engineer's intent, the process capability table, or the title-block
 * general tolerance that covers the process and the blend kind.
 *
 * <p>Which title-block table: ISO 2768-1 covers parts made by metal removal or formed from sheet metal (its
 * scope clause, from memory). Within it an internal fillet radius is a linear size (Table 1) and only external
 * radii and chamfer heights are broken edges (Table 2). Cast and moulded radii take the pack's castings or
 * mouldings table instead ({@link #CASTINGS_TABLE}, {@link #MOULDINGS_TABLE}); forged and additive radii have no
 * shipped title-block table and are sized from the process capability.
 */
final class Sizer {
    /** ISO 2768-1 Table 2: broken edges (external radii and chamfer heights). */
    static final String ISO_EDGES = "iso2768-1-radius-chamfer";
    /** ISO 2768-1 Table 1: linear sizes, which an internal fillet radius is. */
    static final String ISO_LINEAR = "iso2768-1-linear";
    /** The pack's general tolerance for cast radii. */
    static final String CASTINGS_TABLE = "castings-radius-general";
    /** The pack's general tolerance for moulded radii. */
    static final String MOULDINGS_TABLE = "mouldings-radius-general";

    private final RuleBook book;

    Sizer(RuleBook book) { this.book = book; }

    /** Decimal places of the case's figures: at least 2 (mm) or 3 (inch), more when the nominal has more. */
    static int places(DesignCase c) {
        int nominalPlaces = Math.max(0, BigDecimal.valueOf(c.nominalRadius()).stripTrailingZeros().scale());
        return Math.max(c.units() == Units.INCH ? 3 : 2, nominalPlaces);
    }

    /**
     * The title-block table that covers this case, given the table a plan names: an ISO 2768-1 table is swapped
     * for the one that fits the blend kind, or for the pack's castings/mouldings table when the process is not
     * covered by ISO 2768-1. Other tables (a company's own) are taken as named.
     */
    static String coveringTable(String named, DesignCase c) {
        if (named == null || !named.startsWith("iso2768-1")) return named;
        if (c.process() == Process.CAST) return CASTINGS_TABLE;
        if (c.process() == Process.MOLDED) return MOULDINGS_TABLE;
        return c.kind() == BlendKind.FILLET ? ISO_LINEAR : ISO_EDGES;
    }

    /** True when the process is one ISO 2768-1 covers (metal removal, sheet metal). */
    static boolean iso2768Covers(Process p) {
        return p.coveredByIso2768();
    }

    /**
     * Sizes {@code d}.
     *
     * @param capabilitySources the capability wording already built for this case, by factor (built once per case)
     */
    void size(Draft d, List<String> cautions, Map<Double, String> capabilitySources) {
        DesignCase c = d.c;
        CalloutPlan plan = d.plan;
        double mmPer = c.units().millimetres();
        double nomMm = c.nominalRadius() * mmPer;
        CalloutPlan.Sizing s = plan.size();
        if (s.basis() == CalloutPlan.Basis.INTENT && c.tolerance() != null) {
            RadiusCallout rc = CalloutParser.parse(c.tolerance(), c.units(), "tolerance");
            if (rc.isFullyToleranced()) {
                d.fromIntent(rc);
                return;
            }
            cautions.add("The tolerance given (" + c.tolerance() + ") does not bound both ends; the process capability "
                    + "sizes it instead.");
        }
        if (s.basis() == CalloutPlan.Basis.GENERAL || plan.callout() == CalloutKind.GENERAL) {
            String named = plan.table() == null ? ISO_EDGES : plan.table();
            String tableId = coveringTable(named, c);
            String cls = plan.toleranceClass() == null ? "m" : plan.toleranceClass();
            Optional<GeneralToleranceTable> table = book.generalTables().byId(tableId);
            if (table.isPresent() && !table.get().classList().contains(cls) && !tableId.equals(named)) {
                cls = table.get().classList().get(table.get().classList().size() / 2);
            }
            if (!tableId.equals(named)) {
                cautions.add(tableId.startsWith("iso2768-1")
                        ? "The title block reads ISO 2768-1 " + (tableId.equals(ISO_LINEAR)
                        ? "Table 1 (linear sizes) for this internal fillet radius; Table 2 covers only external radii "
                        + "and chamfer heights (broken edges)." : "Table 2 (broken edges) for this external radius.")
                        + " State on the title block which table applies to radii."
                        : "ISO 2768-1 covers machined and sheet-metal parts, not " + c.process().key() + " ones: the "
                        + c.process().key() + " general tolerance of the pack applies instead; state it on the title block.");
            }
            if (table.isPresent()) {
                try {
                    GeneralTolerance g = table.get().lookup(cls, nomMm);
                    String label = generalLabel(table.get(), cls);
                    d.fromPlusMinus(g.plusMinus() * s.factor() / mmPer, CalloutPlan.Disposition.EQUAL,
                            label + " ±" + Advisor.plain(g.plusMinus()) + " mm (" + table.get().source() + ")");
                    d.general(tableId, cls, label);
                    return;
                } catch (InputProblem p) {
                    d.generalMissing = "the general tolerance " + generalLabel(table.get(), cls) + " gives no value at R"
                            + Advisor.plain(c.nominalRadius()) + " " + c.units().symbol() + " (" + p.problem() + ")";
                }
                d.general(tableId, cls, generalLabel(table.get(), cls));
            } else {
                d.generalMissing = "no general-tolerance table '" + tableId + "' is loaded";
                d.general(tableId, cls, tableId + " class " + cls);
            }
            if (plan.callout() != CalloutKind.GENERAL) {
                cautions.add("Sized from the process capability instead: " + d.generalMissing + ".");
                d.generalMissing = null;
            }
        }
        CapabilityTable cap = book.capability();
        Optional<Double> t = cap == null ? Optional.empty() : cap.plusMinusMm(c.process(), nomMm);
        if (t.isPresent()) {
            double pm = t.get();
            d.fromPlusMinus(pm * s.factor() / mmPer, s.disposition(),
                    capabilitySources.computeIfAbsent(s.factor(), f -> capabilitySource(c, pm, f, cap)));
        } else {
            d.fromPlusMinus(c.nominalRadius() * 0.1 * s.factor(), s.disposition(),
                    "10% of the nominal: no process capability entry for " + c.process().key());
            cautions.add("No process capability entry for " + c.process().key() + "; the tolerance is 10% of the nominal. "
                    + "Ask the shop what it holds.");
        }
    }

    /** The ± value the process holds at a radius, in the case's units, if the table says. */
    Optional<Double> plusMinus(DesignCase c, double radius) {
        CapabilityTable cap = book.capability();
        double mmPer = c.units().millimetres();
        return cap == null ? Optional.empty() : cap.plusMinusMm(c.process(), radius * mmPer).map(t -> t / mmPer);
    }

    String capabilitySource(DesignCase c, double plusMinusMm, double factor, CapabilityTable cap) {
        return "process capability, " + c.process().key() + " at R" + Advisor.plain(c.nominalRadius() * c.units().millimetres())
                + " mm: ±" + Advisor.plain(plusMinusMm) + " mm" + (factor == 1 ? "" : " × " + Advisor.plain(factor))
                + " (" + cap.sourceFor(c.process()) + ")";
    }

    /**
     * Why the band left by an adjustment cannot be made, if it cannot: it shrank below both what the rule asked
     * ({@code bandBefore}) and the band the process capability table says the process holds at that size. A band
     * the rule itself set tighter than the table (a team's deliberate choice) is not second-guessed.
     */
    Optional<String> tooTight(Draft d, double bandBefore) {
        double band = d.hi() - d.lo();
        if (!(band < bandBefore - 1e-9)) return Optional.empty();
        CapabilityTable cap = book.capability();
        DesignCase c = d.c;
        double mmPer = c.units().millimetres();
        Optional<Double> t = cap == null ? Optional.empty() : cap.plusMinusMm(c.process(), d.hi() * mmPer);
        if (t.isEmpty()) return Optional.empty();
        double holds = 2 * t.get() / mmPer;
        if (!(band < Math.min(holds, bandBefore) - 1e-9)) return Optional.empty();
        return Optional.of("narrower than " + c.process().key() + " radii near R" + Advisor.fmt(d.hi(), d.places) + " are held (±"
                + Advisor.plain(t.get()) + " mm, a band of " + Advisor.fmt(holds, d.places) + "; " + cap.sourceFor(c.process()) + ")");
    }

    /**
     * The band the process holds near the step height, when it is wider than the room between {@code minRadius}
     * and the step height (so no limits fit); empty when limits can fit or nothing says what the process holds.
     */
    Optional<Double> roomUnderStep(DesignCase c, double minRadius, double h) {
        if (!Double.isFinite(h)) return Optional.empty();
        return plusMinus(c, h).map(t -> 2 * t).filter(band -> band > h - minRadius + 1e-9);
    }

    /**
     * A rule's reasons and references as they apply to the title-block table the draft was sized from: a rule names
     * ISO 2768-1 (often its Table 2), but an internal fillet reads Table 1 and a cast or moulded radius the pack's
     * castings or mouldings table. References to ISO 2768-1 are replaced by the citation of the table read; a reason
     * naming ISO 2768-1 names the title block's tolerance instead when that is not ISO 2768-1. Lists are returned
     * unchanged when the draft was not sized from a title-block table.
     */
    Citations citations(Draft d, List<String> because, List<String> references) {
        references = ownStandard(references, d.c.standard());
        if (d.generalTable == null) return new Citations(because, references);
        boolean iso = d.generalTable.startsWith("iso2768-1");
        String cite = switch (d.generalTable) {
            case ISO_LINEAR -> "ISO 2768-1:1989: Table 1, linear sizes (an internal fillet radius is one)";
            case ISO_EDGES -> "ISO 2768-1:1989: Table 2, broken edges (external radii and chamfer heights)";
            default -> book.generalTables().byId(d.generalTable).map(t -> t.title() + ": " + t.source()).orElse(null);
        };
        List<String> refs = new ArrayList<>();
        boolean cited = false;
        for (String r : references) {
            if (r.startsWith("ISO 2768-1") && (r.contains("Table") || !iso)) {
                if (!cited && cite != null) refs.add(cite);
                cited = true;
            } else {
                refs.add(r);
            }
        }
        if (!cited && !iso && cite != null) refs.add(cite);
        List<String> reasons = because;
        if (!iso) {
            reasons = because.stream().map(b -> b.replace("the general tolerance of ISO 2768-1", "the title block's general "
                    + "tolerance (" + d.generalLabel + ")").replace("ISO 2768-1", d.generalLabel)).toList();
        }
        return new Citations(reasons, refs);
    }

    /**
     * The references that apply to a drawing in {@code style}: a rule written for both standards cites how each one
     * indicates a radius (ISO 129-1 / ISO 1101, ASME Y14.5); the other standard's drawing rules are left out. A
     * reference naming both, or a general standard (ISO 2768-1, ISO 13715, a handbook), stays.
     */
    static List<String> ownStandard(List<String> references, DrawingStyle style) {
        List<String> other = style == DrawingStyle.ASME ? List.of("ISO 129", "ISO 1101") : List.of("ASME Y14.5");
        List<String> kept = references.stream().filter(r -> other.stream().noneMatch(r::startsWith)
                || r.contains(style == DrawingStyle.ASME ? "ASME" : " ISO ")).toList();
        return kept.isEmpty() ? references : kept;
    }

    /** A card's reasons and references. */
    record Citations(List<String> because, List<String> references) {}

    static String generalLabel(GeneralToleranceTable table, String cls) {
        if (table.id().equals(ISO_LINEAR)) return "ISO 2768-" + cls + " (Table 1, linear sizes)";
        if (table.id().startsWith("iso2768-1")) return "ISO 2768-" + cls;
        String name = table.classNames().get(cls);
        return table.title() + ", class " + cls + (name == null ? "" : " (" + name + ")");
    }
}
