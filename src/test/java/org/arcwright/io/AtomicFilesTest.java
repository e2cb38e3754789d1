package org.arcwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @Test
    void replacesTheFileWhole(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("part.arcpart");
        Files.writeString(f, "old");
        AtomicFiles.writeString(f, "new");
        assertThat(Files.readString(f)).isEqualTo("new");
        try (var s = Files.list(dir)) {
            assertThat(s).containsExactly(f);
        }
    }

    @Test
    void newFilesAreReadableByOthersAndExistingFilesKeepTheirPermissions(@TempDir Path dir) throws Exception {
        org.junit.jupiter.api.Assumptions.assumeTrue(
                java.nio.file.FileSystems.getDefault().supportedFileAttributeViews().contains("posix"));
        Path fresh = dir.resolve("sheet.pdf");
        AtomicFiles.writeString(fresh, "x");
        assertThat(java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(fresh)))
                .isEqualTo("rw-r--r--");
        Path kept = dir.resolve("part.arcpart");
        Files.writeString(kept, "old");
        Files.setPosixFilePermissions(kept, java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw----"));
        AtomicFiles.writeString(kept, "new");
        assertThat(java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(kept)))
                .isEqualTo("rw-rw----");
    }

    @Test
    void aFailedWriteLeavesTheOldFileAndNoTemporary(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("part.arcpart");
        Files.writeString(f, "saved work");
        assertThatThrownBy(() -> AtomicFiles.write(f, out -> {
            out.write("half".getBytes());
            throw new IOException("disk full");
        })).hasMessageContaining("disk full");
        assertThat(Files.readString(f)).isEqualTo("saved work");
        try (var s = Files.list(dir)) {
            assertThat(s).containsExactly(f);
        }
    }

    @Test
    void malformedJsonNamesFileLineAndColumn(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "{\n  \"units\": \"mm\",\n  \"nominalRadius\": ,\n}");
        assertThatThrownBy(() -> new JsonFiles().readTree(f))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.source()).isEqualTo(f.toString());
                    assertThat(p.line()).isEqualTo(3);
                })
                .hasMessageStartingWith(f + ":3:");
    }
}
