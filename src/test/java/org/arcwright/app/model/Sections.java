package org.arcwright.app.model;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Inspection files built from the repository's invented sections, for the model and GUI tests. */
public final class Sections {
    private static final Path HOUSING_CSV = Path.of("examples/inspect/housing-fillet-section.csv");

    private Sections() {}

    /** The repository's housing section as an inspection file against CR 1.8-2.2 that states U. */
    public static Path uncertainHousing(Path dir, double u) throws IOException {
        String json = "{\"units\": \"mm\", \"corner\": {\"vertex\": [10, 10], \"legA\": [-1, 0], \"legB\": [0, -1],"
                + " \"kind\": \"fillet\"}, \"nominalRadius\": 2.0,"
                + " \"callout\": {\"type\": \"controlled-radius\", \"min\": 1.8, \"max\": 2.2},"
                + " \"uncertainty\": " + u + ", \"pointsFile\": \"section.csv\"}";
        Files.copy(HOUSING_CSV, dir.resolve("section.csv"));
        Path file = dir.resolve("housing-cr-uncertain.json");
        Files.writeString(file, json);
        return file;
    }
}
