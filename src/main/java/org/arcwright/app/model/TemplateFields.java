package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.arcwright.templates.FieldSchema;
import org.arcwright.templates.NoteFields;

/**
 * The fields a drawing-note template may use, read from the template model ({@link NoteFields}),
 * listed beside the template in the Practice editor and inserted at the caret. The list follows the
 * schema the template check uses, so a field offered here always checks where the entry says.
 */
public final class TemplateFields {
    private TemplateFields() {}

    /**
     * One field.
     *
     * @param path the field as the developer guide writes it, e.g. {@code feature.callout} or {@code features[].id}
     * @param kind text, flag, object or list
     * @param doc what it holds
     * @param insert what is inserted: {@code {{name}}} for text, a section for a flag, list or object
     * @param within the lists it must sit inside, outermost first (e.g. {@code features}), or empty
     */
    public record Field(String path, FieldSchema.Kind kind, String doc, String insert, List<String> within) {
        public Field {
            within = List.copyOf(within);
        }

        /** Where the field may be written, in words, for the tooltip. */
        public String where() {
            if (within.isEmpty()) return "anywhere in the template";
            StringBuilder b = new StringBuilder("inside ");
            for (String w : within) b.append("{{#").append(w).append("}}");
            return b.append("…").toString();
        }

        /** True when {@code text} (already lower case) occurs in the path or the description. */
        public boolean matches(String text) {
            return text.isBlank() || path.toLowerCase(Locale.ROOT).contains(text) || doc.toLowerCase(Locale.ROOT).contains(text);
        }

        @Override
        public String toString() { return path; }
    }

    /** Every field, in the order of the template model, per-feature fields ({@code feature.*}) first. */
    public static List<Field> all() {
        List<Field> part = new ArrayList<>();
        List<Field> feature = new ArrayList<>();
        Set<FieldSchema> listed = Collections.newSetFromMap(new IdentityHashMap<>());
        for (Map.Entry<String, FieldSchema> e : NoteFields.ROOT.fields().entrySet()) {
            walk(e.getKey(), e.getKey(), e.getValue(), List.of(), e.getKey().equals("feature") ? feature : part, listed);
        }
        List<Field> out = new ArrayList<>(feature);
        out.addAll(part);
        return List.copyOf(out);
    }

    /** The fields whose path or description contains {@code text}, case ignored. */
    public static List<Field> matching(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        return all().stream().filter(f -> f.matches(t)).toList();
    }

    /**
     * Adds {@code schema} under {@code path} (as documented) and {@code name} (as written where it
     * sits: relative to the innermost enclosing list, as Mustache looks names up). A list whose
     * elements were listed already under another list ({@code decidedFeatures} after {@code features})
     * is listed alone; its description says whose fields it has.
     */
    private static void walk(String path, String name, FieldSchema schema, List<String> within, List<Field> out,
                             Set<FieldSchema> listed) {
        switch (schema.kind()) {
            case TEXT -> out.add(new Field(path, schema.kind(), schema.doc(), "{{" + name + "}}", within));
            case FLAG -> out.add(new Field(path, schema.kind(), schema.doc(), "{{#" + name + "}}{{/" + name + "}}", within));
            case OBJECT -> {
                out.add(new Field(path, schema.kind(), schema.doc(), "{{#" + name + "}}{{/" + name + "}}", within));
                for (Map.Entry<String, FieldSchema> f : schema.fields().entrySet()) {
                    walk(path + "." + f.getKey(), name + "." + f.getKey(), f.getValue(), within, out, listed);
                }
            }
            case LIST -> {
                FieldSchema element = schema.element();
                boolean plain = element == null || element.kind() == FieldSchema.Kind.TEXT;
                String body = plain ? "{{.}}" : "";
                out.add(new Field(path, schema.kind(), schema.doc(), "{{#" + name + "}}" + body + "{{/" + name + "}}", within));
                if (!plain && listed.add(element)) {
                    List<String> inside = new ArrayList<>(within);
                    inside.add(name);
                    for (Map.Entry<String, FieldSchema> f : element.fields().entrySet()) {
                        walk(path + "[]." + f.getKey(), f.getKey(), f.getValue(), inside, out, listed);
                    }
                }
            }
            default -> throw new IllegalStateException("unknown kind " + schema.kind());
        }
    }
}
