package org.arcwright.bench;

import java.util.concurrent.TimeUnit;
import org.arcwright.mechanics.FilletStressAnalysis;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.LoadCase;
import org.arcwright.mechanics.NotchSensitivity;
import org.arcwright.mechanics.PetersonFits;
import org.arcwright.mechanics.ShoulderShape;
import org.arcwright.mechanics.StressConcentration;
import org.arcwright.mechanics.StressTarget;
import org.arcwright.mechanics.UltimateStrength;
import org.arcwright.tolerance.Units;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * Cost of the mechanics services the advisor calls per fillet: one K<sub>t</sub>, the report across
 * a tolerance, and the inverse search for a K<sub>t</sub> and a K<sub>f</sub> target.
 * Run: {@code mvn -B -o -Pbench test-compile exec:exec -Dbench=MechanicsBench -Dbench.args="-f 1 -wi 3 -i 5 -w 1s -r 1s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class MechanicsBench {
    private final StressConcentration sc = new StressConcentration(PetersonFits.published());
    private final FilletStressAnalysis analysis = new FilletStressAnalysis(sc, new NotchSensitivity());
    private final FilletStressCase shaft = FilletStressCase.ofLimits(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING,
            Units.MM, 38, 32, 0.8, 1.2, UltimateStrength.ofMpa(690));
    private final StressTarget kt = StressTarget.kt(2.2);
    private final StressTarget kf = StressTarget.kf(2.0);

    @Benchmark
    public double singleKt() {
        return sc.kt(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, 38, 32, 1.0).kt();
    }

    @Benchmark
    public Object reportAcrossTolerance() {
        return analysis.report(shaft);
    }

    @Benchmark
    public double minimumRadiusForKt() {
        return analysis.minimumRadius(shaft, kt).radius();
    }

    @Benchmark
    public double minimumRadiusForKf() {
        return analysis.minimumRadius(shaft, kf).radius();
    }
}
