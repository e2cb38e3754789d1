package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointSet;
import org.arcwright.io.JsonFiles;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;
import org.junit.jupiter.api.Test;

/**
 * The measured points the Zone view plots. Geometry checked against plane geometry of arcs tangent
 * to both legs of a corner (centre on the bisector at r/sin(θ/2); for a right angle with legs along
 * +x and +y, centre (r, r)), not against the code under test.
 */
class MeasuredPointsTest {
    private static Recommendation chosen(Callout c) {
        return new Recommendation("test", c, "text", 0, List.of(), List.of(), List.of(), Map.of(), List.of(),
                List.of(), false);
    }

    private static RadiusFeature fillet(Callout c) {
        return new RadiusFeature("F1", Fixtures.fillet(2, null), chosen(c), null);
    }

    /** A point on the vertex side of the blend of radius rho at a right angle, phi from leg +x's normal. */
    private static double[] onBlend(double rho, double phiDeg) {
        double phi = Math.toRadians(phiDeg);
        return new double[] {rho - rho * Math.cos(phi), rho - rho * Math.sin(phi)};
    }

    /**
     * The points of {@code pts} first, then a section of the nominal blend (R2, every 10°) and its legs
     * so that the inspection core can fit the blend; the test looks only at the first points.
     */
    private static MeasuredPoints measured(RadiusFeature f, double[]... pts) {
        List<double[]> all = new ArrayList<>(List.of(pts));
        for (int phi = 5; phi < 90; phi += 10) all.add(onBlend(2.0, phi));
        all.add(new double[] {2.5, 0});
        all.add(new double[] {0, 2.5});
        var r = new Inspector().inspect(CheckRequests.forFeature(f, PointSet.of(all.toArray(new double[0][]))));
        return MeasuredPoints.of(r, "test.csv").orElseThrow();
    }

    @Test
    void gradesRunFromWithinThroughNearALimitToFarOutside() {
        assertThat(MeasuredPoints.grade(-0.2, 0.4)).isEqualTo(MeasuredPoints.Grade.WITHIN);
        assertThat(MeasuredPoints.grade(-0.03, 0.4)).isEqualTo(MeasuredPoints.Grade.NEAR_LIMIT);
        assertThat(MeasuredPoints.grade(0.05, 0.4)).isEqualTo(MeasuredPoints.Grade.OUTSIDE);
        assertThat(MeasuredPoints.grade(0.3, 0.4)).isEqualTo(MeasuredPoints.Grade.FAR_OUTSIDE);
        assertThat(MeasuredPoints.grade(Double.NaN, 0.4)).isEqualTo(MeasuredPoints.Grade.NOT_JUDGED);
    }

    @Test
    void pointsOnKnownBlendsGetTheirRadiusExcessAndGrade() {
        RadiusFeature f = fillet(new Callout.Radius(1.8, 2.2, 2.0));
        MeasuredPoints m = measured(f, onBlend(2.0, 45), onBlend(2.17, 30), onBlend(1.75, 60), onBlend(1.5, 45),
                new double[] {3.5, 0});
        assertThat(m.total()).isEqualTo(5 + 11);
        assertThat(m.angleDeg()).isEqualTo(90, within(1e-9));
        assertThat(m.band()).isEqualTo(0.4, within(1e-12));
        // excess of a point on the blend of radius rho: min - rho below the band, rho - max above it
        assertThat(m.points().subList(0, 5)).extracting(MeasuredPoints.Point::grade).containsExactly(MeasuredPoints.Grade.WITHIN,
                MeasuredPoints.Grade.NEAR_LIMIT, MeasuredPoints.Grade.OUTSIDE, MeasuredPoints.Grade.FAR_OUTSIDE,
                MeasuredPoints.Grade.NOT_JUDGED);
        assertThat(m.points().get(2).excess()).isEqualTo(0.05, within(1e-6));
        assertThat(m.points().get(3).excess()).isEqualTo(0.3, within(1e-6));
        // the CSV frame (vertex at the origin, legs along +x and +y) is the view's frame
        assertThat(m.points().get(0).x()).isEqualTo(onBlend(2.0, 45)[0], within(1e-12));
        assertThat(m.points().get(0).y()).isEqualTo(onBlend(2.0, 45)[1], within(1e-12));
        assertThat(m.mismatch(ZoneSpec.of(f.designCase(), f.chosen().callout(), 90), f)).isEmpty();
    }

    @Test
    void aPointOnALimitArcIsDrawnOnThatLimitArcAtAnyMagnification() {
        RadiusFeature f = fillet(new Callout.Radius(1.8, 2.2, 2.0));
        ZoneSpec spec = ZoneSpec.of(f.designCase(), f.chosen().callout(), 90);
        for (double mag : new double[] {1, 2, 4}) {
            ZonePicture pic = ZonePicture.of(spec, mag);
            double lo = 2 + mag * (1.8 - 2);
            double hi = 2 + mag * (2.2 - 2);
            for (double phi : new double[] {10, 45, 80}) {
                double[] a = onBlend(1.8, phi);
                Point2 p = pic.place(new Point2(a[0], a[1]));
                assertThat(Math.hypot(p.x() - lo, p.y() - lo)).as("on the lower arc at ×%s", mag).isEqualTo(lo, within(1e-9));
                assertThat(distance(p, pic.lower())).isLessThan(1e-3);
                double[] b = onBlend(2.2, phi);
                Point2 q = pic.place(new Point2(b[0], b[1]));
                assertThat(Math.hypot(q.x() - hi, q.y() - hi)).isEqualTo(hi, within(1e-9));
            }
        }
    }

    @Test
    void aPointOnAProfileBoundaryIsDrawnOnTheMagnifiedBoundary() {
        // a fillet's air is away from the vertex: 0.15 toward air is inside the circle, at r - 0.15
        RadiusFeature f = fillet(new Callout.Profile(0.2, 0.15, List.of(), false, null));
        ZoneSpec spec = ZoneSpec.of(f.designCase(), f.chosen().callout(), 90);
        ZonePicture pic = ZonePicture.of(spec, 5);
        double phi = Math.toRadians(30);
        Point2 onBoundary = new Point2(2 - 1.85 * Math.cos(phi), 2 - 1.85 * Math.sin(phi));
        assertThat(pic.deviationTowardAir(onBoundary)).isEqualTo(0.15, within(1e-12));
        Point2 drawn = pic.place(onBoundary);
        assertThat(Math.hypot(drawn.x() - 2, drawn.y() - 2)).isEqualTo(2 - 5 * 0.15, within(1e-12));
        assertThat(distance(drawn, pic.upper())).isLessThan(1e-3);
        // beside a leg the distance from it is magnified alike
        Point2 leg = pic.place(new Point2(3, -0.01));
        assertThat(leg.x()).isEqualTo(3, within(1e-12));
        assertThat(leg.y()).isEqualTo(-0.05, within(1e-12));
    }

    @Test
    void aDynamicProfileDrawsItsPointsAboutTheNominalItsOffsetMoved() {
        // the whole contour 0.3 toward air (legs at 0.3, the blend concentric at R1.7): a dynamic
        // profile frees a uniform offset, so the part conforms, and the view, which draws the zone
        // about the nominal, must show the points on the nominal, not 0.3 beyond it
        RadiusFeature f = fillet(new Callout.Profile(0.1, null, List.of(), true, null));
        List<double[]> pts = new ArrayList<>();
        for (int phi = 5; phi < 90; phi += 10) {
            double a = Math.toRadians(phi);
            pts.add(new double[] {2 - 1.7 * Math.cos(a), 2 - 1.7 * Math.sin(a)});
        }
        for (double t = 2.5; t <= 4; t += 0.5) {
            pts.add(new double[] {t, 0.3});
            pts.add(new double[] {0.3, t});
        }
        var r = new Inspector().inspect(CheckRequests.forFeature(f, PointSet.of(pts.toArray(new double[0][]))));
        assertThat(r.pass()).isTrue();
        MeasuredPoints m = MeasuredPoints.of(r, "test.csv").orElseThrow();
        ZonePicture pic = ZonePicture.of(ZoneSpec.of(f.designCase(), f.chosen().callout(), 90), 1);
        for (MeasuredPoints.Point p : m.points()) {
            assertThat(Math.abs(pic.deviationTowardAir(p.at()))).as("point %d", p.index()).isLessThan(0.05);
        }
    }

    @Test
    void anInspectionCornerInAnyPlaceIsMovedRigidlyIntoTheView() {
        Corner corner = new Corner(new Point2(5, 3), new Point2(0, 1), new Point2(-1, 0), BlendKind.ROUND);
        InspectionRequest q = new InspectionRequest(Units.MM, new Nominal.CornerBlend(corner, 2),
                new InspectionCallout.RadiusLimits(RadiusKind.R, 1.8, 2.2),
                PointSet.of(new double[][] {{5, 5}, {4, 3}, {5 - 0.5, 3 + 0.5}}), 0.001, Double.NaN, false);
        // only the request matters to the frame: a bare result stands in for the inspection
        var result = new InspectionResult(q, true, null, null, null, null, null, null, List.of(), List.of());
        MeasuredPoints m = MeasuredPoints.of(result, "rotated.json").orElseThrow();
        assertThat(m.kind()).isEqualTo(BlendKind.ROUND);
        // leg A onto +x, leg B onto +y, the bisector onto 45°; distances from the vertex kept
        assertThat(m.points().get(0).x()).isEqualTo(2, within(1e-12));
        assertThat(m.points().get(0).y()).isEqualTo(0, within(1e-12));
        assertThat(m.points().get(1).x()).isEqualTo(0, within(1e-12));
        assertThat(m.points().get(1).y()).isEqualTo(1, within(1e-12));
        assertThat(m.points().get(2).x()).isEqualTo(0.5, within(1e-12));
        assertThat(m.points().get(2).y()).isEqualTo(0.5, within(1e-12));
    }

    @Test
    void pointsJudgedAgainstAnotherCalloutAreMarkedStale() {
        RadiusFeature f = fillet(new Callout.Radius(1.8, 2.2, 2.0));
        MeasuredPoints m = measured(f, onBlend(2.0, 45));
        RadiusFeature changed = fillet(new Callout.ControlledRadius(1.9, 2.1, 2.0));
        String says = m.mismatch(ZoneSpec.of(changed.designCase(), changed.chosen().callout(), 90), changed);
        assertThat(says).contains("R 1.8-2.2").contains("not the chosen callout");
    }

    @Test
    void theSceneDescribesAPointByItsDeviationAndExcess() {
        RadiusFeature f = fillet(new Callout.Radius(1.8, 2.2, 2.0));
        MeasuredPoints m = measured(f, onBlend(1.75, 45));
        ZoneScene scene = ZoneScene.of(f, Optional.of(m), 10);
        assertThat(scene.placed()).hasSize(12);
        assertThat(scene.pointsCaption()).startsWith("12 measured points").contains("1 outside");
        // a fillet's blend of 1.75 lies on the material side of the nominal 2, by (2 - 1.75)(√2 - 1) on the bisector
        String says = scene.describe(0, "mm");
        assertThat(says).contains("deviation -" + Numbers.fixed(0.25 * (Math.sqrt(2) - 1), 4)).contains("material side")
                .contains("outside by 0.0500");
    }

    @Test
    void theSessionKeepsPointsPerFeatureUntilAnotherWorksheetIsShown() {
        WorksheetSession s = new WorksheetSession(Fixtures.files(), Fixtures.twoFeatures(), null);
        AtomicInteger fired = new AtomicInteger();
        s.listeners().add(fired::incrementAndGet);
        MeasuredPoints m = measured(fillet(new Callout.Radius(1.8, 2.2, 2.0)), onBlend(2.0, 45));
        s.keepMeasured("F1", m);
        assertThat(fired.get()).isEqualTo(1);
        assertThat(s.measured("F1")).contains(m);
        assertThat(s.measured("F2")).isEmpty();
        assertThat(s.isDirty()).isFalse();
        s.showFresh(Fixtures.twoFeatures());
        assertThat(s.measured("F1")).isEmpty();
    }

    @Test
    void aDeletedFeaturesPointsNeverReachAFeatureAddedUnderItsId() {
        WorksheetSession s = new WorksheetSession(Fixtures.files(), Fixtures.twoFeatures(), null);
        String last = s.worksheet().features().get(s.worksheet().features().size() - 1).id();
        s.keepMeasured(last, measured(fillet(new Callout.Radius(1.8, 2.2, 2.0)), onBlend(2.0, 45)));
        s.select(last);
        assertThat(s.deleteSelected()).isTrue();
        assertThat(s.measured(last)).isEmpty();
        s.undo();
        RadiusFeature again = s.worksheet().features().get(s.worksheet().features().size() - 1);
        assertThat(again.id()).isEqualTo(last);
        assertThat(s.measured(last)).isEmpty();
    }

    private static double distance(Point2 p, List<Point2> line) {
        double best = Double.POSITIVE_INFINITY;
        List<Point2> pts = new ArrayList<>(line);
        for (int i = 1; i < pts.size(); i++) {
            Point2 a = pts.get(i - 1), b = pts.get(i);
            double dx = b.x() - a.x(), dy = b.y() - a.y();
            double t = Math.max(0, Math.min(1, ((p.x() - a.x()) * dx + (p.y() - a.y()) * dy) / (dx * dx + dy * dy)));
            best = Math.min(best, Math.hypot(p.x() - a.x() - t * dx, p.y() - a.y() - t * dy));
        }
        return best;
    }

    /**
     * A perfect R2 corner moved 0.03/0.02 as a whole passes R 1.9-2.1 (a ± radius locates nothing: its
     * zone is tangent to the part's own surfaces). The view draws the zone tangent to its legs, so the
     * blend's points must land on the view's R2 arc, as the verdict read them; before the fix they were
     * placed from the nominal corner, 0.02 to 0.03 off the arc they were graded against.
     */
    @Test
    void aMovedCornerIsDrawnOnTheZoneItWasJudgedOn() {
        RadiusFeature f = fillet(new Callout.Radius(1.9, 2.1, 2.0));
        List<double[]> pts = new ArrayList<>();
        for (double x = 8; x > 2; x -= 0.25) pts.add(new double[] {x + 0.03, 0.02});
        for (int i = 0; i <= 40; i++) {
            double[] p = onBlend(2.0, 90.0 * i / 40);
            pts.add(new double[] {p[0] + 0.03, p[1] + 0.02});
        }
        for (double y = 2.25; y < 8; y += 0.25) pts.add(new double[] {0.03, y + 0.02});
        InspectionResult r = new Inspector().inspect(CheckRequests.forFeature(f, PointSet.of(pts.toArray(new double[0][]))));
        assertThat(r.pass()).isTrue();
        MeasuredPoints m = MeasuredPoints.of(r, "moved.csv").orElseThrow();
        Point2 centre = ZonePicture.viewCorner(m.angleDeg(), BlendKind.FILLET).centre(2.0);
        int onBlend = 0;
        for (MeasuredPoints.Point p : m.points()) {
            if (p.index() < 24 || p.index() > 64) continue;
            onBlend++;
            assertThat(Math.hypot(p.x() - centre.x(), p.y() - centre.y())).as("point #%d", p.index())
                    .isEqualTo(2.0, within(1e-6));
            assertThat(p.grade()).isNotIn(MeasuredPoints.Grade.OUTSIDE, MeasuredPoints.Grade.FAR_OUTSIDE);
        }
        assertThat(onBlend).isEqualTo(41);
    }

    /**
     * A point a hair beyond a fitted surface (the repository's housing section, point #15, 0.00086 mm
     * beyond surface a) is outside by that distance, named as a distance beyond the surface. Before
     * the fix its excess was the lower limit plus that depth (1.8009 "mm"), graded far outside and shown
     * in the Zone view's tooltip as "outside by 1.8009 mm": read as a length it is not.
     */
    @Test
    void aPointBeyondASurfaceIsOutsideByItsDistanceBeyondIt() throws Exception {
        var request = new InspectionFiles(new JsonFiles())
                .read(Path.of("examples/inspect/housing-fillet-profile.json"))
                .withCompare(false).withCallout(new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.8, 2.2));
        InspectionResult r = new Inspector().inspect(request);
        MeasuredPoints m = MeasuredPoints.of(r, "housing.csv").orElseThrow();
        MeasuredPoints.Point p15 = m.points().stream().filter(p -> p.index() == 15).findFirst().orElseThrow();
        assertThat(p15.measure()).isEqualTo("distance beyond surface");
        assertThat(p15.excess()).isEqualTo(r.worst().excess(), within(1e-9)).isLessThan(0.001);
        assertThat(p15.grade()).isEqualTo(MeasuredPoints.Grade.OUTSIDE);
        assertThat(m.points()).filteredOn(p -> p.grade() != MeasuredPoints.Grade.NOT_JUDGED && p.index() != 15)
                .allSatisfy(p -> assertThat(p.measure()).isEqualTo("radius"));
    }
}
