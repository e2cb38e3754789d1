package org.arcwright.simulate;

import java.util.List;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;

/** Invented process figures for the tests (not any shop's data). */
final class Models {
    static final Corner FILLET_90 = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.FILLET);

    private Models() {}

    static InspectionCallout r(double min, double max) { return new InspectionCallout.RadiusLimits(RadiusKind.R, min, max); }

    static InspectionCallout cr(double min, double max) { return new InspectionCallout.RadiusLimits(RadiusKind.CR, min, max); }

    static InspectionCallout located(double zone) {
        return new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(zone), Freedom.none(), false);
    }

    static InspectionCallout floating(double zone) {
        return new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(zone), Freedom.all(), false);
    }

    /** Radius scatter only: perfect arcs, no noise. */
    static ProcessModel radiusOnly(double mean, double sd, int points) {
        return new ProcessModel(Units.MM, FILLET_90, 2.0, new ProcessModel.Scatter(mean, sd), 0, null, null, 0, points);
    }

    /** The invented process of examples/simulate/pump-bracket.json with position scatter added. */
    static ProcessModel everything() {
        return new ProcessModel(Units.MM, FILLET_90, 2.0, new ProcessModel.Scatter(2.02, 0.05), 0.01,
                new ProcessModel.Flats(0.1, 0.1, 0.2, 0.4, 0.6), new ProcessModel.Steps(0.05, 0.005, 0.03), 0.001, 60);
    }

    static Simulation simulation(ProcessModel m, Needs needs, List<InspectionCallout> callouts, int parts, long seed) {
        return new Simulation(m, needs, callouts, parts, seed, Simulation.defaultResolution(m), Double.NaN);
    }
}
