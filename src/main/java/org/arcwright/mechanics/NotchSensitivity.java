package org.arcwright.mechanics;

import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.DecimalText;

/**
 * Notch sensitivity of steels by Neuber's equation, with Neuber's constant from the cubic fits in
 * Shigley's Mechanical Engineering Design (9th ed., eq. 6-35a and 6-35b; equation numbers
 * {@code from memory}):
 * <pre>
 *   bending or axial:  √a = 0.246 - 3.08e-3 S + 1.51e-5 S² - 2.67e-8 S³
 *   torsion:           √a = 0.190 - 2.51e-3 S + 1.35e-5 S² - 2.67e-8 S³
 * </pre>
 * with S = S<sub>ut</sub> in kpsi and √a in √in, fitted for about 50 &le; S<sub>ut</sub> &le; 250 kpsi.
 * Then q = 1 / (1 + √a / √r) and K<sub>f</sub> = 1 + q (K<sub>t</sub> - 1) (Shigley eq. 6-33/6-34).
 *
 * <p>Units: strengths come in as {@link UltimateStrength}, radii in mm; √a is converted to √mm by
 * √25.4. Outside the strength range the fit is evaluated at the nearer end (clamped) and the result
 * says so. The torsion cubic falls below zero above about 234 ksi (1610 MPa), inside the stated
 * range; there √a is taken as 0 (q = 1, the conservative limit) and flagged, never q &gt; 1.
 * The fits are for steels; other materials need their own notch-sensitivity data.
 */
public final class NotchSensitivity {
    /** Lower end of the fitted strength range, kpsi. */
    public static final double SUT_MIN_KSI = 50;
    /** Upper end of the fitted strength range, kpsi. */
    public static final double SUT_MAX_KSI = 250;
    private static final double SQRT_MM_PER_SQRT_IN = Math.sqrt(25.4);

    /** Neuber's constant √a for the material and load, with the strength clamped into the fit's range. */
    public NeuberConstant neuberConstant(UltimateStrength strength, LoadCase load) {
        Objects.requireNonNull(strength, "strength");
        Objects.requireNonNull(load, "load");
        double s = strength.ksi();
        double used = Math.max(SUT_MIN_KSI, Math.min(SUT_MAX_KSI, s));
        double sqrtA = load.isShear()
                ? 0.190 - 2.51e-3 * used + 1.35e-5 * used * used - 2.67e-8 * used * used * used
                : 0.246 - 3.08e-3 * used + 1.51e-5 * used * used - 2.67e-8 * used * used * used;
        boolean within = used == s;
        String message = within ? "" : String.format(Locale.ROOT,
                "S_ut = %s MPa (%s ksi) lies outside the fit's range %s..%s ksi; Neuber's constant is taken at %s ksi",
                DecimalText.fixed(strength.mpa(), 0), DecimalText.fixed(s, 1), DecimalText.exact(SUT_MIN_KSI), DecimalText.exact(SUT_MAX_KSI),
                DecimalText.fixed(used, 0));
        if (sqrtA < 0) {
            // the torsion cubic crosses zero near 234 ksi: a negative √a would give q > 1
            sqrtA = 0;
            within = false;
            message = (message.isEmpty() ? "" : message + "; ") + String.format(Locale.ROOT,
                    "the %s fit gives no positive Neuber constant at %s ksi; q is taken as 1 (fully notch-sensitive)",
                    load.isShear() ? "torsion" : "bending", DecimalText.fixed(used, 0));
        }
        return new NeuberConstant(sqrtA, sqrtA * SQRT_MM_PER_SQRT_IN, used, within, message);
    }

    /** Notch sensitivity q at a notch radius in mm. */
    public Sensitivity at(UltimateStrength strength, LoadCase load, double radiusMm) {
        StressConcentration.positive("r", radiusMm);
        NeuberConstant a = neuberConstant(strength, load);
        double q = 1 / (1 + a.sqrtAmm() / Math.sqrt(radiusMm));
        return new Sensitivity(q, a);
    }

    /** Fatigue stress-concentration factor K<sub>f</sub> = 1 + q (K<sub>t</sub> - 1). */
    public double kf(double kt, double q) {
        return 1 + q * (kt - 1);
    }

    /**
     * Neuber's constant.
     *
     * @param sqrtAinch √a in √in, as Shigley tabulates it
     * @param sqrtAmm √a in √mm
     * @param strengthUsedKsi the strength the fit was evaluated at, after clamping
     * @param withinFit false when the strength was clamped
     * @param message why the value is not within the fit, or empty
     */
    public record NeuberConstant(double sqrtAinch, double sqrtAmm, double strengthUsedKsi, boolean withinFit,
                                 String message) {}

    /** q at one radius and the constant it came from. */
    public record Sensitivity(double q, NeuberConstant constant) {}
}
