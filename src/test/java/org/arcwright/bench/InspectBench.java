package org.arcwright.bench;

import java.util.concurrent.TimeUnit;
import org.arcwright.inspect.Circle;
import org.arcwright.inspect.CircleFits;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.PointSet;
import org.arcwright.inspect.ProfileCheck;
import org.arcwright.inspect.ReferenceSolvers;
import org.arcwright.zone.Contour;
import org.arcwright.zone.ProfileZone;
import org.arcwright.zone.RadiusZone;
import org.arcwright.inspect.AdjacentSurfaces;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * The speed targets of docs/benchmarks/inspect.md, one thread, warm: on 1,000,000 points the radius-zone envelope, the
 * algebraic (Taubin) circle, the geometric least-squares circle, the minimum-zone circle and the
 * floating profile registration; on 1,000 points the same fits side by side with the Commons Math
 * reference solvers (Levenberg-Marquardt, SimplexSolver).
 *
 * <p>Run: {@code mvn -B -o -Pbench test-compile exec:exec -Dbench=InspectBench -Dbench.args="-f 1 -wi 3 -i 5"}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
public class InspectBench {
    @Param({"1000000"})
    int n;

    PointSet all, blend, all1k, blend1k, all200;
    InspectionRequest r1M, cr1M, r200, cr200;
    RadiusZone zone;
    Contour nominal, nominal1k;
    Circle start, start1k;
    double[] taubin1k;

    @Setup(Level.Trial)
    public void setUp() {
        all = SectionData.section(n, 1);
        blend = SectionData.blend(n, 1);
        all1k = SectionData.section(1000, 2);
        blend1k = SectionData.blend(1000, 2);
        zone = new RadiusZone(SectionData.CORNER, 1.9, 2.1, 1e-3);
        nominal = SectionData.CORNER.contour(SectionData.NOMINAL, 20);
        start = CircleFits.leastSquares(blend.xs(), blend.ys(), blend.size()).circle();
        start1k = CircleFits.leastSquares(blend1k.xs(), blend1k.ys(), blend1k.size()).circle();
        Circle t = CircleFits.taubin(blend1k.xs(), blend1k.ys(), blend1k.size());
        taubin1k = new double[] {t.cx(), t.cy(), t.r()};
        all200 = SectionData.section(200, 3);
        InspectionCallout r = new InspectionCallout.RadiusLimits(RadiusKind.R, 1.9, 2.1);
        InspectionCallout cr = new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.9, 2.1);
        Nominal nom = new Nominal.CornerBlend(SectionData.CORNER, SectionData.NOMINAL);
        r1M = new InspectionRequest(Units.MM, nom, r, all, 1e-3, Double.NaN, false);
        cr1M = new InspectionRequest(Units.MM, nom, cr, all, 1e-3, Double.NaN, false);
        r200 = new InspectionRequest(Units.MM, nom, r, all200, 1e-3, Double.NaN, false);
        cr200 = new InspectionRequest(Units.MM, nom, cr, all200, 1e-3, Double.NaN, false);
    }

    /** The adjacent surfaces fitted to a million points (robust orthogonal lines, ADR 0302). */
    @Benchmark
    public Object surfaces1M() { return AdjacentSurfaces.fit(SectionData.CORNER, 2.1, all.xs(), all.ys(), all.size()); }

    /** What the radius envelope now costs: the surfaces, then the zone on them. */
    @Benchmark
    public Object surfacesAndEnvelope1M() {
        AdjacentSurfaces s = AdjacentSurfaces.fit(SectionData.CORNER, 2.1, all.xs(), all.ys(), all.size());
        return new RadiusZone(s.corner(), 1.9, 2.1, 1e-3).evaluate(all.xs(), all.ys(), all.size());
    }

    /** The whole R inspection of a million points, as the CLI runs it (side by side with the previous build). */
    @Benchmark
    public Object inspectR1M() { return new Inspector().inspect(r1M); }

    @Benchmark
    public Object inspectCR1M() { return new Inspector().inspect(cr1M); }

    /** A 200-point section, as a simulation calls it thousands of times. */
    @Benchmark
    public Object inspectR200() { return new Inspector().inspect(r200); }

    @Benchmark
    public Object inspectCR200() { return new Inspector().inspect(cr200); }

    @Benchmark
    public Object radiusEnvelope1M() { return zone.evaluate(all.xs(), all.ys(), all.size()); }

    @Benchmark
    public Object taubin1M() { return CircleFits.taubin(blend.xs(), blend.ys(), blend.size()); }

    @Benchmark
    public Object leastSquares1M() { return CircleFits.leastSquares(blend.xs(), blend.ys(), blend.size()); }

    @Benchmark
    public Object minimumZone1M() { return CircleFits.minimumZone(blend.xs(), blend.ys(), blend.size(), start); }

    @Benchmark
    public Object floatingProfile1M() {
        return new ProfileCheck(nominal, 0, 0, 1e-6).evaluate(all, ProfileZone.bilateral(0.05), Freedom.all(), false);
    }

    @Benchmark
    public Object leastSquares1k() { return CircleFits.leastSquares(blend1k.xs(), blend1k.ys(), blend1k.size()); }

    @Benchmark
    public Object taubin1k() { return CircleFits.taubin(blend1k.xs(), blend1k.ys(), blend1k.size()); }

    @Benchmark
    public Object leastSquares1kCommonsMathLM() {
        return ReferenceSolvers.leastSquaresCircle(blend1k.xs(), blend1k.ys(), blend1k.size(), taubin1k);
    }

    @Benchmark
    public Object minimumZone1k() { return CircleFits.minimumZone(blend1k.xs(), blend1k.ys(), blend1k.size(), start1k); }

    @Benchmark
    public Object minimumZone1kCommonsMathSimplex() {
        return ReferenceSolvers.minimumZoneCircle(blend1k.xs(), blend1k.ys(), blend1k.size(), start1k.cx(), start1k.cy(), 0.05 * start1k.r());
    }

    @Benchmark
    public Object floatingProfile1k() {
        return new ProfileCheck(nominal, 0, 0, 1e-6).evaluate(all1k, ProfileZone.bilateral(0.05), Freedom.all(), false);
    }

    @Benchmark
    public Object floatingProfile1kCommonsMathSimplex() {
        return ReferenceSolvers.floatingZone(nominal, all1k.xs(), all1k.ys(), all1k.size(), 0.05);
    }
}
