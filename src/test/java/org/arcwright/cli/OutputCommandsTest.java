package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code render}, {@code sheet} and {@code note}, run in-process. */
class OutputCommandsTest {
    private static final String DEMO = "examples/tarnbeck-output-shaft-decided.arcpart";

    private record Run(int code, String out, String err) {}

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    private static Path callout(Path dir, String json) throws Exception {
        Path f = dir.resolve("callout.json");
        Files.writeString(f, json);
        return f;
    }

    @Test
    void renderWritesSvgPngAndText(@TempDir Path dir) throws Exception {
        Path in = callout(dir, "{\"units\": \"mm\", \"standard\": \"asme\", \"callout\": "
                + "{\"type\": \"profile\", \"zone\": 0.1, \"datums\": [\"A\", \"B\"]}}");
        assertThat(run("render", in.toString(), "--out", dir.resolve("f.svg").toString()).code()).isZero();
        assertThat(Files.readString(dir.resolve("f.svg"))).startsWith("<?xml").contains("<svg");
        assertThat(run("render", in.toString(), "--out", dir.resolve("f.png").toString(), "--dpi", "150").code()).isZero();
        assertThat(Files.readAllBytes(dir.resolve("f.png"))).startsWith(0x89, 'P', 'N', 'G');
        assertThat(run("render", in.toString(), "--out", dir.resolve("f.txt").toString(), "--unicode").code()).isZero();
        assertThat(Files.readString(dir.resolve("f.txt"))).isEqualTo("|\u2313|0.1|A|B|\n");
        Run printed = run("render", in.toString());
        assertThat(printed.out()).contains("| PROFILE | 0.1 | A | B |", "|\u2313|0.1|A|B|");
    }

    @Test
    void aCalloutMissingItsZoneIsBadInputNamingTheField(@TempDir Path dir) throws Exception {
        Path in = callout(dir, "{\"units\": \"mm\", \"standard\": \"asme\",\n \"callout\": {\"type\": \"profile\", \"datums\": [\"A\"]}}");
        Run r = run("render", in.toString(), "--out", dir.resolve("f.svg").toString());
        assertThat(r.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains("callout.json:2:", "callout", "zone");
        assertThat(dir.resolve("f.svg")).doesNotExist();
    }

    @Test
    void anUnknownOutputTypeIsBadInput(@TempDir Path dir) throws Exception {
        Path in = callout(dir, "{\"units\": \"mm\", \"standard\": \"asme\", \"callout\": {\"type\": \"radius\", \"min\": 1, \"max\": 1.2}}");
        Run r = run("render", in.toString(), "--out", dir.resolve("f.gif").toString());
        assertThat(r.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains("use .svg, .png or .txt");
    }

    @Test
    void sheetExportsEachFormat(@TempDir Path dir) throws Exception {
        for (String ext : new String[] {"md", "html", "pdf"}) {
            Path out = dir.resolve("sheet." + ext);
            Run r = run("sheet", DEMO, "--out", out.toString());
            assertThat(r.code()).as(r.err()).isZero();
            assertThat(r.out()).contains("5 features, 1 undecided");
            assertThat(Files.size(out)).isGreaterThan(1000);
        }
    }

    @Test
    void noteFillsABuiltInTemplate() {
        Run r = run("drawing-note", "edge-break-notes", DEMO);
        assertThat(r.code()).isZero();
        assertThat(r.out()).isEqualTo("EDGES:\n- F4 Shaft end edge round: BREAK EDGE R1 ±0.2 (ISO 2768-m).\n");
        Run one = run("drawing-note", "callout-note", DEMO, "--feature", "F2");
        assertThat(one.out()).startsWith("F2 Bearing seat fillet").doesNotContain("F1 ");
        // an undecided feature has no note: said, not printed as a dangling "F5 <label>: " line
        Run open = run("drawing-note", "callout-note", DEMO, "--feature", "F5");
        assertThat(open.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(open.out()).isEmpty();
        assertThat(open.err()).contains("F5 has no callout chosen yet");
    }

    @Test
    void noteRejectsATemplateFileNamingAnUnknownField(@TempDir Path dir) throws Exception {
        Path t = dir.resolve("mine.mustache");
        Files.writeString(t, "PART {{part.number}}\nCLASS {{titleBlock.klass}}\n");
        Run r = run("drawing-note", t.toString(), DEMO);
        assertThat(r.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains("mine.mustache:2:7", "titleBlock.klass", "toleranceClass");
    }

    @Test
    void anIsoDynamicProfileIsDrawnWithOzAndAnAsmeOneWithTheTriangle(@TempDir Path dir) throws Exception {
        // ISO 1101:2017: a zone whose offset is not specified is marked OZ; ASME Y14.5-2018 marks a dynamic profile
        // with the triangle. Before: an ISO frame carried "(DYN)" and the triangle. Inch twin: .1 in (ASME) / 0.1 (ISO).
        for (String units : new String[] {"mm", "in"}) {
            Run iso = run("render", callout(dir, "{\"units\": \"" + units + "\", \"standard\": \"iso\", \"callout\": "
                    + "{\"type\": \"profile\", \"zone\": 0.1, \"dynamic\": true, \"datums\": [\"A\"]}}").toString());
            assertThat(iso.code()).isZero();
            assertThat(iso.out()).contains("| PROFILE | 0.1 OZ | A |").contains("|\u2313|0.1 OZ|A|")
                    .doesNotContain("(DYN)").doesNotContain("\u25B3");
            Run asme = run("render", callout(dir, "{\"units\": \"" + units + "\", \"standard\": \"asme\", \"callout\": "
                    + "{\"type\": \"profile\", \"zone\": 0.1, \"dynamic\": true, \"datums\": [\"A\"]}}").toString());
            assertThat(asme.out()).contains("(DYN)").contains("\u25B3").doesNotContain("OZ");
        }
        // UZ and OZ together: ISO 1101 states an offset or leaves it unspecified, not both; refused with the field
        Run both = run("render", callout(dir, "{\"units\": \"mm\", \"standard\": \"iso\", \"callout\": "
                + "{\"type\": \"profile\", \"zone\": 0.1, \"dynamic\": true, \"outward\": 0.02}}").toString());
        assertThat(both.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(both.err()).contains("callout.json:1:").contains("either a stated offset (UZ) or an unspecified one (OZ");
    }

    @Test
    void isoNotesSayControlledRadiusOnlyAsACompanyNoteIsoDoesNotDefine(@TempDir Path dir) throws Exception {
        // ISO 1101 / ISO 129-1 define no controlled radius (ASME Y14.5-2018 does): under ISO the CR's smoothness is a
        // company note, and the title-block note speaks of indications, not of CR callouts.
        String demo = Files.readString(Path.of(DEMO)).replace("\"standard\": \"asme\"", "\"standard\": \"iso\"");
        Path iso = dir.resolve("iso.arcpart");
        Files.writeString(iso, demo);
        Run note = run("drawing-note", "callout-note", iso.toString(), "--feature", "F1", "--no-settings");
        assertThat(note.code()).as(note.err()).isZero();
        assertThat(note.out()).contains("R2 ±0.2").contains("COMPANY NOTE, NOT DEFINED BY ISO 1101 OR ISO 129-1")
                .doesNotContain("CONTROLLED RADIUS").doesNotContain("CR2");
        Run block = run("drawing-note", "title-block-notes", iso.toString(), "--no-settings");
        assertThat(block.out()).contains("ISO 2768-1 TABLE 1").doesNotContain(" CR ").doesNotContain("CONTROLLED RADIUS");
        Run asme = run("drawing-note", "callout-note", DEMO, "--feature", "F1", "--no-settings");
        assertThat(asme.out()).contains("CONTROLLED RADIUS BETWEEN 1.8 AND 2.2 mm").contains("AS A FAIR CURVE WITHOUT FLATS OR REVERSALS");
    }

    @Test
    void renderingAControlledRadiusOnAnIsoDrawingSaysIsoHasNone(@TempDir Path dir) throws Exception {
        Path in = callout(dir, "{\"units\": \"mm\", \"standard\": \"iso\", \"callout\": "
                + "{\"type\": \"controlled-radius\", \"min\": 1.8, \"max\": 2.2}}");
        Run r = run("render", in.toString());
        assertThat(r.code()).isZero();
        assertThat(r.out()).isEqualTo("R1.8-2.2\nR1.8-2.2\n");
        assertThat(r.err()).contains("note: Controlled radius (CR) is an ASME Y14.5 concept with no ISO equivalent");
    }

    @Test
    void sheetShowsTheAdvisorsSuggestionUnlessToldNotTo(@TempDir Path dir) throws Exception {
        Path with = dir.resolve("with.md");
        Path without = dir.resolve("without.md");
        assertThat(run("sheet", DEMO, "--out", with.toString()).code()).isZero();
        assertThat(run("sheet", DEMO, "--out", without.toString(), "--no-suggest").code()).isZero();
        assertThat(Files.readString(with)).contains("The advisor suggests (not chosen");
        assertThat(Files.readString(without)).doesNotContain("The advisor suggests");
    }
}
