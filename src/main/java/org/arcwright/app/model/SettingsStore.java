package org.arcwright.app.model;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * Reads and writes {@link Settings}. A missing file means a first run; a damaged one is reported and
 * replaced by defaults rather than stopping the window from opening.
 */
public final class SettingsStore {
    /** The settings file name inside the config directory. */
    public static final String FILE_NAME = "settings.json";

    private final Path file;
    private final JsonFiles json;
    private InputProblem lastProblem;

    public SettingsStore(Path configDir, JsonFiles json) {
        this.file = Objects.requireNonNull(configDir, "configDir").resolve(FILE_NAME);
        this.json = Objects.requireNonNull(json, "json");
    }

    public Path file() { return file; }

    /** True when no settings were ever saved: the window is opening for the first time. */
    public boolean isFirstRun() { return !Files.exists(file); }

    /** The saved settings, or defaults when there are none or they cannot be read. */
    public Settings load() {
        lastProblem = null;
        if (!Files.exists(file)) return Settings.DEFAULTS;
        try {
            return json.read(file, Settings.class);
        } catch (InputProblem p) {
            lastProblem = p;
            return Settings.DEFAULTS;
        }
    }

    /** Why the last {@link #load()} fell back to defaults, or null. */
    public InputProblem lastProblem() { return lastProblem; }

    /** Writes atomically: a crash mid-write leaves the old settings. */
    public void save(Settings settings) {
        AtomicFiles.writeString(file, json.write(settings));
    }
}
