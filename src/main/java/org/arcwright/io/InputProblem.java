package org.arcwright.io;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Bad input from a user's file, text or argument, located precisely enough to fix it.
 *
 * <p>Unchecked because it crosses every layer between the file and the shell; the CLI turns it into
 * exit code 2 and the desktop app into a message next to the field. The message is complete on its
 * own: {@code file:line:column: field: what is wrong}.
 */
public final class InputProblem extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String source;
    private final int line;
    private final int column;
    private final String field;
    private final String problem;

    /**
     * @param source the file path or other origin (e.g. {@code "argument"}), may be null
     * @param line 1-based line, or 0 when not known
     * @param column 1-based column, or 0 when not known
     * @param field the field or column name at fault, may be null
     * @param problem what is wrong, in the user's terms
     */
    public InputProblem(String source, int line, int column, String field, String problem) {
        this(source, line, column, field, problem, null);
    }

    public InputProblem(String source, int line, int column, String field, String problem, Throwable cause) {
        super(compose(source, line, column, field, problem), cause);
        this.source = source;
        this.line = line;
        this.column = column;
        this.field = field;
        this.problem = Objects.requireNonNull(problem, "problem");
    }

    /** A problem with a single named value that has no file position (a command-line argument). */
    public static InputProblem ofField(String field, String problem) {
        return new InputProblem(null, 0, 0, field, problem);
    }

    /** A problem in a file, at a line, with a field. */
    public static InputProblem inFile(Path file, int line, String field, String problem) {
        return new InputProblem(file == null ? null : file.toString(), line, 0, field, problem);
    }

    /** The same problem, attributed to a file (keeps line, column and field). */
    public InputProblem in(String newSource) {
        return new InputProblem(newSource, line, column, field, problem, getCause());
    }

    /** The same problem, attributed to an enclosing field, e.g. {@code callout.min}. */
    public InputProblem under(String parentField) {
        String f = field == null ? parentField : parentField + "." + field;
        return new InputProblem(source, line, column, f, problem, getCause());
    }

    public String source() { return source; }
    public int line() { return line; }
    public int column() { return column; }
    public String field() { return field; }
    public String problem() { return problem; }

    private static String compose(String source, int line, int column, String field, String problem) {
        StringBuilder sb = new StringBuilder();
        if (source != null) {
            sb.append(source);
            if (line > 0) {
                sb.append(':').append(line);
                if (column > 0) sb.append(':').append(column);
            }
            sb.append(": ");
        } else if (line > 0) {
            sb.append("line ").append(line);
            if (column > 0) sb.append(", column ").append(column);
            sb.append(": ");
        } else if (column > 0) {
            sb.append("column ").append(column).append(": ");
        }
        if (field != null && !field.isEmpty()) sb.append(field).append(": ");
        sb.append(problem);
        return sb.toString();
    }
}
