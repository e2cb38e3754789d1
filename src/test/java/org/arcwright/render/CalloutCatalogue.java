package org.arcwright.render;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * One callout of every kind and modifier, for golden files and image checks. Values are invented
 * for the tests (demo data), written the way ASME Y14.5-2018 and ISO 1101 examples write them.
 */
final class CalloutCatalogue {
    private CalloutCatalogue() {}

    record Entry(String name, Callout callout, DrawingStyle style, Units units) {}

    static List<DatumReference> d(String... labels) {
        return Arrays.stream(labels).map(DatumReference::parse).toList();
    }

    static Map<String, Entry> all() {
        Map<String, Entry> m = new LinkedHashMap<>();
        add(m, "radius-plus-minus", new Callout.Radius(1.8, 2.2, 2.0), DrawingStyle.ASME, Units.MM);
        add(m, "radius-limits", new Callout.Radius(0.6, 1.0, null), DrawingStyle.ASME, Units.MM);
        add(m, "controlled-radius", new Callout.ControlledRadius(1.8, 2.2, null), DrawingStyle.ASME, Units.MM);
        add(m, "controlled-radius-inch", new Callout.ControlledRadius(0.06, 0.08, 0.07), DrawingStyle.ASME, Units.INCH);
        add(m, "controlled-radius-iso", new Callout.ControlledRadius(1.8, 2.2, null), DrawingStyle.ISO, Units.MM);
        add(m, "profile-no-datums", new Callout.Profile(0.1, null, List.of(), false, null), DrawingStyle.ASME, Units.MM);
        add(m, "profile-datum-modifiers", new Callout.Profile(0.2, null, d("A", "B(M)", "C(L)"), false, null),
                DrawingStyle.ASME, Units.MM);
        add(m, "profile-unequal-asme", new Callout.Profile(0.1, 0.07, d("A", "B"), false, null), DrawingStyle.ASME, Units.MM);
        add(m, "profile-unequal-iso", new Callout.Profile(0.1, 0.07, d("A", "B"), false, null), DrawingStyle.ISO, Units.MM);
        add(m, "profile-unequal-inch", new Callout.Profile(0.004, 0.001, d("A"), false, null), DrawingStyle.ASME, Units.INCH);
        add(m, "profile-dynamic", new Callout.Profile(0.05, null, List.of(), true, null), DrawingStyle.ASME, Units.MM);
        add(m, "profile-all-around", new Callout.Profile(0.3, null, d("A"), false, Extent.ALL_AROUND), DrawingStyle.ASME, Units.MM);
        add(m, "profile-all-over", new Callout.Profile(0.4, null, List.of(), false, new Extent(Extent.Kind.ALL_OVER, null, null)),
                DrawingStyle.ASME, Units.MM);
        add(m, "profile-between", new Callout.Profile(0.06, 0.02, d("A", "B"), false, Extent.between("J", "K")),
                DrawingStyle.ASME, Units.MM);
        add(m, "profile-with-adjacent", new Callout.Profile(0.1, null, d("A"), false, Extent.WITH_ADJACENT),
                DrawingStyle.ASME, Units.MM);
        add(m, "composite-two-tiers", new Callout.CompositeProfile(List.of(new ProfileTier(0.5, d("A", "B", "C")),
                new ProfileTier(0.1, d("A"))), null), DrawingStyle.ASME, Units.MM);
        add(m, "composite-three-tiers-all-around", new Callout.CompositeProfile(List.of(
                new ProfileTier(0.8, d("A", "B(M)")), new ProfileTier(0.3, d("A")), new ProfileTier(0.1, List.of())),
                Extent.ALL_AROUND), DrawingStyle.ASME, Units.MM);
        add(m, "composite-iso-stacked", new Callout.CompositeProfile(List.of(new ProfileTier(0.5, d("A", "B")),
                new ProfileTier(0.1, List.of())), null), DrawingStyle.ISO, Units.MM);
        add(m, "general-edge-note", new Callout.General("iso2768-1-radius-chamfer", "m", "ISO 13715 -0.3"),
                DrawingStyle.ISO, Units.MM);
        return m;
    }

    private static void add(Map<String, Entry> m, String name, Callout c, DrawingStyle s, Units u) {
        m.put(name, new Entry(name, c, s, u));
    }
}
