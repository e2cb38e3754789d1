package org.arcwright.simulate;

/**
 * A count out of all simulated parts, its share, and the 95 % Wilson score interval of the share.
 *
 * <p>Wilson score interval (E. B. Wilson, "Probable inference, the law of succession, and statistical
 * inference", JASA 22, 1927): with {@code p = k/n} and {@code z = 1.959964},
 * {@code (p + z²/2n ± z·√(p(1-p)/n + z²/4n²)) / (1 + z²/n)}. Brown, Cai and DasGupta ("Interval
 * estimation for a binomial proportion", Statistical Science 16, 2001) recommend it over the Wald
 * interval, which collapses to a point at 0 or n: exactly where an escape share sits for a good
 * callout.
 *
 * @param count parts of this kind
 * @param parts all parts
 * @param share {@code count / parts}
 * @param low lower end of the 95 % interval
 * @param high upper end of the 95 % interval
 */
public record Share(long count, long parts, double share, double low, double high) {
    /** The two-sided 95 % normal quantile. */
    public static final double Z95 = 1.959963984540054;

    /** The share of {@code count} in {@code parts} with its 95 % Wilson interval. */
    public static Share of(long count, long parts) {
        if (parts <= 0 || count < 0 || count > parts) throw new IllegalArgumentException("count " + count + " of " + parts);
        double n = parts, p = count / n, z2 = Z95 * Z95;
        double denom = 1 + z2 / n;
        double centre = (p + z2 / (2 * n)) / denom;
        double half = Z95 * Math.sqrt(p * (1 - p) / n + z2 / (4 * n * n)) / denom;
        return new Share(count, parts, p, Math.max(0, centre - half), Math.min(1, centre + half));
    }
}
