package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An inch twin of a millimetre run for every command: the same part written in inches (1 in =
 * 25.4 mm exactly, ISO 31-1 / NIST SP 811) must give the same answer, reported in inches, with no
 * length read in the wrong unit. Clearance's twins live in {@link ClearanceCommandTest}; limits,
 * general-tolerance, fillet-stress, inspect, render, drawing-note, sheet, advise and simulate are here.
 */
class InchTwinsTest {
    private static final double MM = 25.4;
    private final ObjectMapper json = new ObjectMapper();

    @TempDir
    Path dir;

    private JsonNode run(String... args) throws Exception {
        CliRun r = CliRun.of(args);
        assertThat(r.exitCode()).as(String.join(" ", args) + "\n" + r.err()).isIn(0, 1);
        return json.readTree(r.out());
    }

    @Test
    void limits() throws Exception {
        // R.120 +.012/+.004 in is R3.048 +0.3048/+0.1016 mm: zone 2 × 0.3048 × (√2 − 1) mm (worked by hand).
        JsonNode in = run("limits", "R.120 +.012/+.004", "--units", "in", "--format", "json");
        JsonNode mm = run("limits", "R3.048 +0.3048/+0.1016", "--format", "json");
        assertThat(in.get("units").asText()).isEqualTo("in");
        assertThat(in.get("profileZone").asDouble() * MM).isCloseTo(mm.get("profileZone").asDouble(), within(1e-9));
        assertThat(in.get("profileZoneShortcut").asDouble() * MM).isCloseTo(0.6096, within(1e-9));
    }

    @Test
    void generalTolerance() throws Exception {
        // ISO 2768-1 Table 2, class m, over 3 up to 6 mm: ±0.5 mm; 0.1575 in = 4.0 mm, so ±0.5/25.4 in.
        JsonNode in = run("general-tolerance", "--class", "m", "--radius", "0.1575", "--units", "in", "--format", "json");
        assertThat(in.get("toleranceUnits").asText()).isEqualTo("in");
        assertThat(in.get("tolerance").asDouble()).isCloseTo(0.5 / MM, within(1e-12));
    }

    @Test
    void generalToleranceByBlendKind() throws Exception {
        // ISO 2768-1:1989 class m, R4 (over 3 up to 6 mm): internal fillet = linear size, Table 1, ±0.1 mm; external
        // round = broken edge, Table 2, ±0.5 mm. 4 mm = 0.15748 in; each tolerance comes back in inches, with its unit.
        for (String[] k : new String[][] {{"fillet", "0.1"}, {"round", "0.5"}}) {
            JsonNode mm = run("general-tolerance", "--class", "m", "--radius", "4", "--blend", k[0], "--format", "json");
            JsonNode in = run("general-tolerance", "--class", "m", "--radius", "0.15748", "--units", "in", "--blend", k[0],
                    "--format", "json");
            assertThat(mm.get("tolerance").asDouble()).isEqualTo(Double.parseDouble(k[1]));
            assertThat(in.get("tolerance").asDouble() * MM).as(k[0]).isCloseTo(mm.get("tolerance").asDouble(), within(1e-9));
            assertThat(in.get("table").asText()).isEqualTo(mm.get("table").asText());
            assertThat(in.get("formatted").asText()).endsWith(" in").doesNotContain("±" + k[1] + " ");
        }
    }

    @Test
    void simulate() throws Exception {
        // The pump-bracket process (invented) written in inches: every length / 25.4 (a flat's width and centre are
        // fractions of the sweep, not lengths), so the same parts are drawn and judged, and every share agrees.
        ObjectNode c = (ObjectNode) json.readTree(Path.of("examples/simulate/pump-bracket.json").toFile());
        c.put("parts", 400);
        Path mmFile = dir.resolve("mm.json");
        Files.writeString(mmFile, c.toString());
        c.put("units", "in");
        c.put("nominalRadius", c.get("nominalRadius").asDouble() / MM);
        ObjectNode p = (ObjectNode) c.get("process");
        ObjectNode radius = (ObjectNode) p.get("radius");
        for (String k : new String[] {"mean", "sd"}) radius.put(k, radius.get(k).asDouble() / MM);
        ArrayNode size = (ArrayNode) p.get("step").get("size");
        for (int i = 0; i < size.size(); i++) size.set(i, json.getNodeFactory().numberNode(size.get(i).asDouble() / MM));
        p.put("noise", p.get("noise").asDouble() / MM);
        ObjectNode needs = (ObjectNode) c.get("needs");
        for (String k : new String[] {"minRadius", "maxRadius"}) needs.put(k, needs.get(k).asDouble() / MM);
        for (JsonNode callout : c.get("callouts")) {
            ObjectNode o = (ObjectNode) callout;
            for (String k : new String[] {"min", "max", "zone"}) if (o.has(k)) o.put(k, o.get(k).asDouble() / MM);
        }
        Path inFile = dir.resolve("in.json");
        Files.writeString(inFile, c.toString());
        CliRun mm = CliRun.of("simulate", mmFile.toString());
        CliRun in = CliRun.of("simulate", inFile.toString());
        assertThat(mm.exitCode()).as(mm.err()).isZero();
        assertThat(in.exitCode()).as(in.err()).isZero();
        assertThat(in.out()).contains("(lengths in in)").contains("points within 0.0002 in");
        assertThat(mm.out()).contains("points within 0.00508 mm"); // 0.0002 in × 25.4 (NIST SP 811)
        // the table of shares, line by line after the callout column, is the same
        assertThat(shares(in.out())).isEqualTo(shares(mm.out()));
    }

    /** The share columns of a simulate report (each callout row without its name). */
    private static List<String> shares(String report) {
        return report.lines().filter(l -> l.contains("%") && l.contains("(") && !l.contains("note:")).map(l -> l.replaceFirst("^.*?\\s{2,}(\\d)", "$1"))
                .toList();
    }

    @Test
    void filletStress() throws Exception {
        // Kt depends on ratios only (Peterson's charts are dimensionless), so the inch twin gives the same Kt.
        ObjectNode c = (ObjectNode) json.readTree(Path.of("examples/mechanics/drive-shaft-fillet.json").toFile());
        JsonNode mm = run("fillet-stress", "examples/mechanics/drive-shaft-fillet.json", "--format", "json");
        c.put("units", "in");
        for (String k : new String[] {"D", "d", "rMin", "rMax"}) c.put(k, c.get(k).asDouble() / MM);
        Path f = dir.resolve("in.json");
        Files.writeString(f, c.toString());
        JsonNode in = run("fillet-stress", f.toString(), "--format", "json");
        assertThat(in.get("units").asText()).isEqualTo("in");
        assertThat(in.at("/atNominal/kt").asDouble()).isCloseTo(mm.at("/atNominal/kt").asDouble(), within(1e-9));
        assertThat(in.at("/atNominal/r").asDouble() * MM).isCloseTo(mm.at("/atNominal/r").asDouble(), within(1e-9));
    }

    @Test
    void inspect() throws Exception {
        ObjectNode c = (ObjectNode) json.readTree(Path.of("examples/inspect/bracket-round-r.json").toFile());
        JsonNode mm = run("inspect", "examples/inspect/bracket-round-r.json", "--format", "json");
        c.put("units", "in");
        c.put("nominalRadius", c.get("nominalRadius").asDouble() / MM);
        c.put("resolution", c.get("resolution").asDouble() / MM);
        ObjectNode callout = (ObjectNode) c.get("callout");
        callout.put("min", callout.get("min").asDouble() / MM).put("max", callout.get("max").asDouble() / MM);
        for (JsonNode p : c.get("points")) {
            ArrayNode a = (ArrayNode) p;
            a.set(0, json.getNodeFactory().numberNode(a.get(0).asDouble() / MM));
            a.set(1, json.getNodeFactory().numberNode(a.get(1).asDouble() / MM));
        }
        Path f = dir.resolve("in.json");
        Files.writeString(f, c.toString());
        JsonNode in = run("inspect", f.toString(), "--format", "json");
        assertThat(in.get("units").asText()).isEqualTo("in");
        assertThat(in.get("verdict").asText()).isEqualTo(mm.get("verdict").asText());
        assertThat(in.at("/envelope/smallest").asDouble() * MM).isCloseTo(mm.at("/envelope/smallest").asDouble(), within(1e-6));
    }

    @Test
    void render() throws Exception {
        // ASME Y14.5 writes inch values below one without the leading zero (common practice).
        Path f = dir.resolve("in.json");
        Files.writeString(f, "{\"units\":\"in\",\"standard\":\"asme\",\"callout\":{\"type\":\"profile\",\"zone\":0.004,\"outward\":0.001}}");
        CliRun r = CliRun.of("render", f.toString());
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains(".004 (U) .001").doesNotContain("0.004");
    }

    private Path inchWorksheet() throws Exception {
        ObjectNode ws = (ObjectNode) json.readTree(Path.of("examples/tarnbeck-output-shaft-decided.arcpart").toFile());
        ws.put("units", "in");
        for (JsonNode f : ws.get("features")) ((ObjectNode) f.get("case")).put("units", "in");
        Path f = dir.resolve("part-in.arcpart");
        Files.writeString(f, ws.toString());
        return f;
    }

    @Test
    void drawingNote() throws Exception {
        CliRun r = CliRun.of("drawing-note", "title-block-notes", inchWorksheet().toString(), "--no-settings");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("DIMENSIONS ARE IN INCHES").doesNotContain("MILLIMETRES");
    }

    @Test
    void sheet() throws Exception {
        Path out = dir.resolve("part.md");
        CliRun r = CliRun.of("sheet", inchWorksheet().toString(), "--out", out.toString(), "--no-settings", "--no-suggest");
        assertThat(r.exitCode()).as(r.err()).isZero();
        String md = Files.readString(out);
        assertThat(md).contains("**Units:** inches").doesNotContain("units mixed");
    }

    @Test
    void advise() throws Exception {
        ObjectNode c = (ObjectNode) json.readTree(Path.of("examples/advisor/gear-seat-shoulder.json").toFile());
        JsonNode mm = run("advise", "examples/advisor/gear-seat-shoulder.json", "--format", "json", "--no-settings");
        c.put("units", "in");
        c.put("nominalRadius", 2.0 / MM);
        ObjectNode s = (ObjectNode) c.get("stress");
        s.put("D", 42 / MM).put("d", 35 / MM);
        c.remove("tolerance");
        Path f = dir.resolve("in.json");
        Files.writeString(f, c.toString());
        JsonNode in = run("advise", f.toString(), "--format", "json", "--no-settings");
        double ktMm = mm.at("/recommendations/0/numbers/ktAtMin").asDouble();
        double ktIn = in.at("/recommendations/0/numbers/ktAtMin").asDouble();
        // Limits are rounded to the units' places, so Kt agrees to the rounding of r (0.0001 in), not exactly.
        assertThat(ktIn).isCloseTo(ktMm, within(0.01));
        assertThat(in.at("/recommendations/0/numbers/min").asDouble() * MM)
                .isCloseTo(mm.at("/recommendations/0/numbers/min").asDouble(), within(0.01));
    }
}
