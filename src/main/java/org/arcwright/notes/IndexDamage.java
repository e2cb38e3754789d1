package org.arcwright.notes;

import java.io.EOFException;
import java.io.FileNotFoundException;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ExecutionException;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.index.IndexFormatTooNewException;
import org.apache.lucene.index.IndexFormatTooOldException;
import org.apache.lucene.store.AlreadyClosedException;

/**
 * Which failures mean the index files are damaged, so that rebuilding them from the notes is the
 * cure: Lucene's checksum and format errors, a segment file that is gone, a file that ends early,
 * and a lock file changed under a writer (which Lucene reports as {@link AlreadyClosedException}
 * naming the lock).
 * Anything else (a bug in our hit or snippet code, a full disk) is not cured by a rebuild and must
 * surface instead of throwing a good index away.
 */
final class IndexDamage {
    private IndexDamage() {}

    /** Whether {@code t}, or the failure it wraps, is damage to the index files. */
    static boolean isDamage(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause()) {
            if (c instanceof CorruptIndexException || c instanceof IndexFormatTooOldException
                    || c instanceof IndexFormatTooNewException || c instanceof NoSuchFileException
                    || c instanceof FileNotFoundException || c instanceof EOFException
                    || c instanceof AlreadyClosedException && String.valueOf(c.getMessage()).contains("lock")) {
                return true;
            }
            if (!(c instanceof UncheckedIOException || c instanceof ExecutionException
                    || c instanceof CompletionException)) {
                return false;
            }
        }
        return false;
    }

    /**
     * What went wrong, in words for the index report ("a file of the index is missing"), never a Java
     * class name: the report reaches the user in the status line and {@code notes status}.
     */
    static String name(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause()) {
            if (!(c instanceof UncheckedIOException || c instanceof ExecutionException
                    || c instanceof CompletionException)) {
                return words(c);
            }
        }
        return words(t);
    }

    private static String words(Throwable c) {
        if (c instanceof CorruptIndexException) return "its files are damaged";
        if (c instanceof IndexFormatTooOldException) return "it was written in an older index format";
        if (c instanceof IndexFormatTooNewException) return "it was written in a newer index format";
        if (c instanceof NoSuchFileException || c instanceof FileNotFoundException) return "a file of the index is missing";
        if (c instanceof EOFException) return "a file of the index ends early";
        if (c instanceof AlreadyClosedException) return "its lock was lost";
        if (c instanceof AccessDeniedException) return "permission denied";
        if (c instanceof FileSystemException f && f.getReason() != null) return f.getReason();
        return "a read or write failed";
    }
}
