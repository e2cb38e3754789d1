package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.arcwright.io.JsonFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The advise and pack check commands, run in-process. */
class AdviseCommandTest {
    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    /** Runs a command; advise gets a private notes index and no personal pack, so the user's folders are not touched. */
    private int run(String... args) {
        List<String> all = new ArrayList<>(List.of(args));
        if (args[0].equals("advise")) {
            all.addAll(List.of("--notes-index", dir.resolve("notes-index").toString(),
                    "--personal", dir.resolve("no-personal-pack").toString()));
        }
        return Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(all.toArray(new String[0]));
    }

    private Path caseFile(String json) throws Exception {
        Path f = dir.resolve("case.json");
        Files.writeString(f, json);
        return f;
    }

    private static final String SHOULDER = """
            {"units": "mm", "standard": "asme", "feature": "F1 shoulder", "kind": "fillet", "nominalRadius": 2,
             "function": "stress-relief", "loading": "fatigue", "formMatters": true, "datums": ["A"], "process": "machined"}
            """;

    @Test
    void jsonAnswerListsRecommendationsBestFirstWithCalloutTextNumbersAndTrace() throws Exception {
        int code = run("advise", caseFile(SHOULDER).toString(), "--format", "json");
        assertThat(code).as(err.toString()).isZero();
        JsonNode root = new JsonFiles().mapper().readTree(out.toString());
        JsonNode first = root.get("recommendations").get(0);
        assertThat(first.get("rule").asText()).isEqualTo("stress-relief.fatigue.asme-cr");
        assertThat(first.get("callout").get("type").asText()).isEqualTo("controlled-radius");
        assertThat(first.get("callout").get("min").asDouble()).isEqualTo(2.0);
        assertThat(first.get("callout").get("max").asDouble()).isEqualTo(2.2);
        assertThat(first.get("callout").get("datums").isArray()).isTrue();
        assertThat(first.get("text").asText()).isEqualTo("CR2 +0.2/0");
        assertThat(first.get("score").asDouble()).isEqualTo(90);
        assertThat(first.get("because").size()).isPositive();
        assertThat(first.get("cautions").toString()).contains("Guidance only");
        assertThat(first.get("numbers").get("crescentWidth").asDouble()).isPositive();
        assertThat(first.get("trace").get(0).asText()).startsWith("rule stress-relief.fatigue.asme-cr");
        assertThat(first.get("notes").isArray()).isTrue();
        assertThat(root.get("packs").get(0).asText()).isEqualTo("Arcwright built-in practice");
    }

    @Test
    void recommendationsLinkTheBuiltInPracticeNotesByTheirRuleTags() throws Exception {
        assertThat(run("advise", "examples/advisor/seal-groove-iso.json", "--format", "json")).as(err.toString()).isZero();
        JsonNode notes = new JsonFiles().mapper().readTree(out.toString()).get("recommendations").get(0).get("notes");
        assertThat(notes.size()).isPositive();
        assertThat(notes.toString()).contains("composite-profile");
    }

    @Test
    void textAnswerShowsTheCalloutTheReasoningAndTheCautions() throws Exception {
        assertThat(run("advise", caseFile(SHOULDER).toString())).isZero();
        assertThat(out.toString()).contains("1. CR2 +0.2/0", "because", "caution   Guidance only", "numbers   limits 2.000 to 2.200 mm");
    }

    @Test
    void theReadmeExampleRaisesTheMinimumToMeetTheKfTarget() {
        // golden for the README: R2 ±0.2 at a Ø42/Ø35 shoulder in bending, 900 MPa, Kf target 1.75
        assertThat(run("advise", "examples/advisor/gear-seat-shoulder.json")).as(err.toString()).isZero();
        assertThat(out.toString()).contains("1. CR2.16-2.56", "Limits adjusted", "smallest radius meeting the target 2.157");
    }

    @Test
    void teamPackOverrideChangesTheAnswer() throws Exception {
        assertThat(run("advise", caseFile(SHOULDER).toString(), "--pack", "shared")).isZero();
        assertThat(out.toString()).contains("1. CR2 +0.1/0", "Tarnbeck Drives practice");
    }

    @Test
    void partFileAdvisesEveryFeatureAsCsv() {
        assertThat(run("advise", "examples/tarnbeck-output-shaft.arcpart", "--format", "csv")).isZero();
        String[] lines = out.toString().split("\\R");
        assertThat(lines[0]).startsWith("feature,rule,type,text,score");
        assertThat(lines).hasSize(6);
        assertThat(lines[4]).contains("cosmetic.asme.title-block");
    }

    @Test
    void batchCsvGivesOneResultPerRow() throws Exception {
        Path csv = dir.resolve("part.csv");
        Files.writeString(csv, """
                feature,units,standard,kind,nominalRadius,function,loading,formMatters,locationMatters,datums,process
                F1,mm,iso,fillet,2,stress-relief,fatigue,true,false,,machined
                F2,mm,iso,round,1,cosmetic,none,false,false,,cast
                F3,mm,asme,fillet,0.4,sealing,none,true,true,A B,machined
                """);
        assertThat(run("advise", "--batch", csv.toString(), "--format", "json")).as(err.toString()).isZero();
        JsonNode root = new JsonFiles().mapper().readTree(out.toString());
        assertThat(root.get("features")).hasSize(3);
        assertThat(root.get("features").get(2).get("recommendations").get(0).get("rule").asText())
                .isEqualTo("sealing.located-form.composite");
    }

    @Test
    void aJunkCsvRowIsBadInputNamingFileLineAndColumn() throws Exception {
        Path csv = dir.resolve("part.csv");
        Files.writeString(csv, """
                feature,units,standard,kind,nominalRadius,function,process
                F1,mm,iso,fillet,2,stress-relief,machined
                F2,mm,iso,round,-1,cosmetic,cast
                """);
        assertThat(run("advise", "--batch", csv.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("part.csv:3").contains("nominalRadius");
    }

    @Test
    void anUnknownCsvColumnListsTheKnownOnes() throws Exception {
        Path csv = dir.resolve("part.csv");
        Files.writeString(csv, "feature,units,standard,kind,radius,function,process\nF1,mm,iso,fillet,2,cosmetic,cast\n");
        assertThat(run("advise", "--batch", csv.toString())).isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("unknown column 'radius'").contains("nominalRadius");
    }

    @Test
    void aBadCaseIsBadInput() throws Exception {
        assertThat(run("advise", caseFile(SHOULDER.replace("\"nominalRadius\": 2", "\"nominalRadius\": -2")).toString()))
                .isEqualTo(Cli.BAD_INPUT);
        assertThat(err.toString()).contains("case.json").contains("nominalRadius");
    }

    @Test
    void packCheckPassesTheExampleTeamPack() {
        assertThat(run("pack", "check", "shared")).as(out.toString()).isZero();
        assertThat(out.toString()).contains("pass  stress-relief.fatigue.asme-cr", "override", "PASS");
    }

    @Test
    void packCheckPassesTheBuiltInPackFolder() {
        assertThat(run("pack", "check", "knowledge")).as(out.toString()).isZero();
    }

    @Test
    void packCheckFailsWithAReadableReportOnAFailedExampleAndOnBadFiles() throws Exception {
        Path p = dir.resolve("pack");
        Files.createDirectories(p.resolve("rules"));
        Files.writeString(p.resolve("pack.json"), "{\"name\": \"Wrong Co\"}");
        Files.writeString(p.resolve("rules/a.json"), """
                {"rules": [{"id": "wrong.expectation", "summary": "s", "when": {"function": "cosmetic"},
                  "recommend": {"callout": "radius"}, "weight": 20, "because": ["b"],
                  "examples": [{"name": "cosmetic edge", "case": {"units": "mm", "standard": "iso", "kind": "round",
                    "nominalRadius": 1, "function": "cosmetic", "process": "cast"}, "expect": {"first": "wrong.expectation"}}]}]}
                """);
        Files.writeString(p.resolve("rules/b.json"), "{\"rules\": [}");
        assertThat(run("pack", "check", p.toString())).isEqualTo(Cli.FAIL);
        assertThat(out.toString()).contains("FAIL  wrong.expectation: cosmetic edge", "expected wrong.expectation",
                "got      cosmetic.iso.edge-note", "PROBLEM", "b.json:1");
    }
}
