package org.arcwright.simulate;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Supplier;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.tolerance.Units;

/**
 * Reads a process file (JSON) into a {@link Simulation}, with errors naming the file, line, column
 * and field. The corner and the callouts are read by {@link InspectionFiles}' own readers, so they
 * are exactly the inspection file's.
 *
 * <h2>Format</h2>
 * <pre>
 * {
 *   "units": "mm",
 *   "corner": {"vertex": [0, 0], "legA": [1, 0], "legB": [0, 1], "kind": "fillet"},
 *   "nominalRadius": 2.0,
 *   "process": {
 *     "radius": {"mean": 2.02, "sd": 0.05},                          required
 *     "position": {"sd": 0.01},                                      optional, per axis
 *     "flat": {"rate": 0.1, "width": [0.1, 0.2], "centre": [0.4, 0.6]},
 *     "step": {"rate": 0.05, "size": [0.005, 0.03]},
 *     "noise": 0.001,
 *     "points": 200                                                   default 200
 *   },
 *   "needs": {"minRadius": 1.95, "maxRadius": 2.2, "maxPositionError": .., "maxStep": ..},
 *   "callouts": [{"type": "radius", "min": 1.9, "max": 2.1}, ...],   as in the inspection file
 *   "parts": 20000, "seed": 11,                                       defaults 10000 and 1
 *   "resolution": .., "window": ..                                    as in the inspection file; the
 *                                                                     resolution defaults per callout to
 *                                                                     Simulation.defaultResolution
 * }
 * </pre>
 */
public final class SimulationFiles {
    private final JsonFiles json;

    public SimulationFiles(JsonFiles json) {
        this.json = Objects.requireNonNull(json, "json");
    }

    /** Reads a process file. */
    public Simulation read(Path file) {
        return parse(InputFiles.readText(file), file.toString());
    }

    /** Parses process-file text, attributing errors to {@code source}. */
    public Simulation parse(String text, String source) {
        FileDto dto = json.parse(text, source, FileDto.class);
        try {
            return toSimulation(dto, source);
        } catch (InputProblem p) {
            throw JsonFiles.locate(p, text);
        }
    }

    private static Simulation toSimulation(FileDto d, String source) {
        try {
            if (d.units() == null) throw InputProblem.ofField("units", "missing; use mm or in");
            Units units = Units.parse(d.units());
            if (d.corner() == null) throw InputProblem.ofField("corner", "missing");
            if (d.nominalRadius() == null) throw InputProblem.ofField("nominalRadius", "missing");
            if (d.process() == null) throw InputProblem.ofField("process", "missing; give at least process.radius");
            ProcessDto p = d.process();
            if (p.radius() == null) throw InputProblem.ofField("process.radius", "missing; give {\"mean\": .., \"sd\": ..}");
            ProcessModel model = new ProcessModel(units, d.corner().corner(), d.nominalRadius(), p.radius().scatter,
                    p.position() == null ? 0 : p.position().sd, p.flat() == null ? ProcessModel.Flats.NONE : p.flat().flats,
                    p.step() == null ? ProcessModel.Steps.NONE : p.step().steps, p.noise() == null ? 0 : p.noise(),
                    p.points() == null ? ProcessModel.DEFAULT_POINTS : p.points());
            if (d.needs() == null) throw InputProblem.ofField("needs", "missing; give at least minRadius and maxRadius");
            if (d.callouts() == null || d.callouts().isEmpty()) throw InputProblem.ofField("callouts", "missing or empty; give at least one callout");
            List<InspectionCallout> callouts = new ArrayList<>();
            for (InspectionFiles.CalloutDto c : d.callouts()) callouts.add(c.callout());
            double res = d.resolution() == null ? Double.NaN : d.resolution();
            double window = d.window() == null ? Double.NaN : d.window();
            return new Simulation(model, d.needs().needs, callouts, d.parts() == null ? Simulation.DEFAULT_PARTS : d.parts(),
                    d.seed() == null ? 1 : d.seed(), res, window);
        } catch (InputProblem e) {
            throw e.source() == null ? e.in(source) : e;
        }
    }

    private static <T> T wrap(Supplier<T> s) {
        try {
            return s.get();
        } catch (InputProblem p) {
            throw new IllegalArgumentException((p.field() == null ? "" : p.field() + ": ") + p.problem());
        }
    }

    private static double[] range(double[] v, String field) {
        if (v == null) return null;
        if (v.length != 2) throw new IllegalArgumentException(field + ": expected [min, max], got " + v.length + " number(s)");
        return v;
    }

    /** The file as written. */
    public record FileDto(String units, InspectionFiles.CornerDto corner, Double nominalRadius, ProcessDto process,
                          NeedsDto needs, List<InspectionFiles.CalloutDto> callouts, Integer parts, Long seed,
                          Double resolution, Double window) {}

    /** {@code process}. */
    public record ProcessDto(ScatterDto radius, PositionDto position, FlatDto flat, StepDto step, Double noise, Integer points) {}

    /** {@code process.radius}. */
    public static final class ScatterDto {
        final ProcessModel.Scatter scatter;

        @JsonCreator
        ScatterDto(@JsonProperty("mean") Double mean, @JsonProperty("sd") Double sd) {
            if (mean == null) throw new IllegalArgumentException("mean: missing");
            if (sd == null) throw new IllegalArgumentException("sd: missing");
            scatter = wrap(() -> new ProcessModel.Scatter(mean, sd));
        }
    }

    /** {@code process.position}. */
    public static final class PositionDto {
        final double sd;

        @JsonCreator
        PositionDto(@JsonProperty("sd") Double sd) {
            if (sd == null) throw new IllegalArgumentException("sd: missing");
            wrap(() -> {
                ProcessModel.nonNegative(sd, "sd");
                return sd;
            });
            this.sd = sd;
        }
    }

    /** {@code process.flat}. */
    public static final class FlatDto {
        final ProcessModel.Flats flats;

        @JsonCreator
        FlatDto(@JsonProperty("rate") Double rate, @JsonProperty("width") double[] width, @JsonProperty("centre") double[] centre) {
            if (rate == null) throw new IllegalArgumentException("rate: missing");
            if (width == null) throw new IllegalArgumentException("width: missing; give [min, max] as fractions of the sweep");
            double[] w = range(width, "width");
            double[] c = centre == null ? new double[] {0.5, 0.5} : range(centre, "centre");
            flats = wrap(() -> new ProcessModel.Flats(rate, w[0], w[1], c[0], c[1]));
        }
    }

    /** {@code process.step}. */
    public static final class StepDto {
        final ProcessModel.Steps steps;

        @JsonCreator
        StepDto(@JsonProperty("rate") Double rate, @JsonProperty("size") double[] size) {
            if (rate == null) throw new IllegalArgumentException("rate: missing");
            if (size == null) throw new IllegalArgumentException("size: missing; give [min, max]");
            double[] s = range(size, "size");
            steps = wrap(() -> new ProcessModel.Steps(rate, s[0], s[1]));
        }
    }

    /** {@code needs}. */
    public static final class NeedsDto {
        final Needs needs;

        @JsonCreator
        NeedsDto(@JsonProperty("minRadius") Double minRadius, @JsonProperty("maxRadius") Double maxRadius,
                 @JsonProperty("maxPositionError") Double maxPositionError, @JsonProperty("maxStep") Double maxStep) {
            if (minRadius == null) throw new IllegalArgumentException("minRadius: missing");
            if (maxRadius == null) throw new IllegalArgumentException("maxRadius: missing");
            needs = wrap(() -> new Needs(minRadius, maxRadius, maxPositionError == null ? Double.NaN : maxPositionError,
                    maxStep == null ? Double.NaN : maxStep));
        }
    }
}
