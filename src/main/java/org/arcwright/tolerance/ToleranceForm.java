package org.arcwright.tolerance;

import java.math.BigDecimal;
import java.util.Optional;

/**
 * How a radius is toleranced as drawn. Values are exact decimals as written, so that formatting
 * never invents or drops a digit the engineer drew; the number of places each was written with is
 * kept by {@link BigDecimal#scale()}.
 */
public sealed interface ToleranceForm {

    /** The nominal size, when the form has one. */
    Optional<BigDecimal> nominal();

    /** The smallest size allowed, when bounded below (a MAX-only radius is bounded only by zero). */
    Optional<BigDecimal> lower();

    /** The largest size allowed, when bounded above. */
    Optional<BigDecimal> upper();

    /** The form's name in files and JSON output. */
    String formName();

    /** Decimal places the engineer wrote, the most of any value in the form. */
    int places();

    /** Equal bilateral: {@code R0.55 ±0.05}. */
    record EqualBilateral(BigDecimal nominalValue, BigDecimal plusMinus) implements ToleranceForm {
        public Optional<BigDecimal> nominal() { return Optional.of(nominalValue); }
        public Optional<BigDecimal> lower() { return Optional.of(nominalValue.subtract(plusMinus)); }
        public Optional<BigDecimal> upper() { return Optional.of(nominalValue.add(plusMinus)); }
        public String formName() { return "equal-bilateral"; }
        public int places() { return Math.max(nominalValue.scale(), plusMinus.scale()); }
    }

    /**
     * Unequal bilateral or unilateral: {@code R3 +0.2/-0.1}, {@code R3 +0.2/0}. {@code plus} is the
     * upper deviation and {@code minus} the lower one, both as signed values ({@code minus <= 0 <=
     * plus} is not required: a deviation pair such as {@code +0.3/+0.1} is legal).
     */
    record Deviations(BigDecimal nominalValue, BigDecimal plus, BigDecimal minus) implements ToleranceForm {
        public Optional<BigDecimal> nominal() { return Optional.of(nominalValue); }
        public Optional<BigDecimal> lower() { return Optional.of(nominalValue.add(minus)); }
        public Optional<BigDecimal> upper() { return Optional.of(nominalValue.add(plus)); }
        public String formName() { return "deviations"; }
        public int places() { return Math.max(nominalValue.scale(), Math.max(plus.scale(), minus.scale())); }
    }

    /** Limit dimensioning: {@code CR 1.5-2.0}. The nominal is taken as the mean. */
    record Limits(BigDecimal min, BigDecimal max) implements ToleranceForm {
        public Optional<BigDecimal> nominal() { return Optional.empty(); }
        public Optional<BigDecimal> lower() { return Optional.of(min); }
        public Optional<BigDecimal> upper() { return Optional.of(max); }
        public String formName() { return "limits"; }
        public int places() { return Math.max(min.scale(), max.scale()); }
    }

    /** A single limit: {@code R .060 MAX}, {@code CR .25 MIN}. */
    record SingleLimit(BigDecimal value, LimitSide side) implements ToleranceForm {
        public Optional<BigDecimal> nominal() { return Optional.empty(); }
        public Optional<BigDecimal> lower() { return side == LimitSide.MIN ? Optional.of(value) : Optional.empty(); }
        public Optional<BigDecimal> upper() { return side == LimitSide.MAX ? Optional.of(value) : Optional.empty(); }
        public String formName() { return "single-limit"; }
        public int places() { return value.scale(); }
    }

    /** No tolerance drawn: {@code R 2.5}; the title block's general tolerance applies. */
    record Untoleranced(BigDecimal nominalValue) implements ToleranceForm {
        public Optional<BigDecimal> nominal() { return Optional.of(nominalValue); }
        public Optional<BigDecimal> lower() { return Optional.empty(); }
        public Optional<BigDecimal> upper() { return Optional.empty(); }
        public String formName() { return "untoleranced"; }
        public int places() { return nominalValue.scale(); }
    }
}
