package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.arcwright.templates.CalloutText;
import org.arcwright.templates.Figures;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * The figures behind a recommendation as labelled, formatted rows for its card. The labels and the
 * formatting are the ones the drawing notes and sheets use ({@link Figures}: lengths in the drawing
 * style's decimals with units, factors to two places), so a card and a sheet never disagree; the
 * card only joins the two limits into one row written to the same places, as limit dimensioning does.
 */
public final class CardFigures {
    private CardFigures() {}

    /** One row of the card's figure grid. */
    public record Figure(String label, String value) {}

    /** The rows for {@code numbers} (a recommendation's map): the limits first, then the rest in its order. */
    public static List<Figure> of(Map<String, Object> numbers, DrawingStyle style) {
        Units units = unitsOf(numbers.get("units"));
        CalloutText text = new CalloutText(style, units);
        List<Figure> rows = new ArrayList<>();
        Map<String, Object> rest = new LinkedHashMap<>(numbers);
        Object min = numbers.get("min");
        Object max = numbers.get("max");
        if (min instanceof Number && max instanceof Number) {
            String[] pair = text.limits(((Number) min).doubleValue(), ((Number) max).doubleValue());
            rows.add(new Figure("Limits", pair[0] + " to " + pair[1] + " " + units.symbol()));
            rest.remove("min");
            rest.remove("max");
        }
        for (Figures.Figure f : Figures.of(rest, text)) rows.add(new Figure(capitalised(f.label()), f.value()));
        return List.copyOf(rows);
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : s.substring(0, 1).toUpperCase(Locale.ROOT) + s.substring(1);
    }

    private static Units unitsOf(Object symbol) {
        if (symbol == null) return Units.MM;
        try {
            return Units.parse(String.valueOf(symbol));
        } catch (RuntimeException e) {
            return Units.MM;
        }
    }
}
