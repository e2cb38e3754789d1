package org.arcwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The one door for reading files: what it lets through and what it refuses, each named by file. */
class InputFilesTest {
    @TempDir
    Path dir;

    @Test
    void aDeviceIsRefusedBeforeAnyByteIsRead() {
        assumeTrue(Files.exists(Path.of("/dev/zero")), "needs /dev/zero");
        assertThatThrownBy(() -> InputFiles.readText(Path.of("/dev/zero")))
                .isInstanceOf(InputProblem.class).hasMessageContaining("/dev/zero").hasMessageContaining("not a regular file");
        assertThatThrownBy(() -> InputFiles.openText(Path.of("/dev/zero"), InputFiles.CSV_LIMIT))
                .isInstanceOf(InputProblem.class).hasMessageContaining("not a regular file");
    }

    @Test
    void aPipeIsRefused() throws Exception {
        Path fifo = dir.resolve("points.csv");
        Process p;
        try {
            p = new ProcessBuilder("mkfifo", fifo.toString()).start();
        } catch (IOException e) {
            assumeTrue(false, "needs mkfifo");
            return;
        }
        assumeTrue(p.waitFor() == 0 && Files.exists(fifo), "mkfifo failed");
        assertThatThrownBy(() -> InputFiles.readText(fifo))
                .isInstanceOf(InputProblem.class).hasMessageContaining("not a regular file");
    }

    @Test
    void aFolderIsRefused() {
        assertThatThrownBy(() -> InputFiles.readText(dir)).isInstanceOf(InputProblem.class).hasMessageContaining("is a folder");
    }

    @Test
    void aFileOverTheCapIsRefusedWithTheCapStated() throws Exception {
        Path f = dir.resolve("case.json");
        Files.write(f, new byte[2048]);
        assertThatThrownBy(() -> InputFiles.readText(f, 1024))
                .isInstanceOf(InputProblem.class).hasMessageContaining("2048 bytes").hasMessageContaining("limit");
    }

    @Test
    void aByteOrderMarkIsDroppedInWholeAndStreamedReads() throws Exception {
        Path f = dir.resolve("points.csv");
        byte[] text = "x,y\n1,2\n".getBytes(StandardCharsets.UTF_8);
        byte[] withBom = new byte[text.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(text, 0, withBom, 3, text.length);
        Files.write(f, withBom);
        assertThat(InputFiles.readText(f)).isEqualTo("x,y\n1,2\n");
        try (BufferedReader r = InputFiles.openText(f, InputFiles.CSV_LIMIT)) {
            assertThat(r.readLine()).isEqualTo("x,y");
        }
        Path plain = dir.resolve("plain.csv");
        Files.write(plain, text);
        try (BufferedReader r = InputFiles.openText(plain, InputFiles.CSV_LIMIT)) {
            assertThat(r.readLine()).isEqualTo("x,y");
        }
    }

    @Test
    void textThatIsNotUtf8IsRefused() throws Exception {
        Path f = dir.resolve("case.json");
        Files.write(f, new byte[] {'{', (byte) 0xC3, (byte) 0x28, '}'});
        assertThatThrownBy(() -> InputFiles.readText(f)).isInstanceOf(InputProblem.class).hasMessageContaining("not UTF-8");
    }

    @Test
    void aMissingFileIsNamed() {
        assertThatThrownBy(() -> InputFiles.readText(dir.resolve("gone.json")))
                .isInstanceOf(InputProblem.class).hasMessageContaining("gone.json").hasMessageContaining("file not found");
    }

    @Test
    void aPackFileLinkedOutOfItsPackIsRefusedWithoutReadingIt() throws Exception {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "the-private-key");
        Path pack = Files.createDirectories(dir.resolve("pack"));
        Path templates = Files.createDirectories(pack.resolve("templates"));
        Path link = Files.createSymbolicLink(templates.resolve("leak.mustache"), secret);
        assertThatThrownBy(() -> InputFiles.readPackText(link, pack))
                .isInstanceOf(InputProblem.class)
                .hasMessageContaining("leak.mustache").hasMessageContaining("outside its pack's folder")
                .hasMessageNotContaining("the-private-key").hasMessageNotContaining("secret.txt");
    }

    @Test
    void aPackFolderLinkedOutIsRefusedToo() throws Exception {
        Path elsewhere = Files.createDirectories(dir.resolve("elsewhere"));
        Files.writeString(elsewhere.resolve("r.json"), "{}");
        Path pack = Files.createDirectories(dir.resolve("pack"));
        Files.createSymbolicLink(pack.resolve("rules"), elsewhere);
        assertThatThrownBy(() -> InputFiles.readPackText(pack.resolve("rules").resolve("r.json"), pack))
                .isInstanceOf(InputProblem.class).hasMessageContaining("outside its pack's folder");
    }

    @Test
    void linksInsideThePackAndALinkedPackFolderAreFine() throws Exception {
        Path real = Files.createDirectories(dir.resolve("real-pack"));
        Files.createDirectories(real.resolve("templates"));
        Files.writeString(real.resolve("templates").resolve("a.mustache"), "A");
        Files.createSymbolicLink(real.resolve("templates").resolve("b.mustache"), real.resolve("templates").resolve("a.mustache"));
        Path linkedPack = Files.createSymbolicLink(dir.resolve("pack"), real);
        assertThat(InputFiles.readPackText(linkedPack.resolve("templates").resolve("b.mustache"), linkedPack)).isEqualTo("A");
    }
}
