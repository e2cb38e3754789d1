package org.arcwright.mechanics;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PackTables;

/**
 * The largest shaft or housing fillet radius for a rolling bearing's smallest chamfer dimension
 * r<sub>s min</sub>, so that the ring seats against the shoulder.
 *
 * <p>Data, not code: {@code tables/*.json} with {@code "kind": "bearing-fillet"} in a practice pack;
 * the built-in {@code rolling-bearing-fillet} table carries the values tabulated alike in rolling
 * bearing makers' catalogues, consistent with the chamfer limits of ISO 582. A team pack replaces it
 * by giving a table with the same id.
 *
 * @param id table id
 * @param title what the table is
 * @param source where the values come from, as shown to users (a file's {@code provenance} says how
 *     they were checked and is not read)
 * @param units always mm
 * @param rows by ascending r<sub>s min</sub>
 */
@JsonIgnoreProperties({"provenance"})
public record BearingSeatTable(String id, String title, String source, String units, List<Row> rows) {
    /** The kind of pack table this class reads. */
    public static final String KIND = "bearing-fillet";
    /** Id of the built-in table. */
    public static final String BUILT_IN_ID = "rolling-bearing-fillet";
    /**
     * How near a listed r<sub>s min</sub> a value may lie and still be that value, mm: half of
     * 0.0001 in and more, so that 1.1 mm written as 0.0433 in is read as 1.1 mm; far below the
     * smallest step of the series (0.03 mm).
     */
    public static final double ROUNDING = 0.002;

    @JsonCreator
    public BearingSeatTable(@JsonProperty(value = "id", required = true) String id,
                            @JsonProperty(value = "title", required = true) String title,
                            @JsonProperty(value = "source", required = true) String source,
                            @JsonProperty("units") String units,
                            @JsonProperty(value = "rows", required = true) List<Row> rows) {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("id must not be blank");
        if (units != null && !units.equals("mm")) throw new IllegalArgumentException("units must be mm, got " + units);
        if (rows == null || rows.isEmpty()) throw new IllegalArgumentException("rows must not be empty");
        for (int i = 1; i < rows.size(); i++) {
            if (!(rows.get(i).chamferMin() > rows.get(i - 1).chamferMin())) {
                throw new IllegalArgumentException("rows[" + i + "].chamferMin must exceed the row before it");
            }
        }
        this.id = id;
        this.title = Objects.requireNonNull(title, "title");
        this.source = Objects.requireNonNull(source, "source");
        this.units = "mm";
        this.rows = List.copyOf(rows);
    }

    /**
     * The table with {@code id} from the packs in force, the highest layer winning.
     *
     * @throws InputProblem naming the file when a table is malformed, or when no table has the id
     */
    public static BearingSeatTable load(PackStack stack, String id) {
        return PackTables.byId(stack, KIND, id, BearingSeatTable.class, BearingSeatTable::id);
    }

    /**
     * The largest fillet for r<sub>s min</sub> (mm). A value between rows takes the row below it
     * (the smaller chamfer, so the safer fillet) and says so.
     *
     * @throws InputProblem on {@code mating.chamferMin} below the table's first row
     */
    public Lookup lookup(double chamferMin) {
        StressConcentration.positive("mating.chamferMin", chamferMin);
        Row use = null;
        for (Row r : rows) {
            if (r.chamferMin() <= chamferMin + ROUNDING) use = r;
        }
        if (use == null) {
            throw InputProblem.ofField("mating.chamferMin", "r_s min " + DecimalText.significant(chamferMin, 4) + " mm is below the table's smallest, "
                    + DecimalText.exact(rows.get(0).chamferMin()) + " mm");
        }
        boolean exact = Math.abs(use.chamferMin() - chamferMin) <= ROUNDING;
        String note = exact ? "" : String.format(Locale.ROOT,
                "r_s min %s mm is not a listed chamfer dimension; using the row for %s mm (the next smaller)",
                DecimalText.significant(chamferMin, 4), DecimalText.exact(use.chamferMin()));
        return new Lookup(use, exact, note);
    }

    /**
     * One row.
     *
     * @param chamferMin the ring's smallest chamfer dimension r<sub>s min</sub>, mm
     * @param filletMax the largest fillet radius r<sub>as max</sub> of shaft or housing, mm
     */
    public record Row(double chamferMin, double filletMax) {
        @JsonCreator
        public Row(@JsonProperty(value = "chamferMin", required = true) double chamferMin,
                   @JsonProperty(value = "filletMax", required = true) double filletMax) {
            if (!(Double.isFinite(chamferMin) && chamferMin > 0)) throw new IllegalArgumentException("chamferMin must be positive");
            if (!(Double.isFinite(filletMax) && filletMax > 0)) throw new IllegalArgumentException("filletMax must be positive");
            if (filletMax > chamferMin) throw new IllegalArgumentException("filletMax may not exceed chamferMin");
            this.chamferMin = chamferMin;
            this.filletMax = filletMax;
        }
    }

    /** A row found, whether it matched exactly, and a note when it did not. */
    public record Lookup(Row row, boolean exact, String note) {}
}
