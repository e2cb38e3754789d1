package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.notes.NotesPaths;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TeamPacksTest {
    private final TeamPacks packs = new TeamPacks(new JsonFiles());

    private static Path pack(Path dir, String folder, String name) throws Exception {
        Path p = dir.resolve(folder);
        Files.createDirectories(p);
        Files.writeString(p.resolve("pack.json"), "{\"name\": \"" + name + "\"}");
        return p;
    }

    @Test
    void aPackFolderIsAddedOnTopOnceAndMovesAndGoes(@TempDir Path dir) throws Exception {
        Path kestrel = pack(dir, "kestrel", "Kestrel Works practice");
        Path fenmore = pack(dir, "fenmore", "Fenmore Castings practice");
        List<String> one = packs.add(List.of(), kestrel, null);
        List<String> two = packs.add(one, fenmore, null);
        assertThat(two).containsExactly(kestrel.toString(), fenmore.toString());
        assertThatThrownBy(() -> packs.add(two, kestrel, null)).isInstanceOf(InputProblem.class).hasMessageContaining("already");
        assertThat(TeamPacks.move(two, 1, -1)).containsExactly(fenmore.toString(), kestrel.toString());
        assertThat(TeamPacks.move(two, 1, 1)).isEqualTo(two);
        assertThat(TeamPacks.remove(two, 0)).containsExactly(fenmore.toString());
    }

    @Test
    void aFolderThatIsNotAPackOrIsThePersonalPackIsRefusedWithItsReason(@TempDir Path dir) throws Exception {
        Path empty = Files.createDirectories(dir.resolve("empty"));
        assertThatThrownBy(() -> packs.add(List.of(), empty, null)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("pack.json");
        Path broken = Files.createDirectories(dir.resolve("broken"));
        Files.writeString(broken.resolve("pack.json"), "{\"name\": }");
        assertThatThrownBy(() -> packs.add(List.of(), broken, null)).isInstanceOfSatisfying(InputProblem.class,
                p -> assertThat(p.source()).endsWith("pack.json"));
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        assertThatThrownBy(() -> packs.add(List.of(), personal, personal)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("personal pack");
    }

    @Test
    void theSummaryNamesThePacksInForceLowestFirst(@TempDir Path dir) throws Exception {
        Path kestrel = pack(dir, "kestrel", "Kestrel Works practice");
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        TeamPacks.Summary s = TeamPacks.summary(PackStack.load(List.of(kestrel, dir.resolve("gone")), personal));
        assertThat(s.text()).isEqualTo("Packs: built-in + 1 team + personal (1 not opened)");
        assertThat(s.lines()).hasSize(4);
        assertThat(s.lines().get(0)).startsWith("Built-in: ");
        assertThat(s.lines().get(1)).startsWith("Team: Kestrel Works practice");
        assertThat(s.lines().get(2)).startsWith("Personal: ");
        assertThat(s.lines().get(3)).startsWith("Not opened: ").contains("gone");
    }
}
