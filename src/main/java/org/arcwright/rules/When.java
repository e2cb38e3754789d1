package org.arcwright.rules;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.annotation.JsonDeserialize;
import com.fasterxml.jackson.databind.deser.std.StdDeserializer;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.io.DecimalText;

/**
 * A rule's {@code when} block: conditions on case facts, all of which must hold. An empty block
 * always holds (a fallback rule). Reading it rejects unknown fact names, listing the known ones,
 * and conditions that do not suit the fact, each at its line and column.
 */
@JsonDeserialize(using = When.Reader.class)
public final class When {
    /** Always holds. */
    public static final When ALWAYS = new When(Map.of());

    private final Map<Fact, Condition> conditions;
    private final Fact[] facts;
    private final Condition[] tests;

    public When(Map<Fact, Condition> conditions) {
        this.conditions = Collections.unmodifiableMap(new LinkedHashMap<>(conditions));
        this.facts = this.conditions.keySet().toArray(new Fact[0]);
        this.tests = this.conditions.values().toArray(new Condition[0]);
    }

    /** The conditions, in the order written. */
    public Map<Fact, Condition> conditions() { return conditions; }

    /** True when every condition holds for the case's facts ({@code facts[f.ordinal()]}). */
    public boolean holds(Object[] factValues) {
        for (int i = 0; i < facts.length; i++) {
            if (!tests[i].test(factValues[facts[i].ordinal()])) return false;
        }
        return true;
    }

    /** The facts that fired this block, as {@code name=value}, for the reasoning trace. */
    public List<String> firedBy(Object[] factValues) {
        List<String> out = new ArrayList<>(facts.length);
        for (Fact f : facts) {
            Object v = factValues[f.ordinal()];
            out.add(f.key() + "=" + (v == null ? "absent" : f.type() == Fact.Type.PRESENCE ? "present"
                    : v instanceof Double d ? plain(d) : v));
        }
        return out;
    }

    /** True when some case could satisfy both blocks. */
    public boolean overlaps(When other) {
        Map<Fact, List<Condition>> byFact = new EnumMap<>(Fact.class);
        for (var e : conditions.entrySet()) byFact.computeIfAbsent(e.getKey(), k -> new ArrayList<>()).add(e.getValue());
        for (var e : other.conditions.entrySet()) byFact.computeIfAbsent(e.getKey(), k -> new ArrayList<>()).add(e.getValue());
        for (var e : byFact.entrySet()) {
            if (e.getValue().size() > 1 && !Condition.satisfiable(e.getKey(), e.getValue())) return false;
        }
        return true;
    }

    @Override
    public String toString() { return Condition.describe(conditions); }

    @Override
    public boolean equals(Object o) { return o instanceof When w && w.conditions.equals(conditions); }

    @Override
    public int hashCode() { return conditions.hashCode(); }

    private static String plain(double d) {
        return DecimalText.exact(d);
    }

    /** Reads a {@code when} object field by field, so that errors point at the fact at fault. */
    static final class Reader extends StdDeserializer<When> {
        private static final long serialVersionUID = 1L;

        Reader() { super(When.class); }

        @Override
        public When deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
            if (p.currentToken() != JsonToken.START_OBJECT) {
                throw JsonMappingException.from(p, "'when' must be an object of fact conditions, e.g. "
                        + "{\"function\": \"stress-relief\"}");
            }
            Map<Fact, Condition> out = new LinkedHashMap<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                Fact fact = Fact.byKey(name).orElse(null);
                if (fact == null) {
                    JsonMappingException e = JsonMappingException.from(p, "unknown fact '" + name + "'; known facts: "
                            + Fact.knownNames());
                    e.prependPath(new JsonMappingException.Reference(null, name));
                    throw e;
                }
                p.nextToken();
                JsonNode node = ctxt.readTree(p);
                try {
                    out.put(fact, Condition.parse(fact, node));
                } catch (IllegalArgumentException iae) {
                    JsonMappingException e = JsonMappingException.from(p, iae.getMessage());
                    e.prependPath(new JsonMappingException.Reference(null, name));
                    throw e;
                }
            }
            return new When(out);
        }
    }
}
