package org.arcwright.io;

import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.SequenceInputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Arrays;

/**
 * The one door through which Arcwright reads a user's or a pack's file.
 *
 * <p>Every read here refuses what is not a regular file (a folder, a device such as
 * {@code /dev/zero}, a pipe: an endless stream would otherwise fill the memory), refuses files over a
 * stated size before reading them, accepts and drops a UTF-8 byte-order mark (as a spreadsheet's
 * "CSV UTF-8" export writes), and decodes strictly as UTF-8. A file a practice pack supplies must
 * also lie, after following every link, inside the pack's own folder, so that a shared pack cannot
 * pull another file the user can read (a key, a password file) into a note or an exported sheet.
 *
 * <p>Every refusal is an {@link InputProblem} naming the file; none quotes the file's content.
 */
public final class InputFiles {
    /** Size cap for JSON and text files (cases, worksheets, inspections, rules, templates, notes): 32 MiB. */
    public static final long TEXT_LIMIT = 32L << 20;
    /** Size cap for a CSV of measured points or a table of cases: 1 GiB (about 40 million x,y lines). */
    public static final long CSV_LIMIT = 1L << 30;

    private static final byte[] BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private InputFiles() {}

    /** The whole of {@code file} as text, at most {@link #TEXT_LIMIT} bytes. */
    public static String readText(Path file) {
        return readText(file, TEXT_LIMIT);
    }

    /** The whole of {@code file} as text, refusing files over {@code maxBytes}. */
    public static String readText(Path file, long maxBytes) {
        return decode(readBytes(file, maxBytes), file);
    }

    /**
     * Bytes already read from {@code file} (a note whose bytes are also hashed) as text, as
     * {@link #readText(Path)} would give it: BOM dropped, strict UTF-8.
     */
    public static String decode(byte[] bytes, Path file) {
        int start = startsWithBom(bytes) ? BOM.length : 0;
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes, start, bytes.length - start)).toString();
        } catch (CharacterCodingException e) {
            throw problem(file, "not UTF-8 text (a binary file, or text saved in another encoding?)");
        }
    }

    /**
     * A file a practice pack supplies, as text: as {@link #readText(Path)}, and only when its real path
     * (links followed) lies inside the real path of {@code packFolder}.
     */
    public static String readPackText(Path file, Path packFolder) {
        requireInside(file, packFolder);
        return readText(file);
    }

    /** A reader over {@code file} for streaming (large CSV files), BOM dropped, strict UTF-8. */
    public static BufferedReader openText(Path file, long maxBytes) {
        requireRegular(file, maxBytes);
        try {
            InputStream in = Files.newInputStream(file);
            byte[] head = in.readNBytes(BOM.length);
            InputStream rest = startsWithBom(head) ? in
                    : new SequenceInputStream(new ByteArrayInputStream(head), in);
            return new BufferedReader(new InputStreamReader(rest, StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16);
        } catch (IOException e) {
            throw readFailure(file, e);
        }
    }

    /**
     * Refuses {@code file} unless, with every link followed, it lies inside {@code folder} (also
     * followed). The message names the file, not where its link leads.
     *
     * @return the file's real path
     */
    public static Path requireInside(Path file, Path folder) {
        Path real;
        Path base;
        try {
            base = folder.toRealPath();
        } catch (IOException e) {
            throw problem(folder, "the pack folder cannot be read: " + reason(e));
        }
        try {
            real = file.toRealPath();
        } catch (NoSuchFileException e) {
            throw problem(file, "file not found (or a link to nowhere)");
        } catch (IOException e) {
            throw problem(file, "cannot be read: " + reason(e));
        }
        if (!real.startsWith(base)) {
            throw problem(file, "leads outside its pack's folder (a link?); a pack may only supply files inside "
                    + "its own folder, so this file was not read");
        }
        return real;
    }

    /** Refuses {@code file} unless it is an existing regular file (links followed) of at most {@code maxBytes}. */
    public static void requireRegular(Path file, long maxBytes) {
        BasicFileAttributes a;
        try {
            a = Files.readAttributes(file, BasicFileAttributes.class);
        } catch (NoSuchFileException e) {
            throw problem(file, "file not found");
        } catch (IOException e) {
            throw problem(file, "cannot be read: " + reason(e));
        }
        if (a.isDirectory()) throw problem(file, "is a folder, not a file");
        if (!a.isRegularFile()) {
            throw problem(file, "not a regular file (a device, a pipe or a socket); give a file saved on disk");
        }
        if (a.size() > maxBytes) {
            throw problem(file, "the file is " + megabytes(a.size()) + "; the limit for this kind of file is "
                    + megabytes(maxBytes));
        }
    }

    private static byte[] readBytes(Path file, long maxBytes) {
        requireRegular(file, maxBytes);
        try (InputStream in = Files.newInputStream(file)) {
            // read one byte past the cap, so that a file growing while read is still refused
            byte[] bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes + 1));
            if (bytes.length > maxBytes) {
                throw problem(file, "the file grew past the limit of " + megabytes(maxBytes) + " while being read");
            }
            return bytes;
        } catch (IOException e) {
            throw readFailure(file, e);
        }
    }

    /** A failed read as the user's problem with the file: missing, not permitted, or why it could not be read. */
    private static InputProblem readFailure(Path file, IOException e) {
        if (e instanceof NoSuchFileException) return problem(file, "file not found");
        if (e instanceof AccessDeniedException) return problem(file, "permission denied");
        return problem(file, "cannot be read: " + reason(e));
    }

    private static boolean startsWithBom(byte[] b) {
        return b.length >= BOM.length && Arrays.equals(b, 0, BOM.length, BOM, 0, BOM.length);
    }

    private static String megabytes(long bytes) {
        return bytes < (1L << 20) ? bytes + " bytes" : DecimalText.fixed(bytes / 1048576.0, 1) + " MiB";
    }

    private static String reason(IOException e) {
        if (e instanceof AccessDeniedException) return "permission denied";
        if (e instanceof FileSystemLoopException) return "a loop of links";
        String m = e.getMessage();
        return m == null ? "an input/output error" : m;
    }

    private static InputProblem problem(Path file, String what) {
        return new InputProblem(file.toString(), 0, 0, null, what);
    }
}
