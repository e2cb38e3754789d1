package org.arcwright.rules;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.arcwright.io.DecimalText;

/**
 * A test on one fact's value. In a rule file a condition is written as:
 * <pre>
 *   "function": "stress-relief"                  equals
 *   "loading": ["static", "fatigue"]             one of
 *   "process": {"noneOf": ["cast", "forged"]}    none of
 *   "nominalRadius": {"min": 0.5, "below": 3}    numeric range (min/max inclusive, above/below exclusive)
 *   "stress": {"present": true}                  present or absent
 * </pre>
 * A fact that is absent from the case satisfies only {@code present: false} and {@code noneOf}.
 */
public sealed interface Condition {

    /** True when {@code value} (a String, Double or Boolean, or null when absent) satisfies this condition. */
    boolean test(Object value);

    /** Values mentioned by the condition, used to find a value two conditions could share. */
    List<Object> mentioned();

    /** The value equals the given one. */
    record Equals(Object value) implements Condition {
        public boolean test(Object v) { return value.equals(v); }
        public List<Object> mentioned() { return List.of(value); }
        @Override public String toString() { return "= " + value; }
    }

    /** The value is one of the given ones. */
    record OneOf(Set<Object> values) implements Condition {
        public boolean test(Object v) { return v != null && values.contains(v); }
        public List<Object> mentioned() { return List.copyOf(values); }
        @Override public String toString() { return "in " + values; }
    }

    /** The value is absent or none of the given ones. */
    record NoneOf(Set<Object> values) implements Condition {
        public boolean test(Object v) { return v == null || !values.contains(v); }
        public List<Object> mentioned() { return List.copyOf(values); }
        @Override public String toString() { return "not in " + values; }
    }

    /** A number within bounds; null bounds are open. */
    record Range(Double min, Double max, Double above, Double below) implements Condition {
        public boolean test(Object v) {
            if (!(v instanceof Double d)) return false;
            return (min == null || d >= min) && (max == null || d <= max) && (above == null || d > above)
                    && (below == null || d < below);
        }

        public List<Object> mentioned() {
            List<Object> out = new ArrayList<>();
            for (Double b : new Double[] {min, max, above, below}) if (b != null) out.add(b);
            return out;
        }

        @Override
        public String toString() {
            List<String> parts = new ArrayList<>();
            if (min != null) parts.add(">= " + DecimalText.exact(min));
            if (above != null) parts.add("> " + DecimalText.exact(above));
            if (max != null) parts.add("<= " + DecimalText.exact(max));
            if (below != null) parts.add("< " + DecimalText.exact(below));
            return String.join(" and ", parts);
        }
    }

    /** The value is present (or absent). */
    record Present(boolean present) implements Condition {
        public boolean test(Object v) { return (v != null) == present; }
        public List<Object> mentioned() { return List.of(); }
        @Override public String toString() { return present ? "present" : "absent"; }
    }

    /**
     * Reads the condition on {@code fact} from its JSON form.
     *
     * @throws IllegalArgumentException naming what is wrong and what is allowed
     */
    static Condition parse(Fact fact, JsonNode node) {
        if (node.isArray()) return new OneOf(values(fact, node));
        if (!node.isObject()) return new Equals(value(fact, node));
        Set<String> keys = new LinkedHashSet<>();
        node.fieldNames().forEachRemaining(keys::add);
        if (keys.isEmpty()) throw new IllegalArgumentException("empty condition on '" + fact.key() + "'");
        Set<String> rangeKeys = Set.of("min", "max", "above", "below");
        if (rangeKeys.containsAll(keys)) {
            if (fact.type() != Fact.Type.NUMBER) {
                throw new IllegalArgumentException("'" + fact.key() + "' is not a number; a range (min, max, above, "
                        + "below) applies only to numeric facts");
            }
            Double min = number(fact, node, "min");
            Double max = number(fact, node, "max");
            Double above = number(fact, node, "above");
            Double below = number(fact, node, "below");
            Range r = new Range(min, max, above, below);
            double lo = Math.max(min == null ? Double.NEGATIVE_INFINITY : min, above == null ? Double.NEGATIVE_INFINITY : above);
            double hi = Math.min(max == null ? Double.POSITIVE_INFINITY : max, below == null ? Double.POSITIVE_INFINITY : below);
            if (lo > hi || (lo == hi && (above != null && above == lo || below != null && below == hi))) {
                throw new IllegalArgumentException("range on '" + fact.key() + "' (" + r + ") admits no value");
            }
            return r;
        }
        if (keys.size() != 1) {
            throw new IllegalArgumentException("condition on '" + fact.key() + "' mixes " + keys
                    + "; use one of equals, oneOf, noneOf, present, or the range keys min, max, above, below");
        }
        String key = keys.iterator().next();
        JsonNode v = node.get(key);
        return switch (key) {
            case "equals" -> new Equals(value(fact, v));
            case "oneOf" -> new OneOf(values(fact, v));
            case "noneOf" -> new NoneOf(values(fact, v));
            case "present" -> {
                if (!v.isBoolean()) throw new IllegalArgumentException("'present' on '" + fact.key() + "' takes true or false");
                yield new Present(v.booleanValue());
            }
            default -> throw new IllegalArgumentException("unknown condition '" + key + "' on '" + fact.key()
                    + "'; use equals, oneOf, noneOf, present, min, max, above or below");
        };
    }

    private static Set<Object> values(Fact fact, JsonNode array) {
        if (!array.isArray() || array.isEmpty()) {
            throw new IllegalArgumentException("'" + fact.key() + "' needs a non-empty list of values");
        }
        Set<Object> out = new LinkedHashSet<>();
        for (Iterator<JsonNode> it = array.elements(); it.hasNext(); ) out.add(value(fact, it.next()));
        return Set.copyOf(out);
    }

    private static Object value(Fact fact, JsonNode v) {
        switch (fact.type()) {
            case NUMBER -> {
                if (!v.isNumber() || !Double.isFinite(v.doubleValue())) {
                    throw new IllegalArgumentException("'" + fact.key() + "' is a number, got " + v);
                }
                return v.doubleValue();
            }
            case BOOLEAN -> {
                if (!v.isBoolean()) throw new IllegalArgumentException("'" + fact.key() + "' is true or false, got " + v);
                return v.booleanValue();
            }
            case PRESENCE -> throw new IllegalArgumentException("'" + fact.key()
                    + "' can only be tested with {\"present\": true} or {\"present\": false}");
            default -> {
                if (!v.isTextual()) throw new IllegalArgumentException("'" + fact.key() + "' is a word, got " + v);
                String s = v.textValue();
                if (!fact.allowed().isEmpty() && !fact.allowed().contains(s)) {
                    throw new IllegalArgumentException("'" + s + "' is not a value of '" + fact.key() + "'; use one of "
                            + String.join(", ", fact.allowed()));
                }
                return s;
            }
        }
    }

    private static Double number(Fact fact, JsonNode node, String key) {
        JsonNode v = node.get(key);
        if (v == null) return null;
        if (!v.isNumber() || !Double.isFinite(v.doubleValue())) {
            throw new IllegalArgumentException("'" + key + "' on '" + fact.key() + "' must be a number, got " + v);
        }
        return v.doubleValue();
    }

    /**
     * True when some single value of {@code fact} satisfies every condition in {@code conditions}:
     * tested on every value the conditions mention, points between and beyond them, a value none
     * mentions, and absence. Used to find rules that can fire together.
     */
    static boolean satisfiable(Fact fact, List<Condition> conditions) {
        List<Object> candidates = new ArrayList<>();
        candidates.add(null);
        switch (fact.type()) {
            case BOOLEAN -> { candidates.add(Boolean.TRUE); candidates.add(Boolean.FALSE); }
            case PRESENCE -> candidates.add(Boolean.TRUE);
            case NUMBER -> {
                List<Double> pts = new ArrayList<>();
                for (Condition c : conditions) for (Object o : c.mentioned()) pts.add((Double) o);
                pts.sort(null);
                if (pts.isEmpty()) candidates.add(1.0);
                for (int i = 0; i < pts.size(); i++) {
                    double p = pts.get(i);
                    candidates.add(p);
                    if (i + 1 < pts.size()) candidates.add((p + pts.get(i + 1)) / 2);
                }
                if (!pts.isEmpty()) {
                    candidates.add(pts.get(0) - 1);
                    candidates.add(pts.get(pts.size() - 1) + 1);
                }
            }
            default -> {
                candidates.addAll(fact.allowed());
                for (Condition c : conditions) candidates.addAll(c.mentioned());
                candidates.add("\u0000other");
            }
        }
        for (Object v : candidates) {
            boolean all = true;
            for (Condition c : conditions) {
                if (!c.test(v)) { all = false; break; }
            }
            if (all) return true;
        }
        return false;
    }

    /** Used by the loader's error messages. */
    static String describe(Map<Fact, Condition> when) {
        List<String> parts = new ArrayList<>();
        when.forEach((f, c) -> parts.add(f.key() + " " + c));
        return String.join(", ", parts);
    }
}
