package org.arcwright.rules;

import java.util.Collection;
import java.util.List;

/**
 * Finds practice notes for a recommendation. The notes store implements it; the advisor works
 * without one ({@link #NONE}).
 */
@FunctionalInterface
public interface NoteLinker {
    /** Notes related to the given tags and free text, best first, at most {@code limit}. */
    List<NoteLink> related(Collection<String> tags, String text, int limit);

    /** Links nothing. */
    NoteLinker NONE = (tags, text, limit) -> List.of();
}
