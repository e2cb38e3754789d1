package org.arcwright.tolerance;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import org.arcwright.io.DecimalText;

/**
 * A nominal-size range as tolerance tables write it: "over 3 up to 6" holds 6 but not 3; the first
 * range of a table usually starts inclusively ("0.5 up to 3", written {@code from}).
 *
 * @param from inclusive lower bound, or null
 * @param over exclusive lower bound, or null
 * @param upTo inclusive upper bound, or null for an open range ("over 400")
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record SizeRange(Double from, Double over, Double upTo) {

    @JsonCreator
    public SizeRange(@JsonProperty("from") Double from, @JsonProperty("over") Double over,
                     @JsonProperty("upTo") Double upTo) {
        if (from != null && over != null) throw new IllegalArgumentException("give 'from' or 'over', not both");
        if (upTo != null && !Double.isFinite(upTo)) throw new IllegalArgumentException("upTo must be finite");
        double lo = from != null ? from : over != null ? over : Double.NEGATIVE_INFINITY;
        if (upTo != null && upTo <= lo) throw new IllegalArgumentException("upTo " + DecimalText.exact(upTo) + " must exceed " + DecimalText.exact(lo));
        this.from = from;
        this.over = over;
        this.upTo = upTo;
    }

    /** True when {@code size} lies in this range, bounds as the table states them. */
    public boolean contains(double size) {
        if (from != null && size < from) return false;
        if (over != null && size <= over) return false;
        return upTo == null || size <= upTo;
    }

    /** The range in the table's words, e.g. "over 3 up to 6". */
    public String describe() {
        String lo = from != null ? DecimalText.exact(from) : over != null ? "over " + DecimalText.exact(over) : "";
        String hi = upTo != null ? "up to " + DecimalText.exact(upTo) : "";
        if (lo.isEmpty()) return hi;
        if (hi.isEmpty()) return lo;
        return lo + " " + hi;
    }
}
