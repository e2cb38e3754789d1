package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.arcwright.tolerance.Units;

/**
 * The figures behind one recommendation. Every length is in {@link #units()}, which the value carries, so
 * no length leaves here without its unit; factors (K<sub>t</sub>, K<sub>f</sub>) are dimensionless.
 *
 * <p>The JSON form keeps the keys of the earlier open map ({@code min}, {@code max}, {@code zone},
 * {@code ktAtMin}...), so saved worksheets read back unchanged; keys it does not know are ignored.
 *
 * @param units the length unit of every length below
 * @param nominal the nominal radius drawn (or the mean the control is built about)
 * @param min smallest radius the control admits at the corner (crescent geometry at {@code angle})
 * @param max largest radius the control admits at the corner
 * @param band {@code max - min}
 * @param angle the corner angle in degrees
 * @param crescentWidth width of the crescent between the limit arcs on the bisector
 * @param equivalentProfileZone the equal-bilateral profile zone that holds the same crescent
 * @param zone profile: the (first-tier) zone, else null
 * @param outward profile: the ASME unequally disposed value (the part outside the material), else null
 * @param isoOffset profile: the ISO 1101 offset (UZ) of the zone's centre, + toward the outside of the material, for
 *     an unequally disposed zone; else null
 * @param tierZones composite profile: every tier's zone, else null
 * @param toleranceSource where the tolerance came from, in words
 * @param adjusted true when the limits were moved to meet a need
 * @param ktAtMin K<sub>t</sub> at {@code min}, or null
 * @param ktAtMax K<sub>t</sub> at {@code max}, or null
 * @param kfAtMin K<sub>f</sub> at {@code min}, or null
 * @param kfAtMax K<sub>f</sub> at {@code max}, or null
 * @param stressMethod the fit and its source, or null
 * @param targetKt the case's K<sub>t</sub> target, or null
 * @param targetKf the case's K<sub>f</sub> target, or null
 * @param minRadiusForTarget the smallest radius meeting every stated stress target, or null
 * @param seats whether the largest admitted radius seats under the mating corner, or null
 * @param seatingMargin clearance left at the largest radius (negative when it fouls), or null
 * @param largestSeatingRadius the largest radius that still seats, or null
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
@JsonIgnoreProperties(ignoreUnknown = true)
public record AdviceFigures(Units units, Double nominal, Double min, Double max, Double band, Double angle,
                            Double crescentWidth, Double equivalentProfileZone, Double zone, Double outward,
                            Double isoOffset, List<Double> tierZones, String toleranceSource, Boolean adjusted, Double ktAtMin,
                            Double ktAtMax, Double kfAtMin, Double kfAtMax, String stressMethod, Double targetKt,
                            Double targetKf, Double minRadiusForTarget, Boolean seats, Double seatingMargin,
                            Double largestSeatingRadius) {

    /** No figures at all (a card built from text only). */
    public static final AdviceFigures NONE = new AdviceFigures(null, null, null, null, null, null, null, null, null,
            null, null, null, null, null, null, null, null, null, null, null, null, null, null, null, null);

    @JsonCreator
    public AdviceFigures(@JsonProperty("units") Units units, @JsonProperty("nominal") Double nominal,
                         @JsonProperty("min") Double min, @JsonProperty("max") Double max,
                         @JsonProperty("band") Double band, @JsonProperty("angle") Double angle,
                         @JsonProperty("crescentWidth") Double crescentWidth,
                         @JsonProperty("equivalentProfileZone") Double equivalentProfileZone,
                         @JsonProperty("zone") Double zone, @JsonProperty("outward") Double outward,
                         @JsonProperty("isoOffset") Double isoOffset,
                         @JsonProperty("tierZones") List<Double> tierZones,
                         @JsonProperty("toleranceSource") String toleranceSource,
                         @JsonProperty("adjusted") Boolean adjusted,
                         @JsonProperty("ktAtMin") Double ktAtMin, @JsonProperty("ktAtMax") Double ktAtMax,
                         @JsonProperty("kfAtMin") Double kfAtMin, @JsonProperty("kfAtMax") Double kfAtMax,
                         @JsonProperty("stressMethod") String stressMethod,
                         @JsonProperty("targetKt") Double targetKt, @JsonProperty("targetKf") Double targetKf,
                         @JsonProperty("minRadiusForTarget") Double minRadiusForTarget,
                         @JsonProperty("seats") Boolean seats, @JsonProperty("seatingMargin") Double seatingMargin,
                         @JsonProperty("largestSeatingRadius") Double largestSeatingRadius) {
        this.units = units;
        this.nominal = nominal;
        this.min = min;
        this.max = max;
        this.band = band;
        this.angle = angle;
        this.crescentWidth = crescentWidth;
        this.equivalentProfileZone = equivalentProfileZone;
        this.zone = zone;
        this.outward = outward;
        this.isoOffset = isoOffset;
        this.tierZones = tierZones == null ? null : List.copyOf(tierZones);
        this.toleranceSource = toleranceSource;
        this.adjusted = adjusted;
        this.ktAtMin = ktAtMin;
        this.ktAtMax = ktAtMax;
        this.kfAtMin = kfAtMin;
        this.kfAtMax = kfAtMax;
        this.stressMethod = stressMethod;
        this.targetKt = targetKt;
        this.targetKf = targetKf;
        this.minRadiusForTarget = minRadiusForTarget;
        this.seats = seats;
        this.seatingMargin = seatingMargin;
        this.largestSeatingRadius = largestSeatingRadius;
    }

    /** The units symbol in files and maps: {@code mm} or {@code in}. */
    @JsonIgnore
    public String unitsSymbol() { return units == null ? null : units.symbol(); }

    /**
     * The figures as an ordered key-value view, for readers that list figures generically (sheets, note
     * templates, desktop cards); the keys are the JSON keys.
     */
    @JsonIgnore
    public Map<String, Object> asMap() {
        Map<String, Object> m = new LinkedHashMap<>();
        put(m, "units", unitsSymbol());
        put(m, "nominal", nominal);
        put(m, "min", min);
        put(m, "max", max);
        put(m, "band", band);
        put(m, "angle", angle);
        put(m, "crescentWidth", crescentWidth);
        put(m, "equivalentProfileZone", equivalentProfileZone);
        put(m, "zone", zone);
        put(m, "outward", outward);
        put(m, "isoOffset", isoOffset);
        put(m, "tierZones", tierZones == null ? null : new ArrayList<>(tierZones));
        put(m, "toleranceSource", toleranceSource);
        put(m, "adjusted", adjusted);
        put(m, "ktAtMin", ktAtMin);
        put(m, "ktAtMax", ktAtMax);
        put(m, "kfAtMin", kfAtMin);
        put(m, "kfAtMax", kfAtMax);
        put(m, "stressMethod", stressMethod);
        put(m, "targetKt", targetKt);
        put(m, "targetKf", targetKf);
        put(m, "minRadiusForTarget", minRadiusForTarget);
        put(m, "seats", seats);
        put(m, "seatingMargin", seatingMargin);
        put(m, "largestSeatingRadius", largestSeatingRadius);
        return m;
    }

    /** Reads the earlier open map form (the keys of {@link #asMap()}); unknown keys are ignored. */
    public static AdviceFigures fromMap(Map<String, Object> m) {
        if (m == null || m.isEmpty()) return NONE;
        Object u = m.get("units");
        Units units = u instanceof Units uu ? uu : u == null ? null : Units.parse(u.toString());
        @SuppressWarnings("unchecked")
        List<Double> tiers = m.get("tierZones") instanceof List<?> l
                ? l.stream().map(o -> ((Number) o).doubleValue()).toList() : null;
        return new AdviceFigures(units, num(m, "nominal"), num(m, "min"), num(m, "max"), num(m, "band"),
                num(m, "angle"), num(m, "crescentWidth"),
                num(m, "equivalentProfileZone") != null ? num(m, "equivalentProfileZone") : num(m, "equalBilateralProfile"),
                num(m, "zone"), num(m, "outward"), num(m, "isoOffset"), tiers, str(m, "toleranceSource"), bool(m, "adjusted"),
                num(m, "ktAtMin"), num(m, "ktAtMax"), num(m, "kfAtMin"), num(m, "kfAtMax"), str(m, "stressMethod"),
                num(m, "targetKt"), num(m, "targetKf"), num(m, "minRadiusForTarget"), bool(m, "seats"),
                num(m, "seatingMargin"), num(m, "largestSeatingRadius"));
    }

    /** These figures with the mechanics' figures of {@code mech} filled in where it has them. */
    AdviceFigures withMechanics(AdviceFigures mech) {
        return new AdviceFigures(units, nominal, min, max, band, angle, crescentWidth, equivalentProfileZone, zone,
                outward, isoOffset, tierZones, toleranceSource, adjusted, mech.ktAtMin, mech.ktAtMax, mech.kfAtMin, mech.kfAtMax,
                mech.stressMethod, mech.targetKt, mech.targetKf, mech.minRadiusForTarget, mech.seats,
                mech.seatingMargin, mech.largestSeatingRadius);
    }

    private static void put(Map<String, Object> m, String k, Object v) {
        if (v != null) m.put(k, v);
    }

    private static Double num(Map<String, Object> m, String k) {
        return m.get(k) instanceof Number n ? n.doubleValue() : null;
    }

    private static String str(Map<String, Object> m, String k) {
        return m.get(k) == null ? null : m.get(k).toString();
    }

    private static Boolean bool(Map<String, Object> m, String k) {
        return m.get(k) instanceof Boolean b ? b : null;
    }
}
