package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.arcwright.io.JsonFiles;
import org.arcwright.tolerance.RadiusKind;
import org.junit.jupiter.api.Test;

/**
 * The worst finding an inspection reports is the one that decides its verdict. The repository's
 * invented housing section (a well-formed R2.06 blend, points scattered about 0.001 mm) against
 * CR 1.8-2.2: one point lies 0.00086 mm beyond fitted surface a, inside the largest arc's tangent
 * point, so the radius zone fails (ASME Y14.5-2018 radius zone: two arcs tangent to the adjacent
 * surfaces, nothing beyond them); every CR window only straddles a limit within its uncertainty.
 */
class WorstFindingTest {
    private static InspectionRequest housingAgainstCr() {
        InspectionRequest file = new InspectionFiles(new JsonFiles()).read(Path.of("examples/inspect/housing-fillet-profile.json"));
        return file.withCompare(false).withCallout(new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.8, 2.2));
    }

    /** Before the fix the worst was an undecided window (local radius 2.254 ± 0.25 mm) beside a FAIL. */
    @Test
    void aFailedZoneIsReportedByThePointThatFailedItNotByAnUndecidedWindow() {
        InspectionResult r = new Inspector().inspect(housingAgainstCr());
        assertThat(r.verdict()).isEqualTo(Verdict.FAIL);
        assertThat(r.controlled().verdict()).isEqualTo(Verdict.INDETERMINATE);
        assertThat(r.worst().measure()).isEqualTo("distance beyond surface");
        assertThat(r.worst().text()).contains("mm beyond surface a");
    }

    /** A failure within the data's own scatter says so, and names what would judge the part instead. */
    @Test
    void aFailureWithinTheSurfacesScatterSaysSoAndNamesTheDecisionRule() {
        InspectionResult r = new Inspector().inspect(housingAgainstCr());
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("within the scatter of the points fitted to surface a")
                .contains("ISO 14253-1"));
        // with U stated the decision rule judges it: the zone's failure is no longer proven
        InspectionResult withU = new Inspector().inspect(housingAgainstCr().withUncertainty(0.002));
        assertThat(withU.verdict()).isEqualTo(Verdict.INDETERMINATE);
    }
}
