package org.arcwright.mechanics;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.Units;

/**
 * Reads the JSON files of the {@code fillet-stress} and {@code clearance} jobs. Malformed JSON,
 * unknown fields and wrong types are reported by {@link JsonFiles}; values that are well formed but
 * wrong are reported at their own line and column.
 *
 * <p>Fillet-stress file: {@code units} (mm|in), {@code shape} (stepped-shaft|stepped-bar),
 * {@code load} (tension|bending|torsion), {@code D}, {@code d}, {@code r} or {@code rMin}/{@code rMax}
 * (with an optional nominal {@code r} between them) or a {@code callout} as drawn ({@code "R1 +0.2/-0.1"}), optional {@code ultimateStrength}
 * {value, units: MPa|ksi}, optional {@code targetKt} and {@code targetKf}.
 *
 * <p>Clearance file: {@code units}, {@code fillet} {r | rMin, rMax | callout}, {@code mating}
 * {type: chamfer, leg, angle (default 45)} | {type: radius, rMin} | {type: bearing, chamferMin (mm)},
 * optional {@code shoulderHeight}, {@code shoulderEdgeBreak}, {@code requiredSupport}.
 */
public final class MechanicsFiles {
    private final JsonFiles json;
    private final PetersonFits fits;

    /** @param fits the catalogue a file's shape and load must have a fit in */
    public MechanicsFiles(JsonFiles json, PetersonFits fits) {
        this.json = Objects.requireNonNull(json, "json");
        this.fits = Objects.requireNonNull(fits, "fits");
    }

    /** A fillet-stress job: the case and the targets asked for (none, Kt, Kf or both). */
    public record FilletStressJob(FilletStressCase stressCase, List<StressTarget> targets) {
        public FilletStressJob {
            Objects.requireNonNull(stressCase, "stressCase");
            targets = List.copyOf(targets);
        }
    }

    record StrengthDto(@JsonProperty("value") Double value, @JsonProperty("units") String units) {}

    record StressDto(@JsonProperty("units") String units, @JsonProperty("shape") String shape,
                     @JsonProperty("load") String load, @JsonProperty("D") Double bigD, @JsonProperty("d") Double smallD,
                     @JsonProperty("r") Double r, @JsonProperty("rMin") Double rMin, @JsonProperty("rMax") Double rMax,
                     @JsonProperty("callout") String callout,
                     @JsonProperty("ultimateStrength") StrengthDto ultimateStrength,
                     @JsonProperty("targetKt") Double targetKt, @JsonProperty("targetKf") Double targetKf,
                     @JsonProperty("description") String description) {}

    record FilletDto(@JsonProperty("r") Double r, @JsonProperty("rMin") Double rMin, @JsonProperty("rMax") Double rMax,
                     @JsonProperty("callout") String callout) {}

    record MatingDto(@JsonProperty("type") String type, @JsonProperty("leg") Double leg, @JsonProperty("angle") Double angle,
                     @JsonProperty("rMin") Double rMin, @JsonProperty("chamferMin") Double chamferMin,
                     @JsonProperty("bore") Double bore) {}

    record ClearanceDto(@JsonProperty("units") String units, @JsonProperty("fillet") FilletDto fillet,
                        @JsonProperty("mating") MatingDto mating, @JsonProperty("shoulderHeight") Double shoulderHeight,
                        @JsonProperty("shoulderEdgeBreak") Double shoulderEdgeBreak,
                        @JsonProperty("requiredSupport") Double requiredSupport,
                        @JsonProperty("description") String description) {}

    /** Reads a fillet-stress file. */
    public FilletStressJob readFilletStress(Path file) {
        String text = text(file);
        StressDto dto = json.parse(text, file.toString(), StressDto.class);
        FieldLocations at = FieldLocations.of(file.toString(), text);
        try {
            Units units = Units.parse(dto.units());
            ShoulderShape shape = ShoulderShape.parse(dto.shape());
            LoadCase load = LoadCase.parse(dto.load());
            double bigD = required(dto.bigD(), "D");
            double smallD = required(dto.smallD(), "d");
            UltimateStrength strength = null;
            if (dto.ultimateStrength() != null) {
                StrengthDto s = dto.ultimateStrength();
                strength = new UltimateStrength(required(s.value(), "ultimateStrength.value"),
                        UltimateStrength.Unit.parse(s.units()));
            }
            FilletStressCase c;
            if (dto.callout() != null) {
                if (dto.r() != null || dto.rMin() != null || dto.rMax() != null) {
                    throw InputProblem.ofField("callout", "give either a callout or r/rMin/rMax, not both");
                }
                double[] l = limits(dto.callout(), units, "callout");
                c = new FilletStressCase(shape, load, units, bigD, smallD, l[0], l[1], l[2], strength);
            } else if (dto.rMin() != null || dto.rMax() != null) {
                double lo = required(dto.rMin(), "rMin");
                double hi = required(dto.rMax(), "rMax");
                c = dto.r() == null ? FilletStressCase.ofLimits(shape, load, units, bigD, smallD, lo, hi, strength)
                        : new FilletStressCase(shape, load, units, bigD, smallD, lo, dto.r(), hi, strength);
            } else {
                c = FilletStressCase.of(shape, load, units, bigD, smallD,
                        required(dto.r(), "r", "missing: give r, or rMin and rMax"), strength);
            }
            fits.require(shape, load);
            List<StressTarget> targets = new ArrayList<>();
            if (dto.targetKt() != null) targets.add(StressTarget.kt(dto.targetKt()));
            if (dto.targetKf() != null) {
                if (strength == null) throw InputProblem.ofField("targetKf", "a K_f target needs the material's ultimateStrength");
                targets.add(StressTarget.kf(dto.targetKf()));
            }
            return new FilletStressJob(c, targets);
        } catch (InputProblem p) {
            throw at.locate(p);
        }
    }

    /** Reads a clearance file. */
    public ClearanceCase readClearance(Path file) {
        String text = text(file);
        ClearanceDto dto = json.parse(text, file.toString(), ClearanceDto.class);
        FieldLocations at = FieldLocations.of(file.toString(), text);
        try {
            Units units = Units.parse(dto.units());
            if (dto.fillet() == null) throw InputProblem.ofField("fillet", "missing: the fillet's r, or rMin and rMax");
            FilletDto f = dto.fillet();
            double lo;
            double hi;
            if (f.callout() != null) {
                if (f.r() != null || f.rMin() != null || f.rMax() != null) {
                    throw InputProblem.ofField("fillet.callout", "give either a callout or r/rMin/rMax, not both");
                }
                double[] l = limits(f.callout(), units, "fillet.callout");
                lo = l[0];
                hi = l[2];
            } else if (f.rMin() != null || f.rMax() != null) {
                lo = required(f.rMin(), "fillet.rMin");
                hi = required(f.rMax(), "fillet.rMax");
            } else {
                lo = required(f.r(), "fillet.r", "missing: give r, or rMin and rMax");
                hi = lo;
            }
            MatingCorner corner = corner(dto.mating(), units);
            double edge = dto.shoulderEdgeBreak() == null ? 0 : dto.shoulderEdgeBreak();
            return new ClearanceCase(units, lo, hi, corner, dto.shoulderHeight(), edge, dto.requiredSupport());
        } catch (InputProblem p) {
            throw at.locate(p);
        }
    }

    /** The mating corner; a bearing's sizes go to mm here, at the file boundary, since its tables are metric. */
    private static MatingCorner corner(MatingDto m, Units units) {
        if (m == null) throw InputProblem.ofField("mating", "missing: the mating part's corner, e.g. {\"type\": \"chamfer\", \"leg\": 1.5, \"angle\": 45}");
        String type = m.type() == null ? null : m.type().trim().toLowerCase(Locale.ROOT);
        if (type == null) throw InputProblem.ofField("mating.type", "missing; use chamfer, radius or bearing");
        switch (type) {
            case "chamfer":
                only(m.rMin() == null && m.chamferMin() == null && m.bore() == null, "a chamfer takes leg and angle");
                return new MatingCorner.Chamfer(required(m.leg(), "mating.leg"), m.angle() == null ? 45 : m.angle());
            case "radius":
                only(m.leg() == null && m.angle() == null && m.chamferMin() == null && m.bore() == null, "a radius takes rMin");
                return new MatingCorner.Radius(required(m.rMin(), "mating.rMin"));
            case "bearing":
                only(m.leg() == null && m.angle() == null && m.rMin() == null, "a bearing takes chamferMin (r_s min) and an optional bore");
                double mm = units.millimetres();
                return new MatingCorner.Bearing(required(m.chamferMin(), "mating.chamferMin") * mm,
                        m.bore() == null ? null : m.bore() * mm);
            default:
                throw InputProblem.ofField("mating.type", "unknown type '" + m.type() + "'; use chamfer, radius or bearing");
        }
    }

    /** {min, nominal, max} of a radius callout such as {@code R1 +0.2/-0.1} (nominal: as drawn, else the mean). */
    private static double[] limits(String text, Units units, String field) {
        RadiusCallout rc;
        try {
            rc = CalloutParser.parse(text, units);
        } catch (InputProblem p) {
            throw InputProblem.ofField(field, p.problem() + (p.column() > 0 ? " (at character " + p.column() + ")" : ""));
        }
        if (rc.units() != units) {
            throw InputProblem.ofField(field, "the callout is in " + rc.units() + " but the file's units are " + units);
        }
        if (rc.min().isEmpty() || rc.max().isEmpty()) {
            throw InputProblem.ofField(field, "'" + text.trim() + "' does not give both limits; these checks need the "
                    + "smallest and the largest radius (give limits, or rMin and rMax from the general tolerance)");
        }
        double min = rc.min().getAsDouble();
        double max = rc.max().getAsDouble();
        return new double[] {min, rc.nominal().isPresent() ? rc.nominal().getAsDouble() : (min + max) / 2, max};
    }

    private static void only(boolean ok, String what) {
        if (!ok) throw InputProblem.ofField("mating", "fields of another kind of corner given: " + what);
    }

    private static double required(Double v, String field) {
        return required(v, field, "missing");
    }

    private static double required(Double v, String field, String message) {
        if (v == null) throw InputProblem.ofField(field, message);
        return v;
    }

    private static String text(Path file) {
        return InputFiles.readText(file);
    }
}
