package org.arcwright.app.model;

import java.util.Optional;
import org.arcwright.callout.Callout;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.LoadCase;
import org.arcwright.mechanics.ShoulderShape;
import org.arcwright.mechanics.StressTarget;
import org.arcwright.mechanics.UltimateStrength;
import org.arcwright.model.DesignCase;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.worksheet.RadiusFeature;

/**
 * Turns a worksheet feature into the mechanics core's fillet case: the section from the design
 * case, the radius limits from the chosen callout (or, before a choice, the tolerance intent).
 */
public final class StressCases {
    private StressCases() {}

    /**
     * What the Stress view assesses, or why it cannot.
     *
     * @param stressCase the case, or null
     * @param target the target (K<sub>f</sub> when a strength is given, else K<sub>t</sub>), or null
     * @param why the reason there is no case, or null
     */
    public record Assessment(FilletStressCase stressCase, StressTarget target, String why) {
        public boolean ready() { return stressCase != null; }
    }

    public static Assessment of(RadiusFeature f) {
        DesignCase c = f.designCase();
        DesignCase.StressInputs s = c.stress();
        if (s == null) return new Assessment(null, null, f.id() + " has no section for a stress check: tick "
                + "'Check stress concentration' in Decide and give D and d.");
        double[] limits = limits(f).orElse(new double[] {c.nominalRadius(), c.nominalRadius()});
        UltimateStrength strength = s.ultimateStrength() == null ? null
                : "ksi".equals(s.ultimateStrength().units()) ? UltimateStrength.ofKsi(s.ultimateStrength().value())
                : UltimateStrength.ofMpa(s.ultimateStrength().value());
        try {
            double nominal = Math.min(Math.max(c.nominalRadius(), limits[0]), limits[1]);
            FilletStressCase fc = new FilletStressCase(ShoulderShape.parse(s.shape()), LoadCase.parse(s.load()), c.units(),
                    s.bigD(), s.smallD(), limits[0], nominal, limits[1], strength);
            StressTarget target = s.targetKt() == null || s.targetKt() <= 1 ? null
                    : strength != null ? StressTarget.kf(s.targetKt()) : StressTarget.kt(s.targetKt());
            return new Assessment(fc, target, null);
        } catch (RuntimeException e) {
            return new Assessment(null, null, e.getMessage());
        }
    }

    /** Smallest and largest radius of the chosen callout, or of the tolerance intent. */
    static Optional<double[]> limits(RadiusFeature f) {
        Callout callout = f.chosen() == null ? null : f.chosen().callout();
        if (callout instanceof Callout.Radius r) return Optional.of(new double[] {r.min(), r.max()});
        if (callout instanceof Callout.ControlledRadius r) return Optional.of(new double[] {r.min(), r.max()});
        String t = f.designCase().tolerance();
        if (t == null) return Optional.empty();
        try {
            RadiusCallout rc = CalloutParser.parse(t, f.designCase().units());
            if (!rc.isFullyToleranced()) return Optional.empty();
            return Optional.of(new double[] {rc.min().getAsDouble(), rc.max().getAsDouble()});
        } catch (RuntimeException e) {
            return Optional.empty();
        }
    }
}
