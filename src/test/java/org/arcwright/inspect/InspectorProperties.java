package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.arcwright.zone.ProfileZone;

/** Properties of the inspector that hold for any rigid placement of the measured points. */
class InspectorProperties {
    private final Inspector inspector = new Inspector();

    @Property(tries = 12, seed = "11")
    void rigidlyMovingTheContourChangesNothingWhenAllFreedomsAreFree(
            @ForAll @DoubleRange(min = -0.2, max = 0.2) double dx, @ForAll @DoubleRange(min = -0.2, max = 0.2) double dy,
            @ForAll @DoubleRange(min = -3, max = 3) double turnDeg) {
        // Analytic: the floating zone fits the shape, not its place.
        PointSet pts = Sections.section(Sections.SQUARE, 2, 30, 150, 0.002, 5, f -> 0.01 * Math.sin(3 * Math.PI * f));
        var floating = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.05), Freedom.all(), false);
        double before = inspector.inspect(Sections.request(Sections.SQUARE, 2, floating, pts)).profile().requiredZone();
        double t = Math.toRadians(turnDeg), c = Math.cos(t), s = Math.sin(t);
        double[] xs = new double[pts.size()], ys = new double[pts.size()];
        for (int i = 0; i < xs.length; i++) {
            double x = pts.xs()[i] - 1, y = pts.ys()[i] - 1;
            xs[i] = 1 + c * x - s * y + dx;
            ys[i] = 1 + s * x + c * y + dy;
        }
        InspectionResult after = inspector.inspect(Sections.request(Sections.SQUARE, 2, floating,
                new PointSet(xs, ys, xs.length, "moved")));
        assertThat(after.profile().requiredZone()).isCloseTo(before, within(1e-9));
        assertThat(after.profile().registration().rotationDeg()).isCloseTo(-turnDeg, within(0.5));
    }
}
