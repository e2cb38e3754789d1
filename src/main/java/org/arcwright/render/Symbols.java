package org.arcwright.render;

import java.awt.Shape;
import java.awt.geom.Arc2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;

/**
 * GD&amp;T symbols as vector geometry, sized from the lettering height {@code h}.
 *
 * <p>The proportions follow the symbol figures of ASME Y14.5-2018 (Section 3, geometric
 * characteristic and modifying symbols) and ISO 7083 (symbol proportions in relation to h); they
 * are given here <b>from memory</b>, not measured from the figures, and rounded to simple
 * multiples of h:
 * <ul>
 *   <li>frame height 2h; the symbol cell is square (ISO 7083 and ASME, from memory);</li>
 *   <li>profile of a surface: a semicircle closed by its diameter, diameter 1.5h, standing on a
 *       base 0.375h below the cell's centre (from memory);</li>
 *   <li>circled modifiers (M, L, U): circle of diameter 1.4h around a capital 0.8h tall (from
 *       memory);</li>
 *   <li>dynamic profile modifier: an open equilateral triangle 0.9h tall (ASME Y14.5-2018, from
 *       memory);</li>
 *   <li>all around: a circle of diameter 1.5h at the leader's bend; all over: two concentric
 *       circles, 1.5h and 1.0h (ASME Y14.5-2018, from memory);</li>
 *   <li>between: a straight line with a filled arrowhead at each end (ASME Y14.5-2018, from
 *       memory); arrowheads 3 by 1 (length to width), length h (ISO 129-1 and ASME drafting
 *       practice, from memory).</li>
 * </ul>
 */
public final class Symbols {
    private Symbols() {}

    /** Profile of a surface centred in a square cell whose centre is (cx, cy). */
    public static Shape profileOfSurface(double cx, double cy, double h) {
        double r = 0.75 * h;
        double base = cy + 0.375 * h;
        Path2D.Double p = new Path2D.Double();
        p.append(new Arc2D.Double(cx - r, base - r, 2 * r, 2 * r, 0, 180, Arc2D.OPEN), false);
        p.closePath();
        return p;
    }

    /** The circle of a circled modifier letter centred at (cx, cy). */
    public static Shape modifierCircle(double cx, double cy, double h) {
        double d = modifierDiameter(h);
        return new Ellipse2D.Double(cx - d / 2, cy - d / 2, d, d);
    }

    /** Diameter of a modifier's circle. */
    public static double modifierDiameter(double h) { return 1.4 * h; }

    /** Cap height of the letter inside a modifier's circle. */
    public static double modifierLetterHeight(double h) { return 0.8 * h; }

    /** Width the dynamic-profile triangle takes in a cell. */
    public static double dynamicWidth(double h) { return 0.9 * h * 2 / Math.sqrt(3); }

    /** The dynamic profile triangle, its base centred at (cx, base). */
    public static Shape dynamicTriangle(double cx, double base, double h) {
        double height = 0.9 * h;
        double half = height / Math.sqrt(3);
        Path2D.Double p = new Path2D.Double();
        p.moveTo(cx - half, base);
        p.lineTo(cx + half, base);
        p.lineTo(cx, base - height);
        p.closePath();
        return p;
    }

    /** The all-around circle at (cx, cy). */
    public static Shape allAround(double cx, double cy, double h) {
        double d = 1.5 * h;
        return new Ellipse2D.Double(cx - d / 2, cy - d / 2, d, d);
    }

    /** The inner circle of the all-over symbol at (cx, cy). */
    public static Shape allOverInner(double cx, double cy, double h) {
        double d = 1.0 * h;
        return new Ellipse2D.Double(cx - d / 2, cy - d / 2, d, d);
    }

    /** A filled arrowhead with its tip at (tipX, tipY), pointing along (dx, dy). */
    public static Shape arrowhead(double tipX, double tipY, double dx, double dy, double h) {
        double len = Math.hypot(dx, dy);
        double ux = dx / len;
        double uy = dy / len;
        double l = h;
        double w = h / 3;
        double bx = tipX - ux * l;
        double by = tipY - uy * l;
        Path2D.Double p = new Path2D.Double();
        p.moveTo(tipX, tipY);
        p.lineTo(bx - uy * w / 2, by + ux * w / 2);
        p.lineTo(bx + uy * w / 2, by - ux * w / 2);
        p.closePath();
        return p;
    }
}
