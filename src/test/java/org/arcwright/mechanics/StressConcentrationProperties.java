package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

/** Properties of K<sub>t</sub> over every published fit. */
class StressConcentrationProperties {
    private final StressConcentration sc = new StressConcentration(PetersonFits.published());

    @Property(tries = 300, seed = "20261201")
    void ktFallsAsTheRadiusGrows(@ForAll("shapesAndLoads") PetersonFit fit,
                                 @ForAll @DoubleRange(min = 1.02, max = 2.0) double dOverD,
                                 @ForAll @DoubleRange(min = 0.0, max = 1.0) double u,
                                 @ForAll @DoubleRange(min = 0.0, max = 1.0) double v) {
        double d = 10;
        double bigD = d * dOverD;
        double h = (bigD - d) / 2;
        double lo = Math.max(h / fit.hrMax(), h / 20);
        double hi = h;
        double r1 = lo + (hi - lo) * Math.min(u, v);
        double r2 = lo + (hi - lo) * Math.max(u, v);
        if (r1 <= 0 || r2 <= r1) return;
        double k1 = sc.kt(fit.shape(), fit.load(), bigD, d, r1).kt();
        double k2 = sc.kt(fit.shape(), fit.load(), bigD, d, r2).kt();
        // the two branches may differ by up to 0.01 where they meet (see PetersonFitsTest)
        assertThat(k2).isLessThanOrEqualTo(k1 + 0.01);
        assertThat(k2).isGreaterThanOrEqualTo(1.0);
    }

    @Provide
    Arbitrary<PetersonFit> shapesAndLoads() {
        return Arbitraries.of(PetersonFits.published().all());
    }
}
