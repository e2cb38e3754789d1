package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.util.Pair;
import org.arcwright.zone.Contour;

/**
 * The same problems solved by Apache Commons Math 3.6.1 (Maven Central), for tests and benchmarks
 * only: geometric circle fit by its Levenberg-Marquardt optimiser, minimum-zone circle and Chebyshev
 * registration as successive linear programmes solved by its {@code SimplexSolver}.
 */
public final class ReferenceSolvers {
    private ReferenceSolvers() {}

    /** Geometric least-squares circle {a, b, r} by Commons Math Levenberg-Marquardt. */
    public static double[] leastSquaresCircle(double[] xs, double[] ys, int n, double[] start) {
        MultivariateJacobianFunction model = p -> {
            double a = p.getEntry(0), b = p.getEntry(1), r = p.getEntry(2);
            double[] v = new double[n];
            double[][] j = new double[n][3];
            for (int i = 0; i < n; i++) {
                double dx = xs[i] - a, dy = ys[i] - b, d = Math.hypot(dx, dy);
                v[i] = d - r;
                j[i][0] = -dx / d;
                j[i][1] = -dy / d;
                j[i][2] = -1;
            }
            return new Pair<RealVector, RealMatrix>(new ArrayRealVector(v, false),
                    new Array2DRowRealMatrix(j, false));
        };
        LeastSquaresOptimizer.Optimum o = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-15).withParameterRelativeTolerance(1e-15).withOrthoTolerance(1e-15)
                .optimize(new LeastSquaresBuilder().start(start).model(model).target(new double[n])
                        .maxEvaluations(100_000).maxIterations(100_000).build());
        return o.getPoint().toArray();
    }

    /** Minimum-zone circle {cx, cy, inner, outer} by successive LPs solved with SimplexSolver. */
    public static double[] minimumZoneCircle(double[] xs, double[] ys, int n, double cx, double cy, double trust) {
        for (int pass = 0; pass < 100; pass++) {
            List<LinearConstraint> cons = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                double dx = xs[i] - cx, dy = ys[i] - cy, d = Math.hypot(dx, dy), ux = dx / d, uy = dy / d;
                cons.add(new LinearConstraint(new double[] {-ux, -uy, 0, -1}, Relationship.LEQ, -d));
                cons.add(new LinearConstraint(new double[] {ux, uy, 1, 0}, Relationship.LEQ, d));
            }
            box(cons, 4, 2, trust);
            double[] z = solve(cons, new double[] {0, 0, -1, 1});
            cx += z[0];
            cy += z[1];
            if (Math.hypot(z[0], z[1]) < 1e-14 * trust) break;
        }
        double lo = Double.POSITIVE_INFINITY, hi = 0;
        for (int i = 0; i < n; i++) {
            double d = Math.hypot(xs[i] - cx, ys[i] - cy);
            lo = Math.min(lo, d);
            hi = Math.max(hi, d);
        }
        return new double[] {cx, cy, lo, hi};
    }

    /**
     * Equal-bilateral Chebyshev registration with x, y and rotation free, by successive LPs solved
     * with SimplexSolver; returns the zone needed (twice the min-max deviation).
     */
    public static double floatingZone(Contour contour, double[] xs, double[] ys, int n, double trust) {
        double ox = 0, oy = 0;
        for (int i = 0; i < n; i++) { ox += xs[i]; oy += ys[i]; }
        ox /= n;
        oy /= n;
        double th = 0, tx = 0, ty = 0;
        double[] out = new double[4], w = new double[5];
        for (int pass = 0; pass < 100; pass++) {
            List<LinearConstraint> cons = new ArrayList<>();
            double c = Math.cos(th), s = Math.sin(th);
            for (int i = 0; i < n; i++) {
                double dx = xs[i] - ox, dy = ys[i] - oy;
                double x = ox + c * dx - s * dy + tx, y = oy + s * dx + c * dy + ty;
                contour.measure(x, y, out, w);
                double lever = out[1] * -(y - oy - ty) + out[2] * (x - ox - tx);
                cons.add(new LinearConstraint(new double[] {out[1], out[2], lever, -1}, Relationship.LEQ, -out[0]));
                cons.add(new LinearConstraint(new double[] {-out[1], -out[2], -lever, -1}, Relationship.LEQ, out[0]));
            }
            box(cons, 4, 3, trust);
            double[] z = solve(cons, new double[] {0, 0, 0, 1});
            tx += z[0];
            ty += z[1];
            th += z[2];
            if (Math.abs(z[0]) + Math.abs(z[1]) + Math.abs(z[2]) < 1e-14) break;
        }
        double c = Math.cos(th), s = Math.sin(th), m = 0;
        for (int i = 0; i < n; i++) {
            double dx = xs[i] - ox, dy = ys[i] - oy;
            contour.measure(ox + c * dx - s * dy + tx, oy + s * dx + c * dy + ty, out, w);
            m = Math.max(m, Math.abs(out[0]));
        }
        return 2 * m;
    }

    private static void box(List<LinearConstraint> cons, int vars, int boxed, double trust) {
        for (int k = 0; k < boxed; k++) {
            double[] up = new double[vars], dn = new double[vars];
            up[k] = 1;
            dn[k] = -1;
            cons.add(new LinearConstraint(up, Relationship.LEQ, trust));
            cons.add(new LinearConstraint(dn, Relationship.LEQ, trust));
        }
    }

    private static double[] solve(List<LinearConstraint> cons, double[] objective) {
        PointValuePair p = new SimplexSolver(1e-9, 10, 1e-30).optimize(new MaxIter(1_000_000),
                new LinearObjectiveFunction(objective, 0), new LinearConstraintSet(cons), GoalType.MINIMIZE,
                new NonNegativeConstraint(false));
        return p.getPoint();
    }
}
