package org.arcwright.app.shell;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JOptionPane;
import javax.swing.SwingUtilities;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.arcwright.app.model.Settings;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.NoticeStrip;
import org.arcwright.io.InputProblem;
import org.arcwright.services.Practice;
import org.arcwright.services.SheetService;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;

/**
 * The window's file commands: new, open, open recent, save, save as, the demo and the sheet
 * export, each asking before anything not saved is dropped. Split from {@link MainWindow}, which
 * keeps the layout and the command table.
 */
final class FileCommands {
    /** Class-path location of the first-run demo worksheet. */
    static final String DEMO_RESOURCE = "/arcwright/examples/tarnbeck-output-shaft.arcpart";
    private final JFrame frame;
    private final WorksheetSession session;
    private final AppServices services;
    private final StatusLine status;
    private final NoticeStrip notice;
    private final Supplier<List<String>> unkeptAnswers;
    private final Supplier<Practice> practice;
    private final Consumer<Path> remember;

    /**
     * @param unkeptAnswers the features whose Decide answers are typed but not kept
     * @param practice the practice in force, or null while it loads
     * @param remember told of each file opened or saved (the recent list)
     */
    FileCommands(JFrame frame, WorksheetSession session, AppServices services, StatusLine status, NoticeStrip notice,
                 Supplier<List<String>> unkeptAnswers, Supplier<Practice> practice, Consumer<Path> remember) {
        this.frame = Objects.requireNonNull(frame, "frame");
        this.session = Objects.requireNonNull(session, "session");
        this.services = Objects.requireNonNull(services, "services");
        this.status = Objects.requireNonNull(status, "status");
        this.notice = Objects.requireNonNull(notice, "notice");
        this.unkeptAnswers = Objects.requireNonNull(unkeptAnswers, "unkeptAnswers");
        this.practice = Objects.requireNonNull(practice, "practice");
        this.remember = Objects.requireNonNull(remember, "remember");
    }

    void newWorksheet() {
        if (!confirmDiscard()) return;
        session.newWorksheet(Units.MM, DrawingStyle.ASME);
        status.show("New worksheet");
    }

    void openChosen() {
        if (!confirmDiscard()) return;
        JFileChooser chooser = chooser();
        if (chooser.showOpenDialog(frame) == JFileChooser.APPROVE_OPTION) open(chooser.getSelectedFile().toPath());
    }

    /** Opens {@code file}; a bad file is reported and the current worksheet kept. */
    public void open(Path file) {
        try {
            session.open(file);
            remember.accept(file);
            status.show("Opened " + file.getFileName());
        } catch (InputProblem | UncheckedIOException e) {
            notice.show("Could not open " + file.getFileName() + ": " + e.getMessage(), "OK", null, null, null);
        }
    }

    void save() {
        if (!session.file().isPresent()) {
            saveAs();
            return;
        }
        saveTo(session.file().get());
    }

    void saveAs() {
        JFileChooser chooser = chooser();
        chooser.setSelectedFile(new File(session.worksheet().part().number() + WorksheetFiles.EXTENSION));
        if (chooser.showSaveDialog(frame) == JFileChooser.APPROVE_OPTION) saveTo(chooser.getSelectedFile().toPath());
    }

    /** Saves atomically to {@code file}; a failed save leaves the old file and says why. */
    public void saveTo(Path file) {
        try {
            session.saveAs(file);
            remember.accept(session.file().orElse(file));
            status.show("Saved " + session.file().map(Path::getFileName).orElse(file.getFileName()));
        } catch (UncheckedIOException e) {
            notice.show("Not saved: " + e.getMessage() + ". The file on disk is unchanged.", "OK", null, null, null);
        }
    }

    private JFileChooser chooser() {
        JFileChooser c = new JFileChooser(session.file().map(p -> p.toAbsolutePath().getParent().toFile()).orElse(null));
        c.setFileFilter(new FileNameExtensionFilter("Arcwright part worksheets (*" + WorksheetFiles.EXTENSION + ")",
                WorksheetFiles.EXTENSION.substring(1)));
        return c;
    }

    void showDemo() {
        if (!confirmDiscard()) return;
        session.showFresh(demo());
    }

    /** Asks before answers or edits not saved would be dropped; false when the user cancels. */
    boolean confirmDiscard() {
        List<String> unkept = unkeptAnswers.get();
        if (!unkept.isEmpty()) {
            int answer = JOptionPane.showConfirmDialog(frame, "The answers typed in Decide for " + String.join(", ", unkept)
                    + " are not kept on the worksheet. Drop them?", "Answers not kept", JOptionPane.OK_CANCEL_OPTION);
            if (answer != JOptionPane.OK_OPTION) return false;
        }
        if (!session.isDirty()) return true;
        int answer = JOptionPane.showConfirmDialog(frame, "Save the changes to " + session.title().replace("• ", "") + "?",
                "Unsaved changes", JOptionPane.YES_NO_CANCEL_OPTION);
        if (answer == JOptionPane.CANCEL_OPTION || answer == JOptionPane.CLOSED_OPTION) return false;
        if (answer == JOptionPane.YES_OPTION) save();
        return !session.isDirty() || answer == JOptionPane.NO_OPTION;
    }

    void openRecent(String f) {
        if (confirmDiscard()) open(Path.of(f));
    }

    PartWorksheet demo() { return readDemo(services.files()); }

    /** The bundled demo worksheet of an invented part. */
    static PartWorksheet readDemo(WorksheetFiles files) {
        try (InputStream in = FileCommands.class.getResourceAsStream(DEMO_RESOURCE)) {
            if (in == null) throw new IllegalStateException("demo worksheet missing: " + DEMO_RESOURCE);
            return files.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), DEMO_RESOURCE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * What to open with: after the first run, the most recent worksheet that still reads; else the
     * demo. Runs before the window exists, so it may run on any thread.
     */
    static MainWindow.Opening opening(Settings settings, WorksheetFiles files) {
        if (settings.demoShown()) {
            for (String f : settings.recentFiles()) {
                Path p = Path.of(f);
                if (!Files.isRegularFile(p)) continue;
                try {
                    return new MainWindow.Opening(files.read(p), p);
                } catch (RuntimeException e) {
                    break;
                }
            }
        }
        return new MainWindow.Opening(readDemo(files), null);
    }

    void exportSheet() {
        JFileChooser c = new JFileChooser(session.file().map(p -> p.toAbsolutePath().getParent().toFile()).orElse(null));
        c.setFileFilter(new FileNameExtensionFilter("Sheets (*.pdf, *.html, *.md)", "pdf", "html", "md"));
        c.setSelectedFile(new File(session.worksheet().part().number() + ".pdf"));
        if (c.showSaveDialog(frame) == JFileChooser.APPROVE_OPTION) export(c.getSelectedFile().toPath());
    }

    /** Exports the sheet to {@code out} (PDF, HTML or Markdown by extension) in the background, with progress. */
    public void export(Path out) {
        Practice loaded = practice.get();
        if (loaded == null) {
            status.show("Not exported: the practice packs and templates are still loading");
            return;
        }
        PartWorksheet ws = session.worksheet();
        Future<?>[] job = new Future<?>[1];
        status.progress("Exporting " + out.getFileName() + "…", 0, () -> cancelExport(job[0]));
        job[0] = services.background().submit(() -> {
            try {
                // the same sheet service, suggestions and generated-by line as `arcwright sheet`
                SheetService.withBundledFont().export(ws, loaded, true, out,
                        (done, total, step) -> SwingUtilities.invokeLater(() ->
                                status.progress("Exporting: " + step, total == 0 ? -1 : 100 * done / total, () -> cancelExport(job[0]))));
                SwingUtilities.invokeLater(() -> status.done("Exported " + out.getFileName()));
            } catch (RuntimeException e) {
                SwingUtilities.invokeLater(() -> status.done("Export failed: " + e.getMessage()));
            }
        });
    }

    private void cancelExport(Future<?> job) {
        if (job != null) job.cancel(true);
        status.done("Export cancelled");
    }
}
