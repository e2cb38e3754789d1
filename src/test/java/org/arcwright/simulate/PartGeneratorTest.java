package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;

/**
 * The measured section follows the true geometry: checked by plane geometry worked by hand for a
 * 90° fillet at the origin with legs along +x and +y (centre of a blend of radius r at (r, r)).
 */
class PartGeneratorTest {
    private static final ProcessModel PLAIN = new ProcessModel(Units.MM, Models.FILLET_90, 2.0,
            new ProcessModel.Scatter(2.0, 0), 0, null, null, 0, 101);

    private static PartGenerator.Scan measure(Part p) {
        PartGenerator g = new PartGenerator(PLAIN);
        PartGenerator.Scan s = g.newScan();
        g.measure(p, () -> 0, s);
        return s;
    }

    @Test
    void perfectBlendPointsLieOnTheArcOrOnTheLegs() {
        PartGenerator.Scan s = measure(new Part(0, 2.1, 0, 0, Double.NaN, Double.NaN, 0, false));
        for (int i = 0; i < s.size(); i++) {
            double x = s.xs()[i], y = s.ys()[i];
            double d = x >= 2.1 && y <= 1e-12 ? Math.abs(y) : y >= 2.1 && x <= 1e-12 ? Math.abs(x)
                    : Math.abs(Math.hypot(x - 2.1, y - 2.1) - 2.1);
            assertThat(d).as("point %d [%s, %s]", i, x, y).isLessThan(1e-12);
        }
        assertThat(s.xs()[0]).isCloseTo(3.0, within(1e-12)); // 1.5 × the nominal tangent distance 2
        assertThat(s.ys()[s.size() - 1]).isCloseTo(3.0, within(1e-12));
    }

    @Test
    void flatOverTheMiddleFifthSitsOnItsChord() {
        // chord between the arc points at 45° ± 9° of the sweep from leg A (angles 270° + 36° .. 270° + 54°)
        PartGenerator.Scan s = measure(new Part(0, 2.0, 0, 0, 0.4, 0.6, 0, false));
        double mid = Math.hypot(s.xs()[50] - 2, s.ys()[50] - 2);
        assertThat(mid).as("the middle point lies on the chord, a sagitta inside the arc")
                .isCloseTo(2 * Math.cos(Math.toRadians(9)), within(1e-9));
    }

    @Test
    void stepAtLegBLeavesTheArcOffThatSurface() {
        // arc tangent to x = 0.02 and y = 0: centre (2.02, 2); it ends at (0.02, 2), a wall joins (0, 2)
        PartGenerator.Scan s = measure(new Part(0, 2.0, 0, 0, Double.NaN, Double.NaN, 0.02, true));
        int onLegB = 0;
        for (int i = 0; i < s.size(); i++) {
            double x = s.xs()[i], y = s.ys()[i];
            if (y > 2 + 1e-9) {
                assertThat(x).as("beyond the wall the section runs on leg B").isCloseTo(0, within(1e-12));
                onLegB++;
            } else if (y > 1e-9) {
                assertThat(Math.hypot(x - 2.02, y - 2)).isCloseTo(2, within(1e-12));
            }
        }
        assertThat(onLegB).isPositive();
    }
}
