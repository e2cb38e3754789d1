package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/** Properties of Neuber's notch sensitivity over strength, radius and load. */
class NotchSensitivityProperties {
    private final NotchSensitivity ns = new NotchSensitivity();

    /** Neuber: 0 < q < 1, q grows with the radius, so K_f lies between 1 and K_t. */
    @Property(tries = 200, seed = "20261201")
    void sensitivityLiesBetweenZeroAndOneAndGrowsWithRadius(
            @ForAll @DoubleRange(min = 350, max = 1700) double sutMpa,
            @ForAll @DoubleRange(min = 0.05, max = 10) double r,
            @ForAll boolean torsion) {
        LoadCase load = torsion ? LoadCase.TORSION : LoadCase.BENDING;
        double q = ns.at(UltimateStrength.ofMpa(sutMpa), load, r).q();
        double qLarger = ns.at(UltimateStrength.ofMpa(sutMpa), load, r * 1.1).q();
        assertThat(q).isGreaterThan(0.0).isLessThanOrEqualTo(1.0);
        assertThat(qLarger).isGreaterThanOrEqualTo(q);
        assertThat(ns.kf(2.5, q)).isBetween(1.0, 2.5);
    }
}
