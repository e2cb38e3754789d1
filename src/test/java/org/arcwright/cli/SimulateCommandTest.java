package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.arcwright.simulate.Share;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/** {@code arcwright simulate}: the JSON contract, the caution, and located bad input. Invented process figures. */
class SimulateCommandTest {
    private static final String FILE = """
            {
              "units": "mm",
              "corner": {"vertex": [0, 0], "legA": [1, 0], "legB": [0, 1], "kind": "fillet"},
              "nominalRadius": 2.0,
              "process": {
                "radius": {"mean": 2.02, "sd": 0.05},
                "flat": {"rate": 0.1, "width": [0.1, 0.2], "centre": [0.4, 0.6]},
                "points": 60
              },
              "needs": {"minRadius": 1.95, "maxRadius": 2.2},
              "callouts": [{"type": "radius", "min": 1.9, "max": 2.1}, {"type": "controlled-radius", "min": 1.95, "max": 2.15}],
              "parts": 20000,
              "seed": 11
            }
            """;

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path f = dir.resolve("bracket.json");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void jsonCarriesSharesAndIntervalsOfAllParts() throws IOException {
        CliRun r = CliRun.of("simulate", write(FILE).toString(), "--parts", "300", "--format", "json");
        assertThat(r.exitCode()).isEqualTo(Cli.OK);
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("parts").asInt()).isEqualTo(300);
        assertThat(j.get("good").asInt()).isBetween(1, 300);
        JsonNode c = j.get("callouts").get(0);
        assertThat(c.get("callout").get("type").asText()).isEqualTo("radius");
        assertThat(c.get("text").asText()).isEqualTo("R 1.9-2.1");
        for (String f : new String[] {"accepted", "escapes", "falseRejects"}) {
            double v = c.get(f).asDouble();
            JsonNode iv = c.get(f.equals("escapes") ? "escapesInterval" : f + "Interval");
            assertThat(iv.get(0).asDouble()).isLessThanOrEqualTo(v);
            assertThat(iv.get(1).asDouble()).isGreaterThanOrEqualTo(v);
        }
        assertThat(j.get("caution").asText()).contains("model, not the shop's capability data");
    }

    @Test
    void textShowsEveryCalloutAndTheCaution() throws IOException {
        CliRun r = CliRun.of("simulate", write(FILE).toString(), "--parts", "200", "--seed", "3");
        assertThat(r.exitCode()).isEqualTo(Cli.OK);
        assertThat(r.out()).contains("simulated 200 parts, seed 3").contains("R 1.9-2.1").contains("CR 1.95-2.15")
                .contains("escapes").contains("false rejects").contains("licensed engineering judgement");
    }

    @Test
    void badInputExitsTwoNamingFileLineAndField() throws IOException {
        Path f = write(FILE.replace("\"points\": 60", "\"points\": 2"));
        CliRun r = CliRun.of("simulate", f.toString());
        assertThat(r.exitCode()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains(f.toString() + ":").contains("process.points").contains("at least 3");
    }

    /**
     * picocli formats help text with {@code String.format}; a bare {@code %} ("95 % intervals") made it
     * warn on standard error and print the raw line.
     */
    @Test
    void helpTextFormatsWithoutWarning() {
        CommandLine sim = Cli.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()))
                .getSubcommands().get("simulate");
        List<String> lines = new ArrayList<>(List.of(sim.getCommandSpec().usageMessage().description()));
        for (OptionSpec o : sim.getCommandSpec().options()) lines.addAll(List.of(o.description()));
        for (String line : lines) assertThatCode(() -> String.format(line)).as(line).doesNotThrowAnyException();
        assertThat(CliRun.of("simulate", "--help").out()).contains("with 95 %").doesNotContain("%%");
    }

    @Test
    void badPartsArgumentExitsTwo() throws IOException {
        CliRun r = CliRun.of("simulate", write(FILE).toString(), "--parts", "0");
        assertThat(r.exitCode()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains("--parts");
    }

    @Test
    void sharesOnATieRoundHalfToEvenLikeEveryOtherFigure() {
        // 16,633 of 20,000 parts is 83.165 %: half to even, ISO 80000-1:2009 Annex B, rule A (from memory);
        // the Wilson bounds are the closed form of Share, checked in ShareTest
        Share tie = Share.of(16_633, 20_000);
        assertThat(SimulateCommand.pct(tie.share())).isEqualTo("83.16 %");
        assertThat(SimulateCommand.cell(tie)).startsWith(" 83.16 % (");
        assertThat(AdviceSimulation.cell(tie)).startsWith("83.16 % [");
        assertThat(SimulateCommand.cell(Share.of(0, 20_000))).startsWith("  0.00 % (0.00-0.02)");
    }
}
