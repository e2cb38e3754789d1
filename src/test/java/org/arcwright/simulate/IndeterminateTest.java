package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

/**
 * A section the inspect engine can neither pass nor fail (ISO 14253-1: the uncertainty of a local
 * radius straddles a limit) is counted as indeterminate, never as accepted and never hidden among
 * the rejects. Perfect R2 arcs with 1 µm of noise under CR 1.9-2.1: short windows give local radii
 * whose expanded uncertainty is of the order of the band, so many sections are undecided.
 */
class IndeterminateTest {
    @Test
    void undecidedSectionsAreCountedAsIndeterminate() {
        ProcessModel m = new ProcessModel(Units.MM, Models.FILLET_90, 2.0,
                new ProcessModel.Scatter(2.0, 0), 0, null, null, 0.001, 200);
        Simulation sim = Models.simulation(m, new Needs(1.95, 2.2, Double.NaN, Double.NaN),
                List.of(Models.cr(1.9, 2.1)), 200, 3);
        CalloutResult cr = new SimulationRunner(2).run(sim).callouts().get(0);
        assertThat(cr.indeterminate()).isPositive();
        assertThat(cr.accepted() + cr.indeterminate()).isLessThanOrEqualTo(200);
        // every part is good, so every part not accepted is a false reject, the undecided ones included
        assertThat(cr.falseRejects()).isEqualTo(200 - cr.accepted());
    }
}
