package org.arcwright.templates;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

class CalloutTextTest {
    private final CalloutText asme = new CalloutText(DrawingStyle.ASME, Units.MM);
    private final CalloutText iso = new CalloutText(DrawingStyle.ISO, Units.MM);

    private static List<DatumReference> datums(String... d) {
        return Arrays.stream(d).map(DatumReference::parse).toList();
    }

    @Test
    void unicodeFormUsesTheGdtCodePoints() {
        // Unicode 15 charts: U+2313 SEGMENT, U+24C2 CIRCLED M, U+24C1 CIRCLED L, U+24CA CIRCLED U
        Callout p = new Callout.Profile(0.1, 0.07, datums("A", "B(M)", "C(L)"), false, null);
        assertThat(asme.line(p, true)).isEqualTo("|\u2313|0.1 \u24CA 0.07|A|B\u24C2|C\u24C1|");
        assertThat(asme.line(p, false)).isEqualTo("|PROFILE|0.1 (U) 0.07|A|B(M)|C(L)|");
    }

    @Test
    void isoWritesTheUnequalZoneAsAnOffsetZone() {
        // ISO 1101:2017 specified offset zone UZ: offset of the zone centre, + outward (from memory)
        Callout p = new Callout.Profile(0.1, 0.07, datums("A"), false, null);
        assertThat(iso.line(p, true)).isEqualTo("|\u2313|0.1 UZ+0.02|A|");
        Callout in = new Callout.Profile(0.1, 0.01, datums("A"), false, null);
        assertThat(iso.zoneCell((Callout.Profile) in, false)).isEqualTo("0.1 UZ-0.04");
    }

    @Test
    void compositeFramesShareOneSymbolOverTwoLines() {
        Callout c = new Callout.CompositeProfile(List.of(new ProfileTier(0.5, datums("A", "B")),
                new ProfileTier(0.1, datums("A"))), Extent.ALL_AROUND);
        assertThat(asme.line(c, true)).isEqualTo("|\u2313|0.5|A|B| ALL AROUND\n| |0.1|A|");
    }

    @Test
    void isoWritesTheTiersAsStackedFramesEachWithItsSymbol() {
        // ISO 1101 writes combined profile tiers as frames stacked on one leader (common practice)
        Callout c = new Callout.CompositeProfile(List.of(new ProfileTier(0.5, datums("A", "B")),
                new ProfileTier(0.1, List.of())), null);
        assertThat(iso.line(c, true)).isEqualTo("|\u2313|0.5|A|B|\n|\u2313|0.1|");
    }

    @Test
    void betweenAndDynamicAreMarked() {
        Callout p = new Callout.Profile(0.2, null, List.of(), true, Extent.between("J", "K"));
        assertThat(asme.line(p, true)).isEqualTo("|\u2313|0.2 \u25B3| J \u2194 K");
        assertThat(asme.line(p, false)).isEqualTo("|PROFILE|0.2 (DYN)| J <-> K");
        assertThat(asme.words(p)).contains("dynamic", "no datums", "between J and K");
    }

    @Test
    void radiusCalloutsFollowTheDrawingStyle() {
        assertThat(asme.line(new Callout.ControlledRadius(1.8, 2.2, null), true)).isEqualTo("CR1.8-2.2");
        assertThat(iso.line(new Callout.ControlledRadius(1.8, 2.2, null), true)).isEqualTo("R1.8-2.2");
        assertThat(new CalloutText(DrawingStyle.ASME, Units.INCH).line(new Callout.Radius(0.05, 0.07, 0.06), false))
                .isEqualTo("R.060 ±.010");
    }
}
