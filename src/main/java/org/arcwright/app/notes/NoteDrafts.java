package org.arcwright.app.notes;

import java.util.Optional;
import java.util.function.Function;
import org.arcwright.notes.FiledNote;
import org.arcwright.notes.Note;
import org.arcwright.pack.PackLayer;

/**
 * What the note form starts from and what its OK may save, without Swing. A new note starts empty
 * with an id no note has; overriding a built-in or team note is its own, named action; saving never
 * replaces a note the user did not choose to replace.
 */
final class NoteDrafts {
    private NoteDrafts() {}

    /** What the form was opened for. */
    enum Purpose {
        /** A new, empty note. */
        NEW,
        /** A personal note that replaces the built-in or team note with the same id. */
        OVERRIDE,
        /** The user's own personal note, edited in place. */
        EDIT
    }

    /** The first free id of the form {@code my-note-N}. */
    static String freshId(Function<String, Optional<FiledNote>> lookUp) {
        for (int i = 1; ; i++) {
            String id = "my-note-" + i;
            if (lookUp.apply(id).isEmpty()) return id;
        }
    }

    /** The purpose offered for the highlighted note: override for built-in and team notes, edit for one's own. */
    static Purpose purposeFor(FiledNote highlighted) {
        return highlighted.layer() == PackLayer.PERSONAL ? Purpose.EDIT : Purpose.OVERRIDE;
    }

    /** The copy an override starts from: same id and text, no author (the user writes it). */
    static Note overrideOf(Note n) {
        return new Note(n.id(), n.title(), n.tags(), n.functions(), n.standards(), n.processes(), "", n.updated(), n.body());
    }

    /**
     * Why {@code note} may not be saved for {@code purpose}, or empty when it may.
     *
     * @param existing the note filed under {@code note.id()} now, if any
     * @param opened the id the form was opened with (for OVERRIDE and EDIT)
     */
    static Optional<String> refusal(Purpose purpose, Note note, Optional<FiledNote> existing, String opened) {
        if (purpose == Purpose.NEW) {
            return existing.map(f -> "the id '" + note.id() + "' is taken by the note '" + f.note().title() + "' in "
                    + f.pack() + (f.layer() == PackLayer.PERSONAL ? "; choose another id"
                            : "; to replace it, highlight it and choose Override this note…"));
        }
        if (!note.id().equals(opened)) {
            return Optional.of("the id must stay '" + opened + "' to " + (purpose == Purpose.OVERRIDE
                    ? "override that note" : "edit your note") + "; write a new note for another id");
        }
        return Optional.empty();
    }
}
