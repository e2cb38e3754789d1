package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Arrays;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Regression tests for inputs a hostile or careless user gives: each was a crash, a silent skip, an
 * escape from a pack or an overwrite, and is now a located error with exit 2.
 */
class HostileInputTest {
    @TempDir
    Path dir;

    private static final String SHOULDER = """
            {"units": "mm", "standard": "asme", "kind": "fillet", "nominalRadius": 2, "function": "stress-relief",
             "loading": "fatigue", "formMatters": true, "locationMatters": false, "datums": ["A"], "process": "machined"}
            """;

    private Path file(String name, String text) throws Exception {
        return Files.writeString(dir.resolve(name), text);
    }

    private static String example(String name) {
        return Path.of("examples").resolve(name).toAbsolutePath().toString();
    }

    private static void badInput(CliRun r, String... fragments) {
        assertThat(r.exitCode()).as(r.err()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains(fragments).doesNotContain("Exception", "java.", "org.arcwright.", "\tat ");
    }

    @Test
    void anEmptyKfTargetIsBadInputNotASkippedCheck() throws Exception {
        Path f = file("shaft.json", """
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32, "rMin": 0.8, "rMax": 1.2,
                 "ultimateStrength": {"value": 690, "units": "MPa"}, "targetKf": ""}
                """);
        badInput(CliRun.of("fillet-stress", f.toString()), "shaft.json:2:", "targetKf", "a number");
        Path g = file("shaft2.json", Files.readString(f).replace("\"\"", "\"two\""));
        badInput(CliRun.of("fillet-stress", g.toString()), "targetKf", "expected a number");
    }

    @Test
    void anEmptyRequiredSupportIsBadInputNotASkippedCheck() throws Exception {
        Path f = file("corner.json", """
                {"units": "mm", "fillet": {"rMin": 0.8, "rMax": 1.2}, "mating": {"type": "bearing", "chamferMin": 1.1},
                 "shoulderHeight": 3.0, "requiredSupport": ""}
                """);
        badInput(CliRun.of("clearance", f.toString()), "corner.json:2:", "requiredSupport", "a number");
    }

    @Test
    void aFileOfJustNullIsALocatedErrorInEveryFileCommand() throws Exception {
        Path f = file("null.json", "null");
        String p = f.toString();
        String[][] commands = {
                {"fillet-stress", p}, {"clearance", p}, {"advise", p, "--no-notes", "--no-settings"},
                {"inspect", p}, {"render", p}, {"sheet", p, "--out", dir.resolve("s.md").toString(), "--no-settings"},
                {"drawing-note", "callout-note", p, "--no-settings"},
        };
        for (String[] c : commands) {
            CliRun r = CliRun.of(c);
            assertThat(r.exitCode()).as(String.join(" ", c) + "\n" + r.err()).isEqualTo(Cli.BAD_INPUT);
            assertThat(r.err()).as(c[0]).contains("null.json:1:1", "null").doesNotContain("Exception");
        }
    }

    @Test
    void renderWithNullUnitsNamesTheField() throws Exception {
        Path f = file("callout.json", "{\"units\": null, \"standard\": \"asme\", \"callout\": {\"type\": \"profile\", \"zone\": 0.1}}");
        badInput(CliRun.of("render", f.toString()), "callout.json:1:11: units: is null");
    }

    @Test
    void aChosenFeatureWithoutItsCalloutOrANoteWithoutATitleIsLocated() throws Exception {
        String ws = Files.readString(Path.of(example("tarnbeck-output-shaft-decided.arcpart")));
        int chosen = ws.indexOf("\"chosen\"");
        int callout = ws.indexOf("\"callout\"", chosen);
        int text = ws.indexOf("\"text\"", callout);
        Path noCallout = file("no-callout.arcpart", ws.substring(0, callout) + ws.substring(text));
        badInput(CliRun.of("sheet", noCallout.toString(), "--out", dir.resolve("s.md").toString(), "--no-settings",
                "--no-suggest"), "no-callout.arcpart:", "features[0].chosen.callout: is missing");
        badInput(CliRun.of("drawing-note", "callout-note", noCallout.toString(), "--no-settings"), "callout: is missing");
        Path noTitle = file("no-title.arcpart", ws.replaceFirst("\"title\": \"[^\"]*\",", ""));
        badInput(CliRun.of("sheet", noTitle.toString(), "--out", dir.resolve("s.md").toString(), "--no-settings",
                "--no-suggest"), "no-title.arcpart:", "notes[0].title: is missing");
    }

    @Test
    void aPackTemplateLinkedToAFileOutsideThePackIsRefusedAndNeverPrinted() throws Exception {
        Path secret = file("id_demo_key", "PRIVATE-KEY-OF-A-DEMO-USER");
        Path pack = Files.createDirectories(dir.resolve("team-pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Link test pack\", \"version\": \"1\"}");
        Files.createDirectories(pack.resolve("templates"));
        Files.createSymbolicLink(pack.resolve("templates").resolve("leak.mustache"), secret);
        String part = example("tarnbeck-output-shaft-decided.arcpart");
        CliRun note = CliRun.of("drawing-note", "leak", part, "--pack", pack.toString(), "--no-settings");
        badInput(note, "leak.mustache", "outside its pack's folder");
        assertThat(note.out() + note.err()).doesNotContain("PRIVATE-KEY");
        Path out = dir.resolve("sheet.html");
        CliRun sheet = CliRun.of("sheet", part, "--out", out.toString(), "--pack", pack.toString(), "--no-settings",
                "--no-suggest");
        badInput(sheet, "outside its pack's folder");
        assertThat(out).doesNotExist();
    }

    @Test
    void aPackRuleFileLinkedOutOfThePackIsAPackProblem() throws Exception {
        Path outside = file("rules-elsewhere.json", "{\"rules\": []}");
        Path pack = Files.createDirectories(dir.resolve("team-pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Link test pack\", \"version\": \"1\"}");
        Files.createDirectories(pack.resolve("rules"));
        Files.createSymbolicLink(pack.resolve("rules").resolve("borrowed.json"), outside);
        CliRun r = CliRun.of("pack", "check", pack.toString(), "--no-settings");
        assertThat(r.exitCode()).as(r.out() + r.err()).isEqualTo(Cli.FAIL);
        assertThat(r.out()).contains("borrowed.json", "outside its pack's folder");
    }

    @Test
    void aPointsFileThatIsNotPointsIsNeverEchoed() throws Exception {
        Path secret = file("shadow-demo", "demo-user:$6$SECRETHASH$abcdef:19000:0:99999:7:::\nsecond,line\n");
        Path f = file("inspect.json", """
                {"units": "mm", "corner": {"vertex": [0, 0], "legA": [1, 0], "legB": [0, 1], "kind": "round"},
                 "nominalRadius": 2.0, "callout": {"type": "radius", "min": 1.9, "max": 2.1},
                 "pointsFile": "%s"}
                """.formatted(secret.toString()));
        CliRun r = CliRun.of("inspect", f.toString());
        badInput(r, "shadow-demo");
        assertThat(r.out() + r.err()).doesNotContain("SECRETHASH", "demo-user", "second");
    }

    @Test
    void aNullPackManifestOrRuleFileIsAPackProblemNotACrash() throws Exception {
        Path pack = Files.createDirectories(dir.resolve("team-pack"));
        Files.writeString(pack.resolve("pack.json"), "null");
        Path c = file("case.json", SHOULDER);
        CliRun advise = CliRun.of("advise", c.toString(), "--pack", pack.toString(), "--no-notes", "--no-settings");
        assertThat(advise.exitCode()).as(advise.err()).isIn(Cli.OK, Cli.BAD_INPUT);
        assertThat(advise.err()).contains("pack.json:1:1", "null").doesNotContain("Exception");
        badInput(CliRun.of("pack", "check", pack.toString(), "--no-settings"), "pack.json:1:1");

        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Null rules pack\", \"version\": \"1\"}");
        Files.createDirectories(pack.resolve("rules"));
        Files.writeString(pack.resolve("rules").resolve("empty.json"), "null");
        CliRun check = CliRun.of("pack", "check", pack.toString(), "--no-settings");
        assertThat(check.exitCode()).as(check.out() + check.err()).isEqualTo(Cli.FAIL);
        assertThat(check.out()).contains("empty.json:1:1");
        CliRun advise2 = CliRun.of("advise", c.toString(), "--pack", pack.toString(), "--no-notes", "--no-settings");
        assertThat(advise2.err()).doesNotContain("Exception", "internal error");
    }

    @Test
    void aRuleWithNullOrNoWhenIsAnErrorThatPackCheckReports() throws Exception {
        Path pack = Files.createDirectories(dir.resolve("team-pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"When test pack\", \"version\": \"1\"}");
        Files.createDirectories(pack.resolve("rules"));
        String rule = """
                {"rules": [{"id": "team.always", "summary": "Always", %s "recommend": {"callout": "radius"},
                  "weight": 10, "because": ["Because."]}]}
                """;
        for (String when : new String[] {"\"when\": null,", ""}) {
            Files.writeString(pack.resolve("rules").resolve("always.json"), rule.formatted(when));
            CliRun r = CliRun.of("pack", "check", pack.toString(), "--no-settings");
            assertThat(r.exitCode()).as(r.out() + r.err()).isEqualTo(Cli.FAIL);
            assertThat(r.out()).contains("always.json:", "when: is missing or null", "\"when\": {}");
        }
        Files.writeString(pack.resolve("rules").resolve("always.json"), rule.formatted("\"when\": {},"));
        CliRun ok = CliRun.of("pack", "check", pack.toString(), "--no-settings");
        assertThat(ok.out()).doesNotContain("when is missing");
    }

    @Test
    void theOutputMayNotBeTheInput() throws Exception {
        Path part = dir.resolve("part.html");
        Files.copy(Path.of(example("tarnbeck-output-shaft-decided.arcpart")), part);
        String before = Files.readString(part);
        badInput(CliRun.of("sheet", part.toString(), "--out", part.toString(), "--no-settings", "--no-suggest"),
                "--out", "also the input");
        assertThat(Files.readString(part)).isEqualTo(before);

        Path callout = file("x.txt", "{\"units\": \"mm\", \"standard\": \"asme\", \"callout\": {\"type\": \"profile\", \"zone\": 0.1}}");
        badInput(CliRun.of("render", callout.toString(), "--out", callout.toString()), "also the input");
        assertThat(Files.readString(callout)).startsWith("{");
        Path shaft = dir.resolve("shaft.svg");
        Files.copy(Path.of(example("mechanics/drive-shaft-fillet.json")), shaft);
        badInput(CliRun.of("fillet-stress", shaft.toString(), "--plot", shaft.toString()), "--plot", "also the input");

        // a plot named like the section's pointsFile must not replace the measured points
        Path points = file("section.svg", "x,y\n4,0\n2.586,0.586\n2,2\n0.586,2.586\n0,4\n");
        String pointsBefore = Files.readString(points);
        Path section = file("section.json", "{\"units\": \"mm\", \"corner\": {\"vertex\": [0, 0], \"legA\": [1, 0], "
                + "\"legB\": [0, 1], \"kind\": \"fillet\"}, \"nominalRadius\": 2.0, "
                + "\"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"pointsFile\": \"section.svg\"}");
        badInput(CliRun.of("inspect", section.toString(), "--plot", points.toString()), "--plot", "also the input");
        assertThat(Files.readString(points)).isEqualTo(pointsBefore);
    }

    @Test
    void aSymlinkedReadOnlyOrFolderlessOutputIsRefused() throws Exception {
        Path callout = file("c.json", "{\"units\": \"mm\", \"standard\": \"asme\", \"callout\": {\"type\": \"profile\", \"zone\": 0.1}}");
        Path real = file("real.svg", "keep");
        Path link = Files.createSymbolicLink(dir.resolve("link.svg"), real);
        badInput(CliRun.of("render", callout.toString(), "--out", link.toString()), "symbolic link");
        assertThat(Files.isSymbolicLink(link)).isTrue();
        badInput(CliRun.of("render", callout.toString(), "--out", dir.resolve("nowhere").resolve("f.svg").toString()),
                "does not exist");
        assertThat(dir.resolve("nowhere")).doesNotExist();
        if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(real, PosixFilePermissions.fromString("r--r--r--"));
            badInput(CliRun.of("render", callout.toString(), "--out", real.toString()), "read-only");
            assertThat(Files.readString(real)).isEqualTo("keep");
        }
    }

    @Test
    void messagesCarryTheFullCommandName() throws Exception {
        CliRun r = CliRun.of("pack", "check", dir.resolve("no-pack").toString(), "--no-settings");
        assertThat(r.err()).startsWith("arcwright pack check: ");
        CliRun add = CliRun.of("notes", "add", dir.resolve("missing.md").toString());
        assertThat(add.err()).startsWith("arcwright notes add: ");
    }

    @Test
    void anUnknownCommandWithHelpIsAUsageError() {
        CliRun r = CliRun.of("zone", "--help");
        assertThat(r.exitCode()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains("zone");
        assertThat(CliRun.of("--help").exitCode()).isZero();
        assertThat(CliRun.of("pack", "check", "--help").exitCode()).isZero();
    }

    @Test
    void notANumberAndInfinityAreRefusedByEveryNumberOption() throws Exception {
        Path f = Path.of(example("inspect/bracket-round-r.json"));
        for (String v : new String[] {"NaN", "Infinity", "-Infinity", "nan"}) {
            badInput(CliRun.of("inspect", f.toString(), "--window", v), "--window", "not a");
            badInput(CliRun.of("limits", "R3 +0.2/-0.1", "--angle", v), "--angle", "not a");
            badInput(CliRun.of("general-tolerance", "--class", "m", "--radius", v), "--radius", "not a");
        }
    }

    @Test
    void aDeviceGivenAsInputIsRefusedAtOnce() {
        Assumptions.assumeTrue(Files.exists(Path.of("/dev/zero")));
        badInput(CliRun.of("inspect", "/dev/zero"), "/dev/zero", "not a regular file");
        badInput(CliRun.of("advise", "/dev/zero", "--no-notes", "--no-settings"), "not a regular file");
        badInput(CliRun.of("advise", "--batch", "/dev/zero", "--no-notes", "--no-settings"), "not a regular file");
    }

    @Test
    void anOptionalCheckLeftOutIsSaidNotSilentlySkipped() throws Exception {
        Path shaft = file("no-target.json", """
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32, "rMin": 0.8, "rMax": 1.2}
                """);
        CliRun text = CliRun.of("fillet-stress", shaft.toString());
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).contains("not checked: no targetKt or targetKf given");
        assertThat(CliRun.of("fillet-stress", shaft.toString(), "--format", "json").out()).contains("\"notChecked\"");
        Path corner = file("no-support.json", """
                {"units": "mm", "fillet": {"rMin": 0.8, "rMax": 1.0}, "mating": {"type": "bearing", "chamferMin": 1.1},
                 "shoulderHeight": 3.0}
                """);
        assertThat(CliRun.of("clearance", corner.toString()).out()).contains("not judged: no requiredSupport given");
        Path bare = file("no-shoulder.json", """
                {"units": "mm", "fillet": {"rMin": 0.8, "rMax": 1.0}, "mating": {"type": "bearing", "chamferMin": 1.1}}
                """);
        assertThat(CliRun.of("clearance", bare.toString()).out()).contains("not checked: no shoulderHeight given");
        assertThat(CliRun.of("clearance", bare.toString(), "--format", "json").out()).contains("\"notChecked\"");
    }

    @Test
    void checksMadeAfterReadingNameTheLineAndColumnOfTheirField() throws Exception {
        String section = """
                {"units": "mm",
                 "corner": {"vertex": [0, 0], "legA": [1, 0], "legB": [0, 1], "kind": "round"},
                 "nominalRadius": %s,
                 "callout": {"type": "radius", "min": 1.95, "max": 2.0},
                 "resolution": %s,
                 "points": [[4, 0], [2.586, 0.586], [2, 2], [0.586, 2.586], [0, 4]]}
                """;
        // the record's own checks (resolution against the band, nominal against the limits) were located
        // at the file only, never at a line
        badInput(CliRun.of("inspect", file("wide.json", section.formatted("2.0", "10")).toString()),
                "wide.json:5:16: resolution: is 10 mm, more than a tenth of the tolerance");
        badInput(CliRun.of("inspect", file("nominal.json", section.formatted("5", "0.001")).toString()),
                "nominal.json:3:19: nominalRadius: is 5 mm, 3 mm outside the callout's limits");
        Path process = file("process.json", Files.readString(Path.of(example("simulate/pump-bracket.json")))
                .replace("\"noise\": 0.001", "\"noise\": -1"));
        badInput(CliRun.of("simulate", process.toString(), "--parts", "10"), "process.json:9:14: process.noise: must be zero or more");
        Path corner = file("no-mating.json", "{\"units\": \"mm\",\n \"fillet\": {\"rMin\": 0.8, \"rMax\": 1.2}}\n");
        badInput(CliRun.of("clearance", corner.toString()), "no-mating.json:1:1: mating: missing");
        Path huge = file("huge.json", Files.readString(Path.of(example("mechanics/drive-shaft-fillet.json")))
                .replace("\"D\": 38", "\"D\": 1e999"));
        badInput(CliRun.of("fillet-stress", huge.toString()), "huge.json:6:8: D: the number 1e999 is too large");
    }

    @Test
    void aDeviceOrAFolderGivenAsANoteIsRefusedAtOnce() throws Exception {
        Assumptions.assumeTrue(Files.exists(Path.of("/dev/zero")));
        String cache = dir.resolve("cache").toString();
        String personal = dir.resolve("personal").toString();
        // before: read whole, /dev/zero ran the heap out (exit 70 after seconds)
        badInput(CliRun.of("notes", "add", "/dev/zero", "--index-cache", cache, "--personal", personal),
                "/dev/zero", "not a regular file");
        badInput(CliRun.of("notes", "add", dir.toString(), "--index-cache", cache, "--personal", personal),
                "is a folder, not a file");
    }

    @Test
    void aNoteSavedWithAByteOrderMarkIsAdded() throws Exception {
        Path note = dir.resolve("bom-note.md");
        Files.write(note, ("\uFEFF---\nid: bom-note\ntitle: A note saved with a byte-order mark\ntags: [test]\n---\nBody.\n")
                .getBytes(StandardCharsets.UTF_8));
        CliRun r = CliRun.of("notes", "add", note.toString(), "--index-cache", dir.resolve("cache").toString(),
                "--personal", dir.resolve("personal").toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).contains("bom-note");
    }

    @Test
    void aProcessFileOfJustNullIsLocatedToo() throws Exception {
        Path f = file("null-process.json", "null");
        badInput(CliRun.of("simulate", f.toString()), "null-process.json:1:1", "null");
    }

    @Test
    void anExplicitNullForAnOptionalNumberMeansNotGivenAndIsSaid() throws Exception {
        // decided: null is "not given" (saved worksheets write null for an absent value); the check it
        // would switch on is said not to be made, and "" stays an error
        Path shaft = file("null-target.json", """
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 38, "d": 32, "rMin": 0.8, "rMax": 1.2,
                 "ultimateStrength": {"value": 690, "units": "MPa"}, "targetKf": null}
                """);
        CliRun r = CliRun.of("fillet-stress", shaft.toString());
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("not checked: no targetKt or targetKf given");
        Path corner = file("null-support.json", """
                {"units": "mm", "fillet": {"rMin": 0.8, "rMax": 1.0}, "mating": {"type": "bearing", "chamferMin": 1.1},
                 "shoulderHeight": 3.0, "requiredSupport": null}
                """);
        assertThat(CliRun.of("clearance", corner.toString()).out()).contains("not judged: no requiredSupport given");
    }

    @Test
    void packCheckReportsATemplateThatWouldBreakEverySheet() throws Exception {
        Path pack = Files.createDirectories(dir.resolve("template-pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Template test pack\", \"version\": \"1\"}");
        Path templates = Files.createDirectories(pack.resolve("templates"));
        Files.writeString(templates.resolve("deep.mustache"), "{{#part}}".repeat(5000) + "x" + "{{/part}}".repeat(5000));
        Files.writeString(templates.resolve("fine.mustache"), "PART {{part.number}}\n");
        Path secret = file("id_demo_key", "PRIVATE-KEY-OF-A-DEMO-USER");
        Files.createSymbolicLink(templates.resolve("leak.mustache"), secret);
        // before: PASS, exit 0, and then every sheet and drawing note with this pack was refused
        CliRun r = CliRun.of("pack", "check", pack.toString(), "--no-settings");
        assertThat(r.exitCode()).as(r.out() + r.err()).isEqualTo(Cli.FAIL);
        assertThat(r.out()).contains("deep.mustache:1:", "nested more than 24 deep", "leak.mustache", "outside its pack's folder",
                "FAIL: 2 problem(s)").doesNotContain("fine.mustache", "PRIVATE-KEY");
        CliRun json = CliRun.of("pack", "check", pack.toString(), "--no-settings", "--format", "json");
        assertThat(json.out()).contains("\"passed\" : false", "deep.mustache");
    }

    @Test
    void aSheetSaysAFilletLargerThanItsStepCannotBeBuiltAsDrawn() throws Exception {
        // F1's shoulder steps from Ø42 to Ø35: h = (D - d)/2 = 3.5 mm, so R5 cannot meet the shoulder face
        // (common practice: a fillet no larger than the step it blends)
        String ws = Files.readString(Path.of(example("tarnbeck-output-shaft.arcpart")))
                .replaceFirst("\"nominalRadius\": 2.0", "\"nominalRadius\": 5.0").replaceFirst("R2 ±0.2", "R5 ±0.2");
        Path part = file("too-big.arcpart", ws);
        Path out = dir.resolve("too-big.md");
        // before: the sheet listed only "no control chosen" and suggested a demoted card, without a word
        // about the drawing (advise says "R5 cannot be built as drawn" first)
        CliRun r = CliRun.of("sheet", part.toString(), "--out", out.toString(), "--no-settings");
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(Files.readString(out)).contains("R5 cannot be built as drawn", "h = (D − d)/2 = 3.5 mm");
        Path table = dir.resolve("too-big.csv");
        Files.writeString(table, Files.readString(Path.of(example("advisor/tarnbeck-output-shaft.csv")))
                .replaceFirst(",2.0,stress-relief", ",5.0,stress-relief").replaceFirst("R2 ±0.2", "R5 ±0.2"));
        CliRun batch = CliRun.of("advise", "--batch", table.toString(), "--no-notes", "--no-settings");
        assertThat(batch.exitCode()).as(batch.err()).isZero();
        assertThat(batch.out()).contains("R5 cannot be built as drawn", "== F2");
    }

    @Test
    void aBadCellOfABatchTableNamesItsLineAndColumn() throws Exception {
        String table = Files.readString(Path.of(example("advisor/tarnbeck-output-shaft.csv")));
        String[] lines = table.split("\n", -1);
        lines[2] = lines[2].replaceFirst(",0.8,", ",-0.8,");
        Path f = file("negative.csv", String.join("\n", lines));
        // before: "negative.csv:3: nominalRadius: nominalRadius must be ..." (no column, the field said twice)
        badInput(CliRun.of("advise", "--batch", f.toString(), "--no-notes", "--no-settings"),
                "negative.csv:3:5: nominalRadius: must be a number greater than zero, got -0.8");
        lines = table.split("\n", -1);
        lines[1] = lines[1].replaceFirst(",42,35,", ",30,35,");
        Path g = file("step.csv", String.join("\n", lines));
        badInput(CliRun.of("advise", "--batch", g.toString(), "--no-notes", "--no-settings"), "step.csv:2:15: stress.D: need D > d > 0");
        // the CSV reader's own words carried character codes and its terms
        lines = table.split("\n", -1);
        lines[2] = "\"F2\"x" + lines[2].substring(lines[2].indexOf(','));
        CliRun quote = CliRun.of("advise", "--batch", file("quote.csv", String.join("\n", lines)).toString(), "--no-notes",
                "--no-settings");
        badInput(quote, "quote.csv:3:", "unexpected 'x' after a quoted value");
        assertThat(quote.err()).doesNotContain("(code ");
        lines = table.split("\n", -1);
        lines[2] = lines[2] + ",extra,cells";
        badInput(CliRun.of("advise", "--batch", file("extra.csv", String.join("\n", lines)).toString(), "--no-notes",
                "--no-settings"), "extra.csv:3:", "more cells than the header has columns (20)");
    }

    @Test
    void aTypoInACasesToleranceIsLocatedInTheFileThatHoldsIt() throws Exception {
        // found by the fuzz suite: the tolerance was read only when the advisor sized the card, and the
        // refusal named neither file nor line ("arcwright advise: tolerance: F1 ....callout: ...")
        Path json = file("typo-case.json", Files.readString(Path.of(example("advisor/gear-seat-shoulder.json")))
                .replace("\"R2 ±0.2\"", "\"R2 +0.2/31\""));
        badInput(CliRun.of("advise", json.toString(), "--no-notes", "--no-settings"), "typo-case.json:15:16: tolerance:",
                "no sign");
        Path csv = file("typo-table.csv", Files.readString(Path.of(example("advisor/tarnbeck-output-shaft.csv")))
                .replaceFirst("R2 ±0.2", "Q2"));
        badInput(CliRun.of("advise", "--batch", csv.toString(), "--no-notes", "--no-settings"), "typo-table.csv:2:12: tolerance:");
        Path part = file("typo.arcpart", Files.readString(Path.of(example("tarnbeck-output-shaft.arcpart")))
                .replaceFirst("R2 ±0.2", "Q2"));
        badInput(CliRun.of("sheet", part.toString(), "--out", dir.resolve("typo.md").toString(), "--no-settings"),
                "typo.arcpart:", "features[0].case.tolerance:");
    }

    @Test
    void aByteOrderMarkIsAcceptedInEveryFileTheCommandsRead() throws Exception {
        // as a spreadsheet's "CSV UTF-8" export writes it, and some editors before JSON (common practice)
        byte[] bom = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
        Path table = dir.resolve("bom-table.csv");
        Files.write(table, concat(bom, Files.readAllBytes(Path.of(example("advisor/tarnbeck-output-shaft.csv")))));
        CliRun batch = CliRun.of("advise", "--batch", table.toString(), "--no-notes", "--no-settings");
        assertThat(batch.exitCode()).as(batch.err()).isZero();
        assertThat(batch.out()).contains("== F1 gear seat shoulder");
        Path points = dir.resolve("housing-fillet-section.csv");
        Files.write(points, concat(bom, Files.readAllBytes(Path.of(example("inspect/housing-fillet-section.csv")))));
        Path section = dir.resolve("section.json");
        Files.write(section, concat(bom, Files.readAllBytes(Path.of(example("inspect/housing-fillet-profile.json")))));
        CliRun inspect = CliRun.of("inspect", section.toString());
        assertThat(inspect.exitCode()).as(inspect.err()).isIn(Cli.OK, Cli.FAIL);
        assertThat(inspect.out()).contains("profile");
        Path part = dir.resolve("bom.arcpart");
        Files.write(part, concat(bom, Files.readAllBytes(Path.of(example("tarnbeck-output-shaft-decided.arcpart")))));
        CliRun sheet = CliRun.of("sheet", part.toString(), "--out", dir.resolve("bom.md").toString(), "--no-settings",
                "--no-suggest");
        assertThat(sheet.exitCode()).as(sheet.err()).isZero();
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
