package org.arcwright.app.stress;

import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.SwingUtilities;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.model.StressCases;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.shell.Cautions;
import org.arcwright.app.shell.Themes;
import org.arcwright.app.shell.WrapLabel;
import org.arcwright.mechanics.FilletMechanics;
import org.arcwright.mechanics.FilletStressReport;
import org.arcwright.mechanics.MinimumRadius;
import org.arcwright.mechanics.StressPoint;
import org.arcwright.render.plot.StressPlot;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;

/**
 * The Stress view of the selected feature: K<sub>t</sub> (and K<sub>f</sub>) across the radius
 * tolerance from the mechanics core, the chart with the band and the smallest radius for the target.
 */
public final class StressViewPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient WorksheetSession session;
    private final transient Executor background;
    private transient FilletMechanics mechanics;
    private final JLabel title = new JLabel();
    private final WrapLabel summary = new WrapLabel("", "Arcwright.figure.font", null);
    private final WrapLabel notes = new WrapLabel("", "Label.font", "Arcwright.help.foreground");
    private final ChartPanel chart = new ChartPanel(null);
    private long generation;

    public StressViewPanel(WorksheetSession session, Executor background) {
        super(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[][][][][grow,fill]"));
        this.session = Objects.requireNonNull(session, "session");
        this.background = Objects.requireNonNull(background, "background");
        setName("stressView");
        title.putClientProperty("FlatLaf.styleClass", "h4");
        summary.setName("stressSummary");
        chart.setName("stressChart");
        add(Cautions.box(Cautions.ADVICE + " Stress concentration factors here come from published curve fits and "
                + "are estimates, not a substitute for analysis or test."));
        add(title, "wmin 10");
        add(summary, "wmin 10");
        add(notes, "wmin 10");
        add(chart, "wmin 10, hmin 10");
        session.listeners().add(this::refresh);
        refresh();
    }

    /** Called once the practice packs (and with them the fit catalogue) have loaded. */
    public void setMechanics(FilletMechanics m) {
        this.mechanics = m;
        refresh();
    }

    public String summaryText() { return summary.getText(); }

    private void refresh() {
        long g = ++generation;
        if (session.selected().isEmpty()) {
            show(g, "No feature selected", "", "", null);
            return;
        }
        var f = session.selected().get();
        if (mechanics == null) {
            show(g, f.id(), "Loading the stress-concentration fits…", "", null);
            return;
        }
        StressCases.Assessment a = StressCases.of(f);
        if (!a.ready()) {
            show(g, f.id(), a.why(), "", null);
            return;
        }
        FilletMechanics m = mechanics;
        CompletableFuture.supplyAsync(() -> compute(m, a), background)
                .whenComplete((r, e) -> SwingUtilities.invokeLater(() -> computed(g, f.id(), r, e)));
    }

    private record Computed(FilletStressReport report, MinimumRadius minimum, JFreeChart chart) {}

    private static Computed compute(FilletMechanics m, StressCases.Assessment a) {
        FilletStressReport report = m.stressAnalysis().report(a.stressCase());
        MinimumRadius minimum = a.target() == null ? null : m.stressAnalysis().minimumRadius(a.stressCase(), a.target());
        JFreeChart chart = new StressPlot(m.stressAnalysis()).chart(a.stressCase(), a.target(), minimum);
        return new Computed(report, minimum, chart);
    }

    private void computed(long g, String id, Computed c, Throwable e) {
        if (e != null) {
            Throwable cause = e.getCause() != null ? e.getCause() : e;
            show(g, id, "The stress estimate failed: " + cause.getMessage(), "", null);
            return;
        }
        FilletStressReport r = c.report();
        StringBuilder sb = new StringBuilder();
        line(sb, "at r min", r.atMin());
        line(sb, "at nominal", r.atNominal());
        line(sb, "at r max", r.atMax());
        if (r.input().hasTolerance()) {
            sb.append("The smallest radius costs ").append(Numbers.fixed(r.costPercent(), 1))
                    .append(" % over the nominal's factor.\n");
        }
        if (c.minimum() != null) sb.append(c.minimum().message());
        String u = r.input().units().symbol();
        String head = id + " · " + r.input().shape().description() + ", " + r.input().load().key() + ", D "
                + Numbers.trim(r.input().bigD()) + " / d " + Numbers.trim(r.input().smallD()) + " " + u + ", r "
                + Numbers.trim(r.input().rMin()) + " to " + Numbers.trim(r.input().rMax()) + " " + u;
        show(g, head, sb.toString().strip(), String.join("\n", r.notes()), c.chart());
    }

    @Override
    public void updateUI() {
        super.updateUI();
        // the chart is not a Swing component: give it the new look's colours when the look changes
        if (chart != null) restyle(chart.getChart());
    }

    /** Gives the chart the look's background, grid and text colours (it is drawn light by the render core). */
    private static void restyle(JFreeChart c) {
        if (c == null) return;
        java.awt.Color fg = Themes.color("Label.foreground");
        c.setBackgroundPaint(Themes.color("Panel.background"));
        if (c.getTitle() != null) c.getTitle().setPaint(fg);
        for (int i = 0; i < c.getSubtitleCount(); i++) {
            if (c.getSubtitle(i) instanceof org.jfree.chart.title.TextTitle) {
                ((org.jfree.chart.title.TextTitle) c.getSubtitle(i)).setPaint(fg);
            }
        }
        if (c.getLegend() != null) {
            c.getLegend().setBackgroundPaint(Themes.color("Panel.background"));
            c.getLegend().setItemPaint(fg);
        }
        if (c.getPlot() instanceof org.jfree.chart.plot.XYPlot) {
            org.jfree.chart.plot.XYPlot plot = (org.jfree.chart.plot.XYPlot) c.getPlot();
            plot.setBackgroundPaint(Themes.color("Arcwright.zone.background"));
            plot.setDomainGridlinePaint(Themes.color("Arcwright.zone.grid"));
            plot.setRangeGridlinePaint(Themes.color("Arcwright.zone.grid"));
            for (int i = 0; i < plot.getDomainAxisCount(); i++) axis(plot.getDomainAxis(i), fg);
            for (int i = 0; i < plot.getRangeAxisCount(); i++) axis(plot.getRangeAxis(i), fg);
        }
    }

    private static void axis(org.jfree.chart.axis.Axis a, java.awt.Color fg) {
        if (a == null) return;
        a.setLabelPaint(fg);
        a.setTickLabelPaint(fg);
        a.setAxisLinePaint(fg);
        a.setTickMarkPaint(fg);
    }

    private static void line(StringBuilder sb, String where, StressPoint p) {
        sb.append("Kt ").append(Numbers.fixed(p.kt().kt(), 3));
        if (p.kf() != null) sb.append(", Kf ").append(Numbers.fixed(p.kf(), 3));
        sb.append(" ").append(where).append(" (r = ").append(Numbers.trim(Math.round(p.r() * 1e4) / 1e4)).append(")")
                .append(p.withinFit() ? "" : " — outside the fit, extrapolated").append('\n');
    }

    private void show(long g, String head, String text, String remarks, JFreeChart c) {
        if (g != generation) return;
        title.setText(head);
        summary.setText(text);
        notes.setText(remarks);
        notes.setVisible(!remarks.isEmpty());
        restyle(c);
        chart.setChart(c);
        chart.setVisible(c != null);
        revalidate();
        repaint();
    }
}
