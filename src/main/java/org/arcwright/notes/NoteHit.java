package org.arcwright.notes;

import java.util.List;
import org.arcwright.pack.PackLayer;

/**
 * One note found by a search or proposed as related.
 *
 * @param id the note id
 * @param title the note title
 * @param score the relevance score (BM25; comparable only within one result)
 * @param snippet a passage of the body with the matched words in {@code **bold**} (Markdown), or
 *     the note's first paragraph when nothing in the body matched
 * @param pack the name of the pack that supplies the note
 * @param layer that pack's layer
 * @param tags the note's tags
 * @param functions the note's functions
 * @param standards the standards it leans on
 * @param processes the processes it concerns
 */
public record NoteHit(String id, String title, float score, String snippet, String pack, PackLayer layer,
                      List<String> tags, List<String> functions, List<String> standards, List<String> processes) {
    public NoteHit {
        tags = List.copyOf(tags);
        functions = List.copyOf(functions);
        standards = List.copyOf(standards);
        processes = List.copyOf(processes);
    }
}
