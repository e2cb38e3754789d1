package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.inspect.InspectionCallout;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.junit.jupiter.api.Test;

class SimulationFilesTest {
    private static final String GOOD = """
            {
              "units": "mm",
              "corner": {"vertex": [0, 0], "legA": [1, 0], "legB": [0, 1], "kind": "fillet"},
              "nominalRadius": 2.0,
              "process": {
                "radius": {"mean": 2.02, "sd": 0.05},
                "position": {"sd": 0.01},
                "flat": {"rate": 0.1, "width": [0.1, 0.2], "centre": [0.4, 0.6]},
                "step": {"rate": 0.05, "size": [0.005, 0.03]},
                "noise": 0.001,
                "points": 200
              },
              "needs": {"minRadius": 1.95, "maxRadius": 2.2},
              "callouts": [{"type": "radius", "min": 1.9, "max": 2.1}, {"type": "controlled-radius", "min": 1.95, "max": 2.15}],
              "parts": 20000,
              "seed": 11
            }
            """;

    private static Simulation parse(String text) {
        return new SimulationFiles(new JsonFiles()).parse(text, "part.json");
    }

    @Test
    void readsTheProcessFileOfTheIssue() {
        Simulation s = parse(GOOD);
        assertThat(s.parts()).isEqualTo(20000);
        assertThat(s.seed()).isEqualTo(11);
        assertThat(s.model().radius()).isEqualTo(new ProcessModel.Scatter(2.02, 0.05));
        assertThat(s.model().flat()).isEqualTo(new ProcessModel.Flats(0.1, 0.1, 0.2, 0.4, 0.6));
        assertThat(s.model().step()).isEqualTo(new ProcessModel.Steps(0.05, 0.005, 0.03));
        assertThat(s.model().points()).isEqualTo(200);
        assertThat(s.callouts()).hasSize(2).allMatch(c -> c instanceof InspectionCallout.RadiusLimits);
        // no resolution in the file: each callout's default, σ·√(2 ln(2N/α)) for N = 200 points and
        // α = 0.001 (Chernoff and union bounds on normal noise), below a tenth of either band
        assertThat(Double.isNaN(s.resolution())).isTrue();
        assertThat(s.resolutionFor(s.callouts().get(0))).isCloseTo(0.001 * Math.sqrt(2 * Math.log(400_000)), within(1e-12));
        assertThat(Double.isNaN(s.needs().maxStep())).isTrue();
    }

    @Test
    void badValueIsLocatedByFileLineAndField() {
        String bad = GOOD.replace("\"sd\": 0.05", "\"sd\": -0.05");
        assertThatThrownBy(() -> parse(bad)).isInstanceOf(InputProblem.class)
                .satisfies(e -> {
                    InputProblem p = (InputProblem) e;
                    assertThat(p.source()).isEqualTo("part.json");
                    assertThat(p.line()).isEqualTo(6);
                    // the value itself, not only its object
                    assertThat(p.field()).isEqualTo("process.radius.sd");
                    assertThat(p.problem()).contains("-0.05");
                });
    }

    @Test
    void badCalloutIsReadByTheInspectionFilesOwnReader() {
        String bad = GOOD.replace("\"min\": 1.95, \"max\": 2.15", "\"min\": 2.15, \"max\": 1.95");
        assertThatThrownBy(() -> parse(bad)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("part.json:14").hasMessageContaining("callouts[1]").hasMessageContaining("smaller than min");
    }

    @Test
    void missingNeedsIsNamed() {
        String bad = GOOD.replace("\"needs\": {\"minRadius\": 1.95, \"maxRadius\": 2.2},", "");
        assertThatThrownBy(() -> parse(bad)).isInstanceOf(InputProblem.class).hasMessageContaining("part.json")
                .hasMessageContaining("needs");
    }
}
