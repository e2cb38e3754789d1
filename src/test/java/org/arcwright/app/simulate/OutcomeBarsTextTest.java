package org.arcwright.app.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import org.arcwright.simulate.Share;
import org.junit.jupiter.api.Test;

/** The shares the Simulation view writes beside its bars: one rule with the CLI, no window needed. */
class OutcomeBarsTextTest {

    @Test
    void aShareOnATieRoundsHalfToEven() {
        // 25 of 400 is 6.25 %: half to even, ISO 80000-1:2009 Annex B, rule A (from memory); the bounds are
        // Share's Wilson interval
        assertThat(OutcomeBars.pct(Share.of(25, 400))).startsWith("6.2 % [");
        assertThat(OutcomeBars.pct(Share.of(400, 400))).isEqualTo("100.0 % [99.0-100.0]");
    }
}
