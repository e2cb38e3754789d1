package org.arcwright.app.check;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Cursor;
import java.awt.Graphics2D;
import java.awt.Point;
import java.awt.datatransfer.UnsupportedFlavorException;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.ComponentListener;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.AffineTransform;
import java.awt.geom.NoninvertibleTransformException;
import java.awt.geom.Point2D;
import java.awt.image.BufferedImage;
import java.awt.datatransfer.DataFlavor;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import javax.swing.TransferHandler;
import javax.swing.filechooser.FileNameExtensionFilter;
import javax.swing.table.DefaultTableModel;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.CheckRequests;
import org.arcwright.app.model.FramePick;
import org.arcwright.app.model.MeasuredPoints;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.Cautions;
import org.arcwright.app.widgets.Icons;
import org.arcwright.app.widgets.ScrollablePanel;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.inspect.Comparison;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.PointSet;
import org.arcwright.inspect.PointsCsv;
import org.arcwright.inspect.Verdict;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.render.ContourPlot;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.zone.Point2;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The Check panel: import measured points (an inspection file, or a CSV in a frame the user types
 * or picks on the plotted points; by the button or by dropping the file here) and judge them against the selected feature's chosen
 * callout, in the background with progress and cancel; see the verdict as a sentence naming the
 * feature, the callout and the units, what the file itself states, the figures, the same points
 * under other callouts, and the contour with its points coloured by excess.
 *
 * <p>Everything shown belongs to the selected feature as it stands: selecting another feature,
 * choosing another callout or opening another worksheet clears the result and disables Keep.
 */
public final class CheckPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient WorksheetSession session;
    private final transient CheckRequests requests;
    private final transient Executor background;
    private final transient Clock clock;
    private final transient Consumer<String> status;
    private final WrapLabel target = new WrapLabel("", "Label.font", "Label.foreground");
    private final WrapLabel verdict = new WrapLabel("", "h2.font", "Label.foreground");
    private final WrapLabel fileSays = new WrapLabel("", "Label.font", "Arcwright.help.foreground");
    private final WrapLabel figures = new WrapLabel("", "Label.font", "Arcwright.help.foreground");
    private final DefaultTableModel comparisons = new DefaultTableModel(new Object[] {"Control", "Callout", "Verdict",
        "Deciding figure"}, 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) { return false; }
    };
    private final Plot plot;
    private final JTable table = new TipTable(comparisons);
    private final JScrollPane tableScroll = new JScrollPane(table);
    /** Share of the height the verdict, figures and table get above the plot when the view first opens. */
    private static final double DETAILS_SHARE = 0.42;
    private final JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT);

    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private final JButton keep = new JButton("Keep the verdict");
    private final JButton confirm = new JButton();
    private final JTextField vertexX = frameField("0", "frameVertexX");
    private final JTextField vertexY = frameField("0", "frameVertexY");
    private final JTextField legA = frameField("0", "frameLegA");
    private final JTextField legB = frameField("90", "frameLegB");
    private transient Judged judged;
    private transient CheckRequests.NeedsConfirmation pending;
    private transient String pendingSource;
    private transient Subject subject;
    private long generation;
    /** The last CSV checked or picked on, which "Pick on the plot" offers again. */
    private transient Path lastCsv;
    /** The frame being picked on the plot, or null. */
    private transient FramePick picking;
    private transient Path pickCsv;
    private transient PointSet pickPoints;

    /** What the panel's content belongs to: the worksheet shown, the feature and what was decided for it. */
    private record Subject(long document, String featureId, Object chosen, Object designCase) {
        static Subject of(WorksheetSession s) {
            RadiusFeature f = s.selected().orElse(null);
            return new Subject(s.document(), f == null ? null : f.id(), f == null ? null : f.chosen(),
                    f == null ? null : f.designCase());
        }
    }

    /** A verdict on the screen: what it judged, and the record Keep puts on the worksheet. */
    private record Judged(Subject subject, InspectionResult result, InspectionRecord record) {}

    public CheckPanel(WorksheetSession session, CheckRequests requests, Executor background, Clock clock,
                      Consumer<String> status) {
        super(new MigLayout("insets 8, gap 8, wrap 1, hidemode 2", "[grow,fill]", "[][][][][grow,fill]"));
        this.session = Objects.requireNonNull(session, "session");
        this.requests = Objects.requireNonNull(requests, "requests");
        this.background = Objects.requireNonNull(background, "background");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.status = Objects.requireNonNull(status, "status");
        plot = new Plot();
        setName("checkPanel");
        target.setName("checkTarget");
        verdict.setName("checkVerdict");
        fileSays.setName("checkFileSays");
        figures.setName("checkFigures");
        JButton open = new JButton("Import points…", Icons.get("open"));
        open.setName("checkImport");
        open.addActionListener(e -> chooseFile());
        progress.setVisible(false);
        cancel.setVisible(false);
        cancel.addActionListener(e -> cancelled());
        keep.setName("checkKeep");
        keep.addActionListener(e -> keepVerdict());
        confirm.setName("checkConfirm");
        confirm.setVisible(false);
        confirm.addActionListener(e -> confirmed());
        table.setName("checkComparisons");
        table.setPreferredScrollableViewportSize(new Dimension(10, table.getRowHeight() * 5));
        add(Cautions.box(Cautions.VERDICT), "growx, wmin 10");
        add(target, "growx, wmin 10");
        JPanel buttons = new JPanel(new MigLayout("insets 2, gap 8, hidemode 3", "[][][][]", ""));
        buttons.setOpaque(false);
        buttons.add(open, "wmin 10");
        buttons.add(keep, "wmin 10");
        buttons.add(progress, "w 120!");
        buttons.add(cancel);
        // the rows' insets hold the buttons' focus rings; the negative gaps keep their faces aligned
        add(buttons, "growx, wmin 10, gapleft -2");
        add(frameRow(), "growx, wmin 10, gapleft -2");
        // the words scroll above, the plot takes what is left below: at 1024×700 both stay usable
        ScrollablePanel details = new ScrollablePanel(new MigLayout("insets 0 0 4 0, gap 8, wrap 1, hidemode 3",
                "[grow,fill]", ""));
        details.add(verdict, "growx, wmin 10");
        details.add(confirm, "growx 0");
        details.add(fileSays, "growx, wmin 10");
        details.add(figures, "growx, wmin 10");
        details.add(tableScroll, "growx, wmin 10, hmin 110, h 150:150:");
        JScrollPane detailsScroll = new JScrollPane(details);
        detailsScroll.setBorder(null);
        detailsScroll.getVerticalScrollBar().setUnitIncrement(16);
        detailsScroll.setMinimumSize(new Dimension(10, 80));
        plot.setMinimumSize(new Dimension(10, 160));
        split.setTopComponent(detailsScroll);
        split.setBottomComponent(plot);
        split.setName("checkSplit");
        split.setResizeWeight(DETAILS_SHARE);
        split.setContinuousLayout(true);
        split.setBorder(null);
        split.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { splitFirstSized(this); }
        });
        add(split, "grow, wmin 10, hmin 260");
        setTransferHandler(new FileDrop());
        session.listeners().add(this::sessionChanged);
        subject = Subject.of(session);
        showIdle();
    }

    /** Puts the divider at its share the first time the split has a size; the user moves it after that. */
    private void splitFirstSized(ComponentListener self) {
        if (split.getHeight() <= 0) return;
        split.setDividerLocation(DETAILS_SHARE);
        split.removeComponentListener(self);
    }

    private static JTextField frameField(String value, String name) {
        JTextField f = new JTextField(value, 3);
        f.setName(name);
        return f;
    }

    /** The CSV frame: where the corner's vertex is and which way its legs run, in the CSV's coordinates. */
    private JPanel frameRow() {
        // insets as wide as the button's focus ring, which would otherwise be cut at the row's edges
        JPanel p = new JPanel(new MigLayout("insets 2, gap 4", "[][][][][][][][]", ""));
        p.setOpaque(false);
        String tip = "A CSV holds points only: say where the corner's vertex is (x, y, in the feature's units) and which "
                + "way its two legs run (degrees from +x, counter-clockwise), in the CSV's own coordinates";
        JLabel l = new JLabel("CSV vertex x");
        l.setToolTipText(tip);
        p.setToolTipText(tip);
        p.add(l);
        p.add(vertexX);
        p.add(new JLabel("y"));
        p.add(vertexY);
        p.add(new JLabel("  legs at"));
        p.add(legA);
        p.add(new JLabel("° and"));
        p.add(legB);
        p.add(new JLabel("°"));
        JButton pick = new JButton("Pick on the plot…");
        pick.setName("checkPickFrame");
        pick.setToolTipText("Plot a CSV's points and click the vertex, then a point along each leg");
        pick.addActionListener(e -> pickFrame());
        p.add(pick, "gapleft 8");
        for (JTextField f : List.of(vertexX, vertexY, legA, legB)) f.setToolTipText(tip);
        return p;
    }

    /** Checks the contour in {@code file} for the selected feature in the background (also used by drag and drop and tests). */
    public void check(Path file) {
        if (file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")) lastCsv = file;
        RadiusFeature f = session.selected().orElse(null);
        CheckRequests.Binding binding;
        try {
            binding = requests.read(file, f, frame());
        } catch (RuntimeException e) {
            clearResult();
            verdict.show("Cannot check " + file.getFileName() + ".", "Arcwright.error.foreground");
            figures.show(e.getMessage(), "Arcwright.error.foreground");
            return;
        }
        if (binding instanceof CheckRequests.Refused r) {
            clearResult();
            verdict.show("Not checked: " + r.reason(), "Arcwright.error.foreground");
            status.accept("Not checked: " + file.getFileName());
            return;
        }
        if (binding instanceof CheckRequests.NeedsConfirmation n) {
            clearResult();
            pending = n;
            pendingSource = file.toString();
            verdict.show("Not checked yet: " + file.getFileName() + " does not describe " + n.featureId() + ". "
                    + String.join(" ", n.mismatches()), "Arcwright.error.foreground");
            confirm.setText("Judge the points as " + n.featureId() + " anyway (" + n.featureId() + "'s nominal and corner, "
                    + "the file's frame)");
            confirm.setVisible(true);
            showFileSays("The file says: " + n.ifConfirmed().fileSays());
            return;
        }
        run((CheckRequests.Ready) binding, file.toString());
    }

    /** The frame stated for a CSV; a field that is not a number is reported by name. */
    private CheckRequests.Frame frame() {
        return CheckRequests.Frame.ofDegrees(number(vertexX, "vertex x"), number(vertexY, "vertex y"),
                number(legA, "leg A"), number(legB, "leg B"));
    }

    private static double number(JTextField f, String name) {
        return Numbers.parse(f.getText()).orElseThrow(() -> InputProblem.ofField(name,
                "the CSV frame's " + name + " is not a number: '" + f.getText() + "'"));
    }

    /** Sets the CSV frame (the vertex and the legs' directions in degrees), as a user types it. */
    public void setFrame(double x, double y, double legADeg, double legBDeg) {
        vertexX.setText(Numbers.trim(x));
        vertexY.setText(Numbers.trim(y));
        legA.setText(Numbers.trim(legADeg));
        legB.setText(Numbers.trim(legBDeg));
    }

    /** Plots the last CSV's points (or one the user chooses) to pick its frame on them. */
    private void pickFrame() {
        Path csv = lastCsv;
        if (csv == null) {
            JFileChooser c = new JFileChooser();
            c.setFileFilter(new FileNameExtensionFilter("Measured points (*.csv)", "csv"));
            if (c.showOpenDialog(this) != JFileChooser.APPROVE_OPTION) return;
            csv = c.getSelectedFile().toPath();
        }
        pickFrame(csv);
    }

    /**
     * Shows the points of {@code csv} at true scale and asks for the vertex, then a point along each
     * leg; the third click fills the frame's fields and checks the file in that frame.
     */
    public void pickFrame(Path csv) {
        PointSet points;
        try {
            points = PointsCsv.read(csv);
        } catch (RuntimeException e) {
            clearResult();
            verdict.show("Cannot plot " + csv.getFileName() + ".", "Arcwright.error.foreground");
            figures.show(e.getMessage(), "Arcwright.error.foreground");
            return;
        }
        generation++;
        hideProgress();
        clearResult();
        lastCsv = csv;
        pickCsv = csv;
        pickPoints = points;
        RadiusFeature f = session.selected().orElse(null);
        picking = FramePick.start(f == null ? "" : f.designCase().units().symbol());
        cancel.setVisible(true);
        showPick();
    }

    private void showPick() {
        verdict.show(picking.prompt(), "Label.foreground");
        figures.show(pickPoints.size() + " points of " + pickCsv.getFileName() + ", drawn at true scale in the file's "
                + "coordinates. Cancel stops picking; the fields above can still be typed.", "Arcwright.help.foreground");
        plot.showPoints(pickPoints, picking.picked(), picking.units());
    }

    private void plotClicked(Point2 at, double pixelSize) {
        if (picking == null) return;
        picking = picking.click(at, pixelSize);
        if (!picking.complete()) {
            showPick();
            return;
        }
        FramePick done = picking;
        Path csv = pickCsv;
        setFrame(done.vertexX(), done.vertexY(), done.legDegrees(1), done.legDegrees(2));
        status.accept(done.prompt());
        check(csv);
    }

    /** What the plot asks for while a frame is picked, else empty (tests). */
    public String pickPrompt() { return picking == null ? "" : picking.prompt(); }

    /** Where the plot draws the CSV point {@code (x, y)} while a frame is picked, in the plot's pixels (tests). */
    public Point plotPointOf(double x, double y) { return plot.screenOf(x, y); }

    /** The fields of the CSV frame as typed or picked: vertex x, y, legs A and B in degrees (tests). */
    public List<String> frameText() {
        return List.of(vertexX.getText(), vertexY.getText(), legA.getText(), legB.getText());
    }

    private void confirmed() {
        CheckRequests.NeedsConfirmation n = pending;
        if (n == null) return;
        run(n.ifConfirmed(), pendingSource);
    }

    private void run(CheckRequests.Ready ready, String src) {
        clearResult();
        long g = ++generation;
        Subject s = subject;
        progress.setIndeterminate(true);
        progress.setVisible(true);
        cancel.setVisible(true);
        verdict.show("Checking " + Path.of(src).getFileName() + " against " + ready.featureId() + "'s "
                + ready.request().callout().describe() + "…", "Label.foreground");
        if (ready.fileSays() != null) showFileSays("The file says: " + ready.fileSays() + " (not judged: "
                + ready.featureId() + "'s chosen callout is)");
        status.accept("Checking " + Path.of(src).getFileName() + "…");
        InspectionRequest req = ready.request();
        CompletableFuture.supplyAsync(() -> {
            InspectionResult r = new Inspector().inspect(req);
            return new Checked(r, MeasuredPoints.of(r, src));
        }, background).whenComplete((c, e) -> SwingUtilities.invokeLater(() -> inspected(g, s, src, ready, c, e)));
    }

    /** An inspection and its points as the Zone view plots them (when its nominal is a corner). */
    private record Checked(InspectionResult result, Optional<MeasuredPoints> points) {}

    public String verdictText() { return verdict.getText(); }

    /** The line naming the feature the panel judges for (tests). */
    public String targetText() { return target.getText(); }

    /** What the file states, shown beside the verdict (tests). */
    public String fileSaysText() { return fileSays.getText(); }

    /** Whether Keep may be pressed now (tests). */
    public boolean canKeep() { return keep.isEnabled(); }

    /** Whether the panel offers to judge a mismatched file as the feature anyway (tests). */
    public boolean confirmOffered() { return confirm.isVisible(); }

    /** Rows in the comparison table (tests). */
    public int comparisonRows() { return comparisons.getRowCount(); }

    /** Whether every wrapped line of the verdict fits in the space it was given (tests). */
    public boolean verdictFullyShown() {
        return verdict.getWidth() > 0 && verdict.getHeight() >= verdict.getPreferredSize().height;
    }

    /** How many comparison rows the table's viewport shows whole (tests). */
    public int visibleComparisonRows() {
        return table.getParent() == null ? 0 : table.getParent().getHeight() / table.getRowHeight();
    }

    private void chooseFile() {
        JFileChooser c = new JFileChooser();
        c.setFileFilter(new FileNameExtensionFilter("Measured points (*.csv) or inspection files (*.json)", "csv", "json"));
        if (c.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) check(c.getSelectedFile().toPath());
    }

    /** Opens the file chooser (the menu and command finder command). */
    public void importPoints() { chooseFile(); }

    /** Hides the bar and stops its animation, which an invisible indeterminate bar keeps running. */
    private void hideProgress() {
        progress.setIndeterminate(false);
        progress.setVisible(false);
    }

    private void cancelled() {
        generation++;
        hideProgress();
        cancel.setVisible(false);
        showIdle();
        status.accept("Check cancelled");
    }

    // ---- model to view ----

    private void sessionChanged() {
        Subject now = Subject.of(session);
        if (!now.equals(subject)) {
            subject = now;
            // a check running for the last feature is dropped, and nothing of it stays on the screen
            generation++;
            hideProgress();
            cancel.setVisible(false);
            showIdle();
            return;
        }
        refreshKeep();
    }

    /** What the panel says when nothing is judged: the selected feature and what it would be judged against. */
    private void showIdle() {
        clearResult();
        RadiusFeature f = session.selected().orElse(null);
        target.show(targetLine(f), "Label.foreground");
        verdict.show(f == null ? "No feature selected." : "No contour checked for " + f.id() + " yet.", "Label.foreground");
        figures.show("Import measured points (a CSV of x,y per line, in the frame stated above, or an inspection file "
                + "(.json)), or drop either here. They are judged against the selected feature's chosen callout.",
                "Arcwright.help.foreground");
    }

    private static String targetLine(RadiusFeature f) {
        if (f == null) return "Select a feature in the Part panel: points are judged against its chosen callout.";
        String u = f.designCase().units().symbol();
        String what = f.id() + ", " + f.designCase().kind().key() + " R" + Numbers.trim(f.designCase().nominalRadius()) + " " + u;
        if (f.chosen() == null) return what + ": no callout chosen yet, so nothing to judge against. Decide it first (Alt+2).";
        return what + ": judged against its chosen callout " + f.chosen().text() + " (lengths in " + u + ").";
    }

    /** What the file itself states, or nothing (no empty line is left where a CSV states nothing). */
    private void showFileSays(String text) {
        fileSays.show(text, "Arcwright.help.foreground");
        fileSays.setVisible(!text.isEmpty());
    }

    /** Empties the verdict, the figures, the table and the plot, and disables Keep. */
    private void clearResult() {
        picking = null;
        pickPoints = null;
        cancel.setVisible(false);
        judged = null;
        pending = null;
        pendingSource = null;
        confirm.setVisible(false);
        showFileSays("");
        figures.show("", "Arcwright.help.foreground");
        comparisons.setRowCount(0);
        tableScroll.setVisible(false);
        plot.show(null);
        refreshKeep();
    }

    private void refreshKeep() {
        RadiusFeature f = session.selected().orElse(null);
        boolean current = judged != null && f != null && judged.subject().equals(Subject.of(session));
        boolean kept = current && judged.record().equals(f.inspection());
        keep.setEnabled(current && !kept);
        keep.setToolTipText(judged == null ? "Unavailable: check a contour of the selected feature first"
                : !current ? "Unavailable: the verdict shown is not for the selected feature as it stands"
                : kept ? "Kept on " + f.id() : "Record this verdict with " + f.id() + " (Ctrl+Z to undo)");
    }

    private void inspected(long g, Subject s, String src, CheckRequests.Ready ready, Checked c, Throwable e) {
        if (g != generation || !s.equals(subject)) return;
        hideProgress();
        cancel.setVisible(false);
        if (e != null) {
            Throwable cause = e.getCause() != null ? e.getCause() : e;
            verdict.show("Cannot check " + Path.of(src).getFileName() + ".", "Arcwright.error.foreground");
            figures.show(cause.getMessage(), "Arcwright.error.foreground");
            status.accept("Check failed");
            return;
        }
        InspectionResult r = c.result();
        String u = r.request().units().symbol();
        // the Zone view plots the points of the feature they were checked for
        if (c.points().isPresent() && session.worksheet().feature(ready.featureId()).isPresent()) {
            session.keepMeasured(ready.featureId(), c.points().get());
        }
        judged = new Judged(s, r, CheckRequests.record(r, src, LocalDate.now(clock)));
        verdict.show(sentence(ready.featureId(), r.verdict(), r.request().callout(), u, r.request().uncertainty()),
                ink(r.verdict()));
        figures.show(describe(r), "Label.foreground");
        comparisons.setRowCount(0);
        for (Comparison k : r.comparisons()) {
            comparisons.addRow(new Object[] {k.name(), k.callout(), word(k.verdict()), k.figure()});
        }
        tableScroll.setVisible(comparisons.getRowCount() > 0);
        revalidate();
        plot.show(r);
        refreshKeep();
        // what was judged against what, and that the feature's kept verdict stays until Keep is pressed
        status.accept("Checked " + Path.of(src).getFileName() + " for " + ready.featureId() + " against "
                + r.request().callout().describe() + " " + u + ": " + word(r.verdict()) + " (not kept)");
    }

    /**
     * The verdict as a whole sentence: which feature, against what, in which units. An indeterminate
     * verdict says that neither conformance nor non-conformance is proven (ISO 14253-1 default
     * decision rule) and so is never shown as a pass or a fail.
     */
    static String sentence(String featureId, Verdict v, InspectionCallout callout, String units, double uncertainty) {
        String against = "its chosen callout, " + callout.describe() + " (" + units + ")";
        return switch (v) {
            case PASS -> "The measured contour of " + featureId + " conforms to " + against + ".";
            case FAIL -> "The measured contour of " + featureId + " does not conform to " + against + ".";
            case INDETERMINATE -> "The measured contour of " + featureId + " can be neither accepted nor rejected against "
                    + against + ": " + (uncertainty > 0 ? "with U = " + DecimalText.exact(uncertainty) + " " + units + ", " : "")
                    + "the measurement's uncertainty straddles a limit (ISO 14253-1). Measure again more densely or "
                    + "with a lower-noise probe; the notes say what would decide.";
        };
    }

    /** A verdict in the words of the comparison table and the status line. */
    static String word(Verdict v) {
        return switch (v) {
            case PASS -> "conforms";
            case FAIL -> "does not conform";
            case INDETERMINATE -> "no verdict (indeterminate)";
        };
    }

    private static String ink(Verdict v) {
        return switch (v) {
            case PASS -> "Arcwright.pass.foreground";
            case FAIL -> "Arcwright.fail.foreground";
            case INDETERMINATE -> "Arcwright.undecided.foreground";
        };
    }

    /**
     * The figures beside the plot, written as {@code arcwright inspect} writes them: the envelope rounded
     * outward and the zone the points need rounded up ({@link Inspector#down}, {@link Inspector#up}), so
     * a callout at a figure shown still passes; the least-squares radius to 4 significant digits.
     */
    static String describe(InspectionResult r) {
        String u = " " + r.request().units().symbol();
        double res = r.request().resolution();
        StringBuilder sb = new StringBuilder();
        sb.append(r.request().points().size()).append(" points; lengths in").append(u).append('\n');
        if (r.worst() != null) {
            sb.append("Worst: ").append(r.worst().text()).append("\n");
        }
        if (r.radius() != null) {
            sb.append("Radius envelope: ").append(length(Inspector.down(r.radius().smallest(), res), u)).append(" to ")
                    .append(length(Inspector.up(r.radius().largest(), res), u)).append('\n');
        }
        if (r.fits() != null && r.fits().leastSquares() != null) {
            double ls = r.fits().leastSquares().circle().r();
            sb.append("Least-squares radius: ").append(length(Double.isNaN(ls) ? "none" : DecimalText.significant(ls, 4), u)).append('\n');
        }
        if (r.profile() != null) {
            sb.append("Zone the points need: ").append(length(Inspector.up(r.profile().requiredZone(), Inspector.PROFILE_SLACK), u)).append('\n');
        }
        for (String n : r.notes()) sb.append("• ").append(n).append('\n');
        return sb.toString().strip();
    }

    /** A figure with its unit, or "none" (no unit) where the core found none. */
    private static String length(String figure, String unit) { return "none".equals(figure) ? figure : figure + unit; }

    private void keepVerdict() {
        RadiusFeature f = session.selected().orElse(null);
        if (judged == null || f == null || !judged.subject().equals(Subject.of(session)) || f.chosen() == null) return;
        session.recordInspection(f.id(), judged.record());
        status.accept("Kept the verdict on " + f.id() + " (Ctrl+Z to undo)");
    }

    /** A table whose cells show their whole text as a tooltip when it does not fit. */
    private static final class TipTable extends JTable {
        private static final long serialVersionUID = 1L;

        TipTable(DefaultTableModel m) { super(m); }

        @Override
        public String getToolTipText(MouseEvent e) {
            int row = rowAtPoint(e.getPoint()), col = columnAtPoint(e.getPoint());
            if (row < 0 || col < 0) return null;
            Object v = getValueAt(row, col);
            return v == null ? null : v.toString();
        }
    }

    /** Accepts a dropped .csv or .json file. */
    private final class FileDrop extends TransferHandler {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean canImport(TransferSupport s) { return s.isDataFlavorSupported(DataFlavor.javaFileListFlavor); }

        @Override
        @SuppressWarnings("unchecked")
        public boolean importData(TransferSupport s) {
            try {
                List<File> files = (List<File>) s.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
                for (File f : files) {
                    if (CheckRequests.readable(f.toPath())) {
                        check(f.toPath());
                        return true;
                    }
                }
            } catch (UnsupportedFlavorException | IOException e) {
                status.accept("Could not read the dropped file: " + e.getMessage());
            }
            return false;
        }
    }

    /**
     * The contour plot drawn as vectors at the component's own size with the window's type (the same
     * drawing as the command line's {@code --plot}, whose summary the labels above already give), or,
     * while a frame is picked, the CSV's points at true scale taking clicks.
     */
    private final class Plot extends JComponent {
        private static final long serialVersionUID = 1L;
        private transient InspectionResult result;
        private transient PointSet points;
        private transient List<Point2> picked = List.of();
        private transient String units = "";
        /** From the points' coordinates to the component's, as last painted (pick mode). */
        private transient AffineTransform toScreen;

        Plot() {
            setName("checkPlot");
            addMouseListener(new MouseAdapter() {
                @Override
                public void mouseClicked(MouseEvent e) { clicked(e.getX(), e.getY()); }
            });
        }

        void show(InspectionResult r) {
            result = r;
            points = null;
            toScreen = null;
            setCursor(Cursor.getDefaultCursor());
            repaint();
        }

        void showPoints(PointSet p, List<Point2> picks, String unitSymbol) {
            result = null;
            points = p;
            picked = picks;
            units = unitSymbol;
            toScreen = null;
            setCursor(Cursor.getPredefinedCursor(Cursor.CROSSHAIR_CURSOR));
            repaint();
        }

        /** Where {@code (x, y)} of the points is drawn; the transform is the one painting uses at this size. */
        Point screenOf(double x, double y) {
            if (points == null) throw new IllegalStateException("no frame is being picked");
            Point2D s = transform().transform(new Point2D.Double(x, y), null);
            return new Point((int) Math.round(s.getX()), (int) Math.round(s.getY()));
        }

        private AffineTransform transform() {
            if (toScreen == null) {
                BufferedImage probe = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB);
                Graphics2D g = probe.createGraphics();
                try {
                    toScreen = drawing().drawPoints(points, picked, units, g, getWidth(), getHeight(), Themes.font("Label.font"));
                } finally {
                    g.dispose();
                }
            }
            return toScreen;
        }

        private void clicked(int x, int y) {
            if (points == null) return;
            try {
                AffineTransform t = transform();
                Point2D w = t.inverseTransform(new Point2D.Double(x, y), null);
                plotClicked(new Point2(w.getX(), w.getY()), 1 / t.getScaleX());
            } catch (NoninvertibleTransformException e) {
                status.accept("The plot has no room to pick on; enlarge the window");
            }
        }

        private ContourPlot drawing() { return new ContourPlot(Themes.drawingPalette("Arcwright.zone.background")); }

        @Override
        protected void paintComponent(Graphics g) {
            if (result == null && points == null) return;
            Graphics2D g2 = (Graphics2D) g.create();
            try {
                g2.clipRect(0, 0, getWidth(), getHeight());
                if (points != null) {
                    toScreen = drawing().drawPoints(points, picked, units, g2, getWidth(), getHeight(), Themes.font("Label.font"));
                } else {
                    drawing().draw(result, g2, getWidth(), getHeight(), Themes.font("Label.font"), false);
                }
            } finally {
                g2.dispose();
            }
        }
    }
}
