package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.ConfigDirectory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SettingsAndRecoveryTest {
    @TempDir
    Path dir;

    @Test
    void settingsRoundTripAndAMissingFileMeansAFirstRun() {
        SettingsStore store = new SettingsStore(dir, new JsonFiles());
        assertThat(store.isFirstRun()).isTrue();
        assertThat(store.load()).isEqualTo(Settings.DEFAULTS);
        Settings s = Settings.DEFAULTS.withTheme(ThemeChoice.DARK).withRecent("/a.arcpart").withDemoShown();
        store.save(s);
        assertThat(store.isFirstRun()).isFalse();
        assertThat(store.load()).isEqualTo(s);
    }

    @Test
    void aDamagedSettingsFileFallsBackToDefaultsAndSaysWhy() throws Exception {
        Files.writeString(dir.resolve(SettingsStore.FILE_NAME), "{ \"theme\": ");
        SettingsStore store = new SettingsStore(dir, new JsonFiles());
        assertThat(store.load()).isEqualTo(Settings.DEFAULTS);
        assertThat(store.lastProblem()).isNotNull();
    }

    @Test
    void recentFilesKeepTheLatestFirstWithoutDuplicatesUpToTheLimit() {
        Settings s = Settings.DEFAULTS;
        for (int i = 0; i < 15; i++) s = s.withRecent("/f" + i);
        s = s.withRecent("/f10");
        assertThat(s.recentFiles()).hasSize(Settings.RECENT_LIMIT).first().isEqualTo("/f10");
        assertThat(s.recentFiles()).doesNotHaveDuplicates();
    }

    @Test
    void unsavedEditsAreAutosavedAndASaveRemovesTheAutosave() {
        RecoveryStore store = new RecoveryStore(dir, new JsonFiles());
        Autosaver autosaver = new Autosaver(store, Runnable::run, Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"), ZoneOffset.UTC));
        WorksheetSession session = new WorksheetSession(Fixtures.files(), Fixtures.twoFeatures(), null);
        session.listeners().add(() -> autosaver.sessionChanged(session));
        session.addFeature();
        RecoveryStore.Recovered r = store.find().orElseThrow();
        assertThat(r.worksheet()).isEqualTo(session.worksheet());
        assertThat(r.savedAt()).isEqualTo("2026-01-02T03:04:05Z");
        session.saveAs(dir.resolve("x.arcpart"));
        assertThat(store.find()).isEmpty();
    }

    @Test
    void theConfigDirectoryFollowsEachOperatingSystemsConvention() {
        assertThat(ConfigDirectory.resolve(null, "Linux", "/home/u", Map.of())).isEqualTo(Path.of("/home/u/.config/arcwright"));
        assertThat(ConfigDirectory.resolve(null, "Linux", "/home/u", Map.of("XDG_CONFIG_HOME", "/x")))
                .isEqualTo(Path.of("/x/arcwright"));
        assertThat(ConfigDirectory.resolve(null, "Mac OS X", "/Users/u", Map.of()))
                .isEqualTo(Path.of("/Users/u/Library/Application Support/Arcwright"));
        assertThat(ConfigDirectory.resolve("/tmp/c", "Linux", "/home/u", Map.of())).isEqualTo(Path.of("/tmp/c"));
    }

    @Test
    void theSystemLookIsDarkWhenTheDesktopThemeSaysSo() {
        assertThat(ThemeChoice.SYSTEM.isDark(ThemeChoice.systemPrefersDark("Adwaita:dark", null))).isTrue();
        assertThat(ThemeChoice.SYSTEM.isDark(ThemeChoice.systemPrefersDark(null, "Adwaita"))).isFalse();
        assertThat(ThemeChoice.LIGHT.isDark(true)).isFalse();
    }
}
