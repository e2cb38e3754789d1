package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Neuber/Shigley notch sensitivity against Shigley's worked example. */
class NotchSensitivityTest {
    private final NotchSensitivity ns = new NotchSensitivity();

    /**
     * Shigley's Mechanical Engineering Design, 9th ed., Example 6-6 (from memory): S_ut = 690 MPa
     * (100 kpsi), bending, r = 3 mm: √a = 0.0622 √in = 0.313 √mm, q = 0.847, and with K_t = 1.65,
     * K_f = 1.55.
     */
    @Test
    void matchesShigleysExampleSixSix() {
        NotchSensitivity.Sensitivity s = ns.at(UltimateStrength.ofMpa(690), LoadCase.BENDING, 3.0);
        assertThat(s.constant().sqrtAinch()).isCloseTo(0.0622, within(0.0005));
        assertThat(s.constant().sqrtAmm()).isCloseTo(0.313, within(0.002));
        assertThat(s.q()).isCloseTo(0.847, within(0.002));
        assertThat(ns.kf(1.65, s.q())).isCloseTo(1.55, within(0.005));
        assertThat(s.constant().withinFit()).isTrue();
    }

    /** The torsion fit gives a smaller √a (a more notch-sensitive material in shear), Shigley eq. 6-35b. */
    @Test
    void torsionConstantAt100KsiFollowsTheShearFit() {
        NotchSensitivity.NeuberConstant a = ns.neuberConstant(UltimateStrength.ofKsi(100), LoadCase.TORSION);
        // 0.190 - 0.251 + 0.135 - 0.0267 = 0.0473 √in
        assertThat(a.sqrtAinch()).isCloseTo(0.0473, within(1e-4));
    }

    @Test
    void strengthOutsideTheFitIsClampedAndFlagged() {
        NotchSensitivity.NeuberConstant weak = ns.neuberConstant(UltimateStrength.ofMpa(250), LoadCase.BENDING);
        assertThat(weak.withinFit()).isFalse();
        assertThat(weak.strengthUsedKsi()).isEqualTo(50);
        assertThat(weak.message()).contains("outside the fit's range 50..250 ksi");
        NotchSensitivity.NeuberConstant strong = ns.neuberConstant(UltimateStrength.ofKsi(300), LoadCase.BENDING);
        assertThat(strong.strengthUsedKsi()).isEqualTo(250);
        assertThat(strong.withinFit()).isFalse();
    }

    /** Regression fixture: the torsion cubic of Shigley eq. 6-35b is negative at 240 ksi; q must not exceed 1. */
    @Test
    void torsionFitGoingNegativeAtHighStrengthGivesQOfOneAndAFlag() {
        NotchSensitivity.NeuberConstant a = ns.neuberConstant(UltimateStrength.ofKsi(240), LoadCase.TORSION);
        assertThat(a.sqrtAinch()).isZero();
        assertThat(a.withinFit()).isFalse();
        assertThat(a.message()).contains("q is taken as 1");
        assertThat(ns.at(UltimateStrength.ofKsi(240), LoadCase.TORSION, 1.0).q()).isEqualTo(1.0);
        assertThat(ns.neuberConstant(UltimateStrength.ofKsi(230), LoadCase.TORSION).withinFit()).isTrue();
    }

    @Test
    void inchRadiiGiveTheSameSensitivityAsTheirMillimetres() {
        double qMm = ns.at(UltimateStrength.ofKsi(120), LoadCase.BENDING, 2.54).q();
        // r = 0.1 in: q = 1 / (1 + √a[√in] / √0.1)
        double sqrtA = ns.neuberConstant(UltimateStrength.ofKsi(120), LoadCase.BENDING).sqrtAinch();
        assertThat(qMm).isCloseTo(1 / (1 + sqrtA / Math.sqrt(0.1)), within(1e-12));
    }
}
