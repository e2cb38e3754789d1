package org.arcwright.zone;

import static org.arcwright.zone.CornerAndZonesTest.arc;
import static org.arcwright.zone.CornerAndZonesTest.corner;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.arcwright.model.BlendKind;

/** Invariants of corners, blends and zones over random angles and radii (jqwik, apart from the JUnit tests so each engine reports its own). */
class CornerAndZonesProperties {
    @Property(tries = 200, seed = "42")
    void everyPointOfATangentArcLiesOnTheBlendOfThatRadius(@ForAll @DoubleRange(min = 20, max = 160) double angle,
                                                           @ForAll @DoubleRange(min = 0, max = 360) double turn,
                                                           @ForAll @DoubleRange(min = 0.01, max = 50) double r) {
        // Analytic: a point on the arc of radius r tangent to both legs lies on the blend of radius r.
        Corner c = corner(angle, turn, BlendKind.ROUND);
        double[][] p = arc(c, r, 9);
        for (int i = 1; i < 8; i++) assertThat(c.blendRadiusThrough(p[0][i], p[1][i])).isCloseTo(r, within(1e-9 * r));
    }

    @Property(tries = 100, seed = "7")
    void exactTangentArcHasEnvelopeSmallestEqualLargestEqualItsRadius(@ForAll @DoubleRange(min = 30, max = 150) double angle,
                                                                    @ForAll @DoubleRange(min = 0, max = 360) double turn,
                                                                    @ForAll @DoubleRange(min = 0.1, max = 10) double r) {
        // Analytic: an exact arc of radius r tangent to both legs: smallest = largest = r.
        for (BlendKind kind : BlendKind.values()) {
            Corner c = corner(angle, turn, kind);
            double[][] p = arc(c, r, 101);
            RadiusEnvelope e = new RadiusZone(c, 0.8 * r, 1.2 * r, 1e-6).evaluate(p[0], p[1], 101);
            assertThat(e.smallest()).isCloseTo(r, within(1e-9 * r));
            assertThat(e.largest()).isCloseTo(r, within(1e-9 * r));
            assertThat(e.pass()).isTrue();
        }
    }

    @Property(tries = 300, seed = "5")
    void movingAPointOfTheNominalAlongItsAirNormalDeviatesByTheDistanceMoved(
            @ForAll @DoubleRange(min = 30, max = 150) double angle, @ForAll @DoubleRange(min = 0, max = 360) double turn,
            @ForAll @DoubleRange(min = 0.05, max = 0.95) double where, @ForAll @DoubleRange(min = -0.4, max = 0.4) double delta,
            @ForAll boolean fillet) {
        // Definition of the signed deviation (common practice): distance to the nominal, positive toward air.
        Corner c = corner(angle, turn, fillet ? BlendKind.FILLET : BlendKind.ROUND);
        Contour nominal = c.contour(1, 6);
        double[] out = new double[4], w = new double[6];
        // a point of the nominal at the given fraction of its length, and its normal toward air
        double target = where * nominal.length();
        double lo = 0;
        Point2 p = null;
        for (Segment s : nominal.segments()) {
            if (target <= lo + s.length()) {
                double t = (target - lo) / s.length();
                if (s instanceof Segment.Arc a) {
                    double ang = a.startAngle() + a.sweep() * t;
                    p = new Point2(a.centre().x() + Math.cos(ang), a.centre().y() + Math.sin(ang));
                } else {
                    p = s.start().plus(s.end().minus(s.start()).times(t));
                }
                break;
            }
            lo += s.length();
        }
        nominal.measure(p.x(), p.y(), out, w);
        assertThat(out[0]).isCloseTo(0, within(1e-9));
        assertThat(out[3]).isCloseTo(target, within(1e-9));
        double nx = out[1], ny = out[2];
        nominal.measure(p.x() + delta * nx, p.y() + delta * ny, out, w);
        assertThat(out[0]).isCloseTo(delta, within(1e-9));
    }
}
