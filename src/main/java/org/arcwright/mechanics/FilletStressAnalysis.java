package org.arcwright.mechanics;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * Stress concentration across a radius tolerance, and the inverse: the smallest radius that keeps
 * K<sub>t</sub> or K<sub>f</sub> at or under a target.
 *
 * <p>The smallest radius governs strength: K<sub>t</sub> falls as r grows, so the report's
 * {@code atMin} is the figure to judge. K<sub>f</sub> need not fall monotonically (q rises with r
 * while K<sub>t</sub> falls), so the inverse scans the range first and then bisects the last
 * crossing: the answer is the smallest radius above which every radius meets the target.
 */
public final class FilletStressAnalysis {
    /** Scan points between the sharp end of the fit and the step height, log-spaced. */
    private static final int SCAN_POINTS = 400;
    private static final int BISECTIONS = 200;

    private final StressConcentration stressConcentration;
    private final NotchSensitivity notchSensitivity;

    public FilletStressAnalysis(StressConcentration stressConcentration, NotchSensitivity notchSensitivity) {
        this.stressConcentration = Objects.requireNonNull(stressConcentration, "stressConcentration");
        this.notchSensitivity = Objects.requireNonNull(notchSensitivity, "notchSensitivity");
    }

    /** K<sub>t</sub> (and K<sub>f</sub> with a strength) at r min, nominal and max. */
    public FilletStressReport report(FilletStressCase c) {
        Objects.requireNonNull(c, "case");
        StressPoint min = point(c, c.rMin());
        StressPoint nom = point(c, c.rNominal());
        StressPoint max = point(c, c.rMax());
        Set<String> notes = new LinkedHashSet<>();
        for (StressPoint p : List.of(min, nom, max)) {
            if (!p.kt().message().isEmpty()) notes.add(String.format(Locale.ROOT, "at r = %s: %s", DecimalText.significant(p.r(), 4), p.kt().message()));
        }
        if (c.strength() != null) {
            NotchSensitivity.NeuberConstant a = notchSensitivity.neuberConstant(c.strength(), c.load());
            if (!a.withinFit()) notes.add(a.message());
            notes.add("notch sensitivity from Neuber's constant for steels (Shigley); other materials need their own data");
        }
        Double kfCost = c.strength() == null ? null : min.kf() - nom.kf();
        return new FilletStressReport(c, min, nom, max, min.kt().kt() - nom.kt().kt(), kfCost,
                new ArrayList<>(notes), Cautions.STRESS);
    }

    /** K<sub>t</sub> (and q, K<sub>f</sub> with a strength) at one radius of the case. */
    public StressPoint point(FilletStressCase c, double r) {
        KtEstimate kt = stressConcentration.kt(c.shape(), c.load(), c.bigD(), c.smallD(), r);
        return withNotch(c, r, kt);
    }

    private StressPoint withNotch(FilletStressCase c, double r, KtEstimate kt) {
        if (c.strength() == null) return new StressPoint(r, kt, null, null, true);
        NotchSensitivity.Sensitivity s = notchSensitivity.at(c.strength(), c.load(), r * c.units().millimetres());
        return new StressPoint(r, kt, s.q(), notchSensitivity.kf(kt.kt(), s.q()), s.constant().withinFit());
    }

    /**
     * The smallest radius that keeps the target, searched between the sharp end of the fit
     * (r = h / (h/r)<sub>max</sub>) and the step height h. The case's own radii are ignored.
     *
     * @throws InputProblem on {@code targetKf} when a K<sub>f</sub> target comes without a strength
     */
    public MinimumRadius minimumRadius(FilletStressCase c, StressTarget target) {
        Objects.requireNonNull(c, "case");
        Objects.requireNonNull(target, "target");
        if (target.factor() == StressTarget.Factor.KF && c.strength() == null) {
            throw InputProblem.ofField("targetKf", "a K_f target needs the material's ultimateStrength");
        }
        PetersonFit fit = stressConcentration.fits().require(c.shape(), c.load());
        double h = c.stepHeight();
        double from = h / fit.hrMax();
        double to = Math.min(h, h / fit.hrMin());
        double atTo = factor(c, fit, target, to);
        String sym = target.factor().symbol();
        if (atTo > target.value()) {
            return new MinimumRadius(target, false, Double.NaN, atTo, from, to, false, String.format(Locale.ROOT,
                    "no radius up to the step height h = %s keeps %s <= %s: the largest fillet gives %s = %s; "
                            + "a larger radius needs a taller step, an undercut or a relief groove",
                    DecimalText.significant(h, 4), sym, DecimalText.significant(target.value(), 4), sym, DecimalText.fixed(atTo, 3)));
        }
        double pass = to;
        double ratio = Math.pow(from / to, 1.0 / SCAN_POINTS);
        for (int i = 1; i <= SCAN_POINTS; i++) {
            double r = i == SCAN_POINTS ? from : to * Math.pow(ratio, i);
            if (factor(c, fit, target, r) > target.value()) {
                double lo = r;
                double hi = pass;
                for (int k = 0; k < BISECTIONS && hi - lo > 1e-12 * h; k++) {
                    double mid = 0.5 * (lo + hi);
                    if (factor(c, fit, target, mid) > target.value()) lo = mid; else hi = mid;
                }
                double v = factor(c, fit, target, hi);
                return new MinimumRadius(target, true, hi, v, from, to, false, String.format(Locale.ROOT,
                        "smallest radius keeping %s <= %s: r = %s (%s = %s there)", sym, DecimalText.significant(target.value(), 4),
                        DecimalText.significant(hi, 4), sym, DecimalText.significant(v, 4)));
            }
            pass = r;
        }
        double v = factor(c, fit, target, from);
        return new MinimumRadius(target, true, from, v, from, to, true, String.format(Locale.ROOT,
                "%s stays <= %s down to r = %s, the sharp end of the fit (h/r = %s); smaller radii are outside what the fit covers",
                sym, DecimalText.significant(target.value(), 4), DecimalText.significant(from, 4), DecimalText.significant(fit.hrMax(), 4)));
    }

    private double factor(FilletStressCase c, PetersonFit fit, StressTarget target, double r) {
        KtEstimate kt = stressConcentration.evaluate(fit, c.bigD(), c.smallD(), r);
        if (target.factor() == StressTarget.Factor.KT) return kt.kt();
        return withNotch(c, r, kt).kf();
    }

}
