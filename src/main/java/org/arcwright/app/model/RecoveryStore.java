package org.arcwright.app.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.worksheet.PartWorksheet;

/**
 * The autosave of unsaved worksheet edits, so that a crash or a killed window loses nothing. One
 * file, written atomically; removed when the worksheet is saved or the window closes cleanly.
 */
public final class RecoveryStore {
    /** The autosave file name inside the config directory. */
    public static final String FILE_NAME = "autosave.arcpart.json";

    private final Path file;
    private final JsonFiles json;

    public RecoveryStore(Path configDir, JsonFiles json) {
        this.file = Objects.requireNonNull(configDir, "configDir").resolve(FILE_NAME);
        this.json = Objects.requireNonNull(json, "json");
    }

    public Path file() { return file; }

    /**
     * An autosaved worksheet.
     *
     * @param source the file it was opened from, or null for a never-saved worksheet
     * @param savedAt when it was autosaved (ISO instant)
     * @param worksheet the unsaved content
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record Recovered(String source, String savedAt, PartWorksheet worksheet) {
        @JsonCreator
        public Recovered(@JsonProperty("source") String source, @JsonProperty("savedAt") String savedAt,
                         @JsonProperty(value = "worksheet", required = true) PartWorksheet worksheet) {
            this.source = source;
            this.savedAt = savedAt;
            this.worksheet = Objects.requireNonNull(worksheet, "worksheet");
        }

        public Optional<Path> sourcePath() { return Optional.ofNullable(source).map(Path::of); }
    }

    public void write(PartWorksheet worksheet, Path source, Instant at) {
        Recovered r = new Recovered(source == null ? null : source.toString(), at.toString(), worksheet);
        AtomicFiles.writeString(file, json.write(r));
    }

    /** The autosave left by an earlier session, if any and readable. */
    public Optional<Recovered> find() {
        if (!Files.exists(file)) return Optional.empty();
        try {
            return Optional.of(json.read(file, Recovered.class));
        } catch (InputProblem | UncheckedIOException e) {
            return Optional.empty();
        }
    }

    public void clear() {
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            throw new UncheckedIOException("could not remove " + file, e);
        }
    }
}
