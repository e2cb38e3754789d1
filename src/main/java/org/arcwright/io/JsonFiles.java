package org.arcwright.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.cfg.CoercionAction;
import com.fasterxml.jackson.databind.cfg.CoercionInputShape;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.InvalidTypeIdException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.deser.std.NumberDeserializers;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * One place that knows how Arcwright reads and writes JSON, so every file error reads alike.
 *
 * <p>Unknown fields are errors (a misspelt field silently ignored is how a rule quietly stops
 * applying). Jackson's own exceptions become {@link InputProblem}s naming file, line, column and the
 * JSON path of the field.
 */
public final class JsonFiles {
    private final ObjectMapper mapper;

    public JsonFiles() {
        this.mapper = JsonMapper.builder()
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
                .enable(SerializationFeature.INDENT_OUTPUT)
                .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
                .addModule(new SimpleModule("finite-numbers")
                        .addDeserializer(Double.class, new FiniteDouble(Double.class, null))
                        .addDeserializer(double.class, new FiniteDouble(double.class, 0.0)))
                .build();
        // "" for a number, a list or an object is a mistake, not "absent": absent would quietly
        // switch an optional check off
        mapper.coercionConfigDefaults()
                .setCoercion(CoercionInputShape.EmptyString, CoercionAction.Fail)
                .setAcceptBlankAsEmpty(Boolean.FALSE);
    }

    public ObjectMapper mapper() { return mapper; }

    /** Reads a file as a tree; errors name the file and position. */
    public JsonNode readTree(Path file) {
        return read(file, JsonNode.class);
    }

    /**
     * Reads a file as the given type through {@link InputFiles} (regular files only, size cap, BOM
     * accepted); errors name the file, position and field.
     */
    public <T> T read(Path file, Class<T> type) {
        return parse(InputFiles.readText(file), file.toString(), type);
    }

    /** Reads a file a practice pack supplies: as {@link #read}, and only from inside {@code packFolder}. */
    public <T> T readPackFile(Path file, Path packFolder, Class<T> type) {
        return parse(InputFiles.readPackText(file, packFolder), file.toString(), type);
    }

    /** A JSON object a practice pack supplies (a table), read from inside {@code packFolder} only. */
    public ObjectNode readPackObject(Path file, Path packFolder) {
        JsonNode tree = readPackFile(file, packFolder, JsonNode.class);
        if (!tree.isObject()) {
            throw new InputProblem(file.toString(), 1, 1, null, "expected a JSON object {...} at the top of the file");
        }
        return (ObjectNode) tree;
    }

    /** Parses text as the given type, attributing errors to {@code source}; a bare {@code null} is refused. */
    public <T> T parse(String text, String source, Class<T> type) {
        if (text.isBlank()) {
            throw new InputProblem(source, 1, 1, null, "empty file, expected JSON");
        }
        T value;
        try {
            value = mapper.readValue(text, type);
        } catch (JsonProcessingException e) {
            // a syntax error is where the parser stopped; a value refused by a check is at its field
            InputProblem p = located(e, source);
            if (p.line() == 0 && p.problem().contains(" digits; at most ")) p = atLongNumber(p, text);
            if (p.line() == 0 && p.problem().contains(" levels are read")) p = atDepth(p, text);
            throw e instanceof JsonMappingException ? refine(p, text) : p;
        }
        if (value == null || value instanceof NullNode) {
            throw new InputProblem(source, 1, 1, null, "the file holds only null; expected " + expected(type));
        }
        return value;
    }

    /** Converts a tree node to a type, attributing errors to {@code source}. */
    public <T> T convert(JsonNode node, String source, Class<T> type) {
        try {
            return mapper.treeToValue(node, type);
        } catch (JsonProcessingException e) {
            throw located(e, source);
        } catch (IllegalArgumentException e) {
            throw new InputProblem(source, 0, 0, null, rootMessage(e), e);
        }
    }

    /** Serialises a value as indented JSON text. */
    public String write(Object value) {
        try {
            return mapper.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialise " + value.getClass().getSimpleName(), e);
        }
    }

    /** Serialises a value and replaces {@code file} atomically. */
    public void writeAtomically(Path file, Object value) {
        AtomicFiles.writeString(file, write(value) + System.lineSeparator());
    }

    /** Nesting too deep to read, placed where it first goes deeper than the parser reads. */
    private static InputProblem atDepth(InputProblem p, String text) {
        int max = mapperDepthLimit();
        int depth = 0;
        int line = 1;
        int lineStart = 0;
        boolean inText = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n') {
                line++;
                lineStart = i + 1;
            } else if (inText) {
                if (c == '\\') i++;
                else if (c == '"') inText = false;
            } else if (c == '"') {
                inText = true;
            } else if (c == '[' || c == '{') {
                if (++depth > max) return new InputProblem(p.source(), line, i - lineStart + 1, p.field(), p.problem(), p.getCause());
            } else if (c == ']' || c == '}') {
                depth--;
            }
        }
        return p;
    }

    private static int mapperDepthLimit() {
        return StreamReadConstraints.defaults().getMaxNestingDepth();
    }

    /** A number too long to read, placed at the first such run of digits and named by the field before it. */
    private static InputProblem atLongNumber(InputProblem p, String text) {
        Matcher m = LONG_NUMBER.matcher(text);
        if (!m.find()) return p;
        int line = 1;
        int lineStart = 0;
        for (int i = 0; i < m.start(); i++) {
            if (text.charAt(i) == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        Matcher f = FIELD_BEFORE.matcher(text.substring(Math.max(0, m.start() - 200), m.start()));
        return new InputProblem(p.source(), line, m.start() - lineStart + 1, f.find() ? f.group(1) : p.field(),
                p.problem(), p.getCause());
    }

    /**
     * A problem found after the JSON was read (by a record's constructor or a check of the whole
     * file), located in {@code text}: at the value of its field, or at the object that should hold a
     * field that is missing. A problem that already has a line, or text that does not parse, is
     * returned as it is.
     */
    public static InputProblem locate(InputProblem p, String text) {
        return p.line() > 0 || text == null ? p : refine(p, text);
    }

    private static final Pattern LEADING_FIELD =
            Pattern.compile("^([A-Za-z_]\\w*(?:\\[\\d+])*(?:\\.[A-Za-z_]\\w*(?:\\[\\d+])*)*)(: | (?=must |is |should |needs? ))");

    /**
     * The problem placed at its field in {@code text}. A constructor's message that starts with a
     * field ("zone must be ...", "tiers[1].zone: ...") names a field below the one the parser knew,
     * when the text has it; the parser's own position (after the object, where it stopped) is
     * replaced by the position of the value.
     */
    private static InputProblem refine(InputProblem p, String text) {
        String field = p.field();
        String problem = p.problem();
        Matcher m = LEADING_FIELD.matcher(problem);
        if (m.find()) {
            String lead = m.group(1);
            boolean simple = lead.matches("\\w+");
            for (String deeper : field == null ? List.of(lead) : List.of(field + "." + lead, lead)) {
                int[] at = position(text, deeper);
                // a simple name the text lacks ("when is missing") is shown at the object that lacks it
                if (at != null && (at[2] == 1 || simple && !m.group(2).equals(": ") && field != null
                        && deeper.startsWith(field + "."))) {
                    return new InputProblem(p.source(), at[0], at[1], deeper, problem.substring(m.end()), p.getCause());
                }
            }
        }
        if (field == null) return p;
        int[] at = position(text, field);
        // the object enclosing a missing field, only when nothing better is known
        if (at == null || at[2] == 0 && p.line() > 0) return p;
        return new InputProblem(p.source(), at[0], at[1], field, problem, p.getCause());
    }

    /**
     * Line, column and whether it was found exactly (1) or only its nearest enclosing value (0), of
     * the value at {@code field} ({@code a.b[2].c}) in JSON {@code text}; null when the text does not
     * parse that far or the field's path is not in it at all.
     */
    private static int[] position(String text, String field) {
        List<String> path = new ArrayList<>();
        for (String part : field.replace("[", ".").replace("]", "").split("\\.")) {
            if (!part.isEmpty()) path.add(part);
        }
        for (int keep = path.size(); keep >= 0; keep--) {
            StringBuilder pointer = new StringBuilder();
            for (String part : path.subList(0, keep)) {
                pointer.append('/').append(part.replace("~", "~0").replace("/", "~1"));
            }
            int[] at = valueAt(text, pointer.toString());
            if (at != null) return new int[] {at[0], at[1], keep == path.size() ? 1 : 0};
        }
        return null;
    }

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS).build();

    private static int[] valueAt(String text, String pointer) {
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken t;
            while ((t = p.nextToken()) != null) {
                if (t == JsonToken.FIELD_NAME || t == JsonToken.END_OBJECT || t == JsonToken.END_ARRAY) continue;
                JsonStreamContext ctx = p.getParsingContext();
                if (t.isStructStart()) ctx = ctx.getParent();
                if (pointer.equals(ctx.pathAsPointer().toString())) {
                    JsonLocation l = p.currentTokenLocation();
                    return new int[] {l.getLineNr(), l.getColumnNr()};
                }
            }
        } catch (IOException | RuntimeException e) {
            return null;
        }
        return null;
    }

    /**
     * A number too large for a double reads as infinity, which no check below the boundary expects:
     * it is refused here, as NaN is, with the text the user wrote.
     */
    private static final class FiniteDouble extends NumberDeserializers.DoubleDeserializer {
        private static final long serialVersionUID = 1L;

        FiniteDouble(Class<Double> type, Double nullValue) {
            super(type, nullValue);
        }

        @Override
        public Double deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
            Double v = super.deserialize(p, ctxt);
            if (v != null && Double.isInfinite(v)) {
                String written = p.getText();
                throw JsonMappingException.from(p, "too large",
                        new InputProblem(null, 0, 0, null, "the number " + (written.length() > 24 ? written.substring(0, 24) + "..." : written)
                                + " is too large (beyond 1.8e308); give a finite number"));
            }
            return v;
        }
    }

    /** Turns a Jackson exception into a located {@link InputProblem}. */
    public static InputProblem located(JsonProcessingException e, String source) {
        JsonLocation loc = e.getLocation();
        int line = loc == null ? 0 : Math.max(0, loc.getLineNr());
        int col = loc == null ? 0 : Math.max(0, loc.getColumnNr());
        String field = null;
        if (e instanceof JsonMappingException jme && !jme.getPath().isEmpty()) {
            field = jme.getPath().stream()
                    .map(r -> r.getFieldName() != null ? r.getFieldName() : "[" + r.getIndex() + "]")
                    .collect(Collectors.joining("."))
                    .replace(".[", "[");
        }
        if (field == null && e.getProcessor() instanceof JsonParser p && p.getParsingContext() != null) {
            field = pointerToField(p.getParsingContext().pathAsPointer().toString());
        }
        return new InputProblem(source, line, col, field, cleanMessage(e), e);
    }

    /** {@code /features/0/chosen} as {@code features[0].chosen}; null for the top level. */
    private static String pointerToField(String pointer) {
        if (pointer == null || pointer.isEmpty() || pointer.equals("/")) return null;
        StringBuilder sb = new StringBuilder();
        for (String part : pointer.substring(1).split("/", -1)) {
            String p = part.replace("~1", "/").replace("~0", "~");
            if (!p.isEmpty() && p.chars().allMatch(Character::isDigit)) {
                sb.append('[').append(p).append(']');
            } else {
                if (sb.length() > 0) sb.append('.');
                sb.append(p);
            }
        }
        return sb.length() == 0 ? null : sb.toString();
    }

    /** Jackson's read constraints (StreamReadConstraints): number and text lengths, nesting depth. */
    private static final Pattern LIMIT = Pattern.compile(
            "(Number value length|String value length|Document nesting depth|Document length|Token count) \\((\\d+)\\) exceeds the maximum allowed \\((\\d+)");
    private static final Pattern OUT_OF_RANGE = Pattern.compile("Numeric value \\(([^)]{1,40})[^)]*\\) out of range of (int|long)");
    /** A run of number characters longer than any number read (its position, when the parser gave none). */
    private static final Pattern LONG_NUMBER = Pattern.compile("-?[0-9][0-9.eE+-]{999,}");
    private static final Pattern FIELD_BEFORE = Pattern.compile("\"([^\"\\\\]+)\"\\s*:\\s*$");
    private static final Pattern UNEXPECTED = Pattern.compile("Unexpected character \\('(.{1,2})'\\)");
    private static final Pattern FROM_VALUE = Pattern.compile("from (\\w+) value");
    private static final Pattern TYPE = Pattern.compile("`([\\w.$\\[\\]]+)`");

    /** What went wrong, in the user's terms: no Java or Jackson class or option names. */
    private static String cleanMessage(JsonProcessingException e) {
        Throwable root = e;
        while (root.getCause() != null && root.getCause() != root) {
            if (root.getCause() instanceof InputProblem ip) {
                return ip.field() == null ? ip.problem() : ip.field() + ": " + ip.problem();
            }
            if (root.getCause() instanceof IllegalArgumentException iae && iae.getMessage() != null) return iae.getMessage();
            if (root.getCause() instanceof NullPointerException) return "missing a required value";
            root = root.getCause();
        }
        if (e instanceof UnrecognizedPropertyException upe) {
            return "unknown field '" + upe.getPropertyName() + "'; known fields: "
                    + upe.getKnownPropertyIds().stream().map(Object::toString).sorted()
                            .collect(Collectors.joining(", "));
        }
        String msg = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        int cut = msg.indexOf("\n at [Source");
        if (cut >= 0) msg = msg.substring(0, cut);
        if (e instanceof MismatchedInputException mie) {
            if (msg.startsWith("Missing required creator property")) return "missing required field";
            if (mie instanceof InvalidTypeIdException ite) {
                return ite.getTypeId() == null ? "missing the field that says which kind it is (\"type\")"
                        : "unknown type '" + ite.getTypeId() + "'";
            }
            String want = mie.getTargetType() == null ? null : expected(mie.getTargetType());
            if (msg.startsWith("Cannot coerce empty String")) {
                return "empty text \"\" where " + (want == null ? "a value" : want) + " is expected";
            }
            if (mie instanceof InvalidFormatException ife && want != null) {
                return "expected " + want + ", got " + shown(ife.getValue());
            }
            Matcher m = FROM_VALUE.matcher(msg);
            if (want != null && m.find()) return "expected " + want + ", got " + kind(m.group(1));
            if (msg.startsWith("No content to map")) return "empty file, expected JSON";
            if (want != null) return "expected " + want;
        }
        return parseMessage(msg);
    }

    private static String parseMessage(String msg) {
        String m = msg.replaceAll(" \\(code \\d+\\)", "");
        Matcher limit = LIMIT.matcher(m);
        if (limit.find()) {
            String n = limit.group(2);
            String max = limit.group(3);
            switch (limit.group(1)) {
                case "Number value length":
                    return "a number of " + n + " digits; at most " + max + " digits are read (a value pasted twice?)";
                case "String value length":
                    return "a text of " + n + " characters; at most " + max + " characters are read in one value";
                case "Document nesting depth":
                    return "lists or objects nested " + n + " deep; at most " + max + " levels are read";
                default:
                    return "the file is too large to read (" + n + "; at most " + max + ")";
            }
        }
        Matcher range = OUT_OF_RANGE.matcher(m);
        if (range.find()) {
            return "the number " + range.group(1) + " is too large for a whole number here (at most "
                    + (range.group(2).equals("int") ? "2147483647" : "9223372036854775807") + ")";
        }
        if (m.contains("'NaN'") || m.contains("Infinity") || m.contains("ALLOW_NON_NUMERIC_NUMBERS")) {
            return "NaN and Infinity are not numbers here; give a finite number";
        }
        if (m.startsWith("Unexpected end-of-input")) return "the JSON ends too early (a missing } or ]?)";
        if (m.startsWith("Duplicate field")) {
            int q = m.indexOf('\'');
            int q2 = q < 0 ? -1 : m.indexOf('\'', q + 1);
            return "field " + (q2 > q ? m.substring(q, q2 + 1) : "") + " given twice";
        }
        if (m.contains("ALLOW_SINGLE_QUOTES") || m.startsWith("Unexpected character (''')")) {
            return "text must be in double quotes";
        }
        if (m.startsWith("Unexpected character") && m.contains("expected a valid value")) {
            int q = m.indexOf("('");
            int q2 = q < 0 ? -1 : m.indexOf("')", q);
            String ch = q2 > q ? m.substring(q + 2, q2) : "?";
            return "unexpected '" + ch + "' where a value should be (text in double quotes, a number, a list, an "
                    + "object, true, false or null)";
        }
        if (m.contains("ALLOW_COMMENTS")) return "comments are not allowed in JSON";
        if (m.contains("ALLOW_TRAILING_COMMA") || m.contains("was expecting double-quote to start field name")) {
            return "expected a field name in double quotes (a trailing comma?)";
        }
        if (m.contains("ALLOW_LEADING_") || m.contains("Leading zeroes") || m.contains("in numeric value")) {
            return "not a valid JSON number";
        }
        Matcher ch = UNEXPECTED.matcher(m);
        String c = ch.find() ? ch.group(1) : null;
        if (m.contains("was expecting comma to separate")) {
            return "unexpected " + (c == null ? "character" : "'" + c + "'") + " where a comma between fields (or list items) "
                    + "or the closing bracket should be";
        }
        if (m.contains("was expecting a colon")) return "expected a colon after the field name";
        if (m.startsWith("Unrecognized token")) {
            int q = m.indexOf('\'');
            int q2 = q < 0 ? -1 : m.indexOf('\'', q + 1);
            return "unexpected " + (q2 > q ? m.substring(q, q2 + 1) : "word") + " where a value should be (text in double "
                    + "quotes, a number, a list, an object, true, false or null)";
        }
        if (m.startsWith("Unexpected close marker")) return "a closing } or ] with nothing open to close";
        if (m.startsWith("Illegal unquoted character")) {
            return "a control character (a line break or tab?) inside text; write it as \\n or \\t";
        }
        if (m.startsWith("Unrecognized character escape")) {
            return "an unknown backslash escape inside text; write a backslash itself as \\\\";
        }
        if (m.startsWith("Unexpected character")) {
            return "unexpected " + (c == null ? "character" : "'" + c + "'");
        }
        return scrub(m);
    }

    /** Drops option hints and code numbers, and names types in the user's terms. */
    private static String scrub(String msg) {
        String m = msg.replaceAll(" \\(code \\d+\\)", "")
                .replaceAll(":? *[Ee]nable `[^`]*` to allow", "")
                .replaceAll("\\(for Object starting at [^)]*\\)", "")
                .replaceAll("\\s*\\(through reference chain:[^)]*\\)", "");
        Matcher t = TYPE.matcher(m);
        StringBuilder sb = new StringBuilder();
        while (t.find()) t.appendReplacement(sb, Matcher.quoteReplacement(typeWord(t.group(1))));
        t.appendTail(sb);
        return sb.toString().replace("JsonToken.", "").strip();
    }

    private static String shown(Object v) {
        if (v == null) return "null";
        String s = v.toString();
        if (s.length() > 40) s = s.substring(0, 40) + "...";
        return v instanceof String ? "the text \"" + s + "\"" : s;
    }

    private static String kind(String jacksonShape) {
        switch (jacksonShape.toLowerCase(Locale.ROOT)) {
            case "string": return "text";
            case "object": return "an object {...}";
            case "array": return "a list [...]";
            case "integer": case "floating": case "double": case "number": return "a number";
            case "boolean": return "true or false";
            case "null": return "null";
            default: return "a " + jacksonShape.toLowerCase(Locale.ROOT) + " value";
        }
    }

    /** The user's word for what a Java type expects in JSON. */
    static String expected(Class<?> type) {
        if (type == Double.class || type == double.class || type == Float.class || type == float.class
                || type == BigDecimal.class) {
            return "a number";
        }
        if (type == Integer.class || type == int.class || type == Long.class || type == long.class) return "a whole number";
        if (type == Boolean.class || type == boolean.class) return "true or false";
        if (type == String.class || type.isEnum()) return "text";
        if (type.isArray() || Collection.class.isAssignableFrom(type)
                || type == ArrayNode.class) {
            return "a list [...]";
        }
        return "an object {...}";
    }

    private static String typeWord(String javaName) {
        String n = javaName;
        if (n.endsWith("[]")) return "a list";
        switch (n) {
            case "double": case "java.lang.Double": case "float": case "java.lang.Float": return "a number";
            case "int": case "java.lang.Integer": case "long": case "java.lang.Long": return "a whole number";
            case "boolean": case "java.lang.Boolean": return "true or false";
            case "java.lang.String": return "text";
            default: return n.startsWith("java.util.") && (n.contains("List") || n.contains("Set")) ? "a list" : "an object";
        }
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) t = t.getCause();
        return t.getMessage() == null ? t.toString() : t.getMessage();
    }
}
