package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.arcwright.io.InputProblem;
import org.arcwright.mechanics.EdgeState.EdgeType;
import org.arcwright.mechanics.EdgeState.Sense;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** ISO 13715 edges of undefined shape. */
class EdgeStateTest {

    /** ISO 13715:2019 text forms: sign and size, two sizes of one sign, or a sign alone. */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "-0.3        | MINUS  | 0.3  |     | -0.3",
            "+0.3        | PLUS   | 0.3  |     | +0.3",
            "±0.05       | EITHER | 0.05 |     | ±0.05",
            "+/-0.05     | EITHER | 0.05 |     | ±0.05",
            "-0.1 -0.5   | MINUS  | 0.5  | 0.1 | -0.1 -0.5",
            "-0.5/-0.1   | MINUS  | 0.5  | 0.1 | -0.1 -0.5",
            "−0.2        | MINUS  | 0.2  |     | -0.2",
            "-           | MINUS  |      |     | -"})
    void readsTheStandardsTextForms(String text, Sense sense, String limit, String least, String iso) {
        EdgeState e = EdgeState.parse(EdgeType.EXTERNAL, text);
        assertThat(e.sense()).isEqualTo(sense);
        assertThat(e.limit() == null ? null : e.limit().toPlainString()).isEqualTo(limit);
        assertThat(e.least() == null ? null : e.least().toPlainString()).isEqualTo(least);
        assertThat(e.isoText()).isEqualTo(iso);
    }

    @Test
    void plusOnAnExternalEdgeAllowsABurrAndNoBreak() {
        EdgeState e = EdgeState.plus(EdgeType.EXTERNAL, 0.3);
        assertThat(e.term()).isEqualTo("burr allowed");
        assertThat(e.permits(0.2)).isTrue();
        assertThat(e.permits(0.4)).isFalse();
        assertThat(e.permits(-0.1)).isFalse();
    }

    @Test
    void minusWithTwoSizesRequiresABreakBetweenThem() {
        EdgeState e = EdgeState.undercutBetween(EdgeType.EXTERNAL, 0.1, 0.5);
        assertThat(e.permits(-0.3)).isTrue();
        assertThat(e.permits(-0.05)).isFalse();
        assertThat(e.permits(0.05)).isFalse();
        assertThat(e.asmeNote(Units.MM)).isEqualTo("BREAK EDGE 0.1-0.5 MM, NO BURR");
    }

    @Test
    void internalEdgesSpeakOfPassingAndUndercut() {
        assertThat(EdgeState.plus(EdgeType.INTERNAL, 0.2).term()).isEqualTo("passing allowed");
        assertThat(EdgeState.minus(EdgeType.INTERNAL, 0.2).term()).isEqualTo("undercut required");
        assertThat(EdgeState.either(EdgeType.INTERNAL, 0.05).asmeNote(Units.INCH))
                .isEqualTo("SHARP CORNER, RUNOUT OR UNDERCUT 0.05 MAX");
    }

    @Test
    void rejectsMixedSignsAndJunk() {
        assertThatThrownBy(() -> EdgeState.parse(EdgeType.EXTERNAL, "-0.1 +0.5")).isInstanceOf(InputProblem.class)
                .hasMessageContaining("same sign");
        assertThatThrownBy(() -> EdgeState.parse(EdgeType.EXTERNAL, "0.3")).isInstanceOf(InputProblem.class)
                .hasMessageContaining("starts with +, - or ±");
        assertThatThrownBy(() -> EdgeState.parse(EdgeType.EXTERNAL, "-abc")).isInstanceOf(InputProblem.class)
                .hasMessageContaining("not a number");
        assertThatThrownBy(() -> EdgeState.parse(EdgeType.EXTERNAL, "±0.1 ±0.3")).isInstanceOf(InputProblem.class);
    }
}
