package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class LimitsCommandTest {
    private final ObjectMapper json = new ObjectMapper();

    @Test
    void jsonCarriesLimitsCrescentAndBothStyles() throws Exception {
        CliRun run = CliRun.of("limits", "R0.55 ±0.05", "--format", "json");
        assertThat(run.exitCode()).isZero();
        JsonNode n = json.readTree(run.out());
        // common practice: R0.55 ±0.05 gives limits 0.50 and 0.60.
        assertThat(n.get("min").asDouble()).isEqualTo(0.5);
        assertThat(n.get("max").asDouble()).isEqualTo(0.6);
        assertThat(n.get("nominal").asDouble()).isEqualTo(0.55);
        assertThat(n.get("band").asDouble()).isEqualTo(0.1);
        // (rmax - rmin)(1/sin 45° - 1) = 0.0414 at the default 90°.
        assertThat(n.get("crescentWidth").asDouble()).isCloseTo(0.041421, within(1e-6));
        assertThat(n.get("profileZone").asDouble()).isCloseTo(0.041421, within(1e-6));
        assertThat(n.get("profileZoneShortcut").asDouble()).isCloseTo(0.1, within(1e-12));
        assertThat(n.at("/callout/asme").asText()).isEqualTo("R0.55 ±0.05");
        assertThat(n.at("/callout/iso").asText()).isEqualTo("R0.55 ±0.05");
        assertThat(n.get("remarks").toString()).contains("bounds size only");
    }

    @Test
    void angleOptionChangesTheCrescent() throws Exception {
        JsonNode n = json.readTree(CliRun.of("limits", "R3 +0.2/-0.1", "--angle", "120", "--format", "json").out());
        assertThat(n.get("crescentWidth").asDouble())
                .isCloseTo(0.3 * (1 / Math.sin(Math.toRadians(60)) - 1), within(1e-12));
    }

    @Test
    void blendKindGivesTheUnequallyDisposedZone() throws Exception {
        // A fillet R3 +0.2/-0.1 at 90°: larger arcs add material, so 0.2 × (√2 - 1) lies outward of nominal.
        JsonNode n = json.readTree(CliRun.of("limits", "R3 +0.2/-0.1", "--blend", "fillet", "--format", "json").out());
        double k = Math.sqrt(2) - 1;
        assertThat(n.at("/unequalProfile/zone").asDouble()).isCloseTo(0.3 * k, within(1e-12));
        assertThat(n.at("/unequalProfile/outward").asDouble()).isCloseTo(0.2 * k, within(1e-12));
        assertThat(n.at("/unequalProfile/isoOffset").asDouble()).isCloseTo(0.05 * k, within(1e-12));
        // A round: smaller arcs add material.
        JsonNode r = json.readTree(CliRun.of("limits", "R3 +0.2/-0.1", "--blend", "round", "--format", "json").out());
        assertThat(r.at("/unequalProfile/outward").asDouble()).isCloseTo(0.1 * k, within(1e-12));
        assertThat(CliRun.of("limits", "R3 +0.2/-0.1", "--blend", "chamfer").exitCode()).isEqualTo(2);
    }

    @Test
    void sameSignDeviationsGiveTheCrescentBeyondTheNominalArc() throws Exception {
        // R3 +0.3/+0.1 fillet at 90°, worked by hand with k = √2 − 1 (geometry of tangent arcs, common practice):
        // crescent 0.0414 to 0.1243 away, zone 2 × 0.3k = 0.2485, shortcut 2 × 0.3 = 0.6, UZ +0.0828.
        CliRun text = CliRun.of("limits", "R3 +0.3/+0.1", "--blend", "fillet");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).contains("from 0.0414 to 0.1243 away from the vertex")
                .contains("0.2485  geometric").contains("0.6000  common shortcut").contains("UZ+0.0828")
                .doesNotContain("0.0000 toward");
        JsonNode n = json.readTree(CliRun.of("limits", "R3 +0.3/+0.1", "--blend", "fillet", "--format", "json").out());
        assertThat(n.at("/crescent/minArcOffset").asDouble()).isCloseTo(0.0414, within(5e-5));
        assertThat(n.at("/crescent/maxArcOffset").asDouble()).isCloseTo(0.1243, within(5e-5));
        assertThat(n.get("profileZone").asDouble()).isCloseTo(0.2485, within(5e-5));
        assertThat(n.get("profileZoneShortcut").asDouble()).isCloseTo(0.6, within(1e-12));
        assertThat(n.at("/unequalProfile/isoOffset").asDouble()).isCloseTo(0.0828, within(5e-5));
        // ASME: the zone cannot be disposed about R3; the true profile goes to the nearer limit arc R3.1.
        assertThat(n.at("/unequalProfile/asmeBasicRadius").asDouble()).isEqualTo(3.1);
    }

    @Test
    void bothNegativeDeviationsAreTheMirror() throws Exception {
        // R3 -0.1/-0.3 fillet: crescent 0.0414 to 0.1243 toward the vertex; UZ −0.0828 (remove-material side).
        CliRun text = CliRun.of("limits", "R3 -0.1/-0.3", "--blend", "fillet");
        assertThat(text.out()).contains("from 0.0414 to 0.1243 toward the vertex").contains("0.2485  geometric")
                .contains("0.6000  common shortcut").contains("UZ-0.0828");
        JsonNode n = json.readTree(CliRun.of("limits", "R3 -0.1/-0.3", "--blend", "fillet", "--format", "json").out());
        assertThat(n.at("/unequalProfile/isoOffset").asDouble()).isCloseTo(-0.0828, within(5e-5));
        assertThat(n.at("/unequalProfile/asmeBasicRadius").asDouble()).isEqualTo(2.9);
    }

    @Test
    void unilateralDeviationsKeepTheNominalOnTheCrescentsEdge() throws Exception {
        // R3 +0.2/0 fillet: crescent from the nominal arc to 0.2k = 0.0828, UZ = centre 0.0414 (worked by hand).
        JsonNode n = json.readTree(CliRun.of("limits", "R3 +0.2/0", "--blend", "fillet", "--format", "json").out());
        assertThat(n.at("/crescent/minArcOffset").asDouble()).isZero();
        assertThat(n.get("profileZone").asDouble()).isCloseTo(0.1657, within(5e-5));
        assertThat(n.get("profileZoneShortcut").asDouble()).isCloseTo(0.4, within(1e-12));
        assertThat(n.at("/unequalProfile/isoOffset").asDouble()).isCloseTo(0.0414, within(5e-5));
        assertThat(n.at("/unequalProfile/outward").asDouble()).isCloseTo(0.0828, within(5e-5));
    }

    @Test
    void maxOnlyHasNoNominalAndNoShortcutAndSaysWhy() throws Exception {
        CliRun text = CliRun.of("limits", "R .060 MAX", "--units", "in", "--blend", "fillet");
        assertThat(text.out()).doesNotContain("mean of the limits").contains("none drawn")
                .contains("omitted").doesNotContain("common shortcut").doesNotContain("UZ");
        JsonNode n = json.readTree(CliRun.of("limits", "R .060 MAX", "--units", "in", "--format", "json").out());
        assertThat(n.get("nominal").isNull()).isTrue();
        assertThat(n.get("mean").isNull()).isTrue();
        assertThat(n.get("profileZoneShortcut").isNull()).isTrue();
        assertThat(n.get("profileZoneOmitted").asText()).contains("no nominal");
        // The crescent is still given, from a sharp corner: 0.060 × (√2 − 1) = 0.0249.
        assertThat(n.get("crescentWidth").asDouble()).isCloseTo(0.0249, within(5e-5));
    }

    @Test
    void aZoneCentredOnTheNominalNeverPrintsAZeroUzOffset() {
        CliRun run = CliRun.of("limits", "R0.55 ±0.05", "--blend", "round");
        assertThat(run.out()).doesNotContain("UZ0.0000").doesNotContain("UZ+0.0000").doesNotContain("UZ-0.0000")
                .contains("no UZ offset");
    }

    @Test
    void aCentredZoneHasAPlainZeroOffsetInJson() throws Exception {
        // R0.55 ±0.05 round: the zone is centred on the nominal arc (crescent geometry, common practice), so its ISO
        // offset is 0. Before: JSON "isoOffset": -0.0.
        CliRun run = CliRun.of("limits", "R0.55 ±0.05", "--blend", "round", "--format", "json");
        assertThat(json.readTree(run.out()).at("/unequalProfile/isoOffset").toString()).isEqualTo("0.0");
    }

    @Test
    void minOnlySaysWhyNoZoneIsGivenInTextAndJson() throws Exception {
        // R1 MIN has no upper limit: no crescent, no zone about a nominal, no shortcut (no deviation).
        CliRun text = CliRun.of("limits", "R1 MIN");
        assertThat(text.out()).contains("profile zone   —  omitted: a MIN-only radius has no upper limit");
        JsonNode n = json.readTree(CliRun.of("limits", "R1 MIN", "--format", "json").out());
        assertThat(n.get("profileZone").isNull()).isTrue();
        assertThat(n.get("profileZoneOmitted").asText()).contains("no upper limit");
    }

    @Test
    void theShortcutIsTwiceTheLargerDeviationAsWritten() throws Exception {
        // 2 × 0.3 = 0.6 exactly (the shortcut's own definition). Before: 0.5999999999999996 from 3.3 − 3.
        JsonNode n = json.readTree(CliRun.of("limits", "R3 +0.3/+0.1", "--format", "json").out());
        assertThat(n.get("profileZoneShortcut").asText()).isEqualTo("0.6");
        JsonNode in = json.readTree(CliRun.of("limits", "R.120 +.010/+.004", "--units", "in", "--format", "json").out());
        assertThat(in.get("profileZoneShortcut").asText()).isEqualTo("0.02");
    }

    @Test
    void aTinyAngleIsRefusedAndANearlyStraightOneKeepsItsDigits() {
        CliRun tiny = CliRun.of("limits", "R1 ±0.1", "--angle", "1e-300");
        assertThat(tiny.exitCode()).isEqualTo(2);
        assertThat(tiny.err()).contains("below 1°");
        CliRun flat = CliRun.of("limits", "R1 ±0.1", "--angle", "179.9999999");
        assertThat(flat.exitCode()).isZero();
        assertThat(flat.out()).contains("179.9999999°").doesNotContain("180°");
    }

    @Test
    void textOutputNamesBothProfileValuesAndWhichIsWhich() {
        CliRun run = CliRun.of("limits", "R0.55 +/-0.05");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("0.0414  geometric").contains("0.1000  common shortcut");
    }

    @Test
    void inchSingleLimitIsReadWithInchUnits() throws Exception {
        JsonNode n = json.readTree(CliRun.of("limits", "R .060 MAX", "--units", "in", "--format", "json").out());
        assertThat(n.get("units").asText()).isEqualTo("in");
        assertThat(n.get("min").isNull()).isTrue();
        assertThat(n.get("max").asDouble()).isEqualTo(0.06);
        assertThat(n.at("/callout/asme").asText()).isEqualTo("R.060 MAX");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "R-0.5 ±0.1 | --angle=90 | expected a number",
            "R0 ±0.05   | --angle=90 | greater than zero",
            "CR 2.0-1.5 | --angle=90 | min 2.0 is greater than max 1.5",
            "R NaN      | --angle=90 | NaN",
            "R0.5 ±0.1  | --angle=NaN | not a number",
            "R0.5 ±0.1  | --angle=180 | between 0 and 180",
    })
    void badInputExitsWithTwoAndAClearMessage(String text, String angle, String message) {
        CliRun run = CliRun.of("limits", text, angle);
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains(message);
        assertThat(run.out()).isEmpty();
    }

    @ParameterizedTest(name = "--angle {0}")
    @CsvSource({"1.5f", "0x1p6", "90d", "NaN", "Infinity"})
    void javaLiteralFormsAreNotNumbersOnTheCommandLine(String angle) {
        CliRun run = CliRun.of("limits", "R1 ±0.1", "--angle", angle);
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("not a number");
    }

    @Test
    void anUnsignedDeviationIsBadInput() {
        CliRun run = CliRun.of("limits", "R3 +0.2/31");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("has no sign");
        assertThat(run.out()).isEmpty();
    }

    @Test
    void unknownUnitsIsBadInput() {
        CliRun run = CliRun.of("limits", "R1 ±0.1", "--units", "cubit");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("unknown units 'cubit'");
    }

    @Test
    void helpExitsZero() {
        assertThat(CliRun.of("--help").exitCode()).isZero();
        assertThat(CliRun.of("limits", "--help").exitCode()).isZero();
    }

    @Test
    void unknownCommandIsAUsageError() {
        CliRun run = CliRun.of("limitz");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("limitz");
    }
}
