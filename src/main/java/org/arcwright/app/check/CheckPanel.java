package org.arcwright.app.check;

import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.datatransfer.DataFlavor;
import java.io.File;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.SwingUtilities;
import javax.swing.TransferHandler;
import javax.swing.filechooser.FileNameExtensionFilter;
import javax.swing.table.DefaultTableModel;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.CheckRequests;
import org.arcwright.app.model.MeasuredPoints;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.shell.Icons;
import org.arcwright.app.shell.Themes;
import org.arcwright.app.shell.WrapLabel;
import org.arcwright.inspect.Comparison;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.render.ContourPlot;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The Check panel: import measured points (an inspection file, or a CSV judged against the selected
 * feature; by the button or by dropping the file here), run the inspection in the background with
 * progress and cancel, and see the verdict, the figures, the same points under every callout, and
 * the contour with its points coloured by excess.
 */
public final class CheckPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient WorksheetSession session;
    private final transient CheckRequests requests;
    private final transient Executor background;
    private final transient Clock clock;
    private final transient Consumer<String> status;
    private final WrapLabel verdict = new WrapLabel("No contour checked yet", "h2.font", "Label.foreground");
    private final WrapLabel figures = new WrapLabel("Import measured points (CSV with x,y per line, corner vertex at the "
            + "origin and legs along +x and +y), or an inspection file (.json), or drop either here.", "Label.font",
            "Arcwright.help.foreground");
    private final DefaultTableModel comparisons = new DefaultTableModel(new Object[] {"Control", "Callout", "Verdict",
        "Deciding figure"}, 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) { return false; }
    };
    private final Plot plot = new Plot();
    private final JTable table = new JTable(comparisons);
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private final JButton keep = new JButton("Keep the verdict on the worksheet");
    private transient InspectionResult result;
    private transient String source;
    private long generation;

    public CheckPanel(WorksheetSession session, CheckRequests requests, Executor background, Clock clock,
                      Consumer<String> status) {
        super(new MigLayout("insets 8, gap 8, wrap 1, hidemode 2", "[grow,fill]", "[][][][][grow,fill]"));
        this.session = Objects.requireNonNull(session, "session");
        this.requests = Objects.requireNonNull(requests, "requests");
        this.background = Objects.requireNonNull(background, "background");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.status = Objects.requireNonNull(status, "status");
        setName("checkPanel");
        verdict.setName("checkVerdict");
        figures.setName("checkFigures");
        JButton open = new JButton("Import measured points…", Icons.get("open"));
        open.setName("checkImport");
        open.addActionListener(e -> chooseFile());
        progress.setVisible(false);
        cancel.setVisible(false);
        cancel.addActionListener(e -> cancelled());
        keep.setName("checkKeep");
        keep.setEnabled(false);
        keep.setToolTipText("Unavailable: check a contour first");
        keep.addActionListener(e -> keepVerdict());
        table.setName("checkComparisons");
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(10, table.getRowHeight() * 5));
        // Top: the actions, then the verdict wrapping to the panel's width; then the figures, the
        // comparison table at a height that shows several rows, and the plot taking what is left.
        add(open, "split 4, growx 0");
        add(keep, "growx 0");
        add(progress, "w 120!, growx 0");
        add(cancel, "growx 0");
        add(verdict, "growx, wmin 10");
        add(figures, "growx, wmin 10");
        add(new JScrollPane(table), "growx, wmin 10, hmin 110, h 150:150:");
        add(plot, "grow, wmin 10, hmin 120");
        setTransferHandler(new FileDrop());
    }

    /** Checks the contour in {@code file} in the background (also used by drag and drop and tests). */
    public void check(Path file) {
        RadiusFeature f = session.selected().orElse(null);
        InspectionRequest req;
        try {
            req = requests.read(file, f);
        } catch (RuntimeException e) {
            verdict.show("Cannot check", "Arcwright.error.foreground");
            figures.show(e.getMessage(), "Arcwright.error.foreground");
            return;
        }
        long g = ++generation;
        progress.setIndeterminate(true);
        progress.setVisible(true);
        cancel.setVisible(true);
        status.accept("Checking " + file.getFileName() + "…");
        String src = file.toString();
        String featureId = f == null ? null : f.id();
        CompletableFuture.supplyAsync(() -> {
            InspectionResult r = new Inspector().inspect(req);
            return new Checked(r, MeasuredPoints.of(r, src));
        }, background).whenComplete((c, e) -> SwingUtilities.invokeLater(() -> inspected(g, src, featureId, c, e)));
    }

    /** An inspection and its points as the Zone view plots them (when its nominal is a corner). */
    private record Checked(InspectionResult result, Optional<MeasuredPoints> points) {}

    public String verdictText() { return verdict.getText(); }

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

    /** Hides the bar and stops its animation, which an invisible indeterminate bar keeps running. */
    private void hideProgress() {
        progress.setIndeterminate(false);
        progress.setVisible(false);
    }

    private void cancelled() {
        generation++;
        hideProgress();
        cancel.setVisible(false);
        status.accept("Check cancelled");
    }

    private void inspected(long g, String src, String featureId, Checked c, Throwable e) {
        if (g != generation) return;
        hideProgress();
        cancel.setVisible(false);
        if (e != null) {
            Throwable cause = e.getCause() != null ? e.getCause() : e;
            verdict.show("Cannot check", "Arcwright.error.foreground");
            figures.show(cause.getMessage(), "Arcwright.error.foreground");
            status.accept("Check failed");
            return;
        }
        InspectionResult r = c.result();
        result = r;
        source = src;
        // the Zone view plots the points of the feature they were checked for
        if (featureId != null && c.points().isPresent() && session.worksheet().feature(featureId).isPresent()) {
            session.keepMeasured(featureId, c.points().get());
        }
        verdict.show((r.pass() ? "Conforms" : "Does not conform") + " · " + r.request().callout().describe(),
                r.pass() ? "Arcwright.pass.foreground" : "Arcwright.fail.foreground");
        figures.show(describe(r), "Label.foreground");
        comparisons.setRowCount(0);
        for (Comparison k : r.comparisons()) {
            comparisons.addRow(new Object[] {k.name(), k.callout(), k.pass() ? "conforms" : "does not", k.figure()});
        }
        plot.show(r);
        boolean canKeep = session.selected().isPresent();
        keep.setEnabled(canKeep);
        keep.setToolTipText(canKeep ? "Record this verdict with the selected feature (Ctrl+Z to undo)"
                : "Unavailable: select the feature this contour belongs to");
        status.accept("Checked " + Path.of(src).getFileName() + ": " + (r.pass() ? "conforms" : "does not conform"));
    }

    private static String describe(InspectionResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(r.request().points().size()).append(" points, ").append(r.request().units().symbol()).append('\n');
        if (r.worst() != null) {
            sb.append("Worst point: (").append(fmt(r.worst().x())).append(", ").append(fmt(r.worst().y())).append("), ")
                    .append(r.worst().excess() > 0 ? "beyond" : "within").append(" by ").append(fmt(Math.abs(r.worst().excess())))
                    .append(" (").append(r.worst().measure()).append(")\n");
        }
        if (r.radius() != null) {
            sb.append("Radius envelope: ").append(fmt(r.radius().smallest())).append(" to ").append(fmt(r.radius().largest())).append('\n');
        }
        if (r.fits() != null && r.fits().leastSquares() != null) {
            sb.append("Least-squares radius: ").append(fmt(r.fits().leastSquares().circle().r())).append('\n');
        }
        if (r.profile() != null) sb.append("Zone the points need: ").append(fmt(r.profile().requiredZone())).append('\n');
        for (String n : r.notes()) sb.append("• ").append(n).append('\n');
        return sb.toString().strip();
    }

    private static String fmt(double v) {
        return Double.isNaN(v) ? "none" : String.format(java.util.Locale.ROOT, "%.4f", v);
    }

    private void keepVerdict() {
        if (result == null || session.selected().isEmpty()) return;
        String id = session.selected().get().id();
        session.recordInspection(id, CheckRequests.record(result, source, LocalDate.now(clock)));
        status.accept("Kept the verdict on " + id);
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
            } catch (java.awt.datatransfer.UnsupportedFlavorException | java.io.IOException e) {
                status.accept("Could not read the dropped file: " + e.getMessage());
            }
            return false;
        }
    }

    /** The inspection core's contour plot, scaled to the space it has. */
    private static final class Plot extends JComponent {
        private static final long serialVersionUID = 1L;
        private transient InspectionResult result;

        Plot() { setName("checkPlot"); }

        void show(InspectionResult r) {
            result = r;
            repaint();
        }

        @Override
        protected void paintComponent(Graphics g) {
            if (result == null) return;
            Graphics2D g2 = (Graphics2D) g.create();
            try {
                double s = Math.min(getWidth() / (double) ContourPlot.WIDTH, getHeight() / (double) ContourPlot.HEIGHT);
                g2.translate((getWidth() - ContourPlot.WIDTH * s) / 2, (getHeight() - ContourPlot.HEIGHT * s) / 2);
                g2.scale(s, s);
                g2.clipRect(0, 0, ContourPlot.WIDTH, ContourPlot.HEIGHT);
                new ContourPlot(Themes.drawingPalette("Arcwright.zone.background")).draw(result, g2);
            } finally {
                g2.dispose();
            }
        }
    }
}
