package org.arcwright.render;

import java.util.Objects;
import org.arcwright.io.DecimalText;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGUnits;
import org.jfree.svg.ViewBox;

/**
 * A {@link CalloutDrawing} as a standalone SVG document (JFreeSVG), sized in millimetres with a
 * view box in millimetres, coordinates rounded to 0.001 mm so that output is stable for review.
 */
public final class SvgPainter {
    private final Java2DPainter painter;

    public SvgPainter(DrawingFont font) {
        this.painter = new Java2DPainter(Objects.requireNonNull(font, "font"));
    }

    /** The SVG element alone (for inlining in HTML). */
    public String element(CalloutDrawing d) {
        SVGGraphics2D g = new SVGGraphics2D(d.width(), d.height(), SVGUnits.MM);
        g.setDefsKeyPrefix("aw");
        g.setGeomDoubleConverter(SvgPainter::number);
        g.setTransformDoubleConverter(SvgPainter::number);
        painter.paint(g, d, 1.0);
        return g.getSVGElement(null, true, new ViewBox(0, 0, d.width(), d.height()), null, null);
    }

    /** A complete SVG file's text. */
    public String document(CalloutDrawing d) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + element(d) + "\n";
    }

    private static String number(double v) {
        return Double.isFinite(v) ? DecimalText.places(v, 3) : "0";
    }
}
