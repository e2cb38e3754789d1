package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Commands take the packs of the user's settings when none are given on the command line. */
class PackSettingsCommandTest {
    @TempDir
    Path dir;

    private static final String SHOULDER = """
            {"units": "mm", "standard": "asme", "feature": "F1 shoulder", "kind": "fillet", "nominalRadius": 2,
             "function": "stress-relief", "loading": "fatigue", "formMatters": true, "datums": ["A"], "process": "machined"}
            """;

    private Path config(String settingsJson) throws Exception {
        Path cfg = Files.createDirectories(dir.resolve("config"));
        Files.writeString(cfg.resolve("settings.json"), settingsJson);
        return cfg;
    }

    private CliRun advise(Path cfg, String... extra) throws Exception {
        Path c = dir.resolve("case.json");
        Files.writeString(c, SHOULDER);
        String[] base = {"advise", c.toString(), "--no-notes", "--config-dir", cfg.toString()};
        String[] all = new String[base.length + extra.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(extra, 0, all, base.length, extra.length);
        return CliRun.of(all);
    }

    private static String abs(String p) {
        return Path.of(p).toAbsolutePath().toString().replace("\\", "\\\\");
    }

    @Test
    void adviseLayersTheTeamPacksOfTheSettingsWhenNoPackIsGiven() throws Exception {
        Path cfg = config("{\"theme\": \"SYSTEM\", \"teamPacks\": [\"" + abs("shared") + "\"], \"demoShown\": true}");
        CliRun r = advise(cfg);
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).contains("Tarnbeck Drives practice", "1. CR2 +0.1/0");
    }

    @Test
    void noSettingsAndAnExplicitPackBothSetTheSettingsAside() throws Exception {
        Path cfg = config("{\"teamPacks\": [\"" + abs("shared") + "\"]}");
        CliRun ignored = advise(cfg, "--no-settings");
        assertThat(ignored.out()).doesNotContain("Tarnbeck").contains("1. CR2 +0.2/0");
        Path other = Files.createDirectories(dir.resolve("other"));
        Files.writeString(other.resolve("pack.json"), "{\"name\": \"Other practice\", \"version\": \"1\"}");
        CliRun explicit = advise(cfg, "--pack", other.toString());
        assertThat(explicit.exitCode()).as(explicit.err()).isZero();
        assertThat(explicit.out()).contains("Other practice").doesNotContain("Tarnbeck");
    }

    @Test
    void thePersonalPackOfTheSettingsIsLayeredLastUnlessPersonalIsGiven() throws Exception {
        Path mine = Files.createDirectories(dir.resolve("mine"));
        Files.writeString(mine.resolve("pack.json"), "{\"name\": \"Ada's practice\", \"version\": \"1\"}");
        Path cfg = config("{\"personalPack\": \"" + mine.toString().replace("\\", "\\\\") + "\"}");
        assertThat(advise(cfg).out()).contains("< Ada's practice");
        assertThat(advise(cfg, "--personal", dir.resolve("none").toString()).out()).doesNotContain("Ada's practice");
    }

    @Test
    void aDamagedSettingsFileIsAWarningAndTheCommandStillRuns() throws Exception {
        Path cfg = config("{\"teamPacks\": [");
        CliRun r = advise(cfg);
        assertThat(r.exitCode()).isZero();
        assertThat(r.err()).contains("settings not used", "settings.json");
        assertThat(r.out()).contains("1. CR2 +0.2/0");
    }

    @Test
    void aMissingPackInTheSettingsIsSkippedWithAWarning() throws Exception {
        Path cfg = config("{\"teamPacks\": [\"" + dir.resolve("gone").toString().replace("\\", "\\\\") + "\"]}");
        CliRun r = CliRun.of("general-tolerance", "--config-dir", cfg.toString(), "--class", "m", "--radius", "5");
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.err()).contains("pack from your settings skipped", "gone");
    }

    @Test
    void packCheckLayersTheSettingsPacksListedBelowTheCheckedOne() throws Exception {
        Path cfg = config("{\"teamPacks\": [\"" + abs("shared") + "\"]}");
        CliRun r = CliRun.of("pack", "check", "shared", "--config-dir", cfg.toString());
        assertThat(r.exitCode()).as(r.out() + r.err()).isZero();
        CliRun builtIn = CliRun.of("pack", "check", "knowledge", "--config-dir", cfg.toString());
        assertThat(builtIn.exitCode()).as(builtIn.out() + builtIn.err()).isZero();
    }
}
