package org.arcwright.app.check;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.io.JsonFiles;
import org.junit.jupiter.api.Test;

/**
 * The figures the Check panel writes beside its plot are those of {@code arcwright inspect} on the same
 * file: an envelope rounded outward and a needed zone rounded up, so that a callout at the figure shown
 * passes the same points (the verdict's own rule; common practice for a reported bound). The files are
 * the shipped invented examples; the CLI's figures are in README.md.
 */
class CheckFiguresTest {
    private static InspectionResult inspect(String example) {
        return new Inspector().inspect(new InspectionFiles(new JsonFiles()).read(Path.of("examples/inspect", example)));
    }

    @Test
    void theZoneThePointsNeedIsRoundedUpAsTheCommandLineWritesIt() {
        InspectionResult r = inspect("bracket-round-profile.json");
        // the CLI: "needs zone 0.017236 mm"; four places half to even gave 0.0172, a zone the points fail
        assertThat(r.profile().requiredZone()).isGreaterThan(0.0172);
        assertThat(CheckPanel.describe(r)).contains("Zone the points need: 0.017236 mm");
    }

    @Test
    void theRadiusEnvelopeIsRoundedOutwardAsTheCommandLineWritesIt() {
        InspectionResult r = inspect("bracket-round-r.json");
        // the CLI: "radius smallest 2.0008   largest 2.044 mm"
        assertThat(CheckPanel.describe(r)).contains("Radius envelope: 2.0008 mm to 2.044 mm")
                .contains("Least-squares radius: 2.047 mm");
    }
}
