package org.arcwright.app.simulate;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Component;
import java.awt.Cursor;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Graphics;
import java.awt.Point;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BiConsumer;
import java.util.function.Consumer;
import javax.swing.Icon;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.SwingConstants;
import javax.swing.ToolTipManager;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.widgets.ScrollablePanel;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.io.DecimalText;
import org.arcwright.services.CaseSimulations;
import org.arcwright.simulate.CalloutResult;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.Share;

/**
 * One row per candidate callout: its text (the chosen one marked), a stacked bar of accepted and
 * good, escapes, false rejects and rejected and bad, and the three shares with their 95 % intervals.
 * A click on a segment picks that kind of part; each segment's tooltip gives its count and interval.
 */
final class OutcomeBars {
    private final ScrollablePanel panel = new ScrollablePanel(new MigLayout("insets 4 8 8 8, wrap 1, gap 2", "[grow,fill]"));
    private final List<Bar> bars = new ArrayList<>();
    private BiConsumer<Integer, Outcome> onPick = (i, o) -> { };

    OutcomeBars() {
        panel.setName("simulate.bars");
    }

    /** The rows, for a scroll pane (they track its width and wrap). */
    JComponent component() { return panel; }

    void onPick(BiConsumer<Integer, Outcome> listener) { this.onPick = listener; }

    /** Shows {@code text} instead of bars. */
    void clear(String text) {
        panel.removeAll();
        bars.clear();
        WrapLabel idle = new WrapLabel(text, "Label.font", "Arcwright.help.foreground");
        idle.setName("simulate.barsIdle");
        panel.add(idle, "wmin 10");
        panel.revalidate();
        panel.repaint();
    }

    /** One row per candidate, in order; {@code nominal} is the case's, to say when a process was aimed elsewhere. */
    void show(List<CaseSimulations.Judged> rows, double nominal, String unit) {
        panel.removeAll();
        bars.clear();
        panel.add(legend(), "wmin 10");
        WrapLabel how = new WrapLabel("Shares of all parts [95 % interval]. Click a segment for example parts.", "Label.font",
                "Arcwright.help.foreground");
        how.setToolTipText("Each share is of all simulated parts, with its 95 % Wilson score interval (Wilson 1927). "
                + "Hover over a segment for its count.");
        panel.add(how, "wmin 10, gapbottom 6");
        for (int i = 0; i < rows.size(); i++) {
            CaseSimulations.Judged j = rows.get(i);
            CaseSimulations.Candidate c = j.candidate();
            String rule = c.recommendation().ruleId();
            JLabel title = new JLabel((c.chosen() ? "Chosen: " : "") + c.recommendation().text()
                    + (rule == null || rule.isBlank() ? "" : "   (" + rule + ")"));
            title.setName("simulate.title." + i);
            if (c.chosen()) title.setFont(title.getFont().deriveFont(Font.BOLD));
            panel.add(title, "wmin 10, gaptop " + (i == 0 ? 0 : 10));
            if (j.callout() == null) {
                bars.add(null);
                panel.add(new WrapLabel("Not simulated: " + j.notSimulated(), "Label.font", "Arcwright.help.foreground"), "wmin 10");
                continue;
            }
            int row = i;
            Bar bar = new Bar(j.callout(), o -> pick(row, o));
            bar.setName("simulate.bar." + i);
            bars.add(bar);
            panel.add(bar, "h 22!, wmin 40");
            CalloutResult r = j.callout();
            List<String> said = new ArrayList<>();
            if (!r.text().replace(" ", "").equals(c.recommendation().text().replace(" ", ""))) said.add("judged as " + r.text());
            double aim = j.result().simulation().model().nominalRadius();
            if (aim != nominal) said.add("process aimed at R" + Numbers.trim(aim) + " " + unit
                    + ", the middle of its limits");
            said.add("accepted " + pct(r.acceptedShare()));
            said.add("escapes " + pct(r.escapeShare()));
            said.add("false rejects " + pct(r.falseRejectShare()));
            if (r.indeterminate() > 0) said.add("no verdict " + pct(r.indeterminateShare()));
            said.add(DecimalText.percent(j.good().share(), 1) + " % of the parts good");
            WrapLabel figures = new WrapLabel(String.join(" · ", said), "Label.font", "Arcwright.help.foreground");
            figures.setName("simulate.figures." + i);
            panel.add(figures, "wmin 10");
        }
        panel.revalidate();
        panel.repaint();
    }

    /** The four kinds of part, in the bars' colours and order. */
    private static JComponent legend() {
        JPanel p = new JPanel(new MigLayout("insets 0, gap 12 2, wrap 2", ""));
        p.setOpaque(false);
        for (Outcome o : Outcome.values()) {
            JLabel l = new JLabel(o.label(), new Swatch(o), SwingConstants.LEFT);
            l.setToolTipText(meaning(o));
            p.add(l);
        }
        return p;
    }

    /** A small square of a bar's colour. */
    private record Swatch(Outcome outcome) implements Icon {
        @Override
        public void paintIcon(Component c, Graphics g, int x, int y) {
            g.setColor(ink(outcome));
            g.fillRect(x, y + 1, 11, 11);
        }

        @Override
        public int getIconWidth() { return 12; }

        @Override
        public int getIconHeight() { return 13; }
    }

    /** The bar of row {@code row}, or null when that candidate was not simulated. */
    JComponent bar(int row) { return row < bars.size() ? bars.get(row) : null; }

    /** Where the middle of a segment is drawn in its bar, or null when the segment is empty. */
    Point centreOf(int row, Outcome outcome) {
        Bar b = bars.get(row);
        return b == null ? null : b.centreOf(outcome);
    }

    /** Marks the segment and tells the listener, as a click does. */
    void pick(int row, Outcome outcome) {
        for (int i = 0; i < bars.size(); i++) if (bars.get(i) != null) bars.get(i).mark(i == row ? outcome : null);
        onPick.accept(row, outcome);
    }

    static long count(CalloutResult c, Outcome o) {
        return switch (o) {
            case ACCEPTED_GOOD -> c.accepted() - c.escapes();
            case ESCAPE -> c.escapes();
            case FALSE_REJECT -> c.falseRejects();
            case REJECTED_BAD -> c.parts() - c.accepted() - c.falseRejects();
        };
    }

    static Color ink(Outcome o) {
        return Themes.color(switch (o) {
            case ACCEPTED_GOOD -> "Arcwright.simulate.acceptedGood";
            case ESCAPE -> "Arcwright.simulate.escape";
            case FALSE_REJECT -> "Arcwright.simulate.falseReject";
            case REJECTED_BAD -> "Arcwright.simulate.rejectedBad";
        });
    }

    /** What a segment means, for its tooltip and the examples' heading. */
    static String meaning(Outcome o) {
        return switch (o) {
            case ACCEPTED_GOOD -> "accepted by the inspection and meeting the needs";
            case ESCAPE -> "accepted by the inspection but not meeting the needs: what slips through";
            case FALSE_REJECT -> "rejected by the inspection (or no verdict) though they meet the needs";
            case REJECTED_BAD -> "rejected by the inspection and not meeting the needs";
        };
    }

    static String pct(Share s) {
        return DecimalText.percent(s.share(), 1) + " % [" + DecimalText.percent(s.low(), 1) + "-" + DecimalText.percent(s.high(), 1) + "]";
    }

    /** One callout's stacked bar. */
    static final class Bar extends JComponent {
        private static final long serialVersionUID = 1L;
        private final transient CalloutResult result;
        private Outcome marked;

        Bar(CalloutResult result, Consumer<Outcome> picked) {
            this.result = result;
            ToolTipManager.sharedInstance().registerComponent(this);
            addMouseListener(new MouseAdapter() {
                @Override
                public void mouseClicked(MouseEvent e) {
                    Outcome o = at(e.getX());
                    if (o != null) picked.accept(o);
                }
            });
            setCursor(Cursor.getPredefinedCursor(Cursor.HAND_CURSOR));
        }

        void mark(Outcome o) {
            marked = o;
            repaint();
        }

        Outcome at(int x) {
            double left = 0;
            for (Outcome o : Outcome.values()) {
                double w = getWidth() * (double) count(result, o) / result.parts();
                if (w > 0 && x >= left && x < left + w) return o;
                left += w;
            }
            return null;
        }

        Point centreOf(Outcome outcome) {
            double left = 0;
            for (Outcome o : Outcome.values()) {
                double w = getWidth() * (double) count(result, o) / result.parts();
                if (o == outcome) return w <= 0 ? null : new Point((int) (left + w / 2), getHeight() / 2);
                left += w;
            }
            return null;
        }

        @Override
        public String getToolTipText(MouseEvent e) {
            Outcome o = at(e.getX());
            if (o == null) return null;
            long n = count(result, o);
            Share s = Share.of(n, result.parts());
            return String.format(Locale.ROOT, "<html><b>%s</b>: %,d of %,d parts, %s %% (95 %% Wilson interval %s-%s %%)<br>%s."
                    + "<br>Click to see example parts.</html>", capital(o.label()), n, result.parts(), DecimalText.percent(s.share(), 2),
                    DecimalText.percent(s.low(), 2), DecimalText.percent(s.high(), 2), capital(meaning(o)));
        }

        private static String capital(String s) { return Character.toUpperCase(s.charAt(0)) + s.substring(1); }

        @Override
        public Dimension getPreferredSize() { return new Dimension(200, 22); }

        @Override
        protected void paintComponent(Graphics g0) {
            Graphics2D g = (Graphics2D) g0.create();
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            double left = 0;
            int h = getHeight();
            for (Outcome o : Outcome.values()) {
                double w = getWidth() * (double) count(result, o) / result.parts();
                int x0 = (int) Math.round(left), x1 = (int) Math.round(left + w);
                g.setColor(ink(o));
                g.fillRect(x0, 0, x1 - x0, h);
                if (o == marked && x1 > x0) {
                    g.setColor(Themes.color("Label.foreground"));
                    g.setStroke(new BasicStroke(2f));
                    g.drawRect(x0 + 1, 1, Math.max(2, x1 - x0 - 2), h - 2);
                }
                left += w;
            }
            g.dispose();
        }
    }
}
