package org.arcwright.notes;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.arcwright.io.InputProblem;

/**
 * Reads and writes the note file format: a header of {@code key: value} lines between two lines
 * of three hyphens, then the Markdown body.
 *
 * <pre>
 * ---
 * id: seal-groove-corner-radii
 * title: Corner radii in O-ring grooves
 * tags: o-ring, groove, sealing land
 * functions: sealing
 * standard: ISO 3601-2, common practice
 * process: machined
 * author: Arcwright built-in
 * updated: 2026-11-30
 * ---
 * Body in Markdown...
 * </pre>
 *
 * <p>{@code id} and {@code title} are required; lists are separated by commas; {@code updated} is
 * an ISO date. Unknown or repeated keys are errors (a misspelt key silently ignored is how a note
 * quietly drops out of a filter). Errors are {@link InputProblem}s naming file, line, column and
 * key. See decision record 0500.
 */
public final class NoteFormat {
    /** The header keys, in the order they are written. */
    public static final List<String> KEYS =
            List.of("id", "title", "tags", "functions", "standard", "process", "author", "updated");

    private static final String FENCE = "---";
    private static final Pattern LINE_BREAK = Pattern.compile("\r?\n");
    private static final Pattern HEADING = Pattern.compile("^\\s{0,3}#{1,6}\\s+");
    private static final Pattern BULLET = Pattern.compile("^\\s*[-*+]\\s+");
    private static final Pattern QUOTE = Pattern.compile("^\\s*>\\s?");
    private static final Pattern LINK = Pattern.compile("\\[([^\\]]*)\\]\\([^)]*\\)");
    private static final Pattern STRONG_OR_CODE = Pattern.compile("(\\*\\*|__|`)");
    private static final Pattern EMPHASIS =
            Pattern.compile("(?<![\\w*])\\*(?!\\s)([^*]+?)(?<!\\s)\\*(?![\\w*])");

    private NoteFormat() {}

    /**
     * Parses a note.
     *
     * @param text the whole file
     * @param source the file name for error messages
     * @throws InputProblem when the header is missing, unclosed, has an unknown, repeated or
     *     malformed key, or lacks {@code id} or {@code title}
     */
    public static Note parse(String text, String source) {
        String t = text.startsWith("\uFEFF") ? text.substring(1) : text;
        int pos = 0;
        int lineNo = 0;
        int bodyStart = -1;
        Map<String, String> values = new LinkedHashMap<>();
        Map<String, Integer> lineOf = new LinkedHashMap<>();
        while (pos <= t.length()) {
            int nl = t.indexOf('\n', pos);
            int end = nl < 0 ? t.length() : nl;
            String line = t.substring(pos, end > pos && t.charAt(end - 1) == '\r' ? end - 1 : end);
            pos = end + 1;
            lineNo++;
            if (lineNo == 1) {
                if (!line.strip().equals(FENCE)) {
                    throw new InputProblem(source, 1, 1, null,
                            "a note starts with a header between two '---' lines (id, title, tags, ...)");
                }
                continue;
            }
            if (line.strip().equals(FENCE)) {
                bodyStart = Math.min(pos, t.length());
                break;
            }
            if (line.isBlank() || line.stripLeading().startsWith("#")) continue;
            int colon = line.indexOf(':');
            if (colon < 0) {
                throw new InputProblem(source, lineNo, 1, null,
                        "header line must be 'key: value' (or the header is not closed with '---')");
            }
            String key = line.substring(0, colon).strip();
            if (!KEYS.contains(key)) {
                throw new InputProblem(source, lineNo, 1, key, "unknown header key; known keys: " + String.join(", ", KEYS));
            }
            if (values.containsKey(key)) {
                throw new InputProblem(source, lineNo, 1, key, "repeated header key (first on line " + lineOf.get(key) + ")");
            }
            values.put(key, line.substring(colon + 1).strip());
            lineOf.put(key, lineNo);
        }
        if (bodyStart < 0) {
            throw new InputProblem(source, lineNo, 1, null, "header not closed: add a line '---' after the last key");
        }
        for (String required : List.of("id", "title")) {
            if (values.getOrDefault(required, "").isEmpty()) {
                throw new InputProblem(source, lineOf.getOrDefault(required, 1), 1, required, "missing required header key");
            }
        }
        LocalDate updated = null;
        String u = values.getOrDefault("updated", "");
        if (!u.isEmpty()) {
            try {
                updated = LocalDate.parse(u);
            } catch (DateTimeParseException e) {
                throw new InputProblem(source, lineOf.get("updated"), valueColumn(t, lineOf.get("updated")), "updated",
                        "'" + u + "' is not a date of the form 2026-11-30");
            }
        }
        String rest = t.substring(bodyStart);
        String body = (rest.indexOf('\r') < 0 ? rest : rest.replace("\r\n", "\n")).strip();
        try {
            return new Note(values.get("id"), values.get("title"), list(values.get("tags")),
                    list(values.get("functions")), list(values.get("standard")), list(values.get("process")),
                    values.get("author"), updated, body);
        } catch (IllegalArgumentException e) {
            String field = e.getMessage().startsWith("id") ? "id" : "title";
            int line = lineOf.getOrDefault(field, 1);
            throw new InputProblem(source, line, valueColumn(t, line), field, e.getMessage());
        }
    }

    /** Writes a note in the file format; {@link #parse} reads it back to an equal note. */
    public static String format(Note note) {
        StringBuilder sb = new StringBuilder();
        sb.append(FENCE).append('\n');
        sb.append("id: ").append(note.id()).append('\n');
        sb.append("title: ").append(oneLine(note.title())).append('\n');
        appendList(sb, "tags", note.tags());
        appendList(sb, "functions", note.functions());
        appendList(sb, "standard", note.standards());
        appendList(sb, "process", note.processes());
        if (!note.author().isEmpty()) sb.append("author: ").append(oneLine(note.author())).append('\n');
        if (note.updated() != null) sb.append("updated: ").append(note.updated()).append('\n');
        sb.append(FENCE).append('\n');
        if (!note.body().isEmpty()) sb.append(note.body().strip()).append('\n');
        return sb.toString();
    }

    /**
     * The body without Markdown marks (headings, emphasis, code ticks, link targets, list bullets),
     * for indexing and snippets.
     */
    public static String plainText(String markdown) {
        StringBuilder sb = new StringBuilder(markdown.length() + 1);
        int n = markdown.length();
        int start = 0;
        while (true) {
            int nl = markdown.indexOf('\n', start);
            int end = nl < 0 ? n : nl;
            int lineEnd = nl > start && markdown.charAt(nl - 1) == '\r' ? nl - 1 : end;
            if (!hasMarkdownMarks(markdown, start, lineEnd)) {
                sb.append(markdown, start, lineEnd).append('\n');
            } else {
                String l = markdown.substring(start, lineEnd);
                l = HEADING.matcher(l).replaceFirst("");
                l = BULLET.matcher(l).replaceFirst("");
                l = QUOTE.matcher(l).replaceFirst("");
                l = LINK.matcher(l).replaceAll("$1");
                l = STRONG_OR_CODE.matcher(l).replaceAll("");
                l = EMPHASIS.matcher(l).replaceAll("$1");
                sb.append(l).append('\n');
            }
            if (nl < 0) break;
            start = nl + 1;
        }
        return sb.toString();
    }

    /**
     * Whether a line may hold Markdown that {@link #plainText} strips: heading, bullet and quote marks
     * count only as the first non-blank character, so hyphenated words such as {@code o-ring} do not
     * send every line through the regular expressions.
     */
    private static boolean hasMarkdownMarks(String s, int from, int to) {
        int i = from;
        while (i < to && Character.isWhitespace(s.charAt(i))) i++;
        if (i < to) {
            char first = s.charAt(i);
            if (first == '#' || first == '-' || first == '+' || first == '>') return true;
        }
        for (; i < to; i++) {
            char c = s.charAt(i);
            if (c == '*' || c == '[' || c == '`') return true;
            if (c == '_' && i + 1 < to && s.charAt(i + 1) == '_') return true;
        }
        return false;
    }

    private static void appendList(StringBuilder sb, String key, List<String> values) {
        if (!values.isEmpty()) sb.append(key).append(": ").append(String.join(", ", values)).append('\n');
    }

    private static String oneLine(String s) {
        return s.replaceAll("\\s+", " ").strip();
    }

    private static List<String> list(String raw) {
        if (raw == null || raw.isBlank()) return List.of();
        List<String> out = new ArrayList<>();
        for (String part : raw.split(",")) {
            String p = part.strip();
            if (!p.isEmpty()) out.add(p);
        }
        return out;
    }

    private static int valueColumn(String text, int oneBasedLine) {
        String line = LINE_BREAK.split(text, -1)[oneBasedLine - 1];
        int colon = line.indexOf(':');
        int col = colon + 1;
        while (col < line.length() && Character.isWhitespace(line.charAt(col))) col++;
        return col + 1;
    }
}
