package org.arcwright.rules;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.callout.CalloutFormatter;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.CalloutPlan.CalloutKind;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.ToleranceForm;

/**
 * A candidate being worked out: the radius band, then the control that holds it, then its adjustments. The radius
 * range a profile admits is the crescent geometry read backwards: an arc of radius r lies {@code (r - nominal)·k}
 * from the nominal arc on the bisector, {@code k = 1/sin(θ/2) - 1} ({@link CrescentZone#factor}), so a zone with
 * {@code i} inside and {@code o} outside the material admits, for a fillet, {@code nominal - i/k .. nominal + o/k}
 * (larger fillets add material) and for a round {@code nominal - o/k .. nominal + i/k}.
 */
final class Draft {
    final CalloutPlan plan;
    final DesignCase c;
    final int places;
    final double angle;
    final double k;
    double nominal;
    double min;
    double max;
    String source;
    RadiusCallout intent;
    boolean adjusted;
    double[] zones;
    /** ASME outward value of an unequally disposed single zone, or null for equal-bilateral. */
    Double outward;
    /** A radius refinement drawn with a located profile, or null. */
    Callout.Radius refinement;
    String generalTable;
    String generalClass;
    String generalLabel;
    /** Why the title-block table gives no value here, or null. */
    String generalMissing;

    Draft(CalloutPlan plan, DesignCase c, int places) {
        this.plan = plan;
        this.c = c;
        this.places = places;
        this.nominal = c.nominalRadius();
        this.angle = c.cornerAngleDegrees();
        this.k = CrescentZone.factor(angle);
    }

    boolean isProfile() { return zones != null; }

    boolean isFillet() { return c.kind() == BlendKind.FILLET; }

    void fromIntent(RadiusCallout rc) {
        intent = rc;
        min = rc.min().getAsDouble();
        max = rc.max().getAsDouble();
        // The nominal as drawn, even outside the limits (R3 +0.3/+0.1): a profile built from it is drawn about it.
        nominal = rc.nominalOrMean();
        source = "the engineer's tolerance " + c.tolerance();
    }

    void fromPlusMinus(double t, CalloutPlan.Disposition disposition, String why) {
        double tol = Math.max(Advisor.roundTo(t, places, RoundingMode.HALF_UP), unit());
        switch (disposition) {
            case PLUS_ONLY -> { min = nominal; max = nominal + 2 * tol; }
            case MINUS_ONLY -> { min = nominal - 2 * tol; max = nominal; }
            default -> { min = nominal - tol; max = nominal + tol; }
        }
        if (min <= 0) min = Advisor.roundTo(nominal / 2, places, RoundingMode.HALF_UP);
        min = Advisor.roundTo(min, places, RoundingMode.HALF_EVEN);
        max = Advisor.roundTo(max, places, RoundingMode.HALF_EVEN);
        source = why;
    }

    void general(String table, String cls, String label) {
        generalTable = table;
        generalClass = cls;
        generalLabel = label;
    }

    /** Sizes the profile zone(s) to hold the same radius band at the corner: the crescent's equivalent zone. */
    void zoneFromBand() {
        double base = CrescentZone.of(min, nominal, max, angle).equalBilateralProfile();
        List<Double> factors = plan.tiers() == null ? List.of(1.0) : plan.tiers();
        zones = new double[factors.size()];
        for (int i = 0; i < zones.length; i++) {
            zones[i] = Math.max(Advisor.roundTo(base * factors.get(i), places, RoundingMode.CEILING), unit());
        }
    }

    /**
     * Sizes one unequally disposed zone holding exactly {@code lo..hi} about the nominal, each side rounded down to
     * the drawing grid so the zone never admits more; false when the nominal lies outside {@code lo..hi} (no
     * disposition can do it) or a side rounds to nothing.
     */
    boolean unequalZone(double lo, double hi) {
        if (!(lo <= nominal + 1e-12 && nominal <= hi + 1e-12)) return false;
        double largerSide = Advisor.roundTo((hi - nominal) * k, places, RoundingMode.FLOOR);
        double smallerSide = Advisor.roundTo((nominal - lo) * k, places, RoundingMode.FLOOR);
        double z = Advisor.roundTo(largerSide + smallerSide, places, RoundingMode.HALF_EVEN);
        if (z < unit()) return false;
        zones = new double[] {z};
        // larger fillets add material; smaller rounds add material
        double out = isFillet() ? largerSide : smallerSide;
        outward = Math.abs(out - z / 2) < 1e-12 ? null : out;
        return true;
    }

    double unit() { return Math.pow(10, -places); }

    /** The zone's share inside the material (toward removing it), for the admitted range. */
    private double inside() { return zones[zones.length - 1] - outside(); }

    private double outside() {
        double z = zones[zones.length - 1];
        return outward == null || zones.length > 1 ? z / 2 : outward;
    }

    /** Smallest radius the control admits at the corner. */
    double lo() {
        double v;
        if (!isProfile()) {
            v = min;
        } else {
            double smaller = isFillet() ? inside() : outside();
            v = Math.max(nominal - smaller / k, nominal * 0.01);
        }
        return refinement == null ? v : Math.max(v, refinement.min());
    }

    /** Largest radius the control admits at the corner. */
    double hi() {
        double v;
        if (!isProfile()) {
            v = max;
        } else {
            double larger = isFillet() ? outside() : inside();
            v = nominal + larger / k;
        }
        return refinement == null ? v : Math.min(v, refinement.max());
    }

    /**
     * Raises the smallest admitted radius to at least {@code floor}, keeping the largest at most
     * {@code ceiling}; false when this control cannot.
     */
    boolean raiseLowerEnd(double floor, double ceiling) {
        if (plan.callout() == CalloutKind.GENERAL || plan.callout() == CalloutKind.COMPOSITE_PROFILE) return false;
        if (isProfile()) {
            if (!(nominal > floor)) return false;
            double z = Advisor.roundTo(2 * k * (nominal - floor), places, RoundingMode.FLOOR);
            if (z < unit()) return false;
            zones[0] = z;
            outward = null;
        } else {
            double band = max - min;
            double newMin = Advisor.roundTo(floor, places, RoundingMode.CEILING);
            double newMax = Math.max(max, Advisor.roundTo(newMin + band, places, RoundingMode.HALF_EVEN));
            if (newMax > ceiling) newMax = Advisor.roundTo(ceiling, places, RoundingMode.FLOOR);
            if (!(newMax > newMin)) return false;
            min = newMin;
            max = newMax;
            nominal = Math.min(Math.max(nominal, min), max);
        }
        adjusted = true;
        return true;
    }

    /** Lowers the largest admitted radius to at most {@code ceiling}, keeping the lower end above {@code floor}. */
    boolean lowerUpperEnd(double ceiling, double floor) {
        if (plan.callout() == CalloutKind.GENERAL || plan.callout() == CalloutKind.COMPOSITE_PROFILE) return false;
        if (isProfile()) {
            if (!(ceiling > nominal)) return false;
            double z = Advisor.roundTo(2 * k * (ceiling - nominal), places, RoundingMode.FLOOR);
            if (z < unit() || nominal - z / 2 / k < floor) return false;
            zones[0] = z;
            outward = null;
        } else {
            double band = max - min;
            double newMax = Advisor.roundTo(ceiling, places, RoundingMode.FLOOR);
            double newMin = Math.max(Advisor.roundTo(newMax - band, places, RoundingMode.HALF_EVEN),
                    Advisor.roundTo(floor, places, RoundingMode.CEILING));
            if (!(newMin > 0 && newMin < newMax)) return false;
            min = newMin;
            max = newMax;
            nominal = Math.min(Math.max(nominal, min), max);
        }
        adjusted = true;
        return true;
    }

    String describeRange() {
        return isProfile() ? "zone " + Advisor.fmt(zones[0], places) : "limits " + Advisor.fmt(min, places) + " to "
                + Advisor.fmt(max, places);
    }

    Callout callout(List<String> datumLabels) {
        List<DatumReference> refs = datumLabels.stream().map(l -> new DatumReference(l, null)).toList();
        Extent extent = plan.extent() == Extent.Kind.BETWEEN
                ? Extent.between(plan.between().get(0), plan.between().get(1)) : new Extent(plan.extent(), null, null);
        return switch (plan.callout()) {
            case GENERAL -> new Callout.General(generalTable, generalClass,
                    plan.edgeNote() && c.kind() == BlendKind.ROUND ? edgeNote() : null);
            case RADIUS -> new Callout.Radius(min, max, nominalInside());
            case CONTROLLED_RADIUS -> new Callout.ControlledRadius(min, max, nominalInside());
            case PROFILE -> new Callout.Profile(zones[0], outward, refs, plan.dynamic(), extent);
            case COMPOSITE_PROFILE -> {
                List<ProfileTier> tiers = new ArrayList<>();
                List<DatumReference> lower = refs.subList(0, Math.min(refs.size(),
                        plan.lowerTierDatums().pick(datumLabels).size()));
                for (int i = 0; i < zones.length; i++) tiers.add(new ProfileTier(zones[i], i == 0 ? refs : lower));
                yield new Callout.CompositeProfile(tiers, extent);
            }
        };
    }

    private Double nominalInside() {
        return nominal > min && nominal < max ? nominal : null;
    }

    private String edgeNote() {
        return "ISO 13715 edge −" + Advisor.fmt(min, places) + "/−" + Advisor.fmt(max, places);
    }

    /** The callout as drawn, through the drawing style. */
    String text(Callout callout) {
        CalloutFormatter f = new CalloutFormatter(c.standard(), c.units());
        if (callout instanceof Callout.Radius || callout instanceof Callout.ControlledRadius) {
            RadiusKind kind = callout instanceof Callout.ControlledRadius ? RadiusKind.CR : RadiusKind.R;
            return f.radius(radiusCallout(kind));
        }
        if (callout instanceof Callout.General g) {
            String s = f.radius(new RadiusCallout(RadiusKind.R, c.units(),
                    new ToleranceForm.Untoleranced(BigDecimal.valueOf(nominal).stripTrailingZeros())))
                    + (generalMissing != null ? " (" + generalLabel + " gives no value at this size)"
                    : " (general tolerance " + generalLabel + ": " + Advisor.fmt(min, places) + " to "
                    + Advisor.fmt(max, places) + ")");
            return g.edgeNote() == null ? s : s + "; " + g.edgeNote();
        }
        String profile = f.profile(callout);
        if (refinement == null) return profile;
        return profile + " with " + f.radius(RadiusCallout.limits(RadiusKind.R, c.units(), refinement.min(),
                refinement.max(), places));
    }

    private RadiusCallout radiusCallout(RadiusKind kind) {
        if (intent != null && !adjusted) return intent.withKind(kind);
        BigDecimal nom = BigDecimal.valueOf(nominal).stripTrailingZeros();
        if (nom.scale() < 0) nom = nom.setScale(0);
        BigDecimal lo = BigDecimal.valueOf(min).setScale(places, RoundingMode.HALF_EVEN);
        BigDecimal hi = BigDecimal.valueOf(max).setScale(places, RoundingMode.HALF_EVEN);
        if (adjusted || nominal < min || nominal > max) {
            return new RadiusCallout(kind, c.units(), new ToleranceForm.Limits(lo, hi));
        }
        BigDecimal plus = hi.subtract(nom).stripTrailingZeros();
        BigDecimal minus = lo.subtract(nom).stripTrailingZeros();
        if (plus.compareTo(minus.negate()) == 0) {
            return new RadiusCallout(kind, c.units(), new ToleranceForm.EqualBilateral(nom, plus));
        }
        return new RadiusCallout(kind, c.units(), new ToleranceForm.Deviations(nom, plus, minus));
    }

    /**
     * The radius the figures are about, as {@code limits} reads the same callout: the nominal a radius or CR callout
     * draws (R3 in R3 +0.3/+0.1, even outside its limits), the mean of the limits for a callout drawn as limits only
     * (no nominal on the drawing), and the basic radius of a profile or a title-block tolerance.
     */
    private double aboutRadius(double lo, double hi) {
        if (plan.callout() != CalloutKind.RADIUS && plan.callout() != CalloutKind.CONTROLLED_RADIUS) return nominal;
        RadiusCallout drawn = radiusCallout(RadiusKind.R);
        return drawn.nominal().isPresent() ? drawn.nominal().getAsDouble() : (lo + hi) / 2;
    }

    /** The figures of the control as it stands, without the mechanics. */
    AdviceFigures figures() {
        double lo = lo();
        double hi = hi();
        double about = aboutRadius(lo, hi);
        CrescentZone z = CrescentZone.of(lo, about, hi, angle);
        List<Double> tiers = null;
        if (isProfile() && zones.length > 1) {
            tiers = new ArrayList<>();
            for (double v : zones) tiers.add(v);
        }
        return new AdviceFigures(c.units(), Advisor.round(about), Advisor.round(lo), Advisor.round(hi),
                Advisor.round(hi - lo), angle, Advisor.round(z.width()), Advisor.round(z.equalBilateralProfile()),
                isProfile() ? zones[0] : null, isProfile() ? outward : null,
                isProfile() && outward != null ? Advisor.round(outward - zones[0] / 2) : null, tiers, source, adjusted, null, null, null,
                null, null, null, null, null, null, null, null);
    }
}
