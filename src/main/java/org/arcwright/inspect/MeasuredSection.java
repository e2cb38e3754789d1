package org.arcwright.inspect;

import java.util.Objects;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;

/**
 * One measured section and what several callouts judged on it have in common: the nominal contour
 * the points are measured against, the adjacent surfaces fitted for a given largest radius, and the
 * points' stations along a corner. A simulation judges every part under K callouts; through one of
 * these the surfaces are fitted once per distinct largest radius, not once per callout, and the
 * nominal contour is built once per part. Each piece is computed by the same code, from the same
 * inputs, the first time it is asked for, so a verdict through a shared section is the verdict of a
 * fresh one.
 *
 * <p>Not thread-safe: one per thread and section.
 */
public final class MeasuredSection {
    /** Distinct largest radii remembered (R, CR and a profile's derived radius in one run). */
    private static final int SLOTS = 4;

    private final Nominal nominal;
    private final PointSet points;
    private Contour contour;
    private final double[] surfaceRadius = new double[SLOTS];
    private final Corner[] surfaceNominal = new Corner[SLOTS];
    private final AdjacentSurfaces[] surfaces = new AdjacentSurfaces[SLOTS];
    private int surfaceCount;
    private final Corner[] stationCorner = new Corner[SLOTS];
    private final double[] stationRadius = new double[SLOTS];
    private final double[][] stations = new double[SLOTS][];
    private int stationCount;

    /** The section of {@code points} about {@code nominal}. */
    public MeasuredSection(Nominal nominal, PointSet points) {
        this.nominal = Objects.requireNonNull(nominal, "nominal");
        this.points = Objects.requireNonNull(points, "points");
    }

    /** The section a request judges. */
    public static MeasuredSection of(InspectionRequest req) {
        return new MeasuredSection(req.nominal(), req.points());
    }

    public Nominal nominal() { return nominal; }

    public PointSet points() { return points; }

    /** True when {@code req} judges these very points about this nominal. */
    boolean serves(InspectionRequest req) {
        return req.points() == points && req.nominal().equals(nominal);
    }

    /** The nominal contour, legs long enough for every point. */
    Contour contour() {
        if (contour == null) contour = Inspector.contourOf(nominal, points);
        return contour;
    }

    /** The adjacent surfaces fitted about {@code corner} for arcs up to {@code largestRadius}. */
    AdjacentSurfaces surfaces(Corner corner, double largestRadius) {
        for (int k = 0; k < surfaceCount; k++) {
            if (surfaceRadius[k] == largestRadius && surfaceNominal[k].equals(corner)) return surfaces[k];
        }
        AdjacentSurfaces s = AdjacentSurfaces.fit(corner, largestRadius, points.xs(), points.ys(), points.size());
        int slot = surfaceCount < SLOTS ? surfaceCount++ : SLOTS - 1;
        surfaceRadius[slot] = largestRadius;
        surfaceNominal[slot] = corner;
        surfaces[slot] = s;
        return s;
    }

    /**
     * The stations of the points {@code indices[0..count-1]} along the contour of {@code radius} on
     * {@code corner}: read from the whole array when it was worked out already, else measured for
     * these points alone, on the same contour, so each is the very value {@link #stations} gives.
     */
    double[] stationsOf(Corner corner, double radius, int[] indices, int count) {
        double[] st = new double[count];
        for (int k = 0; k < stationCount; k++) {
            if (stationRadius[k] == radius && stationCorner[k].equals(corner)) {
                for (int i = 0; i < count; i++) st[i] = stations[k][indices[i]];
                return st;
            }
        }
        Inspector.stationsAlong(corner, radius, points, indices, count, st);
        return st;
    }

    /** Each point's station along the contour of {@code radius} on {@code corner} (see {@link Inspector}). */
    double[] stations(Corner corner, double radius) {
        for (int k = 0; k < stationCount; k++) {
            if (stationRadius[k] == radius && stationCorner[k].equals(corner)) return stations[k];
        }
        double[] st = Inspector.stationsAlong(corner, radius, points);
        int slot = stationCount < SLOTS ? stationCount++ : SLOTS - 1;
        stationRadius[slot] = radius;
        stationCorner[slot] = corner;
        stations[slot] = st;
        return st;
    }
}
