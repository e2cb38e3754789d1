package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * The figures behind a recommendation as labelled, formatted rows for its card: lengths with the
 * drawing style's decimals and the case's units, factors to two places, words as they are. Keys the
 * card does not know are still shown, with their name spelled out, so a new figure is never hidden.
 */
public final class CardFigures {
    private CardFigures() {}

    /** One row of the card's figure grid. */
    public record Figure(String label, String value) {}

    private static final int LENGTH_PLACES = 4;

    /**
     * The rows for {@code numbers} (a recommendation's map), in a reading order: limits, band, zone
     * figures, stress, seating, then anything else.
     */
    public static List<Figure> of(Map<String, Object> numbers, DrawingStyle style) {
        Units units = unitsOf(numbers.get("units"));
        String u = " " + units.symbol();
        List<Figure> rows = new ArrayList<>();
        Object min = numbers.get("min");
        Object max = numbers.get("max");
        if (min instanceof Number && max instanceof Number) {
            String[] pair = style.formatLimitPair(((Number) min).doubleValue(), ((Number) max).doubleValue(), units,
                    LENGTH_PLACES);
            rows.add(new Figure("Limits", pair[0] + " to " + pair[1] + u));
        }
        for (Map.Entry<String, Object> e : numbers.entrySet()) {
            String key = e.getKey();
            Object v = e.getValue();
            if (key.equals("units") || (min instanceof Number && max instanceof Number
                    && (key.equals("min") || key.equals("max")))) {
                continue;
            }
            if (key.equals("adjusted")) {
                if (Boolean.TRUE.equals(v)) rows.add(new Figure("Limits adjusted", "yes, to meet the stress and seating checks"));
                continue;
            }
            rows.add(new Figure(label(key), value(key, v, style, units, u)));
        }
        return List.copyOf(rows);
    }

    /** A friendly name for a key of the numbers map. */
    static String label(String key) {
        switch (key) {
            case "nominal": return "Nominal";
            case "min": return "Smallest radius";
            case "max": return "Largest radius";
            case "band": return "Band";
            case "angle": return "Corner angle";
            case "crescentWidth": return "Crescent width";
            case "equivalentProfileZone": return "Equivalent profile zone";
            case "equalBilateralProfile": return "Equal-bilateral profile";
            case "zone": return "Profile zone";
            case "tierZones": return "Tier zones";
            case "toleranceSource": return "Tolerance from";
            case "ktAtMin": return "Kt at smallest radius";
            case "ktAtMax": return "Kt at largest radius";
            case "kfAtMin": return "Kf at smallest radius";
            case "kfAtMax": return "Kf at largest radius";
            case "stressMethod": return "Stress figures from";
            case "targetKt": return "Kt target";
            case "targetKf": return "Kf target";
            case "minRadiusForTarget": return "Smallest radius for the target";
            case "seats": return "Seats on the mating corner";
            case "seatingMargin": return "Seating margin";
            case "largestSeatingRadius": return "Largest radius that seats";
            default: return spelled(key);
        }
    }

    private static String value(String key, Object v, DrawingStyle style, Units units, String u) {
        if (v instanceof Boolean) return (Boolean) v ? "yes" : "no";
        if (v instanceof List) {
            List<String> parts = new ArrayList<>();
            for (Object o : (List<?>) v) parts.add(value(key, o, style, units, ""));
            return String.join(" / ", parts) + (isLength(key) ? u : "");
        }
        if (!(v instanceof Number)) return String.valueOf(v);
        double d = ((Number) v).doubleValue();
        if (!Double.isFinite(d)) return "none";
        if (key.equals("angle")) return Numbers.trim(d) + "°";
        if (key.startsWith("kt") || key.startsWith("kf") || key.startsWith("target")) {
            return DrawingStyle.formatFigure(d, 2);
        }
        if (isLength(key)) return style.formatValue(d, units, LENGTH_PLACES) + u;
        return Numbers.trim(Math.round(d * 1e4) / 1e4);
    }

    private static boolean isLength(String key) {
        switch (key) {
            case "nominal": case "min": case "max": case "band": case "crescentWidth": case "equivalentProfileZone":
            case "equalBilateralProfile": case "zone": case "tierZones": case "minRadiusForTarget": case "seatingMargin":
            case "largestSeatingRadius":
                return true;
            default:
                return false;
        }
    }

    private static Units unitsOf(Object symbol) {
        if (symbol == null) return Units.MM;
        try {
            return Units.parse(String.valueOf(symbol));
        } catch (RuntimeException e) {
            return Units.MM;
        }
    }

    private static String spelled(String key) {
        StringBuilder sb = new StringBuilder();
        for (char ch : key.toCharArray()) {
            if (Character.isUpperCase(ch)) sb.append(' ').append(Character.toLowerCase(ch)); else sb.append(ch);
        }
        return sb.length() == 0 ? key : Character.toUpperCase(sb.charAt(0)) + sb.substring(1);
    }
}
