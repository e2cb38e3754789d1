package org.arcwright.bench;

import java.util.concurrent.TimeUnit;
import org.arcwright.inspect.CircleFits;
import org.arcwright.inspect.PointSet;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * The reference run measured side by side with {@link SimulateBench}: the same least-squares circle
 * on 1,000 points as {@code InspectBench.leastSquares1k}, whose quiet-machine figure is in
 * {@code docs/benchmarks/inspect.md}. Its slowdown in the same session estimates how much the shared
 * machine's load slowed the simulation figures.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
public class SimulateReference {
    PointSet blend1k;

    @Setup(Level.Trial)
    public void setUp() {
        blend1k = SectionData.blend(1000, 2);
    }

    @Benchmark
    public Object leastSquares1k() { return CircleFits.leastSquares(blend1k.xs(), blend1k.ys(), blend1k.size()); }
}
