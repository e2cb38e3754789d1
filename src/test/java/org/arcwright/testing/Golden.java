package org.arcwright.testing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Golden files under {@code src/test/resources/golden/}: rendered output that is committed and
 * reviewed as a diff whenever it changes. Regenerate with {@code -Darcwright.golden.update=true},
 * then review the diff before committing.
 */
public final class Golden {
    /** The folder golden files live in, relative to the project. */
    public static final Path ROOT = Path.of("src/test/resources/golden");
    /** The system property that rewrites golden files instead of comparing. */
    public static final String UPDATE = "arcwright.golden.update";

    private Golden() {}

    /** Compares {@code actual} with the golden file {@code name}, or rewrites it when updating. */
    public static void assertMatches(String name, String actual) {
        Path file = ROOT.resolve(name);
        try {
            if (Boolean.getBoolean(UPDATE)) {
                Files.createDirectories(file.getParent());
                Files.writeString(file, actual, StandardCharsets.UTF_8);
                return;
            }
            assertThat(file).as("golden file %s is missing; run the test with -D%s=true and review it", file, UPDATE)
                    .exists();
            String expected = Files.readString(file, StandardCharsets.UTF_8);
            assertThat(actual).as("output differs from golden file %s (rerun with -D%s=true and review the diff)",
                    file, UPDATE).isEqualTo(expected);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
