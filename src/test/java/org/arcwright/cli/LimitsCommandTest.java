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
            "R0.5 ±0.1  | --angle=NaN | not a finite number",
            "R0.5 ±0.1  | --angle=180 | between 0 and 180",
    })
    void badInputExitsWithTwoAndAClearMessage(String text, String angle, String message) {
        CliRun run = CliRun.of("limits", text, angle);
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains(message);
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
