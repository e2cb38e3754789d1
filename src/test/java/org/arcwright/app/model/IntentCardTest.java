package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.callout.Callout;
import org.arcwright.rules.Recommendation;
import org.junit.jupiter.api.Test;

/**
 * The engineer's own tolerance as a card: its zone figures say what they are about. For same-sign
 * deviations the drawn nominal lies outside the limits, so a card without it leaves the reader to
 * guess. Geometry: the equal-bilateral profile zone about R3 holding R3.1-R3.3 at 90° is
 * 2 × 0.3 × (1/sin 45° − 1) = 0.2485 (plane geometry of arcs tangent to both legs; common practice).
 */
class IntentCardTest {
    @Test
    void aSameSignToleranceStatesTheDrawnNominalItsZoneIsAbout() {
        Recommendation card = IntentCard.of(Fixtures.fillet(3, "R3 +0.3/+0.1"), 90).orElseThrow();
        assertThat(card.numbers().asMap()).containsEntry("nominal", 3.0).containsEntry("min", 3.1);
        assertThat((Double) card.numbers().asMap().get("max")).isEqualTo(3.3, within(1e-12));
        assertThat((Double) card.numbers().asMap().get("equivalentProfileZone")).isEqualTo(2 * 0.3 * (Math.sqrt(2) - 1), within(1e-9));
    }

    /**
     * Before the fix the card could not be made at all (a chosen callout refuses a nominal outside its
     * limits), so the Decide panel's advice failed for the tolerance; the card now keeps the limits and
     * says how the radius was drawn.
     */
    @Test
    void aSameSignToleranceGivesACardKeptAsItsLimitsThatSaysHowItWasDrawn() {
        Recommendation card = IntentCard.of(Fixtures.fillet(3, "R3 +0.3/+0.1"), 90).orElseThrow();
        assertThat(card.text()).isEqualTo("R3 +0.3/+0.1");
        assertThat(card.callout()).isInstanceOf(Callout.Radius.class);
        Callout.Radius r = (Callout.Radius) card.callout();
        assertThat(r.nominal()).isNull();
        assertThat(r.min()).isEqualTo(3.1, within(1e-12));
        assertThat(r.max()).isEqualTo(3.3, within(1e-12));
        assertThat(card.because()).anySatisfy(b -> assertThat(b).contains("Drawn as R3 +0.3/+0.1")
                .contains("kept as its limits 3.1 to 3.3 mm"));
        assertThat(AdviceSource.intentOnly(90).advise(Fixtures.fillet(3, "R3 -0.1/-0.3")).recommendations()).hasSize(1);
    }

    @Test
    void aMaxOnlyRadiusHasNoNominalToStateAndGetsNoCard() {
        assertThat(IntentCard.of(Fixtures.fillet(3, "R3 MAX"), 90)).isEmpty();
    }
}
