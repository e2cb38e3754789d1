package org.arcwright.pack;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.arcwright.io.JsonFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The packs chosen in the user's settings, and where those settings live. */
class PackSettingsTest {
    @TempDir
    Path dir;

    @Test
    void configDirectoryFollowsTheOverrideThenTheOperatingSystemsConvention() {
        // conventions: Windows %APPDATA%, macOS Application Support, XDG Base Directory Specification (common practice)
        Map<String, String> none = Map.of();
        assertThat(ConfigDirectory.resolve("/tmp/cfg", "Linux", "/home/ada", none)).isEqualTo(Path.of("/tmp/cfg"));
        assertThat(ConfigDirectory.resolve(null, "Windows 11", "C:/Users/ada", Map.of("APPDATA", "C:/Users/ada/AppData/Roaming")))
                .isEqualTo(Path.of("C:/Users/ada/AppData/Roaming", "Arcwright"));
        assertThat(ConfigDirectory.resolve(null, "Mac OS X", "/Users/ada", none))
                .isEqualTo(Path.of("/Users/ada", "Library", "Application Support", "Arcwright"));
        assertThat(ConfigDirectory.resolve(" ", "Linux", "/home/ada", Map.of("XDG_CONFIG_HOME", "/xdg")))
                .isEqualTo(Path.of("/xdg", "arcwright"));
        assertThat(ConfigDirectory.resolve(null, "Linux", "/home/ada", none)).isEqualTo(Path.of("/home/ada", ".config", "arcwright"));
    }

    @Test
    void takesTeamPacksInOrderAndThePersonalPackAndIgnoresTheAppsOtherFields() throws Exception {
        Files.writeString(dir.resolve("settings.json"), """
                {"theme": "DARK", "recentFiles": ["a.arcpart"], "teamPacks": ["/packs/group", "/packs/site"],
                 "personalPack": "/home/ada/mine", "demoShown": true, "somethingNewer": {"x": 1}}
                """);
        PackSettings s = PackSettings.read(dir, new JsonFiles());
        assertThat(s.problem()).isEmpty();
        assertThat(s.teamPacks()).containsExactly(Path.of("/packs/group"), Path.of("/packs/site"));
        assertThat(s.personalPack()).isEqualTo(Path.of("/home/ada/mine"));
    }

    @Test
    void aMissingFileOrMissingFieldsMeanNoPacksChosen() throws Exception {
        PackSettings missing = PackSettings.read(dir, new JsonFiles());
        assertThat(missing.teamPacks()).isEmpty();
        assertThat(missing.personalPack()).isNull();
        assertThat(missing.problem()).isEmpty();
        Files.writeString(dir.resolve("settings.json"), "{\"theme\": \"LIGHT\", \"personalPack\": null}");
        PackSettings bare = PackSettings.read(dir, new JsonFiles());
        assertThat(bare.teamPacks()).isEmpty();
        assertThat(bare.personalPack()).isNull();
        assertThat(bare.problem()).isEmpty();
    }

    @Test
    void aDamagedFileIsAProblemNamingTheFileNotAnError() throws Exception {
        Files.writeString(dir.resolve("settings.json"), "{\"teamPacks\": [\"/a\",\n");
        PackSettings broken = PackSettings.read(dir, new JsonFiles());
        assertThat(broken.teamPacks()).isEmpty();
        assertThat(broken.problem()).isPresent();
        assertThat(broken.problem().get().source()).isEqualTo(dir.resolve("settings.json").toString());

        Files.writeString(dir.resolve("settings.json"), "{\"teamPacks\": [\"/a\", 7]}");
        PackSettings wrongType = PackSettings.read(dir, new JsonFiles());
        assertThat(wrongType.teamPacks()).isEmpty();
        assertThat(wrongType.problem().get().getMessage()).contains("settings.json", "teamPacks[1]", "folder path");
    }
}
