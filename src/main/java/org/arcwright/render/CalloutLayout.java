package org.arcwright.render;

import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.io.DecimalText;
import org.arcwright.templates.CalloutText;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * Lays out a callout as it stands on a drawing: a feature control frame with its leader for the
 * profile kinds, a leader and text for R and CR, plain text for a title-block note. All sizes
 * derive from the lettering height h: frame rows 2h tall (ISO 7083 and ASME Y14.5, from memory),
 * cell text centred with 0.5h of padding, lines h/10 wide (ISO 128 line groups pair 0.35 mm lines
 * with 3.5 mm lettering, from memory). Numbers come formatted from {@link CalloutText}, which
 * uses the tolerance package's drawing-style rules.
 */
public final class CalloutLayout {
    /** The usual drawing lettering height, mm (ISO 3098 series, common practice). */
    public static final double DEFAULT_LETTER_HEIGHT = 3.5;

    private final DrawingFont font;
    private final double h;

    public CalloutLayout(DrawingFont font, double letterHeight) {
        this.font = Objects.requireNonNull(font, "font");
        if (!(letterHeight > 0)) throw new IllegalArgumentException("letter height must be > 0, got " + DecimalText.exact(letterHeight));
        this.h = letterHeight;
    }

    public CalloutLayout(DrawingFont font) { this(font, DEFAULT_LETTER_HEIGHT); }

    /** The lettering height, mm. */
    public double letterHeight() { return h; }

    /** Lays out {@code callout} in {@code style} and {@code units}. */
    public CalloutDrawing layout(Callout callout, DrawingStyle style, Units units) {
        Objects.requireNonNull(callout, "callout");
        CalloutText text = new CalloutText(style, units);
        if (callout instanceof Callout.Radius || callout instanceof Callout.ControlledRadius) {
            return dimension(text.radius(callout));
        }
        if (callout instanceof Callout.General g) return note(text.general(g));
        List<List<List<Run>>> rows = new ArrayList<>();
        Extent extent;
        if (callout instanceof Callout.Profile p) {
            rows.add(row(toleranceRuns(p, style, text), p.datums()));
            extent = p.extent();
        } else {
            Callout.CompositeProfile cp = (Callout.CompositeProfile) callout;
            for (ProfileTier t : cp.tiers()) rows.add(row(List.of(new Run.Text(text.value(t.zone()))), t.datums()));
            extent = cp.extent();
        }
        return frame(rows, extent, callout instanceof Callout.CompositeProfile && style == DrawingStyle.ISO);
    }

    // ---- runs: the pieces of a cell's content -------------------------------------------------

    private sealed interface Run permits Run.Text, Run.Circled, Run.Triangle {
        record Text(String text) implements Run {}
        record Circled(String letter) implements Run {}
        record Triangle() implements Run {}
    }

    private List<Run> toleranceRuns(Callout.Profile p, DrawingStyle style, CalloutText text) {
        CalloutText.checkMarks(p, style);
        List<Run> runs = new ArrayList<>();
        runs.add(new Run.Text(text.value(p.zone())));
        if (p.isUnequal()) {
            if (style == DrawingStyle.ISO) {
                runs.add(new Run.Text("UZ" + text.signed(p.isoOffset())));
            } else {
                runs.add(new Run.Circled("U"));
                runs.add(new Run.Text(text.value(p.outward())));
            }
        }
        if (p.dynamic()) runs.add(style == DrawingStyle.ISO ? new Run.Text(CalloutText.ISO_UNSPECIFIED_OFFSET) : new Run.Triangle());
        return runs;
    }

    private static List<List<Run>> row(List<Run> tolerance, List<DatumReference> datums) {
        List<List<Run>> cells = new ArrayList<>();
        cells.add(tolerance);
        for (DatumReference d : datums) {
            List<Run> runs = new ArrayList<>();
            runs.add(new Run.Text(d.label()));
            if (d.modifier() != null) runs.add(new Run.Circled("MMB".equals(d.modifier()) ? "M" : "L"));
            cells.add(runs);
        }
        return cells;
    }

    private double textSize() { return DrawingFont.sizeForCapHeight(h); }

    private double gap() { return 0.3 * h; }

    private double runWidth(Run r) {
        if (r instanceof Run.Text t) return font.width(t.text(), textSize());
        if (r instanceof Run.Circled) return Symbols.modifierDiameter(h);
        return Symbols.dynamicWidth(h);
    }

    private double contentWidth(List<Run> runs) {
        double w = 0;
        for (Run r : runs) w += runWidth(r);
        return w + gap() * Math.max(0, runs.size() - 1);
    }

    private static String plain(List<Run> runs) {
        List<String> parts = new ArrayList<>();
        for (Run r : runs) {
            if (r instanceof Run.Text t) parts.add(t.text());
            else if (r instanceof Run.Circled c) parts.add("(" + c.letter() + ")");
            else parts.add("(DYN)");
        }
        return String.join(" ", parts).replace(" (M)", "(M)").replace(" (L)", "(L)");
    }

    /** Draws runs centred in {@code cell}. */
    private void drawRuns(List<Run> runs, Rectangle2D cell, List<CalloutDrawing.Mark> marks) {
        double x = cell.getX() + (cell.getWidth() - contentWidth(runs)) / 2;
        double cy = cell.getCenterY();
        double baseline = cy + h / 2;
        for (Run r : runs) {
            double w = runWidth(r);
            if (r instanceof Run.Text t) {
                marks.add(new CalloutDrawing.Label(t.text(), x, baseline, textSize()));
            } else if (r instanceof Run.Circled c) {
                double cx = x + w / 2;
                marks.add(new CalloutDrawing.Line(Symbols.modifierCircle(cx, cy, h)));
                double size = DrawingFont.sizeForCapHeight(Symbols.modifierLetterHeight(h));
                double lw = font.width(c.letter(), size);
                marks.add(new CalloutDrawing.Label(c.letter(), cx - lw / 2, cy + Symbols.modifierLetterHeight(h) / 2, size));
            } else {
                marks.add(new CalloutDrawing.Line(Symbols.dynamicTriangle(x + w / 2, baseline, h)));
            }
            x += w + gap();
        }
    }

    // ---- frames --------------------------------------------------------------------------------

    /**
     * @param stacked one symbol per row: ISO 1101 writes the tiers of a combined profile as frames
     *     stacked on one leader, where ASME shares one symbol cell across the tiers (common practice)
     */
    private CalloutDrawing frame(List<List<List<Run>>> rows, Extent extent, boolean stacked) {
        double rowH = 2 * h;
        double pad = 0.5 * h;
        double margin = 0.5 * h;
        double lineWidth = h / 10;
        int columns = 0;
        for (List<List<Run>> r : rows) columns = Math.max(columns, r.size());
        double[] colW = new double[columns];
        for (List<List<Run>> r : rows) {
            for (int c = 0; c < r.size(); c++) colW[c] = Math.max(colW[c], Math.max(rowH, contentWidth(r.get(c)) + 2 * pad));
        }
        double leaderSpace = 4 * h;
        double x0 = margin + leaderSpace;
        double y0 = margin;
        double symW = rowH;
        List<CalloutDrawing.Cell> cells = new ArrayList<>();
        List<CalloutDrawing.Mark> marks = new ArrayList<>();

        int symbols = stacked ? rows.size() : 1;
        double symH = stacked ? rowH : rowH * rows.size();
        for (int t = 0; t < symbols; t++) {
            Rectangle2D sym = new Rectangle2D.Double(x0, y0 + t * symH, symW, symH);
            cells.add(new CalloutDrawing.Cell(sym, CalloutDrawing.Role.SYMBOL, "PROFILE", t));
            marks.add(new CalloutDrawing.Line(sym));
            marks.add(new CalloutDrawing.Line(Symbols.profileOfSurface(sym.getCenterX(), sym.getCenterY(), h)));
        }
        double right = x0 + symW;
        for (int t = 0; t < rows.size(); t++) {
            double x = x0 + symW;
            double y = y0 + t * rowH;
            List<List<Run>> r = rows.get(t);
            for (int c = 0; c < r.size(); c++) {
                Rectangle2D cell = new Rectangle2D.Double(x, y, colW[c], rowH);
                cells.add(new CalloutDrawing.Cell(cell, c == 0 ? CalloutDrawing.Role.TOLERANCE : CalloutDrawing.Role.DATUM,
                        plain(r.get(c)), t));
                marks.add(new CalloutDrawing.Line(cell));
                drawRuns(r.get(c), cell, marks);
                x += colW[c];
            }
            right = Math.max(right, x);
        }
        double bottom = y0 + rowH * rows.size();

        // leader from the frame's left end, with the all-around or all-over circle at its bend
        double midY = y0 + rowH / 2;
        double bendX = x0 - 2 * h;
        double tipX = margin + 0.2 * h;
        double tipY = midY + 2.5 * h;
        Path2D.Double leader = new Path2D.Double();
        leader.moveTo(x0, midY);
        leader.lineTo(bendX, midY);
        leader.lineTo(tipX, tipY);
        marks.add(new CalloutDrawing.Line(leader));
        marks.add(new CalloutDrawing.Solid(Symbols.arrowhead(tipX, tipY, tipX - bendX, tipY - midY, h)));
        if (extent.kind() == Extent.Kind.ALL_AROUND || extent.kind() == Extent.Kind.ALL_OVER) {
            marks.add(new CalloutDrawing.Line(Symbols.allAround(bendX, midY, h)));
            if (extent.kind() == Extent.Kind.ALL_OVER) marks.add(new CalloutDrawing.Line(Symbols.allOverInner(bendX, midY, h)));
        }
        double contentBottom = Math.max(bottom, tipY);

        // between and with-adjacent indications under the frame
        if (extent.kind() == Extent.Kind.BETWEEN || extent.kind() == Extent.Kind.WITH_ADJACENT) {
            double baseline = bottom + 0.8 * h + h;
            double size = textSize();
            String first = extent.kind() == Extent.Kind.BETWEEN ? extent.from() : CalloutText.extentLabel(extent, false);
            // letters such as J reach left of their origin: start the ink, not the origin, at the frame's edge
            double x = x0 + Math.max(0, x0 - font.inkBounds(first, size, x0, baseline).getMinX());
            if (extent.kind() == Extent.Kind.BETWEEN) {
                marks.add(new CalloutDrawing.Label(extent.from(), x, baseline, size));
                x += font.width(extent.from(), size) + gap();
                double len = 3 * h;
                double ay = baseline - h / 2;
                marks.add(new CalloutDrawing.Line(new Line2D.Double(x + h * 0.9, ay, x + len - h * 0.9, ay)));
                marks.add(new CalloutDrawing.Solid(Symbols.arrowhead(x, ay, -1, 0, h)));
                marks.add(new CalloutDrawing.Solid(Symbols.arrowhead(x + len, ay, 1, 0, h)));
                x += len + gap();
                marks.add(new CalloutDrawing.Label(extent.to(), x, baseline, size));
                x += font.width(extent.to(), size);
                cells.add(new CalloutDrawing.Cell(new Rectangle2D.Double(x0, baseline - 1.5 * h, x - x0, 2 * h),
                        CalloutDrawing.Role.TEXT, CalloutText.extentLabel(extent, false), 0));
            } else {
                String label = CalloutText.extentLabel(extent, false);
                marks.add(new CalloutDrawing.Label(label, x, baseline, size));
                x += font.width(label, size);
                cells.add(new CalloutDrawing.Cell(new Rectangle2D.Double(x0, baseline - 1.5 * h, x - x0, 2 * h),
                        CalloutDrawing.Role.TEXT, label, 0));
            }
            right = Math.max(right, x);
            contentBottom = Math.max(contentBottom, baseline + 0.5 * h);
        }
        return new CalloutDrawing(right + margin, contentBottom + margin, lineWidth, cells, marks);
    }

    // ---- dimensions and notes ------------------------------------------------------------------

    private CalloutDrawing dimension(String text) {
        double margin = 0.5 * h;
        double rowH = 2 * h;
        double size = textSize();
        double tipX = margin + 0.2 * h;
        double shoulderY = margin + rowH / 2;
        double tipY = shoulderY + 2.5 * h;
        double shoulderStart = tipX + 2.5 * h;
        double textX = shoulderStart + 1.3 * h;
        double w = font.width(text, size);
        List<CalloutDrawing.Mark> marks = new ArrayList<>();
        Path2D.Double leader = new Path2D.Double();
        leader.moveTo(tipX, tipY);
        leader.lineTo(shoulderStart, shoulderY);
        leader.lineTo(textX - 0.3 * h, shoulderY);
        marks.add(new CalloutDrawing.Line(leader));
        marks.add(new CalloutDrawing.Solid(Symbols.arrowhead(tipX, tipY, tipX - shoulderStart, tipY - shoulderY, h)));
        marks.add(new CalloutDrawing.Label(text, textX, shoulderY + h / 2, size));
        Rectangle2D box = new Rectangle2D.Double(textX, margin, w, rowH);
        return new CalloutDrawing(textX + w + margin, tipY + margin, h / 10,
                List.of(new CalloutDrawing.Cell(box, CalloutDrawing.Role.TEXT, text, 0)), marks);
    }

    private CalloutDrawing note(String text) {
        double margin = 0.5 * h;
        double size = textSize();
        List<CalloutDrawing.Mark> marks = new ArrayList<>();
        List<CalloutDrawing.Cell> cells = new ArrayList<>();
        double y = margin;
        double right = 0;
        for (String line : text.split("; ")) {
            double w = font.width(line, size);
            marks.add(new CalloutDrawing.Label(line, margin, y + 1.5 * h, size));
            cells.add(new CalloutDrawing.Cell(new Rectangle2D.Double(margin, y, w, 2 * h), CalloutDrawing.Role.TEXT, line,
                    cells.size()));
            right = Math.max(right, margin + w);
            y += 2 * h;
        }
        return new CalloutDrawing(right + margin, y + margin, h / 10, cells, marks);
    }
}
