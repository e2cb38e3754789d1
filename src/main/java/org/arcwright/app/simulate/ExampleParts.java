package org.arcwright.app.simulate;

import java.awt.Component;
import java.awt.Dimension;
import java.awt.Graphics2D;
import java.awt.Graphics;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import javax.swing.ButtonGroup;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JToggleButton;
import javax.swing.SwingWorker;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.render.ContourPlot;
import org.arcwright.services.CaseSimulations;
import org.arcwright.simulate.Example;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.SimulationResult;

/**
 * A few example parts of one kind under one callout: a button per part (its true geometry in the
 * tooltip) and the picked part's measured section drawn magnified in the callout's zone by the same
 * plot the Check view and {@code inspect --plot} draw, from the inspection's own judgement of it.
 */
final class ExampleParts extends JPanel {
    private static final long serialVersionUID = 1L;
    static final String IDLE = "Click a segment of a bar to see example parts of that kind, drawn magnified in the zone.";
    private final WrapLabel heading = new WrapLabel(IDLE, "Label.font", "Arcwright.help.foreground");
    private final JPanel buttons = new JPanel(new MigLayout("insets 0, gap 4", ""));
    private final WrapLabel part = new WrapLabel("", "Label.font", null);
    private final Plot plot = new Plot();
    private transient List<Example> examples = List.of();
    private transient SimulationResult result;
    private long generation;

    ExampleParts() {
        super(new MigLayout("insets 4 8 4 8, wrap 1, gap 4", "[grow,fill]", "[][][][grow,fill]"));
        setName("simulate.examples");
        heading.setName("simulate.examplesHeading");
        part.setName("simulate.examplePart");
        buttons.setOpaque(false);
        add(heading, "wmin 10");
        add(buttons, "wmin 10, hidemode 3");
        add(part, "wmin 10, hidemode 3");
        add(plot, "wmin 10, hmin 60");
        buttons.setVisible(false);
        part.setVisible(false);
    }

    String heading() { return heading.getText(); }

    /** How many example parts there are to look at. */
    int shown() { return examples.size(); }

    /** Whether the picked example's plot is drawn (its inspection done). */
    boolean plotted() { return plot.drawn != null; }

    void clear(String text) {
        generation++;
        examples = List.of();
        result = null;
        heading.setText(text);
        buttons.removeAll();
        buttons.setVisible(false);
        part.setVisible(false);
        plot.show(null);
        revalidate();
        repaint();
    }

    /** The examples of {@code outcome} in one candidate's run. */
    void show(CaseSimulations.Judged row, Outcome outcome) {
        generation++;
        result = row.result();
        examples = row.callout().examples(outcome);
        String callout = row.callout().text();
        buttons.removeAll();
        if (examples.isEmpty()) {
            heading.setText("No part in the first parts of the run was " + outcome.label() + " under " + callout + ".");
            buttons.setVisible(false);
            part.setVisible(false);
            plot.show(null);
        } else {
            heading.setText(capital(outcome.label()) + " under " + callout + ": the first " + (examples.size() == 1 ? "such part"
                    : examples.size() + " such parts") + " of the run.");
            heading.setToolTipText(capital(outcome.label()) + ": " + OutcomeBars.meaning(outcome) + ".");
            ButtonGroup group = new ButtonGroup();
            for (int i = 0; i < examples.size(); i++) {
                Example e = examples.get(i);
                JToggleButton b = new JToggleButton("Part " + (e.part().index() + 1));
                b.setName("simulate.example." + i);
                b.setToolTipText(e.part().describe(unit()));
                int k = i;
                b.addActionListener(a -> pick(k));
                group.add(b);
                buttons.add(b);
            }
            buttons.setVisible(true);
            part.setVisible(true);
            ((JToggleButton) buttons.getComponent(0)).setSelected(true);
            pick(0);
        }
        revalidate();
        repaint();
    }

    private String unit() { return result.simulation().model().units().symbol(); }

    private static String capital(String s) { return Character.toUpperCase(s.charAt(0)) + s.substring(1); }

    /** Judges example {@code k} again off the event thread and draws it. */
    private void pick(int k) {
        long g = ++generation;
        Example e = examples.get(k);
        SimulationResult r = result;
        part.setText(capital(e.part().describe(unit())) + " (true); measured section as judged:");
        plot.show(null);
        new SwingWorker<InspectionResult, Void>() {
            @Override
            protected InspectionResult doInBackground() { return CaseSimulations.inspect(r, e); }

            @Override
            protected void done() { inspected(g, this); }
        }.execute();
    }

    private void inspected(long g, SwingWorker<InspectionResult, Void> w) {
        if (g != generation) return;
        try {
            plot.show(w.get());
        } catch (InterruptedException ex) {
            Thread.currentThread().interrupt();
        } catch (ExecutionException ex) {
            part.setText(part.getText() + " It cannot be drawn: " + ex.getCause().getMessage());
        }
    }

    /** The render core's section plot, scaled to the panel. */
    private static final class Plot extends JComponent {
        private static final long serialVersionUID = 1L;
        private transient InspectionResult drawn;

        Plot() { setName("simulate.examplePlot"); }

        void show(InspectionResult r) {
            drawn = r;
            repaint();
        }

        @Override
        public Dimension getPreferredSize() { return new Dimension(ContourPlot.WIDTH / 3, ContourPlot.HEIGHT / 3); }

        @Override
        protected void paintComponent(Graphics g0) {
            if (drawn == null) return;
            Graphics2D g = (Graphics2D) g0.create();
            try {
                double s = Math.min(getWidth() / (double) ContourPlot.WIDTH, getHeight() / (double) ContourPlot.HEIGHT);
                g.translate((getWidth() - ContourPlot.WIDTH * s) / 2, 0);
                g.scale(s, s);
                g.clipRect(0, 0, ContourPlot.WIDTH, ContourPlot.HEIGHT);
                new ContourPlot(Themes.drawingPalette("Arcwright.zone.background")).draw(drawn, g);
            } finally {
                g.dispose();
            }
        }
    }

    /** The example parts' buttons, for tests. */
    List<JToggleButton> exampleButtons() {
        List<JToggleButton> out = new ArrayList<>();
        for (Component c : buttons.getComponents()) out.add((JToggleButton) c);
        return out;
    }
}
