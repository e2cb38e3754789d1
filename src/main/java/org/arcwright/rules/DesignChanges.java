package org.arcwright.rules;

import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.model.DesignCase;

/**
 * What to change in the design when no tolerance can meet every need, each with its numbers: the radius a relief
 * groove or undercut allows within the step, the chamfer a spacer or the mating part needs, the step or the stress
 * target that would then hold, or a nominal inside the room the needs leave. Every figure comes from the mechanics
 * seam on a changed copy of the case, so it is the same mechanics the needs were derived with.
 */
final class DesignChanges {
    private final FilletChecks checks;

    DesignChanges(FilletChecks checks) { this.checks = checks; }

    /**
     * The changes for {@code needs}, given the band {@code band} the process holds; empty when the needs leave room
     * for that band around the nominal.
     */
    List<DesignChange> propose(Needs needs, double band, int places) {
        DesignCase c = needs.designCase();
        String u = " " + c.units().symbol();
        List<DesignChange> out = new ArrayList<>();
        double floor = needs.floor();
        double ceiling = needs.ceiling();
        double h = needs.stepHeight();
        boolean seatingCeiling = needs.governing(Need.Kind.RADIUS_CEILING)
                .filter(b -> b.origin() == Needs.Origin.MATING).isPresent();
        boolean roomForBand = !needs.floorUnreachable() && ceiling - floor >= band - 1e-9;
        double nominal = c.nominalRadius();
        if (roomForBand && nominal >= floor - 1e-9 && nominal <= ceiling + 1e-9) return out;
        if (roomForBand) {
            double suggested = Advisor.roundTo(Math.min(Math.max(nominal, floor + band / 2), ceiling - band / 2), places,
                    RoundingMode.HALF_UP);
            out.add(new DesignChange(DesignChange.Kind.CHANGE_NOMINAL, "Change the nominal to R" + Advisor.fmt(suggested, places)
                    + u + ": R" + Advisor.plain(nominal) + " lies outside the room the needs leave (" + Advisor.fmt(floor, places)
                    + " to " + (Double.isFinite(ceiling) ? Advisor.fmt(ceiling, places) : "any") + u + ").",
                    numbers("nominal", suggested, "floor", floor, "ceiling", ceiling)));
            if (c.stress() != null && Double.isFinite(h) && nominal > h) {
                largerStep(c, nominal + band / 2, band, places).ifPresent(out::add);
            }
            return out;
        }
        double needFor = needs.floorUnreachable() ? Double.NaN : floor + band;
        if (c.stress() != null && Double.isFinite(h)) {
            double grooveR = Double.isNaN(needFor) ? h : Math.min(h, Advisor.roundTo(needFor, places, RoundingMode.CEILING));
            String fl = needs.governingFloor().map(Need::why).orElse("the stress floor");
            out.add(new DesignChange(DesignChange.Kind.RELIEF_GROOVE, "Cut a relief groove into the shoulder face so the "
                    + "mating part seats on the face beyond it: the groove's radius may then be as large as the step allows, h = "
                    + Advisor.fmt(h, places) + u + (Double.isNaN(needFor) ? "" : "; R" + Advisor.fmt(floor, places) + " to R"
                    + Advisor.fmt(grooveR, places) + u + " meets " + fl) + ".",
                    numbers("grooveRadiusMin", Double.isNaN(needFor) ? Double.NaN : floor, "grooveRadiusMax", grooveR,
                            "stepHeight", h)));
            out.add(new DesignChange(DesignChange.Kind.UNDERCUT, "Undercut the smaller diameter at the shoulder (a recessed "
                    + "fillet below d): the radius is then no longer limited by what the mating corner clears, only by the step h = "
                    + Advisor.fmt(h, places) + u + " and the undercut depth; check the section left at the undercut.",
                    numbers("radiusMax", h, "stepHeight", h)));
        }
        if (seatingCeiling && !Double.isNaN(needFor)) {
            Optional<Double> chamfer = chamferFor(c, needFor);
            chamfer.ifPresent(ch -> {
                String corner = c.mating().corner();
                if (!"bearing".equals(corner)) {
                    out.add(new DesignChange(DesignChange.Kind.LARGER_MATING_CHAMFER, "Ask for a larger "
                            + ("radius".equals(corner) ? "corner radius" : "chamfer") + " on the mating part: at least "
                            + Advisor.fmt(ch, places) + u + " lets a fillet up to " + Advisor.fmt(needFor, places) + u
                            + " seat, room for the floor " + Advisor.fmt(floor, places) + " plus the band " + Advisor.fmt(band, places) + ".",
                            numbers("matingSize", ch, "filletMax", needFor)));
                }
                out.add(new DesignChange(DesignChange.Kind.SPACER, "Put a spacer ring between the shoulder and the mating part, "
                        + "its bore chamfered at least " + Advisor.fmt(Math.max(ch, needFor), places) + u + " × 45°, so the fillet up to "
                        + Advisor.fmt(needFor, places) + u + " sits under the spacer's chamfer and the mating part seats on the spacer.",
                        numbers("spacerChamfer", Math.max(ch, needFor), "filletMax", needFor)));
            });
        }
        if (c.stress() != null && Double.isFinite(h) && (!seatingCeiling || Double.isNaN(needFor))) {
            largerStep(c, 0, band, places).ifPresent(out::add);
        }
        strongerMaterial(needs, band, places).ifPresent(out::add);
        return out;
    }

    /** The mating size whose largest seating fillet is at least {@code filletMax}, by bisection on the seam. */
    private Optional<Double> chamferFor(DesignCase c, double filletMax) {
        if (c.mating() == null) return Optional.empty();
        double lo = c.mating().size();
        double hi = lo;
        for (int i = 0; i < 40 && largest(c, hi) < filletMax; i++) hi *= 1.5;
        if (largest(c, hi) < filletMax) return Optional.empty();
        for (int i = 0; i < 60; i++) {
            double mid = (lo + hi) / 2;
            if (largest(c, mid) >= filletMax) hi = mid;
            else lo = mid;
        }
        return Optional.of(Advisor.roundTo(hi, 3, RoundingMode.CEILING));
    }

    private double largest(DesignCase c, double size) {
        DesignCase.MatingCorner m = c.mating();
        DesignCase changed = withMating(c, new DesignCase.MatingCorner(m.corner(), size, m.angle()));
        try {
            return checks.seating(changed, size).map(FilletChecks.SeatingFigure::largestRadius).orElse(0.0);
        } catch (RuntimeException e) {
            return 0.0;
        }
    }

    /**
     * The larger diameter D at which the stress floor (or {@code radius}, if larger) plus the band fits under the
     * step, iterating the floor (it rises a little with D/d).
     */
    private Optional<DesignChange> largerStep(DesignCase c, double radius, double band, int places) {
        DesignCase.StressInputs s = c.stress();
        double bigD = s.bigD();
        for (int i = 0; i < 8; i++) {
            DesignCase changed = withD(c, bigD);
            double floor = 0;
            boolean found = true;
            for (FilletChecks.MinimumRadiusFigure m : checks.minimumRadii(changed)) {
                if (!m.found()) found = false;
                else floor = Math.max(floor, m.radius());
            }
            double h = (bigD - s.smallD()) / 2;
            floor = Math.max(floor, radius - band);
            if (found && h >= floor + band - 1e-9 && bigD > s.bigD()) {
                double rounded = Advisor.roundTo(bigD, Math.max(0, places - 1), RoundingMode.CEILING);
                return Optional.of(new DesignChange(DesignChange.Kind.LARGER_STEP, "Make the step larger: D = "
                        + Advisor.plain(rounded) + " " + c.units().symbol() + " (with d = " + Advisor.plain(s.smallD())
                        + ") gives h = " + Advisor.fmt((rounded - s.smallD()) / 2, places) + ", room for radii from "
                        + Advisor.fmt(floor, places) + " to " + Advisor.fmt(floor + band, places) + " " + c.units().symbol()
                        + " (the stress floor rises a little with D/d; it was found again at this D).",
                        numbers("D", rounded, "d", s.smallD(), "stepHeight", (rounded - s.smallD()) / 2, "floor", floor)));
            }
            bigD = Math.max(bigD * 1.02, s.smallD() + 2 * (floor + band) * 1.02);
        }
        return Optional.empty();
    }

    /** The stress target that would hold with the smallest radius the ceiling leaves room for. */
    private Optional<DesignChange> strongerMaterial(Needs needs, double band, int places) {
        DesignCase c = needs.designCase();
        if (c.stress() == null || needs.stressFloors().isEmpty()) return Optional.empty();
        double rMin = needs.ceiling() - band;
        if (!(rMin > 0) || !Double.isFinite(rMin)) return Optional.empty();
        Optional<FilletChecks.StressFigures> sf;
        try {
            sf = checks.stress(c, rMin, rMin);
        } catch (RuntimeException e) {
            return Optional.empty();
        }
        if (sf.isEmpty() || Double.isNaN(sf.get().ktAtMin())) return Optional.empty();
        boolean kfTarget = c.stress().targetKf() != null && sf.get().kfAtMin() != null;
        double over = kfTarget ? sf.get().kfAtMin() - c.stress().targetKf()
                : c.stress().targetKt() == null ? 0 : sf.get().ktAtMin() - c.stress().targetKt();
        if (!(over > 0)) return Optional.empty();
        FilletChecks.StressFigures f = sf.get();
        boolean kf = c.stress().targetKf() != null && f.kfAtMin() != null;
        double value = kf ? f.kfAtMin() : f.ktAtMin();
        double target = kf ? c.stress().targetKf() : c.stress().targetKt() == null ? value : c.stress().targetKt();
        String sym = kf ? "K_f" : "K_t";
        return Optional.of(new DesignChange(DesignChange.Kind.STRONGER_MATERIAL, "Accept a higher stress concentration "
                + "with a stronger material or a fatigue-strengthening treatment (rolled or shot-peened fillet): with the "
                + "smallest radius the ceiling leaves room for, R" + Advisor.fmt(rMin, places) + " " + c.units().symbol()
                + ", " + sym + " = " + Advisor.fmt(value, 2) + " against the target " + Advisor.plain(target) + "; the "
                + "fatigue strength must then be about " + Advisor.fmt(value / target, 2) + " times what the target assumed.",
                numbers("radius", rMin, kf ? "targetKf" : "targetKt", Advisor.roundTo(value, 2, RoundingMode.CEILING),
                        "strengthRatio", value / target)));
    }

    private static DesignCase withMating(DesignCase c, DesignCase.MatingCorner m) {
        return new DesignCase(c.units(), c.standard(), c.feature(), c.kind(), c.nominalRadius(), c.function(),
                c.loading(), c.formMatters(), c.locationMatters(), c.datums(), c.process(), c.stress(), m, c.tolerance(),
                c.cornerAngle());
    }

    private static DesignCase withD(DesignCase c, double bigD) {
        DesignCase.StressInputs s = c.stress();
        return new DesignCase(c.units(), c.standard(), c.feature(), c.kind(), c.nominalRadius(), c.function(),
                c.loading(), c.formMatters(), c.locationMatters(), c.datums(), c.process(),
                new DesignCase.StressInputs(s.shape(), s.load(), bigD, s.smallD(), s.ultimateStrength(), s.targetKt(),
                        s.targetKf()), c.mating(), c.tolerance(), c.cornerAngle());
    }

    private static Map<String, Double> numbers(Object... kv) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            double v = (Double) kv[i + 1];
            if (Double.isFinite(v)) m.put((String) kv[i], Advisor.round(v));
        }
        return m;
    }
}
