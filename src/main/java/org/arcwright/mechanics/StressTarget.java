package org.arcwright.mechanics;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * A limit on the stress concentration, K<sub>t</sub> or K<sub>f</sub>, that the smallest radius must keep.
 *
 * @param factor which factor is limited
 * @param value the largest acceptable value, greater than 1
 */
public record StressTarget(Factor factor, double value) {
    public StressTarget {
        Objects.requireNonNull(factor, "factor");
        String field = factor == Factor.KT ? "targetKt" : "targetKf";
        if (!Double.isFinite(value)) throw InputProblem.ofField(field, "not a finite number");
        if (value <= 1) throw InputProblem.ofField(field, "must be greater than 1 (no notch), got " + DecimalText.exact(value));
    }

    public static StressTarget kt(double value) { return new StressTarget(Factor.KT, value); }

    public static StressTarget kf(double value) { return new StressTarget(Factor.KF, value); }

    /** The theoretical or the fatigue factor. */
    public enum Factor {
        KT("Kt"), KF("Kf");

        private final String symbol;

        Factor(String symbol) { this.symbol = symbol; }

        public String symbol() { return symbol; }
    }
}
