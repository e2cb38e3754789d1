package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.arcwright.mechanics.EdgeState.EdgeType;
import org.arcwright.mechanics.EdgeState.Sense;

/** Properties of ISO 13715 edge states: what one writes reads back. */
class EdgeStateProperties {
    /** The text an edge state writes reads back as the same state. */
    @Property(tries = 200, seed = "20261201")
    void isoTextReadsBackAsTheSameState(@ForAll EdgeType type, @ForAll Sense sense,
                                        @ForAll @IntRange(min = 1, max = 2000) int most,
                                        @ForAll @IntRange(min = 0, max = 1999) int least,
                                        @ForAll boolean twoSizes) {
        EdgeState e;
        if (twoSizes && sense != Sense.EITHER && least < most) {
            e = new EdgeState(type, sense, BigDecimal.valueOf(most, 3), BigDecimal.valueOf(least, 3));
        } else {
            e = new EdgeState(type, sense, BigDecimal.valueOf(most, 3), null);
        }
        EdgeState back = EdgeState.parse(type, e.isoText());
        assertThat(back.isoText()).isEqualTo(e.isoText());
        assertThat(back.sense()).isEqualTo(e.sense());
        assertThat(back.limit()).isEqualByComparingTo(e.limit());
    }
}
