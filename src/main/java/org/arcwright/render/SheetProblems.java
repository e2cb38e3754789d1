package org.arcwright.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.io.DecimalText;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The open problems of a feature that a sheet must never hide behind a status such as
 * "measured: pass": a stress target the chosen limits miss, a mating part that does not seat, an
 * inspection judged against another callout (or against one it did not record), a feature drawn to
 * another standard or in other units than the part, a demoted or missing choice, a cast or moulded
 * radius left to an ISO 2768 title block.
 */
final class SheetProblems {
    private SheetProblems() {}

    /** Every open problem of {@code f} on the sheet of {@code ws}, in words; empty when there are none. */
    static List<String> of(RadiusFeature f, PartWorksheet ws) {
        List<String> out = new ArrayList<>();
        DesignCase c = f.designCase();
        if (c.standard() != ws.standard()) {
            out.add("standard mixed: the feature is drawn to " + name(c.standard()) + ", the part to " + name(ws.standard()));
        }
        if (c.units() != ws.units()) {
            out.add("units mixed: the feature is in " + c.units().symbol() + ", the part in " + ws.units().symbol());
        }
        DesignCase.StressInputs st = c.stress();
        if (st != null && c.nominalRadius() > st.stepHeight() + 1e-9) {
            // the advisor's first warning for this case; a sheet must not hide it behind a suggestion
            out.add("R" + DecimalText.exact(c.nominalRadius()) + " cannot be built as drawn: larger than the step h = (D − d)/2 = "
                    + DecimalText.exact(st.stepHeight()) + " " + c.units().symbol() + " it blends into the shoulder");
        }
        Recommendation r = f.chosen();
        if (r == null) {
            out.add("no control chosen");
            if (f.inspection() != null) out.add("inspected before a control was chosen");
            return out;
        }
        Map<String, Object> n = r.numbers().asMap();
        Double ktMin = number(n.get("ktAtMin"));
        Double ktTarget = number(n.get("targetKt"));
        if (ktMin != null && ktTarget != null && ktMin > ktTarget) {
            out.add("stress target not met: Kt " + DecimalText.exact(ktMin) + " at the smallest radius against the target " + DecimalText.exact(ktTarget));
        }
        Double kfMin = number(n.get("kfAtMin"));
        Double kfTarget = number(n.get("targetKf"));
        if (kfMin != null && kfTarget != null && kfMin > kfTarget) {
            out.add("stress target not met: Kf " + DecimalText.exact(kfMin) + " at the smallest radius against the target " + DecimalText.exact(kfTarget));
        }
        if (Boolean.FALSE.equals(n.get("seats"))) {
            Double margin = number(n.get("seatingMargin"));
            out.add("seating not met: the largest fillet fouls the mating corner"
                    + (margin == null ? "" : " by " + DecimalText.exact(-margin) + " " + c.units().symbol()));
        }
        if (r.demoted()) out.add("the chosen control failed one of its checks (demoted)");
        if (r.callout() instanceof Callout.General g && isIso2768(g.table() == null ? ws.titleBlock().table() : g.table())
                && !c.process().coveredByIso2768()) {
            out.add("general tolerance out of scope: ISO 2768-1 does not cover " + c.process().key() + " radii");
        }
        InspectionRecord i = f.inspection();
        if (i != null) {
            if (i.undecided()) {
                out.add("measured, but no verdict: the measurement's uncertainty straddles a limit (ISO 14253-1); measure again");
            }
            Object judged = i.figures().get("callout");
            if (judged == null) {
                out.add("the inspection does not record which callout it judged: re-inspect against the chosen one");
            } else if (!sameCallout(String.valueOf(judged), r.callout())) {
                out.add("inspected against another callout (" + judged + ")");
            }
        }
        return out;
    }

    /**
     * A caution when the part is drawn to ASME Y14.5 but its title block invokes ISO 2768 general
     * tolerances: ASME Y14.5 does not define them, so the drawing must say which standard governs
     * the untoleranced sizes (common practice).
     */
    static Optional<String> mixedGeneralTolerance(PartWorksheet ws) {
        String table = ws.titleBlock().table();
        if (ws.standard() == DrawingStyle.ASME && table != null && table.toLowerCase(Locale.ROOT).startsWith("iso2768")) {
            return Optional.of("Standards mixed: the part is drawn to ASME Y14.5-2018 but its title block invokes ISO 2768 "
                    + "general tolerances, which ASME Y14.5 does not define. State on the drawing that ISO 2768 governs the "
                    + "untoleranced sizes (and which table applies to radii), or give general tolerances in ASME terms; "
                    + "company practice decides.");
        }
        return Optional.empty();
    }

    /**
     * A caution when the title block invokes ISO 2768 and some features are not machined or sheet metal: ISO 2768-1
     * covers parts made by metal removal or formed from sheet metal only (ISO 2768-1:1989, clause 1). Castings take
     * ISO 8062-3 grades, mouldings a moulding standard or the moulder's tolerance groups.
     */
    static Optional<String> generalToleranceScope(PartWorksheet ws) {
        if (!isIso2768(ws.titleBlock().table())) return Optional.empty();
        List<String> outside = new ArrayList<>();
        for (RadiusFeature f : ws.features()) {
            if (!f.designCase().process().coveredByIso2768()) outside.add(f.id() + " (" + f.designCase().process().key() + ")");
        }
        if (outside.isEmpty()) return Optional.empty();
        return Optional.of("General tolerance out of scope: ISO 2768-1 covers parts made by metal removal or formed from "
                + "sheet metal, and " + String.join(", ", outside) + (outside.size() == 1 ? " is not" : " are not")
                + ". Give their radii a tolerance of their own, or state on the title block the general tolerance for "
                + "them (for castings an ISO 8062-3 casting tolerance grade, for mouldings the moulder's tolerance group); "
                + "company practice decides.");
    }

    private static boolean isIso2768(String table) {
        return table != null && table.toLowerCase(Locale.ROOT).startsWith("iso2768");
    }

    /** Whether an inspection record's callout text names the chosen callout. */
    private static boolean sameCallout(String judged, Callout chosen) {
        if (chosen instanceof Callout.Radius r) return judged.equals(new InspectionCallout.RadiusLimits(RadiusKind.R, r.min(), r.max()).describe());
        if (chosen instanceof Callout.ControlledRadius r) {
            return judged.equals(new InspectionCallout.RadiusLimits(RadiusKind.CR, r.min(), r.max()).describe());
        }
        if (chosen instanceof Callout.Profile p) return judged.startsWith("profile " + DecimalText.exact(p.zone()));
        if (chosen instanceof Callout.CompositeProfile cp) {
            return judged.startsWith("composite profile") && judged.contains(DecimalText.exact(cp.tiers().get(0).zone()));
        }
        return false;
    }

    private static String name(DrawingStyle s) {
        return s == DrawingStyle.ASME ? "ASME Y14.5" : "ISO";
    }

    private static Double number(Object o) {
        return o instanceof Number v ? v.doubleValue() : null;
    }
}
