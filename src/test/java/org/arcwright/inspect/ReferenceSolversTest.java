package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.arcwright.zone.Contour;
import org.arcwright.zone.ProfileZone;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Arcwright's solvers against Apache Commons Math 3.6.1 (Maven Central) on the same problems:
 * Levenberg-Marquardt for the geometric circle; SimplexSolver for the linear programmes of the
 * minimum-zone circle and of Chebyshev registration. They must agree within 1e-9 relative.
 */
class ReferenceSolversTest {

    private static double[][] noisyArc(long seed, int n) {
        return noisyArc(seed, n, Double.NaN);
    }

    /** {@code n} points on an arc of {@code sweepDeg} degrees (random from 60 to 360 when NaN), 0.2 % radial noise. */
    private static double[][] noisyArc(long seed, int n, double sweepDeg) {
        Random rnd = new Random(seed);
        double cx = rnd.nextDouble() * 10 - 5, cy = rnd.nextDouble() * 10 - 5, r = 0.5 + rnd.nextDouble() * 20;
        double start = rnd.nextDouble() * 2 * Math.PI, random = Math.toRadians(60 + rnd.nextDouble() * 300);
        double sweep = Double.isNaN(sweepDeg) ? random : Math.toRadians(sweepDeg);
        double[] xs = new double[n], ys = new double[n];
        for (int i = 0; i < n; i++) {
            double t = start + sweep * rnd.nextDouble();
            double rr = r * (1 + 0.002 * rnd.nextGaussian());
            xs[i] = cx + rr * Math.cos(t);
            ys[i] = cy + rr * Math.sin(t);
        }
        return new double[][] {xs, ys};
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void leastSquaresCircleAgreesWithCommonsMathLevenbergMarquardt(long seed) {
        int n = 20 + (int) (seed * 37 % 300);
        double[][] p = noisyArc(seed, n);
        LeastSquaresCircle ours = CircleFits.leastSquares(p[0], p[1], n);
        Circle t = CircleFits.taubin(p[0], p[1], n);
        double[] ref = ReferenceSolvers.leastSquaresCircle(p[0], p[1], n, new double[] {t.cx(), t.cy(), t.r()});
        assertSameCircle(ours.circle(), ref, 1e-9);
    }

    /**
     * Rough, short arcs (3 % radial noise on 40 to 90 degrees): Taubin's start is far enough off that
     * the first steps rebuild JᵀJ and the later, small ones keep it. Here Commons Math stops with a
     * gradient of about 1e-8 (its own tolerances, 1e-15, end on the cost), so agreement is asked to
     * 1e-8 and the fit's own gradient, which vanishes at the least-squares circle by definition, to
     * below 1e-9.
     */
    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {61, 62, 63, 64})
    void leastSquaresCircleOnRoughShortArcsAgreesWithCommonsMathLevenbergMarquardt(long seed) {
        int n = 300;
        Random rnd = new Random(seed);
        double[] xs = new double[n], ys = new double[n];
        double sweep = Math.toRadians(40 + 50 * rnd.nextDouble());
        for (int i = 0; i < n; i++) {
            double t = sweep * rnd.nextDouble(), rr = 5 * (1 + 0.03 * rnd.nextGaussian());
            xs[i] = -3 + rr * Math.cos(t);
            ys[i] = 8 + rr * Math.sin(t);
        }
        LeastSquaresCircle ours = CircleFits.leastSquares(xs, ys, n);
        Circle t = CircleFits.taubin(xs, ys, n);
        double[] ref = ReferenceSolvers.leastSquaresCircle(xs, ys, n, new double[] {t.cx(), t.cy(), t.r()});
        assertThat(ours.iterations()).isGreaterThan(2);
        assertSameCircle(ours.circle(), ref, 1e-8);
        double ga = 0, gb = 0, gr = 0;
        Circle c = ours.circle();
        for (int i = 0; i < n; i++) {
            double dx = xs[i] - c.cx(), dy = ys[i] - c.cy(), d = Math.hypot(dx, dy), e = d - c.r();
            ga += e * dx / d;
            gb += e * dy / d;
            gr += e;
        }
        assertThat(Math.sqrt(ga * ga + gb * gb + gr * gr)).isLessThan(1e-9);
    }

    /**
     * Far from the origin: the least-squares pass works about a point of the set and Taubin's start
     * converts moments about that point, so neither may lose the digits that the coordinates' size
     * (1e4 against a radius of 2) would cost a fit about the origin.
     */
    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {41, 42, 43})
    void leastSquaresCircleFarFromTheOriginAgreesWithCommonsMathLevenbergMarquardt(long seed) {
        int n = 400;
        Random rnd = new Random(seed);
        double[] xs = new double[n], ys = new double[n];
        double sweep = Math.toRadians(30 + 300 * rnd.nextDouble());
        for (int i = 0; i < n; i++) {
            double t = sweep * i / n, rr = 2 * (1 + 0.002 * rnd.nextGaussian());
            xs[i] = 1e4 + 0.3 + rr * Math.cos(t);
            ys[i] = 1e4 - 0.7 + rr * Math.sin(t);
        }
        LeastSquaresCircle ours = CircleFits.leastSquares(xs, ys, n);
        Circle t = CircleFits.taubin(xs, ys, n);
        double[] ref = ReferenceSolvers.leastSquaresCircle(xs, ys, n, new double[] {t.cx(), t.cy(), t.r()});
        assertSameCircle(ours.circle(), ref, 1e-9);
    }

    /**
     * One arc per regime of the minimum-zone problem, each small enough for SimplexSolver's dense
     * tableau (2n + 4 rows) to stay fast: the zone is fixed by four points, so more points add time,
     * not sharpness. A short arc leaves the centre badly conditioned (the bisector direction is
     * nearly free), a half circle puts the binding points at its ends and middle, a full circle
     * surrounds the centre. (The old cases had 100 to 250 points on random arcs: 2.5 times the time
     * for the same four binding points.)
     */
    @ParameterizedTest(name = "seed {0}, {1} degrees, {2} points")
    @CsvSource({"11, 40, 40", "12, 90, 60", "13, 180, 50", "14, 270, 80", "15, 360, 70"})
    void minimumZoneCircleAgreesWithTheSameLinearProgrammesSolvedBySimplexSolver(long seed, double sweepDeg, int n) {
        double[][] p = noisyArc(seed, n, sweepDeg);
        LeastSquaresCircle ls = CircleFits.leastSquares(p[0], p[1], n);
        MinimumZoneCircle ours = CircleFits.minimumZone(p[0], p[1], n, ls.circle());
        double[] ref = ReferenceSolvers.minimumZoneCircle(p[0], p[1], n, ls.circle().cx(), ls.circle().cy(), 0.05 * ls.circle().r());
        double r = ls.circle().r();
        assertThat(ours.cx()).isCloseTo(ref[0], within(1e-9 * r));
        assertThat(ours.cy()).isCloseTo(ref[1], within(1e-9 * r));
        assertThat(ours.inner()).isCloseTo(ref[2], within(1e-9 * ref[2]));
        assertThat(ours.outer()).isCloseTo(ref[3], within(1e-9 * ref[3]));
        assertThat(ours.width()).isCloseTo(ref[3] - ref[2], within(1e-9 * (ref[3] - ref[2]) + 1e-12 * r));
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {21, 22, 23})
    void floatingRegistrationAgreesWithTheSameLinearProgrammesSolvedBySimplexSolver(long seed) {
        Random rnd = new Random(seed);
        // 80 points: the zone binds on three or four of them; the screened case below takes 160
        PointSet pts = Sections.section(Sections.SQUARE, 2, 10, 60, 0.003, seed,
                f -> 0.01 * Math.sin((2 + rnd.nextInt(3)) * Math.PI * f));
        double[] xs = pts.x(), ys = pts.y();
        for (int i = 0; i < xs.length; i++) { xs[i] += 0.02; ys[i] -= 0.01; }
        PointSet moved = new PointSet(xs, ys, xs.length, "t");
        Contour nominal = Sections.SQUARE.contour(2, 50);
        ProfileOutcome ours = new ProfileCheck(nominal, 0, 0, 1e-6).evaluate(moved, ProfileZone.bilateral(0.1), Freedom.all(), false);
        double ref = ReferenceSolvers.floatingZone(nominal, xs, ys, xs.length, 0.05);
        assertThat(ours.requiredZone()).isCloseTo(ref, within(1e-9 * ref));
    }
    /**
     * Above 20,000 points the registration polishes on the points near the extremes only: 160
     * measured points plus 30,000 on the equally moved nominal, which never bind, must need the
     * zone SimplexSolver finds for the 160 alone.
     */
    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {31, 32})
    void screenedRegistrationOfManyPointsAgreesWithSimplexSolverOnTheBindingOnes(long seed) {
        Random rnd = new Random(seed);
        PointSet pts = Sections.section(Sections.SQUARE, 2, 20, 120, 0.003, seed,
                f -> 0.01 * Math.sin((2 + rnd.nextInt(3)) * Math.PI * f));
        PointSet fill = Sections.section(Sections.SQUARE, 2, 3000, 24_000, 0, seed, f -> 0);
        int m = pts.size(), n = m + fill.size();
        double[] xs = new double[n], ys = new double[n];
        double[] px = pts.x(), py = pts.y(), fx = fill.x(), fy = fill.y(); // x() and y() copy: once, not per point
        for (int i = 0; i < n; i++) {
            xs[i] = (i < m ? px[i] : fx[i - m]) + 0.02;
            ys[i] = (i < m ? py[i] : fy[i - m]) - 0.01;
        }
        Contour nominal = Sections.SQUARE.contour(2, 50);
        ProfileOutcome ours = new ProfileCheck(nominal, 0, 0, 1e-6)
                .evaluate(new PointSet(xs, ys, n, "t"), ProfileZone.bilateral(0.1), Freedom.all(), false);
        double ref = ReferenceSolvers.floatingZone(nominal, xs, ys, m, 0.05);
        assertThat(ours.requiredZone()).isCloseTo(ref, within(1e-9 * ref));
    }

    /** Centre and radius of {@code ours} within {@code relative} × the reference radius of {@code ref} = {cx, cy, r}. */
    private static void assertSameCircle(Circle ours, double[] ref, double relative) {
        double tolerance = relative * ref[2];
        assertThat(ours.cx()).isCloseTo(ref[0], within(tolerance));
        assertThat(ours.cy()).isCloseTo(ref[1], within(tolerance));
        assertThat(ours.r()).isCloseTo(ref[2], within(tolerance));
    }
}
