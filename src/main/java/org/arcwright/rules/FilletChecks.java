package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import java.util.List;
import java.util.Optional;

/**
 * The mechanics the advisor needs, behind a seam: stress concentration at the radius limits, the
 * smallest radius that meets a target, and whether a fillet seats under its mating corner. The
 * implementation over {@code org.arcwright.mechanics} is {@link MechanicsChecks}; tests may pass
 * stand-ins. Every answer is empty when the case lacks the inputs.
 */
public interface FilletChecks {

    /** K<sub>t</sub> (and K<sub>f</sub> with a strength) at {@code rMin} and {@code rMax}; needs the case's stress section. */
    Optional<StressFigures> stress(DesignCase c, double rMin, double rMax);

    /** The smallest radius that keeps the case's governing stress target (the largest of {@link #minimumRadii}). */
    Optional<MinimumRadiusFigure> minimumRadius(DesignCase c);

    /**
     * The smallest radius for each stress target the case states ({@code targetKt} as K<sub>t</sub>,
     * {@code targetKf} as K<sub>f</sub>); by default the single governing figure.
     */
    default List<MinimumRadiusFigure> minimumRadii(DesignCase c) {
        return minimumRadius(c).map(List::of).orElse(List.of());
    }

    /** Whether a fillet of radius up to {@code rMax} lets the mating part seat; needs the case's mating corner. */
    Optional<SeatingFigure> seating(DesignCase c, double rMax);

    /** The cautions that go with stress figures. */
    List<String> stressCautions();

    /** The cautions that go with seating figures. */
    List<String> seatingCautions();

    /** Checks nothing. */
    FilletChecks NONE = new FilletChecks() {
        public Optional<StressFigures> stress(DesignCase c, double rMin, double rMax) { return Optional.empty(); }
        public Optional<MinimumRadiusFigure> minimumRadius(DesignCase c) { return Optional.empty(); }
        public Optional<SeatingFigure> seating(DesignCase c, double rMax) { return Optional.empty(); }
        public List<String> stressCautions() { return List.of(); }
        public List<String> seatingCautions() { return List.of(); }
    };

    /**
     * Stress concentration across the limits.
     *
     * @param ktAtMin K<sub>t</sub> at the smallest radius (the one that governs)
     * @param ktAtMax K<sub>t</sub> at the largest radius
     * @param kfAtMin K<sub>f</sub> at the smallest radius, or null without a strength
     * @param kfAtMax K<sub>f</sub> at the largest radius, or null
     * @param withinFit false when a figure was extrapolated beyond the fit
     * @param method the fit and source used
     * @param notes extrapolations and clamps, in words
     */
    record StressFigures(double ktAtMin, double ktAtMax, Double kfAtMin, Double kfAtMax, boolean withinFit,
                         String method, List<String> notes) {
        public StressFigures {
            notes = List.copyOf(notes);
        }

        /** K<sub>f</sub> at the minimum when known, else K<sub>t</sub>. */
        public double governingAtMin() { return kfAtMin != null ? kfAtMin : ktAtMin; }
    }

    /**
     * The smallest radius meeting a target.
     *
     * @param factor {@code Kt} or {@code Kf}
     * @param target the target value
     * @param found whether a radius up to the step height meets it
     * @param radius that radius, NaN when not found
     * @param message the answer in words
     */
    record MinimumRadiusFigure(String factor, double target, boolean found, double radius, String message) {}

    /**
     * The seating verdict.
     *
     * @param seats true when the largest fillet clears the mating corner
     * @param margin clearance left at the largest fillet (negative when it fouls), in the case's units
     * @param largestRadius the largest fillet radius that still seats
     * @param message the verdict in words
     */
    record SeatingFigure(boolean seats, double margin, double largestRadius, String message) {}
}
