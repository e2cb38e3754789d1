package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.tolerance.DrawingStyle;
import org.junit.jupiter.api.Test;

class CardFiguresTest {
    private static Map<String, String> rows(List<CardFigures.Figure> figures) {
        Map<String, String> m = new LinkedHashMap<>();
        for (CardFigures.Figure f : figures) m.put(f.label(), f.value());
        return m;
    }

    @Test
    void limitsComeFirstAsAPairWithTheSamePlacesAndUnits() {
        Map<String, Object> n = new LinkedHashMap<>();
        n.put("units", "mm");
        n.put("nominal", 3.48);
        n.put("min", 3.48);
        n.put("max", 3.5);
        n.put("band", 0.02);
        n.put("crescentWidth", 0.0083);
        n.put("ktAtMin", 1.66781);
        n.put("targetKf", 1.6);
        n.put("minRadiusForTarget", 3.4789);
        n.put("adjusted", true);
        n.put("seats", false);
        List<CardFigures.Figure> figures = CardFigures.of(n, DrawingStyle.ISO);
        // limit dimensioning writes both limits to the same places (ISO 129-1, from memory)
        assertThat(figures.get(0)).isEqualTo(new CardFigures.Figure("Limits", "3.48 to 3.50 mm"));
        Map<String, String> m = rows(figures);
        assertThat(m).containsEntry("Size band", "0.02 mm").containsEntry("Crescent width", "0.0083 mm")
                .containsEntry("Kt at the smallest radius", "1.67").containsEntry("Largest acceptable Kf", "1.60")
                .containsEntry("Smallest radius meeting the target", "3.4789 mm")
                .containsEntry("Mating part seats", "no").containsEntry("Limits adjusted by the checks", "yes")
                .doesNotContainKeys("Units", "Smallest radius", "Largest radius");
    }

    @Test
    void inchFiguresFollowTheAsmeInchConventionAndUnknownKeysAreSpelledOut() {
        Map<String, Object> n = new LinkedHashMap<>();
        n.put("units", "in");
        n.put("band", 0.004);
        n.put("someNewFigure", 2.5);
        Map<String, String> m = rows(CardFigures.of(n, DrawingStyle.ASME));
        // ASME Y14.5-2018 inch tolerances: no zero before the point (from memory)
        assertThat(m).containsEntry("Size band", ".004 in").containsEntry("Some new figure", "2.500 in");
    }
}
