package org.arcwright.notes;

/**
 * How the store brought its index in line with the notes, for status lines and logs.
 *
 * @param kind what was done
 * @param reason why, in the user's words (empty when the index was simply opened)
 * @param notes how many notes the index holds afterwards
 * @param written notes (re)indexed
 * @param removed notes dropped from the index because their files are gone
 * @param problems note files that could not be read (see {@link NotesStore#problems()})
 * @param millis time taken
 */
public record IndexReport(Kind kind, String reason, int notes, int written, int removed, int problems, long millis) {

    /** What the store did to its index. */
    public enum Kind {
        /** The index matched the notes and was opened as it was. */
        OPENED,
        /** Some notes changed; only those were re-indexed. */
        UPDATED,
        /** The index was built from the notes (missing, corrupt, another version, or asked for). */
        REBUILT,
        /** The index folder could not be written (locked by a live process, read-only); built in memory. */
        IN_MEMORY
    }

    /** One line for a status bar or the command line. */
    public String describe() {
        String what;
        switch (kind) {
            case OPENED: what = "index up to date"; break;
            case UPDATED: what = "index updated: " + written + " re-indexed, " + removed + " removed"; break;
            case REBUILT: what = "index rebuilt: " + written + " notes"; break;
            case IN_MEMORY: what = "index built in memory: " + written + " notes"; break;
            default: throw new AssertionError(kind);
        }
        StringBuilder sb = new StringBuilder(what);
        if (!reason.isEmpty()) sb.append(" (").append(reason).append(')');
        sb.append(", ").append(notes).append(" notes, ").append(millis).append(" ms");
        if (problems > 0) sb.append(", ").append(problems).append(problems == 1 ? " note file has a problem" : " note files have problems");
        return sb.toString();
    }
}
