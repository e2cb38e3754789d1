package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.inspect.InspectionCallout.CompositeProfile;
import org.arcwright.inspect.InspectionCallout.ProfileTolerance;
import org.arcwright.inspect.InspectionCallout.RadiusLimits;
import org.arcwright.zone.RadiusEnvelope;

/**
 * The JSON form of an {@link InspectionResult} (the {@code --format json} output), as an ordered
 * tree of maps and lists ready for Jackson. Numbers that do not exist (a NaN envelope, an infinite
 * local radius) are written as {@code null} with a note.
 */
public final class InspectionJson {
    private InspectionJson() {}

    /** The result as a JSON-ready tree. */
    public static Map<String, Object> tree(InspectionResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        InspectionRequest q = r.request();
        m.put("verdict", r.verdict().key());
        m.put("callout", q.callout().describe());
        m.put("units", q.units().symbol());
        m.put("points", q.points().size());
        m.put("resolution", q.resolution());
        if (q.uncertainty() > 0) m.put("uncertainty", q.uncertainty());
        if (r.radius() != null) {
            RadiusEnvelope e = r.radius();
            Map<String, Object> env = new LinkedHashMap<>();
            env.put("smallest", num(e.smallest()));
            env.put("largest", num(e.largest()));
            env.put("measures", "radius of the blends tangent to the fitted surfaces");
            m.put("envelope", env);
            RadiusLimits rl = (RadiusLimits) q.callout();
            m.put("limits", Map.of("min", rl.min(), "max", rl.max()));
            Map<String, Object> counts = new LinkedHashMap<>();
            counts.put("judged", e.judged());
            counts.put("onLegs", e.onLegs());
            counts.put("outsideSurfaces", e.outside());
            counts.put("beyondTangentPoints", e.beyond());
            m.put("radiusZone", counts);
        }
        if (r.controlled() != null) {
            ControlledRadiusOutcome c = r.controlled();
            Map<String, Object> local = new LinkedHashMap<>();
            local.put("min", num(c.localMin()));
            local.put("max", num(c.localMax()));
            local.put("uncertainty", num(c.uncertainty()));
            local.put("coverage", ControlledRadiusCheck.COVERAGE);
            local.put("window", c.windowLength());
            local.put("windows", c.windows());
            local.put("flatWindows", c.flats());
            m.put("local", local);
            List<Object> rev = new ArrayList<>();
            for (ControlledRadiusOutcome.Reversal v : c.reversals()) {
                Map<String, Object> x = new LinkedHashMap<>();
                x.put("fromStation", v.fromStation());
                x.put("toStation", v.toStation());
                x.put("at", List.of(v.x(), v.y()));
                rev.add(x);
            }
            m.put("reversals", rev);
            List<Object> open = new ArrayList<>();
            for (ControlledRadiusOutcome.LocalWindow w : c.indeterminate()) open.add(window(w));
            m.put("indeterminate", open);
        }
        if (r.profile() != null) {
            ProfileTolerance pt = (ProfileTolerance) q.callout();
            putProfile(m, r.profile());
            m.put("zone", pt.zone().width());
            m.put("outward", pt.zone().outward());
            m.put("isoOffset", pt.zone().isoOffset());
        }
        if (r.tiers() != null) {
            CompositeProfile cp = (CompositeProfile) q.callout();
            List<Object> tiers = new ArrayList<>();
            for (int i = 0; i < r.tiers().size(); i++) {
                Map<String, Object> t = new LinkedHashMap<>();
                ProfileOutcome o = r.tiers().get(i);
                t.put("verdict", Inspector.profileVerdict(o, q.uncertainty()).key());
                t.put("zone", cp.tiers().get(i).zone());
                t.put("free", freeList(o));
                putProfile(t, o);
                tiers.add(t);
            }
            m.put("tiers", tiers);
        }
        if (r.fits() != null) {
            Fits f = r.fits();
            Map<String, Object> fits = new LinkedHashMap<>();
            Map<String, Object> ls = new LinkedHashMap<>();
            ls.put("centre", List.of(f.leastSquares().circle().cx(), f.leastSquares().circle().cy()));
            ls.put("radius", f.leastSquares().circle().r());
            ls.put("rms", f.leastSquares().rms());
            fits.put("leastSquares", ls);
            Map<String, Object> mz = new LinkedHashMap<>();
            mz.put("centre", List.of(f.minimumZone().cx(), f.minimumZone().cy()));
            mz.put("inner", f.minimumZone().inner());
            mz.put("outer", f.minimumZone().outer());
            mz.put("width", f.minimumZone().width());
            fits.put("minimumZone", mz);
            fits.put("blendPoints", f.blendPoints());
            m.put("fits", fits);
            Map<String, Object> tg = new LinkedHashMap<>();
            tg.put("stepA", f.stepA());
            tg.put("stepB", f.stepB());
            tg.put("measures", "gap between each fitted surface and the blend's least-squares arc at its tangent point");
            m.put("tangency", tg);
        }
        if (r.surfaces() != null) {
            AdjacentSurfaces s = r.surfaces();
            Map<String, Object> sf = new LinkedHashMap<>();
            sf.put("a", surface(s.a()));
            sf.put("b", surface(s.b()));
            sf.put("angle", s.includedAngleDeg());
            sf.put("vertex", List.of(s.corner().vertex().x(), s.corner().vertex().y()));
            if (r.request().nominal() instanceof Nominal.CornerBlend cb) {
                // beside the nominal: how far the part's own corner sits from the drawn one
                Map<String, Object> nom = new LinkedHashMap<>();
                nom.put("vertex", List.of(cb.corner().vertex().x(), cb.corner().vertex().y()));
                nom.put("angle", cb.corner().includedAngleDeg());
                sf.put("nominal", nom);
            }
            m.put("surfaces", sf);
        }
        if (r.worst() != null) {
            Map<String, Object> w = new LinkedHashMap<>();
            w.put("index", r.worst().index());
            w.put("at", List.of(r.worst().x(), r.worst().y()));
            w.put("excess", r.worst().excess());
            w.put("measure", r.worst().measure());
            w.put("unit", r.worst().unit());
            w.put("text", r.worst().text());
            m.put("worst", w);
        }
        m.put("caution", InspectionResult.CAUTION);
        if (!r.comparisons().isEmpty()) {
            List<Object> rows = new ArrayList<>();
            for (Comparison c : r.comparisons()) {
                Map<String, Object> x = new LinkedHashMap<>();
                x.put("control", c.name());
                x.put("callout", c.callout());
                x.put("derived", c.derived());
                x.put("verdict", c.verdict().key());
                x.put("figure", c.figure());
                rows.add(x);
            }
            m.put("compare", rows);
        }
        m.put("notes", r.notes());
        return m;
    }

    private static Map<String, Object> window(ControlledRadiusOutcome.LocalWindow w) {
        Map<String, Object> x = new LinkedHashMap<>();
        x.put("window", w.number());
        x.put("fromStation", w.fromStation());
        x.put("toStation", w.toStation());
        x.put("radius", num(w.radius()));
        x.put("uncertainty", num(w.uncertainty()));
        return x;
    }

    private static Map<String, Object> surface(AdjacentSurfaces.Surface s) {
        Map<String, Object> x = new LinkedHashMap<>();
        x.put("point", List.of(s.point().x(), s.point().y()));
        x.put("direction", List.of(s.direction().x(), s.direction().y()));
        x.put("fitted", s.fitted());
        x.put("points", s.points());
        x.put("rms", s.rms());
        return x;
    }

    private static void putProfile(Map<String, Object> m, ProfileOutcome o) {
        m.put("requiredZone", num(o.requiredZone()));
        Map<String, Object> reg = new LinkedHashMap<>();
        reg.put("x", o.registration().x());
        reg.put("y", o.registration().y());
        reg.put("rotation", o.registration().rotationDeg());
        reg.put("offset", o.registration().offset());
        reg.put("pivot", List.of(o.registration().pivotX(), o.registration().pivotY()));
        m.put("registration", reg);
        m.put("maxOutward", o.maxOutward());
        m.put("maxInward", o.maxInward());
    }

    private static List<String> freeList(ProfileOutcome o) {
        List<String> l = new ArrayList<>();
        for (Freedom f : Freedom.values()) if (o.free().contains(f)) l.add(f.key());
        return l;
    }

    private static Double num(double v) { return Double.isFinite(v) ? v : null; }
}
