package org.arcwright.callout;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;

class CalloutJsonTest {
    private final JsonFiles json = new JsonFiles();

    @Test
    void everyKindRoundTripsThroughJson() {
        List<Callout> all = List.of(
                new Callout.General("iso2768-1-radius-chamfer", "m", null),
                new Callout.Radius(0.5, 0.6, 0.55),
                new Callout.ControlledRadius(1.5, 2.0, null),
                new Callout.Profile(0.1, 0.03, List.of(DatumReference.parse("A"), DatumReference.parse("B(M)")), true,
                        Extent.between("J", "K")),
                new Callout.CompositeProfile(List.of(
                        new ProfileTier(0.4, List.of(DatumReference.parse("A"), DatumReference.parse("B"))),
                        new ProfileTier(0.1, List.of(DatumReference.parse("A")))), Extent.ALL_AROUND));
        for (Callout c : all) {
            String text = json.write(c);
            assertThat(json.parse(text, "test", Callout.class)).as(text).isEqualTo(c);
        }
    }

    @Test
    void readsTheAdvisorsCompactProfileForm() {
        Callout c = json.parse("{\"type\": \"profile\", \"zone\": 0.1, \"datums\": [\"A\", \"B\"]}", "test", Callout.class);
        assertThat(c).isInstanceOf(Callout.Profile.class);
        assertThat(c.allDatums()).extracting(DatumReference::label).containsExactly("A", "B");
    }

    @Test
    void isoOffsetZoneConvertsToAsmeOutward() {
        // ISO 1101:2017 UZ (offset zone) vs ASME Y14.5-2018 unequally disposed profile, from memory:
        // a 0.1 zone with 0.03 outward has its centre 0.02 inside the material: UZ-0.02.
        Callout.Profile p = new Callout.Profile(0.1, 0.03, List.of(), false, null);
        assertThat(p.isoOffset()).isCloseTo(-0.02, Offset.offset(1e-12));
        assertThat(Callout.Profile.outwardFromIsoOffset(0.1, -0.02)).isCloseTo(0.03, Offset.offset(1e-12));
    }

    @Test
    void profileWithoutZoneIsAnError() {
        assertThatThrownBy(() -> json.parse("{\"type\": \"profile\", \"datums\": [\"A\"]}", "frame.json", Callout.class))
                .isInstanceOf(InputProblem.class).hasMessageContaining("frame.json").hasMessageContaining("zone");
    }

    @Test
    void compositeLowerTierMustRepeatUpperDatumsInOrder() {
        assertThatThrownBy(() -> new Callout.CompositeProfile(List.of(
                new ProfileTier(0.4, List.of(DatumReference.parse("A"), DatumReference.parse("B"))),
                new ProfileTier(0.1, List.of(DatumReference.parse("B")))), null))
                .hasMessageContaining("must repeat the first datums");
    }
}
