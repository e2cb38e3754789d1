package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.offset;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NoFeasibleSolutionException;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.PivotSelectionRule;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.linear.UnboundedSolutionException;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.junit.jupiter.api.Test;

/**
 * The general LP solver of the zone fits ({@link SmallLp}, {@link ActiveSetLp}) and its linear
 * solver ({@link Gauss}) against reference implementations on random small problems, fixed seeds.
 * Reference: Apache Commons Math 3.6.1, {@code SimplexSolver} (two-phase simplex with Bland's rule)
 * for the programmes and {@code LUDecomposition} for the linear systems. Optima are compared by
 * objective value, since an LP may have several optimal points.
 */
class LpSolversTest {
    private static final int SEEDS = 300;

    /** A programme: minimise c·z subject to A z <= b, z free; rows row-major. */
    private record Lp(int n, int m, double[] a, double[] b, double[] c) {
        double objective(double[] z) {
            double s = 0;
            for (int i = 0; i < n; i++) s += c[i] * z[i];
            return s;
        }

        double worstViolation(double[] z) {
            double worst = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < m; j++) {
                double s = -b[j];
                for (int i = 0; i < n; i++) s += a[j * n + i] * z[i];
                worst = Math.max(worst, s);
            }
            return worst;
        }

        Lp with(double[] row, double rhs) {
            double[] a2 = Arrays.copyOf(a, a.length + n);
            System.arraycopy(row, 0, a2, a.length, n);
            double[] b2 = Arrays.copyOf(b, m + 1);
            b2[m] = rhs;
            return new Lp(n, m + 1, a2, b2, c);
        }
    }

    /**
     * A feasible programme around a random point, with a box |z_i| <= box on every variable (the
     * first 2n rows) so that it is bounded, and {@code extra} random constraints, some active there.
     */
    private static Lp random(SplittableRandom r, int n, int extra, double box) {
        double[] z0 = new double[n];
        for (int i = 0; i < n; i++) z0[i] = r.nextDouble(-box / 2, box / 2);
        int m = 2 * n + extra;
        double[] a = new double[m * n];
        double[] b = new double[m];
        for (int i = 0; i < n; i++) {
            a[(2 * i) * n + i] = 1;
            b[2 * i] = box;
            a[(2 * i + 1) * n + i] = -1;
            b[2 * i + 1] = box;
        }
        for (int j = 2 * n; j < m; j++) {
            double dot = 0;
            for (int i = 0; i < n; i++) {
                double v = r.nextDouble(-1, 1);
                a[j * n + i] = v;
                dot += v * z0[i];
            }
            b[j] = dot + (r.nextInt(4) == 0 ? 0 : r.nextDouble(0, box));
        }
        double[] c = new double[n];
        for (int i = 0; i < n; i++) c[i] = r.nextDouble(-1, 1);
        return new Lp(n, m, a, b, c);
    }

    private static PointValuePair reference(Lp p) {
        List<LinearConstraint> rows = new ArrayList<>();
        for (int j = 0; j < p.m(); j++) {
            rows.add(new LinearConstraint(Arrays.copyOfRange(p.a(), j * p.n(), (j + 1) * p.n()), Relationship.LEQ, p.b()[j]));
        }
        return new SimplexSolver(1e-9, 10, 1e-12).optimize(new MaxIter(100_000), new LinearObjectiveFunction(p.c(), 0),
                new LinearConstraintSet(rows), GoalType.MINIMIZE, new NonNegativeConstraint(false), PivotSelectionRule.BLAND);
    }

    @Test
    void smallLpReachesTheReferenceOptimumOnRandomProgrammes() {
        for (int seed = 1; seed <= SEEDS; seed++) {
            SplittableRandom r = new SplittableRandom(seed);
            int n = 1 + r.nextInt(5);
            Lp p = random(r, n, r.nextInt(40), 1 + r.nextInt(100));
            SmallLp.Solution s = SmallLp.solve(p.n(), p.m(), p.a(), p.b(), p.c());
            PointValuePair ref = reference(p);
            assertThat(s.z()).as("seed %d: feasible", seed).isNotNull();
            double scale = 1 + Math.abs(ref.getValue());
            assertThat(p.worstViolation(s.z())).as("seed %d: constraints hold", seed).isLessThan(1e-9 * scale * 100);
            assertThat(p.objective(s.z())).as("seed %d: objective", seed).isCloseTo(ref.getValue(), offset(1e-8 * scale));
        }
    }

    @Test
    void smallLpSaysInfeasibleWhereTheReferenceFindsNoFeasibleSolution() {
        for (int seed = 1; seed <= SEEDS / 3; seed++) {
            SplittableRandom r = new SplittableRandom(seed);
            int n = 1 + r.nextInt(4);
            Lp p = random(r, n, r.nextInt(20), 10);
            double[] row = new double[n];
            for (int i = 0; i < n; i++) row[i] = r.nextDouble(-1, 1);
            double[] minus = Arrays.stream(row).map(v -> -v).toArray();
            double t = r.nextDouble(-5, 5);
            Lp contradictory = p.with(row, t).with(minus, -t - 0.5);
            assertThatThrownBy(() -> reference(contradictory)).isInstanceOf(NoFeasibleSolutionException.class);
            assertThat(SmallLp.solve(contradictory.n(), contradictory.m(), contradictory.a(), contradictory.b(), contradictory.c()).z())
                    .as("seed %d", seed).isNull();
        }
    }

    @Test
    void smallLpSaysUnboundedWhereTheReferenceDoes() {
        // minimise -z0 - z1 with only z0 + 2 z1 >= 1 style constraints that leave the direction (1, 1) open
        Lp open = new Lp(2, 2, new double[] {-1, -2, 1, -1}, new double[] {-1, 3}, new double[] {-1, -1});
        assertThatThrownBy(() -> reference(open)).isInstanceOf(UnboundedSolutionException.class);
        assertThatThrownBy(() -> SmallLp.solve(open.n(), open.m(), open.a(), open.b(), open.c()))
                .isInstanceOf(IllegalStateException.class);
    }

    @Test
    void activeSetLpReachesTheReferenceOptimumWithManyConstraints() {
        for (int seed = 1; seed <= SEEDS / 10; seed++) {
            SplittableRandom r = new SplittableRandom(seed);
            int n = 2 + r.nextInt(3);
            Lp p = random(r, n, 100 + r.nextInt(300), 20);
            int[] box = new int[2 * n];
            for (int k = 0; k < box.length; k++) box[k] = k;
            ActiveSetLp.Result s = ActiveSetLp.solve(problem(p), box, 1e-12);
            PointValuePair ref = reference(p);
            assertThat(s.z()).as("seed %d: feasible", seed).isNotNull();
            double scale = 1 + Math.abs(ref.getValue());
            assertThat(p.worstViolation(s.z())).as("seed %d: constraints hold", seed).isLessThan(1e-9 * scale * 100);
            assertThat(p.objective(s.z())).as("seed %d: objective", seed).isCloseTo(ref.getValue(), offset(1e-8 * scale));
            assertThat(s.working().length).as("seed %d: the working set stays small", seed).isLessThan(p.m());
        }
    }

    private static ActiveSetLp.Problem problem(Lp p) {
        return new ActiveSetLp.Problem() {
            @Override
            public int variables() {
                return p.n();
            }

            @Override
            public int constraints() {
                return p.m();
            }

            @Override
            public double row(int j, double[] row) {
                System.arraycopy(p.a(), j * p.n(), row, 0, p.n());
                return p.b()[j];
            }

            @Override
            public double violation(int j, double[] z) {
                double s = -p.b()[j];
                for (int i = 0; i < p.n(); i++) s += p.a()[j * p.n() + i] * z[i];
                return s;
            }

            @Override
            public double[] objective() {
                return p.c();
            }
        };
    }

    @Test
    void gaussSolvesRandomSystemsAsLuDecompositionDoes() {
        for (int seed = 1; seed <= SEEDS; seed++) {
            SplittableRandom r = new SplittableRandom(seed);
            int n = 1 + r.nextInt(7);
            double[][] m = new double[n][n + 1];
            double[][] a = new double[n][n];
            double[] rhs = new double[n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) a[i][j] = m[i][j] = r.nextDouble(-10, 10);
                rhs[i] = m[i][n] = r.nextDouble(-10, 10);
            }
            LUDecomposition lu = new LUDecomposition(new Array2DRowRealMatrix(a));
            if (Math.abs(lu.getDeterminant()) < 1e-6) continue;
            double[] expected = lu.getSolver().solve(new ArrayRealVector(rhs)).toArray();
            double[] x = Gauss.solve(m);
            double size = Arrays.stream(expected).map(Math::abs).max().orElse(1);
            for (int i = 0; i < n; i++) {
                assertThat(x[i]).as("seed %d, x[%d]", seed, i).isCloseTo(expected[i], offset(1e-9 * (1 + size)));
            }
        }
    }

    @Test
    void gaussRefusesASingularSystem() {
        double[][] m = {{1, 2, 3}, {2, 4, 6}};
        assertThatThrownBy(() -> Gauss.solve(m)).isInstanceOf(IllegalStateException.class).hasMessageContaining("singular");
    }
}
