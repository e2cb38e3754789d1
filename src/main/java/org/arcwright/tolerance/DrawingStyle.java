package org.arcwright.tolerance;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * How a radius callout is written on the drawing, following the drawing standard in force.
 *
 * <p>{@link #ASME} follows ASME Y14.5-2018 (from memory: 1.6.1 and 2.3.1 for millimetres, 1.6.2 and
 * 2.3.2 for inches):
 * <ul>
 *   <li>mm: a zero before the decimal point of a value under one; no trailing zeros after a whole
 *       nominal; a zero deviation shown as a single {@code 0} without sign; both deviations of a
 *       bilateral tolerance and both limits with the same number of places.</li>
 *   <li>inch: no zero before the point; dimension and tolerance (and both limits) with the same
 *       number of places, zeros added where needed; a zero deviation keeps its sign and places
 *       ({@code -.000}).</li>
 * </ul>
 * {@link #ISO} follows ISO 129-1:2018 and ISO 14405-1 (from memory): a zero before the point, both
 * deviations with the same number of places, a zero deviation as {@code 0}, single limits as
 * lower-case {@code max}/{@code min}. ISO has no controlled radius: a CR callout is written as R
 * and {@link #remarks(RadiusCallout)} says what to add.
 */
public enum DrawingStyle {
    ASME,
    ISO;

    /** Reads {@code asme} or {@code iso} (any case). */
    @JsonCreator
    public static DrawingStyle parse(String text) {
        if (text == null) throw InputProblem.ofField("standard", "missing; use asme or iso");
        return switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "asme", "asme-y14.5", "y14.5" -> ASME;
            case "iso" -> ISO;
            default -> throw InputProblem.ofField("standard",
                    "unknown standard '" + text + "'; use asme or iso");
        };
    }

    /** The name used in files: {@code asme} or {@code iso}. */
    @JsonValue
    public String key() { return name().toLowerCase(Locale.ROOT); }

    /** The callout text as it would be drawn. */
    public String format(RadiusCallout c) {
        String prefix = (this == ISO ? RadiusKind.R : c.kind()).symbol();
        boolean inch = c.units() == Units.INCH;
        return prefix + body(c.form(), c.units() == Units.INCH);
    }

    private String body(ToleranceForm form, boolean inch) {
        boolean asmeInch = inch && this == ASME;
        if (form instanceof ToleranceForm.EqualBilateral f) {
            if (asmeInch) {
                int p = Math.max(f.nominalValue().scale(), f.plusMinus().scale());
                return value(f.nominalValue(), p, true) + " ±" + value(f.plusMinus(), p, true);
            }
            return nominal(f.nominalValue(), inch) + " ±" + value(f.plusMinus(), f.plusMinus().scale(), inch);
        }
        if (form instanceof ToleranceForm.Deviations f) {
            int p = Math.max(f.plus().scale(), f.minus().scale());
            if (asmeInch) {
                p = Math.max(p, f.nominalValue().scale());
                return value(f.nominalValue(), p, true) + " " + signedInch(f.plus(), p, true) + "/"
                        + signedInch(f.minus(), p, false);
            }
            return nominal(f.nominalValue(), inch) + " " + signed(f.plus(), p, inch) + "/" + signed(f.minus(), p, inch);
        }
        if (form instanceof ToleranceForm.Limits f) {
            int p = Math.max(f.min().scale(), f.max().scale());
            return value(f.min(), p, inch) + "-" + value(f.max(), p, inch);
        }
        if (form instanceof ToleranceForm.SingleLimit f) {
            String word = f.side() == LimitSide.MAX ? "MAX" : "MIN";
            if (this == ISO) word = word.toLowerCase(Locale.ROOT);
            return (asmeInch ? value(f.value(), f.value().scale(), true) : nominal(f.value(), inch)) + " " + word;
        }
        ToleranceForm.Untoleranced f = (ToleranceForm.Untoleranced) form;
        return asmeInch ? value(f.nominalValue(), f.nominalValue().scale(), true) : nominal(f.nominalValue(), inch);
    }

    /**
     * A tolerance value (a profile zone, an offset, a crescent width) as this style writes it.
     * The value is rounded half-even to at most {@code maxPlaces} decimals. ASME mm and ISO drop
     * trailing zeros and keep the zero before the point ({@code 0.1}, {@code 0.05}); ASME inch drops
     * the zero before the point and shows at least three places ({@code .004}, {@code .0005})
     * (ASME Y14.5-2018 decimal conventions for tolerances, from memory; three inch places is common
     * practice). Signs are kept for negative values.
     *
     * @param value the value in {@code units}, finite
     * @param maxPlaces decimals kept at most, 0 to 6
     */
    public String formatValue(double value, Units units, int maxPlaces) {
        if (!Double.isFinite(value)) throw new IllegalArgumentException("not a finite number: " + DecimalText.exact(value));
        if (maxPlaces < 0 || maxPlaces > 6) throw new IllegalArgumentException("places must be 0 to 6, got " + maxPlaces);
        BigDecimal v = BigDecimal.valueOf(value).setScale(maxPlaces, RoundingMode.HALF_EVEN).stripTrailingZeros();
        if (v.signum() == 0) v = BigDecimal.ZERO;
        if (v.scale() < 0) v = v.setScale(0);
        boolean asmeInch = this == ASME && units == Units.INCH;
        if (asmeInch && v.scale() < 3) v = v.setScale(Math.min(3, Math.max(maxPlaces, 0)));
        String s = v.toPlainString();
        if (asmeInch) {
            if (s.startsWith("0.")) s = s.substring(1);
            else if (s.startsWith("-0.")) s = "-" + s.substring(2);
        }
        return s;
    }

    /**
     * Two limits of one size written with the same number of places, as limit dimensioning wants
     * them ({@code 3.48} and {@code 3.50}, not {@code 3.5}; ASME Y14.5-2018 and ISO 129-1, from
     * memory). Each is rounded to at most {@code maxPlaces}; the pair takes the larger place count.
     */
    public String[] formatLimitPair(double min, double max, Units units, int maxPlaces) {
        String a = formatValue(min, units, maxPlaces);
        String b = formatValue(max, units, maxPlaces);
        int places = Math.max(placesOf(a), placesOf(b));
        return new String[] {pad(a, places), pad(b, places)};
    }

    private static int placesOf(String s) {
        int dot = s.indexOf('.');
        return dot < 0 ? 0 : s.length() - dot - 1;
    }

    private static String pad(String s, int places) {
        int have = placesOf(s);
        if (have >= places) return s;
        return (have == 0 ? s + "." : s) + "0".repeat(places - have);
    }

    /**
     * A dimensionless figure (a stress concentration factor, a ratio) with exactly {@code places}
     * decimals, rounded half-even ({@link DecimalText#fixed}): the same in both styles.
     */
    public static String formatFigure(double value, int places) {
        if (!Double.isFinite(value)) throw new IllegalArgumentException("not a finite number: " + DecimalText.exact(value));
        return DecimalText.fixed(value, places);
    }

    /** The text of a radius with limits as this style draws it, e.g. {@code R1.8-2.2} or {@code CR 1.8-2.2}. */
    public String formatLimits(RadiusKind kind, Units units, double min, double max, Double nominal) {
        int places = placesFor(units, min, max, nominal == null ? min : nominal);
        RadiusCallout c;
        if (nominal == null) {
            c = RadiusCallout.limits(kind, units, min, max, places);
        } else {
            BigDecimal n = RadiusCallout.decimal(nominal, places);
            BigDecimal plus = RadiusCallout.decimal(max, places).subtract(n);
            BigDecimal minus = RadiusCallout.decimal(min, places).subtract(n);
            ToleranceForm form = plus.compareTo(minus.negate()) == 0
                    ? new ToleranceForm.EqualBilateral(n, plus)
                    : new ToleranceForm.Deviations(n, plus, minus);
            c = new RadiusCallout(kind, units, form);
        }
        return format(c);
    }

    /** Fewest decimals (at least 1 in mm, 3 in inches, at most 4) that show all values exactly. */
    private static int placesFor(Units units, double... values) {
        int least = units == Units.INCH ? 3 : 1;
        for (int p = least; p < 4; p++) {
            boolean exact = true;
            for (double v : values) {
                if (Math.abs(v * Math.pow(10, p) - Math.rint(v * Math.pow(10, p))) > 1e-6) exact = false;
            }
            if (exact) return p;
        }
        return 4;
    }

    /** What a reader of this style must be told beyond the callout text. */
    public List<String> remarks(RadiusCallout c) {
        List<String> out = new ArrayList<>();
        if (this == ISO && c.kind() == RadiusKind.CR) {
            out.add("Controlled radius (CR) is an ASME Y14.5 concept with no ISO equivalent: the ISO form states the "
                    + "limits as R, and a profile of a surface tolerance (ISO 1101) where form matters.");
        }
        if (this == ISO && c.units() == Units.INCH) {
            out.add("ISO drawings are normally dimensioned in millimetres.");
        }
        if (c.form() instanceof ToleranceForm.Untoleranced) {
            out.add("No tolerance is drawn: the general tolerance of the title block applies.");
        }
        return out;
    }

    /** A nominal: ASME mm and ISO drop trailing zeros of a whole number; the place count is kept otherwise. */
    private String nominal(BigDecimal v, boolean inch) {
        BigDecimal stripped = v.stripTrailingZeros();
        if (stripped.scale() <= 0) return leadingZero(stripped.setScale(0).toPlainString(), inch);
        return value(v, v.scale(), inch);
    }

    private String value(BigDecimal v, int places, boolean inch) {
        String s = v.setScale(places, RoundingMode.UNNECESSARY).toPlainString();
        return leadingZero(s, inch);
    }

    private String leadingZero(String s, boolean inch) {
        if (inch && this == ASME && s.startsWith("0.")) return s.substring(1);
        return s;
    }

    private String signed(BigDecimal v, int places, boolean inch) {
        if (v.signum() == 0) return "0";
        String body = value(v.abs(), places, inch);
        return (v.signum() > 0 ? "+" : "-") + body;
    }

    private String signedInch(BigDecimal v, int places, boolean upper) {
        String body = value(v.abs(), places, true);
        char sign = v.signum() > 0 ? '+' : v.signum() < 0 ? '-' : upper ? '+' : '-';
        return sign + body;
    }
}
