package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.arcwright.mechanics.PetersonFit.Branch;
import org.arcwright.mechanics.PetersonFit.Coefficient;
import org.junit.jupiter.api.Test;

/** Pins the coefficients of Peterson's fits by the continuity of their branches. */
class PetersonFitsTest {
    private final PetersonFits fits = PetersonFits.published();

    @Test
    void catalogueHoldsShaftInThreeLoadsAndBarInTwo() {
        assertThat(fits.all()).hasSize(5);
        assertThat(fits.find(ShoulderShape.STEPPED_BAR, LoadCase.TORSION)).isEmpty();
    }

    /**
     * Both branches evaluated at h/r = 2 agree within 0.01 over 1.01 &lt;= D/d &lt;= 2 (2h/D up to 0.5),
     * the range the charts are drawn for (Pilkey, Peterson's SCF 3rd ed., ch. 3, from memory). A sign
     * flipped in any coefficient breaks this by far more.
     */
    @Test
    void branchesMeetAtTheirBoundaryWithinOneHundredth() {
        for (PetersonFit f : fits.all()) {
            for (int i = 1; i < f.branches().size(); i++) {
                Branch lower = f.branches().get(i - 1);
                Branch upper = f.branches().get(i);
                double x = lower.hrMax();
                for (double dd = 1.01; dd <= 2.0 + 1e-9; dd += 0.01) {
                    double t = 1 - 1 / dd;
                    assertThat(upper.kt(x, t)).as("%s at h/r=%s, D/d=%.2f", f.name(), x, dd)
                            .isCloseTo(lower.kt(x, t), within(0.01));
                }
            }
        }
    }

    /** Each coefficient itself is continuous at the boundary (within 0.05), not just their sum. */
    @Test
    void everyCoefficientIsNearlyContinuousAtTheBoundary() {
        for (PetersonFit f : fits.all()) {
            if (f.branches().size() < 2) continue;
            Branch lo = f.branches().get(0);
            Branch hi = f.branches().get(1);
            List<Coefficient> a = List.of(lo.c1(), lo.c2(), lo.c3(), lo.c4());
            List<Coefficient> b = List.of(hi.c1(), hi.c2(), hi.c3(), hi.c4());
            for (int k = 0; k < 4; k++) {
                assertThat(b.get(k).at(2.0)).as("%s C%d", f.name(), k + 1).isCloseTo(a.get(k).at(2.0), within(0.05));
            }
        }
    }

    /**
     * Regression fixture: copies of the shaft-bending fit in circulation carry C2 = -3.813 - 0.968√(h/r)
     * - 0.260 h/r in the upper branch. The continuity check catches that sign flip.
     */
    @Test
    void signFlippedUpperShaftBendingCoefficientFailsContinuity() {
        PetersonFit good = PetersonFits.shaftBending();
        Branch lo = good.branches().get(0);
        Branch up = good.branches().get(1);
        Branch flipped = new Branch(2.0, 20.0, up.c1(), new Coefficient(-3.813, -0.968, -0.260), up.c3(), up.c4());
        double t = 1 - 1 / 1.5;
        assertThat(Math.abs(flipped.kt(2.0, t) - lo.kt(2.0, t))).isGreaterThan(0.5);
        assertThat(Math.abs(up.kt(2.0, t) - lo.kt(2.0, t))).isLessThan(0.01);
    }

    /** Regression fixture: torsion copies with C4 = -1.061 + 0.171√(h/r) - 0.086 h/r miss Shigley's 1.5 badly. */
    @Test
    void signFlippedTorsionCoefficientMissesShigleysEstimate() {
        Branch b = PetersonFits.shaftTorsion().branches().get(0);
        Branch flipped = new Branch(0.25, 4.0, b.c1(), b.c2(), b.c3(), new Coefficient(-1.061, 0.171, -0.086));
        // D/d = 1.5, r/d = 0.1: h/r = 2.5, 2h/D = 1/3 (Shigley 10th ed. Table 7-1, well-rounded, torsion 1.5)
        double good = b.kt(2.5, 1.0 / 3);
        double bad = flipped.kt(2.5, 1.0 / 3);
        assertThat(good).isCloseTo(1.5, within(0.12 * 1.5));
        assertThat(bad).isLessThan(good);
    }
}
