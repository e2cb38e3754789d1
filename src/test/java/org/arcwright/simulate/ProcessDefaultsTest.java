package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

/** The built-in pack's default process models (figures marked common practice in the table). */
class ProcessDefaultsTest {
    private final ProcessDefaults table = ProcessDefaults.load(PackStack.builtIn()).orElseThrow();

    @Test
    void everyProcessOfTheCaseVocabularyHasAModel() {
        assertThat(table.processes()).containsKeys("machined", "molded", "cast", "forged", "additive", "sheet-metal");
        assertThat(table.source()).contains("common practice");
    }

    @Test
    void radiusScatterIsTheHeldToleranceOverThreeAndInchLengthsAreConverted() {
        ProcessModel mm = table.model("machined", Units.MM, Models.FILLET_90, 2.0, 0.1);
        assertThat(mm.radius().sd()).isCloseTo(0.1 / 3, within(1e-12));
        assertThat(mm.noise()).isEqualTo(0.001);
        ProcessModel in = table.model("machined", Units.INCH, Models.FILLET_90, 0.08, 0.004);
        assertThat(in.noise()).isCloseTo(0.001 / 25.4, within(1e-12));
    }

    @Test
    void unknownProcessIsNamed() {
        assertThatThrownBy(() -> table.model("lasered", Units.MM, Models.FILLET_90, 2.0, 0.1))
                .isInstanceOf(InputProblem.class).hasMessageContaining("lasered").hasMessageContaining("machined");
    }
}
