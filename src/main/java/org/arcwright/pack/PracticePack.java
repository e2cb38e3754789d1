package org.arcwright.pack;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.stream.Stream;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * One loaded practice pack: its manifest, its folder and its layer.
 *
 * @param root the pack folder (a directory, possibly inside the jar's file system for the built-in pack)
 */
public record PracticePack(PackManifest manifest, Path root, PackLayer layer) {

    public PracticePack {
        Objects.requireNonNull(manifest, "manifest");
        Objects.requireNonNull(root, "root");
        Objects.requireNonNull(layer, "layer");
    }

    /** Reads {@code DIR/pack.json}; errors name the file. */
    public static PracticePack open(Path dir, PackLayer layer, JsonFiles json) {
        if (!Files.isDirectory(dir)) {
            throw new InputProblem(dir.toString(), 0, 0, null, "not a practice pack folder (no such directory)");
        }
        Path manifest = dir.resolve("pack.json");
        if (!Files.isRegularFile(manifest)) {
            throw new InputProblem(manifest.toString(), 0, 0, null,
                    "missing pack.json: a practice pack needs one with at least a name");
        }
        return new PracticePack(json.readPackFile(manifest, dir, PackManifest.class), dir, layer);
    }

    public String name() { return manifest.name(); }

    /** The files of one kind ({@code rules}, {@code notes}, ...) with the given extension, by name. */
    public List<Path> files(String folder, String extension) {
        Path dir = root.resolve(folder);
        if (!Files.isDirectory(dir)) return List.of();
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> Files.isRegularFile(p) && p.getFileName().toString().endsWith(extension))
                    .sorted(Comparator.comparing(p -> p.getFileName().toString()))
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException("could not list " + dir, e);
        }
    }

    /** True for the pack that ships inside Arcwright. */
    public boolean isBuiltIn() { return layer == PackLayer.BUILT_IN; }
}
