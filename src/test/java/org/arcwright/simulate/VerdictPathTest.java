package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.NormalizedGaussianSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.MeasuredSection;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointSet;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.ProfileZone;
import org.junit.jupiter.api.Test;

/**
 * The simulation's fast path (verdict only, profile registration stopping at the first placement
 * within the zone, one {@link MeasuredSection} shared by a part's callouts) gives exactly the verdict
 * of the full {@link Inspector#inspect} on the same section, pass, fail and indeterminate alike,
 * and refuses exactly the sections the full inspection refuses. Sections are drawn by the
 * simulation's own generator from invented processes (fixed seeds); callouts cover every kind the
 * inspection file knows, with and without a stated uncertainty (ISO 14253-1 default rule).
 */
class VerdictPathTest {
    private static final List<InspectionCallout> CALLOUTS = List.of(
            Models.r(1.9, 2.1),
            Models.r(1.98, 2.06),
            Models.cr(1.95, 2.15),
            Models.cr(1.8, 2.3),
            Models.located(0.1),
            Models.located(0.03),
            Models.floating(0.05),
            Models.floating(0.015),
            new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.02), EnumSet.of(Freedom.X, Freedom.Y), false),
            new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.03), Freedom.all(), true),
            new InspectionCallout.ProfileTolerance(new ProfileZone(0.03, 0.01), Freedom.all(), false),
            new InspectionCallout.ProfileTolerance(new ProfileZone(0.03, 0), Freedom.all(), false),
            new InspectionCallout.CompositeProfile(List.of(new InspectionCallout.Tier(0.1, Freedom.none()),
                    new InspectionCallout.Tier(0.02, Freedom.all()))));

    /** Invented processes: the worked example's, a noisier and sparser scan, and one with large position scatter. */
    private static List<ProcessModel> processes() {
        return List.of(
                new ProcessModel(Units.MM, Models.FILLET_90, 2.0, new ProcessModel.Scatter(2.02, 0.05), 0.01,
                        new ProcessModel.Flats(0.1, 0.1, 0.2, 0.4, 0.6), new ProcessModel.Steps(0.05, 0.005, 0.03), 0.001, 200),
                new ProcessModel(Units.MM, Models.FILLET_90, 2.0, new ProcessModel.Scatter(2.0, 0.03), 0.02,
                        new ProcessModel.Flats(0.3, 0.05, 0.3, 0.2, 0.8), new ProcessModel.Steps(0.2, 0.001, 0.02), 0.002, 40),
                new ProcessModel(Units.MM, Models.FILLET_90, 2.0, new ProcessModel.Scatter(2.01, 0.02), 0.05,
                        null, null, 0.0005, 120));
    }

    private record Said(String verdict) {}

    private static Said full(InspectionRequest req) {
        try {
            return new Said(new Inspector().inspect(req).verdict().key());
        } catch (InputProblem p) {
            return new Said("refused: " + p.getMessage());
        }
    }

    private static Said fast(Inspector inspector, InspectionRequest req, MeasuredSection section) {
        try {
            return new Said(inspector.verdict(req, section).verdict().key());
        } catch (InputProblem p) {
            return new Said("refused: " + p.getMessage());
        }
    }

    @Test
    void theFastPathGivesTheFullInspectionsVerdictOnEveryGeneratedSection() {
        Map<org.arcwright.inspect.Verdict, Integer> seen = new EnumMap<>(org.arcwright.inspect.Verdict.class);
        List<String> differences = new ArrayList<>();
        int compared = 0;
        long seed = 19;
        for (ProcessModel m : processes()) {
            PartGenerator gen = new PartGenerator(m);
            UniformRandomProvider geometry = RandomSource.XO_SHI_RO_256_PP.create(seed);
            UniformRandomProvider noise = RandomSource.XO_SHI_RO_256_PP.create(seed + 1);
            NormalizedGaussianSampler g = PartGenerator.gaussian(geometry), e = PartGenerator.gaussian(noise);
            PartGenerator.Scan scan = gen.newScan();
            Nominal nominal = new Nominal.CornerBlend(m.corner(), m.nominalRadius());
            Inspector inspector = new Inspector();
            for (int i = 0; i < 60; i++) {
                Part part = gen.draw(i, geometry, g);
                gen.measure(part, e, scan);
                PointSet pts = new PointSet(scan.xs().clone(), scan.ys().clone(), scan.size(), "part " + i);
                MeasuredSection section = new MeasuredSection(nominal, pts);
                for (double u : new double[] {0, 2 * m.noise()}) {
                    for (InspectionCallout c : CALLOUTS) {
                        InspectionRequest req = new InspectionRequest(m.units(), nominal, c, pts, Simulation.defaultResolution(m, c), Double.NaN,
                                false, u);
                        Said want = full(req);
                        Said got = fast(inspector, req, section);
                        compared++;
                        if (!want.equals(got)) differences.add(m.points() + " points, part " + i + ", U " + u + ", " + c.describe() + ": inspect " + want + ", fast " + got);
                        for (org.arcwright.inspect.Verdict v : org.arcwright.inspect.Verdict.values()) {
                            if (want.verdict().equals(v.key())) seen.merge(v, 1, Integer::sum);
                        }
                    }
                }
            }
            seed += 2;
        }
        assertThat(differences).as("verdicts that differ out of " + compared).isEmpty();
        // the comparison covered every verdict, undecided sections included
        assertThat(seen.keySet()).containsExactlyInAnyOrder(org.arcwright.inspect.Verdict.values());
        assertThat(seen.get(org.arcwright.inspect.Verdict.INDETERMINATE)).isGreaterThan(100);
    }

    @Test
    void theRunnerJudgesAsTheFullInspection() {
        ProcessModel m = processes().get(0);
        Simulation sim = Models.simulation(m, new Needs(1.95, 2.2, Double.NaN, Double.NaN), CALLOUTS, 60, 7);
        PartGenerator gen = new PartGenerator(m);
        UniformRandomProvider geometry = RandomSource.XO_SHI_RO_256_PP.create(7L);
        NormalizedGaussianSampler g = PartGenerator.gaussian(geometry), e = PartGenerator.gaussian(RandomSource.XO_SHI_RO_256_PP.create(8L));
        PartGenerator.Scan scan = gen.newScan();
        Inspector inspector = new Inspector();
        for (int i = 0; i < 60; i++) {
            gen.measure(gen.draw(i, geometry, g), e, scan);
            PointSet pts = new PointSet(scan.xs(), scan.ys(), scan.size(), "part " + i);
            MeasuredSection section = new MeasuredSection(new Nominal.CornerBlend(m.corner(), m.nominalRadius()), pts);
            for (InspectionCallout c : CALLOUTS) {
                Verdict want;
                try {
                    want = Verdict.of(new Inspector().inspect(SimulationRunner.request(sim, c, pts)));
                } catch (InputProblem p) {
                    want = Verdict.INDETERMINATE;
                }
                assertThat(SimulationRunner.judge(inspector, sim, c, section)).as("part " + i + ", " + c.describe()).isEqualTo(want);
            }
        }
    }
}
