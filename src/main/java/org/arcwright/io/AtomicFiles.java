package org.arcwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file so that readers see either the old content or the new, never a torn mix.
 *
 * <p>The content goes to a temporary file in the same directory, is forced to disk, and is then
 * renamed over the target. If anything fails before the rename, the old file is untouched and the
 * temporary file is removed.
 */
public final class AtomicFiles {
    private AtomicFiles() {}

    /** Something that writes the whole new content of a file to a stream. */
    @FunctionalInterface
    public interface Writer {
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * Gives the temporary file the permissions the target has, or {@code rw-r--r--} for a new file:
     * the JDK creates temporary files readable by their owner only, which would make every saved
     * worksheet and exported sheet private by accident.
     */
    private static void keepPermissions(Path target, Path tmp) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            return;
        }
        java.util.Set<java.nio.file.attribute.PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    /** Replaces {@code target} with the given UTF-8 text. */
    public static void writeString(Path target, String text) {
        write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /** Replaces {@code target} with the given bytes. */
    public static void writeBytes(Path target, byte[] bytes) {
        write(target, out -> out.write(bytes));
    }

    /** Replaces {@code target} with what {@code writer} produces; the target is untouched on failure. */
    public static void write(Path target, Writer writer) {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        Path tmp = null;
        try {
            Files.createDirectories(dir);
            tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
            keepPermissions(abs, tmp);
            try (var ch = java.nio.channels.FileChannel.open(tmp, java.nio.file.StandardOpenOption.WRITE);
                 OutputStream out = java.nio.channels.Channels.newOutputStream(ch)) {
                writer.writeTo(out);
                out.flush();
                ch.force(true);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } catch (IOException e) {
            throw new UncheckedIOException("could not write " + target + ": " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the temporary file is hidden and harmless; the target was never touched
                }
            }
        }
    }
}
