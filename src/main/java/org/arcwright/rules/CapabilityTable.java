package org.arcwright.rules;

import java.util.Collections;
import org.arcwright.io.DecimalText;
import org.arcwright.model.Process;
import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Typical radius tolerance each process holds without special effort, by nominal radius: the basis
 * on which rules size default tolerances. Data in a pack's {@code tables/*.json} with
 * {@code "kind": "process-capability"}; a later pack's table with the same id replaces it.
 *
 * @param id table id
 * @param title what the table is
 * @param source where the values come from ({@code common practice} for the built-in one)
 * @param processes for each process key, steps of nominal radius (mm) and the ± value (mm)
 * @param rowSources for each process key, where its row comes from (a source named, or common practice); a
 *     process without one falls back to {@code source}
 * @param provenance how the values were obtained and checked, for maintainers; never shown in advice
 */
public record CapabilityTable(String id, String title, String source, Map<String, List<Step>> processes,
                              Map<String, String> rowSources, String provenance) {

    /** The id of the built-in table. */
    public static final String DEFAULT_ID = "process-capability";

    @JsonCreator
    public CapabilityTable(@JsonProperty(value = "id", required = true) String id,
                           @JsonProperty(value = "title", required = true) String title,
                           @JsonProperty(value = "source", required = true) String source,
                           @JsonProperty(value = "processes", required = true) Map<String, List<Step>> processes,
                           @JsonProperty("rowSources") Map<String, String> rowSources,
                           @JsonProperty("provenance") String provenance) {
        for (var e : processes.entrySet()) {
            Process.fromKey(e.getKey());
            List<Step> steps = e.getValue();
            if (steps == null || steps.isEmpty()) {
                throw new IllegalArgumentException("process '" + e.getKey() + "' needs at least one step");
            }
            for (int i = 0; i < steps.size(); i++) {
                Double up = steps.get(i).upTo();
                boolean last = i == steps.size() - 1;
                if (last != (up == null)) {
                    throw new IllegalArgumentException("process '" + e.getKey()
                            + "': every step but the last needs 'upTo'; the last has none");
                }
                if (i > 0 && up != null && !(up > steps.get(i - 1).upTo())) {
                    throw new IllegalArgumentException("process '" + e.getKey() + "': 'upTo' must increase");
                }
            }
        }
        this.id = id;
        this.title = title;
        this.source = source;
        this.processes = Collections.unmodifiableMap(new LinkedHashMap<>(processes));
        if (rowSources != null) rowSources.keySet().forEach(Process::fromKey);
        this.rowSources = rowSources == null ? Map.of() : Map.copyOf(rowSources);
        this.provenance = provenance == null ? "" : provenance;
    }

    /** Where the row of {@code process} comes from: its own source, else the table's. */
    public String sourceFor(Process process) {
        return rowSources.getOrDefault(process.key(), source);
    }

    /** The ± value in mm for a radius of {@code radiusMm} made by {@code process}, if the table covers it. */
    public Optional<Double> plusMinusMm(Process process, double radiusMm) {
        List<Step> steps = processes.get(process.key());
        if (steps == null) return Optional.empty();
        for (Step s : steps) {
            if (s.upTo() == null || radiusMm <= s.upTo()) return Optional.of(s.plusMinus());
        }
        return Optional.empty();
    }

    /**
     * One step of the table.
     *
     * @param upTo largest nominal radius of the step, mm, inclusive; null for the last step
     * @param plusMinus the ± value, mm
     */
    public record Step(Double upTo, double plusMinus) {
        @JsonCreator
        public Step(@JsonProperty("upTo") Double upTo,
                    @JsonProperty(value = "plusMinus", required = true) double plusMinus) {
            if (upTo != null && !(upTo > 0)) throw new IllegalArgumentException("upTo must be greater than zero");
            if (!(Double.isFinite(plusMinus) && plusMinus > 0)) {
                throw new IllegalArgumentException("plusMinus must be greater than zero, got " + DecimalText.exact(plusMinus));
            }
            this.upTo = upTo;
            this.plusMinus = plusMinus;
        }
    }
}
