package org.arcwright.app.simulate;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import javax.swing.JButton;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSpinner;
import javax.swing.JSplitPane;
import javax.swing.JTextField;
import javax.swing.SpinnerNumberModel;
import javax.swing.SwingWorker;
import javax.swing.UIManager;
import javax.swing.filechooser.FileNameExtensionFilter;
import net.miginfocom.swing.MigLayout;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.Share;
import org.arcwright.simulate.Simulation;
import org.arcwright.simulate.SimulationFiles;
import org.arcwright.simulate.SimulationResult;
import org.arcwright.simulate.SimulationRunner;

/**
 * The Simulation view: a process file in, per candidate callout a bar of what it accepts, lets
 * through and turns away; a click on a bar shows example parts of that kind. The run goes on a
 * background worker with a progress bar and a cancel button.
 */
public final class SimulationView extends JPanel {
    private static final long serialVersionUID = 1L;
    private final JTextField file = new JTextField(30);
    private final JSpinner parts = new JSpinner(new SpinnerNumberModel(5000, 1, 10_000_000, 1000));
    private final JButton run = new JButton("Run");
    private final JButton cancel = new JButton("Cancel");
    private final JProgressBar progress = new JProgressBar(0, 100);
    private final javax.swing.JTextArea summary = wrapping(" ");
    private final OutcomeBars bars = new OutcomeBars();
    private final ExamplesPlot examples = new ExamplesPlot();
    private final transient AtomicBoolean cancelled = new AtomicBoolean();
    private transient SwingWorker<SimulationResult, Void> worker;
    private transient SimulationResult result;

    /** A view with {@code start} (may be null) in the file field. */
    public SimulationView(Path start) {
        super(new MigLayout("insets 10, fill", "[grow,fill]", "[][][][][][][grow,fill][]"));
        setName("simulationView");
        file.setName("simulate.file");
        parts.setName("simulate.parts");
        run.setName("simulate.run");
        cancel.setName("simulate.cancel");
        progress.setName("simulate.progress");
        summary.setName("simulate.summary");
        if (start != null) file.setText(start.toString());
        JButton browse = new JButton("Open…");
        browse.setName("simulate.browse");
        cancel.setEnabled(false);
        progress.setStringPainted(true);
        progress.setString("");
        add(new JLabel("Process file"), "wrap");
        add(file, "split 2, growx, wmin 60");
        add(browse, "wrap");
        add(new JLabel("Parts"), "split 2");
        add(parts, "w 90!, wrap");
        add(run, "split 2, sg buttons");
        add(cancel, "sg buttons, wrap");
        add(progress, "growx, wmin 60, wrap");
        add(summary, "growx, wmin 0, wrap");
        JScrollPane barScroll = new JScrollPane(bars);
        barScroll.setBorder(null);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, barScroll, examples);
        split.setResizeWeight(0.4);
        split.setBorder(null);
        examples.setMinimumSize(new java.awt.Dimension(80, 80));
        barScroll.setMinimumSize(new java.awt.Dimension(80, 60));
        add(split, "grow, wmin 0, wrap");
        javax.swing.JTextArea caution = wrapping(SimulationResult.CAUTION);
        caution.setName("simulate.caution");
        caution.setForeground(UIManager.getColor("Arcwright.help.foreground"));
        add(caution, "growx, wmin 0");
        browse.addActionListener(e -> browse());
        run.addActionListener(e -> start());
        cancel.addActionListener(e -> stop());
        bars.onPick(this::picked);
    }

    private static javax.swing.JTextArea wrapping(String text) {
        javax.swing.JTextArea a = new javax.swing.JTextArea(text);
        a.setEditable(false);
        a.setFocusable(false);
        a.setLineWrap(true);
        a.setWrapStyleWord(true);
        a.setOpaque(false);
        a.setBorder(null);
        a.setFont(UIManager.getFont("Label.font"));
        return a;
    }

    /** The bars component, for tests that click it as a user would. */
    public javax.swing.JComponent bars() { return bars; }

    /** Where, in the bars component, the segment of {@code outcome} of callout {@code row} is drawn. */
    public java.awt.Point barPoint(int row, Outcome outcome) { return bars.centreOf(row, outcome); }

    /** The line above the example parts. */
    public String examplesHeading() { return examples.heading(); }

    /** How many example parts are drawn. */
    public int examplesShown() { return examples.shown(); }

    /** The summary line (or the error). */
    public String summaryText() { return summary.getText(); }

    /** The last finished result, or null. */
    public SimulationResult result() { return result; }

    private void browse() {
        JFileChooser chooser = new JFileChooser(file.getText().isBlank() ? null : Path.of(file.getText()).toAbsolutePath().getParent().toFile());
        chooser.setFileFilter(new FileNameExtensionFilter("Process files (.json)", "json"));
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) file.setText(chooser.getSelectedFile().toString());
    }

    private void start() {
        Simulation sim;
        try {
            String f = file.getText().trim();
            if (f.isEmpty()) throw InputProblem.ofField("process file", "choose a process file first");
            Path p = Path.of(f);
            if (!Files.isRegularFile(p)) throw new InputProblem(f, 0, 0, null, "file not found");
            sim = new SimulationFiles(new JsonFiles()).read(p).withParts(((Number) parts.getValue()).intValue());
        } catch (InputProblem | java.io.UncheckedIOException | java.nio.file.InvalidPathException e) {
            error(e.getMessage());
            return;
        }
        cancelled.set(false);
        run.setEnabled(false);
        cancel.setEnabled(true);
        progress.setValue(0);
        progress.setString("0 %");
        summary.setForeground(UIManager.getColor("Label.foreground"));
        summary.setText("simulating " + sim.parts() + " parts × " + sim.callouts().size() + " callouts on all cores…");
        Simulation s = sim;
        worker = new SwingWorker<>() {
            @Override
            protected SimulationResult doInBackground() {
                return SimulationRunner.allCores().run(s, (done, total) -> setProgress((int) (100 * done / total)), cancelled::get);
            }

            @Override
            protected void done() { finished(this); }
        };
        worker.addPropertyChangeListener(e -> progressed(e.getPropertyName(), e.getNewValue()));
        worker.execute();
    }

    private void progressed(String property, Object value) {
        if (!"progress".equals(property)) return;
        progress.setValue((Integer) value);
        progress.setString(value + " %");
    }

    private void stop() {
        cancelled.set(true);
        cancel.setEnabled(false);
        summary.setText("cancelling…");
    }

    private void finished(SwingWorker<SimulationResult, Void> w) {
        run.setEnabled(true);
        cancel.setEnabled(false);
        try {
            result = w.get();
        } catch (CancellationException e) {
            progress.setString("cancelled");
            summary.setText("cancelled; nothing counted");
            return;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return;
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof CancellationException) {
                progress.setString("cancelled");
                summary.setText("cancelled; nothing counted");
            } else {
                error(c.getMessage());
            }
            return;
        }
        progress.setValue(100);
        progress.setString("done");
        Share g = result.goodShare();
        String unit = result.simulation().model().units().symbol();
        summary.setText(String.format(Locale.ROOT, "%d parts, seed %d, %d points per section: %.1f %% functionally good (%s)",
                result.parts(), result.simulation().seed(), result.simulation().model().points(), 100 * g.share(),
                result.simulation().needs().describe(unit)));
        bars.show(result);
        examples.clear("Click a bar above to see example parts of that kind.");
    }

    private void picked(int row, Outcome o) {
        if (result == null) return;
        examples.show(result.simulation().model(), result.callouts().get(row), o);
    }

    private void error(String message) {
        summary.setForeground(UIManager.getColor("Arcwright.error.foreground"));
        summary.setText(message);
        progress.setString("");
    }
}
