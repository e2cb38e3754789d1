package org.arcwright.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.simulate.Needs;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.simulate.Simulation;
import org.arcwright.simulate.SimulationRunner;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Simulation throughput in part × callout evaluations per second: 200-point sections of the invented
 * process of {@code examples/simulate/pump-bracket.json} (radius and position scatter, flats, steps,
 * noise), judged by R, CR and a floating profile ({@code mix}), or by one kind alone. {@code threads}
 * 1 is one core; 2 is the whole machine.
 *
 * <p>Run: {@code mvn -B -o -Pbench test-compile exec:exec -Dbench=SimulateBench -Dbench.args="-f 1 -wi 3 -i 5"}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
public class SimulateBench {
    /** Parts per benchmark call. */
    static final int PARTS = 2048;

    @Param({"mix"})
    String callouts;

    @Param({"2"})
    int threads;

    Simulation sim;
    SimulationRunner runner;

    @Setup(Level.Trial)
    public void setUp() {
        Corner corner = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), BlendKind.FILLET);
        ProcessModel model = new ProcessModel(Units.MM, corner, 2.0, new ProcessModel.Scatter(2.02, 0.05), 0.01,
                new ProcessModel.Flats(0.1, 0.1, 0.2, 0.4, 0.6), new ProcessModel.Steps(0.05, 0.005, 0.03), 0.001, 200);
        InspectionCallout r = new InspectionCallout.RadiusLimits(RadiusKind.R, 1.9, 2.1);
        InspectionCallout cr = new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.95, 2.15);
        InspectionCallout floating = new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.05), Freedom.all(), false);
        List<InspectionCallout> list = switch (callouts) {
            case "R" -> List.of(r, r, r);
            case "CR" -> List.of(cr, cr, cr);
            case "floating" -> List.of(floating, floating, floating);
            default -> List.of(r, cr, floating);
        };
        sim = new Simulation(model, new Needs(1.95, 2.2, Double.NaN, Double.NaN), list, PARTS, 11, 0.003, Double.NaN);
        runner = new SimulationRunner(threads);
    }

    /** One call: 2,048 parts × 3 callouts = 6,144 evaluations; the score is evaluations per second. */
    @Benchmark
    @OperationsPerInvocation(PARTS * 3)
    public Object evaluations() {
        return runner.run(sim);
    }
}
