package org.arcwright;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher script {@code ./arcwright}: which JDK it runs the window on, how it names the
 * ahead-of-time cache, and the record / create / use cycle, driven with stand-in JDKs (a
 * {@code release} file and a {@code bin/java} script that writes down how it was called), so the
 * suite needs neither JDK 25 nor a display. The functions are reached by sourcing the script; the
 * cycle by running a copy of it beside a stand-in jar.
 */
@Tag("slow")
class LauncherScriptTest {
    private static final String FAKE_JAVA = """
            #!/bin/sh
            # Stand-in java: writes down how it was called; "makes" what the AOT modes would make.
            line="$0"; for a in "$@"; do line="$line $a"; done
            echo "$line" >> "$FAKE_LOG"
            mode=; conf=; cache=
            for a in "$@"; do
              case "$a" in
                -XX:AOTMode=*) mode="${a#*=}" ;;
                -XX:AOTConfiguration=*) conf="${a#*=}" ;;
                -XX:AOTCache=*) cache="${a#*=}" ;;
              esac
            done
            case "$mode" in
              record) echo recorded > "$conf" ;;
              create) [ -n "${FAKE_CREATE_FAILS:-}" ] && exit 1; echo cache > "$cache" ;;
            esac
            # the class-data archive of a command: the list of loaded classes, then the static dump
            dump=; list=; archive=
            for a in "$@"; do
              case "$a" in
                -Xshare:dump) dump=yes ;;
                -XX:DumpLoadedClassList=*) printf 'java/lang/Object id: 0\n@lambda-proxy org/Some 1\n' > "${a#*=}" ;;
                -XX:SharedClassListFile=*) list="${a#*=}" ;;
                -XX:SharedArchiveFile=*) archive="${a#*=}" ;;
              esac
            done
            if [ -n "$dump" ]; then
              [ -n "${FAKE_CREATE_FAILS:-}" ] && exit 1
              grep -q '^@' "$list" && exit 1
              cat "$list" > "$archive"
            fi
            exit 0
            """;

    @TempDir Path tmp;
    private Path app;
    private Path jar;
    private Path jdks;
    private Path log;
    private Path aotDir;
    private final Map<String, String> env = new TreeMap<>();

    @BeforeEach
    void standIns() throws IOException {
        assumeTrue(Files.isExecutable(Path.of("/bin/bash")), "the launcher is a bash script");
        app = Files.createDirectories(tmp.resolve("app"));
        Files.copy(Path.of("arcwright"), app.resolve("arcwright"));
        executable(app.resolve("arcwright"));
        jar = Files.createDirectories(app.resolve("target")).resolve("arcwright.jar");
        Files.writeString(jar, "not really a jar, version 1");
        jdks = Files.createDirectories(tmp.resolve("jdks"));
        log = tmp.resolve("java-calls.log");
        Files.createFile(log);
        fakeJdk(jdks.resolve("jdk-17"), "17.0.15", "17.0.15+6");
        fakeJdk(tmp.resolve("path-java"), "17.0.15", "17.0.15+6");
        aotDir = tmp.resolve("cache/arcwright/aot");
        env.put("HOME", tmp.resolve("home").toString());
        env.put("XDG_CACHE_HOME", tmp.resolve("cache").toString());
        env.put("ARCWRIGHT_JDKS", jdks.toString());
        env.put("PATH", tmp.resolve("path-java/bin") + ":/usr/bin:/bin");
        env.put("DISPLAY", ":99");
        env.put("FAKE_LOG", log.toString());
    }

    /** A background step still writing would keep the temporary folder from being removed. */
    @AfterEach
    void backgroundStepsFinished() throws Exception {
        waitUntil(() -> aotFiles(".lock").isEmpty() && aotFiles(".part").isEmpty());
    }

    @Test
    void theFeatureReleaseIsReadFromTheJdksReleaseFile() throws Exception {
        // JEP 223 version strings (feature.interim.update), and the 1.x scheme before JDK 9 (common practice).
        fakeJdk(jdks.resolve("a"), "25.0.3", "25.0.3+9-LTS");
        fakeJdk(jdks.resolve("b"), "26-ea", "26-ea+3");
        fakeJdk(jdks.resolve("c"), "1.8.0_392", "1.8.0_392-b08");
        fakeJdk(jdks.resolve("d"), "24", "24+36");
        Files.createDirectories(jdks.resolve("no-release/bin"));
        String out = sourced("for h in a b c d jdk-17 no-release; do jdk_feature \"$ARCWRIGHT_JDKS/$h\"; echo \"$h=$REPLY\"; done");
        assertThat(out.lines()).containsExactly("a=25", "b=26", "c=8", "d=24", "jdk-17=17", "no-release=");
    }

    @Test
    void theNewestJdk24OrLaterIsChosenAndNoneWhenOnlyJdk17IsThere() throws Exception {
        assertThat(sourced("aot_java_home; echo \"[$REPLY]\"")).isEqualTo("[]\n");
        fakeJdk(jdks.resolve("jdk-24"), "24.0.2", "24.0.2+12");
        fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        Path broken = fakeJdk(jdks.resolve("jdk-26"), "26", "26+1");
        Files.setPosixFilePermissions(broken.resolve("bin/java"), PosixFilePermissions.fromString("rw-r--r--"));
        assertThat(sourced("aot_java_home; echo \"$REPLY\"")).isEqualTo(jdks.resolve("jdk-25") + "\n");
        // A JDK home named directly, and a macOS bundle's Contents/Home inside a folder of them.
        Path direct = fakeJdk(tmp.resolve("elsewhere/jdk-27"), "27", "27+2");
        Path bundle = fakeJdk(tmp.resolve("Machines/jdk-28.jdk/Contents/Home"), "28", "28+1");
        env.put("ARCWRIGHT_JDKS", jdks + ":" + direct);
        assertThat(sourced("aot_java_home; echo \"$REPLY\"")).isEqualTo(direct + "\n");
        env.put("ARCWRIGHT_JDKS", jdks + ":" + tmp.resolve("Machines"));
        assertThat(sourced("aot_java_home; echo \"$REPLY\"")).isEqualTo(bundle + "\n");
    }

    @Test
    void theCacheKeyFollowsTheJarsChecksumItsTimeAndTheJdkBuild() throws Exception {
        Path jdk25 = fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        Path jdk25u = fakeJdk(jdks.resolve("jdk-25u"), "25.0.4", "25.0.4+7-LTS");
        Files.createDirectories(aotDir);
        String first = key(jdk25);
        String[] parts = first.split("-");
        assertThat(parts).hasSize(4);
        assertThat(parts[0]).isEqualTo("jar");
        // The jar's checksum: SHA-256 (FIPS 180-4), computed here by the JDK's MessageDigest.
        assertThat(parts[2]).isEqualTo(sha256(jar).substring(0, 16));
        assertThat(key(jdk25)).as("the same jar on the same JDK").isEqualTo(first);
        assertThat(key(jdk25u)).as("another JDK build").startsWith(parts[0] + "-" + parts[1] + "-" + parts[2] + "-").isNotEqualTo(first);

        Files.setLastModifiedTime(jar, FileTime.from(Instant.parse("2026-01-02T03:04:05Z")));
        String touched = key(jdk25);
        assertThat(touched).as("same bytes, new time: the JVM would refuse the old cache").startsWith(parts[0] + "-" + parts[1] + "-" + parts[2] + "-")
                .isNotEqualTo(first);

        Files.writeString(jar, "not really a jar, version 2");
        String rebuilt = key(jdk25);
        assertThat(rebuilt.split("-")[2]).isEqualTo(sha256(jar).substring(0, 16)).isNotEqualTo(parts[2]);
        assertThat(rebuilt).startsWith(parts[0] + "-" + parts[1] + "-");
    }

    @Test
    void theChecksumIsRememberedForTheSameJarAndReadAgainWhenTheJarChanges() throws Exception {
        fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        Files.createDirectories(aotDir);
        String first = key(jdks.resolve("jdk-25"));
        Path memo;
        try (Stream<Path> files = Files.list(aotDir)) {
            memo = files.filter(f -> f.toString().endsWith(".sha256")).findFirst().orElseThrow();
        }
        String line = Files.readString(memo);
        assertThat(line).startsWith(jar.toString()).endsWith(sha256(jar) + "\n");
        // While the jar's size and time match, the remembered checksum is used and the jar is not read.
        Files.writeString(memo, line.replace(sha256(jar), "f".repeat(64)));
        assertThat(key(jdks.resolve("jdk-25")).split("-")[2]).isEqualTo("f".repeat(16));
        // A memo that no longer matches the jar's size and time is not believed.
        Files.writeString(jar, "not really a jar, version 3, longer");
        assertThat(key(jdks.resolve("jdk-25")).split("-")[2]).isEqualTo(sha256(jar).substring(0, 16));
        assertThat(first.split("-")[2]).isNotEqualTo(sha256(jar).substring(0, 16));
    }

    @Test
    void theFirstWindowRecordsTheCacheIsMadeInTheBackgroundAndLaterWindowsStartFromIt() throws Exception {
        Path jdk25 = fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        assertThat(launch()).isZero();
        List<String> calls = calls();
        assertThat(calls.get(0)).startsWith(jdk25.resolve("bin/java").toString())
                .contains("-XX:AOTMode=record", "--enable-native-access=ALL-UNNAMED", "-jar " + jar);
        Path cache = waitForFile(".aot");
        String name = cache.getFileName().toString().replace(".aot", "");
        assertThat(aotDir.resolve(name + ".aotconf")).as("the recording is removed once the cache is made").doesNotExist();
        assertThat(aotDir.resolve(name + ".lock")).doesNotExist();
        assertThat(calls()).anySatisfy(c -> assertThat(c).contains("-XX:AOTMode=create", "-XX:AOTConfiguration=" + aotDir.resolve(name + ".aotconf")));

        Files.write(log, new byte[0]);
        assertThat(launch()).isZero();
        assertThat(calls()).singleElement().asString().startsWith(jdk25.resolve("bin/java").toString())
                .contains("-XX:AOTCache=" + cache, "-jar " + jar).doesNotContain("AOTMode");
    }

    @Test
    void aCacheOfAnotherBuildOfTheJarIsNeverOfferedAndGoesOnceTheNewOneIsMade() throws Exception {
        fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        assertThat(launch()).isZero();
        Path old = waitForFile(".aot");
        Files.writeString(jar, "not really a jar, version 2");
        Files.write(log, new byte[0]);
        assertThat(launch()).isZero();
        assertThat(calls().get(0)).contains("-XX:AOTMode=record").doesNotContain(old.toString());
        waitUntil(() -> !Files.exists(old) && aotFiles(".aot").size() == 1);
        assertThat(aotFiles(".aot")).singleElement().isNotEqualTo(old);
    }

    @Test
    void anEmptyCacheOrAFolderInItsPlaceIsNotUsed() throws Exception {
        Path jdk25 = fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        Files.createDirectories(aotDir);
        String name = key(jdk25);
        Files.createFile(aotDir.resolve(name + ".aot"));
        assertThat(launch()).isZero();
        assertThat(calls().get(0)).contains("-XX:AOTMode=record").doesNotContain("-XX:AOTCache=");
        waitForFile(".aot");
        assertThat(Files.size(aotDir.resolve(name + ".aot"))).isPositive();

        Files.delete(aotDir.resolve(name + ".aot"));
        Files.createDirectories(aotDir.resolve(name + ".aot/inside"));
        Files.write(log, new byte[0]);
        assertThat(launch()).isZero();
        assertThat(calls().get(0)).contains("-XX:AOTMode=record").doesNotContain("-XX:AOTCache=");
    }

    @Test
    void aCacheThatCouldNotBeMadeIsNotRetriedAtEveryStart() throws Exception {
        Path jdk25 = fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        env.put("FAKE_CREATE_FAILS", "yes");
        assertThat(launch()).isZero();
        waitForFile(".failed");
        Files.write(log, new byte[0]);
        assertThat(launch()).isZero();
        assertThat(calls()).singleElement().asString().startsWith(jdk25.resolve("bin/java").toString())
                .doesNotContain("AOTMode", "AOTCache", "AOTConfiguration");
    }

    @Test
    void withOnlyJdk17OrWithTheCacheTurnedOffTheWindowRunsOnJavaWithItsClassDataArchive() throws Exception {
        Path pathJava = tmp.resolve("path-java/bin/java");
        assertThat(launch()).isZero();
        assertThat(calls()).singleElement().asString().startsWith(pathJava.toString())
                .contains("-Xshare:auto", "-XX:ArchiveClassesAtExit=").doesNotContain("AOT");
        assertThat(aotDir).doesNotExist();

        fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        env.put("ARCWRIGHT_AOT", "off");
        Files.write(log, new byte[0]);
        assertThat(launch()).isZero();
        assertThat(calls()).singleElement().asString().startsWith(pathJava.toString()).doesNotContain("AOT");
    }

    @Test
    void theCommandLineAndAWindowlessStartRecordNothing() throws Exception {
        Path jdk25 = fakeJdk(jdks.resolve("jdk-25"), "25.0.3", "25.0.3+9-LTS");
        assertThat(launch("limits", "R2 +0.1/-0.1")).isZero();
        assertThat(calls()).singleElement().asString().startsWith(tmp.resolve("path-java/bin/java").toString())
                .endsWith("limits R2 +0.1/-0.1").doesNotContain("AOT");

        env.remove("DISPLAY");
        Files.write(log, new byte[0]);
        assertThat(launch()).isZero();
        assertThat(calls()).singleElement().asString().startsWith(jdk25.resolve("bin/java").toString()).doesNotContain("AOT");
        assertThat(aotFiles(".aotconf")).isEmpty();
    }

    @Test
    void theFirstSimulationAfterABuildListsItsClassesTheArchiveIsMadeInTheBackgroundAndLaterRunsStartFromIt() throws Exception {
        Path java = tmp.resolve("path-java/bin/java");
        Path target = jar.getParent();
        String name = "arcwright-simulate-" + javaKey();
        Path list = target.resolve(name + ".classlist");
        Path archive = target.resolve(name + ".jsa");
        assertThat(launch("simulate", "part.json")).isZero();
        assertThat(calls().get(0)).startsWith(java.toString())
                .contains("-XX:TieredStopAtLevel=1", "-XX:DumpLoadedClassList=").endsWith("-jar " + jar + " simulate part.json");
        waitUntil(() -> Files.exists(archive) && !Files.exists(target.resolve(name + ".jsa.lock")));
        assertThat(Files.readString(archive)).as("dumped from the list without its lambda-proxy lines")
                .isEqualTo("java/lang/Object id: 0\n");
        assertThat(calls()).anySatisfy(c -> assertThat(c).contains("-Xshare:dump", "-XX:SharedArchiveFile=" + archive + ".",
                "-XX:+UseSerialGC", "-cp " + jar));
        assertThat(list).exists();

        Files.write(log, new byte[0]);
        assertThat(launch("simulate", "part.json")).isZero();
        assertThat(calls()).singleElement().asString().contains("-XX:SharedArchiveFile=" + archive, "-jar " + jar)
                .doesNotContain("DumpLoadedClassList");

        // An updated JDK (another build in the same home) refuses the old archive: it gets one of its own,
        // and the old one goes once the new one is made.
        fakeJdk(tmp.resolve("path-java"), "17.0.16", "17.0.16+8");
        String updated = "arcwright-simulate-" + javaKey();
        assertThat(updated).isNotEqualTo(name);
        Files.write(log, new byte[0]);
        assertThat(launch("simulate", "part.json")).isZero();
        assertThat(calls().get(0)).contains("-XX:DumpLoadedClassList=").doesNotContain("SharedArchiveFile");
        waitUntil(() -> Files.exists(target.resolve(updated + ".jsa")) && !Files.exists(archive)
                && !Files.exists(target.resolve(updated + ".jsa.lock")));

        // A rebuilt jar records again; an archive that cannot be made is not retried at every run.
        Files.writeString(jar, "not really a jar, version 2");
        env.put("FAKE_CREATE_FAILS", "yes");
        Files.write(log, new byte[0]);
        assertThat(launch("simulate", "part.json")).isZero();
        assertThat(calls().get(0)).contains("-XX:DumpLoadedClassList=").doesNotContain("SharedArchiveFile");
        waitUntil(() -> Files.exists(target.resolve(updated + ".jsa.failed"))
                && !Files.exists(target.resolve(updated + ".jsa.lock")));
        Files.write(log, new byte[0]);
        assertThat(launch("simulate", "part.json")).isZero();
        assertThat(calls()).singleElement().asString().doesNotContain("SharedArchiveFile", "DumpLoadedClassList");
    }

    @Test
    void notesCommandsGetAStaticArchiveTooNeverOneWrittenAtExit() throws Exception {
        // JDK 17 crashed (exit 134, an hs_err file in the working folder) writing an archive at the exit
        // of every notes command: the launcher had asked for one with -XX:ArchiveClassesAtExit
        String name = "arcwright-notes-" + javaKey();
        Path archive = jar.getParent().resolve(name + ".jsa");
        assertThat(launch("notes", "search", "fillet")).isZero();
        assertThat(calls().get(0)).contains("-XX:DumpLoadedClassList=").doesNotContain("ArchiveClassesAtExit")
                .endsWith("notes search fillet");
        waitUntil(() -> Files.exists(archive) && !Files.exists(jar.getParent().resolve(name + ".jsa.lock")));
        Files.write(log, new byte[0]);
        assertThat(launch("notes", "search", "fillet")).isZero();
        assertThat(calls()).singleElement().asString().contains("-XX:SharedArchiveFile=" + archive);
    }

    @Test
    void anInstallationTheUserCannotWriteToRecordsNoArchive() throws Exception {
        // the tests may run as root, who can write anywhere: the folder's check is stood in for
        String plan = sourced("here=\"$1\"; jar=\"$2\"; target_writable() { return 1; }; "
                + "command_archive_plan simulate; echo \"$cds_plan\"", app.toString(), jar.toString()).strip();
        assertThat(plan).isEqualTo("plain");
        String writable = sourced("here=\"$1\"; jar=\"$2\"; command_archive_plan simulate; echo \"$cds_plan\"",
                app.toString(), jar.toString()).strip();
        assertThat(writable).isEqualTo("record");
    }

    // ---- helpers ----

    /** The launcher's name for the JDK that `java` on the test's PATH runs. */
    private String javaKey() throws Exception {
        return sourced("java_key; echo \"$REPLY\"").strip();
    }

    private String key(Path jdkHome) throws Exception {
        return sourced("aot_key \"$1\" \"$2\" \"$3\"; echo \"$REPLY\"", jar.toString(), jdkHome.toString(), aotDir.toString()).strip();
    }

    /** Runs {@code script} in bash after sourcing the launcher; returns standard output. */
    private String sourced(String script, String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of("/bin/bash", "-c", "source \"$1\"; shift; " + script, "bash", app.resolve("arcwright").toString()));
        cmd.addAll(List.of(args));
        Result r = run(cmd);
        assertThat(r.status()).as(r.err()).isZero();
        return r.out();
    }

    /** Runs the launcher copy as a user would; returns its exit status. */
    private int launch(String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(app.resolve("arcwright").toString()));
        cmd.addAll(List.of(args));
        Result r = run(cmd);
        assertThat(r.err()).isEmpty();
        return r.status();
    }

    private record Result(int status, String out, String err) {}

    private Result run(List<String> cmd) throws Exception {
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(tmp.toFile());
        pb.environment().clear();
        pb.environment().putAll(env);
        Path out = Files.createTempFile(tmp, "out", ".txt");
        Path err = Files.createTempFile(tmp, "err", ".txt");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        Process p = pb.start();
        if (!p.waitFor(30, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("the launcher did not finish: " + cmd);
        }
        return new Result(p.exitValue(), Files.readString(out), Files.readString(err));
    }

    private List<String> calls() throws IOException {
        return Files.readAllLines(log, StandardCharsets.UTF_8);
    }

    private List<Path> aotFiles(String suffix) throws IOException {
        if (!Files.isDirectory(aotDir)) return List.of();
        try (Stream<Path> files = Files.list(aotDir)) {
            return files.filter(f -> f.getFileName().toString().endsWith(suffix)).toList();
        }
    }

    /** Waits for the background step to leave a file ending in {@code suffix} (and to let go of its lock). */
    private Path waitForFile(String suffix) throws Exception {
        waitUntil(() -> aotFiles(suffix).size() == 1 && aotFiles(".lock").isEmpty());
        return aotFiles(suffix).get(0);
    }

    private interface Check {
        boolean holds() throws IOException;
    }

    private static void waitUntil(Check check) throws Exception {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(20);
        while (!check.holds()) {
            if (System.nanoTime() > end) throw new AssertionError("the background step did not finish in 20 s");
            Thread.sleep(25);
        }
    }

    private static Path fakeJdk(Path home, String version, String build) throws IOException {
        Files.createDirectories(home.resolve("bin"));
        Files.writeString(home.resolve("release"), "IMPLEMENTOR=\"Stand-in\"\nJAVA_RUNTIME_VERSION=\"" + build
                + "\"\nJAVA_VERSION=\"" + version + "\"\n");
        Files.writeString(home.resolve("bin/java"), FAKE_JAVA);
        executable(home.resolve("bin/java"));
        return home;
    }

    private static void executable(Path file) throws IOException {
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rwxr-xr-x"));
    }

    private static String sha256(Path file) throws IOException, NoSuchAlgorithmException {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
    }
}
