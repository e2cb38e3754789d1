package org.arcwright.app.simulate;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Dimension;
import java.awt.Point;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.HierarchyEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Supplier;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextField;
import javax.swing.JToggleButton;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.Timer;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.Cautions;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Recommendation;
import org.arcwright.services.CaseSimulations;
import org.arcwright.services.Practice;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.simulate.SimulationResult;
import org.arcwright.simulate.SimulationRunner;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The Simulation view of the selected feature: its candidate callouts (the advisor's recommendations
 * for its case, and its chosen callout, marked) judged over a simulated population from the pack's
 * default process model for its process, against the needs the advisor derived. Per callout a bar of
 * accepted, escapes and false rejects; a click on a segment shows example parts of that kind drawn
 * magnified in the zone. The run goes on a background worker with a progress bar and Cancel; a result
 * belongs to the feature, case, chosen callout and practice it was run for and is dropped when any of
 * them changes.
 */
public final class SimulationView extends JPanel {
    private static final long serialVersionUID = 1L;
    /** The simulation's caution in as few words as keep its sense (the whole text is the box's tooltip). */
    static final String SHORT_CAUTION = "A simulated process is a model, not the shop's capability data. Decisions defer to the governing "
            + "standard, company practice and licensed engineering judgement.";
    /** Views at least this wide show the example parts beside the bars, narrower ones below them. */
    private static final int SIDE_BY_SIDE = 760;
    /** The bars' share of the height below the controls while no example part is picked (narrow views). */
    private static final double BARS_SHARE = 0.75;
    private final transient WorksheetSession session;
    private final transient Supplier<Practice> practice;
    private final JLabel title = new JLabel(" ");
    private final WrapLabel context = new WrapLabel("", "Label.font", null);
    private final WrapLabel processLine = new WrapLabel("", "Label.font", "Arcwright.help.foreground");
    private final JToggleButton edit = new JToggleButton("Change figures");
    private final JPanel figuresPanel = new JPanel(new MigLayout("insets 4 0 4 0, gap 6 4, wrap 6", "[right][60:80:120,fill][]20[right][60:80:120,fill][]"));
    private final JButton run = new JButton("Run");
    private final JButton cancel = new JButton("Cancel");
    private final JProgressBar progress = new JProgressBar(0, 100);
    private final WrapLabel status = new WrapLabel("", "Label.font", null);
    private final JSplitPane split;
    private final transient OutcomeBars bars = new OutcomeBars();
    private final ExampleParts examples = new ExampleParts();
    private final List<Figure> figures = new ArrayList<>();
    private final Figure radiusMean, radiusSd, positionSd, noise, flatRate, stepRate, points, parts, seed;
    private final Timer waitForPractice = new Timer(400, e -> refresh());
    private transient Subject subject;
    private transient Practice practiceUsed;
    private transient Optional<ProcessDefaults> table = Optional.empty();
    private transient Practice tableFrom;
    private transient FeatureSimulation plan;
    private transient List<CaseSimulations.Judged> rows;
    private transient AtomicBoolean cancelled = new AtomicBoolean();
    private transient SwingWorker<List<CaseSimulations.Judged>, Void> worker;
    private long generation;
    private String progressTail = "";

    /**
     * @param session the worksheet whose selected feature is simulated
     * @param practice the practice in force, or null while the packs load
     */
    public SimulationView(WorksheetSession session, Supplier<Practice> practice) {
        super(new MigLayout("insets 8, wrap 1, gap 3", "[grow,fill]", "[][][][][][][grow,fill][]"));
        this.session = Objects.requireNonNull(session, "session");
        this.practice = Objects.requireNonNull(practice, "practice");
        setName("simulationView");
        title.setName("simulate.subject");
        title.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        context.setName("simulate.context");
        processLine.setName("simulate.process");
        edit.setName("simulate.edit");
        edit.setToolTipText("Show the process figures to change them: scatter, defect rates, noise, points, parts, seed");
        run.setName("simulate.run");
        cancel.setName("simulate.cancel");
        progress.setName("simulate.progress");
        status.setName("simulate.status");
        radiusMean = figure("Radius mean", "simulate.radiusMean", true);
        radiusSd = figure("Radius sd", "simulate.radiusSd", true);
        positionSd = figure("Position sd", "simulate.positionSd", true);
        noise = figure("Noise (1 sd)", "simulate.noise", true);
        flatRate = figure("Flats on", "simulate.flatRate", false);
        stepRate = figure("Steps on", "simulate.stepRate", false);
        points = figure("Points", "simulate.points", false);
        parts = figure("Parts", "simulate.parts", false);
        seed = figure("Seed", "simulate.seed", false);
        for (Figure f : figures) {
            figuresPanel.add(new JLabel(f.label));
            figuresPanel.add(f.field);
            figuresPanel.add(f.unit);
        }
        JButton defaults = new JButton("Table values");
        defaults.setName("simulate.defaults");
        defaults.setToolTipText("Put back the process table's figures, " + CaseSimulations.DEFAULT_PARTS + " parts and seed "
                + CaseSimulations.DEFAULT_SEED + " (the figures advise --simulate uses)");
        figuresPanel.add(defaults, "span, left");
        figuresPanel.setVisible(false);
        cancel.setEnabled(false);
        progress.setStringPainted(true);
        progress.setString("");
        status.setVisible(false);
        add(title, "split 2, wmin 10, growx");
        add(edit, "right");
        add(context, "wmin 10");
        add(processLine, "wmin 10");
        add(figuresPanel, "wmin 10, hidemode 3");
        add(run, "split 3, sg simulateButtons");
        add(cancel, "sg simulateButtons");
        add(progress, "growx, wmin 40, h 22!");
        add(status, "wmin 10, hidemode 3");
        JScrollPane barScroll = new JScrollPane(bars.component());
        barScroll.setBorder(null);
        barScroll.getVerticalScrollBar().setUnitIncrement(16);
        split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, barScroll, examples);
        split.setName("simulate.split");
        split.setResizeWeight(0.5);
        split.setBorder(null);
        split.setContinuousLayout(true);
        barScroll.setMinimumSize(new Dimension(40, 50));
        examples.setMinimumSize(new Dimension(40, 40));
        add(split, "grow, wmin 10, hmin 100");
        JComponent caution = Cautions.box(SHORT_CAUTION);
        caution.setToolTipText("<html>" + SimulationResult.CAUTION + "<br>The figures are evidence on the candidates, not a ranking.</html>");
        add(caution, "wmin 10");
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { arrange(); }
        });
        edit.addActionListener(e -> toggleFigures());
        defaults.addActionListener(e -> resetFigures());
        run.addActionListener(e -> start());
        cancel.addActionListener(e -> stop());
        bars.onPick(this::picked);
        addHierarchyListener(e -> shownOrHidden(e.getChangeFlags()));
        session.listeners().add(this::refresh);
        refresh();
    }

    /** Brought into view: the packs may have been reloaded meanwhile (a result never outlives the rules that advised it). */
    private void shownOrHidden(long flags) {
        if ((flags & HierarchyEvent.SHOWING_CHANGED) != 0 && isShowing()) refresh();
    }

    // ---- what tests read and press ----

    /** The heading: the feature shown, or that none is selected. */
    public String subjectText() { return title.getText(); }

    /** The line under the Run button: what ran, what failed, or what would run. */
    public String statusText() { return status.getText(); }

    /** The words on the progress bar. */
    public String progressText() { return progress.getString(); }

    /** The process and run figures line. */
    public String processText() { return processLine.getText(); }

    /** The finished rows of the selected feature, one per candidate; null when there is no result. */
    public List<CaseSimulations.Judged> rows() { return rows; }

    /** Whether a run is under way. */
    public boolean running() { return worker != null && !worker.isDone(); }

    /** The bar of candidate {@code row}, or null. */
    public JComponent bar(int row) { return bars.bar(row); }

    /** Where, in the bar of candidate {@code row}, the segment of {@code outcome} is drawn; null when empty. */
    public Point barPoint(int row, Outcome outcome) { return bars.centreOf(row, outcome); }

    /** The line above the example parts. */
    public String examplesHeading() { return examples.heading(); }

    /** How many example parts can be looked at. */
    public int examplesShown() { return examples.shown(); }

    /** Whether the picked example part is drawn. */
    public boolean examplePlotted() { return examples.plotted(); }

    // ---- following the selection ----

    /** What a result belongs to: a worksheet, a feature as it stands, and the rules that advised it. */
    private record Subject(long document, String id, DesignCase designCase, Recommendation chosen) {
        static Subject of(long document, RadiusFeature f) { return new Subject(document, f.id(), f.designCase(), f.chosen()); }
    }

    private void refresh() {
        Optional<RadiusFeature> f = session.selected();
        Practice p = practice.get();
        Subject now = f.map(x -> Subject.of(session.document(), x)).orElse(null);
        if (Objects.equals(now, subject) && p == practiceUsed && (p != null || now == null)) return;
        subject = now;
        practiceUsed = p;
        drop();
        plan = null;
        if (now == null) {
            waitForPractice.stop();
            show("No feature selected", "Select a feature in the Part list: its candidate callouts are simulated here.", "", false);
            bars.clear("Nothing to simulate.");
            return;
        }
        RadiusFeature feature = f.get();
        DesignCase c = feature.designCase();
        String head = feature.id() + (c.feature() == null || c.feature().isBlank() ? "" : " · " + c.feature());
        if (p == null) {
            show(head, "Loading the practice packs: the candidates and the process model come from them…", "", false);
            bars.clear("Waiting for the practice packs.");
            waitForPractice.start();
            return;
        }
        waitForPractice.stop();
        if (table.isEmpty() || tableFrom != p) {
            table = ProcessDefaults.load(p.packs());
            tableFrom = p;
        }
        try {
            plan = FeatureSimulation.of(feature, p, table);
        } catch (InputProblem e) {
            show(head, "The advisor cannot read this feature's case: " + e.getMessage(), "", false);
            bars.clear("Nothing to simulate.");
            return;
        }
        if (plan.unavailable() != null) {
            show(head, context(feature, plan), plan.unavailable(), false);
            bars.clear("Nothing to simulate.");
            return;
        }
        fill(plan.defaults());
        show(head, context(feature, plan), processText(plan.defaults()), true);
        int n = plan.candidates(plan.defaults()).size();
        bars.clear("Run to judge " + (n == 1 ? "its candidate callout" : "its " + n + " candidate callouts")
                + " over a simulated population: a bar each, of accepted, escapes and false rejects.");
    }

    private static String context(RadiusFeature f, FeatureSimulation plan) {
        DesignCase c = f.designCase();
        String u = c.units().symbol();
        StringBuilder sb = new StringBuilder();
        sb.append(capital(c.process().key())).append(' ').append(c.kind().key()).append(", nominal R").append(Numbers.trim(c.nominalRadius()))
                .append(' ').append(u).append(f.chosen() == null ? ", undecided: the advisor's candidates." : ", chosen " + f.chosen().text() + ".");
        CaseSimulations.JudgedNeeds n = plan.needs();
        List<String> judged = new ArrayList<>();
        if (n.floor() > 0) judged.add("local radius ≥ " + Numbers.trim(n.floor()) + " " + u + " (a flat's corners count as 0)");
        if (Double.isFinite(n.ceiling())) judged.add("radius ≤ " + Numbers.trim(n.ceiling()) + " " + u);
        sb.append(" Needs judged: ").append(judged.isEmpty() ? "none (no radius floor or ceiling: every part counts as good, so "
                + "escapes are 0 by construction)" : String.join(", ", judged));
        if (!n.notJudged().isEmpty()) {
            List<String> keys = new ArrayList<>();
            for (String x : n.notJudged()) keys.add(x.contains(" (") ? x.substring(0, x.indexOf(" (")) : x);
            sb.append("; not judged: ").append(String.join(", ", keys));
        }
        return sb.append('.').toString();
    }

    private static String capital(String s) { return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1); }

    /** The process and run figures in one line, as they will run. */
    private String processText(FeatureSimulation.Figures f) {
        CaseSimulations.CaseProcess p = plan.process();
        String u = p.model().units().symbol();
        boolean edited = !f.equals(plan.defaults());
        return String.format(Locale.ROOT, "Process (%s %s): R %s %s, sd %s · flats %s %% · steps %s %% · noise %s %s · "
                        + "%d points · %,d parts, seed %d", plan.feature().designCase().process().key(), edited ? "defaults, edited" : "defaults",
                sig(f.radiusMean()), u, sig(f.radiusSd()), sig(100 * f.flatRate()), sig(100 * f.stepRate()), sig(f.noise()), u,
                f.points(), f.parts(), f.seed());
    }

    /** Where the defaults come from, for the process line's tooltip. */
    private static String processSource(FeatureSimulation plan) {
        CaseSimulations.CaseProcess p = plan.process();
        String u = p.model().units().symbol();
        return "<html>Table " + p.table().id() + ": " + p.table().source() + ".<br>Radius sd " + sig(p.radiusSd()) + " " + u + " = ±"
                + sig(p.plusMinus()) + " " + u + (p.fromCapability() ? " (process capability table)" : " (no capability entry: ±10 % of the nominal assumed)")
                + " / " + Numbers.trim(p.table().radiusSdDivisor()) + ".<br>Flat widths and places and step sizes stay the table's.</html>";
    }

    private void show(String head, String ctx, String process, boolean canRun) {
        title.setText(head);
        context.setText(ctx);
        processLine.setText(process);
        processLine.setToolTipText(canRun ? processSource(plan) : null);
        processLine.setVisible(!process.isEmpty());
        edit.setVisible(canRun);
        figuresPanel.setVisible(canRun && edit.isSelected());
        run.setEnabled(canRun);
        say("", "Label.foreground");
        progress.setValue(0);
        progress.setString("");
        revalidate();
    }

    /** A line under the Run button, shown only when there is something to say. */
    private void say(String text, String colourKey) {
        status.show(text, colourKey);
        status.setVisible(!text.isBlank());
        revalidate();
    }

    /** Cancels a run under way and forgets the result and the examples: they belonged to another subject. */
    private void drop() {
        generation++;
        cancelled.set(true);
        rows = null;
        run.setEnabled(false);
        cancel.setEnabled(false);
        examples.clear(ExampleParts.IDLE);
    }

    // ---- figures ----

    /** One editable figure: its field, and the exact value behind the text shown until it is edited. */
    private static final class Figure {
        final String label;
        final JTextField field = new JTextField(6);
        final JLabel unit = new JLabel();
        final boolean length;
        double exact;
        String shown = "";

        Figure(String label, boolean length) {
            this.label = label;
            this.length = length;
        }

        void set(double v, String text) {
            exact = v;
            shown = text;
            field.setText(text);
        }

        double value() {
            String t = field.getText().trim();
            if (t.equals(shown)) return exact;
            return Numbers.parse(t).orElseThrow(() -> InputProblem.ofField(label, "'" + t + "' is not a number"));
        }
    }

    private Figure figure(String label, String name, boolean length) {
        Figure f = new Figure(label, length);
        f.field.setName(name);
        figures.add(f);
        return f;
    }

    private void fill(FeatureSimulation.Figures d) {
        String u = plan.process().model().units().symbol();
        for (Figure f : figures) if (f.length) f.unit.setText(u);
        flatRate.unit.setText("% of parts");
        stepRate.unit.setText("% of parts");
        points.unit.setText("per section");
        parts.unit.setText("per callout");
        seed.unit.setText("");
        radiusMean.set(d.radiusMean(), sig(d.radiusMean()));
        radiusSd.set(d.radiusSd(), sig(d.radiusSd()));
        positionSd.set(d.positionSd(), sig(d.positionSd()));
        noise.set(d.noise(), sig(d.noise()));
        flatRate.set(100 * d.flatRate(), sig(100 * d.flatRate()));
        stepRate.set(100 * d.stepRate(), sig(100 * d.stepRate()));
        points.set(d.points(), Integer.toString(d.points()));
        parts.set(d.parts(), Integer.toString(d.parts()));
        seed.set(d.seed(), Long.toString(d.seed()));
    }

    /** Four significant figures, no trailing zeros. */
    private static String sig(double v) {
        return DecimalText.significant(v, 4);
    }

    private FeatureSimulation.Figures readFigures() {
        double pts = points.value(), n = parts.value(), s = seed.value();
        if (pts != Math.rint(pts)) throw InputProblem.ofField("Points", "a whole number, got " + Numbers.trim(pts));
        if (n != Math.rint(n) || n < 1 || n > 10_000_000) throw InputProblem.ofField("Parts", "a whole number from 1 to 10,000,000");
        if (s != Math.rint(s)) throw InputProblem.ofField("Seed", "a whole number, got " + Numbers.trim(s));
        return new FeatureSimulation.Figures(radiusMean.value(), radiusSd.value(), positionSd.value(), flatRate.value() / 100,
                stepRate.value() / 100, noise.value(), (int) pts, (int) n, (long) s);
    }

    /** The example parts beside the bars when there is room, else below them. */
    private void arrange() {
        int want = getWidth() >= SIDE_BY_SIDE ? JSplitPane.HORIZONTAL_SPLIT : JSplitPane.VERTICAL_SPLIT;
        if (split.getOrientation() == want) return;
        split.setOrientation(want);
        split.setResizeWeight(want == JSplitPane.HORIZONTAL_SPLIT ? 0.45 : 0.5);
        // the split takes its new size in the layout after this event: place the divider then
        SwingUtilities.invokeLater(() -> {
            if (split.getOrientation() == JSplitPane.HORIZONTAL_SPLIT) split.setDividerLocation(0.45);
            else roomForExamples(examples.shown() > 0);
        });
    }

    /** Below the bars, the example parts get most of the room once picked, little before. */
    private void roomForExamples(boolean picked) {
        if (split.getOrientation() != JSplitPane.VERTICAL_SPLIT) return;
        int room = split.getHeight() - split.getDividerSize();
        if (room <= 0) return;
        split.setDividerLocation((int) Math.round((picked ? 0.35 : BARS_SHARE) * room));
    }

    private void toggleFigures() {
        figuresPanel.setVisible(edit.isSelected());
        revalidate();
    }

    private void resetFigures() {
        if (plan != null && plan.process() != null) fill(plan.defaults());
    }

    // ---- running ----

    private void start() {
        // a run dropped with its feature may still be winding down: it ends on its own, so it does not block a new one
        if (plan == null || plan.process() == null || running() && !cancelled.get()) return;
        FeatureSimulation.Figures f;
        List<CaseSimulations.Candidate> candidates;
        try {
            f = readFigures();
            candidates = plan.candidates(f);
        } catch (InputProblem e) {
            say("Cannot run: " + e.getMessage(), "Arcwright.error.foreground");
            return;
        }
        long g = ++generation;
        if (edit.isSelected()) {
            edit.setSelected(false);
            toggleFigures();
        }
        AtomicBoolean stop = new AtomicBoolean();
        cancelled = stop;
        rows = null;
        examples.clear(ExampleParts.IDLE);
        run.setEnabled(false);
        cancel.setEnabled(true);
        progress.setValue(0);
        long simulable = candidates.stream().filter(c -> c.callout() != null).count();
        progressTail = String.format(Locale.ROOT, " of %,d parts × %d callouts", f.parts(), simulable);
        processLine.setText(processText(f));
        say("", "Label.foreground");
        progress.setString(String.format(Locale.ROOT, "0 %% of %,d parts × %d callouts", f.parts(), simulable));
        CaseSimulations.JudgedNeeds needs = plan.needs();
        worker = new SwingWorker<>() {
            @Override
            protected List<CaseSimulations.Judged> doInBackground() {
                return CaseSimulations.run(candidates, needs.needs(), f.parts(), f.seed(), SimulationRunner.allCores(),
                        (done, total) -> setProgress((int) (100 * done / Math.max(1, total))), stop::get);
            }

            @Override
            protected void done() { finished(g, f, this); }
        };
        worker.addPropertyChangeListener(e -> progressed(g, e.getPropertyName(), e.getNewValue()));
        worker.execute();
    }

    private void progressed(long g, String property, Object value) {
        if (g != generation || !"progress".equals(property)) return;
        progress.setValue((Integer) value);
        progress.setString(value + " %" + progressTail);
    }

    private void stop() {
        cancelled.set(true);
        cancel.setEnabled(false);
        progress.setString("cancelling…");
    }

    private void finished(long g, FeatureSimulation.Figures f, SwingWorker<List<CaseSimulations.Judged>, Void> w) {
        if (g != generation) return;
        run.setEnabled(true);
        cancel.setEnabled(false);
        try {
            rows = w.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return;
        } catch (CancellationException e) {
            cancelledRun();
            return;
        } catch (ExecutionException e) {
            if (e.getCause() instanceof CancellationException) {
                cancelledRun();
            } else {
                progress.setString("failed");
                say("The simulation failed: " + e.getCause().getMessage(), "Arcwright.error.foreground");
            }
            return;
        }
        progress.setValue(100);
        ProcessModel base = plan.process().model();
        String u = base.units().symbol();
        long simulated = rows.stream().filter(r -> r.result() != null).count();
        progress.setString(String.format(Locale.ROOT, "done: %d of %d candidates simulated, %,d parts each", simulated, rows.size(), f.parts()));
        say("", "Label.foreground");
        bars.show(rows, base.nominalRadius(), u);
        roomForExamples(false);
    }

    private void cancelledRun() {
        progress.setString("cancelled");
        say("Cancelled; nothing counted. Run again to simulate.", "Label.foreground");
    }

    private void picked(int row, Outcome o) {
        if (rows == null || row >= rows.size() || rows.get(row).result() == null) return;
        examples.show(rows.get(row), o);
        roomForExamples(true);
    }
}
