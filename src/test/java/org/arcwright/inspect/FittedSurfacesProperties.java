package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.EnumSet;
import java.util.Set;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.LongRange;
import net.jqwik.api.constraints.Scale;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.zone.Corner;
import org.arcwright.zone.ProfileZone;

/** Properties of inspection on fitted adjacent surfaces: rigid motion, verdicts against their worst point, the envelope shown. */
class FittedSurfacesProperties {
    private final Inspector inspector = new Inspector();

    private static final Corner SQUARE = Sections.SQUARE;

    private static final InspectionCallout R = new InspectionCallout.RadiusLimits(RadiusKind.R, 1.9, 2.1);

    private static final InspectionCallout CR = new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.9, 2.1);

    @Property(tries = 25, seed = "15")
    void rigidMotionLeavesRadiusControlledRadiusAndFloatingProfileUnchanged(
            @ForAll @DoubleRange(min = -0.05, max = 0.05) double dx, @ForAll @DoubleRange(min = -0.05, max = 0.05) double dy,
            @ForAll @DoubleRange(min = -1, max = 1) double turnDeg, @ForAll @LongRange(min = 1, max = 1000) long seed) {
        // rigid motion does not change the part; only the datum frame locates it (ASME Y14.5-2018 /
        // ISO 1101, from memory): R, CR and a profile without datums must not see it.
        PointSet pts = Sections.section(SQUARE, 2.02, 60, 600, 0.0002, seed, f -> 0.003 * Math.sin(3 * Math.PI * f));
        PointSet turned = FittedSurfacesTest.moved(pts, dx, dy, turnDeg, 1, 1);
        InspectionCallout floating = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.03), EnumSet.allOf(Freedom.class), false);
        for (InspectionCallout k : new InspectionCallout[] {R, CR, floating}) {
            InspectionResult a = inspector.inspect(FittedSurfacesTest.request(SQUARE, 2, k, pts, 0.001));
            InspectionResult b = inspector.inspect(FittedSurfacesTest.request(SQUARE, 2, k, turned, 0.001));
            assertThat(b.verdict()).as(k.describe()).isEqualTo(a.verdict());
            if (a.radius() != null) {
                assertThat(b.radius().smallest()).isCloseTo(a.radius().smallest(), within(1e-6));
                assertThat(b.radius().largest()).isCloseTo(a.radius().largest(), within(1e-6));
                assertThat(b.fits().stepA()).isCloseTo(a.fits().stepA(), within(1e-6));
            }
            if (a.controlled() != null) {
                assertThat(b.controlled().localMin()).isCloseTo(a.controlled().localMin(), within(1e-6));
                assertThat(b.controlled().localMax()).isCloseTo(a.controlled().localMax(), within(1e-6));
            }
            if (a.profile() != null) assertThat(b.profile().requiredZone()).isCloseTo(a.profile().requiredZone(), within(1e-7));
        }
        // the located profile is free to change: it reads the datum frame, which the motion moved
    }

    @Property(tries = 40, seed = "13")
    void aVerdictNeverContradictsItsWorstPoint(@ForAll @DoubleRange(min = 1.8, max = 2.2) double radius,
                                               @ForAll @DoubleRange(min = 0, max = 0.003) @Scale(6) double noise,
                                               @ForAll @DoubleRange(min = 1e-6, max = 0.02) @Scale(7) double resolution,
                                               @ForAll @DoubleRange(min = 0.005, max = 0.06) @Scale(5) double zone,
                                               @ForAll @LongRange(min = 1, max = 1000) long seed) {
        PointSet pts = Sections.section(SQUARE, radius, 30, 200, noise, seed, f -> 0.002 * Math.cos(5 * f));
        InspectionCallout[] callouts = {R, CR,
                new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(zone), EnumSet.allOf(Freedom.class), false),
                new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(zone), Set.of(), false)};
        for (InspectionCallout k : callouts) {
            InspectionResult r;
            try {
                r = inspector.inspect(FittedSurfacesTest.request(SQUARE, 2, k, pts, resolution));
            } catch (InputProblem p) {
                continue; // e.g. a resolution above a tenth of the band: refused, never judged
            }
            if (r.worst() != null && r.worst().excess() > resolution) assertThat(r.verdict()).isNotEqualTo(Verdict.PASS);
            if (r.verdict() == Verdict.PASS && r.worst() != null) assertThat(r.worst().excess()).isLessThanOrEqualTo(resolution);
        }
    }

    @Property(tries = 30, seed = "6")
    void aCalloutAtTheEnvelopeShownAlwaysPasses(@ForAll @DoubleRange(min = 1.85, max = 2.15) double radius,
                                               @ForAll @DoubleRange(min = 0, max = 0.004) @Scale(6) double form,
                                               @ForAll @LongRange(min = 1, max = 1000) long seed) {
        PointSet pts = Sections.section(SQUARE, radius, 30, 300, 0.0003, seed, f -> form * Math.sin(4 * f));
        InspectionResult r = inspector.inspect(FittedSurfacesTest.request(SQUARE, 2, new InspectionCallout.RadiusLimits(RadiusKind.R, 1.5, 2.5), pts, 1e-4));
        if (!(r.radius().smallest() < r.radius().largest())) return;
        double lo = Double.parseDouble(Inspector.down(r.radius().smallest(), 1e-4));
        double hi = Double.parseDouble(Inspector.up(r.radius().largest(), 1e-4));
        if (hi - lo < 1e-3 || lo > 2 || hi < 2) return; // a callout must leave room for the resolution cap and hold the nominal
        InspectionResult again = inspector.inspect(FittedSurfacesTest.request(SQUARE, 2, new InspectionCallout.RadiusLimits(RadiusKind.R, lo, hi), pts, 1e-4));
        assertThat(again.verdict()).isEqualTo(Verdict.PASS);
    }
}
