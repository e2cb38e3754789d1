package org.arcwright.mechanics;

import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * Theoretical stress-concentration factor K<sub>t</sub> of a shoulder fillet from Peterson's curve
 * fits ({@link PetersonFits}).
 *
 * <p>Geometry: D the larger and d the smaller diameter (shaft) or width (flat bar), r the fillet
 * radius, all in one length unit. The fillet must be tangent to both the smaller section and the
 * shoulder face, so r may not exceed the step h = (D - d)/2 (decision record 0801). Outside the fit's
 * range of h/r the nearest branch is still evaluated, and the estimate says so with
 * {@code withinFit = false} and a message; it is never silent.
 */
public final class StressConcentration {
    private final PetersonFits fits;

    public StressConcentration(PetersonFits fits) {
        this.fits = Objects.requireNonNull(fits, "fits");
    }

    /** The catalogue this service evaluates. */
    public PetersonFits fits() { return fits; }

    /**
     * K<sub>t</sub> of the fillet.
     *
     * @throws InputProblem on fields {@code D}, {@code d} or {@code r} when a value is not finite and
     *     positive, when D &le; d, or when r exceeds the step; on {@code load} when no fit exists
     */
    public KtEstimate kt(ShoulderShape shape, LoadCase load, double bigD, double smallD, double r) {
        Objects.requireNonNull(shape, "shape");
        Objects.requireNonNull(load, "load");
        checkGeometry(bigD, smallD);
        positive("r", r);
        double h = (bigD - smallD) / 2;
        if (r > h * (1 + 1e-12)) {
            throw InputProblem.ofField("r", "fillet radius " + DecimalText.exact(r) + " is larger than the step h = (D - d)/2 = " + DecimalText.significant(h, 6)
                    + "; a fillet tangent to both the diameter and the shoulder face needs r <= h");
        }
        PetersonFit fit = fits.require(shape, load);
        return evaluate(fit, bigD, smallD, r);
    }

    /** K<sub>t</sub> from a given fit, without the r &le; h check (used to sweep a plot or a search). */
    KtEstimate evaluate(PetersonFit fit, double bigD, double smallD, double r) {
        double h = (bigD - smallD) / 2;
        double hr = h / r;
        double t = 2 * h / bigD;
        double kt = fit.kt(hr, t);
        boolean within = fit.covers(hr);
        String message = "";
        if (!within) {
            message = String.format(Locale.ROOT,
                    "extrapolated: h/r = %s lies outside the fit's range %s..%s (%s); treat K_t as a rough estimate",
                    DecimalText.significant(hr, 3), DecimalText.exact(fit.hrMin()), DecimalText.exact(fit.hrMax()),
                    hr > fit.hrMax() ? "the fillet is sharper than the charts cover" : "the fillet is blunter than the charts cover");
        }
        if (kt < 1) {
            within = false;
            message = (message.isEmpty() ? "" : message + "; ") + "the fit gives K_t below 1 here, which is not physical";
        }
        return new KtEstimate(kt, within, fit.name(), fit.source(), h, hr, t, message);
    }

    static void checkGeometry(double bigD, double smallD) {
        positive("D", bigD);
        positive("d", smallD);
        if (bigD <= smallD) {
            throw InputProblem.ofField("D", "the larger size D = " + DecimalText.exact(bigD) + " must exceed the smaller size d = " + DecimalText.exact(smallD));
        }
    }

    static void positive(String field, double v) {
        if (!Double.isFinite(v)) throw InputProblem.ofField(field, "not a finite number");
        if (v <= 0) throw InputProblem.ofField(field, "must be greater than zero, got " + DecimalText.exact(v));
    }
}
