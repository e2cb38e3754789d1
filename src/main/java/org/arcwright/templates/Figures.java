package org.arcwright.templates;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.arcwright.tolerance.DrawingStyle;

/**
 * Turns a recommendation's or an inspection's {@code numbers} map into labelled, formatted figures.
 * Known keys get the trade's words; other keys are spelt out from their camel case. Lengths are
 * formatted by {@link DrawingStyle} in the part's units; dimensionless factors (Kt, Kf, q, ratios)
 * with two decimals; angles in degrees. Nested maps are flattened with their parent's label.
 */
public final class Figures {
    private Figures() {}

    private enum Kind { LENGTH, FACTOR, ANGLE, TEXT }

    private record Known(String key, String label, Kind kind) {}

    private static final List<Known> KNOWN = List.of(
            new Known("min", "smallest radius", Kind.LENGTH),
            new Known("max", "largest radius", Kind.LENGTH),
            new Known("nominal", "nominal radius", Kind.LENGTH),
            new Known("band", "size band", Kind.LENGTH),
            new Known("crescentWidth", "crescent width", Kind.LENGTH),
            new Known("profileZone", "equivalent profile zone", Kind.LENGTH),
            new Known("profileZoneShortcut", "profile zone, 2 × deviation shortcut", Kind.LENGTH),
            new Known("outward", "outward part of the zone", Kind.LENGTH),
            new Known("isoOffset", "ISO offset (UZ)", Kind.LENGTH),
            new Known("ktAtMin", "Kt at the smallest radius", Kind.FACTOR),
            new Known("ktAtMax", "Kt at the largest radius", Kind.FACTOR),
            new Known("ktAtNominal", "Kt at the nominal radius", Kind.FACTOR),
            new Known("kfAtMin", "Kf at the smallest radius", Kind.FACTOR),
            new Known("kfAtMax", "Kf at the largest radius", Kind.FACTOR),
            new Known("targetKt", "largest acceptable Kt", Kind.FACTOR),
            new Known("notchSensitivity", "notch sensitivity q", Kind.FACTOR),
            new Known("seatingMargin", "seating margin", Kind.LENGTH),
            new Known("matingCorner", "mating part's corner", Kind.LENGTH),
            new Known("angle", "included angle", Kind.ANGLE),
            new Known("envelope", "measured envelope", Kind.LENGTH),
            new Known("requiredZone", "zone required to pass", Kind.LENGTH),
            new Known("fittedRadius", "fitted radius", Kind.LENGTH),
            new Known("points", "points measured", Kind.TEXT),
            new Known("equivalentProfileZone", "equivalent profile zone", Kind.LENGTH),
            new Known("zone", "profile zone", Kind.LENGTH),
            new Known("tierZones", "tier zones", Kind.LENGTH),
            new Known("toleranceSource", "tolerance from", Kind.TEXT),
            new Known("adjusted", "limits adjusted by the checks", Kind.TEXT),
            new Known("stressMethod", "stress method", Kind.TEXT),
            new Known("targetKf", "largest acceptable Kf", Kind.FACTOR),
            new Known("minRadiusForTarget", "smallest radius meeting the target", Kind.LENGTH),
            new Known("seats", "mating part seats", Kind.TEXT),
            new Known("largestSeatingRadius", "largest fillet that still seats", Kind.LENGTH),
            new Known("callout", "callout judged", Kind.TEXT),
            new Known("worst", "worst finding", Kind.TEXT),
            new Known("smallestRadius", "smallest radius the points meet", Kind.LENGTH),
            new Known("largestRadius", "largest radius the points meet", Kind.LENGTH),
            new Known("uncertainty", "measurement uncertainty U", Kind.LENGTH));

    /** Keys that are context, not figures: left out of the list. */
    private static final Set<String> SKIPPED = Set.of("units");

    /** The figures of {@code numbers}, in its order, formatted by {@code text}'s style and units. */
    public static List<Figure> of(Map<String, Object> numbers, CalloutText text) {
        List<Figure> out = new ArrayList<>();
        for (Map.Entry<String, Object> e : numbers.entrySet()) {
            if (!SKIPPED.contains(e.getKey())) add(out, "", e.getKey(), e.getValue(), text);
        }
        return out;
    }

    @SuppressWarnings("unchecked")
    private static void add(List<Figure> out, String prefix, String key, Object v, CalloutText text) {
        Known k = KNOWN.stream().filter(x -> x.key().equals(key)).findFirst().orElse(null);
        String label = prefix + (k != null ? k.label() : words(key));
        if (v instanceof Map<?, ?> m) {
            for (Map.Entry<String, Object> e : ((Map<String, Object>) m).entrySet()) {
                add(out, label + ", ", e.getKey(), e.getValue(), text);
            }
            return;
        }
        out.add(new Figure(label, value(key, k, v, text)));
    }

    private static String value(String key, Known k, Object v, CalloutText text) {
        if (v == null) return "—";
        if (v instanceof Boolean b) return b ? "yes" : "no";
        if (v instanceof List<?> l) {
            List<String> parts = new ArrayList<>();
            for (Object o : l) parts.add(value(key, k, o, text));
            return String.join(", ", parts);
        }
        if (!(v instanceof Number n)) return v.toString();
        double d = n.doubleValue();
        if (!Double.isFinite(d)) return "—";
        Kind kind = k != null ? k.kind() : guess(key);
        switch (kind) {
            case FACTOR:
                return DrawingStyle.formatFigure(d, 2);
            case ANGLE:
                return DrawingStyle.formatFigure(d, d == Math.rint(d) ? 0 : 1) + "°";
            case TEXT:
                return d == Math.rint(d) ? DrawingStyle.formatFigure(d, 0) : DrawingStyle.formatFigure(d, 3);
            default:
                return text.value(d) + " " + text.unitsSymbol();
        }
    }

    private static Kind guess(String key) {
        String k = key.toLowerCase(Locale.ROOT);
        if (k.startsWith("kt") || k.startsWith("kf") || k.contains("factor") || k.contains("ratio") || k.equals("q")) {
            return Kind.FACTOR;
        }
        if (k.contains("angle")) return Kind.ANGLE;
        if (k.contains("count") || k.contains("points") || k.contains("score")) return Kind.TEXT;
        return Kind.LENGTH;
    }

    /** {@code crescentWidth} as {@code crescent width}. */
    static String words(String key) {
        String s = key.replaceAll("([a-z0-9])([A-Z])", "$1 $2").replace('-', ' ').replace('_', ' ');
        return s.toLowerCase(Locale.ROOT);
    }

    /**
     * One figure.
     *
     * @param label what it is, in words
     * @param value formatted, with its unit
     */
    public record Figure(String label, String value) {}
}
