package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

/**
 * Invariants of the crescent for every disposition of the deviations: both positive, both negative,
 * unilateral either way, and bilateral. Geometry of tangent arcs (common practice): an arc of radius r
 * crosses the bisector r·k from the vertex, so every figure is a signed distance between two arcs.
 */
class CrescentDispositionProperties {

    record Disposition(double upper, double lower) {}

    @Provide
    Arbitrary<Disposition> dispositions() {
        Arbitrary<Double> dev = Arbitraries.doubles().between(0.001, 0.9).ofScale(4);
        return Arbitraries.oneOf(
                Combinators.combine(dev, dev).as((a, b) -> new Disposition(a + b, a)),      // both positive
                Combinators.combine(dev, dev).as((a, b) -> new Disposition(-a, -a - b)),    // both negative
                dev.map(a -> new Disposition(a, 0)),                                                        // +a/0
                dev.map(a -> new Disposition(0, -a)),                                                       // 0/-a
                Combinators.combine(dev, dev).as((a, b) -> new Disposition(a, -b)));        // bilateral
    }

    @Property(tries = 300, seed = "16")
    void everyFigureFollowsFromTheSignedOffsetsOfTheLimitArcs(@ForAll("dispositions") Disposition d,
                                                               @ForAll @DoubleRange(min = 2, max = 10) double nominal,
                                                               @ForAll @DoubleRange(min = 20, max = 170) double angle) {
        double rMin = nominal + d.lower();
        double rMax = nominal + d.upper();
        CrescentZone z = CrescentZone.of(rMin, nominal, rMax, angle);
        double k = 1 / Math.sin(Math.toRadians(angle) / 2) - 1;
        double eps = 1e-12 * nominal;
        assertThat(z.minArcOffset()).isCloseTo(d.lower() * k, within(eps));
        assertThat(z.maxArcOffset()).isCloseTo(d.upper() * k, within(eps));
        assertThat(z.width()).isCloseTo(z.maxArcOffset() - z.minArcOffset(), within(eps));
        // A zone of the crescent's width centred at the UZ offset holds exactly the crescent, for either blend.
        for (boolean fillet : new boolean[] {true, false}) {
            double centreAway = fillet ? z.isoOffset(true) : -z.isoOffset(false);
            assertThat(centreAway - z.width() / 2).isCloseTo(z.minArcOffset(), within(eps));
            assertThat(centreAway + z.width() / 2).isCloseTo(z.maxArcOffset(), within(eps));
        }
        // The equal-bilateral zone about the nominal reaches the farther limit arc and no further.
        assertThat(z.equalBilateralProfile() / 2).isCloseTo(Math.max(Math.abs(z.minArcOffset()), Math.abs(z.maxArcOffset())), within(eps));
        // The shortcut is twice the larger deviation, by its own definition.
        assertThat(z.shortcutProfile()).isCloseTo(2 * Math.max(Math.abs(d.upper()), Math.abs(d.lower())), within(eps));
        // Toward + away is the width; the nominal is held only when the deviations do not share a sign.
        assertThat(z.towardVertex() + z.awayFromVertex()).isCloseTo(z.width(), within(eps));
        assertThat(z.holdsNominal()).isEqualTo(d.upper() >= 0 && d.lower() <= 0);
        assertThat(z.outwardPortion(true).isPresent()).isEqualTo(z.holdsNominal());
    }
}
