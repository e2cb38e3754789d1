package org.arcwright.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;

/**
 * Decides, before anything is written, whether a command may write its output to a path the user
 * named. The least surprising answer is to refuse, with the reason, rather than to guess:
 * <ul>
 *   <li>the output is one of the inputs: refused (writing would replace the worksheet with the sheet);
 *   <li>the output is a symbolic link: refused (a save replaces the link with a plain file, which would
 *       silently cut the link);
 *   <li>the output exists but is read-only (no write permission for its owner): refused, even when
 *       run as root, who could otherwise replace it;
 *   <li>the output exists and is not a regular file (a folder, a device): refused;
 *   <li>the output's folder does not exist: refused, rather than created without a word.
 * </ul>
 * An existing regular, writable file is replaced atomically ({@link AtomicFiles}), as the user asked.
 */
public final class OutputFiles {
    private OutputFiles() {}

    /**
     * @param out the output path the user gave
     * @param option the option that named it, e.g. {@code --out}
     * @param inputs the files the command reads (null entries are ignored)
     * @throws InputProblem naming {@code option} when the output may not be written there
     */
    public static void requireWritable(Path out, String option, Path... inputs) {
        Path abs = out.toAbsolutePath().normalize();
        for (Path in : inputs) {
            if (in != null && same(abs, in)) {
                throw InputProblem.ofField(option, out + " is also the input file; choose another output name, "
                        + "so that the input is not overwritten");
            }
        }
        if (Files.isSymbolicLink(abs)) {
            throw InputProblem.ofField(option, out + " is a symbolic link; saving would replace the link with a plain "
                    + "file, so give the path it points to, or another name");
        }
        if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
            if (!Files.isRegularFile(abs, LinkOption.NOFOLLOW_LINKS)) {
                throw InputProblem.ofField(option, out + " exists and is not a regular file (a folder or a device)");
            }
            if (readOnly(abs)) {
                throw InputProblem.ofField(option, out + " is read-only; Arcwright does not replace read-only files "
                        + "(make it writable first, or choose another name)");
            }
        }
        Path dir = abs.getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw InputProblem.ofField(option, "the folder " + dir + " does not exist; create it first");
        }
    }

    private static boolean same(Path out, Path in) {
        Path inAbs = in.toAbsolutePath().normalize();
        if (inAbs.equals(out)) return true;
        try {
            return Files.exists(out) && Files.exists(inAbs) && Files.isSameFile(out, inAbs);
        } catch (IOException e) {
            return false;
        }
    }

    private static boolean readOnly(Path file) {
        try {
            PosixFileAttributeView v = Files.getFileAttributeView(file, PosixFileAttributeView.class, LinkOption.NOFOLLOW_LINKS);
            if (v != null) return !v.readAttributes().permissions().contains(PosixFilePermission.OWNER_WRITE);
            return !Files.isWritable(file);
        } catch (IOException e) {
            return !Files.isWritable(file);
        }
    }
}
