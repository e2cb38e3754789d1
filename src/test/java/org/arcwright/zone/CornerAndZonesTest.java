package org.arcwright.zone;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.arcwright.io.InputProblem;
import org.arcwright.model.BlendKind;
import org.junit.jupiter.api.Test;

class CornerAndZonesTest {

    static Corner corner(double angleDeg, double turnDeg, BlendKind kind) {
        double t = Math.toRadians(turnDeg), a = Math.toRadians(angleDeg);
        return new Corner(new Point2(1.5, -2), new Point2(Math.cos(t), Math.sin(t)),
                new Point2(Math.cos(t + a), Math.sin(t + a)), kind);
    }

    /** Points on the blend of radius r, from tangent point to tangent point. */
    static double[][] arc(Corner c, double r, int n) {
        Point2 ctr = c.centre(r), ta = c.tangentA(r), tb = c.tangentB(r);
        double s = Math.atan2(ta.y() - ctr.y(), ta.x() - ctr.x()), e = Math.atan2(tb.y() - ctr.y(), tb.x() - ctr.x());
        double sweep = Math.IEEEremainder(e - s, 2 * Math.PI);
        double[] xs = new double[n], ys = new double[n];
        for (int i = 0; i < n; i++) {
            double t = s + sweep * i / (n - 1);
            xs[i] = ctr.x() + r * Math.cos(t);
            ys[i] = ctr.y() + r * Math.sin(t);
        }
        return new double[][] {xs, ys};
    }

    /**
     * A perfect R2 blend between R1.9 and R2.1, with one point as a scan with 1 µm noise measured it:
     * 0.12 µm on the material side of leg b, 0.011 before the R1.9 arc's tangent point, where the
     * zone is thinner than the resolution. Within the resolution (5 µm) of where it lies, the point
     * lies on every arc up to about R2.03 (plane geometry: the blend through the point moved 5 µm off
     * the leg), so the part conforms. It was failed: read only as on the leg, the point allowed radii
     * up to 1.889 alone.
     */
    @Test
    void aPointWithinTheResolutionOfALegAllowsEveryArcPassingWithinTheResolutionOfIt() {
        Corner c = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.FILLET);
        double[][] p = arc(c, 2, 41);
        double[] xs = Arrays.copyOf(p[0], 42), ys = Arrays.copyOf(p[1], 42);
        xs[41] = -0.000124;
        ys[41] = 1.889;
        RadiusZone zone = new RadiusZone(c, 1.9, 2.1, 0.005);
        RadiusEnvelope e = zone.evaluate(xs, ys, 42);
        assertThat(e.pass()).isTrue();
        // the largest radius the point allows: the blend through (0.005 - 0.000124, 1.889), by hand
        double d = 0.005 - 0.000124, t = 1.889;
        RadiusEnvelope alone = zone.evaluate(new double[] {-0.000124}, new double[] {1.889}, 1);
        assertThat(alone.smallest()).isCloseTo(d + t + Math.sqrt(2 * d * t), within(1e-9));
        assertThat(zone.excess(-0.000124, 1.889)).isNegative();
        assertThat(zone.decide(xs, ys, 42, 0, null)).isTrue();
        // a point beyond the leg by more than the resolution still lies beyond every contour
        xs[41] = -0.006;
        assertThat(zone.evaluate(xs, ys, 42).pass()).isFalse();
    }

    @Test
    void limitsOutsideTheEnvelopeFail() {
        Corner c = corner(90, 0, BlendKind.ROUND);
        double[][] p = arc(c, 2, 51);
        assertThat(new RadiusZone(c, 2.05, 2.5, 1e-6).evaluate(p[0], p[1], 51).pass()).isFalse();
        assertThat(new RadiusZone(c, 1.5, 1.95, 1e-6).evaluate(p[0], p[1], 51).pass()).isFalse();
    }

    @Test
    void pointOnALegAllowsEveryRadiusWhoseTangentPointIsBeyondIt() {
        // 90° corner: a point on leg A at 1.5 from the vertex lies on every contour with ρ·cot45° >= 1.5,
        // and within the resolution (1e-6) of the arcs up to the blend through (1.5, 1e-6):
        // ρ = t + d + √(2td) for a 90° corner (plane geometry), 1.5 + 0.0017
        Corner c = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.ROUND);
        RadiusEnvelope e = new RadiusZone(c, 1, 2, 1e-6).evaluate(new double[] {1.5}, new double[] {0}, 1);
        assertThat(e.largest()).isEqualTo(0);
        assertThat(e.smallest()).isCloseTo(1.5 + 1e-6 + Math.sqrt(2 * 1.5e-6), within(1e-12));
        assertThat(e.onLegs()).isEqualTo(1);
    }

    @Test
    void pointBeyondTheSharpCornerFailsEveryRadius() {
        Corner c = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.ROUND);
        RadiusEnvelope e = new RadiusZone(c, 0, 2, 1e-6).evaluate(new double[] {1, 0.5}, new double[] {-0.01, 0.5}, 2);
        assertThat(e.outside()).isEqualTo(1);
        assertThat(Double.isNaN(e.smallest())).isTrue();
        assertThat(e.pass()).isFalse();
    }

    @Test
    void noPointWithinTheExtentIsBadInput() {
        Corner c = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.ROUND);
        assertThatThrownBy(() -> new RadiusZone(c, 1, 2, 1e-6).evaluate(new double[] {5, 6}, new double[] {0, 0}, 2))
                .isInstanceOf(InputProblem.class).hasMessageContaining("extent");
    }

    @Test
    void parallelLegsAreBadInput() {
        assertThatThrownBy(() -> new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(-1, 0), BlendKind.ROUND))
                .isInstanceOf(InputProblem.class).hasMessageContaining("parallel");
        assertThatThrownBy(() -> new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(2, 0), BlendKind.FILLET))
                .isInstanceOf(InputProblem.class).hasMessageContaining("parallel");
    }

    @Test
    void deviationIsPositiveTowardAirForRoundsAndFillets() {
        // A round's material is inside the angle, so the air is outside the arc; a fillet's the reverse.
        Corner round = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.ROUND);
        Contour cr = round.contour(1, 10);
        double[] out = new double[4], w = new double[5];
        double k = 1 - Math.sqrt(0.5); // the arc crosses the bisector at (k, k)
        cr.measure(k - 0.01, k - 0.01, out, w);
        assertThat(out[0]).isCloseTo(0.01 * Math.sqrt(2), within(1e-12));
        cr.measure(5, -0.2, out, w);
        assertThat(out[0]).isCloseTo(0.2, within(1e-12));
        Contour cf = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.FILLET).contour(1, 10);
        cf.measure(k - 0.01, k - 0.01, out, w);
        assertThat(out[0]).isCloseTo(-0.01 * Math.sqrt(2), within(1e-12));
        cf.measure(5, 0.3, out, w);
        assertThat(out[0]).isCloseTo(0.3, within(1e-12));
    }

    @Test
    void isoOffsetAndAsmeOutwardDescribeTheSameZone() {
        // ASME Y14.5-2018 unequally disposed (outward portion) and ISO 1101:2017 UZ offset (from memory):
        // outward = offset + width/2.
        ProfileZone asme = new ProfileZone(0.2, 0.15);
        assertThat(asme.isoOffset()).isCloseTo(0.05, within(1e-15));
        assertThat(ProfileZone.isoOffset(0.2, 0.05)).isEqualTo(new ProfileZone(0.2, 0.15000000000000002));
        assertThat(ProfileZone.isoOffset(0.2, -0.1).outward()).isCloseTo(0, within(1e-15));
        assertThat(ProfileZone.bilateral(0.1).isoOffset()).isZero();
        assertThatThrownBy(() -> ProfileZone.isoOffset(0.2, 0.15)).isInstanceOf(InputProblem.class);
    }

    @Test
    void badValuesAreEchoedAsTyped() {
        // a message shows what the user typed, every digit and no more (DecimalText.exact): common practice
        Corner c = corner(90, 0, BlendKind.FILLET);
        assertThatThrownBy(() -> c.contour(-2.0, 10)).isInstanceOf(InputProblem.class)
                .hasMessageEndingWith("must be zero or more, got -2");
        assertThatThrownBy(() -> new RadiusZone(c, -1e-5, 2, 1e-6)).isInstanceOf(InputProblem.class)
                .hasMessageEndingWith("must be zero or more, got -0.00001");
        assertThatThrownBy(() -> new RadiusZone(c, 2.0, 1.0, 1e-6)).isInstanceOf(InputProblem.class)
                .hasMessageEndingWith("is smaller than min (1 < 2)");
        assertThatThrownBy(() -> new ProfileZone(0.1, 0.2)).isInstanceOf(InputProblem.class)
                .hasMessageEndingWith("must be between 0 and the zone (0.1), got 0.2");
        assertThatThrownBy(() -> ProfileZone.isoOffset(1e-4, 1.0)).isInstanceOf(InputProblem.class)
                .hasMessageEndingWith("must lie within ±half the zone (0.00005), got 1");
    }
}
