package org.arcwright.notes;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;

/** Builds small practice packs of invented notes in a temporary folder. */
final class TestPacks {
    private TestPacks() {}

    static Path pack(Path dir, String name) {
        try {
            Files.createDirectories(dir.resolve("notes"));
            Files.writeString(dir.resolve("pack.json"), "{\"name\": \"" + name + "\"}\n");
            return dir;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Path note(Path pack, String fileName, String text) {
        try {
            Path p = pack.resolve("notes").resolve(fileName);
            Files.writeString(p, text);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String text(String id, String title, String tags, String functions, String body) {
        return "---\nid: " + id + "\ntitle: " + title + "\ntags: " + tags + "\nfunctions: " + functions
                + "\nstandard: common practice\nprocess: machined\nauthor: test\nupdated: 2026-11-30\n---\n" + body + "\n";
    }

    /** A stack of the given pack folders, the first as built-in, the last as personal, any between as team. */
    static PackStack stack(Path... packs) {
        JsonFiles json = new JsonFiles();
        List<PracticePack> out = new ArrayList<>();
        for (int i = 0; i < packs.length; i++) {
            PackLayer layer = i == 0 ? PackLayer.BUILT_IN : (i == packs.length - 1 && packs.length > 1 ? PackLayer.PERSONAL : PackLayer.TEAM);
            out.add(PracticePack.open(packs[i], layer, json));
        }
        return new PackStack(out, List.of());
    }
}
