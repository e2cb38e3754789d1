package org.arcwright.rules;

import org.arcwright.io.DecimalText;
import org.arcwright.model.Keys;
import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.List;
import org.arcwright.callout.Extent;

/**
 * What a rule recommends: the kind of callout, which datums it references, where it applies and how
 * its tolerance is sized. The engine turns it into a concrete {@link org.arcwright.callout.Callout}
 * with numbers for one case.
 *
 * @param callout the callout kind
 * @param datums which of the case's datum labels to reference
 * @param extent where a profile tolerance applies
 * @param between the two point labels of a {@code between} extent, else null
 * @param size how the tolerance is sized
 * @param tiers composite profile: zone multipliers per tier, upper (locating) first, strictly decreasing
 * @param lowerTierDatums composite profile: datums of the lower (refining) tiers
 * @param dynamic profile: the dynamic modifier (form only, size left to the radius tolerance)
 * @param table general: the general-tolerance table id
 * @param toleranceClass general: the class in that table
 * @param edgeNote general: add an ISO 13715 edge indication built from the limits
 */
@JsonInclude(JsonInclude.Include.NON_DEFAULT)
public record CalloutPlan(CalloutKind callout, DatumChoice datums, Extent.Kind extent, List<String> between,
                          Sizing size, List<Double> tiers, DatumChoice lowerTierDatums, boolean dynamic, String table,
                          String toleranceClass, boolean edgeNote) {

    @JsonCreator
    public CalloutPlan(@JsonProperty(value = "callout", required = true) CalloutKind callout,
                       @JsonProperty("datums") DatumChoice datums,
                       @JsonProperty("extent") Extent.Kind extent,
                       @JsonProperty("between") List<String> between,
                       @JsonProperty("size") Sizing size,
                       @JsonProperty("tiers") List<Double> tiers,
                       @JsonProperty("lowerTierDatums") DatumChoice lowerTierDatums,
                       @JsonProperty("dynamic") boolean dynamic,
                       @JsonProperty("table") String table,
                       @JsonProperty("class") String toleranceClass,
                       @JsonProperty("edgeNote") boolean edgeNote) {
        if (callout == null) throw new IllegalArgumentException("callout must be one of general, radius, controlled-radius, profile, composite-profile");
        this.callout = callout;
        this.datums = datums == null ? DatumChoice.NONE : datums;
        this.extent = extent == null ? Extent.Kind.THIS_RADIUS : extent;
        if (this.extent == Extent.Kind.BETWEEN && (between == null || between.size() != 2)) {
            throw new IllegalArgumentException("a 'between' extent needs \"between\": [\"J\", \"K\"]");
        }
        this.between = between == null ? null : List.copyOf(between);
        this.size = size == null ? Sizing.CAPABILITY : size;
        boolean profile = callout == CalloutKind.PROFILE || callout == CalloutKind.COMPOSITE_PROFILE;
        if (!profile && (this.extent != Extent.Kind.THIS_RADIUS || this.datums != DatumChoice.NONE || dynamic)) {
            throw new IllegalArgumentException("datums, extent and dynamic apply only to profile callouts");
        }
        if (callout == CalloutKind.COMPOSITE_PROFILE) {
            if (tiers == null || tiers.size() < 2) {
                throw new IllegalArgumentException("a composite profile needs \"tiers\": zone multipliers, e.g. [3, 1]");
            }
            for (int i = 0; i < tiers.size(); i++) {
                if (!(tiers.get(i) > 0) || i > 0 && !(tiers.get(i) < tiers.get(i - 1))) {
                    throw new IllegalArgumentException("tiers must be positive and strictly decreasing, got " + tiers);
                }
            }
            if (this.datums == DatumChoice.NONE) {
                throw new IllegalArgumentException("a composite profile's upper tier locates: it needs datums");
            }
            this.tiers = List.copyOf(tiers);
        } else {
            if (tiers != null) throw new IllegalArgumentException("tiers apply only to composite-profile");
            this.tiers = null;
        }
        this.lowerTierDatums = lowerTierDatums == null ? DatumChoice.NONE : lowerTierDatums;
        this.dynamic = dynamic;
        if (callout != CalloutKind.GENERAL && (table != null || toleranceClass != null || edgeNote)) {
            throw new IllegalArgumentException("table, class and edgeNote apply only to general callouts");
        }
        this.table = table == null && callout == CalloutKind.GENERAL ? "iso2768-1-radius-chamfer" : table;
        this.toleranceClass = toleranceClass == null && callout == CalloutKind.GENERAL ? "m" : toleranceClass;
        this.edgeNote = edgeNote;
    }

    /** Two plans recommend the same control when they would draw the same kind of frame. */
    public boolean sameControlAs(CalloutPlan o) {
        return callout == o.callout && datums == o.datums && extent == o.extent;
    }

    /** The callout kinds a rule can recommend; names as in {@link org.arcwright.callout.Callout}. */
    public enum CalloutKind {
        GENERAL("general"),
        RADIUS("radius"),
        CONTROLLED_RADIUS("controlled-radius"),
        PROFILE("profile"),
        COMPOSITE_PROFILE("composite-profile");

        private final String key;

        CalloutKind(String key) { this.key = key; }

        @JsonValue
        public String key() { return key; }

        @JsonCreator
        public static CalloutKind fromKey(String key) { return Keys.fromKey(CalloutKind.class, values(), key, CalloutKind::key); }
    }

    /** Which of the case's datum labels a profile references, in the order the case lists them. */
    public enum DatumChoice {
        NONE("none", 0),
        PRIMARY("primary", 1),
        FIRST_TWO("first-two", 2),
        /** Up to three: a complete datum reference frame. */
        ALL("all", 3);

        private final String key;
        private final int count;

        DatumChoice(String key, int count) {
            this.key = key;
            this.count = count;
        }

        @JsonValue
        public String key() { return key; }

        /** The labels chosen from those the case offers. */
        public List<String> pick(List<String> available) {
            return available.subList(0, Math.min(count, available.size()));
        }

        @JsonCreator
        public static DatumChoice fromKey(String key) { return Keys.fromKey(DatumChoice.class, values(), key, DatumChoice::key); }
    }

    /**
     * How the tolerance is sized.
     *
     * @param basis where the ± value comes from
     * @param factor multiplier on that value (a tighter or looser class than the process's usual)
     * @param disposition where the band sits about the nominal
     */
    @JsonInclude(JsonInclude.Include.NON_DEFAULT)
    public record Sizing(Basis basis, double factor, Disposition disposition) {
        public static final Sizing CAPABILITY = new Sizing(Basis.CAPABILITY, 1.0, Disposition.EQUAL);

        @JsonCreator
        public Sizing(@JsonProperty("basis") Basis basis, @JsonProperty("factor") Double factor,
                      @JsonProperty("disposition") Disposition disposition) {
            this(basis == null ? Basis.CAPABILITY : basis, factor == null ? 1.0 : factor.doubleValue(),
                    disposition == null ? Disposition.EQUAL : disposition);
        }

        public Sizing {
            if (!(Double.isFinite(factor) && factor > 0 && factor <= 10)) {
                throw new IllegalArgumentException("factor must be greater than 0 and at most 10, got " + DecimalText.exact(factor));
            }
        }
    }

    /** Where the tolerance value comes from. */
    public enum Basis {
        /** The process capability table: what the process usually holds at this radius. */
        CAPABILITY("capability"),
        /** The engineer's own tolerance text in the case; capability when the case has none. */
        INTENT("intent"),
        /** The title-block general-tolerance table named by the plan. */
        GENERAL("general");

        private final String key;

        Basis(String key) { this.key = key; }

        @JsonValue
        public String key() { return key; }

        @JsonCreator
        public static Basis fromKey(String key) { return Keys.fromKey(Basis.class, values(), key, Basis::key); }
    }

    /** Where the size band sits about the nominal. */
    public enum Disposition {
        /** ± about the nominal. */
        EQUAL("equal"),
        /** Nominal is the minimum: protects the smallest radius of a stress-relief fillet. */
        PLUS_ONLY("plus-only"),
        /** Nominal is the maximum: protects the seating of a mating corner. */
        MINUS_ONLY("minus-only");

        private final String key;

        Disposition(String key) { this.key = key; }

        @JsonValue
        public String key() { return key; }

        @JsonCreator
        public static Disposition fromKey(String key) { return Keys.fromKey(Disposition.class, values(), key, Disposition::key); }
    }
}
