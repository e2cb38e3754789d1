package org.arcwright.worksheet;

import java.nio.file.Path;
import java.util.Objects;
import org.arcwright.io.JsonFiles;

/**
 * Reads and writes part worksheets. Reading reports bad content with file, line and field;
 * writing is atomic, so a failed save leaves the previous file as it was.
 */
public final class WorksheetFiles {
    /** The extension of our worksheet files. */
    public static final String EXTENSION = ".arcpart";

    private final JsonFiles json;

    public WorksheetFiles(JsonFiles json) {
        this.json = Objects.requireNonNull(json, "json");
    }

    public PartWorksheet read(Path file) {
        return json.read(file, PartWorksheet.class);
    }

    public void write(Path file, PartWorksheet worksheet) {
        json.writeAtomically(file, worksheet);
    }

    /** Parses worksheet JSON text, attributing errors to {@code source}. */
    public PartWorksheet parse(String text, String source) {
        return json.parse(text, source, PartWorksheet.class);
    }
}
