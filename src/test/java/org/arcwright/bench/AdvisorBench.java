package org.arcwright.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Advisor;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.rules.MechanicsChecks;
import org.arcwright.rules.NoteLinker;
import org.arcwright.model.Process;
import org.arcwright.rules.RuleBook;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Threads;

/**
 * Speed targets of the advisor: a pack of 1,000 rules loads (parse, layer over the built-in pack,
 * find conflicts) in under 200 ms; 100,000 cases advise at 50,000 cases/s or more on one core.
 *
 * <p>Run: {@code mvn -B -o -Pbench test-compile exec:exec -Dbench=AdvisorBench -Dbench.args="-f 1 -wi 3 -i 5"}
 */
@State(Scope.Benchmark)
@Threads(1)
public class AdvisorBench {
    static final int RULES = 1_000;
    static final int CASES = 100_000;

    Path packDir;
    Advisor advisor;
    DesignCase[] cases;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        packDir = Files.createTempDirectory("arcwright-bench-pack");
        writeThousandRulePack(packDir);
        PackStack stack = PackStack.builtIn();
        advisor = new Advisor(RuleBook.load(stack), MechanicsChecks.standard(stack), NoteLinker.NONE);
        cases = generateCases(new Random(20261201L));
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        try (var s = Files.walk(packDir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) Files.delete(p);
        }
    }

    /** Loads the built-in pack and a team pack of 1,000 rules in 10 files. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public RuleBook loadThousandRules() {
        RuleBook book = RuleBook.load(PackStack.load(List.of(packDir), null));
        if (book.entries().size() < RULES || !book.problems().isEmpty()) throw new IllegalStateException("pack did not load");
        return book;
    }

    /** Advises all 100,000 cases in one invocation; the score divided into 100,000 is the time per case. */
    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @OperationsPerInvocation(CASES)
    public int adviseHundredThousandCases() {
        int n = 0;
        for (DesignCase c : cases) {
            Advice a = advisor.advise(c);
            n += a.recommendations().size();
        }
        return n;
    }

    static DesignCase[] generateCases(Random rnd) {
        DesignCase[] out = new DesignCase[CASES];
        BlendFunction[] functions = BlendFunction.values();
        Loading[] loadings = Loading.values();
        Process[] processes = Process.values();
        List<List<String>> datums = List.of(List.of(), List.of("A"), List.of("A", "B"));
        for (int i = 0; i < CASES; i++) {
            BlendFunction f = functions[rnd.nextInt(functions.length)];
            double r = Math.round((0.3 + rnd.nextDouble() * 4.5) * 10) / 10.0;
            DesignCase.StressInputs stress = f == BlendFunction.STRESS_RELIEF && rnd.nextBoolean()
                    ? new DesignCase.StressInputs("stepped-shaft", "bending", 50, 40, null, rnd.nextBoolean() ? 1.8 : null)
                    : null;
            DesignCase.MatingCorner mating = f == BlendFunction.MATING
                    ? new DesignCase.MatingCorner(rnd.nextBoolean() ? "radius" : "chamfer", r * (0.8 + rnd.nextDouble() * 0.6), null)
                    : null;
            out[i] = new DesignCase(Units.MM, rnd.nextBoolean() ? DrawingStyle.ASME : DrawingStyle.ISO, null,
                    rnd.nextInt(3) == 0 ? BlendKind.ROUND : BlendKind.FILLET, r, f, loadings[rnd.nextInt(loadings.length)],
                    rnd.nextBoolean(), rnd.nextBoolean(), datums.get(rnd.nextInt(datums.size())),
                    processes[rnd.nextInt(processes.length)], stress, mating, null);
        }
        return out;
    }

    /** 1,000 distinct rules over ten files: varied conditions, weights and controls. */
    static void writeThousandRulePack(Path dir) throws IOException {
        Files.createDirectories(dir.resolve("rules"));
        Files.writeString(dir.resolve("pack.json"), "{\"name\": \"Bench pack\"}");
        String[] functions = {"stress-relief", "sealing", "cosmetic", "mating"};
        String[] callouts = {"radius", "controlled-radius", "profile", "general"};
        for (int file = 0; file < 10; file++) {
            StringBuilder sb = new StringBuilder("{\"rules\": [\n");
            for (int j = 0; j < RULES / 10; j++) {
                int i = file * (RULES / 10) + j;
                if (j > 0) sb.append(",\n");
                sb.append("{\"id\": \"bench.rule-").append(i).append("\", \"summary\": \"bench rule ").append(i)
                        .append("\", \"when\": {\"function\": \"").append(functions[i % 4])
                        .append("\", \"nominalRadiusMm\": {\"min\": ").append(i % 7).append(", \"below\": ")
                        .append(i % 7 + 3).append("}, \"loading\": [\"static\", \"fatigue\"], \"formMatters\": ")
                        .append(i % 2 == 0).append("}, \"recommend\": {\"callout\": \"").append(callouts[i % 4])
                        .append("\"}, \"weight\": ").append(1 + i).append(", \"because\": [\"bench\"], ")
                        .append("\"cautions\": [\"c\"], \"references\": [\"r\"], \"noteTags\": [\"t\"]}");
            }
            sb.append("\n]}\n");
            Files.writeString(dir.resolve("rules/bench-" + file + ".json"), sb.toString());
        }
    }

    /**
     * A smoke run outside JMH that reports wall time and this thread's CPU time: on a shared machine
     * the CPU time is the better estimate of what one free core does.
     */
    public static void main(String[] args) throws IOException {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        AdvisorBench b = new AdvisorBench();
        b.setUp();
        for (int k = 0; k < 5; k++) {
            long w0 = System.nanoTime();
            long c0 = mx.getCurrentThreadCpuTime();
            b.loadThousandRules();
            long w1 = System.nanoTime();
            long c1 = mx.getCurrentThreadCpuTime();
            b.adviseHundredThousandCases();
            long w2 = System.nanoTime();
            long c2 = mx.getCurrentThreadCpuTime();
            System.out.printf("load %.0f ms wall, %.0f ms cpu; advise %.0f cases/s wall, %.0f cases/s cpu%n",
                    (w1 - w0) / 1e6, (c1 - c0) / 1e6, CASES / ((w2 - w1) / 1e9), CASES / ((c2 - c1) / 1e9));
        }
        b.tearDown();
    }
}
