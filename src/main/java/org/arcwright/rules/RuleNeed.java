package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import org.arcwright.io.DecimalText;
import org.arcwright.tolerance.Units;

/**
 * A need a pack rule adds to every case it fires on: a company floor or ceiling on the radius, or a form or
 * location need the built-in derivation would not see. The advisor proves every candidate against it as it does
 * against the needs it derives, and names the rule as its source. Written in a rule's {@code "needs"} list:
 * <pre>
 *   {"id": "radius-floor", "min": 0.8, "units": "mm",
 *    "why": "works standard: no fatigue fillet under R0.8", "source": "TD-STD-114 §3 (invented)"}
 * </pre>
 *
 * @param id the kind of need, as the JSON contract names it ({@code radius-floor}, {@code radius-ceiling},
 *     {@code form}, {@code location})
 * @param min radius-floor only: the smallest radius allowed, in {@code units}
 * @param max radius-ceiling only: the largest radius allowed, in {@code units}
 * @param units mm or in; required with {@code min} or {@code max}, so one rule serves metric and inch drawings
 * @param why the need in the engineer's words
 * @param source where it comes from: a company standard, a handbook, or "common practice"
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record RuleNeed(Need.Kind id, Double min, Double max, Units units, String why, String source) {

    @JsonCreator
    public RuleNeed(@JsonProperty(value = "id", required = true) Need.Kind id,
                    @JsonProperty("min") Double min,
                    @JsonProperty("max") Double max,
                    @JsonProperty("units") Units units,
                    @JsonProperty(value = "why", required = true) String why,
                    @JsonProperty(value = "source", required = true) String source) {
        if (id == null) throw new IllegalArgumentException("id must be radius-floor, radius-ceiling, form or location");
        if (why == null || why.isBlank()) throw new IllegalArgumentException("why must say the need in words");
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must name where the need comes from (a company standard, a "
                    + "handbook, or common practice)");
        }
        switch (id) {
            case RADIUS_FLOOR -> {
                if (min == null || max != null) {
                    throw new IllegalArgumentException("a radius-floor need takes \"min\" (and \"units\"), not \"max\"");
                }
            }
            case RADIUS_CEILING -> {
                if (max == null || min != null) {
                    throw new IllegalArgumentException("a radius-ceiling need takes \"max\" (and \"units\"), not \"min\"");
                }
            }
            default -> {
                if (min != null || max != null || units != null) {
                    throw new IllegalArgumentException("a " + id.key() + " need takes no min, max or units");
                }
            }
        }
        Double v = min != null ? min : max;
        if (v != null) {
            if (!(Double.isFinite(v) && v > 0)) {
                throw new IllegalArgumentException((min != null ? "min" : "max") + " must be a positive length, got " + DecimalText.exact(v));
            }
            if (units == null) throw new IllegalArgumentException("units (mm or in) must be given with min or max");
        }
        this.id = id;
        this.min = min;
        this.max = max;
        this.units = units;
        this.why = why;
        this.source = source;
    }

    /** The bound ({@code min} or {@code max}) in the case's units, or NaN for form and location. */
    double boundIn(Units caseUnits) {
        Double v = min != null ? min : max;
        return v == null ? Double.NaN : v * units.millimetres() / caseUnits.millimetres();
    }
}
