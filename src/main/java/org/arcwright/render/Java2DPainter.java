package org.arcwright.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.util.Objects;

/**
 * Paints a {@link CalloutDrawing} onto any Java2D surface (an image, an SVG document). Text goes
 * down as the bundled font's outlines, so the result does not depend on the fonts of the machine.
 */
public final class Java2DPainter {
    private final DrawingFont font;

    public Java2DPainter(DrawingFont font) {
        this.font = Objects.requireNonNull(font, "font");
    }

    /**
     * Paints {@code d} with its top-left corner at the surface's origin, {@code scale} surface
     * units per millimetre. Leaves the graphics state as it found it.
     */
    public void paint(Graphics2D g, CalloutDrawing d, double scale) {
        paint(g, d, scale, Color.BLACK);
    }

    /** As {@link #paint(Graphics2D, CalloutDrawing, double)}, in {@code ink} rather than black. */
    public void paint(Graphics2D g, CalloutDrawing d, double scale, Color ink) {
        AffineTransform saved = g.getTransform();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.scale(scale, scale);
            g.setColor(ink);
            g.setStroke(new BasicStroke((float) d.lineWidth(), BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
            for (CalloutDrawing.Mark m : d.marks()) {
                if (m instanceof CalloutDrawing.Line l) {
                    g.draw(l.shape());
                } else if (m instanceof CalloutDrawing.Solid s) {
                    g.fill(s.shape());
                } else {
                    CalloutDrawing.Label t = (CalloutDrawing.Label) m;
                    g.fill(font.outline(t.text(), t.size(), t.x(), t.baseline()));
                }
            }
        } finally {
            g.setTransform(saved);
        }
    }
}
