package org.arcwright.callout;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

/** The advisor's one-line profile text writes its marks as the frames do. */
class CalloutFormatterTest {

    @Test
    void theAdvisorsLineWritesADatumModifierWithItsSymbolAsTheFrameDoes() {
        // ASME Y14.5-2018 and ISO 1101: the MMB/MMR modifier is the circled M in the datum cell (common practice).
        // Before: the line read |⌓|0.1|A|B(M)| beside the circled U of the same line.
        CalloutFormatter f = new CalloutFormatter(DrawingStyle.ASME, Units.MM);
        Callout.Profile p = new Callout.Profile(0.1, 0.03, List.of(DatumReference.parse("A"), DatumReference.parse("B(M)")),
                false, Extent.THIS_RADIUS);
        String line = f.profile(p);
        assertThat(line).contains("|B\u24C2|").doesNotContain("B(M)");
        assertThat(line).startsWith("|\u2313|0.1 \u24CA 0.03|A|");
        assertThat(f.line(p, true)).contains("|B\u24C2|");
    }
}
