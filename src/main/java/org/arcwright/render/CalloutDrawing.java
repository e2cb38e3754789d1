package org.arcwright.render;

import java.awt.Shape;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Objects;

/**
 * A callout laid out on paper, in millimetres, y downwards: the frame cells, the vector marks
 * (lines, symbols, arrowheads) and the text labels. Painters draw this and nothing else, so SVG,
 * PNG and PDF show the same geometry.
 *
 * @param width overall width including the margin
 * @param height overall height including the margin
 * @param lineWidth stroke width of every line
 * @param cells the frame's cells (and the dimension text's box), for painting and for checks
 * @param marks everything to draw
 */
public record CalloutDrawing(double width, double height, double lineWidth, List<Cell> cells, List<Mark> marks) {

    public CalloutDrawing {
        cells = List.copyOf(cells);
        marks = List.copyOf(marks);
    }

    /** What a cell holds. */
    public enum Role {
        /** The geometric characteristic symbol. */
        SYMBOL,
        /** The tolerance value and its modifiers. */
        TOLERANCE,
        /** A datum reference. */
        DATUM,
        /** The text of an R or CR dimension or of a title-block note (no outline). */
        TEXT
    }

    /**
     * A rectangular cell.
     *
     * @param bounds where it is, mm
     * @param role what it holds
     * @param text its content as plain text
     * @param tier the frame row, 0 for the upper tier
     */
    public record Cell(Rectangle2D bounds, Role role, String text, int tier) {
        public Cell {
            Objects.requireNonNull(bounds, "bounds");
            Objects.requireNonNull(role, "role");
        }
    }

    /** Something to draw. */
    public sealed interface Mark permits Line, Solid, Label {}

    /** A stroked outline (cell borders, leaders, symbol strokes). */
    public record Line(Shape shape) implements Mark {}

    /** A filled shape (arrowheads). */
    public record Solid(Shape shape) implements Mark {}

    /**
     * Text in the bundled font.
     *
     * @param text the characters
     * @param x left end of the baseline, mm
     * @param baseline baseline, mm
     * @param size font size, mm
     */
    public record Label(String text, double x, double baseline, double size) implements Mark {}
}
