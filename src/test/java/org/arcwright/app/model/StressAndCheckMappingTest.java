package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.Inspector;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.mechanics.StressTarget;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.RadiusFeature;
import org.assertj.core.api.Assertions;
import org.junit.jupiter.api.Test;

class StressAndCheckMappingTest {
    private static DesignCase shoulder(String tolerance, DesignCase.Strength strength) {
        return new DesignCase(Units.MM, DrawingStyle.ASME, "gear seat", BlendKind.FILLET, 2, BlendFunction.STRESS_RELIEF,
                Loading.FATIGUE, true, false, List.of("A"), Process.MACHINED,
                new DesignCase.StressInputs("stepped-shaft", "bending", 42, 35, strength, 1.6), null, tolerance);
    }

    private static Recommendation chosen(Callout c) {
        return new Recommendation("test", c, "text", 0, List.of(), List.of(), List.of(), Map.of(), List.of(),
                List.of(), false);
    }

    @Test
    void theStressCaseTakesItsLimitsFromTheChosenCalloutBeforeTheIntent() {
        RadiusFeature f = new RadiusFeature("F1", shoulder("R2 ±0.2", null), chosen(new Callout.Radius(1.9, 2.3, 2.0)), null);
        StressCases.Assessment a = StressCases.of(f);
        assertThat(a.ready()).isTrue();
        assertThat(a.stressCase().rMin()).isEqualTo(1.9);
        assertThat(a.stressCase().rMax()).isEqualTo(2.3);
        assertThat(a.target().factor()).isEqualTo(StressTarget.Factor.KT);
    }

    @Test
    void withAStrengthTheTargetIsOnKf() {
        RadiusFeature f = new RadiusFeature("F1", shoulder("R2 ±0.2", new DesignCase.Strength(900, "MPa")), null, null);
        StressCases.Assessment a = StressCases.of(f);
        assertThat(a.stressCase().rMin()).isEqualTo(1.8, Assertions.within(1e-12));
        assertThat(a.target().factor()).isEqualTo(StressTarget.Factor.KF);
    }

    @Test
    void aFeatureWithoutASectionSaysWhatToGive() {
        RadiusFeature f = new RadiusFeature("F9", Fixtures.fillet(1, null), null, null);
        assertThat(StressCases.of(f).why()).contains("D and d");
    }

    @Test
    void aControlledRadiusIsCheckedAsCr() {
        RadiusFeature f = new RadiusFeature("F1", shoulder(null, null), chosen(new Callout.ControlledRadius(1.8, 2.2, null)), null);
        InspectionCallout c = CheckRequests.callout(f);
        assertThat(c).isEqualTo(new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.8, 2.2));
    }

    @Test
    void pointsCannotBeJudgedBeforeACalloutIsChosen() {
        RadiusFeature f = new RadiusFeature("F1", shoulder(null, null), null, null);
        assertThatThrownBy(() -> CheckRequests.callout(f)).isInstanceOf(InputProblem.class).hasMessageContaining("decide it first");
    }

    @Test
    void anInspectionRecordKeepsTheVerdictAndDate() throws Exception {
        var req = new InspectionFiles(new JsonFiles())
                .read(Path.of("examples/inspect/bracket-round-cr-flat.json"));
        var result = new Inspector().inspect(req);
        var rec = CheckRequests.record(result, "cr-flat.json", LocalDate.of(2026, 12, 1));
        assertThat(rec.verdict()).isEqualTo(result.pass() ? "pass" : "fail");
        assertThat(rec.measuredOn()).isEqualTo("2026-12-01");
        assertThat(rec.figures()).containsEntry("callout", req.callout().describe());
    }
}
