package org.arcwright.notes;

import java.util.List;
import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * Quiets Lucene's notices about the JDK it runs on: on JDK 21 and later it tells which file access
 * it uses and that a newer Lucene would use more of the vector API, on standard error, at every
 * start. They are for Lucene's developers, not for an engineer reading a command's output or
 * starting the window; Lucene's errors still show.
 */
final class LuceneNotices {
    /**
     * The loggers, held here because the logging framework keeps loggers only weakly: a level set on
     * a logger that is collected before Lucene asks for it again is lost.
     */
    private static final List<Logger> QUIETED = List.of(
            Logger.getLogger("org.apache.lucene.store.MemorySegmentIndexInputProvider"),
            Logger.getLogger("org.apache.lucene.internal.vectorization.VectorizationProvider"));

    private LuceneNotices() {}

    /** Lets only Lucene's errors through these loggers; call before Lucene's first use (again is harmless). */
    static void quiet() {
        for (Logger l : QUIETED) l.setLevel(Level.SEVERE);
    }
}
