package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.Verdict;
import org.arcwright.io.JsonFiles;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Points are judged against the selected feature's chosen callout, never the file's; a file that
 * describes another corner is refused or confirmed; an undecided feature keeps no verdict. The
 * examples are the repository's own invented inspection files.
 */
class CheckBindingTest {
    private static final Path HOUSING = Path.of("examples/inspect/housing-fillet-profile.json");
    private static final Path HOUSING_CSV = Path.of("examples/inspect/housing-fillet-section.csv");
    private static final Path BRACKET_R = Path.of("examples/inspect/bracket-round-r.json");
    private final CheckRequests requests = new CheckRequests(new JsonFiles());

    private static DesignCase fillet(Units u, double r) {
        return new DesignCase(u, DrawingStyle.ASME, "shoulder", BlendKind.FILLET, r, BlendFunction.STRESS_RELIEF,
                Loading.FATIGUE, true, false, List.of("A"), Process.MACHINED, null, null, null);
    }

    private static Recommendation chosen(Callout c, String text) {
        return new Recommendation("test", c, text, 0, List.of(), List.of(), List.of(), Map.of(), List.of(),
                List.of(), false);
    }

    private static RadiusFeature crShoulder() {
        return new RadiusFeature("F1", fillet(Units.MM, 2), chosen(new Callout.ControlledRadius(1.8, 2.2, 2.0), "CR2 ±0.2"), null);
    }

    @Test
    void aProfileFileIsJudgedAgainstTheFeaturesChosenCrAndItsOwnCalloutIsOnlyShown() {
        CheckRequests.Binding b = requests.read(HOUSING, crShoulder(), CheckRequests.Frame.STANDARD);
        assertThat(b).isInstanceOf(CheckRequests.Ready.class);
        CheckRequests.Ready ready = (CheckRequests.Ready) b;
        assertThat(ready.request().callout()).isEqualTo(new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.8, 2.2));
        assertThat(ready.fileSays()).startsWith("profile 0.1").contains("0.07 outward");
        InspectionResult r = new Inspector().inspect(ready.request());
        // the verdict and the record name the callout judged: the feature's, not the file's
        assertThat(r.request().callout().describe()).isEqualTo("CR 1.8-2.2");
        InspectionRecord rec = CheckRequests.record(r, HOUSING.toString(), LocalDate.of(2026, 12, 5));
        assertThat(rec.figures()).containsEntry("callout", "CR 1.8-2.2").containsEntry("units", "mm");
        // the worst finding is kept in words, with its unit and what it measures, never as a bare excess
        assertThat(rec.figures()).doesNotContainKeys("worstExcess", "worstMeasure");
        assertThat(String.valueOf(rec.figures().get("worst"))).startsWith("worst #").contains(" mm");
    }

    @Test
    void theVerdictAgreesWithTheInspectorRunOnTheFeaturesCallout() {
        // independent route: the file read by the core, its callout swapped for the feature's by the core's own API
        InspectionRequest file = new InspectionFiles(new JsonFiles()).read(HOUSING);
        boolean expected = new Inspector().inspect(file.withCallout(
                new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.8, 2.2))).pass();
        CheckRequests.Ready ready = (CheckRequests.Ready) requests.read(HOUSING, crShoulder(), CheckRequests.Frame.STANDARD);
        assertThat(new Inspector().inspect(ready.request()).pass()).isEqualTo(expected);
    }

    @Test
    void aSectionOfAnR2RoundIsNotAcceptedForAnR04FilletWithoutConfirmation() {
        RadiusFeature small = new RadiusFeature("F3", fillet(Units.MM, 0.4), chosen(new Callout.Radius(0.3, 0.5, 0.4), "R0.4 ±0.1"), null);
        CheckRequests.Binding b = requests.read(BRACKET_R, small, CheckRequests.Frame.STANDARD);
        assertThat(b).isInstanceOf(CheckRequests.NeedsConfirmation.class);
        CheckRequests.NeedsConfirmation n = (CheckRequests.NeedsConfirmation) b;
        assertThat(n.mismatches()).hasSize(2);
        assertThat(n.mismatches().get(0)).contains("nominal radius is 2 mm").contains("F3's is 0.4 mm");
        assertThat(n.mismatches().get(1)).contains("round").contains("fillet");
        // confirmed, it is judged as F3 (R0.4 fillet, R 0.3-0.5): an R2 round's section never passes as it
        CheckRequests.Ready asF3 = n.ifConfirmed();
        assertThat(asF3.request().callout()).isEqualTo(new InspectionCallout.RadiusLimits(RadiusKind.R, 0.3, 0.5));
        assertThat(new Inspector().inspect(asF3.request()).verdict()).isEqualTo(Verdict.FAIL);
    }

    @Test
    void aFileInOtherUnitsIsRefusedWithTheReason() {
        RadiusFeature inch = new RadiusFeature("F2", fillet(Units.INCH, 2), chosen(new Callout.Radius(1.9, 2.1, 2.0), "R2"), null);
        CheckRequests.Binding b = requests.read(BRACKET_R, inch, CheckRequests.Frame.STANDARD);
        assertThat(b).isInstanceOf(CheckRequests.Refused.class);
        assertThat(((CheckRequests.Refused) b).reason()).contains("in mm").contains("F2 in in");
    }

    @Test
    void anUndecidedFeatureOrNoSelectionIsRefused() {
        RadiusFeature open = new RadiusFeature("F5", fillet(Units.MM, 2), null, null);
        assertThat(requests.read(HOUSING, open, CheckRequests.Frame.STANDARD)).isInstanceOfSatisfying(CheckRequests.Refused.class,
                r -> assertThat(r.reason()).startsWith("F5 has no callout chosen yet"));
        assertThat(requests.read(HOUSING_CSV, open, CheckRequests.Frame.STANDARD)).isInstanceOf(CheckRequests.Refused.class);
        assertThat(requests.read(HOUSING, null, CheckRequests.Frame.STANDARD)).isInstanceOfSatisfying(CheckRequests.Refused.class,
                r -> assertThat(r.reason()).startsWith("Select the feature"));
        RadiusFeature general = new RadiusFeature("F4", fillet(Units.MM, 1),
                chosen(new Callout.General("iso2768-1-radius-chamfer", "m", null), "ISO 2768-m"), null);
        assertThat(requests.read(HOUSING, general, CheckRequests.Frame.STANDARD)).isInstanceOf(CheckRequests.Refused.class);
    }

    @Test
    void theRepositorysCsvIsJudgedInTheFrameTheUserStates() {
        // housing-fillet-profile.json places these points at vertex (10, 10), legs along -x and -y
        CheckRequests.Frame stated = CheckRequests.Frame.ofDegrees(10, 10, 180, 270);
        CheckRequests.Ready csv = (CheckRequests.Ready) requests.read(HOUSING_CSV, crShoulder(), stated);
        CheckRequests.Ready json = (CheckRequests.Ready) requests.read(HOUSING, crShoulder(), CheckRequests.Frame.STANDARD);
        // the stated frame places the same corner as the file, within rounding of the legs' directions
        var a = (Nominal.CornerBlend) csv.request().nominal();
        var b = (Nominal.CornerBlend) json.request().nominal();
        assertThat(a.radius()).isEqualTo(b.radius());
        assertThat(a.corner().vertex()).isEqualTo(b.corner().vertex());
        assertThat(a.corner().legA().minus(b.corner().legA()).length()).isLessThan(1e-12);
        assertThat(a.corner().legB().minus(b.corner().legB()).length()).isLessThan(1e-12);
        assertThat(csv.request().points().size()).isEqualTo(json.request().points().size());
        // and the standard frame (vertex at the origin) does not: the points would lie far from the corner
        CheckRequests.Ready origin = (CheckRequests.Ready) requests.read(HOUSING_CSV, crShoulder(), CheckRequests.Frame.STANDARD);
        assertThat(((Nominal.CornerBlend) origin.request().nominal()).corner().vertex())
                .isNotEqualTo(b.corner().vertex());
    }

    @Test
    void anUndecidedFeatureKeepsNoVerdictAndANewCalloutDropsTheOldOne() {
        PartWorksheet ws = PartWorksheet.empty(new PartWorksheet.PartInfo("QX-1", "Invented shaft", null, "Invented Co", "A"),
                Units.MM, DrawingStyle.ASME).withFeature(crShoulder()).withFeature(new RadiusFeature("F2", fillet(Units.MM, 1), null, null));
        WorksheetSession s = new WorksheetSession(Fixtures.files(), ws, null);
        InspectionRecord rec = new InspectionRecord("pass", "a.csv", "2026-12-05", Map.of("callout", "CR 1.8-2.2"));
        assertThatThrownBy(() -> s.recordInspection("F2", rec)).isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("undecided");
        s.recordInspection("F1", rec);
        assertThat(s.worksheet().feature("F1").orElseThrow().status()).isEqualTo(RadiusFeature.Status.MEASURED_PASS);
        s.choose("F1", fillet(Units.MM, 2), chosen(new Callout.Radius(1.9, 2.1, 2.0), "R2 ±0.1"));
        assertThat(s.worksheet().feature("F1").orElseThrow().inspection()).isNull();
        s.undo();
        s.updateCase("F1", fillet(Units.MM, 2.5));
        assertThat(s.worksheet().feature("F1").orElseThrow().inspection()).isNull();
        assertThat(s.worksheet().feature("F1").orElseThrow().status()).isEqualTo(RadiusFeature.Status.OPEN);
    }

    /**
     * A file that states its expanded uncertainty U is judged by the ISO 14253-1 default decision rule
     * in the desktop as in {@code arcwright inspect}: the same file, the same verdict. The housing section
     * against CR 1.8-2.2 fails without U and is indeterminate with U = 0.01 mm (the command line's
     * verdict on the same file is the reference). Before the fix the desktop dropped U and kept "fail".
     */
    @Test
    void aFileStatingItsUncertaintyIsJudgedByTheDecisionRuleAndAnIndeterminateVerdictIsKeptAsSuch(
            @TempDir Path dir) throws Exception {
        Path file = Sections.uncertainHousing(dir, 0.01);
        CheckRequests.Ready ready = (CheckRequests.Ready) requests.read(file, crShoulder(), CheckRequests.Frame.STANDARD);
        assertThat(ready.request().uncertainty()).isEqualTo(0.01);
        InspectionResult r = new Inspector().inspect(ready.request());
        InspectionRequest asTheCommandLineReadsIt = new InspectionFiles(new JsonFiles()).read(file);
        assertThat(r.verdict()).isEqualTo(new Inspector().inspect(asTheCommandLineReadsIt).verdict())
                .isEqualTo(Verdict.INDETERMINATE);
        InspectionRecord rec = CheckRequests.record(r, file.toString(), LocalDate.of(2026, 12, 5));
        assertThat(rec.verdict()).isEqualTo("indeterminate");
        assertThat(rec.passed()).isFalse();
        assertThat(rec.undecided()).isTrue();
        assertThat(rec.figures()).containsEntry("uncertainty", 0.01).containsEntry("callout", "CR 1.8-2.2");
        RadiusFeature kept = crShoulder().withInspection(rec);
        assertThat(kept.status()).isEqualTo(RadiusFeature.Status.MEASURED_INDETERMINATE);
        assertThat(kept.status().label()).isEqualTo("measured: indeterminate");
        assertThat(rec.describe()).startsWith("measured: indeterminate against CR 1.8-2.2 (mm)");
    }

    /** A worksheet keeping an indeterminate verdict reads back as written (it was refused as "not pass or fail"). */
    @Test
    void anIndeterminateRecordSurvivesTheWorksheetFile() throws Exception {
        var mapper = new ObjectMapper();
        InspectionRecord rec = new InspectionRecord("indeterminate", "s.csv", "2026-12-05", Map.of("callout", "CR 1.8-2.2"));
        InspectionRecord back = mapper.readValue(mapper.writeValueAsString(rec), InspectionRecord.class);
        assertThat(back).isEqualTo(rec);
        assertThatThrownBy(() -> new InspectionRecord("maybe", null, null, null))
                .hasMessageContaining("pass, fail or indeterminate");
    }
}
