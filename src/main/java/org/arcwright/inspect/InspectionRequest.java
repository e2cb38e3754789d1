package org.arcwright.inspect;

import java.util.Objects;
import org.arcwright.tolerance.Units;

/**
 * Everything an inspection needs: what the shoulds are and what was measured. Built by
 * {@link InspectionFiles} from a file, or directly by the desktop app.
 *
 * @param units drawing units of every length
 * @param nominal the nominal contour
 * @param callout what the section is judged against
 * @param points the measured points, in the nominal's coordinates
 * @param resolution distance below which a point counts as on a surface where a zone narrows to
 *     nothing, and the slack of every verdict; default {@link Units#resolution()}
 * @param window CR window length along the nominal contour; NaN for the default
 * @param compare whether to judge the same points under every applicable callout as well
 */
public record InspectionRequest(Units units, Nominal nominal, InspectionCallout callout, PointSet points,
                                double resolution, double window, boolean compare) {
    public InspectionRequest {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(nominal, "nominal");
        Objects.requireNonNull(callout, "callout");
        Objects.requireNonNull(points, "points");
        if (!(resolution > 0) || !Double.isFinite(resolution)) {
            throw org.arcwright.io.InputProblem.ofField("resolution", "must be above zero, got " + resolution);
        }
        if (!Double.isNaN(window) && !(window > 0 && Double.isFinite(window))) {
            throw org.arcwright.io.InputProblem.ofField("window", "must be above zero, got " + window);
        }
    }

    /** The same request, with or without the comparison. */
    public InspectionRequest withCompare(boolean c) {
        return new InspectionRequest(units, nominal, callout, points, resolution, window, c);
    }

    /** The same request with another CR window. */
    public InspectionRequest withWindow(double w) {
        return new InspectionRequest(units, nominal, callout, points, resolution, w, compare);
    }

    /** The same request judged against another callout. */
    public InspectionRequest withCallout(InspectionCallout c) {
        return new InspectionRequest(units, nominal, c, points, resolution, window, false);
    }
}
