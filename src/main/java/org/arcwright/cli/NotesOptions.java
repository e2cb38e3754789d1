package org.arcwright.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.arcwright.notes.NotesPaths;
import org.arcwright.notes.NotesStore;
import org.arcwright.pack.PackStack;
import picocli.CommandLine.Option;

/** The options every {@code notes} subcommand shares: which packs, which personal pack, which cache. */
final class NotesOptions {
    @Option(names = "--pack", paramLabel = "DIR",
            description = "A team practice pack layered over the built-in one (repeatable, later wins).")
    List<Path> packs = new ArrayList<>();

    @Option(names = "--personal", paramLabel = "DIR",
            description = "Your personal pack (default: $XDG_CONFIG_HOME/arcwright/personal-pack or ~/.config/arcwright/personal-pack).")
    Path personal;

    @Option(names = "--index-cache", paramLabel = "DIR",
            description = "Folder for the search index cache (default: $XDG_CACHE_HOME/arcwright/notes-index or ~/.cache/arcwright/notes-index).")
    Path indexCache;

    Path personalFolder() {
        return personal != null ? personal : NotesPaths.ofSystem().personalPack();
    }

    /** Opens the store; the personal pack is created first when {@code createPersonal}, else used only if it exists. */
    NotesStore open(boolean createPersonal) {
        Path p = personalFolder();
        if (createPersonal) NotesPaths.ensurePersonalPack(p);
        Path personalPack = Files.isRegularFile(p.resolve("pack.json")) ? p : null;
        PackStack stack = PackStack.load(packs, personalPack);
        if (!stack.problems().isEmpty()) throw stack.problems().get(0);
        Path root = indexCache != null ? indexCache : NotesPaths.ofSystem().indexRoot();
        return NotesStore.open(stack, NotesStore.indexFolderFor(root, stack));
    }
}
