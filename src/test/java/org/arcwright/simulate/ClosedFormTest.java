package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.arcwright.tolerance.CrescentZone;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * With radius scatter only (perfect arcs tangent to the nominal surfaces, no noise) every share has
 * a closed form in the normal distribution, here Commons Math's {@link NormalDistribution} as the
 * reference. Each simulated share must lie within 4 standard errors {@code √(p(1-p)/N)} of it
 * (plus one part, for shares whose exact value is 0).
 *
 * <ul>
 *   <li>R or CR {@code [a, b]} accepts exactly the parts with {@code a <= r <= b}: the arcs of the
 *       limit radii bound the zone and every perfect arc lies between them (ASME Y14.5-2018 radius
 *       definition, from memory).</li>
 *   <li>A located equal-bilateral profile of zone {@code t} accepts {@code |r - r0| <= t / (2k)},
 *       {@code k = 1/sin(θ/2) - 1}: crescent geometry, two arcs tangent to both surfaces are
 *       {@code |r - r0|·k} apart on the bisector and closer everywhere else (plane geometry, see
 *       {@link CrescentZone}).</li>
 *   <li>Escapes and false rejects: the parts accepted outside the needs' radius band, and those in
 *       it but rejected.</li>
 * </ul>
 */
class ClosedFormTest {
    static final int N = 3000;
    static final double MEAN = 2.02, SD = 0.05, MIN_NEED = 1.95, MAX_NEED = 2.2, ZONE = 0.05;
    static final NormalDistribution RADIUS = new NormalDistribution(MEAN, SD);
    static SimulationResult result;

    @BeforeAll
    static void run() {
        Simulation sim = Models.simulation(Models.radiusOnly(MEAN, SD, 60), new Needs(MIN_NEED, MAX_NEED, Double.NaN, Double.NaN),
                List.of(Models.r(1.9, 2.1), Models.cr(1.95, 2.15), Models.located(ZONE)), N, 20261205L);
        result = new SimulationRunner(2).run(sim);
    }

    static double p(double a, double b) {
        return b <= a ? 0 : RADIUS.cumulativeProbability(b) - RADIUS.cumulativeProbability(a);
    }

    static void near(Share s, double expected, String what) {
        double se = Math.sqrt(expected * (1 - expected) / N);
        assertThat(s.share()).as(what + " (expected %.4f, 4 SE = %.4f)", expected, 4 * se)
                .isCloseTo(expected, Offset.offset(4 * se + 1.0 / N));
    }

    @Test
    void goodPartsAreThoseInTheNeedsBand() {
        near(result.goodShare(), p(MIN_NEED, MAX_NEED), "good");
    }

    @Test
    void radiusAcceptsTheNormalMassBetweenItsLimits() {
        CalloutResult c = result.callouts().get(0);
        near(c.acceptedShare(), p(1.9, 2.1), "R accepted");
        near(c.escapeShare(), p(1.9, MIN_NEED), "R escapes");
        near(c.falseRejectShare(), p(2.1, MAX_NEED), "R false rejects");
    }

    @Test
    void controlledRadiusOnPerfectArcsAcceptsTheSameMass() {
        CalloutResult c = result.callouts().get(1);
        near(c.acceptedShare(), p(1.95, 2.15), "CR accepted");
        assertThat(c.escapes()).as("CR inside the needs band lets nothing bad through").isZero();
        near(c.falseRejectShare(), p(2.15, MAX_NEED), "CR false rejects");
    }

    @Test
    void locatedProfileAcceptsTheCrescentBand() {
        double half = ZONE / (2 * CrescentZone.factor(90));
        double lo = 2.0 - half, hi = 2.0 + half;
        CalloutResult c = result.callouts().get(2);
        near(c.acceptedShare(), p(lo, hi), "profile accepted");
        near(c.escapeShare(), p(lo, Math.max(lo, MIN_NEED)), "profile escapes");
        near(c.falseRejectShare(), p(MIN_NEED, lo) + p(hi, MAX_NEED), "profile false rejects");
    }
}
