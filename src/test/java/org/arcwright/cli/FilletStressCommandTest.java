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

/** {@code arcwright fillet-stress}, run in-process. */
class FilletStressCommandTest {
    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    }

    private Path file(String json) throws Exception {
        Path f = dir.resolve("fillet.json");
        Files.writeString(f, json);
        return f;
    }

    private JsonNode json() throws Exception { return new ObjectMapper().readTree(out.toString()); }

    /** Roark's Formulas for Stress and Strain, Table 17.1 worked case: tension K_t 1.515 (within 2%). */
    @Test
    void singleRadiusGivesKtAndWithinFit() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "tension", "D": 10, "d": 6.35, "r": 1.5}
                """);
        assertThat(run("fillet-stress", f.toString(), "--format", "json")).isZero();
        JsonNode j = json();
        assertThat(j.get("kt").asDouble()).isCloseTo(1.515, within(0.02 * 1.515));
        assertThat(j.get("withinFit").asBoolean()).isTrue();
        assertThat(j.has("kf")).isFalse();
        assertThat(j.get("cautions").toString()).contains("licensed engineer");
    }

    @Test
    void toleranceWithStrengthGivesKtAndKfAtEachLimit() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32,
                 "rMin": 2.8, "rMax": 3.0, "ultimateStrength": {"value": 100, "units": "ksi"}}
                """);
        assertThat(run("fillet-stress", f.toString(), "--format", "json")).isZero();
        JsonNode j = json();
        for (String k : new String[] {"atMin", "atNominal", "atMax"}) {
            assertThat(j.get(k).has("r")).isTrue();
            assertThat(j.get(k).has("kt")).isTrue();
            assertThat(j.get(k).has("kf")).isTrue();
        }
        assertThat(j.get("atMin").get("kt").asDouble()).isGreaterThan(j.get("atMax").get("kt").asDouble());
        assertThat(j.get("q").asDouble()).isBetween(0.8, 0.9);
    }

    @Test
    void targetTheMinimumMissesIsAFailVerdict() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32,
                 "rMin": 0.8, "rMax": 1.2, "targetKt": 2.2}
                """);
        assertThat(run("fillet-stress", f.toString(), "--format", "json")).isEqualTo(Cli.FAIL);
        JsonNode j = json();
        assertThat(j.get("minimumRadius").asDouble()).isBetween(0.8, 1.2);
        assertThat(j.get("rMinMeetsTarget").asBoolean()).isFalse();
    }

    @Test
    void targetTheMinimumMeetsPassesInText() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32,
                 "rMin": 0.8, "rMax": 1.2, "targetKt": 2.5}
                """);
        assertThat(run("fillet-stress", f.toString())).isZero();
        assertThat(out.toString()).contains("verdict    PASS").contains("caution: Fatigue-critical parts");
    }

    /** Shigley 10th ed. Table 7-1: sharp shoulder in torsion (r/d = 0.02, D/d = 1.5) lies beyond the fit. */
    @Test
    void sharpTorsionIsReportedAsExtrapolated() throws Exception {
        Path f = file("""
                {"units": "in", "shape": "stepped-shaft", "load": "torsion", "D": 1.5, "d": 1.0, "r": 0.02}
                """);
        assertThat(run("fillet-stress", f.toString(), "--format", "json")).isZero();
        JsonNode j = json();
        assertThat(j.get("withinFit").asBoolean()).isFalse();
        assertThat(j.get("notes").toString()).contains("extrapolated");
        out.getBuffer().setLength(0);
        run("fillet-stress", f.toString());
        assertThat(out.toString()).contains("(extrapolated)");
    }

    @Test
    void largerSizeNotAboveSmallerIsBadInputAtItsLine() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending",
                 "D": 30, "d": 32, "r": 1}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("fillet.json:2:").contains("D: the larger size D = 30 must exceed");
    }

    @Test
    void calloutAsDrawnGivesTheLimits() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 42, "d": 35, "callout": "R2 +0.2/-0.1"}
                """);
        assertThat(run("fillet-stress", f.toString(), "--format", "json")).isZero();
        JsonNode j = json();
        assertThat(j.get("atMin").get("r").asDouble()).isEqualTo(1.9);
        assertThat(j.get("atNominal").get("r").asDouble()).isEqualTo(2.0);
        assertThat(j.get("atMax").get("r").asDouble()).isEqualTo(2.2);
    }

    @Test
    void calloutWithOneLimitIsBadInputAtItsLine() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 42, "d": 35,
                 "callout": "R2 MAX"}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("fillet.json:2:").contains("callout: 'R2 MAX' does not give both limits");
    }

    @Test
    void negativeStrengthIsBadInputAtItsNestedField() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32, "r": 1,
                 "ultimateStrength": {
                    "value": -690, "units": "MPa"}}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("fillet.json:3:").contains("ultimateStrength.value: must be greater than zero");
    }

    @Test
    void zeroRadiusIsBadInput() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32, "r": 0}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("r: must be greater than zero");
    }

    @Test
    void filletLargerThanTheStepIsBadInput() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32,
                 "rMin": 2, "rMax": 4}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("fillet.json:2:").contains("rMax: fillet radius 4 is larger than the step");
    }

    @Test
    void missingLoadIsBadInput() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "D": 38, "d": 32, "r": 1}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("load: missing; use tension, bending or torsion");
    }

    @Test
    void misspeltFieldIsBadInputListingTheKnownOnes() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32, "radius": 1}
                """);
        assertThat(run("fillet-stress", f.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("unknown field 'radius'").contains("rMin");
    }

    @Test
    void plotIsWrittenAsPngOrRefusedForOtherExtensions() throws Exception {
        Path f = file("""
                {"units": "mm", "shape": "stepped-bar", "load": "bending", "D": 60, "d": 40, "rMin": 3, "rMax": 4}
                """);
        Path png = dir.resolve("kt.png");
        assertThat(run("fillet-stress", f.toString(), "--plot", png.toString())).isZero();
        assertThat(Files.size(png)).isGreaterThan(10_000);
        assertThat(run("fillet-stress", f.toString(), "--plot", dir.resolve("kt.gif").toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("--plot: give a file ending in .png or .svg");
    }
}
