package org.arcwright.app.model;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.io.InputProblem;

/**
 * The Practice editor's form over a rule's JSON: each field of the rule as text a lead engineer
 * writes (one condition or one sentence a line), read from the JSON and written back into it, so the
 * form and the JSON tab are two views of one text. Writing a field replaces that field only and keeps
 * the others, their order and any field the form does not show; reading then writing a field
 * unchanged gives the same rule ({@code RuleFormTest} checks every built-in rule).
 *
 * <p>Conditions and recommendation settings are written {@code name: value}, one a line; the value
 * is JSON where it reads as JSON ({@code true}, {@code 3}, {@code ["static", "fatigue"]},
 * {@code {"min": 0.5}}) and a word otherwise ({@code sealing}); a word that would read as JSON is
 * written quoted, so it comes back a word.
 */
public final class RuleForm {
    /** Reads a whole value or fails: {@code 3 apples} is a word, not the number 3. */
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS).build();

    private RuleForm() {}

    /** The fields of the form, in the order shown, with the JSON field each one edits. */
    public enum Field {
        ID("id", "Id"), SUMMARY("summary", "Summary"), WEIGHT("weight", "Weight"), WHEN("when", "When"),
        RECOMMEND("recommend", "Recommends"), NEEDS("needs", "Adds needs"), PREFER("prefer", "Prefers"),
        BECAUSE("because", "Because"), CAUTIONS("cautions", "Cautions"),
        REFERENCES("references", "References"), NOTE_TAGS("noteTags", "Note tags"), EXAMPLES("examples", "Examples");

        private final String key;
        private final String label;

        Field(String key, String label) {
            this.key = key;
            this.label = label;
        }

        /** The field's name in the rule's JSON. */
        public String key() { return key; }

        /** The field's name on the form. */
        public String label() { return label; }

        boolean isLines() { return this == BECAUSE || this == CAUTIONS || this == REFERENCES; }

        boolean isPairs() { return this == WHEN || this == RECOMMEND; }

        /** Written as a comma-separated list of words. */
        boolean isWords() { return this == NOTE_TAGS || this == PREFER; }

        /** Written as JSON: a list of objects with fields of their own. */
        boolean isJson() { return this == NEEDS || this == EXAMPLES; }
    }

    /** The form text of every field of {@code json}; empty when the text is not a JSON object. */
    public static Optional<Map<Field, String>> read(String json) {
        ObjectNode rule = object(json);
        if (rule == null) return Optional.empty();
        Map<Field, String> out = new EnumMap<>(Field.class);
        for (Field f : Field.values()) out.put(f, text(f, rule.get(f.key())));
        return Optional.of(out);
    }

    /**
     * {@code json} with field {@code f} set from {@code formText}, indented as the editor shows rules.
     *
     * @throws InputProblem naming the field (and its line, for conditions and examples) when the text
     *     cannot be a value of that field, or when {@code json} is not a JSON object
     */
    public static String write(String json, Field f, String formText) {
        ObjectNode rule = object(json);
        if (rule == null) {
            throw InputProblem.ofField(f.key(), "the JSON tab does not read as a rule object; fix it there first");
        }
        JsonNode value = value(f, formText == null ? "" : formText, rule.get(f.key()));
        if (value == null) {
            rule.remove(f.key());
        } else {
            rule.set(f.key(), value);
        }
        try {
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(rule);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /**
     * The form field a reader's problem is about: by the problem's field ({@code weight},
     * {@code when.function}, {@code examples[0].case}) or, for a value a rule refuses, by the name its
     * message starts with ({@code "weight must be 1 to 1000"}).
     */
    public static Optional<Field> fieldOf(InputProblem p) {
        String name = p.field() == null ? "" : p.field();
        String message = p.problem();
        for (Field f : Field.values()) {
            if (name.equals(f.key()) || name.startsWith(f.key() + ".") || name.startsWith(f.key() + "[")) return Optional.of(f);
        }
        for (Field f : Field.values()) {
            if (message.contains(": " + f.key() + " ") || message.startsWith(f.key() + " ")) return Optional.of(f);
        }
        return Optional.empty();
    }

    private static ObjectNode object(String json) {
        try {
            JsonNode n = MAPPER.readTree(json == null ? "" : json);
            return n instanceof ObjectNode o ? o : null;
        } catch (JsonProcessingException e) {
            return null;
        }
    }

    private static String text(Field f, JsonNode v) {
        if (v == null || v.isNull()) return "";
        if (f.isLines() || f.isWords()) {
            StringBuilder b = new StringBuilder();
            String sep = f.isWords() ? ", " : "\n";
            for (JsonNode item : v) {
                if (b.length() > 0) b.append(sep);
                b.append(item.isTextual() ? item.asText() : item.toString());
            }
            return b.toString();
        }
        if (f.isPairs()) {
            StringBuilder b = new StringBuilder();
            for (Iterator<Map.Entry<String, JsonNode>> it = v.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                if (b.length() > 0) b.append('\n');
                b.append(e.getKey()).append(": ").append(word(e.getValue()));
            }
            return b.toString();
        }
        if (f.isJson()) {
            try {
                return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(v);
            } catch (JsonProcessingException e) {
                throw new IllegalStateException(e);
            }
        }
        return v.isTextual() ? v.asText() : v.toString();
    }

    /** A value as written after {@code name: }: a word as it is unless it would read back as something else. */
    private static String word(JsonNode v) {
        if (!v.isTextual()) return v.toString();
        String s = v.asText();
        if (s.isBlank() || !s.equals(s.strip()) || readsAsJson(s)) return v.toString();
        return s;
    }

    private static boolean readsAsJson(String s) {
        try {
            MAPPER.readTree(s);
            return true;
        } catch (JsonProcessingException e) {
            return false;
        }
    }

    private static JsonNode value(Field f, String text, JsonNode before) {
        JsonNodeFactory nodes = JsonNodeFactory.instance;
        switch (f) {
            case ID:
            case SUMMARY:
                return nodes.textNode(text.strip());
            case WEIGHT:
                if (text.isBlank() && before == null) return null;
                try {
                    return nodes.numberNode(Integer.parseInt(text.strip()));
                } catch (NumberFormatException e) {
                    throw InputProblem.ofField(f.key(), "a whole number from 1 to 1000, got '" + text.strip() + "'");
                }
            case WHEN:
            case RECOMMEND:
                return text.isBlank() && before == null ? null : pairs(f, text);
            case NEEDS:
            case EXAMPLES: {
                if (text.isBlank()) return before == null ? null : nodes.arrayNode();
                try {
                    JsonNode n = MAPPER.readTree(text);
                    if (!(n instanceof ArrayNode)) {
                        throw InputProblem.ofField(f.key(), "a JSON list [ ... ] of " + (f == Field.NEEDS ? "needs" : "examples"));
                    }
                    return n;
                } catch (JsonProcessingException e) {
                    int line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
                    throw new InputProblem(null, line, 0, f.key(), "not JSON: " + e.getOriginalMessage());
                }
            }
            default: {
                ArrayNode list = nodes.arrayNode();
                List<String> items = f.isWords() ? List.of(text.split(",")) : text.lines().toList();
                for (String item : items) if (!item.isBlank()) list.add(item.strip());
                return list.isEmpty() && before == null && f != Field.BECAUSE ? null : list;
            }
        }
    }

    private static ObjectNode pairs(Field f, String text) {
        ObjectNode out = JsonNodeFactory.instance.objectNode();
        List<String> lines = text.lines().toList();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.isBlank()) continue;
            int colon = line.indexOf(':');
            if (colon <= 0) {
                throw new InputProblem(null, i + 1, 0, f.key(), "write name: value, one a line, e.g. "
                        + (f == Field.WHEN ? "function: sealing" : "callout: profile") + "; got '" + line.strip() + "'");
            }
            String name = line.substring(0, colon).strip();
            String raw = line.substring(colon + 1).strip();
            JsonNode v;
            try {
                v = raw.isEmpty() ? JsonNodeFactory.instance.textNode("") : MAPPER.readTree(raw);
            } catch (JsonProcessingException e) {
                v = JsonNodeFactory.instance.textNode(raw);
            }
            if (out.has(name)) {
                throw new InputProblem(null, i + 1, 0, f.key() + "." + name, "'" + name + "' is given twice");
            }
            out.set(name, v);
        }
        return out;
    }
}
