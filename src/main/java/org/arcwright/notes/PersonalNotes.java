package org.arcwright.notes;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetsConfig;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;

/**
 * Writes notes into the stack's personal pack, atomically ({@link AtomicFiles}), and says what the
 * index must take in: the note's document and how the stamp of the note files changed.
 */
final class PersonalNotes {
    private final PackStack stack;
    private final FacetsConfig facetsConfig;

    /** A note written: where it is now, its index document, and the change to the note files' stamp. */
    record Written(FiledNote filed, Document document, long stampDelta) {}

    PersonalNotes(PackStack stack, FacetsConfig facetsConfig) {
        this.stack = stack;
        this.facetsConfig = facetsConfig;
    }

    /** The personal pack (the top one when there are several); an {@link InputProblem} when none is open. */
    PracticePack personalPack() {
        for (int i = stack.packs().size() - 1; i >= 0; i--) {
            PracticePack p = stack.packs().get(i);
            if (p.layer() == PackLayer.PERSONAL) return p;
        }
        throw InputProblem.ofField("personal pack", "no personal pack is open, so there is nowhere to save the note");
    }

    /**
     * The file a note with {@code id} goes to: the file of the personal note in force under that id,
     * if it has one, else {@code notes/ID.md} in the personal pack.
     */
    Path target(String id, Optional<FiledNote> current) {
        PracticePack personal = personalPack();
        if (current.isPresent() && current.get().layer() == PackLayer.PERSONAL
                && current.get().pack().equals(personal.name())) {
            Path p = Path.of(current.get().location());
            if (p.startsWith(personal.root())) return p;
        }
        return personal.root().resolve("notes").resolve(id + ".md");
    }

    /** Writes {@code text} (the note's file) to {@code target} in the personal pack. */
    Written write(Note note, String text, Path target) {
        PracticePack personal = personalPack();
        int packIndex = stack.packs().indexOf(personal);
        long delta = 0;
        if (Files.exists(target)) delta -= SourceScan.entry(packIndex, personal, target).stamp();
        AtomicFiles.writeString(target, text);
        delta += SourceScan.entry(packIndex, personal, target).stamp();
        String location = target.toString();
        String hash = NoteDocuments.hash(text.getBytes(StandardCharsets.UTF_8), personal.name(), personal.layer());
        Document doc = NoteDocuments.toDocument(facetsConfig, note, text, personal.name(), personal.layer(), location, hash);
        return new Written(new FiledNote(note, personal.name(), personal.layer(), location), doc, delta);
    }
}
