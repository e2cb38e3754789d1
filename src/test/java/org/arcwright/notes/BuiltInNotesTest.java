package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The notes that ship in the built-in pack are well formed and say what they lean on. */
class BuiltInNotesTest {
    private static List<PackStack.PackFile> files() {
        return PackStack.builtIn().files("notes", ".md");
    }

    @Test
    void thereAreAtLeastFortyBuiltInNotes() {
        assertThat(files()).hasSizeGreaterThanOrEqualTo(40);
    }

    @Test
    void everyNoteParsesHasAUniqueIdMatchingItsFileAndNamesASource() throws Exception {
        Set<String> ids = new HashSet<>();
        for (PackStack.PackFile f : files()) {
            Note n = NoteFormat.parse(Files.readString(f.path()), f.path().toString());
            assertThat(f.path().getFileName().toString()).as("file name of %s", n.id()).isEqualTo(n.id() + ".md");
            assertThat(ids.add(n.id())).as("unique id %s", n.id()).isTrue();
            assertThat(n.standards()).as("standard of %s", n.id()).isNotEmpty();
            assertThat(n.body()).as("body of %s", n.id()).contains("Source");
            assertThat(n.functions()).as("functions of %s", n.id()).isNotEmpty();
            assertThat(n.body().length()).as("length of %s", n.id()).isBetween(600, 4000);
        }
    }

    @Test
    void theBuiltInIndexBuildsWithoutProblems(@TempDir Path tmp) {
        try (NotesStore store = NotesStore.open(PackStack.builtIn(), tmp)) {
            assertThat(store.problems()).isEmpty();
            assertThat(store.size()).isEqualTo(files().size());
        }
    }
}
