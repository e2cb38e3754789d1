package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

/** Stress concentration across a tolerance, and the smallest radius for a target. */
class FilletStressAnalysisTest {
    private final StressConcentration sc = new StressConcentration(PetersonFits.published());
    private final FilletStressAnalysis analysis = new FilletStressAnalysis(sc, new NotchSensitivity());

    private FilletStressCase shaft(double rMin, double rMax, UltimateStrength s) {
        return FilletStressCase.ofLimits(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, Units.MM, 38, 32, rMin, rMax, s);
    }

    @Test
    void smallestRadiusGivesTheHighestFactorAndCostsAgainstNominal() {
        FilletStressReport r = analysis.report(shaft(0.8, 1.2, UltimateStrength.ofMpa(690)));
        assertThat(r.atMin().kt().kt()).isGreaterThan(r.atNominal().kt().kt());
        assertThat(r.atNominal().kt().kt()).isGreaterThan(r.atMax().kt().kt());
        assertThat(r.ktCostOfMinimum()).isPositive();
        assertThat(r.kfCostOfMinimum()).isPositive();
        assertThat(r.atNominal().r()).isEqualTo(1.0);
        assertThat(r.costPercent()).isPositive();
        assertThat(r.cautions()).isEqualTo(Cautions.STRESS);
        assertThat(r.withinFit()).isTrue();
    }

    @Test
    void withoutAStrengthThereIsNoKf() {
        FilletStressReport r = analysis.report(shaft(1, 1, null));
        assertThat(r.atMin().kf()).isNull();
        assertThat(r.kfCostOfMinimum()).isNull();
        assertThat(r.ktCostOfMinimum()).isZero();
    }

    /** Shigley 9th ed. Example 6-6 through the whole chain: K_f within 0.05 of the book's 1.55. */
    @Test
    void reportReproducesShigleysExampleSixSix() {
        StressPoint p = analysis.report(shaft(3, 3, UltimateStrength.ofMpa(690))).atNominal();
        assertThat(p.q()).isCloseTo(0.847, within(0.002));
        assertThat(p.kf()).isCloseTo(1.55, within(0.05));
    }

    /** Cross-checked against Commons Math's Brent solver on K_t(r) - target (a reference implementation). */
    @Test
    void minimumRadiusForAKtTargetIsTheRootBrentFinds() {
        FilletStressCase c = shaft(1, 1, null);
        MinimumRadius m = analysis.minimumRadius(c, StressTarget.kt(1.8));
        assertThat(m.found()).isTrue();
        assertThat(m.limitedByFit()).isFalse();
        double brent = new BrentSolver(1e-12).solve(200,
                r -> sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 38, 32, r).kt() - 1.8, 0.3, 3.0);
        assertThat(m.radius()).isCloseTo(brent, within(1e-8));
        assertThat(m.valueAtRadius()).isCloseTo(1.8, within(1e-6));
    }

    @Test
    void minimumRadiusForAKfTargetKeepsKfAtOrUnderIt() {
        FilletStressCase c = shaft(1, 1, UltimateStrength.ofMpa(690));
        MinimumRadius m = analysis.minimumRadius(c, StressTarget.kf(1.6));
        assertThat(m.found()).isTrue();
        assertThat(m.valueAtRadius()).isLessThanOrEqualTo(1.6 + 1e-9);
        for (double r = m.radius(); r <= 3; r += 0.01) {
            assertThat(analysis.point(c, r).kf()).isLessThanOrEqualTo(1.6 + 1e-9);
        }
        assertThat(analysis.point(c, m.radius() * 0.98).kf()).isGreaterThan(1.6);
    }

    @Test
    void reportsWhenNoRadiusWithinTheStepMeetsTheTarget() {
        MinimumRadius m = analysis.minimumRadius(shaft(1, 1, null), StressTarget.kt(1.2));
        assertThat(m.found()).isFalse();
        assertThat(m.radius()).isNaN();
        assertThat(m.message()).contains("no radius up to the step height h = 3");
    }

    @Test
    void aLooseTargetStopsAtTheSharpEndOfTheFit() {
        MinimumRadius m = analysis.minimumRadius(shaft(1, 1, null), StressTarget.kt(5));
        assertThat(m.found()).isTrue();
        assertThat(m.limitedByFit()).isTrue();
        assertThat(m.radius()).isCloseTo(3.0 / 20, within(1e-12));
    }

    @Test
    void kfTargetWithoutAStrengthIsBadInput() {
        assertThatThrownBy(() -> analysis.minimumRadius(shaft(1, 1, null), StressTarget.kf(1.5)))
                .isInstanceOf(InputProblem.class).hasMessageContaining("targetKf");
    }

    @Test
    void rejectsLimitsThatCrossOrExceedTheStep() {
        assertThatThrownBy(() -> shaft(1.2, 0.8, null)).isInstanceOf(InputProblem.class).hasMessageContaining("rMin");
        assertThatThrownBy(() -> shaft(1, 3.5, null)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("rMax: fillet radius 3.5 is larger than the step");
        assertThatThrownBy(() -> StressTarget.kt(0.9)).isInstanceOf(InputProblem.class).hasMessageContaining("greater than 1");
    }
}
