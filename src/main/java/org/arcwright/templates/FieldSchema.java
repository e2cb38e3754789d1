package org.arcwright.templates;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * The shape of the values a template may name: text, a flag, an object with named fields, or a
 * list whose elements share one shape. Used to check templates at load, before any part is filled.
 *
 * @param kind what the value is
 * @param doc one line saying what it holds, for the developer guide and error messages
 * @param fields the named fields of an object (empty otherwise), in documentation order
 * @param element the shape of a list's elements, or null
 */
public record FieldSchema(Kind kind, String doc, Map<String, FieldSchema> fields, FieldSchema element) {

    /** What a value is. */
    public enum Kind {
        /** Formatted text, written with {@code {{name}}}. */
        TEXT,
        /** True or false, used as a section {@code {{#name}}...{{/name}}}. */
        FLAG,
        /** Named fields. */
        OBJECT,
        /** Repeated elements, used as a section. */
        LIST
    }

    public FieldSchema {
        Objects.requireNonNull(kind, "kind");
        fields = Collections.unmodifiableMap(new LinkedHashMap<>(fields));
    }

    public static FieldSchema text(String doc) { return new FieldSchema(Kind.TEXT, doc, Map.of(), null); }

    public static FieldSchema flag(String doc) { return new FieldSchema(Kind.FLAG, doc, Map.of(), null); }

    /** An object; {@code fields} alternates names and schemas. */
    public static FieldSchema object(String doc, Object... fields) {
        Map<String, FieldSchema> m = new LinkedHashMap<>();
        for (int i = 0; i < fields.length; i += 2) m.put((String) fields[i], (FieldSchema) fields[i + 1]);
        return new FieldSchema(Kind.OBJECT, doc, m, null);
    }

    public static FieldSchema list(String doc, FieldSchema element) {
        return new FieldSchema(Kind.LIST, doc, Map.of(), element);
    }

    /** The field {@code name} of this object, or null. */
    public FieldSchema field(String name) { return fields.get(name); }
}
