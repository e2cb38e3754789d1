package org.arcwright.pack;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.FileSystem;
import java.nio.file.FileSystemAlreadyExistsException;
import java.nio.file.FileSystems;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * The practice packs in force, lowest layer first: built-in, then team packs in the order given,
 * then the personal pack. Packs that fail to open are kept aside as {@link #problems()} so that the
 * app still starts on the layers that loaded.
 */
public final class PackStack {
    /** Classpath location of the built-in pack's manifest. */
    public static final String BUILT_IN_RESOURCE = "/arcwright/knowledge/pack.json";

    private final List<PracticePack> packs;
    private final List<InputProblem> problems;

    public PackStack(List<PracticePack> packs, List<InputProblem> problems) {
        this.packs = List.copyOf(packs);
        this.problems = List.copyOf(problems);
    }

    /** Only the built-in pack. */
    public static PackStack builtIn() {
        JsonFiles json = new JsonFiles();
        return new PackStack(List.of(PracticePack.open(builtInRoot(), PackLayer.BUILT_IN, json)), List.of());
    }

    /**
     * Built-in, then {@code teamPacks}, then {@code personal} when not null. A pack that cannot be
     * opened is recorded in {@link #problems()} and skipped.
     */
    public static PackStack load(List<Path> teamPacks, Path personal) {
        JsonFiles json = new JsonFiles();
        List<PracticePack> packs = new ArrayList<>();
        List<InputProblem> problems = new ArrayList<>();
        packs.add(PracticePack.open(builtInRoot(), PackLayer.BUILT_IN, json));
        for (Path p : teamPacks) {
            try {
                packs.add(PracticePack.open(p, PackLayer.TEAM, json));
            } catch (InputProblem e) {
                problems.add(e);
            }
        }
        if (personal != null) {
            try {
                packs.add(PracticePack.open(personal, PackLayer.PERSONAL, json));
            } catch (InputProblem e) {
                problems.add(e);
            }
        }
        return new PackStack(packs, problems);
    }

    /** The packs, lowest layer first. */
    public List<PracticePack> packs() { return packs; }

    /** Packs that could not be opened. */
    public List<InputProblem> problems() { return problems; }

    /** Files of one kind from every pack, lowest layer first; within a pack, by name. */
    public List<PackFile> files(String folder, String extension) {
        List<PackFile> out = new ArrayList<>();
        for (PracticePack pack : packs) {
            for (Path p : pack.files(folder, extension)) out.add(new PackFile(pack, p));
        }
        return Collections.unmodifiableList(out);
    }

    /** A file and the pack it belongs to. */
    public record PackFile(PracticePack pack, Path path) {}

    /**
     * The folder of the built-in pack: a directory when running from classes, a folder inside the
     * jar's zip file system when running from the jar.
     */
    public static Path builtInRoot() {
        URL url = PackStack.class.getResource(BUILT_IN_RESOURCE);
        if (url == null) throw new IllegalStateException("built-in knowledge missing from the classpath: " + BUILT_IN_RESOURCE);
        try {
            URI uri = url.toURI();
            if ("jar".equals(uri.getScheme())) {
                FileSystem fs;
                try {
                    fs = FileSystems.newFileSystem(uri, Map.of());
                } catch (FileSystemAlreadyExistsException e) {
                    fs = FileSystems.getFileSystem(uri);
                }
                return fs.getPath(BUILT_IN_RESOURCE).getParent();
            }
            return Path.of(uri).getParent();
        } catch (URISyntaxException | IOException e) {
            throw new UncheckedIOException(new IOException("cannot open built-in knowledge at " + url, e));
        }
    }
}
