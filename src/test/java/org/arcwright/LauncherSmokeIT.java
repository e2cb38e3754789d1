package org.arcwright;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shipped launcher on the built jar and the machine's own JDK, end to end, as a user runs it: each
 * command twice, so that the first run (which lists the classes for an archive) and a run from the
 * archive both finish cleanly. {@code LauncherScriptTest} drives the script with stand-in JDKs; only a
 * real JVM shows a crash at exit (JDK 17 aborted writing the notes commands' archive at exit, exit 134
 * and an hs_err file in the working folder, while every unit test passed).
 */
class LauncherSmokeIT {
    private static final Path PROJECT = Path.of("").toAbsolutePath();

    @TempDir Path work;

    /** Starts from no archive of this build for the command {@code name}, so that its first run records. */
    private static void noArchive(String name) throws IOException {
        try (Stream<Path> files = Files.list(PROJECT.resolve("target"))) {
            for (Path f : files.filter(f -> f.getFileName().toString().startsWith("arcwright-" + name + "-")).toList()) {
                Files.deleteIfExists(f);
            }
        }
    }

    @Test
    void simulateRunsCleanlyBeforeAndAfterItsArchiveIsMade() throws Exception {
        noArchive("simulate");
        String file = PROJECT.resolve("examples/simulate/pump-bracket.json").toString();
        Result first = launch("simulate", file, "--parts", "300");
        assertThat(first.status()).as(first.err()).isZero();
        assertThat(first.out()).contains("simulated 300 parts");
        awaitArchive("simulate");
        Result second = launch("simulate", file, "--parts", "300");
        assertThat(second.status()).as(second.err()).isZero();
        assertThat(second.out()).as("the same figures from the archive").isEqualTo(first.out());
        assertThat(second.err()).isEmpty();
        assertThat(crashLogs()).isEmpty();
    }

    @Test
    void notesSearchRunsCleanlyBeforeAndAfterItsArchiveIsMade() throws Exception {
        noArchive("notes");
        Result first = launch("notes", "search", "fillet");
        assertThat(first.status()).as(first.err()).isZero();
        assertThat(first.out()).contains("notes for \"fillet\"");
        awaitArchive("notes");
        Result second = launch("notes", "search", "fillet");
        assertThat(second.status()).as(second.err()).isZero();
        assertThat(second.out()).isEqualTo(first.out());
        assertThat(crashLogs()).isEmpty();
    }

    private record Result(int status, String out, String err) {}

    private Result launch(String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(PROJECT.resolve("arcwright").toString()));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(work.toFile());
        // a home of its own: the personal pack, the settings and the notes index stay in the test's folder
        pb.environment().put("HOME", work.resolve("home").toString());
        pb.environment().put("XDG_CONFIG_HOME", work.resolve("config").toString());
        pb.environment().put("XDG_CACHE_HOME", work.resolve("cache").toString());
        pb.environment().put("XDG_DATA_HOME", work.resolve("data").toString());
        Path out = Files.createTempFile(work, "out", ".txt");
        Path err = Files.createTempFile(work, "err", ".txt");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        Process p = pb.start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("the launcher did not finish: " + cmd);
        }
        return new Result(p.exitValue(), Files.readString(out), Files.readString(err));
    }

    /** Waits for the background step to leave the archive (or its failure mark) and let go of its lock. */
    private static void awaitArchive(String name) throws Exception {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (!(has(name, ".jsa") || has(name, ".jsa.failed")) || has(name, ".jsa.lock")) {
            if (System.nanoTime() > end) throw new AssertionError("no archive for " + name + " after 120 s");
            Thread.sleep(100);
        }
        assertThat(has(name, ".jsa")).as("made, not failed").isTrue();
    }

    /** Whether the command's file ending in {@code suffix} (for whichever JDK) is in the target folder. */
    private static boolean has(String name, String suffix) throws IOException {
        try (Stream<Path> files = Files.list(PROJECT.resolve("target"))) {
            // arcwright-NAME-KEY.SUFFIX, KEY the launcher's eight hex digits for the JDK
            Pattern file = Pattern.compile("arcwright-" + Pattern.quote(name) + "-[0-9a-f]{8}" + Pattern.quote(suffix));
            return files.anyMatch(f -> file.matcher(f.getFileName().toString()).matches());
        }
    }

    private List<Path> crashLogs() throws IOException {
        try (Stream<Path> files = Files.list(work)) {
            return files.filter(f -> f.getFileName().toString().startsWith("hs_err")).toList();
        }
    }
}
