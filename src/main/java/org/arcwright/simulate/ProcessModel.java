package org.arcwright.simulate;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Corner;

/**
 * How a process makes a blend and how it is measured: the generator's input. Every length is in
 * {@link #units()}; shares ({@code rate}, {@code width}, {@code centre}) are fractions from 0 to 1.
 *
 * @param units drawing units of every length
 * @param corner the nominal adjacent surfaces (the inspection file's corner)
 * @param nominalRadius nominal blend radius, > 0
 * @param radius the true radius: normal, tangent to the actual surfaces
 * @param positionSd the blend moved off its nominal place, normal per axis (0: none)
 * @param flat chords replacing part of the arc
 * @param step the blend ending off one surface
 * @param noise measuring scatter along the surface normal, standard deviation (0: none)
 * @param points points per measured section, >= 3
 */
public record ProcessModel(Units units, Corner corner, double nominalRadius, Scatter radius, double positionSd,
                           Flats flat, Steps step, double noise, int points) {
    /** Points per section when the file does not say (a dense CMM scan, common practice). */
    public static final int DEFAULT_POINTS = 200;

    public ProcessModel {
        Objects.requireNonNull(units, "units");
        if (corner == null) throw InputProblem.ofField("corner", "missing");
        if (!(nominalRadius > 0) || !Double.isFinite(nominalRadius)) throw InputProblem.ofField("nominalRadius", "must be above zero, got " + DecimalText.exact(nominalRadius));
        if (radius == null) throw InputProblem.ofField("process.radius", "missing; give {\"mean\": .., \"sd\": ..}");
        nonNegative(positionSd, "process.position.sd");
        nonNegative(noise, "process.noise");
        if (flat == null) flat = Flats.NONE;
        if (step == null) step = Steps.NONE;
        if (points < 3) throw InputProblem.ofField("process.points", "need at least 3 points per section, got " + points);
    }

    /** The same model with another scan density. */
    public ProcessModel withPoints(int n) {
        return new ProcessModel(units, corner, nominalRadius, radius, positionSd, flat, step, noise, n);
    }

    static void nonNegative(double v, String field) {
        if (!(v >= 0) || !Double.isFinite(v)) throw InputProblem.ofField(field, "must be zero or more, got " + DecimalText.exact(v));
    }

    static void fraction(double v, String field) {
        if (!(v >= 0 && v <= 1)) throw InputProblem.ofField(field, "must be a fraction from 0 to 1, got " + DecimalText.exact(v));
    }

    /**
     * A normal scatter.
     *
     * @param mean mean, > 0
     * @param sd standard deviation, >= 0
     */
    public record Scatter(double mean, double sd) {
        public Scatter {
            if (!(mean > 0) || !Double.isFinite(mean)) throw InputProblem.ofField("mean", "must be above zero, got " + DecimalText.exact(mean));
            nonNegative(sd, "sd");
        }
    }

    /**
     * Flats: on a share {@code rate} of parts a chord replaces the arc over a fraction of its sweep
     * drawn uniformly from {@code [widthMin, widthMax]}, centred at a fraction drawn uniformly from
     * {@code [centreMin, centreMax]} (0 = tangent point on leg A, 1 = on leg B). The chord meets the
     * arc in corners: a local radius of 0 there.
     */
    public record Flats(double rate, double widthMin, double widthMax, double centreMin, double centreMax) {
        /** No flats. */
        public static final Flats NONE = new Flats(0, 0, 0, 0.5, 0.5);

        public Flats {
            fraction(rate, "rate");
            fraction(widthMin, "width");
            fraction(widthMax, "width");
            fraction(centreMin, "centre");
            fraction(centreMax, "centre");
            if (widthMax < widthMin) throw InputProblem.ofField("width", "[min, max] out of order: " + DecimalText.exact(widthMin) + " > " + DecimalText.exact(widthMax));
            if (centreMax < centreMin) throw InputProblem.ofField("centre", "[min, max] out of order: " + DecimalText.exact(centreMin) + " > " + DecimalText.exact(centreMax));
            if (rate > 0 && !(widthMax > 0)) throw InputProblem.ofField("width", "a flat needs a width above zero");
        }
    }

    /**
     * Steps: on a share {@code rate} of parts the blend ends off one surface (A or B, even odds) by
     * a size drawn uniformly from {@code [sizeMin, sizeMax]}: the arc is tangent to a line parallel to
     * that surface and offset into the corner's angle, and a short wall joins it to the surface.
     */
    public record Steps(double rate, double sizeMin, double sizeMax) {
        /** No steps. */
        public static final Steps NONE = new Steps(0, 0, 0);

        public Steps {
            fraction(rate, "rate");
            nonNegative(sizeMin, "size");
            nonNegative(sizeMax, "size");
            if (sizeMax < sizeMin) throw InputProblem.ofField("size", "[min, max] out of order: " + DecimalText.exact(sizeMin) + " > " + DecimalText.exact(sizeMax));
        }
    }
}
