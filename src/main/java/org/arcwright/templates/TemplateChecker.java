package org.arcwright.templates;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.Deque;
import java.util.LinkedHashSet;
import java.util.Set;
import java.util.stream.Collectors;
import org.arcwright.io.InputProblem;

/**
 * Reads a template's tags before it is used and rejects what a logic-less note may not do: a name
 * that is not in {@link NoteFields}, a list or object written as text, an unclosed or mismatched
 * section, partials, template inheritance and delimiter changes. Errors name file, line, column and
 * the field, like every other input problem.
 */
final class TemplateChecker {

    /** What the check learnt about a valid template. */
    record Result(Set<String> fields, boolean perFeature) {}

    private record Open(String name, int line, int column, boolean list) {}

    /** Sections nested deeper than this are refused: a drawing note needs a handful; thousands overflow the stack. */
    static final int MAX_DEPTH = 24;
    /**
     * List sections nested deeper than this are refused: each repeats what it holds for every item, so
     * nesting multiplies the note's length (eleven nested feature lists made 97 MB).
     */
    static final int MAX_LIST_DEPTH = 3;

    private TemplateChecker() {}

    static Result check(String text, String source, FieldSchema root) {
        Deque<FieldSchema> scopes = new ArrayDeque<>();
        Deque<Open> open = new ArrayDeque<>();
        scopes.push(root);
        Set<String> used = new LinkedHashSet<>();
        boolean perFeature = false;
        int i = 0;
        while (true) {
            int start = text.indexOf("{{", i);
            if (start < 0) break;
            boolean triple = text.startsWith("{{{", start);
            String closer = triple ? "}}}" : "}}";
            int end = text.indexOf(closer, start + (triple ? 3 : 2));
            int line = lineOf(text, start);
            int column = start - text.lastIndexOf('\n', start - 1);
            if (end < 0) throw new InputProblem(source, line, column, null, "tag opened with {{ is never closed");
            String tag = text.substring(start + (triple ? 3 : 2), end).trim();
            i = end + closer.length();
            if (tag.isEmpty()) throw new InputProblem(source, line, column, null, "empty tag {{}}");
            char sigil = triple ? '&' : tag.charAt(0);
            String name = "#^/!>&<$=".indexOf(sigil) >= 0 && !triple ? tag.substring(1).trim() : tag;
            switch (sigil) {
                case '!':
                    continue;
                case '>':
                case '<':
                case '$':
                    throw new InputProblem(source, line, column, name,
                            "templates cannot include or extend other templates; write the text out");
                case '=':
                    throw new InputProblem(source, line, column, null, "delimiter changes are not allowed");
                case '#':
                case '^': {
                    FieldSchema s = resolve(name, scopes, root, source, line, column);
                    if (scopes.size() == 1 && name.split("\\.")[0].equals("feature")) perFeature = true;
                    used.add(name);
                    boolean list = sigil == '#' && s.kind() == FieldSchema.Kind.LIST;
                    if (open.size() >= MAX_DEPTH) {
                        throw new InputProblem(source, line, column, name, "sections nested more than " + MAX_DEPTH
                                + " deep; a drawing note needs far fewer");
                    }
                    if (list) {
                        int lists = 1;
                        for (Open o : open) {
                            if (!o.list()) continue;
                            lists++;
                            if (o.name().equals(name)) {
                                throw new InputProblem(source, line, column, name, "list section opened inside itself "
                                        + "(at line " + o.line() + "); each item would repeat the whole list");
                            }
                        }
                        if (lists > MAX_LIST_DEPTH) {
                            throw new InputProblem(source, line, column, name, "list sections nested more than "
                                    + MAX_LIST_DEPTH + " deep; each repeats its text for every item, so the note "
                                    + "would grow beyond use");
                        }
                    }
                    open.push(new Open(name, line, column, list));
                    if (sigil == '^') {
                        scopes.push(scopes.peek());
                    } else if (s.kind() == FieldSchema.Kind.LIST) {
                        scopes.push(s.element());
                    } else if (s.kind() == FieldSchema.Kind.OBJECT) {
                        scopes.push(s);
                    } else {
                        scopes.push(FieldSchema.text("inside " + name));
                    }
                    continue;
                }
                case '/': {
                    if (open.isEmpty()) {
                        throw new InputProblem(source, line, column, name, "closes a section that was never opened");
                    }
                    Open o = open.pop();
                    if (!o.name().equals(name)) {
                        throw new InputProblem(source, line, column, name, "closes section '" + o.name()
                                + "' opened at line " + o.line() + "; close the inner section first");
                    }
                    scopes.pop();
                    continue;
                }
                default: {
                    if (name.equals(".") || name.equals("this")) continue;
                    if (name.equals("-first") || name.equals("-last") || name.equals("-index")) {
                        if (open.isEmpty()) {
                            throw new InputProblem(source, line, column, name, "only means something inside a list section");
                        }
                        continue;
                    }
                    FieldSchema s = resolve(name, scopes, root, source, line, column);
                    if (scopes.size() == 1 && name.split("\\.")[0].equals("feature")) perFeature = true;
                    if (s.kind() == FieldSchema.Kind.LIST || s.kind() == FieldSchema.Kind.OBJECT) {
                        throw new InputProblem(source, line, column, name, "is " + (s.kind() == FieldSchema.Kind.LIST
                                ? "a list" : "an object") + ", not text; open it as a section {{#" + name + "}}...{{/"
                                + name + "}} and write its fields inside");
                    }
                    used.add(name);
                }
            }
        }
        if (!open.isEmpty()) {
            Open o = open.peek();
            throw new InputProblem(source, o.line(), o.column(), o.name(), "section is never closed with {{/" + o.name() + "}}");
        }
        return new Result(used, perFeature);
    }

    private static FieldSchema resolve(String name, Deque<FieldSchema> scopes, FieldSchema root, String source, int line,
                                       int column) {
        if (!name.matches("[A-Za-z][A-Za-z0-9]*(\\.[A-Za-z][A-Za-z0-9]*)*")) {
            throw new InputProblem(source, line, column, name, "not a field name; names are letters and digits joined by dots");
        }
        String[] parts = name.split("\\.");
        FieldSchema found = null;
        for (FieldSchema scope : scopes) {
            FieldSchema f = scope.field(parts[0]);
            if (f != null) {
                found = f;
                break;
            }
        }
        if (found == null) {
            throw new InputProblem(source, line, column, name, "unknown field '" + parts[0] + "'; known here: "
                    + known(scopes));
        }
        for (int k = 1; k < parts.length; k++) {
            FieldSchema next = found.field(parts[k]);
            if (next == null) {
                String prefix = String.join(".", Arrays.copyOfRange(parts, 0, k));
                throw new InputProblem(source, line, column, name, "unknown field '" + parts[k] + "' in " + prefix
                        + (found.fields().isEmpty() ? ", which has no fields"
                                : "; known: " + String.join(", ", found.fields().keySet())));
            }
            found = next;
        }
        return found;
    }

    private static String known(Deque<FieldSchema> scopes) {
        Set<String> names = new LinkedHashSet<>();
        for (FieldSchema s : scopes) names.addAll(s.fields().keySet());
        return names.stream().collect(Collectors.joining(", "));
    }

    private static int lineOf(String text, int index) {
        int line = 1;
        for (int k = 0; k < index; k++) if (text.charAt(k) == '\n') line++;
        return line;
    }
}
