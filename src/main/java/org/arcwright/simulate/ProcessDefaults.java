package org.arcwright.simulate;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PackTables;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Corner;

/**
 * Default process models per manufacturing process, from the packs' {@code simulation-process-model}
 * table (values marked common practice there): flats, steps, measuring noise and scan density per
 * process; the radius scatter comes from the caller (the capability the case already has, divided by
 * the table's {@code radiusSdDivisor}). For evidence on the advisor's candidates, not for ranking.
 *
 * @param id the table id
 * @param source where the figures come from, as the table says
 * @param radiusSdDivisor the held plus-minus over this gives the radius standard deviation
 * @param processes per process key ({@code machined}, {@code cast}, ...)
 */
public record ProcessDefaults(String id, String source, double radiusSdDivisor, Map<String, Entry> processes) {
    /** The table kind in {@code tables/*.json}. */
    public static final String KIND = "simulation-process-model";

    public ProcessDefaults {
        Objects.requireNonNull(id, "id");
        if (!(radiusSdDivisor > 0)) throw InputProblem.ofField("radiusSdDivisor", "must be above zero, got " + DecimalText.exact(radiusSdDivisor));
        processes = Map.copyOf(processes);
    }

    /** The table from the packs in force, the highest layer winning; empty when no pack has one. */
    public static Optional<ProcessDefaults> load(PackStack stack) {
        // read as every pack table is (PackTables): from inside its own pack only; it read a table
        // linked from outside the pack before
        return PackTables.highest(stack, KIND, FileDto.class).map(FileDto::toDefaults);
    }

    /**
     * The model for {@code process}: radius normal about {@code meanRadius} with standard deviation
     * {@code plusMinus / radiusSdDivisor}; no position scatter (the advisor's case has no location
     * need to judge it by).
     *
     * @throws InputProblem when the table has no entry for the process
     */
    public ProcessModel model(String process, Units units, Corner corner, double nominalRadius, double plusMinus) {
        Entry e = processes.get(process);
        if (e == null) throw InputProblem.ofField("process", "no default process model for '" + process + "'; known: " + String.join(", ", processes.keySet()));
        double mm = units.millimetres();
        return new ProcessModel(units, corner, nominalRadius, new ProcessModel.Scatter(nominalRadius, plusMinus / radiusSdDivisor), 0,
                e.flat(), new ProcessModel.Steps(e.step().rate(), e.step().sizeMin() / mm, e.step().sizeMax() / mm), e.noise() / mm, e.points());
    }

    /**
     * One process's defects and measurement, lengths in mm.
     *
     * @param flat flats
     * @param step steps (sizes in mm)
     * @param noise measuring noise, mm
     * @param points points per section
     */
    public record Entry(ProcessModel.Flats flat, ProcessModel.Steps step, double noise, int points) {}

    /** The table as written. */
    record FileDto(String id, String title, String source, String note, Double radiusSdDivisor, Map<String, EntryDto> processes) {
        ProcessDefaults toDefaults() {
            if (processes == null) throw InputProblem.ofField("processes", "missing");
            Map<String, Entry> m = new LinkedHashMap<>();
            processes.forEach((k, v) -> m.put(k, v.entry));
            return new ProcessDefaults(id == null ? "simulation-process-models" : id, source, radiusSdDivisor == null ? 3 : radiusSdDivisor, m);
        }
    }

    /** One process as written. */
    static final class EntryDto {
        final Entry entry;

        @JsonCreator
        EntryDto(@JsonProperty("flat") SimulationFiles.FlatDto flat, @JsonProperty("step") SimulationFiles.StepDto step,
                 @JsonProperty("noise") Double noise, @JsonProperty("points") Integer points) {
            entry = new Entry(flat == null ? ProcessModel.Flats.NONE : flat.flats, step == null ? ProcessModel.Steps.NONE : step.steps,
                    noise == null ? 0 : noise, points == null ? ProcessModel.DEFAULT_POINTS : points);
        }
    }
}
