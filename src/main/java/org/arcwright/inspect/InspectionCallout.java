package org.arcwright.inspect;

import java.util.List;
import java.util.Set;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.zone.ProfileZone;

/**
 * The callout a measured section is judged against, as an inspection file states it. A closed
 * family: a radius with limits (R or CR), a profile of a surface, or a composite profile.
 */
public sealed interface InspectionCallout {
    /** Short text for reports, e.g. {@code R 0.5-0.6} or {@code profile 0.05 (x, y free)}. */
    String describe();

    /**
     * A radius (R) or controlled radius (CR) with limits.
     *
     * @param kind R or CR
     * @param min smallest radius, >= 0
     * @param max largest radius, > min
     */
    record RadiusLimits(RadiusKind kind, double min, double max) implements InspectionCallout {
        public RadiusLimits {
            if (kind == null) throw InputProblem.ofField("callout.type", "missing");
            if (!Double.isFinite(min) || min < 0) throw InputProblem.ofField("callout.min", "must be zero or more, got " + DecimalText.exact(min));
            if (!Double.isFinite(max) || max <= 0) throw InputProblem.ofField("callout.max", "must be above zero, got " + DecimalText.exact(max));
            if (max < min) throw InputProblem.ofField("callout.max", "is smaller than min (" + DecimalText.exact(max) + " < " + DecimalText.exact(min) + ")");
            if (max == min) throw InputProblem.ofField("callout.max", "equals min (" + DecimalText.exact(max) + "); a radius tolerance needs max above min");
        }

        @Override
        public String describe() { return kind.symbol() + " " + num(min) + "-" + num(max); }
    }

    /**
     * A profile of a surface.
     *
     * @param zone width and disposition
     * @param free degrees of freedom the datums leave free (empty: located)
     * @param dynamic whether a uniform offset is also free (controls form, not size)
     */
    record ProfileTolerance(ProfileZone zone, Set<Freedom> free, boolean dynamic) implements InspectionCallout {
        public ProfileTolerance {
            if (zone == null) throw InputProblem.ofField("callout.zone", "missing");
            free = Set.copyOf(free);
        }

        @Override
        public String describe() {
            String d = zone.equalBilateral() ? "" : " (" + num(zone.outward()) + " outward)";
            return "profile " + num(zone.width()) + d + freedomText(free) + (dynamic ? ", dynamic" : "");
        }
    }

    /**
     * A composite profile: tiers of decreasing zone and increasing freedom, each judged on its own.
     *
     * @param tiers at least two
     */
    record CompositeProfile(List<Tier> tiers) implements InspectionCallout {
        public CompositeProfile {
            tiers = List.copyOf(tiers);
            if (tiers.size() < 2) throw InputProblem.ofField("callout.tiers", "a composite profile needs at least 2 tiers, got " + tiers.size());
            for (int i = 1; i < tiers.size(); i++) {
                if (tiers.get(i).zone() > tiers.get(i - 1).zone()) {
                    throw InputProblem.ofField("callout.tiers[" + i + "].zone", "tier " + (i + 1) + "'s zone " + DecimalText.exact(tiers.get(i).zone())
                            + " is larger than tier " + i + "'s " + DecimalText.exact(tiers.get(i - 1).zone())
                            + "; each lower tier refines the one above it (ASME Y14.5-2018, composite profile tolerancing)");
                }
            }
        }

        @Override
        public String describe() {
            StringBuilder sb = new StringBuilder("composite profile");
            for (Tier t : tiers) sb.append(" | ").append(num(t.zone())).append(freedomText(t.free()));
            return sb.toString();
        }
    }

    /**
     * One tier of a composite profile (equal-bilateral).
     *
     * @param zone width, > 0
     * @param free degrees of freedom left free for this tier
     */
    record Tier(double zone, Set<Freedom> free) {
        public Tier {
            if (!Double.isFinite(zone) || zone <= 0) throw InputProblem.ofField("zone", "must be above zero, got " + DecimalText.exact(zone));
            free = Set.copyOf(free);
        }
    }

    private static String freedomText(Set<Freedom> free) {
        if (free.isEmpty()) return " located";
        if (free.size() == 3) return " floating";
        StringBuilder sb = new StringBuilder(" (");
        for (Freedom f : Freedom.values()) if (free.contains(f)) sb.append(sb.length() > 2 ? ", " : "").append(f.key());
        return sb.append(" free)").toString();
    }

    private static String num(double v) {
        return DecimalText.exact(v);
    }
}
