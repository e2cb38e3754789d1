package org.arcwright.app.model;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.arcwright.zone.Point2;

/**
 * Picking a CSV's frame on its plotted points, as an alternative to typing it: the corner's vertex
 * first, then a point along each leg. A click is only as precise as a pixel, so the frame keeps no
 * more digits than that: the vertex is rounded to the nearest 1, 2 or 5 × 10ⁿ at least one pixel
 * long, and each leg's direction to the nearest such step of degrees at least the angle one pixel
 * subtends at that leg's point (common practice: state no more precision than the measurement has).
 *
 * @param picked the points clicked so far, in the CSV's coordinates: the vertex, then leg A, then leg B
 * @param pixel the length one pixel of the plot stood for at each click, in the CSV's units
 * @param units the CSV's length unit (a symbol, e.g. mm), for the prompts
 */
public record FramePick(List<Point2> picked, List<Double> pixel, String units) {
    /** Clicks closer than this many pixels to the vertex give no direction, and are asked again. */
    private static final double NEAR_VERTEX_PX = 4;

    public FramePick {
        picked = List.copyOf(picked);
        pixel = List.copyOf(pixel);
        Objects.requireNonNull(units, "units");
        if (picked.size() != pixel.size() || picked.size() > 3) {
            throw new IllegalArgumentException("a frame is three clicks, got " + picked.size() + " for " + pixel.size() + " pixel sizes");
        }
    }

    /** Nothing picked yet. */
    public static FramePick start(String units) { return new FramePick(List.of(), List.of(), units); }

    /**
     * The pick with one more click at {@code p}, where one pixel is {@code pixelSize} long; a leg
     * click on the vertex itself is ignored (it gives no direction), and so is a click after the third.
     */
    public FramePick click(Point2 p, double pixelSize) {
        if (complete()) return this;
        if (!picked.isEmpty() && p.distance(picked.get(0)) < NEAR_VERTEX_PX * pixelSize) return this;
        List<Point2> pts = new ArrayList<>(picked);
        List<Double> px = new ArrayList<>(pixel);
        pts.add(p);
        px.add(pixelSize);
        return new FramePick(pts, px, units);
    }

    /** Whether the vertex and both legs are picked. */
    public boolean complete() { return picked.size() == 3; }

    /** What to click next, or what was picked, in words with the units. */
    public String prompt() {
        String u = units.isEmpty() ? "" : " " + units;
        switch (picked.size()) {
            case 0:
                return "Click the corner's vertex on the plot: where the two straight surfaces would meet (1 of 3).";
            case 1:
                return "Vertex at (" + Numbers.trim(vertexX()) + ", " + Numbers.trim(vertexY()) + ")" + u
                        + ". Now click a point along the first leg, well away from the blend (2 of 3).";
            case 2:
                return "First leg at " + Numbers.trim(legDegrees(1)) + "°. Now click a point along the second leg (3 of 3).";
            default:
                return "Frame picked: vertex (" + Numbers.trim(vertexX()) + ", " + Numbers.trim(vertexY()) + ")" + u
                        + ", legs at " + Numbers.trim(legDegrees(1)) + "° and " + Numbers.trim(legDegrees(2)) + "°.";
        }
    }

    /** The vertex's x, rounded to the click's precision. */
    public double vertexX() { return round(picked.get(0).x(), step(pixel.get(0))); }

    /** The vertex's y, rounded to the click's precision. */
    public double vertexY() { return round(picked.get(0).y(), step(pixel.get(0))); }

    /**
     * Direction from the vertex (as rounded, the one the frame keeps) to the {@code leg}-th pick (1
     * or 2), degrees counter-clockwise from +x in [0, 360), rounded to the precision of a click at
     * that distance.
     */
    public double legDegrees(int leg) {
        Point2 d = picked.get(leg).minus(new Point2(vertexX(), vertexY()));
        double deg = Math.toDegrees(Math.atan2(d.y(), d.x()));
        double step = step(Math.toDegrees(pixel.get(leg) / d.length()));
        double r = round(deg < 0 ? deg + 360 : deg, step);
        return r >= 360 ? round(r - 360, step) : r;
    }

    /** The frame picked, for {@link CheckRequests#read}; only once {@link #complete()}. */
    public CheckRequests.Frame frame() {
        if (!complete()) throw new IllegalStateException("the frame needs the vertex and both legs; " + picked.size() + " picked");
        return CheckRequests.Frame.ofDegrees(vertexX(), vertexY(), legDegrees(1), legDegrees(2));
    }

    /** The smallest 1, 2 or 5 × 10ⁿ not below {@code size}. */
    static double step(double size) {
        if (!(size > 0) || !Double.isFinite(size)) return 1;
        double p = Math.pow(10, Math.floor(Math.log10(size)));
        double m = size / p;
        return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
    }

    /** {@code v} to the nearest multiple of {@code step}, without binary noise in its decimals. */
    private static double round(double v, double step) {
        int places = Math.max(0, (int) -Math.floor(Math.log10(step)) + 1);
        return BigDecimal.valueOf(Math.round(v / step) * step).setScale(places, RoundingMode.HALF_EVEN).doubleValue();
    }
}
