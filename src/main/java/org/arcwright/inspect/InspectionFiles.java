package org.arcwright.inspect;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.annotation.JsonDeserialize;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.function.Supplier;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;
import org.arcwright.zone.Segment;
import org.arcwright.zone.Side;

/**
 * Reads an inspection file (JSON) into an {@link InspectionRequest}, with errors that name the file,
 * line, column and field. Shared by the command line and the desktop app.
 *
 * <h2>Format</h2>
 * <pre>
 * {
 *   "units": "mm",                                   mm | in
 *   "corner": {"vertex": [0, 0], "legA": [1, 0], "legB": [0, 1], "kind": "round"},
 *   "nominalRadius": 0.55,
 *   "callout": {"type": "radius", "min": 0.5, "max": 0.6},
 *        or {"type": "controlled-radius", "min": .., "max": ..}
 *        or {"type": "profile", "zone": 0.05, "outward": 0.01, "free": ["x", "y", "rotation"], "dynamic": false}
 *        or {"type": "composite-profile", "tiers": [{"zone": 0.1, "free": []}, {"zone": 0.03, "free": ["x", "y", "rotation"]}]}
 *   "points": [[x, y], ...]          or  "pointsFile": "section-3.csv"   (relative to this file)
 * }
 * </pre>
 * Instead of {@code corner} and {@code nominalRadius}, a general contour (profile callouts only):
 * {@code "contour": {"air": "left", "segments": [{"type": "line", "from": [..], "to": [..]},
 * {"type": "arc", "from": [..], "to": [..], "centre": [..], "turn": "ccw"}]}}. The profile zone's
 * disposition may be stated as ASME's {@code outward} (the part on the add-material side) or as
 * ISO's {@code offset} (zone centre offset, positive out of the material), not both. Optional:
 * {@code resolution} (default 1e-6 of the unit; the slack at the tangent points, at most a tenth of the
 * tolerance), {@code window} (CR window length) and {@code uncertainty} (the expanded measurement
 * uncertainty U in the file's units; verdicts then follow the ISO 14253-1 default rule).
 */
public final class InspectionFiles {
    private final JsonFiles json;

    public InspectionFiles(JsonFiles json) {
        this.json = Objects.requireNonNull(json, "json");
    }

    /** Reads {@code file}; a {@code pointsFile} is resolved against its folder. */
    public InspectionRequest read(Path file) {
        return parse(InputFiles.readText(file), file.toString(), file.toAbsolutePath().getParent());
    }

    /** Parses inspection JSON text; {@code baseDir} resolves a {@code pointsFile} (may be null). */
    public InspectionRequest parse(String text, String source, Path baseDir) {
        FileDto dto = json.parse(text, source, FileDto.class);
        try {
            return toRequest(dto, source, baseDir);
        } catch (InputProblem p) {
            // checks made after reading (the request's own) are located at their field in the file
            throw source.equals(p.source()) ? JsonFiles.locate(p, text) : p;
        }
    }

    private static InspectionRequest toRequest(FileDto d, String source, Path dir) {
        try {
            Units units = d.units() == null ? null : Units.parse(d.units());
            if (units == null) throw InputProblem.ofField("units", "missing; use mm or in");
            Nominal nominal;
            if (d.corner() != null && d.contour() != null) throw InputProblem.ofField("contour", "give either corner or contour, not both");
            if (d.corner() != null) {
                if (d.nominalRadius() == null) throw InputProblem.ofField("nominalRadius", "missing");
                nominal = new Nominal.CornerBlend(d.corner().corner, d.nominalRadius());
            } else if (d.contour() != null) {
                nominal = new Nominal.Chain(d.contour().contour);
            } else {
                throw InputProblem.ofField("corner", "missing; give a corner (or a general contour)");
            }
            if (d.callout() == null) throw InputProblem.ofField("callout", "missing");
            PointSet pts;
            if (d.points() != null && d.pointsFile() != null) throw InputProblem.ofField("pointsFile", "give either points or pointsFile, not both");
            if (d.points() != null) {
                pts = d.points();
            } else if (d.pointsFile() != null) {
                Path p = dir == null ? Path.of(d.pointsFile()) : dir.resolve(d.pointsFile());
                pts = PointsCsv.read(p);
            } else {
                throw InputProblem.ofField("points", "missing; give points or pointsFile");
            }
            double res = d.resolution() == null ? units.resolution() : d.resolution();
            double window = d.window() == null ? Double.NaN : d.window();
            double u = d.uncertainty() == null ? 0 : d.uncertainty();
            return new InspectionRequest(units, nominal, d.callout().callout, pts, res, window, false, u);
        } catch (InputProblem p) {
            throw p.source() == null ? p.in(source) : p;
        }
    }

    private static <T> T wrap(String field, Supplier<T> s) {
        try {
            return s.get();
        } catch (InputProblem p) {
            String f = p.field() == null ? field : field == null || p.field().startsWith(field) ? p.field() : field + "." + p.field();
            if (f != null && f.startsWith("callout.")) f = f.substring("callout.".length());
            throw new IllegalArgumentException((f == null ? "" : f + ": ") + p.problem());
        }
    }

    private static Point2 point(double[] v, String field) {
        if (v == null) throw new IllegalArgumentException(field + ": missing");
        if (v.length != 2) throw new IllegalArgumentException(field + ": expected [x, y], got " + v.length + " number(s)");
        return wrap(field, () -> new Point2(v[0], v[1]));
    }

    /** The file as written. */
    public record FileDto(String units, CornerDto corner, ContourDto contour, Double nominalRadius, CalloutDto callout,
                          @JsonDeserialize(using = PointsDeserializer.class) PointSet points, String pointsFile,
                          Double resolution, Double window, Double uncertainty) {}

    /** {@code corner}: vertex, legs and kind. */
    public static final class CornerDto {
        final Corner corner;

        @JsonCreator
        CornerDto(@JsonProperty("vertex") double[] vertex,
                  @JsonProperty("legA") double[] legA,
                  @JsonProperty("legB") double[] legB,
                  @JsonProperty("kind") String kind) {
            Point2 v = point(vertex, "vertex"), a = point(legA, "legA"), b = point(legB, "legB");
            if (kind == null) throw new IllegalArgumentException("kind: missing; use round or fillet");
            BlendKind k = null;
            for (BlendKind each : BlendKind.values()) if (each.key().equalsIgnoreCase(kind)) k = each;
            if (k == null) throw new IllegalArgumentException("kind: unknown kind '" + kind + "'; use round or fillet");
            BlendKind known = k;
            this.corner = wrap(null, () -> new Corner(v, a, b, known));
        }

        /** The corner as read (also used by other files that share the corner shape). */
        public Corner corner() { return corner; }
    }

    /** {@code contour}: air side and segments. */
    public static final class ContourDto {
        final Contour contour;

        @JsonCreator
        ContourDto(@JsonProperty("air") String air,
                   @JsonProperty("segments") List<SegmentDto> segments) {
            if (air == null) throw new IllegalArgumentException("air: missing; use left or right");
            Side side = "left".equalsIgnoreCase(air) ? Side.LEFT : "right".equalsIgnoreCase(air) ? Side.RIGHT : null;
            if (side == null) throw new IllegalArgumentException("air: unknown side '" + air + "'; use left or right");
            if (segments == null || segments.isEmpty()) throw new IllegalArgumentException("segments: missing or empty");
            List<Segment> list = new ArrayList<>();
            for (SegmentDto s : segments) list.add(s.segment);
            this.contour = wrap(null, () -> new Contour(list, side));
        }
    }

    /** One segment of a general contour. */
    public static final class SegmentDto {
        final Segment segment;

        @JsonCreator
        SegmentDto(@JsonProperty("type") String type,
                   @JsonProperty("from") double[] from,
                   @JsonProperty("to") double[] to,
                   @JsonProperty("centre") double[] centre,
                   @JsonProperty("turn") String turn) {
            Point2 a = point(from, "from"), b = point(to, "to");
            if ("line".equals(type)) {
                if (centre != null || turn != null) throw new IllegalArgumentException("a line takes only from and to");
                segment = wrap(null, () -> new Segment.Line(a, b));
            } else if ("arc".equals(type)) {
                Point2 c = point(centre, "centre");
                boolean ccw;
                if ("ccw".equals(turn)) ccw = true;
                else if ("cw".equals(turn)) ccw = false;
                else throw new IllegalArgumentException("turn: use ccw or cw, got " + turn);
                double r = c.distance(a);
                if (Math.abs(c.distance(b) - r) > 1e-6 * Math.max(1, r)) {
                    throw new IllegalArgumentException("to: not on the arc's circle (from is " + DecimalText.significant(r, 7) + " from the centre, to is " + DecimalText.significant(c.distance(b), 7) + ")");
                }
                double s = Math.atan2(a.y() - c.y(), a.x() - c.x()), e = Math.atan2(b.y() - c.y(), b.x() - c.x());
                double sweep = ccw ? e - s : s - e;
                sweep = sweep - 2 * Math.PI * Math.floor(sweep / (2 * Math.PI));
                if (sweep == 0) throw new IllegalArgumentException("to: same as from; an arc needs distinct ends");
                double sw = ccw ? sweep : -sweep;
                segment = wrap(null, () -> new Segment.Arc(c, r, s, sw));
            } else {
                throw new IllegalArgumentException("type: unknown segment type '" + type + "'; use line or arc");
            }
        }
    }

    /** {@code callout}: one of the four types. */
    public static final class CalloutDto {
        final InspectionCallout callout;

        @JsonCreator
        CalloutDto(@JsonProperty("type") String type,
                   @JsonProperty("min") Double min,
                   @JsonProperty("max") Double max,
                   @JsonProperty("zone") Double zone,
                   @JsonProperty("outward") Double outward,
                   @JsonProperty("offset") Double offset,
                   @JsonProperty("free") List<String> free,
                   @JsonProperty("dynamic") Boolean dynamic,
                   @JsonProperty("tiers") List<TierDto> tiers) {
            if (type == null) throw new IllegalArgumentException("type: missing; use radius, controlled-radius, profile or composite-profile");
            switch (type) {
                case "radius", "controlled-radius" -> {
                    only(type, zone == null && outward == null && offset == null && free == null && dynamic == null && tiers == null,
                            "min and max");
                    if (min == null) throw new IllegalArgumentException("min: missing");
                    if (max == null) throw new IllegalArgumentException("max: missing");
                    RadiusKind k = type.equals("radius") ? RadiusKind.R : RadiusKind.CR;
                    callout = wrap(null, () -> new InspectionCallout.RadiusLimits(k, min, max));
                }
                case "profile" -> {
                    only(type, min == null && max == null && tiers == null, "zone, outward or offset, free and dynamic");
                    if (zone == null) throw new IllegalArgumentException("zone: missing");
                    if (outward != null && offset != null) throw new IllegalArgumentException("offset: give outward (ASME) or offset (ISO), not both");
                    ProfileZone z = wrap(null, () -> outward != null ? new ProfileZone(zone, outward)
                            : offset != null ? ProfileZone.isoOffset(zone, offset) : ProfileZone.bilateral(zone));
                    Set<Freedom> f = freedoms(free, "free");
                    callout = new InspectionCallout.ProfileTolerance(z, f, dynamic != null && dynamic);
                }
                case "composite-profile" -> {
                    only(type, min == null && max == null && zone == null && outward == null && offset == null && free == null
                            && dynamic == null, "tiers");
                    if (tiers == null) throw new IllegalArgumentException("tiers: missing");
                    List<InspectionCallout.Tier> list = new ArrayList<>();
                    for (TierDto t : tiers) list.add(t.tier);
                    callout = wrap(null, () -> new InspectionCallout.CompositeProfile(list));
                }
                default -> throw new IllegalArgumentException("type: unknown callout type '" + type
                        + "'; use radius, controlled-radius, profile or composite-profile");
            }
        }

        /** The callout as read (also used by other files that share the callout shape). */
        public InspectionCallout callout() { return callout; }

        private static void only(String type, boolean ok, String takes) {
            if (!ok) throw new IllegalArgumentException("a " + type + " callout takes only " + takes);
        }
    }

    /** One tier of a composite profile. */
    public static final class TierDto {
        final InspectionCallout.Tier tier;

        @JsonCreator
        TierDto(@JsonProperty("zone") Double zone,
                @JsonProperty("free") List<String> free) {
            if (zone == null) throw new IllegalArgumentException("zone: missing");
            Set<Freedom> f = freedoms(free, "free");
            tier = wrap(null, () -> new InspectionCallout.Tier(zone, f));
        }
    }

    private static Set<Freedom> freedoms(List<String> free, String field) {
        Set<Freedom> out = EnumSet.noneOf(Freedom.class);
        if (free == null) return out;
        for (String s : free) {
            Freedom f = Freedom.fromKey(s);
            if (f == null) throw new IllegalArgumentException(field + ": unknown freedom '" + s + "'; use x, y or rotation");
            if (!out.add(f)) throw new IllegalArgumentException(field + ": '" + s + "' given twice");
        }
        return out;
    }

    /** Streams {@code [[x, y], ...]} into primitive arrays, naming the index of a bad point. */
    public static final class PointsDeserializer extends JsonDeserializer<PointSet> {
        @Override
        public PointSet deserialize(JsonParser p, DeserializationContext ctxt) throws IOException {
            if (p.currentToken() != JsonToken.START_ARRAY) {
                throw JsonMappingException.from(p, "expected an array of [x, y] pairs");
            }
            double[] xs = new double[256], ys = new double[256];
            int n = 0;
            JsonToken t;
            while ((t = p.nextToken()) != JsonToken.END_ARRAY) {
                if (t != JsonToken.START_ARRAY) {
                    throw JsonMappingException.from(p, "[" + n + "]: expected [x, y], got " + t.asString());
                }
                double x = coordinate(p, n, "x"), y = coordinate(p, n, "y");
                if (p.nextToken() != JsonToken.END_ARRAY) {
                    throw JsonMappingException.from(p, "[" + n + "]: expected exactly two numbers [x, y]");
                }
                if (n == xs.length) {
                    xs = Arrays.copyOf(xs, 2 * n);
                    ys = Arrays.copyOf(ys, 2 * n);
                }
                xs[n] = x;
                ys[n] = y;
                n++;
            }
            return new PointSet(xs, ys, n, "points");
        }

        private static double coordinate(JsonParser p, int i, String which) throws IOException {
            JsonToken t = p.nextToken();
            if (t != JsonToken.VALUE_NUMBER_INT && t != JsonToken.VALUE_NUMBER_FLOAT) {
                throw JsonMappingException.from(p, "[" + i + "]: " + which
                        + " must be a number, got " + (t == JsonToken.END_ARRAY ? "]" : p.getText()));
            }
            double v = p.getDoubleValue();
            if (!Double.isFinite(v)) {
                throw JsonMappingException.from(p, "[" + i + "]: " + which + " is not a finite number");
            }
            return v;
        }
    }
}
