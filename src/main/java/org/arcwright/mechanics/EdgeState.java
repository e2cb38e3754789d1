package org.arcwright.mechanics;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;

/**
 * An edge of undefined shape in the sense of ISO 13715: the drawing states only which side of the
 * ideal sharp edge the material may lie on, and how far.
 *
 * <ul>
 *   <li>{@code +a}: material beyond the ideal edge, up to a: a burr on an external edge, a passing
 *       (material into the corner) on an internal edge.</li>
 *   <li>{@code -a}: material removed, up to a: an undercut (a break) on an external edge, an undercut
 *       (a relief into the corner) on an internal edge.</li>
 *   <li>{@code ±a}: either, up to a: a "sharp" edge.</li>
 *   <li>Two sizes of the same sign ({@code -0.1 -0.5}) bound the deviation both ways.</li>
 * </ul>
 * Source: ISO 13715:2019 (edges of undefined shape), written from the standard's principles (the
 * graphical symbol is not drawn here). ASME Y14.5 has no such symbol: the
 * {@link #asmeNote(Units)} wording is {@code common practice}.
 *
 * @param type external or internal edge
 * @param sense +, - or ±
 * @param limit the largest deviation allowed (absolute value), or null when the drawing gives the sign only
 * @param least the smallest deviation required with two sizes (absolute value), or null
 */
public record EdgeState(EdgeType type, Sense sense, BigDecimal limit, BigDecimal least) {
    public EdgeState {
        Objects.requireNonNull(type, "type");
        Objects.requireNonNull(sense, "sense");
        if (limit != null && limit.signum() <= 0) throw InputProblem.ofField("edge", "the size must be greater than zero");
        if (least != null) {
            if (limit == null) throw InputProblem.ofField("edge", "a smallest size needs a largest one");
            if (sense == Sense.EITHER) throw InputProblem.ofField("edge", "two sizes need one sign, + or -, not ±");
            if (least.signum() < 0 || least.compareTo(limit) >= 0) {
                throw InputProblem.ofField("edge", "the two sizes must differ, the smaller first in value: " + least + " and " + limit);
            }
        }
    }

    /** A burr or passing allowed up to {@code a}. */
    public static EdgeState plus(EdgeType type, double a) { return new EdgeState(type, Sense.PLUS, big(a), null); }

    /** An undercut (break) allowed up to {@code a}, no burr. */
    public static EdgeState minus(EdgeType type, double a) { return new EdgeState(type, Sense.MINUS, big(a), null); }

    /** Either way up to {@code a}: the sharp edge. */
    public static EdgeState either(EdgeType type, double a) { return new EdgeState(type, Sense.EITHER, big(a), null); }

    /** An undercut required between {@code least} and {@code most}: the usual handling break. */
    public static EdgeState undercutBetween(EdgeType type, double least, double most) {
        return new EdgeState(type, Sense.MINUS, big(most), big(least));
    }

    /**
     * Reads the ISO 13715 text forms: {@code +0.3}, {@code -0.3}, {@code ±0.05} (or {@code +/-0.05}),
     * {@code -0.1 -0.5} (or {@code -0.1/-0.5}, either order), or a sign alone.
     */
    public static EdgeState parse(EdgeType type, String text) {
        if (text == null || text.isBlank()) throw InputProblem.ofField("edge", "missing; e.g. -0.3, +0.3, ±0.05 or -0.1 -0.5");
        String t = text.trim().replace('−', '-').replace("+/-", "±").replace("+-", "±");
        String[] parts = t.split("[\\s/]+");
        if (parts.length > 2) throw InputProblem.ofField("edge", "at most two sizes, got '" + text + "'");
        Sense sense = null;
        BigDecimal[] sizes = new BigDecimal[parts.length];
        int n = 0;
        for (String p : parts) {
            Sense s = Sense.ofSymbol(p.substring(0, 1));
            if (s == null) throw InputProblem.ofField("edge", "each size starts with +, - or ±: '" + text + "'");
            if (sense != null && s != sense) throw InputProblem.ofField("edge", "two sizes need the same sign: '" + text + "'");
            sense = s;
            String num = p.substring(1);
            if (num.isEmpty()) {
                if (parts.length > 1) throw InputProblem.ofField("edge", "a sign without a size stands alone: '" + text + "'");
                continue;
            }
            try {
                sizes[n++] = new BigDecimal(num);
            } catch (NumberFormatException e) {
                throw InputProblem.ofField("edge", "'" + num + "' is not a number in '" + text + "'");
            }
        }
        if (n == 0) return new EdgeState(type, sense, null, null);
        if (n == 1) return new EdgeState(type, sense, sizes[0], null);
        BigDecimal lo = sizes[0].min(sizes[1]);
        BigDecimal hi = sizes[0].max(sizes[1]);
        return new EdgeState(type, sense, hi, lo);
    }

    /** The ISO 13715 text beside the symbol, e.g. {@code -0.1 -0.5} or {@code ±0.05}. */
    public String isoText() {
        if (limit == null) return sense.symbol();
        if (least == null) return sense.symbol() + limit.toPlainString();
        return sense.symbol() + least.toPlainString() + " " + sense.symbol() + limit.toPlainString();
    }

    /** The state's name in the standard's words: burr, passing, undercut or sharp. */
    public String term() {
        return switch (sense) {
            case PLUS -> type == EdgeType.EXTERNAL ? "burr allowed" : "passing allowed";
            case MINUS -> type == EdgeType.EXTERNAL ? "undercut (edge break) required" : "undercut required";
            case EITHER -> type == EdgeType.EXTERNAL ? "sharp: burr or undercut" : "sharp: passing or undercut";
        };
    }

    /** How an ASME drawing says the same in a note ({@code common practice}; Y14.5 has no symbol for it). */
    public String asmeNote(Units units) {
        String u = units == Units.INCH ? "" : " MM";
        String size = limit == null ? "" : least == null ? " " + limit.toPlainString() + " MAX" + u
                : " " + least.toPlainString() + "-" + limit.toPlainString() + u;
        return switch (sense) {
            case PLUS -> type == EdgeType.EXTERNAL ? "BURR PERMITTED" + size + ", NO EDGE BREAK REQUIRED"
                    : "CORNER RUNOUT PERMITTED" + size + ", NO UNDERCUT";
            case MINUS -> type == EdgeType.EXTERNAL ? "BREAK EDGE" + size + ", NO BURR"
                    : "UNDERCUT CORNER" + size + ", NO RUNOUT";
            case EITHER -> type == EdgeType.EXTERNAL ? "SHARP EDGE, BURR OR BREAK" + size
                    : "SHARP CORNER, RUNOUT OR UNDERCUT" + size;
        };
    }

    /**
     * Whether a measured deviation conforms: positive = material beyond the ideal edge (burr,
     * passing), negative = material removed (undercut). A sign-only state has no size limit.
     */
    public boolean permits(double deviation) {
        if (!Double.isFinite(deviation)) throw InputProblem.ofField("deviation", "not a finite number");
        double max = limit == null ? Double.POSITIVE_INFINITY : limit.doubleValue();
        double min = least == null ? 0 : least.doubleValue();
        return switch (sense) {
            case PLUS -> deviation >= min && deviation <= max;
            case MINUS -> -deviation >= min && -deviation <= max;
            case EITHER -> Math.abs(deviation) <= max;
        };
    }

    private static BigDecimal big(double v) {
        if (!Double.isFinite(v)) throw InputProblem.ofField("edge", "not a finite number");
        return BigDecimal.valueOf(v).stripTrailingZeros();
    }

    /** Where the edge is: outside corner (edge) or inside corner. */
    public enum EdgeType {
        EXTERNAL, INTERNAL;

        public static EdgeType parse(String text) {
            if (text == null) throw InputProblem.ofField("edgeType", "missing; use external or internal");
            return switch (text.trim().toLowerCase(Locale.ROOT)) {
                case "external", "outside" -> EXTERNAL;
                case "internal", "inside" -> INTERNAL;
                default -> throw InputProblem.ofField("edgeType", "unknown edge type '" + text + "'; use external or internal");
            };
        }
    }

    /** Which side of the ideal edge the material may lie. */
    public enum Sense {
        PLUS("+"), MINUS("-"), EITHER("±");

        private final String symbol;

        Sense(String symbol) { this.symbol = symbol; }

        public String symbol() { return symbol; }

        static Sense ofSymbol(String s) {
            for (Sense v : values()) if (v.symbol.equals(s)) return v;
            return null;
        }
    }
}
