package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GeneralToleranceCommandTest {
    private final ObjectMapper json = new ObjectMapper();

    @Test
    void radiusLooksUpTheBrokenEdgeTable() throws Exception {
        // ISO 2768-1:1989 Table 2: class m, over 3 up to 6 mm: ±0.5.
        CliRun run = CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--format", "json");
        assertThat(run.exitCode()).isZero();
        JsonNode n = json.readTree(run.out());
        assertThat(n.get("tolerance").asDouble()).isEqualTo(0.5);
        assertThat(n.get("class").asText()).isEqualTo("m");
        assertThat(n.get("range").asText()).isEqualTo("over 3 up to 6 mm");
    }

    @Test
    void aFilletRadiusIsALinearSizeAndARoundABrokenEdge() throws Exception {
        // ISO 2768-1:1989: an internal fillet radius is a linear size, Table 1, R4 class m (over 3 up to 6): ±0.1;
        // an external round is a broken edge, Table 2, same range and class: ±0.5
        JsonNode fillet = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--blend", "fillet",
                "--format", "json").out());
        assertThat(fillet.get("tolerance").asDouble()).isEqualTo(0.1);
        assertThat(fillet.get("table").asText()).isEqualTo("iso2768-1-linear");
        JsonNode round = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--blend", "round",
                "--format", "json").out());
        assertThat(round.get("tolerance").asDouble()).isEqualTo(0.5);
        // without --blend both readings are named
        CliRun both = CliRun.of("general-tolerance", "--class", "m", "--radius", "4");
        assertThat(both.out()).contains("±0.5 mm", "internal fillet radius it is a linear size: ±0.1 mm", "--blend");
        JsonNode bothJson = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--format", "json")
                .out());
        assertThat(bothJson.get("asInternalFillet").get("tolerance").asDouble()).isEqualTo(0.1);
        assertThat(CliRun.of("general-tolerance", "--class", "m", "--linear", "4", "--blend", "fillet").exitCode())
                .isEqualTo(Cli.BAD_INPUT);
    }

    @Test
    void theFormattedToleranceOfAnInchSizeIsInInchesWithItsUnit() throws Exception {
        // ISO 2768-1:1989 Table 2: class m, over 6 mm (4 in = 101.6 mm): ±1 mm = ±0.03937 in.
        // Before: "formatted" said "±1", the millimetre value with no unit, beside an inch tolerance.
        JsonNode in = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--units", "in",
                "--format", "json").out());
        assertThat(in.get("tolerance").asDouble()).isCloseTo(1 / 25.4, within(1e-12));
        assertThat(in.get("formatted").asText()).isEqualTo("±0.03937 in");
        JsonNode mm = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--format", "json").out());
        assertThat(mm.get("formatted").asText()).isEqualTo("±0.5 mm");
    }

    @Test
    void aCastRadiusReadsTheCastingsTableWithoutIso2768Readings() throws Exception {
        // ISO 8062-3:2007 Table 2, DCTG 10 (class m of the castings table): 2 mm total up to 10 mm, so R5 is ±1 mm,
        // fillet or round alike. Before: the text read it "as an external round or chamfer height", an ISO 2768-1
        // Table 2 reading, and JSON said "quantity": "radius-chamfer" for a linear-size table.
        CliRun text = CliRun.of("general-tolerance", "--table", "castings-radius-general", "--class", "m", "--radius", "5");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).startsWith("radius 5 mm, class m (DCTG 10").contains("±1 mm").doesNotContain("chamfer height")
                .doesNotContain("--blend");
        JsonNode n = json.readTree(CliRun.of("general-tolerance", "--table", "castings-radius-general", "--class", "m",
                "--radius", "5", "--blend", "fillet", "--format", "json").out());
        assertThat(n.get("tolerance").asDouble()).isEqualTo(1.0);
        assertThat(n.get("quantity").asText()).isEqualTo("linear");
        assertThat(n.get("table").asText()).isEqualTo("castings-radius-general");
    }

    @Test
    void linearAndAngularUseTheirOwnTables() throws Exception {
        // ISO 2768-1:1989 Table 1: class c, over 120 up to 400 mm: ±1.2.
        assertThat(json.readTree(CliRun.of("general-tolerance", "--class", "c", "--linear", "250", "--format", "json")
                .out()).get("tolerance").asDouble()).isEqualTo(1.2);
        // ISO 2768-1:1989 Table 3: class f, shorter side over 10 up to 50 mm: ±0°30'.
        JsonNode a = json.readTree(CliRun.of("general-tolerance", "--class", "f", "--angle-side", "35", "--format",
                "json").out());
        assertThat(a.get("tolerance").asDouble()).isEqualTo(0.5);
        assertThat(a.get("formatted").asText()).isEqualTo("±0°30'");
    }

    @Test
    void inchSizesConvertBothWays() throws Exception {
        // 0.25 in = 6.35 mm, over 6 mm in ISO 2768-1 Table 2 class m: ±1 mm = ±0.03937 in.
        JsonNode n = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "0.25", "--units", "in",
                "--format", "json").out());
        assertThat(n.get("tolerance").asDouble()).isCloseTo(1 / 25.4, within(1e-12));
    }

    @Test
    void companyTableInATeamPackReplacesTheBuiltInOne(@TempDir Path dir) throws Exception {
        Path pack = dir.resolve("team");
        Files.createDirectories(pack.resolve("tables"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Demo team\"}");
        Files.writeString(pack.resolve("tables/edges.json"), """
                {"kind": "general-tolerance", "id": "iso2768-1-radius-chamfer", "title": "Demo works edges",
                 "source": "invented demo table", "quantity": "radius-chamfer", "units": "mm",
                 "ranges": [{"from": 0.2, "upTo": 10}], "classes": {"m": [0.1]}}
                """);
        JsonNode n = json.readTree(CliRun.of("general-tolerance", "--class", "m", "--radius", "4", "--pack",
                pack.toString(), "--format", "json").out());
        assertThat(n.get("tolerance").asDouble()).isEqualTo(0.1);
        assertThat(n.get("source").asText()).isEqualTo("invented demo table");
    }

    @Test
    void badInputExitsTwoWithTheReason() {
        CliRun unknownClass = CliRun.of("general-tolerance", "--class", "x", "--radius", "4");
        assertThat(unknownClass.exitCode()).isEqualTo(2);
        assertThat(unknownClass.err()).contains("unknown tolerance class 'x'");

        CliRun outside = CliRun.of("general-tolerance", "--class", "m", "--radius", "0.3");
        assertThat(outside.exitCode()).isEqualTo(2);
        assertThat(outside.err()).contains("--radius").contains("outside every range");

        CliRun negative = CliRun.of("general-tolerance", "--class", "m", "--radius", "-2");
        assertThat(negative.exitCode()).isEqualTo(2);
        assertThat(negative.err()).contains("greater than zero");

        CliRun nan = CliRun.of("general-tolerance", "--class", "m", "--linear", "NaN");
        assertThat(nan.exitCode()).isEqualTo(2);

        CliRun dash = CliRun.of("general-tolerance", "--class", "v", "--linear", "2");
        assertThat(dash.exitCode()).isEqualTo(2);
        assertThat(dash.err()).contains("no general tolerance for class v");

        CliRun none = CliRun.of("general-tolerance", "--class", "m");
        assertThat(none.exitCode()).isEqualTo(2);
    }
}
