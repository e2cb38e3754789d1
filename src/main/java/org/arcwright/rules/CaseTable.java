package org.arcwright.rules;

import java.util.Locale;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputFiles;
import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * A part's radii as a CSV table, one row per feature, for advising in one go. The header names the
 * columns (any order; blank cells are absent values); see {@link #COLUMNS}. Bad rows are
 * {@link InputProblem}s naming the file, the line and the column.
 */
public final class CaseTable {
    /** The columns a table may have; those marked required must be present in the header. */
    public static final List<String> COLUMNS = List.of("feature", "units", "standard", "kind", "nominalRadius",
            "function", "loading", "formMatters", "locationMatters", "datums", "process", "tolerance", "stress.shape",
            "stress.load", "stress.D", "stress.d", "stress.ultimateStrength", "stress.targetKt", "mating.corner",
            "mating.size", "mating.angle", "cornerAngle", "stress.targetKf");
    /** Columns every table needs. */
    public static final List<String> REQUIRED = List.of("feature", "units", "standard", "kind", "nominalRadius",
            "function", "process");

    private CaseTable() {}

    /** One row: the line it came from and the case it describes. */
    public record Row(int line, String feature, DesignCase designCase) {}

    /** Reads every row of {@code file}. */
    public static List<Row> read(Path file) {
        String src = file.toString();
        CsvMapper mapper = new CsvMapper();
        mapper.enable(CsvParser.Feature.TRIM_SPACES);
        mapper.enable(CsvParser.Feature.SKIP_EMPTY_LINES);
        CsvSchema schema = CsvSchema.emptySchema().withHeader().withComments();
        List<Row> rows = new ArrayList<>();
        try (Reader reader = InputFiles.openText(file, InputFiles.CSV_LIMIT);
             MappingIterator<Map<String, String>> it = mapper.readerFor(Map.class).with(schema).readValues(reader)) {
            CsvSchema header = null;
            while (true) {
                boolean more;
                try {
                    more = it.hasNextValue();
                } catch (IOException e) {
                    throw new InputProblem(src, it.getCurrentLocation().getLineNr(), 0, null, e.getMessage());
                }
                if (!more) break;
                int line = it.getCurrentLocation().getLineNr();
                Map<String, String> values;
                try {
                    values = it.nextValue();
                } catch (IOException | RuntimeException e) {
                    throw new InputProblem(src, line, 0, null, "unreadable row: " + csvWords(firstLine(e.getMessage())));
                }
                if (header == null) {
                    header = (CsvSchema) it.getParserSchema();
                    checkHeader(src, header);
                }
                rows.add(row(src, line, values, header));
            }
        } catch (NoSuchFileException e) {
            throw new InputProblem(src, 0, 0, null, "file not found");
        } catch (IOException e) {
            throw new UncheckedIOException("could not read " + src + ": " + e.getMessage(), e);
        }
        if (rows.isEmpty()) throw new InputProblem(src, 1, 0, null, "no rows: expected a header and one row per feature");
        return List.copyOf(rows);
    }

    private static void checkHeader(String src, CsvSchema header) {
        List<String> names = new ArrayList<>();
        header.forEach(c -> names.add(c.getName()));
        for (int i = 0; i < names.size(); i++) {
            String n = names.get(i);
            if (names.indexOf(n) != i) {
                throw new InputProblem(src, 1, i + 1, n, "column '" + n + "' appears twice (columns " + (names.indexOf(n) + 1)
                        + " and " + (i + 1) + "); a table gives each column once, so that no value is silently replaced");
            }
        }
        for (String n : names) {
            if (!COLUMNS.contains(n)) {
                throw new InputProblem(src, 1, names.indexOf(n) + 1, n, "unknown column '" + n + "'; known columns: "
                        + String.join(", ", COLUMNS));
            }
        }
        for (String r : REQUIRED) {
            if (!names.contains(r)) {
                throw new InputProblem(src, 1, 0, r, "missing column '" + r + "'; required: " + String.join(", ", REQUIRED));
            }
        }
    }

    private static Row row(String src, int line, Map<String, String> v, CsvSchema header) {
        String field = null;
        try {
            field = "feature";
            String feature = text(v, "feature");
            field = "units";
            Units units = Units.parse(required(v, "units"));
            field = "standard";
            DrawingStyle standard = DrawingStyle.parse(required(v, "standard"));
            field = "kind";
            BlendKind kind = BlendKind.fromKey(required(v, "kind"));
            field = "nominalRadius";
            double r = number(required(v, "nominalRadius"));
            field = "function";
            BlendFunction function = BlendFunction.fromKey(required(v, "function"));
            field = "loading";
            Loading loading = text(v, "loading") == null ? Loading.NONE : Loading.fromKey(text(v, "loading"));
            field = "formMatters";
            boolean form = bool(text(v, "formMatters"));
            field = "locationMatters";
            boolean location = bool(text(v, "locationMatters"));
            field = "datums";
            List<String> datums = text(v, "datums") == null ? List.of()
                    : Arrays.stream(text(v, "datums").split("[\\s,;]+")).filter(s -> !s.isEmpty()).toList();
            field = "process";
            Process process = Process.fromKey(required(v, "process"));
            field = "stress.shape";
            DesignCase.StressInputs stress = null;
            if (text(v, "stress.shape") != null) {
                String shape = text(v, "stress.shape");
                field = "stress.load";
                String load = required(v, "stress.load");
                field = "stress.D";
                double bigD = number(required(v, "stress.D"));
                field = "stress.d";
                double smallD = number(required(v, "stress.d"));
                field = "stress.ultimateStrength";
                String su = text(v, "stress.ultimateStrength");
                DesignCase.Strength strength = su == null ? null : new DesignCase.Strength(number(su), "MPa");
                field = "stress.targetKt";
                String kt = text(v, "stress.targetKt");
                field = "stress.targetKf";
                String kf = text(v, "stress.targetKf");
                field = "stress.D";
                stress = new DesignCase.StressInputs(shape, load, bigD, smallD, strength, kt == null ? null : number(kt),
                        kf == null ? null : number(kf));
            }
            field = "mating.corner";
            DesignCase.MatingCorner mating = null;
            if (text(v, "mating.corner") != null) {
                String corner = text(v, "mating.corner");
                field = "mating.size";
                double size = number(required(v, "mating.size"));
                field = "mating.angle";
                String angle = text(v, "mating.angle");
                field = "mating.corner";
                mating = new DesignCase.MatingCorner(corner, size, angle == null ? null : number(angle));
            }
            field = "cornerAngle";
            String corner = text(v, "cornerAngle");
            Double cornerAngle = corner == null ? null : number(corner);
            field = "nominalRadius";
            DesignCase c = new DesignCase(units, standard, feature, kind, r, function, loading, form, location, datums,
                    process, stress, mating, text(v, "tolerance"), cornerAngle);
            return new Row(line, feature == null ? "line " + line : feature, c);
        } catch (InputProblem p) {
            throw cell(src, line, header, p.field() != null && COLUMNS.contains(p.field()) ? p.field() : field, p.problem());
        } catch (IllegalArgumentException e) {
            throw cell(src, line, header, field, e.getMessage());
        }
    }

    /**
     * A bad cell, at its line and column. A message that starts with a column's name ("nominalRadius
     * must be ...") names the column at fault, and is not repeated after it.
     */
    private static InputProblem cell(String src, int line, CsvSchema header, String field, String problem) {
        String f = field;
        String m = problem == null ? "not readable" : problem;
        for (String name : COLUMNS) {
            if (m.startsWith(name + " ")) {
                f = name;
                m = m.substring(name.length() + 1);
                break;
            }
        }
        CsvSchema.Column c = f == null ? null : header.column(f);
        return new InputProblem(src, line, c == null ? 0 : c.getIndex() + 1, f, m);
    }

    private static String text(Map<String, String> v, String key) {
        String s = v.get(key);
        return s == null || s.isBlank() ? null : s.trim();
    }

    private static String required(Map<String, String> v, String key) {
        String s = text(v, key);
        if (s == null) throw new IllegalArgumentException("missing value");
        return s;
    }

    private static double number(String s) {
        try {
            return DecimalText.parseFinite(s);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(e.getMessage());
        }
    }

    private static boolean bool(String s) {
        if (s == null) return false;
        return switch (s.toLowerCase(Locale.ROOT)) {
            case "true", "yes", "y", "1" -> true;
            case "false", "no", "n", "0" -> false;
            default -> throw new IllegalArgumentException("expected true or false, got '" + s + "'");
        };
    }

    private static final Pattern AFTER_QUOTE = Pattern.compile("^Unexpected character \\('(.{1,2})'\\): Expected column separator");
    private static final Pattern TOO_MANY = Pattern.compile("^Too many entries: expected at most (\\d+)");

    /** The CSV reader's message in the user's terms: no character codes, no reader vocabulary. */
    private static String csvWords(String m) {
        String w = m.replaceAll(" \\(code \\d+\\)", "");
        Matcher ch = AFTER_QUOTE.matcher(w);
        if (ch.find()) return "unexpected '" + ch.group(1) + "' after a quoted value; a comma or the end of the line should follow it";
        Matcher many = TOO_MANY.matcher(w);
        if (many.find()) return "more cells than the header has columns (" + many.group(1) + ")";
        if (w.startsWith("Missing closing quote")) return "a quoted value is not closed (a missing \")";
        return w;
    }

    private static String firstLine(String s) {
        if (s == null) return "";
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl);
    }
}
