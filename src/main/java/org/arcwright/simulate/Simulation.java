package org.arcwright.simulate;

import java.util.List;
import java.util.Objects;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * A simulation to run: the process, the function's needs, the candidate callouts and the run size.
 *
 * @param model the process model
 * @param needs what the function asks of the true blend
 * @param callouts candidate callouts, at least one
 * @param parts number of parts, >= 1
 * @param seed random seed: the same seed gives the same counts on any number of threads
 * @param resolution the inspection's resolution (see {@link org.arcwright.inspect.InspectionRequest}); NaN for
 *        {@link #defaultResolution(ProcessModel, InspectionCallout) the default} of each callout
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
        if (!Double.isNaN(resolution) && (!(resolution > 0) || !Double.isFinite(resolution))) {
            throw InputProblem.ofField("resolution", "must be above zero, got " + DecimalText.exact(resolution));
        }
        if (!Double.isNaN(window) && !(window > 0 && Double.isFinite(window))) throw InputProblem.ofField("window", "must be above zero, got " + DecimalText.exact(window));
    }

    /** Chance, at most, that measuring noise alone puts any point of a perfect section beyond the default slack. */
    public static final double NOISE_ALONE_REJECTS = 0.001;

    /**
     * The inspection's slack when the file does not set it: {@code z·σ} for measuring noise {@code σ},
     * with {@code z = √(2 ln(2N/α))} for a section of {@code N} points and {@code α} =
     * {@value #NOISE_ALONE_REJECTS}, and at least the units' resolution. By the Chernoff bound on the
     * normal tail, {@code P(|e| > zσ) ≤ 2 exp(-z²/2)}, and the union bound over the points, a perfect
     * blend's points all lie within it of its true surfaces with probability at least {@code 1 - α}
     * (5.1σ for 200 points). The adjacent surfaces the inspection fits carry scatter of their own,
     * which is why α is small: with α = 1 % still about 1.2 % of perfect R2 blends with 1 µm noise
     * were rejected, and with a fixed 3σ about 8 %, each at a point beside a tangent point, where the
     * radius zone narrows to nothing. A point
     * within the slack of a surface counts as on it, so the verdicts favour acceptance by up to that
     * slack (no guard band in the sense of ISO 14253-1). Set {@code resolution} in the file to judge
     * tighter.
     */
    public static double defaultResolution(ProcessModel m) {
        double z = Math.sqrt(2 * Math.log(2.0 * m.points() / NOISE_ALONE_REJECTS));
        return Math.max(m.units().resolution(), z * m.noise());
    }

    /**
     * {@link #defaultResolution(ProcessModel)}, but never above the share of a radius callout's band
     * the inspection accepts ({@link InspectionRequest#RESOLUTION_SHARE}): a band too narrow for the
     * measuring noise is then still judged, and its false rejects and undecided parts show it.
     */
    public static double defaultResolution(ProcessModel m, InspectionCallout c) {
        double r = defaultResolution(m);
        if (c instanceof InspectionCallout.RadiusLimits rl) r = Math.min(r, InspectionRequest.RESOLUTION_SHARE * (rl.max() - rl.min()));
        return r;
    }

    /** The resolution callout {@code c} is judged with: the stated one, else its default. */
    public double resolutionFor(InspectionCallout c) {
        return Double.isNaN(resolution) ? defaultResolution(model, c) : resolution;
    }

    public Simulation withParts(int n) { return new Simulation(model, needs, callouts, n, seed, resolution, window); }

    public Simulation withSeed(long s) { return new Simulation(model, needs, callouts, parts, s, resolution, window); }

    public Simulation withModel(ProcessModel m) { return new Simulation(m, needs, callouts, parts, seed, resolution, window); }

    public Simulation withCallouts(List<InspectionCallout> c) { return new Simulation(model, needs, c, parts, seed, resolution, window); }
}
