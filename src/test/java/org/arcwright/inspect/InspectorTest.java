package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.EnumSet;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;
import org.junit.jupiter.api.Test;

class InspectorTest {
    private final Inspector inspector = new Inspector();
    private static final InspectionCallout R = new InspectionCallout.RadiusLimits(RadiusKind.R, 1.9, 2.1);
    private static final InspectionCallout CR = new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.9, 2.1);

    /** A flat across the middle of the blend, sunk {@code depth} below the nominal arc's crown. */
    private static double flat(double f, double r, double halfWidth) {
        double a = (f - 0.5) * Math.PI / 2; // angle from the bisector
        double chord = r - halfWidth; // the flat lies this far from the centre
        return Math.abs(a) < Math.acos(chord / r) ? chord / Math.cos(a) - r : 0;
    }

    @Test
    void reportFiguresRoundTheDecimalAsPrintedNotItsBinaryValue() {
        // half to even on the printed decimal: ISO 80000-1:2009 Annex B, rule A (from memory); the
        // binary values are 0.00123434999... and 1.00005000...01, which rounded the other way before
        assertThat(Inspector.fmt(0.00123435)).isEqualTo("0.0012344");
        assertThat(Inspector.fmt(1.00005)).isEqualTo("1");
        assertThat(Inspector.fmt(0.0086175)).isEqualTo("0.0086175");
        assertThat(Inspector.fmt(Double.NaN)).isEqualTo("none");
        assertThat(Inspector.fmt(Double.POSITIVE_INFINITY)).isEqualTo("infinite (flat)");
    }

    @Test
    void coordinatesHaveFixedPlacesByUnit() {
        // fixed places per unit, as a CMM report lists points (common practice); ties half to even
        assertThat(Inspector.coordinate(0.0002465, Units.MM)).isEqualTo("0.0002");
        assertThat(Inspector.coordinate(4.131, Units.MM)).isEqualTo("4.1310");
        assertThat(Inspector.coordinate(-0.00003862, Units.MM)).isEqualTo("0.0000");
        assertThat(Inspector.coordinate(0.0002465, Units.INCH)).isEqualTo("0.00025");
        assertThat(Inspector.coordinate(Double.NaN, Units.INCH)).isEqualTo("none");
    }

    @Test
    void flatInsideTheZonePassesRadiusButFailsControlledRadius() {
        // ASME Y14.5-2018 controlled radius (from memory): no flats or reversals; the R zone alone
        // accepts any contour between the limit arcs.
        PointSet pts = Sections.section(Sections.SQUARE, 2, 40, 400, 0, 1, f -> flat(f, 2, 0.004));
        InspectionResult r = inspector.inspect(Sections.request(Sections.SQUARE, 2, R, pts));
        assertThat(r.pass()).isTrue();
        InspectionResult cr = inspector.inspect(Sections.request(Sections.SQUARE, 2, CR, pts));
        assertThat(cr.pass()).isFalse();
        assertThat(cr.controlled().localMax()).isGreaterThan(2.1);
    }

    @Test
    void exactArcWithinTheLimitsPassesControlledRadius() {
        PointSet pts = Sections.section(Sections.SQUARE, 2.05, 40, 400, 0, 1, f -> 0);
        InspectionResult cr = inspector.inspect(Sections.request(Sections.SQUARE, 2, CR, pts));
        assertThat(cr.pass()).isTrue();
        assertThat(cr.controlled().localMin()).isCloseTo(2.05, within(1e-9));
        assertThat(cr.controlled().localMax()).isCloseTo(2.05, within(1e-9));
        assertThat(cr.controlled().reversals()).isEmpty();
        assertThat(cr.fits().leastSquares().circle().r()).isCloseTo(2.05, within(1e-9));
        assertThat(cr.fits().stepA()).isLessThan(1e-9);
        assertThat(cr.radius().smallest()).isCloseTo(2.05, within(1e-9));
        assertThat(cr.radius().largest()).isCloseTo(2.05, within(1e-9));
    }

    @Test
    void dentIsReportedAsAReversal() {
        // a bump toward the centre over 10% of the blend, deep enough to curve the wrong way
        PointSet pts = Sections.section(Sections.SQUARE, 2, 40, 600, 0, 1,
                f -> Math.abs(f - 0.5) < 0.06 ? -0.01 * (1 + Math.cos(Math.PI * (f - 0.5) / 0.06)) : 0);
        InspectionResult cr = inspector.inspect(Sections.request(Sections.SQUARE, 2, CR, pts).withWindow(0.1));
        assertThat(cr.pass()).isFalse();
        assertThat(cr.controlled().reversals()).isNotEmpty();
        ControlledRadiusOutcome.Reversal v = cr.controlled().reversals().get(0);
        assertThat(Math.hypot(v.x() - 0.586, v.y() - 0.586)).isLessThan(0.3);
    }

    @Test
    void stepAtATangentPointIsMeasuredFromTheFittedCircle() {
        // blend of radius 2 whose centre sits 0.01 too far from leg A: a 0.01 step there
        Corner c = Sections.SQUARE;
        PointSet arc = Sections.section(c, 2, 0, 300, 0, 1, f -> 0);
        double[] xs = arc.x(), ys = arc.y();
        for (int i = 0; i < xs.length; i++) ys[i] += 0.01;
        PointSet pts = new PointSet(xs, ys, xs.length, "test");
        Fits f = Inspector.fitsOf(c, Blend.of(c, 2, pts, new double[xs.length], 10));
        assertThat(f.stepA()).isCloseTo(0.01, within(1e-9));
        assertThat(f.stepB()).isCloseTo(0, within(1e-9));
    }

    @Test
    void locatedProfileOfAConcentricArcDeviatesByTheRadiusDifference() {
        // A round's arc of radius r+δ about the nominal centre lies δ toward air on the blend; the legs
        // are exact, so the equal-bilateral zone needed is 2δ (twice the min-max deviation).
        PointSet pts = Sections.section(Sections.SQUARE, 2, 40, 200, 0, 1, f -> 0.01);
        var callout = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.03), Freedom.none(), false);
        InspectionResult r = inspector.inspect(Sections.request(Sections.SQUARE, 2, callout, pts));
        assertThat(r.profile().maxOutward()).isCloseTo(0.01, within(1e-12));
        assertThat(r.profile().requiredZone()).isCloseTo(0.02, within(1e-12));
        assertThat(r.pass()).isTrue();
        // the same zone unequally disposed, all inward (outward 0), cannot hold it
        var inward = new InspectionCallout.ProfileTolerance(new ProfileZone(0.03, 0), Freedom.none(), false);
        InspectionResult ri = inspector.inspect(Sections.request(Sections.SQUARE, 2, inward, pts));
        assertThat(ri.pass()).isFalse();
        assertThat(Double.isNaN(ri.profile().requiredZone())).isTrue();
    }

    @Test
    void unequallyDisposedRequiredZoneKeepsTheDisposition() {
        // all deviations 0..+0.01 toward air; a zone with 80% outward needs 0.01 / 0.8 (ASME Y14.5-2018
        // unequally disposed profile, from memory: the zone scales with its disposition kept)
        PointSet pts = Sections.section(Sections.SQUARE, 2, 40, 200, 0, 1, f -> 0.01);
        var unequal = new InspectionCallout.ProfileTolerance(new ProfileZone(0.02, 0.016), Freedom.none(), false);
        InspectionResult r = inspector.inspect(Sections.request(Sections.SQUARE, 2, unequal, pts));
        assertThat(r.profile().requiredZone()).isCloseTo(0.0125, within(1e-12));
        assertThat(r.pass()).isTrue();
        var iso = new InspectionCallout.ProfileTolerance(ProfileZone.isoOffset(0.02, 0.006), Freedom.none(), false);
        assertThat(inspector.inspect(Sections.request(Sections.SQUARE, 2, iso, pts)).profile().requiredZone())
                .isCloseTo(0.0125, within(1e-12));
        // floating in x and y with the same disposition: the zone can move, so it needs no more
        var floatingXy = new InspectionCallout.ProfileTolerance(new ProfileZone(0.02, 0.016), EnumSet.of(Freedom.X, Freedom.Y), false);
        assertThat(inspector.inspect(Sections.request(Sections.SQUARE, 2, floatingXy, pts)).profile().requiredZone())
                .isLessThanOrEqualTo(0.0125 + 1e-12);
    }

    @Test
    void generalContourGivesTheSameProfileVerdictAsTheCorner() {
        PointSet pts = Sections.section(Sections.SQUARE, 2, 30, 150, 0.002, 4, f -> 0.005 * Math.sin(2 * Math.PI * f));
        var floating = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.05), Freedom.all(), false);
        double viaCorner = inspector.inspect(Sections.request(Sections.SQUARE, 2, floating, pts)).profile().requiredZone();
        Contour chain = Sections.SQUARE.contour(2, 20);
        InspectionRequest req = new InspectionRequest(Units.MM, new Nominal.Chain(chain), floating, pts, 1e-6,
                Double.NaN, false);
        assertThat(inspector.inspect(req).profile().requiredZone()).isCloseTo(viaCorner, within(1e-9));
        InspectionRequest radius = new InspectionRequest(Units.MM, new Nominal.Chain(chain), R, pts, 1e-6,
                Double.NaN, false);
        assertThatThrownBy(() -> inspector.inspect(radius)).isInstanceOf(InputProblem.class).hasMessageContaining("needs a corner");
    }

    @Test
    void dynamicProfileAbsorbsAUniformOffset() {
        // every point 0.01 toward air (legs and blend): a uniform offset, which dynamic profile frees
        Corner c = Sections.SQUARE;
        PointSet base = Sections.section(c, 2, 40, 200, 0, 1, f -> 0.01);
        double[] xs = base.x(), ys = base.y();
        for (int i = 0; i < 40; i++) ys[i] -= 0.01;
        for (int i = 240; i < 280; i++) xs[i] -= 0.01;
        PointSet pts = new PointSet(xs, ys, xs.length, "test");
        var dyn = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.001), Freedom.none(), true);
        InspectionResult r = inspector.inspect(Sections.request(c, 2, dyn, pts));
        assertThat(r.profile().requiredZone()).isLessThan(1e-9);
        assertThat(r.profile().registration().offset()).isCloseTo(0.01, within(1e-9));
        var fixed = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.001), Freedom.none(), false);
        assertThat(inspector.inspect(Sections.request(c, 2, fixed, pts)).pass()).isFalse();
    }

    @Test
    void compositeTiersAreJudgedEachWithItsOwnFreedom() {
        // shape good, place off by 0.03: the located tier fails, the floating tier passes
        PointSet base = Sections.section(Sections.SQUARE, 2, 40, 200, 0.001, 3, f -> 0);
        double[] xs = base.x(), ys = base.y();
        for (int i = 0; i < xs.length; i++) { xs[i] += 0.03; ys[i] += 0.03; }
        var comp = new InspectionCallout.CompositeProfile(List.of(new InspectionCallout.Tier(0.05, Freedom.none()),
                new InspectionCallout.Tier(0.01, Freedom.all())));
        InspectionResult r = inspector.inspect(Sections.request(Sections.SQUARE, 2, comp, new PointSet(xs, ys, xs.length, "t")));
        assertThat(r.tiers().get(0).pass()).isFalse();
        assertThat(r.tiers().get(1).pass()).isTrue();
        assertThat(r.pass()).isFalse();
    }

    @Test
    void compareJudgesTheSameContourUnderEveryControl() {
        PointSet pts = Sections.section(Sections.SQUARE, 2, 40, 400, 0, 1, f -> flat(f, 2, 0.004));
        InspectionResult r = inspector.inspect(Sections.request(Sections.SQUARE, 2, R, pts).withCompare(true));
        assertThat(r.comparisons()).extracting(Comparison::name)
                .containsExactly("radius", "controlled radius", "profile, located", "profile, floating", "composite profile");
        assertThat(r.comparisons().get(0).pass()).isTrue();
        assertThat(r.comparisons().get(1).pass()).isFalse();
        assertThat(r.comparisons().get(0).derived()).isFalse();
        assertThat(r.comparisons().get(2).derived()).isTrue();
    }

    @Test
    void filletIsJudgedLikeARound() {
        Corner f = new Corner(new Point2(4, 4), new Point2(-1, 0), new Point2(0, -1), BlendKind.FILLET);
        PointSet pts = Sections.section(f, 2.05, 40, 300, 0, 2, x -> 0);
        InspectionResult cr = inspector.inspect(Sections.request(f, 2, CR, pts));
        assertThat(cr.pass()).isTrue();
        assertThat(cr.radius().smallest()).isCloseTo(2.05, within(1e-9));
        var located = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.2), Freedom.none(), false);
        // a fillet of larger radius adds material near the vertex: positive (toward air) deviation
        assertThat(inspector.inspect(Sections.request(f, 2, located, pts)).profile().maxOutward()).isPositive();
    }

    @Test
    void tooFewOrNoPointsAreBadInput() {
        assertThatThrownBy(() -> inspector.inspect(Sections.request(Sections.SQUARE, 2, R, new PointSet(new double[0], new double[0], 0, "t"))))
                .isInstanceOf(InputProblem.class).hasMessageContaining("no points");
        assertThatThrownBy(() -> inspector.inspect(Sections.request(Sections.SQUARE, 2, R,
                new PointSet(new double[] {1, 0}, new double[] {0, 1}, 2, "t"))))
                .isInstanceOf(InputProblem.class).hasMessageContaining("too few");
    }

    @Test
    void collinearPointsGiveNoBlendAndAreBadInput() {
        double[] xs = {3, 2.5, 2, 1.5, 1, 0.5}, ys = {0, 0, 0, 0, 0, 0};
        assertThatThrownBy(() -> inspector.inspect(Sections.request(Sections.SQUARE, 2, R, new PointSet(xs, ys, 6, "t"))))
                .isInstanceOf(InputProblem.class).hasMessageContaining("blend");
    }
}
