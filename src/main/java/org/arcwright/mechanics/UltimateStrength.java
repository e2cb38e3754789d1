package org.arcwright.mechanics;

import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.InputProblem;

/**
 * Ultimate tensile strength S<sub>ut</sub> of the material, as given.
 *
 * @param value the strength, finite and positive
 * @param unit MPa or ksi
 */
public record UltimateStrength(double value, Unit unit) {
    /** MPa per ksi: 1 ksi = 1000 lbf/in² = 6.894757 MPa (exact conversion of the pound-force and inch). */
    public static final double MPA_PER_KSI = 6.894757293168361;

    public UltimateStrength {
        Objects.requireNonNull(unit, "unit");
        StressConcentration.positive("ultimateStrength.value", value);
    }

    /** Strength in MPa. */
    public double mpa() { return unit == Unit.MPA ? value : value * MPA_PER_KSI; }

    /** Strength in ksi (kpsi). */
    public double ksi() { return unit == Unit.KSI ? value : value / MPA_PER_KSI; }

    public static UltimateStrength ofMpa(double mpa) { return new UltimateStrength(mpa, Unit.MPA); }

    public static UltimateStrength ofKsi(double ksi) { return new UltimateStrength(ksi, Unit.KSI); }

    /** Units of strength accepted in files. */
    public enum Unit {
        MPA("MPa"), KSI("ksi");

        private final String symbol;

        Unit(String symbol) { this.symbol = symbol; }

        public String symbol() { return symbol; }

        /** Reads {@code MPa}, {@code N/mm2}, {@code ksi} or {@code kpsi} (any case). */
        public static Unit parse(String text) {
            if (text == null) throw InputProblem.ofField("ultimateStrength.units", "missing; use MPa or ksi");
            return switch (text.trim().toLowerCase(Locale.ROOT)) {
                case "mpa", "n/mm2", "n/mm²" -> MPA;
                case "ksi", "kpsi" -> KSI;
                default -> throw InputProblem.ofField("ultimateStrength.units", "unknown units '" + text + "'; use MPa or ksi");
            };
        }

        @Override
        public String toString() { return symbol; }
    }
}
