package org.arcwright.notes;

import java.util.List;
import java.util.Locale;

/** The dimensions along which notes are counted and filtered. */
public enum NoteFacet {
    /** What the radius does: stress-relief, sealing, mating-clearance, ... */
    FUNCTION,
    /** The standard or handbook leaned on, or common practice. */
    STANDARD,
    /** Manufacturing process: machined, cast, moulded, ... */
    PROCESS,
    /** The practice pack the note comes from. */
    PACK,
    /** A search label. */
    TAG;

    /** The lower-case key used in JSON output and index fields. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The facet's values for one note from a pack. */
    List<String> valuesOf(Note note, String pack) {
        switch (this) {
            case FUNCTION: return note.functions();
            case STANDARD: return note.standards();
            case PROCESS: return note.processes();
            case PACK: return List.of(pack);
            case TAG: return note.tags();
            default: throw new AssertionError(this);
        }
    }
}
