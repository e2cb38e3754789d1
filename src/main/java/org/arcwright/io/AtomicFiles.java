package org.arcwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Set;

/**
 * Writes a file so that readers see either the old content or the new, never a torn mix.
 *
 * <p>The content goes to a temporary file in the same directory, is forced to disk, and is then
 * renamed over the target. If anything fails before the rename, the old file is untouched and the
 * temporary file is removed. A save killed outright (power cut, {@code kill -9}) cannot remove its
 * temporary file; the next save of the same file removes such leftovers once they are
 * {@link #STALE_AFTER} old, so that a save running at the same moment in another process keeps its own.
 */
public final class AtomicFiles {
    /** Age after which a leftover temporary file of a save is taken to belong to a save that died. */
    public static final Duration STALE_AFTER = Duration.ofMinutes(10);

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
        if (!Files.getFileStore(tmp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    /**
     * Removes the temporary files earlier saves of {@code target} left behind when they were killed:
     * {@code .NAME.*.tmp} in the target's folder, last modified more than {@link #STALE_AFTER} ago.
     *
     * @return how many were removed
     */
    public static int removeStaleTemporaries(Path target) {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        String prefix = "." + abs.getFileName() + ".";
        long cutoff = System.currentTimeMillis() - STALE_AFTER.toMillis();
        int removed = 0;
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, p -> {
            String n = p.getFileName().toString();
            return n.startsWith(prefix) && n.endsWith(".tmp") && n.length() > prefix.length() + 4;
        })) {
            for (Path p : s) {
                try {
                    if (Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)
                            && Files.getLastModifiedTime(p, LinkOption.NOFOLLOW_LINKS).toMillis() < cutoff
                            && Files.deleteIfExists(p)) {
                        removed++;
                    }
                } catch (IOException e) {
                    // another process removed it, or it cannot be removed: it is hidden and harmless
                }
            }
        } catch (IOException e) {
            return removed;
        }
        return removed;
    }

    /**
     * Replaces several files as one change: every new content is written and forced to its own
     * temporary file first, and only then are they renamed over their targets, in order. If writing
     * fails, no target has changed; if a rename fails, the targets already replaced get their old
     * content back (or are removed when they did not exist). For saves that must not be half done,
     * such as a rule file and the pack manifest that lists it.
     *
     * @param targets the files and their writers, in the order they are renamed into place
     */
    public static void writeAll(LinkedHashMap<Path, Writer> targets) {
        List<Path> absTargets = new ArrayList<>();
        List<Path> temps = new ArrayList<>();
        List<byte[]> before = new ArrayList<>();
        int renamed = 0;
        try {
            for (var e : targets.entrySet()) {
                Path abs = e.getKey().toAbsolutePath();
                Path dir = abs.getParent();
                Files.createDirectories(dir);
                removeStaleTemporaries(abs);
                absTargets.add(abs);
                before.add(Files.isRegularFile(abs) ? Files.readAllBytes(abs) : null);
                Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
                temps.add(tmp);
                keepPermissions(abs, tmp);
                try (var ch = FileChannel.open(tmp, StandardOpenOption.WRITE);
                     OutputStream out = Channels.newOutputStream(ch)) {
                    e.getValue().writeTo(out);
                    out.flush();
                    ch.force(true);
                }
            }
            for (; renamed < temps.size(); renamed++) {
                move(temps.get(renamed), absTargets.get(renamed));
            }
        } catch (IOException | RuntimeException e) {
            for (int i = renamed - 1; i >= 0; i--) restore(absTargets.get(i), before.get(i));
            for (int i = renamed; i < temps.size(); i++) {
                try {
                    Files.deleteIfExists(temps.get(i));
                } catch (IOException ignored) {
                    // hidden and harmless; removed as stale by a later save
                }
            }
            if (e instanceof RuntimeException re) throw re;
            throw new UncheckedIOException("could not save " + targets.keySet() + ": " + e.getMessage(), (IOException) e);
        }
    }

    private static void move(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void restore(Path target, byte[] old) {
        try {
            if (old == null) {
                Files.deleteIfExists(target);
            } else {
                writeBytes(target, old);
            }
        } catch (IOException | RuntimeException ignored) {
            // the first failure is the one reported; nothing more can be done here
        }
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
            removeStaleTemporaries(abs);
            tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
            keepPermissions(abs, tmp);
            try (var ch = FileChannel.open(tmp, StandardOpenOption.WRITE);
                 OutputStream out = Channels.newOutputStream(ch)) {
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
