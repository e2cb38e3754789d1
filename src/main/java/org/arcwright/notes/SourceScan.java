package org.arcwright.notes;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;

/**
 * A cheap look at the note files of a pack stack: path, size and modification time of each, folded
 * into an order-independent stamp. When the stamp equals the one recorded in the index, the index is
 * trusted without reading a note; otherwise the notes are read and compared by content hash.
 *
 * <p>The stamp is a sum of 64-bit per-file hashes, so adding or replacing one file updates it
 * without listing the others.
 */
final class SourceScan {
    /** One note file. */
    record Entry(int packIndex, PracticePack pack, Path path, long size, long modified) {
        long stamp() {
            return stampOf(packIndex, path.toString(), size, modified);
        }
    }

    private final List<Entry> entries;
    private final long stamp;

    private SourceScan(List<Entry> entries, long stamp) {
        this.entries = entries;
        this.stamp = stamp;
    }

    static SourceScan of(PackStack stack) {
        List<Entry> out = new ArrayList<>();
        long sum = 0;
        List<PracticePack> packs = stack.packs();
        for (int i = 0; i < packs.size(); i++) {
            for (Entry e : list(i, packs.get(i))) {
                out.add(e);
                sum += e.stamp();
            }
        }
        return new SourceScan(List.copyOf(out), sum);
    }

    /**
     * The {@code notes/*.md} files of a pack, by file name, as {@link PracticePack#files} lists them,
     * but reading each file's attributes once while listing (one system call per file, not two).
     */
    private static List<Entry> list(int packIndex, PracticePack pack) {
        Path dir = pack.root().resolve("notes");
        if (!Files.isDirectory(dir)) return List.of();
        List<Entry> out = new ArrayList<>();
        try {
            Files.walkFileTree(dir, Set.of(), 1, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes a) {
                    if (a.isRegularFile() && file.getFileName().toString().endsWith(".md")) {
                        out.add(new Entry(packIndex, pack, file, a.size(), a.lastModifiedTime().toMillis()));
                    }
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("could not list " + dir, e);
        }
        out.sort(Comparator.comparing(e -> e.path().getFileName().toString()));
        return out;
    }

    static Entry entry(int packIndex, PracticePack pack, Path p) {
        try {
            BasicFileAttributes a = Files.readAttributes(p, BasicFileAttributes.class);
            return new Entry(packIndex, pack, p, a.size(), a.lastModifiedTime().toMillis());
        } catch (IOException e) {
            throw new UncheckedIOException("could not read the attributes of " + p, e);
        }
    }

    List<Entry> entries() {
        return entries;
    }

    long stamp() {
        return stamp;
    }

    static long stampOf(int packIndex, String path, long size, long modified) {
        long h = 0xcbf29ce484222325L;
        for (byte b : path.getBytes(StandardCharsets.UTF_8)) {
            h ^= b;
            h *= 0x100000001b3L;
        }
        h = mix(h ^ packIndex);
        h = mix(h ^ size);
        h = mix(h ^ modified);
        return h;
    }

    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
