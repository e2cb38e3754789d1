package org.arcwright.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;

/**
 * What the feature needs, derived from the case before any control is looked at (the first step of the
 * advisor; {@link Proof} is the second). Floors and ceilings come from the mechanics seam, so their figures are
 * the mechanics package's (Peterson's fits, Neuber/Shigley notch sensitivity, the mating-corner clearance
 * geometry and the pack's bearing-seat table).
 *
 * @param designCase the case
 * @param list every need, floors first
 * @param stressFloors the stress-target figures behind the floors, for the numbers and the design changes
 * @param stepHeight h = (D - d)/2 of a shoulder fillet with a section, else +∞
 */
public record Needs(DesignCase designCase, List<Need> list, List<FilletChecks.MinimumRadiusFigure> stressFloors,
                    double stepHeight) {

    public Needs {
        list = List.copyOf(list);
        stressFloors = List.copyOf(stressFloors);
    }

    /**
     * The needs of {@code c}.
     *
     * @param warnings receives what the engineer should know about how the case was read
     */
    public static Needs derive(DesignCase c, FilletChecks checks, List<String> warnings) {
        List<Need> out = new ArrayList<>(6);
        List<FilletChecks.MinimumRadiusFigure> floors = List.of();
        boolean fillet = c.kind() == BlendKind.FILLET;
        String u = " " + c.units().symbol();
        double h = Double.POSITIVE_INFINITY;
        if (c.stress() != null && fillet) {
            h = c.stress().stepHeight();
            floors = checks.minimumRadii(c);
            for (FilletChecks.MinimumRadiusFigure m : floors) {
                String field = "Kt".equals(m.factor()) ? "stress.targetKt" : "stress.targetKf";
                String sub = "Kt".equals(m.factor()) ? "K_t" : "K_f";
                String source = field + " " + Advisor.plain(m.target()) + ("Kt".equals(m.factor())
                        ? "; Peterson's fits for shoulder fillets (Pilkey and Pilkey, 3rd ed.)"
                        : "; Peterson's fits with Neuber/Shigley notch sensitivity (Shigley's, Pilkey and Pilkey)");
                if (m.found()) {
                    out.add(new Need(Need.Kind.RADIUS_FLOOR, Advisor.round(m.radius()), null, sub + " ≤ "
                            + Advisor.plain(m.target()) + " at the smallest radius needs r ≥ " + Advisor.fmt(m.radius(), 3) + u,
                            source, true));
                } else {
                    out.add(new Need(Need.Kind.RADIUS_FLOOR, null, null, sub + " ≤ " + Advisor.plain(m.target())
                            + " cannot be met: " + m.message(), source, false));
                }
            }
            if (c.stress().targetKt() != null && c.stress().targetKf() == null && c.stress().ultimateStrength() != null) {
                warnings.add("stress.targetKt is read as a K_t target (geometry only), as it always is; to set a K_f "
                        + "target from the ultimate strength, state stress.targetKf.");
            }
        }
        if (c.mating() != null && !fillet) {
            if ("radius".equals(c.mating().corner())) {
                out.add(new Need(Need.Kind.RADIUS_FLOOR, c.mating().size(), null, "a round that sits in the mating part's "
                        + "fillet must clear it: the round's minimum at least the mating fillet's largest radius, "
                        + Advisor.plain(c.mating().size()) + u, "mating.corner radius, size " + Advisor.plain(c.mating().size())
                        + " (clearance geometry, common practice)", true));
            } else {
                warnings.add("A round's clearance floor is derived from a mating radius only; for a mating " + c.mating().corner()
                        + " check the seating by hand or give the mating fillet's largest radius as corner \"radius\".");
            }
        }
        if (c.mating() != null && fillet) {
            Optional<FilletChecks.SeatingFigure> s = checks.seating(c, c.nominalRadius());
            s.ifPresent(f -> out.add(new Need(Need.Kind.RADIUS_CEILING, null, Advisor.round(f.largestRadius()),
                    "the largest fillet that still seats under the mating " + describe(c.mating()) + " is "
                            + Advisor.fmt(f.largestRadius(), 3) + u,
                    "mating.corner " + c.mating().corner() + ", size " + Advisor.plain(c.mating().size())
                            + ("bearing".equals(c.mating().corner()) ? " (the pack's bearing-seat table)"
                            : " (clearance geometry, decision record 0802)"), true)));
        }
        if (Double.isFinite(h)) {
            out.add(new Need(Need.Kind.RADIUS_CEILING, null, Advisor.round(h), "a fillet larger than the step h = (D − d)/2 = "
                    + Advisor.fmt(h, 3) + u + " cannot meet the shoulder face tangentially", "stress.D, stress.d "
                    + "(shoulder geometry)", true));
        }
        if (c.formMatters() || c.loading() == Loading.FATIGUE) {
            out.add(new Need(Need.Kind.FORM, null, null, c.formMatters() ? "the shape of the blend matters: no flats, "
                    + "reversals or steps" : "fatigue loading: a flat or reversal is a sharper local radius than the minimum "
                    + "checked", c.formMatters() ? "formMatters" : "loading fatigue", true));
        }
        if (c.locationMatters() && c.hasDatums()) {
            out.add(new Need(Need.Kind.LOCATION, null, null, "the blend must sit where the datums " + String.join(", ",
                    c.datums()) + " put it", "locationMatters, datums", true));
        }
        return new Needs(c, out, floors, h);
    }

    private static String describe(DesignCase.MatingCorner m) {
        return switch (m.corner()) {
            case "chamfer" -> "chamfer " + Advisor.plain(m.size()) + " × " + Advisor.plain(m.angle() == null ? 45 : m.angle()) + "°";
            case "bearing" -> "rolling-bearing ring corner (r_s min " + Advisor.plain(m.size()) + ")";
            default -> "corner radius " + Advisor.plain(m.size());
        };
    }

    /** The largest floor of the reachable floors, or 0. */
    public double floor() {
        double f = 0;
        for (Need n : list) if (n.id() == Need.Kind.RADIUS_FLOOR && n.reachable()) f = Math.max(f, n.min());
        return f;
    }

    /** The smallest ceiling, or +∞. */
    public double ceiling() {
        double c = Double.POSITIVE_INFINITY;
        for (Need n : list) if (n.id() == Need.Kind.RADIUS_CEILING) c = Math.min(c, n.max());
        return c;
    }

    /** True when some floor cannot be met by any radius. */
    public boolean floorUnreachable() {
        for (Need n : list) if (n.id() == Need.Kind.RADIUS_FLOOR && !n.reachable()) return true;
        return false;
    }

    /** True when the radius needs leave no room: a floor above a ceiling, or an unreachable floor. */
    public boolean radiusConflict() { return floorUnreachable() || floor() > ceiling() + 1e-9; }

    public boolean has(Need.Kind kind) {
        for (Need n : list) if (n.id() == kind) return true;
        return false;
    }

    /** The ceiling need that decides {@link #ceiling()}, if any. */
    public Optional<Need> governingCeiling() {
        Need best = null;
        for (Need n : list) {
            if (n.id() == Need.Kind.RADIUS_CEILING && (best == null || n.max() < best.max())) best = n;
        }
        return Optional.ofNullable(best);
    }

    /** The floor need that decides {@link #floor()} (an unreachable one first), if any. */
    public Optional<Need> governingFloor() {
        Need best = null;
        for (Need n : list) {
            if (n.id() != Need.Kind.RADIUS_FLOOR) continue;
            if (!n.reachable()) return Optional.of(n);
            if (best == null || n.min() > best.min()) best = n;
        }
        return Optional.ofNullable(best);
    }
}
