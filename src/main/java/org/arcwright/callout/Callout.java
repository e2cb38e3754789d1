package org.arcwright.callout;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonSubTypes;
import com.fasterxml.jackson.annotation.JsonTypeInfo;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.arcwright.io.DecimalText;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;

/**
 * A control on a fillet, round or edge, as the drawing would carry it. Values are in the drawing's
 * units, which the enclosing case or worksheet states.
 */
@JsonTypeInfo(use = JsonTypeInfo.Id.NAME, property = "type")
@JsonSubTypes({
        @JsonSubTypes.Type(value = Callout.General.class, name = "general"),
        @JsonSubTypes.Type(value = Callout.Radius.class, name = "radius"),
        @JsonSubTypes.Type(value = Callout.ControlledRadius.class, name = "controlled-radius"),
        @JsonSubTypes.Type(value = Callout.Profile.class, name = "profile"),
        @JsonSubTypes.Type(value = Callout.CompositeProfile.class, name = "composite-profile")})
public sealed interface Callout permits Callout.General, Callout.SizeLimits, Callout.Profile, Callout.CompositeProfile {

    /** The {@code type} name used in files. */
    @JsonIgnore
    String typeName();

    /** Datum references, all tiers together, in order of first appearance. */
    @JsonIgnore
    default List<DatumReference> allDatums() { return List.of(); }

    /**
     * The title block governs: a general-tolerance table and class, or an ISO 13715 edge note.
     *
     * @param table general-tolerance table id, e.g. {@code iso2768-1-radius-chamfer}, or null
     * @param toleranceClass class in that table, e.g. {@code m}, or null
     * @param edgeNote an ISO 13715 edge indication or an ASME-style edge-break note, or null
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    record General(String table, String toleranceClass, String edgeNote) implements Callout {
        public String typeName() { return "general"; }
    }

    /** A size control on the radius: limits, with CR adding a fair curve. */
    sealed interface SizeLimits extends Callout permits Radius, ControlledRadius {
        /** Smallest radius allowed. */
        double min();

        /** Largest radius allowed. */
        double max();

        /** The nominal as drawn, or null for limit dimensioning. */
        Double nominal();

        /** R or CR. */
        @JsonIgnore
        RadiusKind radiusKind();

        /** As a radius callout in limit form, rounded to {@code places}. */
        default RadiusCallout toRadiusCallout(Units units, int places) {
            return RadiusCallout.limits(radiusKind(), units, min(), max(), places);
        }
    }

    /**
     * A radius (R) with limits: size only.
     *
     * @param min smallest radius, > 0
     * @param max largest radius, > min
     * @param nominal the nominal as drawn, or null for limit dimensioning
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    record Radius(@JsonProperty(value = "min", required = true) double min,
                  @JsonProperty(value = "max", required = true) double max,
                  @JsonProperty("nominal") Double nominal) implements SizeLimits {
        public Radius {
            requireLimits(min, max, nominal);
        }

        public String typeName() { return "radius"; }

        public RadiusKind radiusKind() { return RadiusKind.R; }
    }

    /**
     * A controlled radius (CR, ASME Y14.5): size plus a fair curve with no flats or reversals.
     *
     * @param min smallest radius, > 0
     * @param max largest radius, > min
     * @param nominal the nominal as drawn, or null
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    record ControlledRadius(@JsonProperty(value = "min", required = true) double min,
                            @JsonProperty(value = "max", required = true) double max,
                            @JsonProperty("nominal") Double nominal) implements SizeLimits {
        public ControlledRadius {
            requireLimits(min, max, nominal);
        }

        public String typeName() { return "controlled-radius"; }

        public RadiusKind radiusKind() { return RadiusKind.CR; }
    }

    /**
     * Profile of a surface.
     *
     * @param zone total zone width, > 0
     * @param outward ASME unequally disposed value: the part of the zone on the add-material side;
     *     null for an equal-bilateral zone; 0 &lt;= outward &lt;= zone
     * @param datums datum references; empty means the zone floats (size and form only)
     * @param dynamic the dynamic profile modifier: form controlled, size left to another tolerance
     * @param extent where the tolerance applies
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    record Profile(double zone, Double outward, List<DatumReference> datums, boolean dynamic, Extent extent)
            implements Callout {
        @JsonCreator
        public Profile(@JsonProperty(value = "zone", required = true) double zone,
                       @JsonProperty("outward") Double outward,
                       @JsonProperty("datums") List<DatumReference> datums,
                       @JsonProperty("dynamic") boolean dynamic,
                       @JsonProperty("extent") Extent extent) {
            requirePositive("zone", zone);
            if (outward != null && !(Double.isFinite(outward) && outward >= 0 && outward <= zone)) {
                throw new IllegalArgumentException("outward must lie between 0 and the zone " + DecimalText.exact(zone) + ", got " + DecimalText.exact(outward));
            }
            this.zone = zone;
            this.outward = outward;
            this.datums = datums == null ? List.of() : List.copyOf(datums);
            requireDistinct(this.datums);
            this.dynamic = dynamic;
            this.extent = extent == null ? Extent.THIS_RADIUS : extent;
        }

        public String typeName() { return "profile"; }

        @Override
        public List<DatumReference> allDatums() { return datums; }

        /** True when the zone is unequally disposed (an {@code outward} other than half the zone). */
        @JsonIgnore
        public boolean isUnequal() { return outward != null && Math.abs(outward - zone / 2) > 1e-12; }

        /**
         * The ISO 1101 offset-zone value (UZ): the offset of the zone's centre from the nominal
         * surface, + toward the outside of the material. {@code outward - zone/2}.
         */
        @JsonIgnore
        public double isoOffset() { return outward == null ? 0.0 : outward - zone / 2; }

        /** The ASME outward value of an ISO offset zone of width {@code zone} offset by {@code offset}. */
        public static double outwardFromIsoOffset(double zone, double offset) { return offset + zone / 2; }
    }

    /**
     * Composite profile: one symbol, several tiers. The first tier locates; the lower tiers refine
     * form and orientation within it.
     *
     * @param tiers at least two, zones strictly decreasing
     * @param extent where the tolerance applies
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    record CompositeProfile(List<ProfileTier> tiers, Extent extent) implements Callout {
        @JsonCreator
        public CompositeProfile(@JsonProperty(value = "tiers", required = true) List<ProfileTier> tiers,
                                @JsonProperty("extent") Extent extent) {
            if (tiers == null || tiers.size() < 2) {
                throw new IllegalArgumentException("a composite profile needs at least two tiers");
            }
            for (int i = 1; i < tiers.size(); i++) {
                if (!(tiers.get(i).zone() < tiers.get(i - 1).zone())) {
                    throw new IllegalArgumentException("tier " + (i + 1) + " zone " + DecimalText.exact(tiers.get(i).zone())
                            + " must be smaller than tier " + i + " zone " + DecimalText.exact(tiers.get(i - 1).zone()));
                }
                List<DatumReference> upper = tiers.get(i - 1).datums();
                List<DatumReference> lower = tiers.get(i).datums();
                if (lower.size() > upper.size() || !upper.subList(0, lower.size()).equals(lower)) {
                    throw new IllegalArgumentException("tier " + (i + 1) + " datums " + lower
                            + " must repeat the first datums of the tier above, in order " + upper);
                }
            }
            this.tiers = List.copyOf(tiers);
            this.extent = extent == null ? Extent.THIS_RADIUS : extent;
        }

        public String typeName() { return "composite-profile"; }

        @Override
        public List<DatumReference> allDatums() { return tiers.get(0).datums(); }
    }

    static void requirePositive(String field, double v) {
        if (!(Double.isFinite(v) && v > 0)) {
            throw new IllegalArgumentException(field + " must be a number greater than zero, got " + DecimalText.exact(v));
        }
    }

    private static void requireLimits(double min, double max, Double nominal) {
        requirePositive("min", min);
        requirePositive("max", max);
        if (!(min < max)) throw new IllegalArgumentException("min " + DecimalText.exact(min) + " must be smaller than max " + DecimalText.exact(max));
        if (nominal != null && !(nominal >= min && nominal <= max)) {
            throw new IllegalArgumentException("nominal " + DecimalText.exact(nominal) + " must lie between min and max");
        }
    }

    private static void requireDistinct(List<DatumReference> datums) {
        Set<String> seen = new HashSet<>();
        for (DatumReference d : datums) {
            if (!seen.add(d.label())) throw new IllegalArgumentException("datum " + d.label() + " appears twice");
        }
    }
}
