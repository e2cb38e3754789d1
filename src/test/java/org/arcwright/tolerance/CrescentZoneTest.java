package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.io.InputProblem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CrescentZoneTest {

    @Test
    void rightAngleCrescentOfPlusMinusFiveHundredthsIsFourHundredthsWide() {
        // (rmax - rmin)(1/sin(θ/2) - 1) = 0.1 × (√2 - 1) = 0.041421 at 90° (geometry of tangent arcs).
        CrescentZone z = CrescentZone.of(0.50, 0.55, 0.60, 90);
        assertThat(z.width()).isCloseTo(0.1 * (Math.sqrt(2) - 1), within(1e-15));
        assertThat(z.width()).isCloseTo(0.0414, within(5e-5));
        assertThat(z.towardVertex()).isCloseTo(z.width() / 2, within(1e-15));
        assertThat(z.equalBilateralProfile()).isCloseTo(0.0414, within(5e-5));
        // common practice shortcut: twice the ± value.
        assertThat(z.shortcutProfile()).isCloseTo(0.1, within(1e-15));
    }

    @ParameterizedTest(name = "θ = {0}°, R{2} between {1} and {3}")
    @CsvSource({
            "90, 0.50, 0.55, 0.60",
            "60, 1.4, 1.5, 1.7",
            "120, 2.9, 3.0, 3.2",
            "150, 0.2, 0.25, 0.3",
            "30, 4.8, 5.0, 5.2",
    })
    void widthMatchesAnIndependentConstructionOfTheTwoArcs(double angle, double rMin, double rNom, double rMax) {
        CrescentZone z = CrescentZone.of(rMin, rNom, rMax, angle);
        assertThat(z.widestOnBisector()).isTrue();
        double legLength = 3 * rMax / Math.tan(Math.toRadians(angle) / 2) + 1;
        Separation s = separation(contour(rMax, angle, legLength, 4001), contour(rMin, angle, legLength * 1.5, 40001));
        assertThat(s.distance).isCloseTo(z.width(), within(z.width() * 2e-4 + 1e-9));
        // The widest point lies on the bisector (y = 0 in this construction).
        assertThat(Math.abs(s.where[1])).isLessThan(rMax * 0.01);
        // Split about the nominal arc, measured on the bisector.
        double vNom = rNom / Math.sin(Math.toRadians(angle) / 2) - rNom;
        double vMin = rMin / Math.sin(Math.toRadians(angle) / 2) - rMin;
        double vMax = rMax / Math.sin(Math.toRadians(angle) / 2) - rMax;
        assertThat(z.towardVertex()).isCloseTo(vNom - vMin, within(1e-12));
        assertThat(z.awayFromVertex()).isCloseTo(vMax - vNom, within(1e-12));
    }

    @Test
    void atASharpCornerWithAWideBandTheBisectorValueIsAnUpperBound() {
        // sin(15°) = 0.259 < 1 - 4.0/5.5 = 0.273: the boundaries meet closer through the surfaces.
        CrescentZone z = CrescentZone.of(4.0, 5.0, 5.5, 30);
        assertThat(z.widestOnBisector()).isFalse();
        double legLength = 3 * 5.5 / Math.tan(Math.toRadians(15)) + 1;
        Separation s = separation(contour(5.5, 30, legLength, 4001), contour(4.0, 30, legLength * 1.5, 40001));
        assertThat(s.distance).isLessThan(z.width());
    }

    @Test
    void outwardPortionFollowsTheMaterialSide() {
        CrescentZone z = CrescentZone.of(1.0, 1.5, 1.7, 90);
        // A round: smaller arcs lie toward the vertex and leave more material there.
        assertThat(z.outwardPortion(false)).hasValue(z.towardVertex());
        // A fillet: larger arcs fill more of the corner.
        assertThat(z.outwardPortion(true)).hasValue(z.awayFromVertex());
    }

    @Test
    void bothDeviationsPositiveLeaveTheCrescentWhollyBeyondTheNominalArc() {
        // R3 +0.3/+0.1 at 90°: limit arcs R3.1 and R3.3; k = √2 − 1 (geometry of tangent arcs, common practice).
        // Worked by hand: 0.1k = 0.0414, 0.3k = 0.1243, zone 2 × 0.3k = 0.2485, shortcut 2 × 0.3 = 0.6,
        // centre (0.0414 + 0.1243)/2 = 0.0828 (ISO 1101:2017 UZ offset is the zone centre's offset, from memory).
        CrescentZone z = CrescentZone.of(3.1, 3.0, 3.3, 90);
        double k = Math.sqrt(2) - 1;
        assertThat(z.minArcOffset()).isCloseTo(0.1 * k, within(1e-12)).isCloseTo(0.0414, within(5e-5));
        assertThat(z.maxArcOffset()).isCloseTo(0.3 * k, within(1e-12)).isCloseTo(0.1243, within(5e-5));
        assertThat(z.width()).isCloseTo(0.0828, within(5e-5));
        assertThat(z.towardVertex()).isZero();
        assertThat(z.awayFromVertex()).isCloseTo(z.width(), within(1e-15));
        assertThat(z.equalBilateralProfile()).isCloseTo(0.2485, within(5e-5));
        assertThat(z.shortcutProfile()).isCloseTo(0.6, within(1e-12));
        assertThat(z.holdsNominal()).isFalse();
        assertThat(z.isoOffset(true)).isCloseTo(0.0828, within(5e-5));
        assertThat(z.outwardPortion(true)).isEmpty();
    }

    @Test
    void bothDeviationsNegativeMirrorThePositiveCase() {
        // R3 -0.1/-0.3: limit arcs R2.7 and R2.9, the crescent 0.0414 to 0.1243 toward the vertex (worked by hand).
        CrescentZone z = CrescentZone.of(2.7, 3.0, 2.9, 90);
        assertThat(z.minArcOffset()).isCloseTo(-0.1243, within(5e-5));
        assertThat(z.maxArcOffset()).isCloseTo(-0.0414, within(5e-5));
        assertThat(z.awayFromVertex()).isZero();
        assertThat(z.towardVertex()).isCloseTo(z.width(), within(1e-15));
        assertThat(z.equalBilateralProfile()).isCloseTo(0.2485, within(5e-5));
        assertThat(z.shortcutProfile()).isCloseTo(0.6, within(1e-12));
        assertThat(z.isoOffset(true)).isCloseTo(-0.0828, within(5e-5));
        assertThat(z.isoOffset(false)).isCloseTo(0.0828, within(5e-5));
    }

    @ParameterizedTest(name = "R{1} with limits {0}..{2} at {3}°")
    @CsvSource({
            "3.1, 3.0, 3.3, 90",
            "2.7, 3.0, 2.9, 90",
            "3.0, 3.0, 3.2, 120",
            "1.8, 2.0, 2.0, 60",
    })
    void signedOffsetsMatchAnIndependentConstructionForEveryDisposition(double rMin, double rNom, double rMax, double angle) {
        // Directed separation between independently built contours (tangent points at r/tan(θ/2)), no use of k.
        CrescentZone z = CrescentZone.of(rMin, rNom, rMax, angle);
        double leg = 3 * Math.max(rMax, rNom) / Math.tan(Math.toRadians(angle) / 2) + 1;
        assertThat(Math.abs(z.minArcOffset())).isCloseTo(gap(rMin, rNom, angle, leg), within(2e-4 * z.width() + 1e-9));
        assertThat(Math.abs(z.maxArcOffset())).isCloseTo(gap(rMax, rNom, angle, leg), within(2e-4 * z.width() + 1e-9));
        assertThat(z.width()).isCloseTo(gap(rMax, rMin, angle, leg), within(2e-4 * z.width() + 1e-9));
    }

    /** Widest distance between the contours of radii a and b (zero when equal), from the larger to the smaller. */
    private static double gap(double a, double b, double angle, double leg) {
        if (a == b) return 0;
        double big = Math.max(a, b);
        double small = Math.min(a, b);
        return separation(contour(big, angle, leg, 4001), contour(small, angle, leg * 1.5, 40001)).distance;
    }

    @Test
    void anglesBelowOneDegreeAreRefusedWithTheReason() {
        // --angle 1e-300 once gave a crescent of 2.29e301: 1/sin(θ/2) has no bound as θ → 0.
        assertThatThrownBy(() -> CrescentZone.of(1, 1.5, 2, 1e-300)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("below 1°").hasMessageContaining("nearly parallel");
        assertThat(CrescentZone.of(1, 1.5, 2, 1.0).width()).isFinite();
    }

    @Test
    void anAngleJustShortOf180IsWrittenWithAllItsDigits() {
        assertThat(CrescentZone.degrees(179.9999999)).isEqualTo("179.9999999");
        assertThat(CrescentZone.degrees(90)).isEqualTo("90");
        assertThat(CrescentZone.degrees(1e-300)).doesNotContain("0000000000");
    }

    @Test
    void anglesOutsideTheOpenIntervalAreRejected() {
        assertThatThrownBy(() -> CrescentZone.of(1, 1.5, 2, 180)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("between 0 and 180");
        assertThatThrownBy(() -> CrescentZone.of(1, 1.5, 2, Double.NaN)).isInstanceOf(InputProblem.class);
        assertThatThrownBy(() -> CrescentZone.of(2, 1.5, 1, 90)).isInstanceOf(InputProblem.class);
    }

    /**
     * Points of the contour of a corner blended with radius r: legs along directions at ±θ/2 from the
     * x axis, vertex at the origin, arc tangent to both. Built from first principles (tangent points
     * at distance r/tan(θ/2) from the vertex), independently of {@link CrescentZone}.
     */
    private static List<double[]> contour(double r, double angleDeg, double legLength, int n) {
        double half = Math.toRadians(angleDeg) / 2;
        double t = r / Math.tan(half);
        double[] dirA = {Math.cos(half), Math.sin(half)};
        double[] dirB = {Math.cos(half), -Math.sin(half)};
        double[] tanA = {dirA[0] * t, dirA[1] * t};
        double[] tanB = {dirB[0] * t, dirB[1] * t};
        double cx = r / Math.sin(half);
        double a0 = Math.atan2(tanA[1], tanA[0] - cx);
        double a1 = Math.atan2(tanB[1], tanB[0] - cx);
        if (a1 < a0) a1 += 2 * Math.PI;
        List<double[]> pts = new ArrayList<>();
        int legN = n / 4;
        for (int i = legN; i > 0; i--) {
            double s = t + (legLength - t) * i / legN;
            pts.add(new double[] {dirA[0] * s, dirA[1] * s});
        }
        int arcN = n - 2 * legN;
        for (int i = 0; i <= arcN; i++) {
            double a = a0 + (a1 - a0) * i / arcN;
            pts.add(new double[] {cx + r * Math.cos(a), r * Math.sin(a)});
        }
        for (int i = 1; i <= legN; i++) {
            double s = t + (legLength - t) * i / legN;
            pts.add(new double[] {dirB[0] * s, dirB[1] * s});
        }
        return pts;
    }

    private record Separation(double distance, double[] where) {}

    /**
     * The largest distance from a point of {@code outer} to the polyline {@code inner} (directed
     * Hausdorff), exact: each point's distance is the minimum over every segment of {@code inner}
     * that could be nearer than the best found, found through a grid of the segments' bounding boxes
     * (a segment whose box lies only in cells k or more rings away is at least (k - 1) cells away).
     */
    private static Separation separation(List<double[]> outer, List<double[]> inner) {
        SegmentGrid grid = new SegmentGrid(inner);
        double best = -1;
        double[] where = null;
        for (double[] p : outer) {
            double d = grid.distance(p);
            if (d > best) {
                best = d;
                where = p;
            }
        }
        return new Separation(best, where);
    }

    /** The segments of a polyline filed by the grid cells their bounding boxes touch. */
    private static final class SegmentGrid {
        private final List<double[]> pts;
        private final double x0;
        private final double y0;
        private final double cell;
        private final Map<Long, List<Integer>> cells = new HashMap<>();

        SegmentGrid(List<double[]> pts) {
            this.pts = pts;
            double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY;
            double maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
            for (double[] p : pts) {
                minX = Math.min(minX, p[0]);
                minY = Math.min(minY, p[1]);
                maxX = Math.max(maxX, p[0]);
                maxY = Math.max(maxY, p[1]);
            }
            x0 = minX;
            y0 = minY;
            cell = Math.max(Math.hypot(maxX - minX, maxY - minY) / 256, 1e-9);
            for (int i = 1; i < pts.size(); i++) {
                double[] a = pts.get(i - 1);
                double[] b = pts.get(i);
                for (long cx = ix(Math.min(a[0], b[0])); cx <= ix(Math.max(a[0], b[0])); cx++) {
                    for (long cy = iy(Math.min(a[1], b[1])); cy <= iy(Math.max(a[1], b[1])); cy++) {
                        cells.computeIfAbsent(key(cx, cy), k -> new ArrayList<>()).add(i);
                    }
                }
            }
        }

        private long ix(double x) {
            return (long) Math.floor((x - x0) / cell);
        }

        private long iy(double y) {
            return (long) Math.floor((y - y0) / cell);
        }

        private static long key(long cx, long cy) {
            return (cx << 32) ^ (cy & 0xffffffffL);
        }

        /** The distance from {@code p} to the nearest segment, searching rings of cells outwards. */
        double distance(double[] p) {
            long px = ix(p[0]);
            long py = iy(p[1]);
            double best = Double.POSITIVE_INFINITY;
            for (long ring = 0; ; ring++) {
                if ((ring - 1) * cell >= best) return best;
                for (long cx = px - ring; cx <= px + ring; cx++) {
                    for (long cy = py - ring; cy <= py + ring; cy++) {
                        if (Math.max(Math.abs(cx - px), Math.abs(cy - py)) != ring) continue;
                        List<Integer> segs = cells.get(key(cx, cy));
                        if (segs == null) continue;
                        for (int i : segs) best = Math.min(best, segmentDistance(p, pts.get(i - 1), pts.get(i)));
                    }
                }
                if (ring > 4 * 256 + 4) return best;
            }
        }
    }

    private static double segmentDistance(double[] p, double[] a, double[] b) {
        double vx = b[0] - a[0];
        double vy = b[1] - a[1];
        double len2 = vx * vx + vy * vy;
        double u = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * vx + (p[1] - a[1]) * vy) / len2));
        double dx = a[0] + u * vx - p[0];
        double dy = a[1] + u * vy - p[1];
        return Math.sqrt(dx * dx + dy * dy);
    }
}
