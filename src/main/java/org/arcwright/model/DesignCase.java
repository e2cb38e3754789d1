package org.arcwright.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * What the engineer tells Arcwright about one radius: what it does, how it is loaded and made, what
 * it can be related to. The advisor's rules read these facts; nothing here is a recommendation.
 *
 * @param units drawing units
 * @param standard drawing standard, ASME Y14.5 or ISO
 * @param feature optional label of the radius on the part, e.g. {@code F3 shoulder fillet}
 * @param kind round or fillet
 * @param nominalRadius nominal radius in {@code units}, > 0
 * @param function what the radius does
 * @param loading service loading at the radius
 * @param formMatters whether the shape of the blend matters to its function
 * @param locationMatters whether where the blend sits relative to datums matters
 * @param datums datum features the adjacent surfaces can reference, may be empty
 * @param process how the radius is made
 * @param stress section geometry and material for a stress-concentration check, or null
 * @param mating the mating part's corner for a seating check, or null
 * @param tolerance the engineer's tolerance intent as radius text (e.g. {@code R1.5 ±0.1}), or null
 * @param cornerAngle the angle between the two faces the radius blends, degrees, in (0, 180), or null for a
 *     square corner ({@value #SQUARE_CORNER}); it sets the crescent and the equivalent profile zone
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record DesignCase(Units units, DrawingStyle standard, String feature, BlendKind kind, double nominalRadius,
                         BlendFunction function, Loading loading, boolean formMatters, boolean locationMatters,
                         List<String> datums, Process process, StressInputs stress, MatingCorner mating,
                         String tolerance, Double cornerAngle) {

    /** The corner angle assumed when the case gives none, degrees. */
    public static final double SQUARE_CORNER = 90.0;

    /** A case at a square corner (no {@code cornerAngle}): the form every caller used before the angle existed. */
    public DesignCase(Units units, DrawingStyle standard, String feature, BlendKind kind, double nominalRadius,
                      BlendFunction function, Loading loading, boolean formMatters, boolean locationMatters,
                      List<String> datums, Process process, StressInputs stress, MatingCorner mating, String tolerance) {
        this(units, standard, feature, kind, nominalRadius, function, loading, formMatters, locationMatters, datums,
                process, stress, mating, tolerance, null);
    }

    @JsonCreator
    public DesignCase(@JsonProperty(value = "units", required = true) Units units,
                      @JsonProperty(value = "standard", required = true) DrawingStyle standard,
                      @JsonProperty("feature") String feature,
                      @JsonProperty(value = "kind", required = true) BlendKind kind,
                      @JsonProperty(value = "nominalRadius", required = true) double nominalRadius,
                      @JsonProperty(value = "function", required = true) BlendFunction function,
                      @JsonProperty("loading") Loading loading,
                      @JsonProperty("formMatters") boolean formMatters,
                      @JsonProperty("locationMatters") boolean locationMatters,
                      @JsonProperty("datums") List<String> datums,
                      @JsonProperty(value = "process", required = true) Process process,
                      @JsonProperty("stress") StressInputs stress,
                      @JsonProperty("mating") MatingCorner mating,
                      @JsonProperty("tolerance") String tolerance,
                      @JsonProperty("cornerAngle") Double cornerAngle) {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(standard, "standard");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(function, "function");
        Objects.requireNonNull(process, "process");
        if (!(Double.isFinite(nominalRadius) && nominalRadius > 0)) {
            throw new IllegalArgumentException("nominalRadius must be a number greater than zero, got " + DecimalText.exact(nominalRadius));
        }
        this.units = units;
        this.standard = standard;
        this.feature = feature;
        this.kind = kind;
        this.nominalRadius = nominalRadius;
        this.function = function;
        this.loading = loading == null ? Loading.NONE : loading;
        this.formMatters = formMatters;
        this.locationMatters = locationMatters;
        this.datums = datums == null ? List.of() : List.copyOf(datums);
        for (String d : this.datums) {
            if (d == null || !d.matches("[A-Z]{1,2}")) {
                throw new IllegalArgumentException("datum labels are one or two capital letters, got '" + d + "'");
            }
        }
        this.process = process;
        this.stress = stress;
        this.mating = mating;
        this.tolerance = tolerance == null || tolerance.isBlank() ? null : tolerance.trim();
        if (this.tolerance != null) {
            // read here, at the file, so that a typo is refused where it stands, not when a card is sized
            try {
                CalloutParser.parse(this.tolerance, units);
            } catch (InputProblem p) {
                throw InputProblem.ofField("tolerance", p.problem()
                        + (p.column() > 0 ? " (at character " + p.column() + " of '" + this.tolerance + "')" : ""));
            }
        }
        if (cornerAngle != null && !(Double.isFinite(cornerAngle) && cornerAngle > 0 && cornerAngle < 180)) {
            throw new IllegalArgumentException("cornerAngle must be between 0 and 180 degrees (exclusive), got " + DecimalText.exact(cornerAngle));
        }
        this.cornerAngle = cornerAngle;
    }

    /** The corner angle in degrees: the case's, else a square corner. */
    @JsonIgnore
    public double cornerAngleDegrees() { return cornerAngle == null ? SQUARE_CORNER : cornerAngle; }

    /** The same case at another corner angle (null for a square corner). */
    public DesignCase withCornerAngle(Double angle) {
        return new DesignCase(units, standard, feature, kind, nominalRadius, function, loading, formMatters,
                locationMatters, datums, process, stress, mating, tolerance, angle);
    }

    /** True when datum features are available for the adjacent surfaces. */
    @JsonIgnore
    public boolean hasDatums() { return !datums.isEmpty(); }

    /**
     * Section geometry for a shoulder-fillet stress-concentration estimate.
     *
     * @param shape {@code stepped-shaft} or {@code stepped-bar}
     * @param load {@code tension}, {@code bending} or {@code torsion}
     * @param bigD larger diameter (or width) D
     * @param smallD smaller diameter (or width) d, &lt; D
     * @param ultimateStrength material ultimate tensile strength, or null
     * @param targetKt largest acceptable K<sub>t</sub>, or null; always K<sub>t</sub>, with or without a strength
     * @param targetKf largest acceptable K<sub>f</sub>, or null; needs {@code ultimateStrength} for the notch
     *     sensitivity
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record StressInputs(String shape, String load, double bigD, double smallD, Strength ultimateStrength,
                               Double targetKt, Double targetKf) {

        /** Section geometry with a K<sub>t</sub> target only (the form every caller used before K<sub>f</sub> targets). */
        public StressInputs(String shape, String load, double bigD, double smallD, Strength ultimateStrength,
                            Double targetKt) {
            this(shape, load, bigD, smallD, ultimateStrength, targetKt, null);
        }

        @JsonCreator
        public StressInputs(@JsonProperty(value = "shape", required = true) String shape,
                            @JsonProperty(value = "load", required = true) String load,
                            @JsonProperty(value = "D", required = true) double bigD,
                            @JsonProperty(value = "d", required = true) double smallD,
                            @JsonProperty("ultimateStrength") Strength ultimateStrength,
                            @JsonProperty("targetKt") Double targetKt,
                            @JsonProperty("targetKf") Double targetKf) {
            if (!List.of("stepped-shaft", "stepped-bar").contains(shape)) {
                throw new IllegalArgumentException("shape must be stepped-shaft or stepped-bar, got '" + shape + "'");
            }
            if (!List.of("tension", "bending", "torsion").contains(load)) {
                throw new IllegalArgumentException("load must be tension, bending or torsion, got '" + load + "'");
            }
            if (!(Double.isFinite(bigD) && Double.isFinite(smallD) && smallD > 0 && bigD > smallD)) {
                throw new IllegalArgumentException("need D > d > 0, got D=" + DecimalText.exact(bigD) + ", d=" + DecimalText.exact(smallD));
            }
            if (targetKt != null && !(Double.isFinite(targetKt) && targetKt >= 1)) {
                throw new IllegalArgumentException("targetKt must be at least 1, got " + DecimalText.exact(targetKt));
            }
            if (targetKf != null && !(Double.isFinite(targetKf) && targetKf >= 1)) {
                throw new IllegalArgumentException("targetKf must be at least 1, got " + DecimalText.exact(targetKf));
            }
            if (targetKf != null && ultimateStrength == null) {
                throw new IllegalArgumentException("targetKf needs the material's ultimateStrength (for the notch sensitivity)");
            }
            this.shape = shape;
            this.load = load;
            this.bigD = bigD;
            this.smallD = smallD;
            this.ultimateStrength = ultimateStrength;
            this.targetKt = targetKt;
            this.targetKf = targetKf;
        }

        /** h = (D - d)/2: the largest fillet tangent to both the smaller diameter and the shoulder face. */
        @JsonIgnore
        public double stepHeight() { return (bigD - smallD) / 2; }

        @JsonProperty("D")
        public double bigD() { return bigD; }

        @JsonProperty("d")
        public double smallD() { return smallD; }
    }

    /**
     * A material strength with its unit.
     *
     * @param value > 0
     * @param units {@code MPa} or {@code ksi}
     */
    public record Strength(double value, String units) {
        @JsonCreator
        public Strength(@JsonProperty(value = "value", required = true) double value,
                        @JsonProperty(value = "units", required = true) String units) {
            if (!(Double.isFinite(value) && value > 0)) {
                throw new IllegalArgumentException("strength must be greater than zero, got " + DecimalText.exact(value));
            }
            if (!"MPa".equals(units) && !"ksi".equals(units)) {
                throw new IllegalArgumentException("strength units must be MPa or ksi, got '" + units + "'");
            }
            this.value = value;
            this.units = units;
        }

        /** The strength in MPa. */
        public double megapascals() { return "ksi".equals(units) ? value * 6.894757293168361 : value; }
    }

    /**
     * The corner of the part that seats against this fillet.
     *
     * @param corner {@code chamfer}, {@code radius} or {@code bearing} (a rolling bearing's ring corner)
     * @param size the mating part's minimum chamfer leg or minimum corner radius, or for a bearing the ring's
     *     smallest chamfer dimension r<sub>s min</sub> (the largest fillet then comes from the pack's bearing
     *     table), > 0
     * @param angle chamfer angle in degrees from the seating face, default 45
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record MatingCorner(String corner, double size, Double angle) {
        @JsonCreator
        public MatingCorner(@JsonProperty(value = "corner", required = true) String corner,
                            @JsonProperty(value = "size", required = true) double size,
                            @JsonProperty("angle") Double angle) {
            if (!"chamfer".equals(corner) && !"radius".equals(corner) && !"bearing".equals(corner)) {
                throw new IllegalArgumentException("corner must be chamfer, radius or bearing, got '" + corner + "'");
            }
            if (angle != null && !"chamfer".equals(corner)) {
                throw new IllegalArgumentException("angle applies only to a chamfer corner");
            }
            if (!(Double.isFinite(size) && size > 0)) {
                throw new IllegalArgumentException("size must be greater than zero, got " + DecimalText.exact(size));
            }
            if (angle != null && !(angle > 0 && angle < 90)) {
                throw new IllegalArgumentException("angle must be between 0 and 90 degrees, got " + DecimalText.exact(angle));
            }
            this.corner = corner;
            this.size = size;
            this.angle = angle;
        }
    }
}
