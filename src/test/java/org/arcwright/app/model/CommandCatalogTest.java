package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Optional;
import org.junit.jupiter.api.Test;

class CommandCatalogTest {
    private final CommandCatalog catalog = new CommandCatalog();

    CommandCatalogTest() {
        catalog.add(Command.always("file.save", "Save", "File", "ctrl S", () -> { }));
        catalog.add(Command.always("file.saveAs", "Save as…", "File", "ctrl shift S", () -> { }));
        catalog.add(Command.always("part.add", "Add feature", "Part", "ctrl shift N", () -> { }));
        catalog.add(new Command("edit.undo", "Undo", "Edit", "ctrl Z", () -> Optional.of("there is nothing to undo"), () -> { }));
    }

    @Test
    void aBlankQueryListsEveryCommandInOrder() {
        assertThat(catalog.search(" ")).extracting(Command::id).containsExactly("file.save", "file.saveAs", "part.add", "edit.undo");
    }

    @Test
    void titlesStartingWithTheQueryComeFirst() {
        assertThat(catalog.search("sa")).extracting(Command::id).startsWith("file.save", "file.saveAs");
    }

    @Test
    void wordPrefixesAndLettersInOrderAlsoMatch() {
        assertThat(catalog.search("add feat")).extracting(Command::id).containsExactly("part.add");
        assertThat(catalog.search("adft")).extracting(Command::id).containsExactly("part.add");
        assertThat(catalog.search("zzz")).isEmpty();
    }

    @Test
    void aDisabledCommandSaysWhy() {
        Command undo = catalog.byId("edit.undo").orElseThrow();
        assertThat(undo.isEnabled()).isFalse();
        assertThat(undo.whyDisabled().get()).contains("there is nothing to undo");
    }

    @Test
    void shortcutsReadAsPeopleWriteThem() {
        assertThat(catalog.byId("file.saveAs").orElseThrow().shortcutLabel()).isEqualTo("Ctrl+Shift+S");
    }

    @Test
    void duplicateIdsAreRejected() {
        assertThatThrownBy(() -> catalog.add(Command.always("file.save", "x", "File", null, () -> { })))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
