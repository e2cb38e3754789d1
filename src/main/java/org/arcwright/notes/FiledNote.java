package org.arcwright.notes;

import java.util.Objects;
import org.arcwright.pack.PackLayer;

/**
 * A note and where it is filed: the pack that supplies it (after layering) and its file.
 *
 * @param note the note
 * @param pack the name of the pack it comes from
 * @param layer the layer of that pack
 * @param location the note file, as a path string (inside the jar for built-in notes)
 */
public record FiledNote(Note note, String pack, PackLayer layer, String location) {
    public FiledNote {
        Objects.requireNonNull(note, "note");
        Objects.requireNonNull(pack, "pack");
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(location, "location");
    }
}
