package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.io.InputProblem;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** K<sub>t</sub> of shoulder fillets against published worked values. */
class StressConcentrationTest {
    private final StressConcentration sc = new StressConcentration(PetersonFits.published());

    /**
     * Roark's Formulas for Stress and Strain, Table 17.1 (stepped round shaft), worked case
     * d = 6.35, D = 10, r = 1.5: Roark's own fit gives bending 1.398 and tension 1.515; Peterson's must
     * agree within 2%.
     */
    @ParameterizedTest(name = "{0}: Roark {1}")
    @CsvSource({"BENDING, 1.398", "TENSION, 1.515"})
    void agreesWithRoarksWorkedStepWithinTwoPercent(LoadCase load, double roark) {
        KtEstimate e = sc.kt(ShoulderShape.STEPPED_SHAFT, load, 10, 6.35, 1.5);
        assertThat(e.kt()).isCloseTo(roark, within(0.02 * roark));
        assertThat(e.withinFit()).isTrue();
        assertThat(e.message()).isEmpty();
    }

    /**
     * Shigley's Mechanical Engineering Design, 10th ed., Table 7-1, first-iteration estimates for
     * shoulder fillets (D/d = 1.5 assumed there, from memory): sharp r/d = 0.02 bending 2.7; well
     * rounded r/d = 0.1 bending 1.7, torsion 1.5. Rough figures: within 12%.
     */
    @ParameterizedTest(name = "{0} r/d={1}: Shigley {2}")
    @CsvSource({"BENDING, 0.02, 2.7", "BENDING, 0.1, 1.7", "TORSION, 0.1, 1.5"})
    void agreesWithShigleysFirstIterationEstimates(LoadCase load, double rOverD, double shigley) {
        KtEstimate e = sc.kt(ShoulderShape.STEPPED_SHAFT, load, 1.5, 1.0, rOverD);
        assertThat(e.kt()).isCloseTo(shigley, within(0.12 * shigley));
    }

    /** Shigley Table 7-1's sharp torsion estimate (2.2 at r/d = 0.02) is h/r = 12.5, beyond the torsion fit's 4. */
    @Test
    void sharpTorsionFilletIsFlaggedAsExtrapolated() {
        KtEstimate e = sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.TORSION, 1.5, 1.0, 0.02);
        assertThat(e.hOverR()).isCloseTo(12.5, within(1e-9));
        assertThat(e.withinFit()).isFalse();
        assertThat(e.message()).contains("extrapolated").contains("0.25..4");
    }

    /** A very sharp fillet's h/r is written as a number a reader can type back (no 2.00e+03): common practice. */
    @Test
    void aVerySharpFilletsRatioIsWrittenWithoutAnExponent() {
        KtEstimate e = sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 30, 10, 0.005);
        assertThat(e.hOverR()).isCloseTo(2000, within(1e-9));
        assertThat(e.message()).contains("h/r = 2000 lies outside").doesNotContain("e+");
    }

    /** Shigley 9th ed. Example 6-6: D = 38, d = 32, r = 3 mm in bending, K_t = 1.65 read from Fig. A-15-9. */
    @Test
    void agreesWithShigleysChartReadingForExampleSixSix() {
        KtEstimate e = sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 38, 32, 3);
        assertThat(e.kt()).isCloseTo(1.65, within(0.05));
    }

    @Test
    void rejectsALargerSizeNotAboveTheSmaller() {
        assertThatThrownBy(() -> sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 10, 10, 1))
                .isInstanceOf(InputProblem.class).hasMessageContaining("D: ").hasMessageContaining("must exceed");
    }

    @Test
    void rejectsAZeroOrNegativeRadius() {
        assertThatThrownBy(() -> sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 12, 10, 0))
                .isInstanceOf(InputProblem.class).hasMessageContaining("r: must be greater than zero");
        assertThatThrownBy(() -> sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 12, 10, Double.NaN))
                .isInstanceOf(InputProblem.class).hasMessageContaining("not a finite number");
    }

    @Test
    void rejectsAFilletLargerThanTheStep() {
        assertThatThrownBy(() -> sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 12, 10, 1.5))
                .isInstanceOf(InputProblem.class).hasMessageContaining("larger than the step h = (D - d)/2 = 1");
    }

    @Test
    void barInTorsionHasNoFitAndSaysWhichDo() {
        assertThatThrownBy(() -> sc.kt(ShoulderShape.STEPPED_BAR, LoadCase.TORSION, 12, 10, 0.5))
                .isInstanceOf(InputProblem.class).hasMessageContaining("load: no stress-concentration fit")
                .hasMessageContaining("tension, bending");
    }
}
