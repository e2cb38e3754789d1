package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.arcwright.notes.NotesPaths;
import org.arcwright.notes.NotesStore;
import org.arcwright.pack.PackStack;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** The options every {@code notes} subcommand shares: which packs, which personal pack, which cache. */
final class NotesOptions {
    @Mixin
    PackOptions packs;

    @Option(names = "--index-cache", paramLabel = "DIR",
            description = "Folder for the search index cache (default: $XDG_CACHE_HOME/arcwright/notes-index or ~/.cache/arcwright/notes-index).")
    Path indexCache;

    Path personalFolder() {
        return packs.personalFolder();
    }

    /** Opens the store; the personal pack is created first when {@code createPersonal}, else used only if it exists. */
    NotesStore open(boolean createPersonal, PrintWriter err) {
        if (createPersonal) NotesPaths.ensurePersonalPack(personalFolder());
        PackStack stack = packs.load("notes", err);
        if (!stack.problems().isEmpty()) throw stack.problems().get(0);
        Path root = indexCache != null ? indexCache : NotesPaths.ofSystem().indexRoot();
        return NotesStore.open(stack, NotesStore.indexFolderFor(root, stack));
    }
}
