package org.arcwright.simulate;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.tolerance.RadiusKind;

/**
 * The JSON form of a {@link SimulationResult}:
 * {@code {parts, good, callouts: [{callout, text, accepted, escapes, falseRejects, acceptedInterval,
 * escapesInterval, falseRejectsInterval}]}}, every share a fraction of all parts and every interval
 * {@code [low, high]} at 95 % (Wilson), plus the seed, units, needs and caution.
 */
public final class SimulationJson {
    private SimulationJson() {}

    /** The result as maps and lists, ready for Jackson. */
    public static Map<String, Object> tree(SimulationResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        Simulation s = r.simulation();
        m.put("units", s.model().units().symbol());
        m.put("parts", s.parts());
        m.put("seed", s.seed());
        m.put("points", s.model().points());
        m.put("good", r.good());
        m.put("goodShare", r.goodShare().share());
        m.put("goodInterval", interval(r.goodShare()));
        m.put("needs", s.needs().describe(s.model().units().symbol()));
        List<Object> list = new ArrayList<>();
        for (CalloutResult c : r.callouts()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("callout", callout(c.callout()));
            x.put("text", c.text());
            x.put("accepted", c.acceptedShare().share());
            x.put("escapes", c.escapeShare().share());
            x.put("falseRejects", c.falseRejectShare().share());
            x.put("acceptedInterval", interval(c.acceptedShare()));
            x.put("escapesInterval", interval(c.escapeShare()));
            x.put("falseRejectsInterval", interval(c.falseRejectShare()));
            x.put("indeterminate", c.indeterminateShare().share());
            x.put("counts", Map.of("accepted", c.accepted(), "escapes", c.escapes(), "falseRejects", c.falseRejects(),
                    "indeterminate", c.indeterminate()));
            list.add(x);
        }
        m.put("callouts", list);
        m.put("interval", "95 % Wilson score interval of each share (Wilson 1927; Brown, Cai and DasGupta 2001)");
        m.put("caution", SimulationResult.CAUTION);
        return m;
    }

    private static List<Double> interval(Share s) { return List.of(s.low(), s.high()); }

    /** A callout in the inspection file's shape. */
    static Map<String, Object> callout(InspectionCallout c) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (c instanceof InspectionCallout.RadiusLimits rl) {
            m.put("type", rl.kind() == RadiusKind.CR ? "controlled-radius" : "radius");
            m.put("min", rl.min());
            m.put("max", rl.max());
        } else if (c instanceof InspectionCallout.ProfileTolerance pt) {
            m.put("type", "profile");
            m.put("zone", pt.zone().width());
            if (!pt.zone().equalBilateral()) m.put("outward", pt.zone().outward());
            m.put("free", keys(pt.free()));
            if (pt.dynamic()) m.put("dynamic", true);
        } else {
            InspectionCallout.CompositeProfile cp = (InspectionCallout.CompositeProfile) c;
            m.put("type", "composite-profile");
            List<Object> tiers = new ArrayList<>();
            for (InspectionCallout.Tier t : cp.tiers()) tiers.add(Map.of("zone", t.zone(), "free", keys(t.free())));
            m.put("tiers", tiers);
        }
        return m;
    }

    private static List<String> keys(Set<Freedom> free) {
        List<String> out = new ArrayList<>();
        for (Freedom f : Freedom.values()) if (free.contains(f)) out.add(f.key());
        return out;
    }
}
