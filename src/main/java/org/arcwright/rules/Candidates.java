package org.arcwright.rules;

import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.callout.Extent;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.CalloutPlan.CalloutKind;
import org.arcwright.rules.CalloutPlan.DatumChoice;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.tolerance.DrawingStyle;

/**
 * Candidates built from the needs, one per control the standard allows, when no rule's card meets every need:
 * a limit radius, a controlled radius (ASME only), a floating profile (equal, or unequally disposed: ASME Ⓤ, ISO
 * 1101 UZ), a located profile, a located profile with a radius refinement, and a composite profile. Each holds the
 * radius band {@link #band} places inside the floor and ceiling: the band the process holds at the nominal
 * (capability table), moved up above a floor and down under a ceiling, narrowed only when the room is smaller.
 */
final class Candidates {
    /** The score of a built candidate: below every pack rule, so a rule's card wins among equals. */
    static final double SCORE = 1.0;

    private final Sizer sizer;

    Candidates(Sizer sizer) { this.sizer = sizer; }

    /**
     * A candidate before its mechanics and proof.
     *
     * @param id {@code needs.*}
     * @param draft the sized control
     * @param datums the datum labels it references
     * @param because why this control, in words
     * @param references the standards it leans on
     * @param cautions what to watch
     * @param demoted true when the band is narrower than the process holds
     */
    record Built(String id, Draft draft, List<String> datums, List<String> because, List<String> references,
                 List<String> cautions, boolean demoted) {}

    /**
     * The band to hold, inside the needs' floor and ceiling, on the drawing grid; null when no band of at least one
     * grid step fits.
     */
    static double[] band(Needs needs, double plusMinus, int places) {
        DesignCase c = needs.designCase();
        double unit = Math.pow(10, -places);
        double t = Math.max(Advisor.roundTo(plusMinus, places, RoundingMode.HALF_UP), unit);
        // the floor rounded up and the ceiling rounded down to the drawing grid first, so the band keeps its width
        double floor = needs.floor() > 0 ? Advisor.roundTo(needs.floor(), places, RoundingMode.CEILING) : 0;
        double ceiling = Double.isFinite(needs.ceiling())
                ? Advisor.roundTo(needs.ceiling(), places, RoundingMode.FLOOR) : Double.POSITIVE_INFINITY;
        double lo = Advisor.roundTo(c.nominalRadius() - t, places, RoundingMode.HALF_EVEN);
        double hi = Advisor.roundTo(c.nominalRadius() + t, places, RoundingMode.HALF_EVEN);
        if (lo < floor) {
            lo = floor;
            hi = Advisor.roundTo(floor + 2 * t, places, RoundingMode.HALF_EVEN);
        }
        if (hi > ceiling) {
            hi = ceiling;
            lo = Math.max(floor, Advisor.roundTo(ceiling - 2 * t, places, RoundingMode.HALF_EVEN));
        }
        lo = Math.max(lo, unit);
        if (needs.floorUnreachable() || hi - lo < unit - 1e-12) return null;
        return new double[] {lo, hi, 2 * t};
    }

    List<Built> build(Needs needs, int places) {
        DesignCase c = needs.designCase();
        double t = sizer.plusMinus(c, c.nominalRadius()).orElse(c.nominalRadius() * 0.1);
        double[] b = band(needs, t, places);
        List<Built> out = new ArrayList<>();
        if (b == null) return out;
        double lo = b[0];
        double hi = b[1];
        boolean narrow = hi - lo < b[2] - 1e-9;
        String bandWords = "the radius band " + Advisor.fmt(lo, places) + " to " + Advisor.fmt(hi, places) + " "
                + c.units().symbol() + (needs.list().stream().anyMatch(n -> n.min() != null || n.max() != null)
                ? ", inside every floor and ceiling the needs set" : "");
        List<String> cautions = new ArrayList<>();
        if (narrow) {
            cautions.add("The band " + Advisor.fmt(hi - lo, places) + " is narrower than " + c.process().key()
                    + " radii are usually held (±" + Advisor.plain(Advisor.round(b[2] / 2)) + " " + c.units().symbol()
                    + ", the pack's capability table): ask the shop, or take one of the design changes.");
        }
        boolean asme = c.standard() == DrawingStyle.ASME;
        List<String> datums = c.datums().subList(0, Math.min(3, c.datums().size()));

        // only the controls that can meet the needs present: size-only controls cannot meet form, floating ones
        // cannot meet location
        boolean form = needs.has(Need.Kind.FORM);
        boolean location = needs.has(Need.Kind.LOCATION);
        if (!form && !location) {
            out.add(limits(c, places, lo, hi, bandWords, asme, cautions, narrow));
        }
        if (asme && !location) {
            out.add(new Built("needs.controlled-radius", draft(CalloutKind.CONTROLLED_RADIUS, DatumChoice.NONE, c, places, lo, hi),
                    List.of(), List.of("A controlled radius holding " + bandWords + ".",
                            "It also forbids flats and reversals, so no local radius is sharper than its minimum."),
                    List.of("ASME Y14.5-2018: controlled radius (CR)"), cautions, narrow));
        }
        Draft floating = location ? null : profile(c, places, DatumChoice.NONE, Extent.Kind.THIS_RADIUS, lo, hi);
        if (floating != null) {
            out.add(new Built("needs.profile", floating, List.of(), List.of("A profile of a surface without datums holding "
                    + bandWords + (floating.outward != null ? ", its zone unequally disposed about the nominal ("
                    + (asme ? "ASME Y14.5-2018 Ⓤ" : "ISO 1101:2017 UZ offset") + ")" : "") + ".",
                    "It bounds size and form; without datums it floats."), profileRefs(asme, floating), cautions, narrow));
        }
        if (location && !datums.isEmpty()) {
            located(c, places, lo, hi, datums, bandWords, asme, cautions, narrow, out);
        }
        return out;
    }

    private Built limits(DesignCase c, int places, double lo, double hi, String bandWords, boolean asme,
                         List<String> cautions, boolean narrow) {
        Draft limits = draft(CalloutKind.RADIUS, DatumChoice.NONE, c, places, lo, hi);
        return new Built("needs.limits", limits, List.of(), List.of("A radius with limits holding " + bandWords + ".",
                "It bounds size only."), List.of(asme ? "ASME Y14.5-2018: radius" : "ISO 129-1:2018: radii"), cautions, narrow);
    }

    private static void located(DesignCase c, int places, double lo, double hi, List<String> datums, String bandWords,
                            boolean asme, List<String> cautions, boolean narrow, List<Built> out) {
        Draft located = profile(c, places, DatumChoice.ALL, Extent.Kind.WITH_ADJACENT, lo, hi);
        if (located != null) {
            out.add(new Built("needs.profile-located", located, datums, List.of("A profile of a surface to "
                    + String.join(", ", datums) + " on the radius and its adjacent surfaces, holding " + bandWords
                    + (located.outward != null ? ", its zone unequally disposed about the nominal" : "") + ".",
                    "It bounds size and form and locates the blend."), profileRefs(asme, located), cautions, narrow));
        }
        Draft refined = refined(c, places, lo, hi);
        out.add(new Built("needs.profile-located-with-radius", refined, datums, List.of("A profile of a surface to "
                + String.join(", ", datums) + " locates the blend; a radius with limits under it refines its size to "
                + bandWords + ".", "Two drawing elements: the profile for where the blend sits and its form, the radius "
                + "for the smallest and largest radius."), List.of(asme ? "ASME Y14.5-2018: profile with datums; radius"
                : "ISO 1101:2017: profile related to a datum system; ISO 129-1:2018: radii"), cautions, narrow));
        Draft composite = composite(c, places, lo, hi);
        if (composite != null) {
            out.add(new Built("needs.composite", composite, datums, List.of((asme ? "A composite profile" : "Two stacked "
                    + "profile frames") + ": the upper tier to "
                    + String.join(", ", datums) + " locates the blend, the lower tier without datums holds " + bandWords + "."),
                    List.of(asme ? "ASME Y14.5-2018: composite profile" : "ISO 1101:2017: combined zone, stacked frames"),
                    cautions, narrow));
        }
    }

    private static List<String> profileRefs(boolean asme, Draft d) {
        if (asme) return List.of(d.outward != null ? "ASME Y14.5-2018: unequally disposed profile (Ⓤ)" : "ASME Y14.5-2018: profile of a surface");
        return List.of(d.outward != null ? "ISO 1101:2017: offset tolerance zone (UZ)" : "ISO 1101:2017: profile of a surface");
    }

    private static CalloutPlan plan(CalloutKind kind, DatumChoice datums, Extent.Kind extent, List<Double> tiers) {
        return new CalloutPlan(kind, datums, extent, null, CalloutPlan.Sizing.CAPABILITY, tiers,
                tiers == null ? null : DatumChoice.NONE, false, null, null, false);
    }

    private static Draft draft(CalloutKind kind, DatumChoice datums, DesignCase c, int places, double lo, double hi) {
        Draft d = new Draft(plan(kind, datums, Extent.Kind.THIS_RADIUS, null), c, places);
        d.min = lo;
        d.max = hi;
        d.adjusted = lo > c.nominalRadius() || hi < c.nominalRadius();
        d.source = "the needs' floor and ceiling and the process capability";
        return d;
    }

    private static Draft profile(DesignCase c, int places, DatumChoice datums, Extent.Kind extent, double lo, double hi) {
        Draft d = new Draft(plan(CalloutKind.PROFILE, datums, extent, null), c, places);
        d.min = lo;
        d.max = hi;
        d.source = "the needs' floor and ceiling and the process capability";
        return d.unequalZone(lo, hi) ? d : null;
    }

    /** A located profile wide enough to hold the band, with the band drawn as a radius refinement under it. */
    private static Draft refined(DesignCase c, int places, double lo, double hi) {
        Draft d = new Draft(plan(CalloutKind.PROFILE, DatumChoice.ALL, Extent.Kind.WITH_ADJACENT, null), c, places);
        double nom = c.nominalRadius();
        double reach = Math.max(Math.max(nom - lo, hi - nom), 0);
        double z = Advisor.roundTo(2 * CrescentZone.factor(c.cornerAngleDegrees()) * reach, places, RoundingMode.CEILING);
        d.zones = new double[] {Math.max(z, d.unit())};
        d.min = lo;
        d.max = hi;
        d.refinement = new Callout.Radius(lo, hi, null);
        d.source = "the needs' floor and ceiling and the process capability";
        return d;
    }

    /** A composite whose lower (floating) tier holds the band about the nominal, the upper three times it. */
    private static Draft composite(DesignCase c, int places, double lo, double hi) {
        double nom = c.nominalRadius();
        if (!(lo < nom && nom < hi)) return null;
        double k = CrescentZone.factor(c.cornerAngleDegrees());
        double lower = Advisor.roundTo(2 * k * Math.min(nom - lo, hi - nom), places, RoundingMode.FLOOR);
        if (lower < Math.pow(10, -places)) return null;
        Draft d = new Draft(plan(CalloutKind.COMPOSITE_PROFILE, DatumChoice.ALL, Extent.Kind.WITH_ADJACENT,
                List.of(3.0, 1.0)), c, places);
        d.zones = new double[] {Advisor.roundTo(3 * lower, places, RoundingMode.HALF_EVEN), lower};
        d.min = lo;
        d.max = hi;
        d.source = "the needs' floor and ceiling and the process capability";
        return d;
    }
}
