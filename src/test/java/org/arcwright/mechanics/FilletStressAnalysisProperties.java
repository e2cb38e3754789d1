package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.arcwright.tolerance.Units;

/** Properties of the minimum radius for a K<sub>t</sub> or K<sub>f</sub> target. */
class FilletStressAnalysisProperties {
    private final StressConcentration sc = new StressConcentration(PetersonFits.published());

    private final FilletStressAnalysis analysis = new FilletStressAnalysis(sc, new NotchSensitivity());

    /** Invariant: at the answer the factor equals the target, and every larger radius up to h meets it. */
    @Property(tries = 60, seed = "20261201")
    void minimumRadiusMeetsTheTargetAndEveryLargerRadiusDoes(
            @ForAll @DoubleRange(min = 1.05, max = 2.0) double dOverD,
            @ForAll @DoubleRange(min = 1.3, max = 3.0) double target,
            @ForAll boolean fatigue) {
        FilletStressCase c = FilletStressCase.of(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, Units.MM, 20 * dOverD, 20,
                (20 * dOverD - 20) / 2, fatigue ? UltimateStrength.ofMpa(800) : null);
        StressTarget t = fatigue ? StressTarget.kf(target) : StressTarget.kt(target);
        MinimumRadius m = analysis.minimumRadius(c, t);
        Assume.that(m.found() && !m.limitedByFit());
        assertThat(m.valueAtRadius()).isCloseTo(target, within(1e-6));
        double h = c.stepHeight();
        for (int i = 0; i <= 50; i++) {
            double r = m.radius() + (h - m.radius()) * i / 50;
            StressPoint p = analysis.point(c, r);
            assertThat(fatigue ? p.kf() : p.kt().kt()).isLessThanOrEqualTo(target + 1e-9);
        }
    }
}
