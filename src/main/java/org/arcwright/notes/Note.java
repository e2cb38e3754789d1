package org.arcwright.notes;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * One practice note: why a company tolerances a kind of radius the way it does.
 *
 * <p>Ids are short lower-case slugs ({@code radius-vs-controlled-radius}); a note in a later pack
 * layer with the same id replaces the earlier one. Tags, functions and processes are lower-case
 * labels (spaces become hyphens); standards are short names such as {@code ASME Y14.5-2018},
 * {@code ISO 2768-1} or {@code common practice}.
 *
 * @param id lower-case slug, letters, digits and hyphens, at most 80 characters
 * @param title one line, what the note answers
 * @param tags search labels
 * @param functions what the radius does (stress-relief, sealing, mating-clearance, ...)
 * @param standards the standards or handbooks the note leans on, or {@code common practice}
 * @param processes manufacturing processes the note concerns (machined, cast, moulded, ...)
 * @param author who wrote it (a role or a name), may be empty
 * @param updated date of the last revision, may be null
 * @param body the Markdown text
 */
public record Note(String id, String title, List<String> tags, List<String> functions, List<String> standards,
                   List<String> processes, String author, LocalDate updated, String body) {

    private static final Pattern ID = Pattern.compile("[a-z0-9][a-z0-9-]{0,79}");

    public Note {
        Objects.requireNonNull(id, "id");
        if (!ID.matcher(id).matches()) {
            throw new IllegalArgumentException("id '" + id
                    + "' must be 1 to 80 lower-case letters, digits or hyphens, starting with a letter or digit");
        }
        Objects.requireNonNull(title, "title");
        title = oneSpace(title).strip();
        if (title.isEmpty()) throw new IllegalArgumentException("title must not be blank");
        tags = labels(tags);
        functions = labels(functions);
        processes = labels(processes);
        standards = standards == null ? List.of()
                : standards.stream().map(String::strip).filter(s -> !s.isEmpty()).distinct().toList();
        author = author == null ? "" : oneSpace(author).strip();
        body = body == null ? "" : body;
    }

    /** Lower-cases a label and turns inner spaces into hyphens, as tags are stored. */
    public static String label(String raw) {
        String l = raw.strip().toLowerCase(Locale.ROOT);
        return plainSpaced(l) && l.indexOf(' ') < 0 ? l : l.replaceAll("\\s+", "-");
    }

    /** Runs of white space as one space; skips the regular expression for text that is already so (most text). */
    private static String oneSpace(String s) {
        return plainSpaced(s) ? s : s.replaceAll("\\s+", " ");
    }

    /** Whether every white space character in {@code s} is a single space. */
    private static boolean plainSpaced(String s) {
        boolean prevSpace = false;
        for (int i = 0, n = s.length(); i < n; i++) {
            char c = s.charAt(i);
            if (c == ' ') {
                if (prevSpace) return false;
                prevSpace = true;
            } else {
                if (Character.isWhitespace(c) || Character.isSpaceChar(c)) return false;
                prevSpace = false;
            }
        }
        return true;
    }

    private static List<String> labels(List<String> raw) {
        if (raw == null) return List.of();
        List<String> out = new ArrayList<>();
        for (String r : raw) {
            String l = label(r);
            if (!l.isEmpty() && !out.contains(l)) out.add(l);
        }
        return List.copyOf(out);
    }

    /** The first paragraph of the body, without Markdown marks: a summary for lists. */
    public String summary(int maxChars) {
        String plain = NoteFormat.plainText(body).strip();
        int para = plain.indexOf("\n\n");
        String first = para < 0 ? plain : plain.substring(0, para);
        first = oneSpace(first).strip();
        if (first.length() <= maxChars) return first;
        int cut = first.lastIndexOf(' ', maxChars - 1);
        return first.substring(0, cut > maxChars / 2 ? cut : maxChars - 1) + " …";
    }
}
