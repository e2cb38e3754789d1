package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Zone and limit values as each drawing style writes them. Conventions from ASME Y14.5-2018
 * decimal rules for mm and inch (from memory) and ISO 129-1:2018 (from memory).
 */
class DrawingStyleValueTest {

    @Test
    void asmeMillimetreValuesKeepTheLeadingZeroAndDropTrailingZeros() {
        assertThat(DrawingStyle.ASME.formatValue(0.1, Units.MM, 4)).isEqualTo("0.1");
        assertThat(DrawingStyle.ASME.formatValue(0.050, Units.MM, 4)).isEqualTo("0.05");
        assertThat(DrawingStyle.ASME.formatValue(2.0, Units.MM, 4)).isEqualTo("2");
        assertThat(DrawingStyle.ASME.formatValue(0.16569, Units.MM, 4)).isEqualTo("0.1657");
    }

    @Test
    void asmeInchValuesDropTheLeadingZeroAndShowAtLeastThreePlaces() {
        assertThat(DrawingStyle.ASME.formatValue(0.004, Units.INCH, 4)).isEqualTo(".004");
        assertThat(DrawingStyle.ASME.formatValue(0.0005, Units.INCH, 4)).isEqualTo(".0005");
        assertThat(DrawingStyle.ASME.formatValue(0.01, Units.INCH, 4)).isEqualTo(".010");
        assertThat(DrawingStyle.ASME.formatValue(-0.002, Units.INCH, 4)).isEqualTo("-.002");
    }

    @Test
    void isoValuesKeepTheLeadingZero() {
        assertThat(DrawingStyle.ISO.formatValue(0.004, Units.INCH, 4)).isEqualTo("0.004");
        assertThat(DrawingStyle.ISO.formatValue(0.02, Units.MM, 4)).isEqualTo("0.02");
        assertThat(DrawingStyle.ISO.formatValue(0, Units.MM, 4)).isEqualTo("0");
    }

    @Test
    void figuresKeepExactlyTheirPlaces() {
        assertThat(DrawingStyle.formatFigure(1.6, 2)).isEqualTo("1.60");
        assertThat(DrawingStyle.formatFigure(1.855, 2)).isEqualTo("1.86");
    }

    @Test
    void limitsWithANominalAreWrittenAsTolerancesAndWithoutAsLimits() {
        assertThat(DrawingStyle.ASME.formatLimits(RadiusKind.CR, Units.MM, 1.8, 2.2, 2.0)).isEqualTo("CR2 ±0.2");
        assertThat(DrawingStyle.ASME.formatLimits(RadiusKind.R, Units.MM, 0.5, 0.8, 0.6)).isEqualTo("R0.6 +0.2/-0.1");
        assertThat(DrawingStyle.ASME.formatLimits(RadiusKind.R, Units.MM, 1.8, 2.2, null)).isEqualTo("R1.8-2.2");
        assertThat(DrawingStyle.ASME.formatLimits(RadiusKind.CR, Units.INCH, 0.06, 0.08, null)).isEqualTo("CR.060-.080");
        // ISO has no controlled radius: written as R (ISO 129-1, from memory)
        assertThat(DrawingStyle.ISO.formatLimits(RadiusKind.CR, Units.MM, 1.8, 2.2, null)).isEqualTo("R1.8-2.2");
    }

    @Test
    void limitPairsShareTheirNumberOfPlaces() {
        assertThat(DrawingStyle.ASME.formatLimitPair(3.48, 3.5, Units.MM, 4)).containsExactly("3.48", "3.50");
        assertThat(DrawingStyle.ASME.formatLimitPair(0.6, 1.0, Units.MM, 4)).containsExactly("0.6", "1.0");
        assertThat(DrawingStyle.ASME.formatLimitPair(2, 3, Units.MM, 4)).containsExactly("2", "3");
        assertThat(DrawingStyle.ASME.formatLimitPair(0.06, 0.0625, Units.INCH, 4)).containsExactly(".0600", ".0625");
    }
}
