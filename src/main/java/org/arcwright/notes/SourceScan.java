package org.arcwright.notes;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
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
            PracticePack pack = packs.get(i);
            for (Path p : pack.files("notes", ".md")) {
                Entry e = entry(i, pack, p);
                out.add(e);
                sum += e.stamp();
            }
        }
        return new SourceScan(List.copyOf(out), sum);
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
