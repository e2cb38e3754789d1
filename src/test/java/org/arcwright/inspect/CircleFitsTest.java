package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.arcwright.io.InputProblem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CircleFitsTest {

    @Test
    void leastSquaresCircleMatchesGanderGolubStrebel() {
        // W. Gander, G. H. Golub, R. Strebel, "Least-squares fitting of circles and ellipses",
        // BIT 34 (1994): geometric fit centre (4.739782, 2.983533), radius 4.714226.
        double[] x = {1, 2, 5, 7, 9, 3};
        double[] y = {7, 6, 8, 7, 5, 7};
        LeastSquaresCircle fit = CircleFits.leastSquares(x, y, 6);
        assertThat(fit.circle().cx()).isCloseTo(4.739782, within(1e-6));
        assertThat(fit.circle().cy()).isCloseTo(2.983533, within(1e-6));
        assertThat(fit.circle().r()).isCloseTo(4.714226, within(1e-6));
    }

    @ParameterizedTest(name = "R={0} A={1} k={2}")
    @CsvSource({"10, 0.05, 2", "10, 0.05, 3", "5, 0.2, 4", "1, 0.001, 5", "25, 0.5, 7"})
    void minimumZoneOfAHarmonicOutOfRoundnessIsCentredWithWidthTwoA(double r0, double amp, int k) {
        // Analytic: r(θ) = R + A cos(kθ), k >= 2, evenly sampled, has its minimum zone centred at the
        // origin with width 2A (the k-lobed form alternates 2k times between R - A and R + A).
        int n = 360 * k;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            double r = r0 + amp * Math.cos(k * t);
            x[i] = r * Math.cos(t) + 3;
            y[i] = r * Math.sin(t) - 2;
        }
        MinimumZoneCircle mz = CircleFits.minimumZone(x, y, n);
        assertThat(mz.cx()).isCloseTo(3, within(1e-9 * r0));
        assertThat(mz.cy()).isCloseTo(-2, within(1e-9 * r0));
        assertThat(mz.width()).isCloseTo(2 * amp, within(1e-9 * r0));
    }

    @Test
    void exactCircleFitsExactly() {
        Random rnd = new Random(7);
        int n = 50;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = rnd.nextDouble() * 2;
            x[i] = 1 + 4 * Math.cos(t);
            y[i] = 2 + 4 * Math.sin(t);
        }
        assertThat(CircleFits.taubin(x, y, n).r()).isCloseTo(4, within(1e-9));
        assertThat(CircleFits.leastSquares(x, y, n).rms()).isLessThan(1e-9);
        assertThat(CircleFits.minimumZone(x, y, n).width()).isLessThan(1e-9);
    }

    @ParameterizedTest(name = "offset {0}")
    @CsvSource({"0", "1e4", "-3e5"})
    void taubinDoesNotDependOnWhichPointItsSinglePassIsTakenAbout(double offset) {
        // Taubin's circle is defined by moments about the centroid (Chernov 2010, §5), so it cannot
        // depend on the order of the points, i.e. on which point the one pass is taken about; an
        // outlier in the middle of the list sends the fit to the two-pass fallback
        Random rnd = new Random(17);
        int n = 201;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = rnd.nextDouble() * 2.5, r = 3 * (1 + 0.003 * rnd.nextGaussian());
            x[i] = offset + 1 + r * Math.cos(t);
            y[i] = offset - 2 + r * Math.sin(t);
        }
        x[n / 2] = offset + 400;
        y[n / 2] = offset - 300;
        double[] x2 = x.clone(), y2 = y.clone();
        x2[0] = x[n / 2]; y2[0] = y[n / 2];
        x2[n / 2] = x[0]; y2[n / 2] = y[0];
        Circle outlierInTheMiddle = CircleFits.taubin(x, y, n), outlierFirst = CircleFits.taubin(x2, y2, n);
        double scale = outlierFirst.r();
        assertThat(outlierInTheMiddle.cx()).isCloseTo(outlierFirst.cx(), within(1e-9 * scale));
        assertThat(outlierInTheMiddle.cy()).isCloseTo(outlierFirst.cy(), within(1e-9 * scale));
        assertThat(outlierInTheMiddle.r()).isCloseTo(outlierFirst.r(), within(1e-9 * scale));
    }

    @Test
    void exactCircleFarFromTheOriginFitsToTheRoundingOfItsCoordinates() {
        int n = 300;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = 1.2 * i / n;
            x[i] = 1e4 + 2 * Math.cos(t);
            y[i] = 1e4 + 2 * Math.sin(t);
        }
        LeastSquaresCircle fit = CircleFits.leastSquares(x, y, n);
        // coordinates near 1e4 carry a rounding of about 1e-12
        assertThat(fit.circle().cx()).isCloseTo(1e4, within(1e-9));
        assertThat(fit.circle().cy()).isCloseTo(1e4, within(1e-9));
        assertThat(fit.circle().r()).isCloseTo(2, within(1e-9));
        assertThat(fit.rms()).isLessThan(1e-11);
        assertThat(CircleFits.taubin(x, y, n).r()).isCloseTo(2, within(1e-9));
    }

    @Test
    void collinearPointsAreBadInput() {
        assertThatThrownBy(() -> CircleFits.leastSquares(new double[] {0, 1, 2, 3}, new double[] {0, 1, 2, 3}, 4))
                .isInstanceOf(InputProblem.class).hasMessageContaining("collinear");
    }

    @Test
    void duplicatePointsAreBadInput() {
        assertThatThrownBy(() -> CircleFits.leastSquares(new double[] {1, 1, 1, 2}, new double[] {1, 1, 1, 2}, 4))
                .isInstanceOf(InputProblem.class).hasMessageContaining("duplicates");
    }

    @Test
    void tooFewPointsAreBadInput() {
        assertThatThrownBy(() -> CircleFits.leastSquares(new double[] {1, 2}, new double[] {1, 2}, 2))
                .isInstanceOf(InputProblem.class).hasMessageContaining("at least 3");
    }
}
