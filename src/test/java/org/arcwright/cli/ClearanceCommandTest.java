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
