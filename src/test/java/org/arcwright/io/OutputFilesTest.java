package org.arcwright.io;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Where a command may write: refusals, each with its reason and the option named. */
class OutputFilesTest {
    @TempDir
    Path dir;

    @Test
    void theInputIsNeverTheOutput() throws Exception {
        Path part = Files.writeString(dir.resolve("part.html"), "{}");
        assertThatThrownBy(() -> OutputFiles.requireWritable(part, "--out", part))
                .isInstanceOf(InputProblem.class).hasMessageStartingWith("--out: ").hasMessageContaining("also the input");
        Path sameByAnotherName = dir.resolve("sub").resolve("..").resolve("part.html");
        Files.createDirectories(dir.resolve("sub"));
        assertThatThrownBy(() -> OutputFiles.requireWritable(sameByAnotherName, "--out", part))
                .hasMessageContaining("also the input");
        Path hardLink = Files.createLink(dir.resolve("alias.html"), part);
        assertThatThrownBy(() -> OutputFiles.requireWritable(hardLink, "--out", part)).hasMessageContaining("also the input");
    }

    @Test
    void aSymbolicLinkIsRefused() throws Exception {
        Path target = Files.writeString(dir.resolve("real.svg"), "x");
        Path link = Files.createSymbolicLink(dir.resolve("frame.svg"), target);
        assertThatThrownBy(() -> OutputFiles.requireWritable(link, "--out")).hasMessageContaining("symbolic link");
    }

    @Test
    void aReadOnlyFileIsRefusedEvenForRoot() throws Exception {
        assumeTrue(FileSystems.getDefault().supportedFileAttributeViews().contains("posix"));
        Path f = Files.writeString(dir.resolve("frame.svg"), "x");
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("r--r--r--"));
        assertThatThrownBy(() -> OutputFiles.requireWritable(f, "--out")).hasMessageContaining("read-only");
    }

    @Test
    void aMissingFolderIsRefusedNotCreated() {
        Path out = dir.resolve("no-such-folder").resolve("frame.svg");
        assertThatThrownBy(() -> OutputFiles.requireWritable(out, "--out")).hasMessageContaining("does not exist");
        assertThatThrownBy(() -> OutputFiles.requireWritable(dir, "--out")).hasMessageContaining("not a regular file");
    }

    @Test
    void aNewFileOrAWritableOneIsFine() throws Exception {
        assertThatCode(() -> OutputFiles.requireWritable(dir.resolve("new.svg"), "--out", dir.resolve("in.json")))
                .doesNotThrowAnyException();
        Path existing = Files.writeString(dir.resolve("old.svg"), "x");
        assertThatCode(() -> OutputFiles.requireWritable(existing, "--out")).doesNotThrowAnyException();
    }
}
