package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.Units;

/** Properties of the seating check, against an independent sampled construction. */
class ClearanceAnalysisProperties {
    private final ClearanceAnalysis analysis =
            new ClearanceAnalysis(BearingSeatTable.load(PackStack.builtIn(), BearingSeatTable.BUILT_IN_ID),
                    BearingChamferLimits.load(PackStack.builtIn(), BearingChamferLimits.BUILT_IN_ID));

    private CornerClearance check(double rMin, double rMax, MatingCorner corner) {
        return analysis.check(new ClearanceCase(Units.MM, rMin, rMax, corner, null, 0, null));
    }

    /**
     * Independent check of the derived condition: sample the fillet's material (the corner square
     * outside the fillet circle) and test each point against the chamfer's relief triangle. The part
     * seats exactly when no sample lies outside.
     */
    @Property(tries = 400, seed = "20261201")
    void seatsExactlyWhenEveryPointOfTheFilletLiesInTheChamferRelief(
            @ForAll @DoubleRange(min = 0.2, max = 3) double leg,
            @ForAll @DoubleRange(min = 10, max = 80) double angle,
            @ForAll @DoubleRange(min = 0.1, max = 3) double rMax) {
        MatingCorner.Chamfer ch = new MatingCorner.Chamfer(leg, angle);
        CornerClearance c = check(rMax, rMax, ch);
        Assume.that(Math.abs(c.margin()) > 0.01 * rMax);
        double a = ch.alongSeat();
        double b = ch.alongShoulder();
        boolean allInside = true;
        int n = 120;
        for (int i = 0; i <= n && allInside; i++) {
            for (int j = 0; j <= n; j++) {
                double x = -rMax + rMax * i / n; // along the seat, corner at 0
                double y = rMax * j / n;         // up the shoulder
                boolean material = (x + rMax) * (x + rMax) + (y - rMax) * (y - rMax) >= rMax * rMax;
                if (material && -x / a + y / b > 1 + 1e-9) {
                    allInside = false;
                    break;
                }
            }
        }
        assertThat(c.seats()).isEqualTo(allInside);
    }
}
