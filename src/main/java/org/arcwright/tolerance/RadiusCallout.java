package org.arcwright.tolerance;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * A radius dimension as it stands on the drawing: R or CR, its units, and its tolerance form.
 *
 * <p>A plain radius bounds size only: any contour that stays inside the crescent between the limit
 * arcs conforms, flats, dips and a step at the tangent point included (common practice; ASME
 * Y14.5-2018 radius definition, from memory). Form and location need CR or a profile tolerance.
 *
 * <p>The constructor rejects what cannot be made: a radius of zero or less, a lower limit at or
 * below zero, a lower limit above the upper one.
 */
public record RadiusCallout(RadiusKind kind, Units units, ToleranceForm form) {

    public RadiusCallout {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(form, "form");
        validate(form);
    }

    /** A limit-form callout, e.g. from the advisor's adjusted limits. Values are rounded to {@code places}. */
    public static RadiusCallout limits(RadiusKind kind, Units units, double min, double max, int places) {
        return new RadiusCallout(kind, units, new ToleranceForm.Limits(decimal(min, places), decimal(max, places)));
    }

    /** An equal-bilateral callout such as {@code R0.55 ±0.05}. */
    public static RadiusCallout plusMinus(RadiusKind kind, Units units, double nominal, double tol, int places) {
        return new RadiusCallout(kind, units,
                new ToleranceForm.EqualBilateral(decimal(nominal, places), decimal(tol, places)));
    }

    /** Smallest radius allowed; a MAX-only radius is bounded by zero, reported as empty. */
    public OptionalDouble min() { return toDouble(form.lower()); }

    /** Largest radius allowed; empty for a MIN-only radius or an untoleranced one. */
    public OptionalDouble max() { return toDouble(form.upper()); }

    /** The nominal as drawn, or the mean of the limits for limit and single-limit forms where known. */
    public double nominalOrMean() {
        if (form.nominal().isPresent()) return form.nominal().get().doubleValue();
        if (min().isPresent() && max().isPresent()) return (min().getAsDouble() + max().getAsDouble()) / 2;
        if (form instanceof ToleranceForm.SingleLimit s) return s.value().doubleValue();
        throw new IllegalStateException("no nominal");
    }

    /** The nominal as drawn, if the form has one. */
    public OptionalDouble nominal() { return toDouble(form.nominal()); }

    /** Mean of the limits, when both exist. */
    public OptionalDouble mean() {
        if (min().isEmpty() || max().isEmpty()) return OptionalDouble.empty();
        return OptionalDouble.of(form.lower().get().add(form.upper().get()).doubleValue() / 2);
    }

    /** Width of the size band {@code max - min}, exact in decimal, when both limits exist. */
    public OptionalDouble band() {
        if (form.lower().isEmpty() || form.upper().isEmpty()) return OptionalDouble.empty();
        return OptionalDouble.of(form.upper().get().subtract(form.lower().get()).doubleValue());
    }

    /** True when both limits are on the drawing (a MAX-only radius still bounds below by zero). */
    public boolean isFullyToleranced() {
        return form.lower().isPresent() && form.upper().isPresent();
    }

    /** Decimal places the engineer wrote, the most of any value in the callout. */
    public int places() {
        return form.places();
    }

    /** The same values with another kind (e.g. R turned into CR). */
    public RadiusCallout withKind(RadiusKind newKind) {
        return new RadiusCallout(newKind, units, form);
    }

    static BigDecimal decimal(double value, int places) {
        if (!Double.isFinite(value)) throw InputProblem.ofField("radius", "not a finite number: " + DecimalText.exact(value));
        return BigDecimal.valueOf(value).setScale(Math.max(0, places), RoundingMode.HALF_EVEN);
    }

    private static OptionalDouble toDouble(Optional<BigDecimal> v) {
        return v.map(b -> OptionalDouble.of(b.doubleValue())).orElseGet(OptionalDouble::empty);
    }

    private static void validate(ToleranceForm form) {
        if (form instanceof ToleranceForm.EqualBilateral f) {
            positive("nominal", f.nominalValue());
            if (f.plusMinus().signum() <= 0) {
                throw InputProblem.ofField("tolerance", "the ± value must be greater than zero, got "
                        + f.plusMinus().toPlainString());
            }
        } else if (form instanceof ToleranceForm.Deviations f) {
            positive("nominal", f.nominalValue());
            if (f.plus().compareTo(f.minus()) <= 0) {
                throw InputProblem.ofField("tolerance", "upper deviation " + f.plus().toPlainString()
                        + " must be greater than lower deviation " + f.minus().toPlainString());
            }
        } else if (form instanceof ToleranceForm.Limits f) {
            if (f.min().compareTo(f.max()) > 0) {
                throw InputProblem.ofField("limits", "min " + f.min().toPlainString()
                        + " is greater than max " + f.max().toPlainString());
            }
            if (f.min().compareTo(f.max()) == 0) {
                throw InputProblem.ofField("limits", "min equals max (" + f.min().toPlainString()
                        + "): no tolerance band");
            }
        } else if (form instanceof ToleranceForm.SingleLimit f) {
            positive("radius", f.value());
        } else if (form instanceof ToleranceForm.Untoleranced f) {
            positive("nominal", f.nominalValue());
        }
        form.lower().ifPresent(lo -> {
            if (lo.signum() <= 0) {
                throw InputProblem.ofField("min", "the smallest allowed radius must be greater than zero, got "
                        + lo.toPlainString());
            }
        });
    }

    private static void positive(String field, BigDecimal v) {
        if (v.signum() <= 0) {
            throw InputProblem.ofField(field, "a radius must be greater than zero, got " + v.toPlainString());
        }
    }
}
