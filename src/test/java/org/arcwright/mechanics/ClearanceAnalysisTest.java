package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Whether the largest fillet lets a mating part seat flush against the shoulder. */
class ClearanceAnalysisTest {
    private final ClearanceAnalysis analysis =
            new ClearanceAnalysis(BearingSeatTable.load(PackStack.builtIn(), BearingSeatTable.BUILT_IN_ID),
                    BearingChamferLimits.load(PackStack.builtIn(), BearingChamferLimits.BUILT_IN_ID));

    private CornerClearance check(double rMin, double rMax, MatingCorner corner) {
        return analysis.check(new ClearanceCase(Units.MM, rMin, rMax, corner, null, 0, null));
    }

    @Test
    void equalLegChamferAdmitsAFilletUpToItsLeg() {
        CornerClearance ok = check(0.8, 1.0, new MatingCorner.Chamfer(1.0, 45));
        assertThat(ok.seats()).isTrue();
        assertThat(ok.margin()).isCloseTo(0, within(1e-12));
        CornerClearance bad = check(0.8, 1.1, new MatingCorner.Chamfer(1.0, 45));
        assertThat(bad.seats()).isFalse();
        assertThat(bad.margin()).isCloseTo(-0.1, within(1e-12));
    }

    @Test
    void shallowChamferIsLimitedByItsShortLegUpTheShoulder() {
        CornerClearance c = check(0.5, 0.8, new MatingCorner.Chamfer(1.5, 30));
        // 1.5 × tan 30° = 0.866
        assertThat(c.reliefAlongShoulder()).isCloseTo(0.8660, within(1e-4));
        assertThat(c.allowedFilletMax()).isCloseTo(0.8660, within(1e-4));
        assertThat(c.governing()).contains("up the shoulder");
        assertThat(c.seats()).isTrue();
    }

    @Test
    void mating_radius_must_be_at_least_the_fillet_maximum() {
        assertThat(check(1.2, 1.5, new MatingCorner.Radius(1.5)).seats()).isTrue();
        CornerClearance bad = check(1.2, 1.6, new MatingCorner.Radius(1.5));
        assertThat(bad.seats()).isFalse();
        assertThat(bad.margin()).isCloseTo(-0.1, within(1e-12));
    }

    /** Bearing seat table (makers' catalogues, consistent with ISO 582; from memory): 1.5 -> 1.5, 2.1 -> 2, 3 -> 2.5. */
    @ParameterizedTest(name = "r_s min {0} -> fillet max {1}")
    @CsvSource({"1.5, 1.5", "2.1, 2", "3, 2.5", "1.1, 1", "0.3, 0.3", "7.5, 6"})
    void bearingSeatAdmitsTheTabulatedFillet(double chamferMin, double filletMax) {
        CornerClearance c = check(0.5 * filletMax, filletMax, new MatingCorner.Bearing(chamferMin));
        assertThat(c.allowedFilletMax()).isEqualTo(filletMax);
        assertThat(c.seats()).isTrue();
        assertThat(check(0.5 * filletMax, filletMax + 0.1, new MatingCorner.Bearing(chamferMin)).seats()).isFalse();
    }

    @Test
    void bearingInInchUnitsConvertsTheTableFromMillimetres() {
        CornerClearance c = analysis.check(new ClearanceCase(Units.INCH, 0.05, 0.075, new MatingCorner.Bearing(2.1), null, 0, null));
        assertThat(c.allowedFilletMax()).isCloseTo(2.0 / 25.4, within(1e-12));
        assertThat(c.seats()).isTrue();
    }

    @Test
    void unlistedBearingChamferUsesTheNextSmallerRowAndSaysSo() {
        CornerClearance c = check(0.5, 1.0, new MatingCorner.Bearing(1.8));
        assertThat(c.allowedFilletMax()).isEqualTo(1.5);
        assertThat(c.notes()).anyMatch(n -> n.contains("not a listed chamfer dimension"));
    }

    @Test
    void shoulderSupportIsTheFaceAboveTheFilletAndTheRelief() {
        CornerClearance c = analysis.check(new ClearanceCase(Units.MM, 0.6, 0.8, new MatingCorner.Chamfer(1.0, 45),
                4.0, 0.5, 3.0));
        assertThat(c.support().contactFrom()).isCloseTo(1.0, within(1e-12));
        assertThat(c.support().contactTo()).isEqualTo(3.5);
        assertThat(c.support().flat()).isCloseTo(2.5, within(1e-12));
        assertThat(c.support().sufficient()).isFalse();
        assertThat(c.seats()).isTrue();
        assertThat(c.passes()).isFalse();
    }

    @Test
    void rejectsBadCorners() {
        assertThatThrownBy(() -> new MatingCorner.Chamfer(1, 90)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("mating.angle");
        assertThatThrownBy(() -> new MatingCorner.Radius(-1)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("mating.rMin");
        assertThatThrownBy(() -> check(1.2, 1.0, new MatingCorner.Radius(2))).isInstanceOf(InputProblem.class)
                .hasMessageContaining("fillet.rMin").hasMessageEndingWith("rMin = 1.2 exceeds rMax = 1"); // as typed, not 1.0
        assertThatThrownBy(() -> check(0.01, 0.02, new MatingCorner.Bearing(0.01))).isInstanceOf(InputProblem.class)
                .hasMessageContaining("below the table's smallest");
    }

    /**
     * ISO 582 r_s max for r_s min 1.1 (from memory, as reprinted in makers' catalogues): 2.0 radial for
     * bores up to 120 mm, 2.5 above. The ring's face starts beyond r_s max, so with a 3.0 shoulder less a
     * 0.3 edge break the flat is 2.7 − 2.0 = 0.7 mm (worked by hand), not the 1.6 measured from r_s min.
     */
    @Test
    void bearingSupportStartsBeyondTheRingsLargestChamfer() {
        CornerClearance c = analysis.check(new ClearanceCase(Units.MM, 0.9, 1.0, new MatingCorner.Bearing(1.1, 32.0), 3.0, 0.3, 1.5));
        assertThat(c.seats()).isTrue();
        assertThat(c.support().contactFrom()).isEqualTo(2.0);
        assertThat(c.support().flat()).isCloseTo(0.7, within(1e-12));
        assertThat(c.support().sufficient()).isFalse();
        assertThat(c.passes()).isFalse();
        assertThat(c.notes()).anySatisfy(n -> assertThat(n).contains("row used: r_s min 1.1 mm, bore up to 120 mm: r_s max 2 mm radial"));
    }

    @Test
    void inchBearingSupportIsTheSameSeatInInches() {
        // Inch twin: every length / 25.4; 0.0433 in is 1.1 mm written to four places.
        CornerClearance c = analysis.check(new ClearanceCase(Units.INCH, 0.9 / 25.4, 1.0 / 25.4,
                new MatingCorner.Bearing(0.0433 * 25.4, 32.0), 3.0 / 25.4, 0.3 / 25.4, 1.5 / 25.4));
        assertThat(c.allowedFilletMax()).isCloseTo(1.0 / 25.4, within(1e-12));
        assertThat(c.support().flat()).isCloseTo(0.7 / 25.4, within(1e-12));
        assertThat(c.passes()).isFalse();
    }

    @ParameterizedTest(name = "r_s min {0}, bore {1} -> r_s max {2} radial, {3} axial")
    @CsvSource({"1.1, 32, 2, 3.5", "1.1, 120, 2, 3.5", "1.1, 150, 2.5, 4", "0.6, 40, 1, 2", "0.6, 45, 1.3, 2",
            "2, 100, 3.5, 5", "0.3, 10, 0.6, 1"})
    void chamferLimitRowFollowsTheBore(double chamferMin, double bore, double radial, double axial) {
        // ISO 582 chamfer limits for radial bearings (from memory, as reprinted in makers' catalogues).
        BearingChamferLimits t = BearingChamferLimits.load(PackStack.builtIn(), BearingChamferLimits.BUILT_IN_ID);
        BearingChamferLimits.Row r = t.lookup(chamferMin, bore).row();
        assertThat(r.radialMax()).isEqualTo(radial);
        assertThat(r.axialMax()).isEqualTo(axial);
    }

    @Test
    void withoutABoreTheWorstRowIsUsedAndSaidSo() {
        BearingChamferLimits t = BearingChamferLimits.load(PackStack.builtIn(), BearingChamferLimits.BUILT_IN_ID);
        BearingChamferLimits.Lookup l = t.lookup(1.1, null);
        assertThat(l.row().radialMax()).isEqualTo(2.5);
        assertThat(l.note()).contains("No bore given");
        assertThat(t.source()).doesNotContain("memory");
    }
}
