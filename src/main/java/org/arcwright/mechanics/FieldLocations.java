package org.arcwright.mechanics;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.Map;
import org.arcwright.io.InputProblem;

/**
 * Line and column of each field of a JSON object tree, so that a value that is well formed but
 * wrong (D &le; d, a radius larger than the step) is reported where it stands in the file.
 */
final class FieldLocations {
    private final String source;
    private final Map<String, int[]> byPath;

    private FieldLocations(String source, Map<String, int[]> byPath) {
        this.source = source;
        this.byPath = byPath;
    }

    /** Locations of the fields in {@code text}; text that does not parse gives no locations. */
    static FieldLocations of(String source, String text) {
        Map<String, int[]> m = new HashMap<>();
        try (JsonParser p = new JsonFactory().createParser(text)) {
            JsonToken t;
            String pendingField = null;
            Deque<String> objectPrefixes = new ArrayDeque<>();
            while ((t = p.nextToken()) != null) {
                if (t == JsonToken.FIELD_NAME) {
                    String prefix = objectPrefixes.isEmpty() ? "" : objectPrefixes.peek();
                    pendingField = prefix.isEmpty() ? p.currentName() : prefix + "." + p.currentName();
                    var loc = p.currentTokenLocation();
                    m.putIfAbsent(pendingField, new int[] {loc.getLineNr(), loc.getColumnNr()});
                } else if (t == JsonToken.START_OBJECT) {
                    objectPrefixes.push(pendingField == null ? "" : pendingField);
                    pendingField = null;
                } else if (t == JsonToken.END_OBJECT) {
                    if (!objectPrefixes.isEmpty()) objectPrefixes.pop();
                } else if (t == JsonToken.START_ARRAY) {
                    p.skipChildren();
                }
            }
        } catch (IOException e) {
            return new FieldLocations(source, Map.of());
        }
        return new FieldLocations(source, m);
    }

    /** The same problem, placed at its field's line and column in this file. */
    InputProblem locate(InputProblem p) {
        int[] at = p.field() == null ? null : byPath.get(p.field());
        if (at == null && p.field() != null && p.field().contains(".")) {
            at = byPath.get(p.field().substring(0, p.field().lastIndexOf('.')));
        }
        return new InputProblem(source, at == null ? 0 : at[0], at == null ? 0 : at[1], p.field(), p.problem(), p);
    }
}
