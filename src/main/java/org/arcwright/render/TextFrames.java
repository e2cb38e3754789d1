package org.arcwright.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.templates.CalloutText;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * A callout as text. Plain: a feature control frame drawn in ASCII boxes, readable in a terminal,
 * a log or a plain e-mail; R and CR as their dimension text. Unicode: one line per tier with the
 * GD&amp;T code points, for pasting into CAD notes ({@link CalloutText#line}).
 */
public final class TextFrames {
    private final DrawingStyle style;
    private final Units units;
    private final CalloutText text;

    public TextFrames(DrawingStyle style, Units units) {
        this.style = Objects.requireNonNull(style, "style");
        this.units = Objects.requireNonNull(units, "units");
        this.text = new CalloutText(style, units);
    }

    /** The Unicode form, one line per tier, ending in a newline. */
    public String unicode(Callout c) {
        return text.line(c, true) + "\n";
    }

    /** The plain ASCII form, ending in a newline. */
    public String plain(Callout c) {
        if (c instanceof Callout.Radius || c instanceof Callout.ControlledRadius) return text.radius(c) + "\n";
        if (c instanceof Callout.General g) return String.join("\n", text.general(g).split("; ")) + "\n";
        List<List<String>> rows = new ArrayList<>();
        Extent extent;
        if (c instanceof Callout.Profile p) {
            rows.add(row(text.zoneCell(p, false), p.datums()));
            extent = p.extent();
        } else {
            Callout.CompositeProfile cp = (Callout.CompositeProfile) c;
            for (ProfileTier t : cp.tiers()) rows.add(row(text.value(t.zone()), t.datums()));
            extent = cp.extent();
        }
        String symbol = "PROFILE";
        int[] w = widths(rows);
        int symW = symbol.length() + 2;
        StringBuilder sb = new StringBuilder();
        boolean stacked = c instanceof Callout.CompositeProfile && style == DrawingStyle.ISO;
        for (int r = 0; r < rows.size(); r++) {
            if (stacked && r > 0) {
                int cols = Math.max(rows.get(r - 1).size(), rows.get(r).size());
                sb.append(border("+" + "-".repeat(symW) + "+", w, cols)).append('\n');
                sb.append('|').append(pad(symbol, symW)).append('|');
                for (int k = 0; k < rows.get(r).size(); k++) sb.append(pad(rows.get(r).get(k), w[k])).append('|');
                sb.append('\n');
                continue;
            }
            int cols = r == 0 ? rows.get(0).size() : Math.max(rows.get(r - 1).size(), rows.get(r).size());
            sb.append(border(r == 0 ? "+" + "-".repeat(symW) + "+" : "|" + " ".repeat(symW) + "+", w, cols)).append('\n');
            sb.append('|').append(pad(r == 0 ? symbol : "", symW)).append('|');
            for (int k = 0; k < rows.get(r).size(); k++) sb.append(pad(rows.get(r).get(k), w[k])).append('|');
            sb.append('\n');
        }
        sb.append(border("+" + "-".repeat(symW) + "+", w, rows.get(rows.size() - 1).size())).append('\n');
        String label = CalloutText.extentLabel(extent, false);
        if (!label.isEmpty()) sb.append(label).append('\n');
        return sb.toString();
    }

    private static List<String> row(String tolerance, List<DatumReference> datums) {
        List<String> cells = new ArrayList<>();
        cells.add(tolerance);
        for (DatumReference d : datums) cells.add(CalloutText.datum(d, false));
        return cells;
    }

    private static int[] widths(List<List<String>> rows) {
        int cols = 0;
        for (List<String> r : rows) cols = Math.max(cols, r.size());
        int[] w = new int[cols];
        for (List<String> r : rows) {
            for (int k = 0; k < r.size(); k++) w[k] = Math.max(w[k], r.get(k).length() + 2);
        }
        return w;
    }

    private static String border(String prefix, int[] w, int cols) {
        StringBuilder sb = new StringBuilder(prefix);
        for (int k = 0; k < cols; k++) sb.append("-".repeat(w[k])).append('+');
        return sb.toString();
    }

    private static String pad(String s, int width) {
        return " " + s + " ".repeat(Math.max(0, width - s.length() - 1));
    }

    public DrawingStyle style() { return style; }

    public Units units() { return units; }
}
