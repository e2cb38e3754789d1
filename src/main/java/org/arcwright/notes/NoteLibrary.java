package org.arcwright.notes;

import java.util.Collection;
import java.util.List;
import java.util.Optional;

/**
 * What a reader of the practice notes works with: search, related notes, one note, and saving into
 * the personal pack. {@link NotesStore} is the real one; the desktop's Notes panel takes this, so a
 * test can give it a stand-in with no index behind it.
 */
public interface NoteLibrary {
    /** Notes for what the user typed, with facet counts; see {@link NotesStore#search(String, NoteFilters, int)}. */
    SearchResult search(String text, NoteFilters filters, int limit);

    /** Notes sharing the labels or like the text; see {@link NotesStore#related(Collection, String, int)}. */
    List<NoteHit> related(Collection<String> tags, String text, int limit);

    /** The note in force under {@code id}, with the pack that supplies it. */
    Optional<FiledNote> get(String id);

    /** Saves a new or edited note into the personal pack; see {@link NotesStore#save(Note)}. */
    FiledNote save(Note note);
}
