package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The same seed gives the same counts and the same example parts on any number of threads. */
class DeterminismTest {
    private static Simulation sim(long seed) {
        return Models.simulation(Models.everything(), new Needs(1.95, 2.2, 0.03, 0.02),
                List.of(Models.r(1.9, 2.1), Models.cr(1.95, 2.15), Models.located(0.1)), 700, seed);
    }

    private static String fingerprint(SimulationResult r) {
        StringBuilder sb = new StringBuilder().append(r.good());
        for (CalloutResult c : r.callouts()) {
            sb.append('|').append(c.accepted()).append(',').append(c.escapes()).append(',').append(c.falseRejects())
                    .append(',').append(c.indeterminate());
            for (Outcome o : Outcome.values()) for (Example e : c.examples(o)) sb.append(',').append(e.part());
        }
        return sb.toString();
    }

    @Test
    void oneTwoAndThreeThreadsGiveTheSameResult() {
        String one = fingerprint(new SimulationRunner(1).run(sim(11)));
        assertThat(fingerprint(new SimulationRunner(2).run(sim(11)))).isEqualTo(one);
        assertThat(fingerprint(new SimulationRunner(3).run(sim(11)))).isEqualTo(one);
    }

    @Test
    void anotherSeedGivesAnotherPopulation() {
        assertThat(fingerprint(new SimulationRunner(2).run(sim(12)))).isNotEqualTo(fingerprint(new SimulationRunner(2).run(sim(11))));
    }
}
