package org.arcwright.app.simulate;

import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.Locale;
import java.util.function.BiConsumer;
import javax.swing.JComponent;
import javax.swing.UIManager;
import org.arcwright.simulate.CalloutResult;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.SimulationResult;

/** One stacked bar per candidate callout: accepted and good, escapes, false rejects, rejected and bad. */
final class OutcomeBars extends JComponent implements javax.swing.Scrollable {
    private static final long serialVersionUID = 1L;
    static final int ROW = 66, LABEL = 12, PAD = 10;
    private transient SimulationResult result;
    private transient BiConsumer<Integer, Outcome> onPick = (i, o) -> { };
    private int pickedRow = -1;
    private Outcome pickedOutcome;

    OutcomeBars() {
        setName("simulate.bars");
        addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) { clicked(e.getX(), e.getY()); }
        });
    }

    void onPick(BiConsumer<Integer, Outcome> listener) { this.onPick = listener; }

    void show(SimulationResult r) {
        result = r;
        pickedRow = -1;
        pickedOutcome = null;
        revalidate();
        repaint();
    }

    /** Selects the bar segment of {@code outcome} in row {@code row}, as a click would. */
    void pick(int row, Outcome outcome) {
        pickedRow = row;
        pickedOutcome = outcome;
        repaint();
        onPick.accept(row, outcome);
    }

    /** The bar's segment at a point, or null. */
    Outcome outcomeAt(int row, int x) {
        if (result == null || row < 0 || row >= result.callouts().size()) return null;
        CalloutResult c = result.callouts().get(row);
        double left = LABEL, width = barWidth();
        for (Outcome o : Outcome.values()) {
            double w = width * count(c, o) / c.parts();
            if (x >= left && x < left + w) return o;
            left += w;
        }
        return null;
    }

    /** Where the middle of a segment is drawn (for tests driving the view as a user would). */
    java.awt.Point centreOf(int row, Outcome outcome) {
        CalloutResult c = result.callouts().get(row);
        double left = LABEL, width = barWidth();
        for (Outcome o : Outcome.values()) {
            double w = width * count(c, o) / c.parts();
            if (o == outcome) return new java.awt.Point((int) (left + w / 2), PAD + row * ROW + 31);
            left += w;
        }
        return null;
    }

    private void clicked(int x, int y) {
        if (result == null) return;
        int row = (y - PAD) / ROW;
        if (y - PAD - row * ROW < 18 || y - PAD - row * ROW > 44) return;
        Outcome o = outcomeAt(row, x);
        if (o != null) pick(row, o);
    }

    private double barWidth() { return Math.max(40, getWidth() - 2 * LABEL); }

    static long count(CalloutResult c, Outcome o) {
        return switch (o) {
            case ACCEPTED_GOOD -> c.accepted() - c.escapes();
            case ESCAPE -> c.escapes();
            case FALSE_REJECT -> c.falseRejects();
            case REJECTED_BAD -> c.parts() - c.accepted() - c.falseRejects();
        };
    }

    static Color ink(Outcome o) {
        String key = switch (o) {
            case ACCEPTED_GOOD -> "Arcwright.simulate.acceptedGood";
            case ESCAPE -> "Arcwright.simulate.escape";
            case FALSE_REJECT -> "Arcwright.simulate.falseReject";
            case REJECTED_BAD -> "Arcwright.simulate.rejectedBad";
        };
        Color c = UIManager.getColor(key);
        return c != null ? c : Color.GRAY;
    }

    @Override
    public Dimension getPreferredScrollableViewportSize() { return getPreferredSize(); }

    @Override
    public int getScrollableUnitIncrement(java.awt.Rectangle visible, int orientation, int direction) { return ROW / 2; }

    @Override
    public int getScrollableBlockIncrement(java.awt.Rectangle visible, int orientation, int direction) { return ROW * 2; }

    @Override
    public boolean getScrollableTracksViewportWidth() { return true; }

    @Override
    public boolean getScrollableTracksViewportHeight() { return false; }

    @Override
    public Dimension getPreferredSize() {
        int rows = result == null ? 1 : result.callouts().size();
        return new Dimension(300, 2 * PAD + rows * ROW);
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        Font base = UIManager.getFont("Label.font");
        g.setFont(base);
        Color fg = UIManager.getColor("Label.foreground");
        if (result == null) {
            g.setColor(UIManager.getColor("Arcwright.help.foreground"));
            g.drawString("Open a process file and run it: each candidate callout gets a bar here.", PAD, PAD + 16);
            g.dispose();
            return;
        }
        double width = barWidth();
        for (int row = 0; row < result.callouts().size(); row++) {
            CalloutResult c = result.callouts().get(row);
            int y = PAD + row * ROW;
            g.setColor(fg);
            g.drawString(c.text(), LABEL, y + 14);
            double left = LABEL;
            for (Outcome o : Outcome.values()) {
                double w = width * count(c, o) / c.parts();
                g.setColor(ink(o));
                g.fillRect((int) Math.round(left), y + 20, (int) Math.ceil(w), 22);
                if (row == pickedRow && o == pickedOutcome) {
                    g.setColor(fg);
                    g.setStroke(new java.awt.BasicStroke(2f));
                    g.drawRect((int) Math.round(left) + 1, y + 21, Math.max(2, (int) Math.ceil(w) - 2), 20);
                }
                left += w;
            }
            g.setColor(UIManager.getColor("Arcwright.help.foreground"));
            g.setFont(base.deriveFont(base.getSize2D() - 1f));
            g.drawString(String.format(Locale.ROOT, "accepted %s   escapes %s   false rejects %s%s", pct(c.acceptedShare()),
                    pct(c.escapeShare()), pct(c.falseRejectShare()),
                    c.indeterminate() > 0 ? "   no verdict " + pct(c.indeterminateShare()) : ""), LABEL, y + 57);
            g.setFont(base);
        }
        g.dispose();
    }

    private static String pct(org.arcwright.simulate.Share s) {
        return String.format(Locale.ROOT, "%.1f %% (%.1f-%.1f)", 100 * s.share(), 100 * s.low(), 100 * s.high());
    }
}
