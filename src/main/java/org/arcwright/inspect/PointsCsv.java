package org.arcwright.inspect;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Arrays;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;

/**
 * Reads measured points from a CSV file of {@code x,y} lines, streaming, into primitive arrays (a
 * million points need 16 MB plus the growth copy). An optional header line is recognised by a first
 * field that is not a number; blank lines and lines starting with {@code #} are skipped. Any other
 * line that is not two finite numbers is an error naming the line, column and field, never quoting
 * the line: a {@code pointsFile} may name any file the user can read, and its content must not leak
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
                if (!seenData && n == 0 && !isNumber(fx)) {
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
        } catch (java.nio.charset.MalformedInputException e) {
            throw new InputProblem(src, lineNo + 1, 0, null, "not UTF-8 text");
        } catch (IOException e) {
            throw new UncheckedIOException("could not read " + file + ": " + e.getMessage(), e);
        }
        if (n == 0) throw new InputProblem(src, 0, 0, "points", "no points in the file");
        return new PointSet(xs, ys, n, src);
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private static double number(String s, String src, int line, int col, String field) {
        double v;
        try {
            v = Double.parseDouble(s);
        } catch (NumberFormatException e) {
            throw new InputProblem(src, line, col, field, "not a number");
        }
        if (!Double.isFinite(v)) throw new InputProblem(src, line, col, field, "not a finite number");
        return v;
    }

}
