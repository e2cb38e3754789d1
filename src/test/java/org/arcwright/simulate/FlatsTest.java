package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

/**
 * Flats small enough to stay inside the R zone: the radius zone cannot see them, so R accepts every
 * part and, since the chord meets the arc in corners of local radius 0, every one is an escape; the
 * controlled radius (no flats, no reversals) catches them. Worked by hand: a chord over at most 15 %
 * of the 90° sweep of R2 spans {@code Δ = 0.15·π/2 = 0.236} rad and lies at most its sagitta
 * {@code 2(1 - cos(Δ/2)) = 0.0139} mm inside the arc, which near the bisector reads as a blend about
 * {@code 0.0139 / (√2 - 1) = 0.034} mm larger: well inside {@code R 1.9-2.1} (crescent geometry,
 * plane geometry).
 */
class FlatsTest {
    @Test
    void radiusAcceptsEveryFlatAsAnEscapeAndControlledRadiusCatchesThem() {
        ProcessModel m = new ProcessModel(Units.MM, Models.FILLET_90, 2.0,
                new ProcessModel.Scatter(2.0, 0), 0, new ProcessModel.Flats(1, 0.1, 0.15, 0.45, 0.55), null, 0, 200);
        Simulation sim = Models.simulation(m, new Needs(1.95, 2.2, Double.NaN, Double.NaN),
                List.of(Models.r(1.9, 2.1), Models.cr(1.9, 2.1)), 300, 7);
        SimulationResult r = new SimulationRunner(2).run(sim);
        assertThat(r.good()).isZero();
        CalloutResult radius = r.callouts().get(0), controlled = r.callouts().get(1);
        assertThat(radius.accepted()).isEqualTo(300);
        assertThat(radius.escapes()).isEqualTo(300);
        assertThat(controlled.accepted()).isZero();
        assertThat(controlled.escapes()).isZero();
        assertThat(controlled.examples(Outcome.REJECTED_BAD)).hasSize(SimulationRunner.EXAMPLES);
    }
}
