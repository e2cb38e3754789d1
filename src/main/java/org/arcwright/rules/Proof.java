package org.arcwright.rules;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;

/**
 * Whether one candidate meets each need, and the words for every need it does not meet. The radius range is the
 * one the control admits at the corner (the crescent geometry at the case's angle, {@code CrescentZone}); form and
 * location are judged by what the control actually controls:
 * <ul>
 *   <li>a radius (R) and a title-block tolerance bound size only: flats and reversals inside the crescent pass
 *       (ASME Y14.5-2018 radius definition, from memory);</li>
 *   <li>a controlled radius forbids flats and reversals (ASME Y14.5-2018 CR definition, from memory);</li>
 *   <li>any profile of a surface bounds form within its zone (ASME Y14.5-2018, ISO 1101:2017);</li>
 *   <li>only a profile referenced to datums (or a composite's upper tier) locates the blend.</li>
 * </ul>
 *
 * @param meets per need id, true when every need of that id is met
 * @param meetsAll true when every need is met
 * @param unmet one sentence per need not met, with its numbers
 */
public record Proof(Map<String, Boolean> meets, boolean meetsAll, List<String> unmet) {

    private static final double SLACK = 1e-9;

    public Proof {
        meets = Collections.unmodifiableMap(meets);
        unmet = Collections.unmodifiableList(unmet);
    }

    /**
     * Proves a control admitting radii {@code lo..hi} against {@code needs}.
     *
     * @param refinement a radius refinement drawn with the profile, or null
     */
    public static Proof of(Needs needs, Callout control, Callout refinement, double lo, double hi, int places) {
        Map<String, Boolean> meets = new LinkedHashMap<>(8);
        List<String> unmet = new ArrayList<>(2);
        boolean all = true;
        for (Need n : needs.list()) {
            boolean ok = switch (n.id()) {
                case RADIUS_FLOOR -> n.reachable() && lo >= n.min() - SLACK;
                case RADIUS_CEILING -> hi <= n.max() + SLACK;
                case FORM -> controlsForm(control);
                default -> locates(control);
            };
            if (meets.put(n.key(), ok) == Boolean.FALSE) meets.put(n.key(), Boolean.FALSE);
            if (!ok) {
                all = false;
                String u = " " + needs.designCase().units().symbol();
                unmet.add("Does not meet " + n.key() + ": " + why(n, control, lo, hi, places, u) + ".");
            }
        }
        return new Proof(meets, all, unmet);
    }

    /** Why {@code control} does not meet {@code n}, with the numbers: built only for the needs it misses. */
    private static String why(Need n, Callout control, double lo, double hi, int places, String u) {
        return switch (n.id()) {
            case RADIUS_FLOOR -> n.reachable() ? "admits " + Advisor.fmt(lo, places + 1) + u + ", under the floor "
                    + Advisor.fmt(n.min(), places + 1) + u + " (" + n.why() + ")" : n.why();
            case RADIUS_CEILING -> "admits " + Advisor.fmt(hi, places + 1) + u + ", over the ceiling "
                    + Advisor.fmt(n.max(), places + 1) + u + " (" + n.why() + ")";
            case FORM -> "a " + Callouts.name(control) + " bounds size only: flats and reversals inside its crescent pass";
            default -> "a " + Callouts.name(control) + (control instanceof Callout.Profile
                    ? " without datums floats: it does not locate the blend" : " does not locate the blend");
        };
    }

    /** True when the control bounds the form of the blend, not only its size. */
    static boolean controlsForm(Callout c) {
        return c instanceof Callout.ControlledRadius || c instanceof Callout.Profile || c instanceof Callout.CompositeProfile;
    }

    /** True when the control locates the blend to datums. */
    static boolean locates(Callout c) {
        if (c instanceof Callout.Profile p) return !p.datums().isEmpty() && !p.dynamic();
        return c instanceof Callout.CompositeProfile cp && !cp.tiers().get(0).datums().isEmpty();
    }

    /** Names of controls in the trade's words. */
    static final class Callouts {
        private Callouts() {}

        static String name(Callout c) {
            if (c instanceof Callout.Radius) return "radius";
            if (c instanceof Callout.ControlledRadius) return "controlled radius";
            if (c instanceof Callout.Profile) return "profile of a surface";
            if (c instanceof Callout.CompositeProfile) return "composite profile";
            return "title-block general tolerance";
        }
    }
}
