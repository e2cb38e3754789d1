package org.arcwright.templates;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

class FiguresTest {

    @Test
    void advisorNumbersGetTheTradesWordsAndTheirUnits() {
        Map<String, Object> n = new LinkedHashMap<>();
        n.put("units", "mm");
        n.put("min", 1.8);
        n.put("crescentWidth", 0.16568542);
        n.put("ktAtMin", 1.8634);
        n.put("seatingMargin", 0.1);
        n.put("seats", true);
        n.put("angle", 90.0);
        n.put("tierZones", List.of(0.5, 0.1));
        n.put("somethingNew", 0.25);
        List<Figures.Figure> f = Figures.of(n, new CalloutText(DrawingStyle.ASME, Units.MM));
        assertThat(f).extracting(Figures.Figure::label).containsExactly("smallest radius", "crescent width",
                "Kt at the smallest radius", "seating margin", "mating part seats", "included angle", "tier zones",
                "something new");
        assertThat(f).extracting(Figures.Figure::value).containsExactly("1.8 mm", "0.1657 mm", "1.86", "0.1 mm", "yes",
                "90°", "0.5 mm, 0.1 mm", "0.25 mm");
    }

    @Test
    void inchFiguresFollowTheAsmeInchRules() {
        List<Figures.Figure> f = Figures.of(Map.of("seatingMargin", 0.004), new CalloutText(DrawingStyle.ASME, Units.INCH));
        assertThat(f.get(0).value()).isEqualTo(".004 in");
    }
}
