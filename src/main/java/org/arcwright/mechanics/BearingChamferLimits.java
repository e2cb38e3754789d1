package org.arcwright.mechanics;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PackTables;

/**
 * The largest chamfer dimension r<sub>s max</sub> of a rolling bearing's ring for its smallest
 * r<sub>s min</sub> and bore, in the radial and the axial direction (ISO 582 for radial bearings).
 *
 * <p>Why it matters: a ring's chamfer may reach r<sub>s max</sub>, not r<sub>s min</sub>, so the
 * ring's face meets the shoulder only beyond its radial r<sub>s max</sub>. The flat left on the
 * shoulder for a bearing is measured from there.
 *
 * <p>Data, not code: {@code tables/*.json} with {@code "kind": "bearing-chamfer-limits"} in a
 * practice pack. {@code source} is the plain citation shown to users; {@code provenance} says how
 * the values were checked and stays in the file (and in tests and decision records).
 *
 * @param id table id
 * @param title what the table is
 * @param source citation shown to users
 * @param provenance how the values were obtained and checked; never shown in a report
 * @param rows by ascending r<sub>s min</sub>, then bore
 */
public record BearingChamferLimits(String id, String title, String source, String provenance, List<Row> rows) {
    /** The kind of pack table this class reads. */
    public static final String KIND = "bearing-chamfer-limits";
    /** Id of the built-in table. */
    public static final String BUILT_IN_ID = "iso582-radial-bearings";

    @JsonCreator
    public BearingChamferLimits(@JsonProperty(value = "id", required = true) String id,
                                @JsonProperty(value = "title", required = true) String title,
                                @JsonProperty(value = "source", required = true) String source,
                                @JsonProperty("provenance") String provenance,
                                @JsonProperty("units") String units,
                                @JsonProperty(value = "rows", required = true) List<Row> rows) {
        this(id, title, source, provenance, checked(units, rows));
    }

    public BearingChamferLimits {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("id must not be blank");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(source, "source");
        provenance = provenance == null ? "" : provenance;
        rows = List.copyOf(rows);
    }

    private static List<Row> checked(String units, List<Row> rows) {
        if (units != null && !units.equals("mm")) throw new IllegalArgumentException("units must be mm, got " + units);
        if (rows == null || rows.isEmpty()) throw new IllegalArgumentException("rows must not be empty");
        for (int i = 1; i < rows.size(); i++) {
            if (rows.get(i).chamferMin() < rows.get(i - 1).chamferMin()) {
                throw new IllegalArgumentException("rows[" + i + "].chamferMin must not be smaller than the row before it");
            }
        }
        return rows;
    }

    /**
     * The table with {@code id} from the packs in force, the highest layer winning.
     *
     * @throws InputProblem naming the file when a table is malformed, or when no table has the id
     */
    public static BearingChamferLimits load(PackStack stack, String id) {
        return PackTables.byId(stack, KIND, id, BearingChamferLimits.class, BearingChamferLimits::id);
    }

    /**
     * The row for r<sub>s min</sub> and bore {@code bore} (both mm). Without a bore, the row with the
     * largest radial r<sub>s max</sub> for that r<sub>s min</sub> (the worst case) is used. An
     * r<sub>s min</sub> between listed values takes the next larger one (the larger chamfer, so the
     * smaller flat). Either choice is said in the note.
     *
     * @throws InputProblem ({@code mating.chamferMin}) above the table's largest r<sub>s min</sub>
     */
    public Lookup lookup(double chamferMin, Double bore) {
        StressConcentration.positive("mating.chamferMin", chamferMin);
        if (bore != null) StressConcentration.positive("mating.bore", bore);
        Double listed = null;
        for (Row r : rows) {
            if (r.chamferMin() >= chamferMin - BearingSeatTable.ROUNDING) {
                listed = r.chamferMin();
                break;
            }
        }
        if (listed == null) {
            throw InputProblem.ofField("mating.chamferMin", "r_s min " + DecimalText.significant(chamferMin, 4) + " mm is above the largest in the "
                    + "chamfer-limit table (" + DecimalText.exact(rows.get(rows.size() - 1).chamferMin()) + " mm)");
        }
        StringBuilder note = new StringBuilder();
        if (Math.abs(listed - chamferMin) > BearingSeatTable.ROUNDING) {
            note.append("r_s min ").append(DecimalText.significant(chamferMin, 4)).append(" mm is not a listed chamfer dimension; r_s max is taken "
                    + "from the row for ").append(DecimalText.exact(listed)).append(" mm (the next larger). ");
        }
        Row use = null;
        int ranges = 0;
        for (Row r : rows) {
            if (r.chamferMin() != listed) continue;
            ranges++;
            if (bore == null) {
                if (use == null || r.radialMax() > use.radialMax()) use = r;
            } else if (r.holds(bore)) {
                use = r;
            }
        }
        if (use == null) throw new IllegalStateException("no bore range for r_s min " + DecimalText.exact(listed) + " holds " + (bore == null ? "any bore" : DecimalText.exact(bore)));
        if (bore == null && ranges > 1) {
            note.append("No bore given: the largest r_s max for this r_s min (").append(use.boreRange())
                    .append(") is used; give mating.bore for the ring's own row.");
        }
        return new Lookup(use, note.toString().strip());
    }


    /**
     * One row.
     *
     * @param chamferMin the ring's smallest chamfer dimension r<sub>s min</sub>, mm
     * @param boreOver the bore range starts above this, mm, or null from zero
     * @param boreUpTo the bore range ends at this (inclusive), mm, or null without end
     * @param radialMax largest chamfer dimension in the radial direction (up the shoulder face), mm
     * @param axialMax largest chamfer dimension in the axial direction (along the seat), mm
     */
    public record Row(double chamferMin, Double boreOver, Double boreUpTo, double radialMax, double axialMax) {
        @JsonCreator
        public Row(@JsonProperty(value = "chamferMin", required = true) double chamferMin,
                   @JsonProperty("boreOver") Double boreOver,
                   @JsonProperty("boreUpTo") Double boreUpTo,
                   @JsonProperty(value = "radialMax", required = true) double radialMax,
                   @JsonProperty(value = "axialMax", required = true) double axialMax) {
            if (!(Double.isFinite(chamferMin) && chamferMin > 0)) throw new IllegalArgumentException("chamferMin must be positive");
            if (!(radialMax >= chamferMin)) throw new IllegalArgumentException("radialMax may not be smaller than chamferMin");
            if (!(axialMax >= chamferMin)) throw new IllegalArgumentException("axialMax may not be smaller than chamferMin");
            this.chamferMin = chamferMin;
            this.boreOver = boreOver;
            this.boreUpTo = boreUpTo;
            this.radialMax = radialMax;
            this.axialMax = axialMax;
        }

        /** True when {@code bore} (mm) lies in this row's range: over {@link #boreOver}, up to and including {@link #boreUpTo}. */
        public boolean holds(double bore) {
            return (boreOver == null || bore > boreOver) && (boreUpTo == null || bore <= boreUpTo);
        }

        /** The bore range in words, e.g. {@code "bore over 40 up to 120 mm"} or {@code "any bore"}. */
        public String boreRange() {
            if (boreOver == null && boreUpTo == null) return "any bore";
            if (boreOver == null) return "bore up to " + DecimalText.exact(boreUpTo) + " mm";
            if (boreUpTo == null) return "bore over " + DecimalText.exact(boreOver) + " mm";
            return "bore over " + DecimalText.exact(boreOver) + " up to " + DecimalText.exact(boreUpTo) + " mm";
        }

        /** The row in words for a report. */
        public String describe() {
            return String.format(Locale.ROOT, "r_s min %s mm, %s: r_s max %s mm radial, %s mm axial",
                    DecimalText.significant(chamferMin, 4), boreRange(), DecimalText.exact(radialMax), DecimalText.exact(axialMax));
        }
    }

    /** A row found and a note on how it was chosen (empty when the table gave it directly). */
    public record Lookup(Row row, String note) {}
}
