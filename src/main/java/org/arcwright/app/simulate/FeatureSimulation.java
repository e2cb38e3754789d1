package org.arcwright.app.simulate;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Recommendation;
import org.arcwright.services.CaseSimulations;
import org.arcwright.services.Practice;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.worksheet.RadiusFeature;

/**
 * What the Simulation view simulates for one worksheet feature, built without a screen: the advisor's
 * recommendations for the feature's case and its chosen callout, the needs the simulation can judge
 * and the pack's default process model for its process, all through {@link CaseSimulations}, the
 * builder {@code advise --simulate} uses, so the view and the command give the same figures.
 *
 * @param feature the feature as it stood when this was built
 * @param needs the needs judged and those not judged
 * @param recommendations the advisor's cards, best first
 * @param process the default process model, or null when there is none (see {@code unavailable})
 * @param unavailable why nothing can be simulated, or null
 */
public record FeatureSimulation(RadiusFeature feature, CaseSimulations.JudgedNeeds needs, List<Recommendation> recommendations,
                                CaseSimulations.CaseProcess process, String unavailable) {
    public FeatureSimulation {
        Objects.requireNonNull(feature, "feature");
        recommendations = List.copyOf(recommendations);
        if ((process == null) == (unavailable == null)) throw new IllegalArgumentException("a process or a reason, not both");
    }

    /**
     * Advises the feature's case with the practice's advisor and finds its process model.
     *
     * @param table the practice's process-model table, if any
     */
    public static FeatureSimulation of(RadiusFeature f, Practice practice, Optional<ProcessDefaults> table) {
        DesignCase c = f.designCase();
        Advice advice = practice.advisor().advise(c);
        CaseSimulations.JudgedNeeds needs = CaseSimulations.needs(advice.needs());
        if (table.isEmpty()) {
            return new FeatureSimulation(f, needs, advice.recommendations(), null, "No practice pack provides a "
                    + ProcessDefaults.KIND + " table, so there is no process model to simulate.");
        }
        if (needs.contradictory()) {
            return new FeatureSimulation(f, needs, advice.recommendations(), null, "The radius floor lies above the ceiling: no part "
                    + "can be functionally good, so there is nothing to simulate. The Decide view says what would work.");
        }
        try {
            return new FeatureSimulation(f, needs, advice.recommendations(), CaseSimulations.process(c, table.get(),
                    practice.book().capability()), null);
        } catch (InputProblem p) {
            return new FeatureSimulation(f, needs, advice.recommendations(), null, "No process model: " + p.getMessage());
        }
    }

    /** The figures the view starts from: the default model, {@link CaseSimulations#DEFAULT_PARTS} parts, seed {@link CaseSimulations#DEFAULT_SEED}. */
    public Figures defaults() {
        ProcessModel m = process.model();
        return new Figures(m.radius().mean(), m.radius().sd(), m.positionSd(), m.flat().rate(), m.step().rate(), m.noise(), m.points(),
                CaseSimulations.DEFAULT_PARTS, CaseSimulations.DEFAULT_SEED);
    }

    /** The candidates under {@code figures}, the chosen callout marked (R and CR off the nominal aimed at, as the CLI does). */
    public List<CaseSimulations.Candidate> candidates(Figures figures) {
        return CaseSimulations.candidates(recommendations, feature.chosen(), figures.model(process.model()), true);
    }

    /**
     * The figures an engineer may change, lengths in the case's units, rates as fractions of parts.
     *
     * @param radiusMean mean of the true radius
     * @param radiusSd its standard deviation
     * @param positionSd position scatter per axis
     * @param flatRate share of parts with a flat
     * @param stepRate share of parts with a step
     * @param noise measuring noise along the normal (1 sd)
     * @param points points per measured section
     * @param parts parts per candidate's population
     * @param seed the seed
     */
    public record Figures(double radiusMean, double radiusSd, double positionSd, double flatRate, double stepRate, double noise,
                          int points, int parts, long seed) {
        /** Checks each figure under the name the view gives it, so an error names the field the engineer typed in. */
        public Figures {
            if (!(radiusMean > 0) || !Double.isFinite(radiusMean)) throw InputProblem.ofField("Radius mean", "must be above zero");
            atLeastZero(radiusSd, "Radius sd");
            atLeastZero(positionSd, "Position sd");
            atLeastZero(noise, "Noise (1 sd)");
            share(flatRate, "Flats on");
            share(stepRate, "Steps on");
            if (points < 3) throw InputProblem.ofField("Points", "at least 3 per section, got " + points);
            if (parts < 1) throw InputProblem.ofField("Parts", "at least 1, got " + parts);
        }

        private static void atLeastZero(double v, String field) {
            if (!(v >= 0) || !Double.isFinite(v)) throw InputProblem.ofField(field, "must be zero or more");
        }

        private static void share(double v, String field) {
            if (!(v >= 0 && v <= 1)) throw InputProblem.ofField(field, "a share from 0 to 100 % of parts");
        }

        /**
         * {@code base} with these figures; the flats' widths and places and the steps' sizes stay the
         * table's.
         *
         * @throws InputProblem naming the figure that the model refuses
         */
        public ProcessModel model(ProcessModel base) {
            ProcessModel.Flats f = base.flat();
            ProcessModel.Steps s = base.step();
            if (flatRate > 0 && !(f.widthMax() > 0)) {
                throw InputProblem.ofField("Flats on", "the process table gives this process no flat width; keep it at 0 %");
            }
            if (stepRate > 0 && !(s.sizeMax() > 0)) {
                throw InputProblem.ofField("Steps on", "the process table gives this process no step size; keep it at 0 %");
            }
            return new ProcessModel(base.units(), base.corner(), base.nominalRadius(), new ProcessModel.Scatter(radiusMean, radiusSd),
                    positionSd, new ProcessModel.Flats(flatRate, f.widthMin(), f.widthMax(), f.centreMin(), f.centreMax()),
                    new ProcessModel.Steps(stepRate, s.sizeMin(), s.sizeMax()), noise, points);
        }
    }
}
