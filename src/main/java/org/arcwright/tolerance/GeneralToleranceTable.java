package org.arcwright.tolerance;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * A general-tolerance table as a title block invokes it ("ISO 2768-mK", or a company's own): ranges
 * of nominal size, and for each tolerance class the ± deviation in each range. A {@code null} cell
 * is a dash in the standard: no general tolerance, the size must be toleranced individually.
 *
 * <p>Tables are data ({@code tables/*.json} in a practice pack); the built-in pack carries ISO
 * 2768-1. A company table with the same {@code id} replaces the built-in one, a new id adds one.
 *
 * <p>{@code source} is the plain citation users see; {@code provenance} says for maintainers how the
 * values were obtained and checked (a recalled value is marked there, never in {@code source}).
 */
public record GeneralToleranceTable(String id, String title, String source, ToleranceQuantity quantity, String units,
                                    List<SizeRange> ranges, Map<String, List<Double>> classes,
                                    Map<String, String> classNames, String note, String provenance) {

    @JsonCreator
    public GeneralToleranceTable(@JsonProperty(value = "id", required = true) String id,
                                 @JsonProperty(value = "title", required = true) String title,
                                 @JsonProperty(value = "source", required = true) String source,
                                 @JsonProperty(value = "quantity", required = true) ToleranceQuantity quantity,
                                 @JsonProperty("units") String units,
                                 @JsonProperty(value = "ranges", required = true) List<SizeRange> ranges,
                                 @JsonProperty(value = "classes", required = true) Map<String, List<Double>> classes,
                                 @JsonProperty("classNames") Map<String, String> classNames,
                                 @JsonProperty("note") String note,
                                 @JsonProperty("provenance") String provenance) {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("id must not be blank");
        if (ranges.isEmpty()) throw new IllegalArgumentException("ranges must not be empty");
        for (int i = 1; i < ranges.size(); i++) {
            Double prevHi = ranges.get(i - 1).upTo();
            SizeRange r = ranges.get(i);
            if (prevHi == null || r.over() == null || !prevHi.equals(r.over())) {
                throw new IllegalArgumentException("ranges[" + i + "] must start 'over' where the previous one ends ("
                        + (prevHi == null ? "it has no upTo" : DecimalText.exact(prevHi)) + ")");
            }
        }
        for (var e : classes.entrySet()) {
            if (e.getValue().size() != ranges.size()) {
                throw new IllegalArgumentException("class '" + e.getKey() + "' has " + e.getValue().size()
                        + " values for " + ranges.size() + " ranges");
            }
            for (Double v : e.getValue()) {
                if (v != null && !(Double.isFinite(v) && v > 0)) {
                    throw new IllegalArgumentException("class '" + e.getKey() + "' has a value that is not a positive number: " + DecimalText.exact(v));
                }
            }
        }
        this.id = id;
        this.title = title;
        this.source = source;
        this.quantity = quantity;
        this.units = units == null ? "mm" : units;
        this.ranges = List.copyOf(ranges);
        this.classes = Collections.unmodifiableMap(new LinkedHashMap<>(classes));
        this.classNames = classNames == null ? Map.of() : Map.copyOf(classNames);
        this.note = note;
        this.provenance = provenance == null ? "" : provenance;
    }

    /**
     * The ± value for {@code size} in class {@code toleranceClass}.
     *
     * @throws InputProblem for an unknown class, a size outside every range, or a dash in the table
     */
    public GeneralTolerance lookup(String toleranceClass, double size) {
        String cls = toleranceClass == null ? "" : toleranceClass.trim().toLowerCase(Locale.ROOT);
        List<Double> column = classes.get(cls);
        if (column == null) {
            throw InputProblem.ofField("class", "unknown tolerance class '" + toleranceClass + "' for " + title
                    + "; known classes: " + String.join(", ", classes.keySet()));
        }
        if (!Double.isFinite(size)) throw InputProblem.ofField("size", "not a finite number: " + DecimalText.exact(size));
        if (size <= 0) throw InputProblem.ofField("size", "must be greater than zero, got " + DecimalText.exact(size));
        for (int i = 0; i < ranges.size(); i++) {
            SizeRange r = ranges.get(i);
            if (r.contains(size)) {
                Double v = column.get(i);
                if (v == null) {
                    throw InputProblem.ofField("class", title + " gives no general tolerance for class " + cls
                            + " in the range " + r.describe() + " " + units + ": tolerance this size individually");
                }
                return new GeneralTolerance(id, source, cls, quantity, size, r.describe(), v);
            }
        }
        throw InputProblem.ofField("size", DecimalText.exact(size) + " " + units + " lies outside every range of " + title + " ("
                + ranges.get(0).describe() + " to " + ranges.get(ranges.size() - 1).describe()
                + "): tolerance it individually" + (note == null ? "" : "; " + note));
    }

    /** All classes, in table order. */
    public List<String> classList() { return new ArrayList<>(classes.keySet()); }
}
