package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The case's optional corner angle sets the crescent and the profile zone the advisor gives. Expected
 * values from the geometry of an arc tangent to two lines meeting at θ: its centre lies r/sin(θ/2) from the
 * vertex, so the crescent of r ± t is 2t·k wide on the bisector with k = 1/sin(θ/2) − 1 (plane geometry;
 * decision 0402).
 */
class CaseCornerAngleTest {
    private static Advisor advisor;

    @BeforeAll
    static void load() {
        advisor = new Advisor(RuleBook.load(PackStack.builtIn()), FilletChecks.NONE, NoteLinker.NONE);
    }

    private static DesignCase seal(Double angle) {
        return new DesignCase(Units.MM, DrawingStyle.ISO, "flange blend", BlendKind.FILLET, 2.0, BlendFunction.SEALING,
                Loading.NONE, true, false, List.of(), Process.MACHINED, null, null, null, angle);
    }

    @Test
    void aCaseWithoutAnAngleLoadsAsASquareCornerAndWritesNoAngle() {
        JsonFiles json = new JsonFiles();
        DesignCase c = json.parse("""
                {"units": "mm", "standard": "iso", "kind": "fillet", "nominalRadius": 2, "function": "sealing",
                 "formMatters": true, "process": "machined"}
                """, "case.json", DesignCase.class);
        assertThat(c.cornerAngle()).isNull();
        assertThat(c.cornerAngleDegrees()).isEqualTo(90.0);
        assertThat(json.write(c)).doesNotContain("cornerAngle");
        DesignCase angled = json.parse(json.write(seal(120.0)), "case.json", DesignCase.class);
        assertThat(angled.cornerAngle()).isEqualTo(120.0);
    }

    @Test
    void anAngleOutsideZeroTo180IsBadInputNamingTheField() {
        for (String bad : List.of("0", "180", "-30", "200")) {
            assertThatThrownBy(() -> new JsonFiles().parse("""
                    {"units": "mm", "standard": "iso", "kind": "fillet", "nominalRadius": 2, "function": "sealing",
                     "process": "machined", "cornerAngle": %s}
                    """.formatted(bad), "case.json", DesignCase.class))
                    .isInstanceOf(InputProblem.class).hasMessageContaining("cornerAngle").hasMessageContaining("180");
        }
    }

    @Test
    void theProfileZoneHoldsTheSameRadiiAtTheCasesAngle() {
        // machined R2: ±0.1 (built-in capability table, common practice). Square corner: k = √2 − 1 = 0.4142,
        // zone 2 × 0.1 × 0.4142 = 0.083 -> 0.09 (rounded up to the drawing's 2 places).
        // 120°: k = 1/sin 60° − 1 = 0.1547, zone 0.0309 -> 0.04, admitting 2 ± 0.02/0.1547 = 1.871 to 2.129.
        Recommendation square = advisor.advise(seal(null)).first().orElseThrow();
        Recommendation obtuse = advisor.advise(seal(120.0)).first().orElseThrow();
        assertThat(((Callout.Profile) square.callout()).zone()).isEqualTo(0.09);
        assertThat(((Callout.Profile) obtuse.callout()).zone()).isEqualTo(0.04);
        assertThat((Double) obtuse.numbers().asMap().get("min")).isCloseTo(1.871, within(0.001));
        assertThat((Double) obtuse.numbers().asMap().get("max")).isCloseTo(2.129, within(0.001));
        assertThat(obtuse.numbers().asMap()).containsEntry("angle", 120.0);
    }

    @Test
    void theCrescentOfARadiusToleranceWidensAtAnAcuteCorner() {
        // R2 +0.2/0 style band 0.2 at 60°: k = 1/sin 30° − 1 = 1, crescent 0.2 × 1 = 0.2; at 90°, 0.2 × 0.4142 = 0.0828
        DesignCase base = new DesignCase(Units.MM, DrawingStyle.ASME, "shoulder", BlendKind.FILLET, 2.0,
                BlendFunction.STRESS_RELIEF, Loading.FATIGUE, true, false, List.of(), Process.MACHINED, null, null, null);
        Recommendation square = advisor.advise(base).first().orElseThrow();
        Recommendation acute = advisor.advise(base.withCornerAngle(60.0)).first().orElseThrow();
        assertThat(square.text()).isEqualTo(acute.text()).isEqualTo("CR2 +0.2/0");
        assertThat((Double) square.numbers().asMap().get("crescentWidth")).isCloseTo(0.0828, within(1e-4));
        assertThat((Double) acute.numbers().asMap().get("crescentWidth")).isCloseTo(0.2, within(1e-4));
    }
}
