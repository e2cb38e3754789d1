package org.arcwright.simulate;

import java.util.List;
import java.util.Objects;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.io.InputProblem;

/**
 * A simulation to run: the process, the function's needs, the candidate callouts and the run size.
 *
 * @param model the process model
 * @param needs what the function asks of the true blend
 * @param callouts candidate callouts, at least one
 * @param parts number of parts, >= 1
 * @param seed random seed: the same seed gives the same counts on any number of threads
 * @param resolution the inspection's resolution (see {@link org.arcwright.inspect.InspectionRequest})
 * @param window the CR window length; NaN for the inspection's default
 */
public record Simulation(ProcessModel model, Needs needs, List<InspectionCallout> callouts, int parts, long seed,
                         double resolution, double window) {
    /** Parts simulated when neither the file nor the command says. */
    public static final int DEFAULT_PARTS = 10_000;

    public Simulation {
        Objects.requireNonNull(model, "model");
        if (needs == null) throw InputProblem.ofField("needs", "missing; give at least minRadius and maxRadius");
        if (callouts == null || callouts.isEmpty()) throw InputProblem.ofField("callouts", "missing or empty; give at least one callout");
        callouts = List.copyOf(callouts);
        if (parts < 1) throw InputProblem.ofField("parts", "must be at least 1, got " + parts);
        if (!(resolution > 0) || !Double.isFinite(resolution)) throw InputProblem.ofField("resolution", "must be above zero, got " + resolution);
        if (!Double.isNaN(window) && !(window > 0 && Double.isFinite(window))) throw InputProblem.ofField("window", "must be above zero, got " + window);
    }

    /**
     * The inspection's slack when the file does not set it: three standard deviations of the measuring
     * noise, at least the units' resolution. A point within it of a surface counts as on it, so noise
     * alone does not reject a perfect blend; the verdicts then favour acceptance by up to that slack
     * (no guard band in the sense of ISO 14253-1). Set {@code resolution} in the file to judge tighter.
     */
    public static double defaultResolution(ProcessModel m) {
        return Math.max(m.units().resolution(), 3 * m.noise());
    }

    public Simulation withParts(int n) { return new Simulation(model, needs, callouts, n, seed, resolution, window); }

    public Simulation withSeed(long s) { return new Simulation(model, needs, callouts, parts, s, resolution, window); }

    public Simulation withModel(ProcessModel m) { return new Simulation(m, needs, callouts, parts, seed, resolution, window); }

    public Simulation withCallouts(List<InspectionCallout> c) { return new Simulation(model, needs, c, parts, seed, resolution, window); }
}
