package org.arcwright.services;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import org.arcwright.callout.Callout;
import org.arcwright.callout.ProfileTier;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointSet;
import org.arcwright.io.InputProblem;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.CapabilityTable;
import org.arcwright.rules.Need;
import org.arcwright.rules.Recommendation;
import org.arcwright.simulate.CalloutResult;
import org.arcwright.simulate.Example;
import org.arcwright.simulate.Needs;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.simulate.Share;
import org.arcwright.simulate.Simulation;
import org.arcwright.simulate.SimulationResult;
import org.arcwright.simulate.SimulationRunner;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;

/**
 * Simulations built from a design case and its advice, the one adapter behind {@code advise --simulate}
 * and the desktop's Simulation view, so that the same feature and seed give the same figures in both.
 *
 * <p>Mapping (the adapter's whole job): the radius floor (largest of the floors) becomes
 * {@code minRadius}, the radius ceiling (smallest of the ceilings) {@code maxRadius}; form and location
 * needs are not radius limits and are reported as not judged. Callouts: R and CR as radius limits; a
 * profile floats without datums and is located with them (a 2-D section has no partial datum frame to
 * honour); a composite profile's lower tiers keep rotation fixed and translation free when they repeat
 * datums (refinement of orientation, ASME Y14.5-2018 composite profile, from memory). Not simulated: a
 * title-block general tolerance (not a callout on this blend) and a profile with a radius refinement
 * (two callouts judged together; the runner judges one at a time). The process is the pack's default
 * model for the case's process, its radius scatter the capability table's ± over the table's divisor.
 * Each candidate is judged on its own population of the same seed; R and CR limits off the nominal are
 * judged with the process aimed at their middle (a shop centres on the drawn band, common practice).
 */
public final class CaseSimulations {
    /** Parts when none are asked for: small enough for an interactive answer. */
    public static final int DEFAULT_PARTS = 2_000;
    /** The fixed seed: the same case gives the same figures on every run and machine. */
    public static final long DEFAULT_SEED = 19;
    /** Why a title-block general tolerance is not simulated. */
    public static final String GENERAL_NOT_SIMULATED = "a title-block general tolerance is no callout on this blend; its range is "
            + "judged by the size check, not simulated here";
    /** Why a profile with a radius refinement is not simulated. */
    public static final String REFINED_NOT_SIMULATED = "a profile with a radius refinement is judged by two callouts together; "
            + "the simulation judges one callout at a time";

    private CaseSimulations() {}

    /**
     * The needs a simulation can judge on the true blend.
     *
     * @param floor the largest radius floor, 0 when there is none
     * @param ceiling the smallest radius ceiling, infinite when there is none
     * @param notJudged the other needs, each with why it is not judged
     */
    public record JudgedNeeds(double floor, double ceiling, List<String> notJudged) {
        public JudgedNeeds {
            notJudged = List.copyOf(notJudged);
        }

        /** The simulation's needs. */
        public Needs needs() { return new Needs(floor, ceiling, Double.NaN, Double.NaN); }

        /** The floor lies above the ceiling: no part can be functionally good. */
        public boolean contradictory() { return floor > ceiling; }

        /** Neither floor nor ceiling: every part is functionally good, escapes are 0 by construction. */
        public boolean none() { return floor == 0 && Double.isInfinite(ceiling); }
    }

    /** The radius floor and ceiling among {@code needs}; the rest listed as not judged. */
    public static JudgedNeeds needs(List<Need> needs) {
        double floor = 0, ceiling = Double.POSITIVE_INFINITY;
        List<String> notJudged = new ArrayList<>();
        for (Need n : needs) {
            if (n.id() == Need.Kind.RADIUS_FLOOR && n.min() != null) floor = Math.max(floor, n.min());
            else if (n.id() == Need.Kind.RADIUS_CEILING && n.max() != null) ceiling = Math.min(ceiling, n.max());
            else notJudged.add(n.key() + " (not a radius limit the simulation can check on the true blend)");
        }
        return new JudgedNeeds(floor, ceiling, notJudged);
    }

    /**
     * The default process model of a case.
     *
     * @param table the pack table it comes from
     * @param model the model, aimed at the case's nominal radius
     * @param plusMinus the ± the radius scatter is derived from, case units
     * @param fromCapability whether that ± comes from the capability table (else 10 % of the nominal)
     */
    public record CaseProcess(ProcessDefaults table, ProcessModel model, double plusMinus, boolean fromCapability) {
        public CaseProcess {
            Objects.requireNonNull(table, "table");
            Objects.requireNonNull(model, "model");
        }

        /** The radius standard deviation, case units. */
        public double radiusSd() { return plusMinus / table.radiusSdDivisor(); }

        /** The table's id and source, as a report names it. */
        public String source() { return table.id() + " (" + table.source() + ")"; }
    }

    /**
     * The pack's default process model for the case's process, radius normal about the nominal with
     * sd = capability ± / the table's divisor (10 % of the nominal as ± when the capability table has
     * no entry).
     *
     * @param capability the capability table, or null for none
     * @throws InputProblem when the table has no model for the case's process
     */
    public static CaseProcess process(DesignCase c, ProcessDefaults table, CapabilityTable capability) {
        double mmPer = c.units().millimetres();
        Optional<Double> pmMm = capability == null ? Optional.empty() : capability.plusMinusMm(c.process(), c.nominalRadius() * mmPer);
        double pm = pmMm.map(t -> t / mmPer).orElse(c.nominalRadius() * 0.1);
        return new CaseProcess(table, table.model(c.process().key(), c.units(), corner(c), c.nominalRadius(), pm), pm, pmMm.isPresent());
    }

    /** The case's corner: leg A along x, leg B at the corner angle, material as the blend kind says. */
    public static Corner corner(DesignCase c) {
        double a = Math.toRadians(c.cornerAngleDegrees());
        return new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(Math.cos(a), Math.sin(a)), c.kind());
    }

    /** The inspection callout judging the same thing, or null when there is none. */
    public static InspectionCallout toInspection(Callout callout) {
        if (callout instanceof Callout.SizeLimits s) {
            return new InspectionCallout.RadiusLimits(s.radiusKind(), s.min(), s.max());
        }
        if (callout instanceof Callout.Profile p) {
            ProfileZone z = p.outward() == null ? ProfileZone.bilateral(p.zone()) : new ProfileZone(p.zone(), p.outward());
            Set<Freedom> free = p.datums().isEmpty() ? EnumSet.allOf(Freedom.class) : EnumSet.noneOf(Freedom.class);
            return new InspectionCallout.ProfileTolerance(z, free, p.dynamic());
        }
        if (callout instanceof Callout.CompositeProfile cp) {
            List<InspectionCallout.Tier> tiers = new ArrayList<>();
            for (int i = 0; i < cp.tiers().size(); i++) {
                ProfileTier t = cp.tiers().get(i);
                Set<Freedom> free = t.datums().isEmpty() ? EnumSet.allOf(Freedom.class)
                        : i == 0 ? EnumSet.noneOf(Freedom.class) : EnumSet.of(Freedom.X, Freedom.Y);
                tiers.add(new InspectionCallout.Tier(t.zone(), free));
            }
            return new InspectionCallout.CompositeProfile(tiers);
        }
        return null;
    }

    /**
     * The model a callout is judged on: {@code base} itself, or, when {@code aim} and the callout's R or
     * CR limits are off the base's nominal, the same process aimed at the middle of those limits (its
     * nominal there, its mean offset from that nominal as the base's is).
     */
    public static ProcessModel aimedFor(ProcessModel base, Callout callout, boolean aim) {
        if (!aim || !(callout instanceof Callout.SizeLimits lim) || lim.min() + lim.max() == 2 * base.nominalRadius()) return base;
        double mid = (lim.min() + lim.max()) / 2;
        double offset = base.radius().mean() - base.nominalRadius();
        return new ProcessModel(base.units(), base.corner(), mid, new ProcessModel.Scatter(mid + offset, base.radius().sd()),
                base.positionSd(), base.flat(), base.step(), base.noise(), base.points());
    }

    /**
     * One candidate callout of a case.
     *
     * @param recommendation the card it comes from
     * @param chosen whether it is the feature's chosen callout
     * @param callout the inspection callout judging it; null when not simulated
     * @param model the process it is judged on; null when not simulated
     * @param notSimulated why it is not simulated; null when it is
     */
    public record Candidate(Recommendation recommendation, boolean chosen, InspectionCallout callout, ProcessModel model,
                            String notSimulated) {
        public Candidate {
            Objects.requireNonNull(recommendation, "recommendation");
            if ((callout == null) != (notSimulated != null)) throw new IllegalArgumentException("a callout or a reason, not both");
        }

        /** Whether its process is aimed off the case's nominal (see {@link #aimedFor}). */
        public boolean aimedOff(ProcessModel base) { return model != null && model != base; }
    }

    /**
     * The candidates of a case: each recommendation in order, then {@code chosen} when no
     * recommendation proposes its callout (a recommendation that does is marked chosen instead).
     *
     * @param chosen the feature's chosen card, or null
     * @param base the case's process model (edited or not)
     * @param aim whether R and CR limits off the nominal are judged with the process aimed at their middle
     */
    public static List<Candidate> candidates(List<Recommendation> recommendations, Recommendation chosen, ProcessModel base, boolean aim) {
        List<Candidate> out = new ArrayList<>();
        boolean chosenSeen = false;
        for (Recommendation r : recommendations) {
            boolean isChosen = chosen != null && !chosenSeen && r.callout().equals(chosen.callout());
            chosenSeen |= isChosen;
            out.add(candidate(r, isChosen, base, aim));
        }
        if (chosen != null && !chosenSeen) out.add(candidate(chosen, true, base, aim));
        return List.copyOf(out);
    }

    private static Candidate candidate(Recommendation r, boolean chosen, ProcessModel base, boolean aim) {
        if (r.refinement() != null) return new Candidate(r, chosen, null, null, REFINED_NOT_SIMULATED);
        InspectionCallout ic = toInspection(r.callout());
        if (ic == null) {
            String why = r.callout() instanceof Callout.General ? GENERAL_NOT_SIMULATED : "no inspection equivalent for " + r.callout().typeName();
            return new Candidate(r, chosen, null, null, why);
        }
        return new Candidate(r, chosen, ic, aimedFor(base, r.callout(), aim), null);
    }

    /**
     * One candidate after the run.
     *
     * @param candidate what was judged
     * @param result its population and record; null when not simulated
     * @param notSimulated why there is no result; null when there is
     */
    public record Judged(Candidate candidate, SimulationResult result, String notSimulated) {
        public Judged {
            Objects.requireNonNull(candidate, "candidate");
            if ((result == null) == (notSimulated == null)) throw new IllegalArgumentException("a result or a reason, not both");
        }

        /** The callout's record, or null. */
        public CalloutResult callout() { return result == null ? null : result.callouts().get(0); }

        /** Parts of its population meeting the needs, or null. */
        public Share good() { return result == null ? null : result.goodShare(); }
    }

    /**
     * Judges every simulable candidate on its own population of {@code parts} parts from {@code seed}
     * (each callout judged with {@link Simulation#defaultResolution(ProcessModel, InspectionCallout) its default resolution}, the default CR window).
     *
     * @param progress told of parts done over all candidates together
     * @param cancelled polled between parts
     * @throws CancellationException when cancelled
     */
    public static List<Judged> run(List<Candidate> candidates, Needs needs, int parts, long seed, SimulationRunner runner,
                                   SimulationRunner.Progress progress, BooleanSupplier cancelled) {
        long simulable = candidates.stream().filter(c -> c.callout() != null).count();
        long total = simulable * parts;
        List<Judged> out = new ArrayList<>();
        long offset = 0;
        for (Candidate c : candidates) {
            if (c.callout() == null) {
                out.add(new Judged(c, null, c.notSimulated()));
                continue;
            }
            Simulation sim = new Simulation(c.model(), needs, List.of(c.callout()), parts, seed, Double.NaN, Double.NaN);
            long before = offset;
            try {
                out.add(new Judged(c, runner.run(sim, (done, all) -> progress.partsDone(before + done, total), cancelled), null));
            } catch (InputProblem p) {
                out.add(new Judged(c, null, "the inspection cannot judge even the nominal part: " + p.getMessage()));
            }
            offset += parts;
        }
        return List.copyOf(out);
    }

    /** Runs every simulable candidate on all cores, without progress or cancellation. */
    public static List<Judged> run(List<Candidate> candidates, Needs needs, int parts, long seed) {
        return run(candidates, needs, parts, seed, SimulationRunner.allCores(), SimulationRunner.Progress.NONE, () -> false);
    }

    /**
     * An example part judged again by the inspection, as the run judged it, for a plot of its section in
     * the zone.
     */
    public static InspectionResult inspect(SimulationResult result, Example example) {
        Simulation sim = result.simulation();
        ProcessModel m = sim.model();
        PointSet pts = example.section();
        InspectionRequest q = new InspectionRequest(m.units(), new Nominal.CornerBlend(m.corner(), m.nominalRadius()),
                sim.callouts().get(0), pts, sim.resolutionFor(sim.callouts().get(0)), sim.window(), false);
        return new Inspector().inspect(q);
    }
}
