package org.arcwright.pack;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PackStackTest {

    @Test
    void builtInPackLoadsFromTheClasspath() {
        PackStack stack = PackStack.builtIn();
        assertThat(stack.packs()).hasSize(1);
        assertThat(stack.packs().get(0).isBuiltIn()).isTrue();
        assertThat(stack.files("tables", ".json")).isNotEmpty();
    }

    @Test
    void aBrokenTeamPackIsReportedAndTheOthersStillLoad(@TempDir Path dir) throws Exception {
        Path good = dir.resolve("good");
        Files.createDirectories(good);
        Files.writeString(good.resolve("pack.json"), "{\"name\": \"Good team\"}");
        Path broken = dir.resolve("broken");
        Files.createDirectories(broken);
        Files.writeString(broken.resolve("pack.json"), "{\"name\": ");
        Path missing = dir.resolve("missing");
        PackStack stack = PackStack.load(List.of(broken, good, missing), null);
        assertThat(stack.packs()).extracting(PracticePack::name)
                .containsExactly("Arcwright built-in practice", "Good team");
        assertThat(stack.problems()).hasSize(2);
        assertThat(stack.problems().get(0).getMessage()).contains("broken").contains("pack.json");
        assertThat(stack.problems().get(1).getMessage()).contains("not a practice pack folder");
    }

    @Test
    void filesComeLowestLayerFirst(@TempDir Path dir) throws Exception {
        Path team = dir.resolve("team");
        Files.createDirectories(team.resolve("tables"));
        Files.writeString(team.resolve("pack.json"), "{\"name\": \"Team\"}");
        Files.writeString(team.resolve("tables/a.json"), "{}");
        PackStack stack = PackStack.load(List.of(team), null);
        List<PackStack.PackFile> files = stack.files("tables", ".json");
        assertThat(files.get(files.size() - 1).pack().name()).isEqualTo("Team");
        assertThat(files.get(0).pack().isBuiltIn()).isTrue();
    }
}
