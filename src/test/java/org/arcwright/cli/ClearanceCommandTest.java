package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code arcwright clearance}, run in-process. */
class ClearanceCommandTest {
    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String json, String... extra) throws Exception {
        Path f = dir.resolve("corner.json");
        Files.writeString(f, json);
        String[] args = new String[2 + extra.length];
        args[0] = "clearance";
        args[1] = f.toString();
        System.arraycopy(extra, 0, args, 2, extra.length);
        return Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    }

    @Test
    void filletWithinAnEqualLegChamferSeatsWithItsMargin() throws Exception {
        int code = run("""
                {"units": "mm", "fillet": {"rMin": 0.6, "rMax": 0.8}, "mating": {"type": "chamfer", "leg": 1.0}}
                """, "--format", "json");
        assertThat(code).isZero();
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("seats").asBoolean()).isTrue();
        assertThat(j.get("margin").asDouble()).isCloseTo(0.2, within(1e-12));
    }

    /** Bearing-seat table (makers' catalogues, consistent with ISO 582; from memory): r_s min 3 admits 2.5. */
    @Test
    void filletTooLargeForTheBearingInterferesAndFails() throws Exception {
        int code = run("""
                {"units": "mm", "fillet": {"rMin": 2.5, "rMax": 3.0}, "mating": {"type": "bearing", "chamferMin": 3}}
                """, "--format", "json");
        assertThat(code).isEqualTo(Cli.FAIL);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("seats").asBoolean()).isFalse();
        assertThat(j.get("margin").asDouble()).isCloseTo(-0.5, within(1e-12));
    }

    /**
     * The shipped example: r_s min 1.1, bore 32, so r_s max 2.0 radial (ISO 582, from memory); the flat is
     * 2.7 − 2.0 = 0.7 mm (worked by hand), short of the 1.5 mm asked for.
     */
    @Test
    void revisedBearingSeatExampleIsShortOfSupport() throws Exception {
        int code = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true))
                .execute("clearance", "examples/mechanics/bearing-seat-clearance-revised.json");
        assertThat(code).isEqualTo(Cli.FAIL);
        assertThat(out.toString()).contains("flat 0.700 mm on the shoulder (from 2.000 to 2.700): LESS THAN the required 1.5 mm")
                .contains("row used: r_s min 1.1 mm, bore up to 120 mm").doesNotContain("memory");
    }

    @Test
    void inchBearingFileIsConvertedAtTheBoundaryAndReportedInInches() throws Exception {
        // Inch twin of the example: 0.0433 in = 1.1 mm r_s min (once read as 0.0433 mm and refused), bore 1.26 in.
        int code = run("""
                {"units": "in", "fillet": {"rMin": 0.035, "rMax": 0.039},
                 "mating": {"type": "bearing", "chamferMin": 0.0433, "bore": 1.26},
                 "shoulderHeight": 0.1181, "shoulderEdgeBreak": 0.0118, "requiredSupport": 0.059}
                """, "--format", "json");
        assertThat(code).isEqualTo(Cli.FAIL);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("units").asText()).isEqualTo("in");
        assertThat(j.get("seats").asBoolean()).isTrue();
        assertThat(j.get("allowedFilletMax").asDouble()).isCloseTo(1.0 / 25.4, within(1e-9));
        // 0.1181 − 0.0118 − 2.0/25.4 = 0.02756 in ≈ 0.7 mm.
        assertThat(j.at("/support/flat").asDouble()).isCloseTo(0.1181 - 0.0118 - 2.0 / 25.4, within(1e-9));
        assertThat(j.at("/support/sufficient").asBoolean()).isFalse();
    }

    @Test
    void inchBearingChamferIsNotReadAsMillimetres() throws Exception {
        // 0.06 in = 1.524 mm: admits the 1.5 mm row's fillet (1.5 mm = 0.059 in), so R 0.04–0.05 in seats.
        int code = run("""
                {"units": "in", "fillet": {"rMin": 0.04, "rMax": 0.05}, "mating": {"type": "bearing", "chamferMin": 0.06}}
                """, "--format", "json");
        assertThat(code).isZero();
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("allowedFilletMax").asDouble()).isCloseTo(1.5 / 25.4, within(1e-9));
    }

    @Test
    void anInchRingIsDescribedInInchesAndItsConvertedChamferIsNotPrintedRaw() throws Exception {
        // 0.06 in = 1.524 mm (1 in = 25.4 mm exactly, NIST SP 811). Before: "r_s min 1.5239999999999998 mm is not a
        // listed chamfer dimension" and the ring described as "r_s min 1.524 mm" only, in a file written in inches.
        int code = run("""
                {"units": "in", "fillet": {"rMin": 0.03, "rMax": 0.04}, "mating": {"type": "bearing", "chamferMin": 0.06}}
                """);
        assertThat(code).isZero();
        assertThat(out.toString()).contains("r_s min 0.06 in (1.524 mm)").contains("r_s min 1.524 mm is not a listed")
                .doesNotContain("1.5239999");
    }

    @Test
    void anInterferenceSmallerThanThePlacesShownIsNotPrintedAsZero() throws Exception {
        // R 0.0394 in = 1.00076 mm against a ring with r_s min 1.1 (0.0433 in), which admits fillets up to 1 mm
        // (rolling-bearing seat table): it fouls by 0.00003 in. Before: "exceeds what the corner admits by 0.0000 in".
        int code = run("""
                {"units": "in", "fillet": {"rMin": 0.0354, "rMax": 0.0394}, "mating": {"type": "bearing", "chamferMin": 0.0433, "bore": 1.26}}
                """);
        assertThat(code).isEqualTo(Cli.FAIL);
        assertThat(out.toString()).contains("INTERFERES").contains("by 0.00003 in").doesNotContain("by 0.0000 in");
    }

    @Test
    void textSaysWhatGovernsAndCarriesTheCaution() throws Exception {
        int code = run("""
                {"units": "mm", "fillet": {"r": 0.8}, "mating": {"type": "radius", "rMin": 1.0},
                 "shoulderHeight": 3, "requiredSupport": 1.5}
                """);
        assertThat(code).isZero();
        assertThat(out.toString()).contains("SEATS: margin 0.200 mm").contains("meets the required 1.5 mm")
                .contains("caution:");
    }

    @Test
    void unknownCornerTypeIsBadInputAtItsLine() throws Exception {
        int code = run("""
                {"units": "mm", "fillet": {"r": 0.8},
                 "mating": {"type": "groove", "leg": 1.0}}
                """);
        assertThat(code).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("corner.json:2:").contains("mating.type: unknown type 'groove'");
    }
}
