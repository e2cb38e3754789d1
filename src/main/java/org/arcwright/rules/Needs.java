package org.arcwright.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;

/**
 * What the feature needs, derived from the case before any control is looked at (the first step of the
 * advisor; {@link Proof} is the second). Floors and ceilings come from the mechanics seam, so their figures are
 * the mechanics package's (Peterson's fits, Neuber/Shigley notch sensitivity, the mating-corner clearance
 * geometry and the pack's bearing-seat table); pack rules may add needs of their own ({@link RuleNeed}).
 *
 * <p>Each bound found is a {@link Bound}; {@link #list()} holds one need per kind, so a fillet bounded both by
 * its mating chamfer and by the step has one {@code radius-ceiling} whose maximum is the tighter of the two and
 * whose words name both sources and say which binds (likewise for several floors, or a form need stated twice).
 *
 * <p>A value: built once per case by {@link #derive}, read for every card.
 */
public final class Needs {
    private final DesignCase designCase;
    private final List<Need> list;
    private final List<FilletChecks.MinimumRadiusFigure> stressFloors;
    private final double stepHeight;
    private final List<Bound> bounds;
    // read for every card: worked out once
    private final double floor;
    private final double ceiling;
    private final boolean floorUnreachable;
    private final Bound governingFloor;
    private final Bound governingCeiling;
    private final int kinds;

    public Needs(DesignCase designCase, List<Need> list, List<FilletChecks.MinimumRadiusFigure> stressFloors,
                 double stepHeight, List<Bound> bounds) {
        this.designCase = Objects.requireNonNull(designCase, "designCase");
        this.list = List.copyOf(list);
        this.stressFloors = List.copyOf(stressFloors);
        this.stepHeight = stepHeight;
        this.bounds = List.copyOf(bounds);
        double f = 0;
        double c = Double.POSITIVE_INFINITY;
        boolean unreachable = false;
        int k = 0;
        for (Need n : this.list) k |= 1 << n.id().ordinal();
        for (Bound b : this.bounds) {
            Need n = b.need();
            if (n.id() == Need.Kind.RADIUS_FLOOR) {
                if (n.reachable()) f = Math.max(f, n.min());
                else unreachable = true;
            } else if (n.id() == Need.Kind.RADIUS_CEILING) {
                c = Math.min(c, n.max());
            }
        }
        this.floor = f;
        this.ceiling = c;
        this.floorUnreachable = unreachable;
        this.kinds = k;
        this.governingFloor = bindingOf(this.bounds, Need.Kind.RADIUS_FLOOR);
        this.governingCeiling = bindingOf(this.bounds, Need.Kind.RADIUS_CEILING);
    }

    /** The case. */
    public DesignCase designCase() { return designCase; }

    /** One need per kind, in the order floor, ceiling, form, location. */
    public List<Need> list() { return list; }

    /** The stress-target figures behind the floors, for the numbers and the design changes. */
    public List<FilletChecks.MinimumRadiusFigure> stressFloors() { return stressFloors; }

    /** h = (D - d)/2 of a shoulder fillet with a section, else +∞. */
    public double stepHeight() { return stepHeight; }

    /** Every bound found, before merging, each with where it came from. */
    public List<Bound> bounds() { return bounds; }

    private static Bound bindingOf(List<Bound> bounds, Need.Kind kind) {
        List<Bound> same = new ArrayList<>(2);
        for (Bound b : bounds) if (b.need().id() == kind) same.add(b);
        return same.isEmpty() ? null : binding(same);
    }

    /** Where a bound came from, which decides the words and the design changes that can lift it. */
    public enum Origin {
        /** A K_t or K_f target on the mechanics. */
        STRESS,
        /** The mating part: seating under its corner, or clearing its fillet. */
        MATING,
        /** The step height of a shoulder. */
        STEP,
        /** The case's own statements (form matters, location matters). */
        CASE,
        /** A pack rule. */
        RULE
    }

    /**
     * One need as found, before needs of the same kind are merged.
     *
     * @param need the need with its own numbers, why and source
     * @param origin where it came from
     * @param label a short name for it in the merged words, e.g. "the step height"
     */
    public record Bound(Need need, Origin origin, String label) {
        public Bound {
            Objects.requireNonNull(need, "need");
            Objects.requireNonNull(origin, "origin");
            Objects.requireNonNull(label, "label");
        }
    }

    /**
     * A need a pack rule adds, with the rule that adds it.
     *
     * @param need the rule's need
     * @param ruleId the rule's id
     * @param pack the pack that supplied the rule
     */
    public record Added(RuleNeed need, String ruleId, String pack) {
        public Added {
            Objects.requireNonNull(need, "need");
            Objects.requireNonNull(ruleId, "ruleId");
            Objects.requireNonNull(pack, "pack");
        }
    }

    /**
     * The needs of {@code c}.
     *
     * @param warnings receives what the engineer should know about how the case was read
     */
    public static Needs derive(DesignCase c, FilletChecks checks, List<String> warnings) {
        return derive(c, checks, warnings, List.of());
    }

    /**
     * The needs of {@code c}, with the needs that the pack rules firing on it add.
     *
     * @param warnings receives what the engineer should know about how the case was read
     * @param added needs from the rules that fire, in rule order
     */
    public static Needs derive(DesignCase c, FilletChecks checks, List<String> warnings, List<Added> added) {
        List<Bound> out = new ArrayList<>(6);
        List<FilletChecks.MinimumRadiusFigure> floors = List.of();
        boolean fillet = c.kind() == BlendKind.FILLET;
        String u = " " + c.units().symbol();
        double h = Double.POSITIVE_INFINITY;
        if (c.stress() != null && fillet) {
            h = c.stress().stepHeight();
            floors = checks.minimumRadii(c);
            for (FilletChecks.MinimumRadiusFigure m : floors) {
                boolean kt = "Kt".equals(m.factor());
                String field = kt ? "stress.targetKt" : "stress.targetKf";
                String sub = kt ? "K_t" : "K_f";
                String source = field + " " + Advisor.plain(m.target()) + (kt
                        ? "; Peterson's fits for shoulder fillets (Pilkey and Pilkey, 3rd ed.)"
                        : "; Peterson's fits with Neuber/Shigley notch sensitivity (Shigley's, Pilkey and Pilkey)");
                String label = "the " + sub + " target";
                if (m.found()) {
                    out.add(new Bound(new Need(Need.Kind.RADIUS_FLOOR, Advisor.round(m.radius()), null, sub + " ≤ "
                            + Advisor.plain(m.target()) + " at the smallest radius needs r ≥ " + Advisor.fmt(m.radius(), 3) + u,
                            source, true), Origin.STRESS, label));
                } else {
                    out.add(new Bound(new Need(Need.Kind.RADIUS_FLOOR, null, null, sub + " ≤ " + Advisor.plain(m.target())
                            + " cannot be met: " + m.message(), source, false), Origin.STRESS, label));
                }
            }
            if (c.stress().targetKt() != null && c.stress().targetKf() == null && c.stress().ultimateStrength() != null) {
                warnings.add("stress.targetKt is read as a K_t target (geometry only), as it always is; to set a K_f "
                        + "target from the ultimate strength, state stress.targetKf.");
            }
        }
        if (c.mating() != null && !fillet) {
            if ("radius".equals(c.mating().corner())) {
                out.add(new Bound(new Need(Need.Kind.RADIUS_FLOOR, c.mating().size(), null, "a round that sits in the "
                        + "mating part's fillet must clear it: the round's minimum at least the mating fillet's largest "
                        + "radius, " + Advisor.plain(c.mating().size()) + u, "mating.corner radius, size "
                        + Advisor.plain(c.mating().size()) + " (clearance geometry, common practice)", true),
                        Origin.MATING, "the mating fillet"));
            } else {
                warnings.add("A round's clearance floor is derived from a mating radius only; for a mating " + c.mating().corner()
                        + " check the seating by hand or give the mating fillet's largest radius as corner \"radius\".");
            }
        }
        if (c.mating() != null && fillet) {
            Optional<FilletChecks.SeatingFigure> s = checks.seating(c, c.nominalRadius());
            s.ifPresent(f -> out.add(new Bound(new Need(Need.Kind.RADIUS_CEILING, null, Advisor.round(f.largestRadius()),
                    "the largest fillet that still seats under the mating " + describe(c.mating()) + " is "
                            + Advisor.fmt(f.largestRadius(), 3) + u,
                    "mating.corner " + c.mating().corner() + ", size " + Advisor.plain(c.mating().size())
                            + ("bearing".equals(c.mating().corner()) ? " (the pack's bearing-seat table)"
                            : " (clearance geometry, decision record 0802)"), true), Origin.MATING,
                    "seating under the mating " + corner(c.mating()))));
        }
        if (Double.isFinite(h)) {
            out.add(new Bound(new Need(Need.Kind.RADIUS_CEILING, null, Advisor.round(h), "a fillet larger than the step "
                    + "h = (D − d)/2 = " + Advisor.fmt(h, 3) + u + " cannot meet the shoulder face tangentially",
                    "stress.D, stress.d (shoulder geometry)", true), Origin.STEP, "the step height"));
        }
        if (c.formMatters() || c.loading() == Loading.FATIGUE) {
            out.add(new Bound(new Need(Need.Kind.FORM, null, null, c.formMatters() ? "the shape of the blend matters: no "
                    + "flats, reversals or steps" : "fatigue loading: a flat or reversal is a sharper local radius than the "
                    + "minimum checked", c.formMatters() ? "formMatters" : "loading fatigue", true), Origin.CASE,
                    c.formMatters() ? "formMatters" : "fatigue loading"));
        }
        if (c.locationMatters() && c.hasDatums()) {
            out.add(new Bound(new Need(Need.Kind.LOCATION, null, null, "the blend must sit where the datums "
                    + String.join(", ", c.datums()) + " put it", "locationMatters, datums", true), Origin.CASE,
                    "locationMatters"));
        }
        for (Added a : added) {
            out.add(fromRule(a, c, warnings));
        }
        return new Needs(c, merge(out, u), floors, h, out);
    }

    /** A rule's need in the case's units, its why with the number, its source naming the rule. */
    private static Bound fromRule(Added a, DesignCase c, List<String> warnings) {
        RuleNeed n = a.need();
        String u = " " + c.units().symbol();
        String source = "rule " + a.ruleId() + " (" + a.pack() + "): " + n.source();
        Double min = null;
        Double max = null;
        String why = n.why();
        if (n.id() == Need.Kind.RADIUS_FLOOR || n.id() == Need.Kind.RADIUS_CEILING) {
            double v = Advisor.round(n.boundIn(c.units()));
            String stated = n.units() == c.units() ? "" : " (" + Advisor.plain(n.min() != null ? n.min() : n.max()) + " "
                    + n.units().symbol() + ")";
            why = why + ": r " + (n.id() == Need.Kind.RADIUS_FLOOR ? "≥ " : "≤ ") + Advisor.plain(v) + u + stated;
            if (n.id() == Need.Kind.RADIUS_FLOOR) min = v;
            else max = v;
        }
        if (n.id() == Need.Kind.LOCATION && !c.hasDatums()) {
            warnings.add("Rule '" + a.ruleId() + "' adds a location need, but the case lists no datums: no control can "
                    + "locate the blend until its datum features are named.");
        }
        return new Bound(new Need(n.id(), min, max, why, source, true), Origin.RULE, "rule " + a.ruleId());
    }

    private static final Need.Kind[] KINDS = Need.Kind.values();

    /** One need per kind: the tightest bound, every source named, the binding one said. */
    private static List<Need> merge(List<Bound> bounds, String u) {
        List<Need> out = new ArrayList<>(4);
        int[] count = new int[KINDS.length];
        for (Bound b : bounds) count[b.need().id().ordinal()]++;
        for (Need.Kind kind : KINDS) {
            int k = count[kind.ordinal()];
            if (k == 0) continue;
            if (k == 1) {
                for (Bound b : bounds) if (b.need().id() == kind) out.add(b.need());
                continue;
            }
            List<Bound> same = new ArrayList<>(k);
            for (Bound b : bounds) if (b.need().id() == kind) same.add(b);
            StringBuilder why = new StringBuilder();
            StringBuilder source = new StringBuilder();
            for (Bound b : same) {
                if (why.length() > 0) {
                    why.append("; ");
                    source.append("; ");
                }
                why.append(b.need().why());
                source.append(b.need().source());
            }
            Double min = null;
            Double max = null;
            boolean reachable = true;
            Bound binding = binding(same);
            if (kind == Need.Kind.RADIUS_FLOOR) {
                for (Bound b : same) {
                    if (!b.need().reachable()) reachable = false;
                    else if (min == null || b.need().min() > min) min = b.need().min();
                }
                if (reachable) {
                    why.append("; the highest floor, ").append(Advisor.fmt(min, 3)).append(u).append(" from ")
                            .append(binding.label()).append(", binds");
                } else {
                    why.append("; no radius meets ").append(binding.label());
                }
            } else if (kind == Need.Kind.RADIUS_CEILING) {
                max = binding.need().max();
                why.append("; the lowest ceiling, ").append(Advisor.fmt(max, 3)).append(u).append(" from ")
                        .append(binding.label()).append(", binds");
            }
            out.add(new Need(kind, min, max, why.toString(), source.toString(), reachable));
        }
        return out;
    }

    /** The bound that decides a merged need: the unreachable floor, the highest floor, the lowest ceiling. */
    private static Bound binding(List<Bound> same) {
        Bound best = null;
        for (Bound b : same) {
            Need n = b.need();
            if (n.id() == Need.Kind.RADIUS_FLOOR) {
                if (!n.reachable()) return b;
                if (best == null || n.min() > best.need().min()) best = b;
            } else if (n.id() == Need.Kind.RADIUS_CEILING) {
                if (best == null || n.max() < best.need().max()) best = b;
            } else if (best == null) {
                best = b;
            }
        }
        return best;
    }

    private static String corner(DesignCase.MatingCorner m) {
        return switch (m.corner()) {
            case "chamfer" -> "chamfer";
            case "bearing" -> "bearing ring corner";
            default -> "corner radius";
        };
    }

    private static String describe(DesignCase.MatingCorner m) {
        return switch (m.corner()) {
            case "chamfer" -> "chamfer " + Advisor.plain(m.size()) + " × " + Advisor.plain(m.angle() == null ? 45 : m.angle()) + "°";
            case "bearing" -> "rolling-bearing ring corner (r_s min " + Advisor.plain(m.size()) + ")";
            default -> "corner radius " + Advisor.plain(m.size());
        };
    }

    /** The largest floor of the reachable floors, or 0. */
    public double floor() { return floor; }

    /** The smallest ceiling, or +∞. */
    public double ceiling() { return ceiling; }

    /** True when some floor cannot be met by any radius. */
    public boolean floorUnreachable() { return floorUnreachable; }

    /** True when the radius needs leave no room: a floor above a ceiling, or an unreachable floor. */
    public boolean radiusConflict() { return floorUnreachable || floor > ceiling + 1e-9; }

    public boolean has(Need.Kind kind) { return (kinds & 1 << kind.ordinal()) != 0; }

    /** The ceiling that decides {@link #ceiling()}, as found (before merging), if any. */
    public Optional<Need> governingCeiling() {
        return governingCeiling == null ? Optional.empty() : Optional.of(governingCeiling.need());
    }

    /** The floor that decides {@link #floor()} (an unreachable one first), as found (before merging), if any. */
    public Optional<Need> governingFloor() {
        return governingFloor == null ? Optional.empty() : Optional.of(governingFloor.need());
    }

    /** The bound of {@code kind} that decides the merged need, if any. */
    public Optional<Bound> governing(Need.Kind kind) {
        if (kind == Need.Kind.RADIUS_FLOOR) return Optional.ofNullable(governingFloor);
        if (kind == Need.Kind.RADIUS_CEILING) return Optional.ofNullable(governingCeiling);
        return Optional.ofNullable(bindingOf(bounds, kind));
    }
}
