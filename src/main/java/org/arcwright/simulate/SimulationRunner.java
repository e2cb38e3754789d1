package org.arcwright.simulate;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import org.apache.commons.rng.JumpableUniformRandomProvider;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.NormalizedGaussianSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.MeasuredSection;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointSet;
import org.arcwright.io.InputProblem;

/**
 * Runs a {@link Simulation}: draws the parts, measures each once, judges the section with every
 * callout through {@link Inspector} and the true part against the needs, and counts.
 *
 * <h2>Same seed, same counts, any thread count</h2>
 * The parts are cut into fixed blocks of {@value #BLOCK} in part order. Block {@code b} draws its
 * geometry and its measuring noise from two streams of one xoshiro256++ generator (Blackman and
 * Vigna, Commons RNG {@code XO_SHI_RO_256_PP}) seeded with the run's seed and jumped ahead
 * {@code 2b} and {@code 2b + 1} times by 2<sup>128</sup> draws: non-overlapping streams that depend on
 * the block alone, never on which thread runs it. Counts are summed and examples kept in block
 * order, so the result is the same on 1 thread or 64.
 */
public final class SimulationRunner {
    /** Parts per block: the unit of work and of random streams. */
    public static final int BLOCK = 256;
    /** Example parts kept per callout and outcome. */
    public static final int EXAMPLES = 4;
    /**
     * Examples are drawn from the first this many blocks only (the first 16,384 parts), so that a run of
     * millions of parts does not keep a few sections per block in memory until the blocks are merged.
     */
    static final int EXAMPLE_BLOCKS = 64;

    /** Told of progress from the worker threads after each block; must be thread-safe. */
    @FunctionalInterface
    public interface Progress {
        void partsDone(long done, long total);

        /** Tells nothing. */
        Progress NONE = (done, total) -> { };
    }

    private final int threads;

    /** A runner on {@code threads} worker threads (>= 1). */
    public SimulationRunner(int threads) {
        if (threads < 1) throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        this.threads = threads;
    }

    /** A runner using every core. */
    public static SimulationRunner allCores() {
        return new SimulationRunner(Runtime.getRuntime().availableProcessors());
    }

    /** Runs without progress or cancellation. */
    public SimulationResult run(Simulation sim) {
        return run(sim, Progress.NONE, () -> false);
    }

    /**
     * Runs the simulation.
     *
     * @param progress told after each block
     * @param cancelled polled between parts; when it turns true the run stops
     * @throws CancellationException when cancelled
     * @throws InputProblem when a callout cannot judge even the nominal part (field {@code callouts[k]})
     */
    public SimulationResult run(Simulation sim, Progress progress, BooleanSupplier cancelled) {
        Objects.requireNonNull(progress, "progress");
        Objects.requireNonNull(cancelled, "cancelled");
        PartGenerator gen = new PartGenerator(sim.model());
        preflight(sim, gen);
        int blocks = (sim.parts() + BLOCK - 1) / BLOCK;
        JumpableUniformRandomProvider base = (JumpableUniformRandomProvider) RandomSource.XO_SHI_RO_256_PP.create(sim.seed());
        List<Block> work = new ArrayList<>(blocks);
        for (int b = 0; b < blocks; b++) {
            UniformRandomProvider geometry = base.jump();
            UniformRandomProvider noise = base.jump();
            work.add(new Block(b * BLOCK, Math.min(sim.parts(), (b + 1) * BLOCK), geometry, noise, b < EXAMPLE_BLOCKS));
        }
        AtomicLong done = new AtomicLong();
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "arcwright-simulate");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Tally>> futures = new ArrayList<>(blocks);
            for (Block blk : work) {
                futures.add(pool.submit(() -> {
                    Tally t = blk.run(sim, gen, cancelled);
                    progress.partsDone(done.addAndGet(blk.to - blk.from), sim.parts());
                    return t;
                }));
            }
            Tally total = new Tally(sim.callouts().size(), true);
            for (Future<Tally> f : futures) total.add(get(f));
            return total.result(sim);
        } finally {
            pool.shutdownNow();
        }
    }

    private static Tally get(Future<Tally> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException re) throw re;
            if (c instanceof Error er) throw er;
            throw new IllegalStateException(c);
        }
    }

    /** A callout that cannot judge the perfect nominal part is an input problem, not an indeterminate count. */
    private static void preflight(Simulation sim, PartGenerator gen) {
        ProcessModel m = sim.model();
        Part nominal = new Part(-1, m.nominalRadius(), 0, 0, Double.NaN, Double.NaN, 0, false);
        PartGenerator.Scan scan = gen.newScan();
        gen.measure(nominal, () -> 0, scan);
        PointSet pts = new PointSet(scan.xs(), scan.ys(), scan.size(), "simulated section");
        MeasuredSection section = new MeasuredSection(nominal(sim), pts);
        Inspector inspector = new Inspector();
        for (int k = 0; k < sim.callouts().size(); k++) {
            try {
                // judged as the parts will be: the same path, so what it refuses here it would refuse there
                inspector.verdict(request(sim, sim.callouts().get(k), pts), section);
            } catch (InputProblem p) {
                throw p.under("callouts[" + k + "]");
            }
        }
    }

    static InspectionRequest request(Simulation sim, InspectionCallout callout, PointSet pts) {
        return new InspectionRequest(sim.model().units(), nominal(sim), callout, pts, sim.resolutionFor(callout), sim.window(), false);
    }

    private static Nominal nominal(Simulation sim) {
        return new Nominal.CornerBlend(sim.model().corner(), sim.model().nominalRadius());
    }

    /**
     * Judges one measured section under one callout; {@code section} is shared by the part's callouts,
     * so what they have in common is worked out once.
     */
    static Verdict judge(Inspector inspector, Simulation sim, InspectionCallout callout, MeasuredSection section) {
        try {
            return Verdict.of(inspector.verdict(request(sim, callout, section.points()), section));
        } catch (InputProblem p) {
            return Verdict.INDETERMINATE;
        }
    }

    private record Block(int from, int to, UniformRandomProvider geometry, UniformRandomProvider noise, boolean keepExamples) {
        Tally run(Simulation sim, PartGenerator gen, BooleanSupplier cancelled) {
            int k = sim.callouts().size();
            Tally t = new Tally(k, keepExamples);
            Inspector inspector = new Inspector();
            Nominal nominal = nominal(sim);
            PartGenerator.Scan scan = gen.newScan();
            NormalizedGaussianSampler g = PartGenerator.gaussian(geometry);
            NormalizedGaussianSampler e = PartGenerator.gaussian(noise);
            for (int i = from; i < to; i++) {
                if (cancelled.getAsBoolean() || Thread.currentThread().isInterrupted()) throw new CancellationException("cancelled");
                Part part = gen.draw(i, geometry, g);
                gen.measure(part, e, scan);
                PointSet pts = new PointSet(scan.xs(), scan.ys(), scan.size(), "simulated section");
                boolean good = sim.needs().metBy(part);
                if (good) t.good++;
                MeasuredSection section = new MeasuredSection(nominal, pts);
                for (int c = 0; c < k; c++) {
                    Verdict v = judge(inspector, sim, sim.callouts().get(c), section);
                    t.count(c, part, pts, v, good);
                }
            }
            return t;
        }
    }

    /** Counts of one block, or of the whole run once blocks are added in order. */
    private static final class Tally {
        long good;
        final long[] accepted, escapes, falseRejects, indeterminate;
        final List<Map<Outcome, List<Example>>> examples = new ArrayList<>();
        final boolean keepExamples;

        Tally(int k, boolean keepExamples) {
            this.keepExamples = keepExamples;
            accepted = new long[k];
            escapes = new long[k];
            falseRejects = new long[k];
            indeterminate = new long[k];
            for (int c = 0; c < k; c++) examples.add(new EnumMap<>(Outcome.class));
        }

        void count(int c, Part part, PointSet pts, Verdict v, boolean good) {
            boolean acc = v == Verdict.ACCEPTED;
            if (acc) accepted[c]++;
            if (v == Verdict.INDETERMINATE) indeterminate[c]++;
            Outcome o = Outcome.of(acc, good);
            if (o == Outcome.ESCAPE) escapes[c]++;
            if (o == Outcome.FALSE_REJECT) falseRejects[c]++;
            if (!keepExamples) return;
            List<Example> list = examples.get(c).computeIfAbsent(o, x -> new ArrayList<>());
            if (list.size() < EXAMPLES) list.add(new Example(part, new PointSet(pts.x(), pts.y(), pts.size(), "part " + (part.index() + 1)), o));
        }

        void add(Tally o) {
            good += o.good;
            for (int c = 0; c < accepted.length; c++) {
                accepted[c] += o.accepted[c];
                escapes[c] += o.escapes[c];
                falseRejects[c] += o.falseRejects[c];
                indeterminate[c] += o.indeterminate[c];
                for (Map.Entry<Outcome, List<Example>> e : o.examples.get(c).entrySet()) {
                    List<Example> mine = examples.get(c).computeIfAbsent(e.getKey(), x -> new ArrayList<>());
                    for (Example ex : e.getValue()) if (mine.size() < EXAMPLES) mine.add(ex);
                }
            }
        }

        SimulationResult result(Simulation sim) {
            List<CalloutResult> out = new ArrayList<>();
            for (int c = 0; c < accepted.length; c++) {
                Map<Outcome, List<Example>> ex = new EnumMap<>(Outcome.class);
                for (Map.Entry<Outcome, List<Example>> e : examples.get(c).entrySet()) ex.put(e.getKey(), List.copyOf(e.getValue()));
                out.add(new CalloutResult(sim.callouts().get(c), sim.parts(), accepted[c], escapes[c], falseRejects[c],
                        indeterminate[c], ex));
            }
            return new SimulationResult(sim, good, out);
        }
    }
}
