package org.arcwright.app.stress;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Font;
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
import org.arcwright.app.widgets.Cautions;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.WrapLabel;
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
        title.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
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
        StressPlot.Inks ink = inks();
        CompletableFuture.supplyAsync(() -> compute(m, a, ink), background)
                .whenComplete((r, e) -> SwingUtilities.invokeLater(() -> computed(g, f.id(), r, e)));
    }

    private record Computed(FilletStressReport report, MinimumRadius minimum, JFreeChart chart) {}

    private static Computed compute(FilletMechanics m, StressCases.Assessment a, StressPlot.Inks ink) {
        FilletStressReport report = m.stressAnalysis().report(a.stressCase());
        MinimumRadius minimum = a.target() == null ? null : m.stressAnalysis().minimumRadius(a.stressCase(), a.target());
        JFreeChart chart = new StressPlot(m.stressAnalysis()).chart(a.stressCase(), a.target(), minimum, ink);
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
        // the chart is drawn by the render core in the look's inks: draw it again when the look changes,
        // but not for a disposed window (the look reaches every window; its executor may be shut down)
        if (session != null && isDisplayable()) refresh();
    }

    /**
     * The look's colours and label fonts for the chart, from the theme properties; read on the event
     * thread, before the chart is made in the background.
     */
    private static StressPlot.Inks inks() {
        Font label = Themes.font("Arcwright.stress.label.font");
        return new StressPlot.Inks(Themes.color("Panel.background"), Themes.color("Arcwright.zone.background"),
                Themes.color("Label.foreground"), Themes.color("Arcwright.help.foreground"),
                Themes.color("Arcwright.stress.axis"), Themes.color("Arcwright.zone.grid"), Themes.color("Arcwright.stress.outline"),
                Themes.color("Arcwright.stress.kt"), Themes.color("Arcwright.stress.kf"), Themes.color("Arcwright.stress.band"),
                Themes.color("Arcwright.stress.bandText"), Themes.color("Arcwright.stress.target"),
                Themes.color("Arcwright.stress.marks"), Themes.color("Arcwright.stress.labelBackground"), label,
                Themes.font("Arcwright.stress.marker.font"));
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
        chart.setChart(c);
        chart.setVisible(c != null);
        revalidate();
        repaint();
    }
}
