package org.arcwright.io;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
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
                .build();
    }

    public ObjectMapper mapper() { return mapper; }

    /** Reads a file as a tree; errors name the file and position. */
    public JsonNode readTree(Path file) {
        return read(file, JsonNode.class);
    }

    /** Reads a file as the given type; errors name the file, position and field. */
    public <T> T read(Path file, Class<T> type) {
        String text;
        try {
            text = Files.readString(file);
        } catch (NoSuchFileException e) {
            throw new InputProblem(file.toString(), 0, 0, null, "file not found");
        } catch (java.nio.charset.MalformedInputException e) {
            throw new InputProblem(file.toString(), 0, 0, null, "not UTF-8 text");
        } catch (IOException e) {
            throw new UncheckedIOException("could not read " + file + ": " + e.getMessage(), e);
        }
        return parse(text, file.toString(), type);
    }

    /** Parses text as the given type, attributing errors to {@code source}. */
    public <T> T parse(String text, String source, Class<T> type) {
        if (text.isBlank()) {
            throw new InputProblem(source, 1, 1, null, "empty file, expected JSON");
        }
        try {
            return mapper.readValue(text, type);
        } catch (JsonProcessingException e) {
            throw located(e, source);
        }
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
        return new InputProblem(source, line, col, field, cleanMessage(e), e);
    }

    private static String cleanMessage(JsonProcessingException e) {
        Throwable root = e;
        while (root.getCause() != null && root.getCause() != root) {
            if (root.getCause() instanceof InputProblem ip) return ip.problem();
            if (root.getCause() instanceof IllegalArgumentException iae) return iae.getMessage();
            root = root.getCause();
        }
        if (e instanceof com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException upe) {
            return "unknown field '" + upe.getPropertyName() + "'; known fields: "
                    + upe.getKnownPropertyIds().stream().map(Object::toString).sorted()
                            .collect(Collectors.joining(", "));
        }
        if (e instanceof com.fasterxml.jackson.databind.exc.MismatchedInputException mie && mie.getTargetType() != null
                && mie.getOriginalMessage().startsWith("Missing required creator property")) {
            return "missing required field";
        }
        String msg = e.getOriginalMessage();
        int cut = msg.indexOf("\n at [Source");
        if (cut >= 0) msg = msg.substring(0, cut);
        return msg;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) t = t.getCause();
        return t.getMessage() == null ? t.toString() : t.getMessage();
    }
}
