package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The exit codes, as the README states them once: 0 done or pass, 1 fail, 2 bad input or usage, 3
 * indeterminate ({@code inspect} only), 70 internal error. Held here command by command, on the
 * invented examples shipped in {@code examples/}.
 */
class ExitCodesTest {
    @TempDir
    static Path dir;

    private static String ex(String name) {
        return Path.of("examples").resolve(name).toString();
    }

    private static Path write(String name, String text) {
        try {
            return Files.writeString(dir.resolve(name), text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private record Case(int code, String... args) {}

    @TestFactory
    Stream<DynamicTest> everyCommandKeepsItsExitCodes() throws Exception {
        String bad = write("bad.json", "{\"units\": \"mm\",").toString();
        String notes = dir.resolve("cache").toString();
        String personal = dir.resolve("personal").toString();
        String narrowR = write("narrow-r.json", Files.readString(Path.of(ex("inspect/bracket-round-r.json")))
                .replace("\"nominalRadius\": 2.0", "\"nominalRadius\": 2.55")
                .replace("\"min\": 1.9", "\"min\": 2.5").replace("\"max\": 2.1", "\"max\": 2.6")).toString();
        // the revised bearing seat with a taller shoulder: the flat beyond the ring's largest chamfer (r_s max)
        // then meets the required support
        String tallSeat = write("tall-seat.json", Files.readString(Path.of(ex("mechanics/bearing-seat-clearance-revised.json")))
                .replace("\"shoulderHeight\": 3.0", "\"shoulderHeight\": 4.0")).toString();
        String part = ex("tarnbeck-output-shaft-decided.arcpart");
        String callout = ex("callout-composite.json");
        String table = Files.readString(Path.of(ex("advisor/tarnbeck-output-shaft.csv")));
        String dupUnits = write("dup-units.csv", table.replaceFirst("feature,units,", "feature,units,units,")).toString();
        Path failingPack = Files.createDirectories(dir.resolve("failing-pack").resolve("rules"));
        write("failing-pack/pack.json", "{\"name\": \"Exit code pack (invented)\", \"version\": \"1\"}");
        write("failing-pack/rules/null.json", "null");
        failingPack = failingPack.getParent();
        Path note = write("note.md", "---\nid: exit-code-note\ntitle: An exit code note\ntags: [test]\n---\nBody text.\n");
        List<Case> cases = new ArrayList<>(List.of(
                new Case(Cli.OK, "--help"),
                new Case(Cli.OK, "--version"),
                new Case(Cli.BAD_INPUT, "no-such-command"),
                new Case(Cli.BAD_INPUT, "zone", "--help"),
                new Case(Cli.OK, "limits", "R3 +0.2/-0.1"),
                new Case(Cli.BAD_INPUT, "limits", "R3 +0.2/-0.1", "--angle", "NaN"),
                new Case(Cli.OK, "general-tolerance", "--class", "m", "--radius", "4"),
                new Case(Cli.BAD_INPUT, "general-tolerance", "--class", "m", "--radius", "Infinity"),
                new Case(Cli.OK, "fillet-stress", ex("mechanics/drive-shaft-fillet-revised.json")),
                new Case(Cli.FAIL, "fillet-stress", ex("mechanics/drive-shaft-fillet.json")),
                new Case(Cli.BAD_INPUT, "fillet-stress", bad),
                new Case(Cli.OK, "clearance", tallSeat),
                new Case(Cli.FAIL, "clearance", ex("mechanics/bearing-seat-clearance-revised.json")),
                new Case(Cli.FAIL, "clearance", ex("mechanics/bearing-seat-clearance.json")),
                new Case(Cli.BAD_INPUT, "clearance", bad),
                new Case(Cli.OK, "advise", ex("advisor/gear-seat-shoulder.json"), "--no-notes", "--no-settings"),
                new Case(Cli.BAD_INPUT, "advise", bad, "--no-notes", "--no-settings"),
                new Case(Cli.OK, "pack", "check", "knowledge", "--no-settings"),
                new Case(Cli.BAD_INPUT, "pack", "check", dir.resolve("no-pack").toString(), "--no-settings"),
                new Case(Cli.OK, "inspect", ex("inspect/bracket-round-r.json")),
                new Case(Cli.FAIL, "inspect", narrowR),
                // U = 0.06 mm against a 0.2 mm band: the ISO 14253-1 default rule proves neither pass nor fail
                new Case(Cli.INDETERMINATE, "inspect", ex("inspect/bracket-round-r.json"), "--uncertainty", "0.06"),
                new Case(Cli.BAD_INPUT, "inspect", bad),
                new Case(Cli.OK, "drawing-note", "title-block-notes", part, "--no-settings"),
                new Case(Cli.BAD_INPUT, "drawing-note", "title-block-notes", bad, "--no-settings"),
                new Case(Cli.OK, "render", callout),
                new Case(Cli.BAD_INPUT, "render", bad),
                new Case(Cli.OK, "sheet", part, "--out", dir.resolve("sheet.md").toString(), "--no-settings", "--no-suggest"),
                new Case(Cli.BAD_INPUT, "sheet", bad, "--out", dir.resolve("sheet2.md").toString(), "--no-settings"),
                new Case(Cli.OK, "notes", "add", note.toString(), "--index-cache", notes, "--personal", personal),
                new Case(Cli.OK, "notes", "search", "fillet", "--index-cache", notes, "--personal", personal),
                new Case(Cli.BAD_INPUT, "notes", "add", bad, "--index-cache", notes, "--personal", personal),
                new Case(Cli.OK, "notes", "show", "profile-with-datums", "--index-cache", notes, "--personal", personal),
                new Case(Cli.BAD_INPUT, "notes", "show", "no-such-note", "--index-cache", notes, "--personal", personal),
                new Case(Cli.OK, "notes", "reindex", "--index-cache", notes, "--personal", personal),
                new Case(Cli.BAD_INPUT, "notes", "search", "fillet", "--limit", "many", "--index-cache", notes,
                        "--personal", personal),
                new Case(Cli.BAD_INPUT, "general-tolerance", "--class", "q", "--radius", "4"),
                new Case(Cli.OK, "advise", "--batch", ex("advisor/tarnbeck-output-shaft.csv"), "--no-notes", "--no-settings"),
                new Case(Cli.BAD_INPUT, "advise", "--batch", dupUnits, "--no-notes", "--no-settings"),
                new Case(Cli.FAIL, "pack", "check", failingPack.toString(), "--no-settings"),
                new Case(Cli.OK, "simulate", ex("simulate/pump-bracket.json"), "--parts", "20", "--points", "50"),
                new Case(Cli.BAD_INPUT, "simulate", bad),
                new Case(Cli.OK, "limits", "--help"),
                new Case(Cli.BAD_INPUT, "limits", "R3 +0.2/31")));
        return cases.stream().map(c -> DynamicTest.dynamicTest(String.join(" ", c.args()), () -> {
            CliRun r = CliRun.of(c.args());
            assertThat(r.exitCode()).as(r.out() + r.err()).isEqualTo(c.code());
            if (c.code() == Cli.BAD_INPUT) assertThat(r.err()).startsWith("arcwright").doesNotContain("\tat ");
        }));
    }

    /** A command that fails by a fault of ours, as a crash would. */
    @CommandLine.Command(name = "crash")
    static final class Crash implements Callable<Integer> {
        @Override
        public Integer call() {
            throw new IllegalStateException("a fault in the code");
        }
    }

    private static CliRun runWithCrash(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true));
        cl.addSubcommand("crash", new Crash());
        cl.setErr(new PrintWriter(err, true));
        return new CliRun(cl.execute(args), out.toString(), err.toString());
    }

    @Test
    void aCrashIsNeverAFailButAnInternalErrorWithoutAStackTrace() {
        CliRun r = runWithCrash("crash");
        assertThat(r.exitCode()).isEqualTo(Cli.INTERNAL_ERROR).isNotEqualTo(Cli.FAIL);
        assertThat(r.err()).startsWith("arcwright crash: internal error").contains("--debug")
                .doesNotContain("IllegalStateException", "\tat ");
    }

    @Test
    void debugShowsTheStackTraceToReport() {
        CliRun r = runWithCrash("crash", "--debug");
        assertThat(r.exitCode()).isEqualTo(Cli.INTERNAL_ERROR);
        assertThat(r.err()).contains("IllegalStateException", "a fault in the code", "\tat ");
    }

    @Test
    void theReadmeAndTheHelpStateTheSameCodesAsTheCode() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        String help = CliRun.of("--help").out().replaceAll("\\s+", " ");
        for (int code : new int[] {Cli.OK, Cli.FAIL, Cli.BAD_INPUT, Cli.INDETERMINATE, Cli.INTERNAL_ERROR}) {
            assertThat(readme).contains("| " + code + " | ");
            assertThat(help).contains(" " + code + " ");
        }
    }
}
