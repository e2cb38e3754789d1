package org.arcwright.inspect;

import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;

/** Synthetic measured sections for tests (fixed seeds; invented, not measured data). */
final class Sections {
    private Sections() {}

    static final Corner SQUARE = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.ROUND);

    /**
     * Leg A from 3r to the tangent point, the blend of radius {@code r} (with {@code shape} adding a
     * radial deviation as a function of the blend fraction 0..1), then leg B; noise σ.
     */
    static PointSet section(Corner c, double r, int perLeg, int onArc, double noise, long seed,
                            DoubleUnaryOperator shape) {
        Random rnd = new Random(seed);
        int n = 2 * perLeg + onArc;
        double[] xs = new double[n], ys = new double[n];
        int k = 0;
        double t = c.tangentDistance(r);
        Point2 na = c.inwardNormalA(), nb = c.inwardNormalB();
        for (int i = 0; i < perLeg; i++) {
            double d = 3 * t - 2 * t * i / perLeg;
            double e = noise * rnd.nextGaussian();
            xs[k] = c.vertex().x() + c.legA().x() * d + na.x() * e;
            ys[k++] = c.vertex().y() + c.legA().y() * d + na.y() * e;
        }
        Point2 ctr = c.centre(r), ta = c.tangentA(r), tb = c.tangentB(r);
        double s = Math.atan2(ta.y() - ctr.y(), ta.x() - ctr.x()), e0 = Math.atan2(tb.y() - ctr.y(), tb.x() - ctr.x());
        double sweep = Math.IEEEremainder(e0 - s, 2 * Math.PI);
        for (int i = 0; i < onArc; i++) {
            double f = (i + 0.5) / onArc;
            double a = s + sweep * f;
            double rr = r + shape.applyAsDouble(f) + noise * rnd.nextGaussian();
            xs[k] = ctr.x() + rr * Math.cos(a);
            ys[k++] = ctr.y() + rr * Math.sin(a);
        }
        for (int i = 0; i < perLeg; i++) {
            double d = t + 2 * t * (i + 1) / perLeg;
            double e = noise * rnd.nextGaussian();
            xs[k] = c.vertex().x() + c.legB().x() * d + nb.x() * e;
            ys[k++] = c.vertex().y() + c.legB().y() * d + nb.y() * e;
        }
        return new PointSet(xs, ys, n, "test");
    }

    static InspectionRequest request(Corner c, double r, InspectionCallout callout, PointSet pts) {
        return new InspectionRequest(Units.MM, new Nominal.CornerBlend(c, r), callout, pts, 1e-6, Double.NaN, false);
    }
}
