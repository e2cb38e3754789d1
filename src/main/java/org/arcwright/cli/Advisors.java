package org.arcwright.cli;

import java.io.Closeable;
import java.nio.file.Path;
import java.util.function.Consumer;
import org.arcwright.notes.NotesPaths;
import org.arcwright.notes.NotesStore;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.MechanicsChecks;
import org.arcwright.rules.NoteLinker;
import org.arcwright.rules.RuleBook;
import org.arcwright.services.Practice;

/** Builds the advisor the commands use: the packs' rules, the mechanics checks and, when asked, the notes store. */
final class Advisors {
    private Advisors() {}

    /** Rules of {@code stack} and the mechanics checks, no notes. */
    static Advisor standard(PackStack stack, RuleBook book) {
        return new Advisor(book, MechanicsChecks.standard(stack), NoteLinker.NONE);
    }

    /** An advisor with notes linked from the packs' notes, and the store to close when done. */
    record WithNotes(Advisor advisor, Closeable store) {}

    /**
     * Opens the notes of {@code stack} (index under {@code indexRoot}, or the user's cache) and links
     * them; when the store cannot open, the advisor works without notes and {@code warn} is told why.
     */
    static WithNotes withNotes(PackStack stack, RuleBook book, Path indexRoot, Consumer<String> warn) {
        NotesStore store;
        try {
            Path root = indexRoot != null ? indexRoot : NotesPaths.ofSystem().indexRoot();
            store = NotesStore.open(stack, NotesStore.indexFolderFor(root, stack));
        } catch (RuntimeException e) {
            warn.accept("notes not linked: " + e.getMessage());
            return new WithNotes(standard(stack, book), () -> { });
        }
        NoteLinker linker = Practice.linker(store);
        return new WithNotes(new Advisor(book, MechanicsChecks.standard(stack), linker), store);
    }
}
