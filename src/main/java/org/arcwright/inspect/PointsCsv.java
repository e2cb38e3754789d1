package org.arcwright.inspect;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.MalformedInputException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Arrays;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;

/**
 * Reads measured points from a CSV file of {@code x,y} lines, streaming, into primitive arrays (a
 * million points need 16 MB plus the growth copy). An optional header line is recognised as one
 * whose fields are all words without a digit ({@code x,y}); a first line such as {@code 2.O3,0.0004}
 * is a mistyped point, not a header. Blank lines and lines starting with {@code #} are skipped. Any
 * other line that is not two finite numbers ({@link DecimalText}) is an error naming the line, column
 * and field, never quoting the line: a {@code pointsFile} may name any file the user can read, and its content must not leak
 * into a message (or a log, or a shared report) when it is not a points file.
 */
public final class PointsCsv {
    private PointsCsv() {}

    /** Reads {@code file}. @throws InputProblem for a missing file or a bad line */
    public static PointSet read(Path file) {
        String src = file.toString();
        double[] xs = new double[1024], ys = new double[1024];
        int n = 0;
        int lineNo = 0;
        boolean seenData = false;
        try (BufferedReader r = InputFiles.openText(file, InputFiles.CSV_LIMIT)) {
            String line;
            while ((line = r.readLine()) != null) {
                lineNo++;
                String t = line.strip();
                if (t.isEmpty() || t.startsWith("#")) continue;
                int comma = t.indexOf(',');
                if (comma < 0) {
                    throw new InputProblem(src, lineNo, 1, null, "expected two comma-separated values x,y; not a points file?");
                }
                int comma2 = t.indexOf(',', comma + 1);
                if (comma2 >= 0) {
                    throw new InputProblem(src, lineNo, comma2 + 1, null, "expected two values x,y, found more");
                }
                String fx = t.substring(0, comma).strip(), fy = t.substring(comma + 1).strip();
                if (!seenData && n == 0 && isWord(fx) && isWord(fy)) {
                    seenData = true; // a header: any text, once, before the first point
                    continue;
                }
                seenData = true;
                double x = number(fx, src, lineNo, 1, "x");
                double y = number(fy, src, lineNo, comma + 2, "y");
                if (n == xs.length) {
                    xs = Arrays.copyOf(xs, n * 2);
                    ys = Arrays.copyOf(ys, n * 2);
                }
                xs[n] = x;
                ys[n] = y;
                n++;
            }
        } catch (NoSuchFileException e) {
            throw new InputProblem(src, 0, 0, "pointsFile", "file not found");
        } catch (MalformedInputException e) {
            throw new InputProblem(src, lineNo + 1, 0, null, "not UTF-8 text");
        } catch (IOException e) {
            throw new UncheckedIOException("could not read " + file + ": " + e.getMessage(), e);
        }
        if (n == 0) throw new InputProblem(src, 0, 0, "points", "no points in the file");
        return new PointSet(xs, ys, n, src);
    }

    /**
     * A header field: a name that starts with a letter or a bracket, so that a number with a typo in it
     * ({@code 2.O3}) is never taken for a column name.
     */
    private static boolean isWord(String s) {
        if (s.isEmpty() || DecimalText.isDecimal(s)) return false;
        char c = s.charAt(0);
        return !(Character.isDigit(c) || c == '+' || c == '-' || c == '.' || c == ',');
    }

    private static double number(String s, String src, int line, int col, String field) {
        try {
            return DecimalText.parseFinite(s);
        } catch (NumberFormatException e) {
            throw new InputProblem(src, line, col, field, "not a number (expected a finite decimal such as 0.25 or 1e-3)");
        }
    }

}
