package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Text forms of radius callouts in the ASME Y14.5-2018 and ISO 129-1:2018 styles. Clause numbers
 * are from memory: ASME Y14.5-2018 1.6.1/2.3.1 (millimetre values and tolerances) and 1.6.2/2.3.2
 * (inch values and tolerances); ISO 129-1:2018 on tolerances and limits.
 */
class DrawingStyleTest {

    @ParameterizedTest(name = "{0} -> ASME {2}, ISO {3}")
    @CsvSource(delimiter = '|', value = {
            // input | units | ASME | ISO
            // mm: leading zero, no trailing zeros on a whole nominal (ASME 1.6.1, from memory)
            "R0.55 ±0.05      | mm | R0.55 ±0.05      | R0.55 ±0.05",
            "R3.0 +0.2/-0.1   | mm | R3 +0.2/-0.1     | R3 +0.2/-0.1",
            // both deviations with the same places; a zero deviation as a single 0 (ASME 2.3.1, from memory)
            "R3 +0.25/-0.1    | mm | R3 +0.25/-0.10   | R3 +0.25/-0.10",
            "R3 +0.2/0        | mm | R3 +0.2/0        | R3 +0.2/0",
            // limits with the same number of places (ASME 2.3.1, from memory)
            "CR 1.5-2         | mm | CR1.5-2.0        | R1.5-2.0",
            // single limits: ASME upper case, ISO 129-1 lower case (from memory)
            "R0.5 MAX         | mm | R0.5 MAX         | R0.5 max",
            "R 2.5            | mm | R2.5             | R2.5",
            // inch: no leading zero, tolerance and value with the same places (ASME 1.6.2, 2.3.2, from memory)
            "R .25 ±.005      | in | R.250 ±.005      | R0.25 ±0.005",
            "R .500 +.005/0   | in | R.500 +.005/-.000 | R0.500 +0.005/0",
            "R .060 MAX       | in | R.060 MAX        | R0.060 max",
            "CR .25 MIN       | in | CR.25 MIN        | R0.25 min",
            "R .75-.8         | in | R.75-.80         | R0.75-0.80",
    })
    void formatsEachStyle(String input, String units, String asme, String iso) {
        RadiusCallout c = CalloutParser.parse(input, Units.parse(units));
        assertThat(DrawingStyle.ASME.format(c)).isEqualTo(asme);
        assertThat(DrawingStyle.ISO.format(c)).isEqualTo(iso);
    }

    @Test
    void isoStyleExplainsThatControlledRadiusHasNoIsoEquivalent() {
        RadiusCallout c = CalloutParser.parse("CR 1.5-2.0", Units.MM);
        assertThat(DrawingStyle.ISO.remarks(c)).anyMatch(r -> r.contains("no ISO equivalent"));
        assertThat(DrawingStyle.ASME.remarks(c)).isEmpty();
    }
}
