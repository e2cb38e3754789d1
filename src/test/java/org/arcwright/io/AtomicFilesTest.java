package org.arcwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.LinkedHashMap;
import org.junit.jupiter.api.Assumptions;
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
        Assumptions.assumeTrue(
                FileSystems.getDefault().supportedFileAttributeViews().contains("posix"));
        Path fresh = dir.resolve("sheet.pdf");
        AtomicFiles.writeString(fresh, "x");
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(fresh)))
                .isEqualTo("rw-r--r--");
        Path kept = dir.resolve("part.arcpart");
        Files.writeString(kept, "old");
        Files.setPosixFilePermissions(kept, PosixFilePermissions.fromString("rw-rw----"));
        AtomicFiles.writeString(kept, "new");
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(kept)))
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

    @Test
    void aTwoFileSaveIsAllOrNothingWhenTheSecondFails(@TempDir Path dir) throws Exception {
        Path rule = dir.resolve("rules").resolve("override-x.json");
        Path manifest = dir.resolve("pack.json");
        Files.writeString(manifest, "{\"name\": \"Personal\"}");
        LinkedHashMap<Path, AtomicFiles.Writer> writes = new LinkedHashMap<>();
        writes.put(rule, out -> out.write("{\"rules\": []}".getBytes(StandardCharsets.UTF_8)));
        writes.put(manifest, out -> {
            throw new IOException("disk full");
        });
        assertThatThrownBy(() -> AtomicFiles.writeAll(writes)).hasMessageContaining("disk full");
        assertThat(rule).doesNotExist();
        assertThat(Files.readString(manifest)).isEqualTo("{\"name\": \"Personal\"}");
        try (var s = Files.list(dir)) {
            assertThat(s.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder("pack.json", "rules");
        }
    }

    @Test
    void aFailedRenameRollsBackTheFilesAlreadyReplaced(@TempDir Path dir) throws Exception {
        Path first = dir.resolve("a.json");
        Files.writeString(first, "old a");
        Path second = Files.createDirectories(dir.resolve("b.json")); // a folder: the rename over it fails
        Files.writeString(second.resolve("keep"), "x");
        LinkedHashMap<Path, AtomicFiles.Writer> writes = new LinkedHashMap<>();
        writes.put(first, out -> out.write("new a".getBytes(StandardCharsets.UTF_8)));
        writes.put(second, out -> out.write("new b".getBytes(StandardCharsets.UTF_8)));
        assertThatThrownBy(() -> AtomicFiles.writeAll(writes)).isInstanceOf(UncheckedIOException.class);
        assertThat(Files.readString(first)).isEqualTo("old a");
    }

    @Test
    void staleTemporaryFilesOfKilledSavesGoOnTheNextSave(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("part.arcpart");
        Path stale = Files.createFile(dir.resolve(".part.arcpart.123456.tmp"));
        Path fresh = Files.createFile(dir.resolve(".part.arcpart.777.tmp"));
        Path other = Files.createFile(dir.resolve(".other.arcpart.1.tmp"));
        FileTime old = FileTime.fromMillis(
                System.currentTimeMillis() - AtomicFiles.STALE_AFTER.toMillis() - 60_000);
        Files.setLastModifiedTime(stale, old);
        Files.setLastModifiedTime(other, old);
        AtomicFiles.writeString(f, "saved");
        assertThat(stale).doesNotExist();
        assertThat(fresh).as("a save running now in another process keeps its file").exists();
        assertThat(other).as("another file's leftovers wait for its own save").exists();
        assertThat(Files.readString(f)).isEqualTo("saved");
    }
}
