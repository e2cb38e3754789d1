package org.arcwright.app.shell;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Toolkit;
import java.awt.datatransfer.StringSelection;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;
import javax.swing.Action;
import javax.swing.Icon;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JToolBar;
import javax.swing.SwingWorker;
import javax.swing.WindowConstants;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.arcwright.app.AppServices;
import org.arcwright.app.decide.DecidePanel;
import org.arcwright.app.model.AdviceSource;
import org.arcwright.app.model.Autosaver;
import org.arcwright.app.model.Command;
import org.arcwright.app.model.CommandCatalog;
import org.arcwright.app.model.DecideForm;
import org.arcwright.app.model.RecoveryStore;
import org.arcwright.app.model.Settings;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.part.PartPanel;
import org.arcwright.app.zoneview.ZoneViewPanel;
import org.arcwright.app.check.CheckPanel;
import org.arcwright.app.model.CheckRequests;
import org.arcwright.app.notes.NotesPanel;
import org.arcwright.app.stress.StressViewPanel;
import org.arcwright.app.practice.PracticeEditorPanel;
import org.arcwright.mechanics.FilletMechanics;
import org.arcwright.notes.NotesPaths;
import org.arcwright.notes.NotesStore;
import org.arcwright.render.FrameRenderer;
import org.arcwright.render.SheetExporter;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.MechanicsChecks;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.NoteLinker;
import org.arcwright.rules.RuleBook;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;

/**
 * The Arcwright window: the Part panel on the left, the work area (Decide, Zone view, Stress view,
 * Check, Practice editor) in the centre, Notes on the right, the status line below; every command in
 * the menus, on shortcuts and in the command finder.
 */
public final class MainWindow {
    /** Class-path location of the first-run demo worksheet. */
    public static final String DEMO_RESOURCE = "/arcwright/examples/tarnbeck-output-shaft.arcpart";
    /** The packs start loading this long after the window opens even if it has not painted. */
    private static final int PACKS_AT_THE_LATEST_MS = 1000;

    private final AppServices services;
    private final Themes themes;
    private final JFrame frame = new JFrame("Arcwright");
    private final WorksheetSession session;
    private final DecideForm decideForm = new DecideForm();
    private final CommandCatalog catalog = new CommandCatalog();
    private final StatusLine status = new StatusLine();
    private final NoticeStrip notice = new NoticeStrip();
    private final JTabbedPane work = new JTabbedPane();
    private final Autosaver autosaver;
    private final CommandActions actions;
    private final JMenu recentMenu = new JMenu("Open recent");
    private Settings settings;
    private PartPanel partPanel;
    private LazyTab<DecidePanel> decideTab;
    private NotesPanel notesPanel;
    private LazyTab<StressViewPanel> stressTab;
    private LazyTab<PracticeEditorPanel> practiceTab;
    private LazyTab<CheckPanel> checkTab;
    private PackStack packs;
    private NotesStore notesStore;
    private Loaded core;
    private boolean packsRequested;

    /**
     * The worksheet the window opens with, read before the window is built (off the event thread).
     *
     * @param worksheet what to show
     * @param file where it was read from, or null for the demo
     */
    public record Opening(PartWorksheet worksheet, Path file) {}

    public MainWindow(AppServices services, Themes themes, Settings settings, Opening opening) {
        this.services = services;
        this.themes = themes;
        this.settings = settings;
        this.session = new WorksheetSession(services.files(), opening.worksheet(), opening.file());
        this.autosaver = new Autosaver(services.recovery(), services.io(), services.clock());
        registerCommands();
        this.actions = new CommandActions(catalog, icons());
        build();
        session.listeners().add(this::sessionChanged);
        sessionChanged();
    }

    public JFrame frame() { return frame; }

    public WorksheetSession session() { return session; }

    public DecideForm decideForm() { return decideForm; }

    public CommandCatalog catalog() { return catalog; }

    public StatusLine statusLine() { return status; }

    public NoticeStrip notice() { return notice; }

    public JTabbedPane workArea() { return work; }

    /** The Decide panel, built now if the window has not painted yet. */
    public DecidePanel decidePanel() { return decideTab.panel(); }

    /**
     * Shows the window, then restores the last work; the packs, fits, rules and notes index start
     * loading in the background once the first frame is painted and the Decide form built.
     */
    public void show() {
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowOpened(WindowEvent e) {
                javax.swing.Timer fallback = new javax.swing.Timer(PACKS_AT_THE_LATEST_MS, t -> loadPacksOnce());
                fallback.setRepeats(false);
                fallback.start();
            }
        });
        decideTab.whenBuilt(p -> javax.swing.SwingUtilities.invokeLater(() -> {
            setWindowIcon();
            loadPacksOnce();
        }));
        frame.setVisible(true);
        frame.toFront();
        partPanel.table().requestFocusInWindow();
        restoreWork();
        status.progress("Loading practice packs…", -1, null);
    }

    /** The taskbar icon, drawn from its SVG after the first frame rather than before it. */
    private void setWindowIcon() {
        if (frame.getIconImages().isEmpty()) {
            frame.setIconImages(List.of(((com.formdev.flatlaf.extras.FlatSVGIcon) Icons.get("zone", 32)).getImage()));
        }
    }

    /** Runs {@code then} on the event thread once the Decide form exists (at once if it does). */
    public void whenDecideBuilt(Runnable then) { decideTab.whenBuilt(p -> then.run()); }

    /**
     * Starts loading the packs, once: after the Decide form is built (which follows the first paint),
     * so that the loading thread does not compete with the first frame, or after a second if the
     * window is never painted (minimised).
     */
    private void loadPacksOnce() {
        if (packsRequested) return;
        packsRequested = true;
        loadPacksInBackground();
    }

    // ---- building ----

    private void build() {
        frame.setName("arcwright");
        frame.setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) { quit(); }
        });
        frame.setJMenuBar(menuBar());
        bindShortcuts();
        partPanel = new PartPanel(session, List.of(actions.get("part.add"), actions.get("part.duplicate"),
                actions.get("part.delete")));
        // the form's sixty-odd controls are built just after the first paint, not before it
        decideTab = new LazyTab<>("decide", () -> new DecidePanel(decideForm, session, AdviceSource.intentOnly(90),
                services.background(), status::show), true);
        work.setName("workArea");
        work.addTab("Decide", Icons.get("decide"), decideTab, "The guided form and its recommendations (Alt+2)");
        work.addTab("Zone view", Icons.get("zone"), new LazyTab<>("zoneView", () -> new ZoneViewPanel(session)),
                "The zone of the chosen control (Alt+3)");
        stressTab = new LazyTab<>("stressView", () -> new StressViewPanel(session, services.background()));
        work.addTab("Stress view", Icons.get("stress"), stressTab, "Stress concentration across the tolerance (Alt+4)");
        checkTab = new LazyTab<>("check", () -> new CheckPanel(session, new CheckRequests(services.json()), services.background(),
                services.clock(), status::show));
        work.addTab("Check", Icons.get("check"), checkTab, "Conformance of a measured contour (Alt+5)");
        practiceTab = new LazyTab<>("practiceEditor", () -> new PracticeEditorPanel(services.json(), services.background(),
                session, this::personalPackPath, this::reloadRulesInBackground));
        work.addTab("Practice editor", Icons.get("practice"), practiceTab, "Rules of the practice packs (Alt+7)");
        work.addTab("Simulation", null, new LazyTab<>("simulation", () -> new org.arcwright.app.simulate.SimulationView(null)),
                "What each candidate callout lets through, on a simulated population of parts");
        notesPanel = new NotesPanel(services.search(), services.background(), status::show);
        JSplitPane right = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, work, notesPanel);
        right.setResizeWeight(1);
        right.setBorder(null);
        JSplitPane main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, partPanel, right);
        main.setResizeWeight(0);
        main.setBorder(null);
        JPanel top = new JPanel(new BorderLayout());
        top.add(toolBar(), BorderLayout.NORTH);
        top.add(notice, BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout());
        content.add(top, BorderLayout.NORTH);
        content.add(main, BorderLayout.CENTER);
        content.add(status, BorderLayout.SOUTH);
        frame.setContentPane(content);
        java.awt.Rectangle screen = java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
        int w = Math.min(1480, screen.width);
        frame.setSize(w, Math.min(900, screen.height));
        int partWidth = Math.min(470, w * 10 / 32);
        main.setDividerLocation(partWidth);
        right.setDividerLocation(w - partWidth - Math.min(290, w * 2 / 9));
        frame.setLocationRelativeTo(null);
        rebuildRecent();
    }

    private JToolBar toolBar() {
        JToolBar bar = new JToolBar();
        bar.setFloatable(false);
        bar.setName("toolbar");
        for (String id : List.of("file.new", "file.open", "file.save", "|", "edit.undo", "edit.redo", "|", "edit.copyCallout",
                "file.export", "|", "view.finder", "view.toggleTheme")) {
            if (id.equals("|")) {
                bar.addSeparator();
                continue;
            }
            JButton b = bar.add(actions.get(id));
            b.setName("tool." + id);
            b.setFocusable(false);
        }
        return bar;
    }

    /**
     * The menus, each filled with its items when first opened, so the first frame builds five menus
     * rather than thirty items; the shortcuts work from the first frame all the same, bound on the
     * root pane from the command list (see {@link #bindShortcuts}).
     */
    private JMenuBar menuBar() {
        JMenuBar bar = new JMenuBar();
        Map<String, Character> mnemonics = Map.of("File", 'F', "Edit", 'E', "Part", 'P', "View", 'V', "Help", 'H');
        for (String group : catalog.groups()) {
            JMenu menu = new JMenu(group);
            menu.setName("menu." + group);
            Character m = mnemonics.get(group);
            if (m != null) menu.setMnemonic(m);
            menu.addMenuListener(new javax.swing.event.MenuListener() {
                public void menuSelected(javax.swing.event.MenuEvent e) {
                    if (menu.getMenuComponentCount() == 0) fillMenu(menu, group);
                    actions.refresh();
                }
                public void menuDeselected(javax.swing.event.MenuEvent e) { }
                public void menuCanceled(javax.swing.event.MenuEvent e) { }
            });
            bar.add(menu);
        }
        return bar;
    }

    private void fillMenu(JMenu menu, String group) {
        for (Command c : catalog.group(group)) {
            JMenuItem item = new JMenuItem(actions.get(c.id()));
            item.setName("item." + c.id());
            menu.add(item);
            if (c.id().equals("file.open")) menu.add(recentMenu);
        }
    }

    /** Every command's shortcut, bound on the root pane so it works before any menu was opened. */
    private void bindShortcuts() {
        javax.swing.InputMap keys = frame.getRootPane().getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW);
        javax.swing.ActionMap map = frame.getRootPane().getActionMap();
        for (Command c : catalog.all()) {
            if (c.shortcut() == null) continue;
            keys.put(javax.swing.KeyStroke.getKeyStroke(c.shortcut()), c.id());
            map.put(c.id(), actions.get(c.id()));
        }
    }

    private Map<String, Icon> icons() {
        Map<String, Icon> m = new LinkedHashMap<>();
        m.put("file.new", Icons.get("new"));
        m.put("file.open", Icons.get("open"));
        m.put("file.save", Icons.get("save"));
        m.put("file.export", Icons.get("export"));
        m.put("edit.undo", Icons.get("undo"));
        m.put("edit.redo", Icons.get("redo"));
        m.put("edit.copyCallout", Icons.get("copy"));
        m.put("part.add", Icons.get("add"));
        m.put("part.duplicate", Icons.get("duplicate"));
        m.put("part.delete", Icons.get("delete"));
        m.put("view.finder", Icons.get("finder"));
        m.put("view.toggleTheme", Icons.get("theme"));
        return m;
    }

    private void registerCommands() {
        Supplier<Optional<String>> needsSelection = () -> session.selected().isPresent() ? Optional.empty()
                : Optional.of("no feature is selected");
        catalog.add(Command.always("file.new", "New worksheet", "File", "ctrl N", this::newWorksheet));
        catalog.add(Command.always("file.open", "Open worksheet…", "File", "ctrl O", this::openChosen));
        catalog.add(Command.always("file.save", "Save", "File", "ctrl S", this::save));
        catalog.add(Command.always("file.saveAs", "Save as…", "File", "ctrl shift S", this::saveAs));
        catalog.add(new Command("file.export", "Export the sheet (PDF, HTML, Markdown)…", "File", "ctrl E",
                () -> core == null ? Optional.of("the practice packs and templates are still loading") : Optional.empty(),
                this::exportSheet));
        catalog.add(Command.always("file.quit", "Quit", "File", "ctrl Q", this::quit));
        catalog.add(new Command("edit.undo", "Undo", "Edit", "ctrl Z",
                () -> session.canUndo() ? Optional.empty() : Optional.of("there is nothing to undo"), session::undo));
        catalog.add(new Command("edit.redo", "Redo", "Edit", "ctrl shift Z",
                () -> session.canRedo() ? Optional.empty() : Optional.of("there is nothing to redo"), session::redo));
        catalog.add(new Command("edit.copyCallout", "Copy the chosen callout", "Edit", "ctrl shift C",
                () -> session.selected().map(f -> f.chosen() == null ? "the selected feature has no callout yet" : null)
                        .map(Optional::ofNullable).orElse(Optional.of("no feature is selected")), this::copyCallout));
        catalog.add(Command.always("part.add", "Add feature", "Part", "ctrl shift N", this::addFeature));
        catalog.add(new Command("part.duplicate", "Duplicate feature", "Part", "ctrl D", needsSelection,
                this::duplicateFeature));
        catalog.add(new Command("part.delete", "Delete feature", "Part", "ctrl DELETE", needsSelection,
                this::deleteFeature));
        catalog.add(Command.always("view.part", "Go to Part", "View", "alt 1", this::focusPart));
        String[] tabs = {"Decide", "Zone view", "Stress view", "Check", "Practice editor"};
        String[] keys = {"alt 2", "alt 3", "alt 4", "alt 5", "alt 7"};
        for (int i = 0; i < tabs.length; i++) {
            int tab = i;
            catalog.add(Command.always("view.tab" + i, "Go to " + tabs[i], "View", keys[i], () -> showTab(tab)));
        }
        catalog.add(Command.always("view.notes", "Go to Notes", "View", "alt 6", this::focusNotes));
        catalog.add(Command.always("view.finder", "Find a command", "View", "ctrl K", this::openFinder));
        catalog.add(Command.always("view.toggleTheme", "Switch light/dark look", "View", "ctrl alt T", this::toggleTheme));
        catalog.add(Command.always("view.light", "Light look", "View", null, () -> setTheme(ThemeChoice.LIGHT)));
        catalog.add(Command.always("view.dark", "Dark look", "View", null, () -> setTheme(ThemeChoice.DARK)));
        catalog.add(Command.always("view.system", "Follow the system's look", "View", null, () -> setTheme(ThemeChoice.SYSTEM)));
        catalog.add(Command.always("help.keys", "Keyboard shortcuts", "Help", "F1", this::openFinder));
        catalog.add(Command.always("help.demo", "Open the demo worksheet", "Help", null, this::showDemo));
    }

    // ---- commands ----

    private void newWorksheet() {
        if (!confirmDiscard()) return;
        session.newWorksheet(Units.MM, DrawingStyle.ASME);
        status.show("New worksheet");
    }

    private void openChosen() {
        if (!confirmDiscard()) return;
        JFileChooser chooser = chooser();
        if (chooser.showOpenDialog(frame) == JFileChooser.APPROVE_OPTION) open(chooser.getSelectedFile().toPath());
    }

    /** Opens {@code file}; a bad file is reported and the current worksheet kept. */
    public void open(Path file) {
        try {
            session.open(file);
            remember(file);
            status.show("Opened " + file.getFileName());
        } catch (InputProblem | UncheckedIOException e) {
            notice.show("Could not open " + file.getFileName() + ": " + e.getMessage(), "OK", null, null, null);
        }
    }

    private void save() {
        if (!session.file().isPresent()) {
            saveAs();
            return;
        }
        saveTo(session.file().get());
    }

    private void saveAs() {
        JFileChooser chooser = chooser();
        chooser.setSelectedFile(new java.io.File(session.worksheet().part().number() + WorksheetFiles.EXTENSION));
        if (chooser.showSaveDialog(frame) == JFileChooser.APPROVE_OPTION) saveTo(chooser.getSelectedFile().toPath());
    }

    /** Saves atomically to {@code file}; a failed save leaves the old file and says why. */
    public void saveTo(Path file) {
        try {
            session.saveAs(file);
            remember(session.file().orElse(file));
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

    private void copyCallout() {
        session.selected().map(RadiusFeature::chosen).ifPresent(r -> {
            Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new StringSelection(r.text()), null);
            status.show("Copied " + r.text());
        });
    }

    private void addFeature() {
        RadiusFeature f = session.addFeature();
        status.show("Added " + f.id() + ": describe it in Decide");
        showTab(0);
    }

    private void duplicateFeature() { session.duplicateSelected().ifPresent(f -> status.show("Duplicated as " + f.id())); }

    private void deleteFeature() {
        String id = session.selected().map(RadiusFeature::id).orElse("");
        if (session.deleteSelected()) status.show("Deleted " + id + " (Ctrl+Z to undo)");
    }

    private void focusPart() { partPanel.table().requestFocusInWindow(); }

    private void focusNotes() { notesPanel.focusSearch(); }

    /** Shows work-area tab {@code index} and moves the keyboard focus into it. */
    public void showTab(int index) {
        work.setSelectedIndex(index);
        Component c = work.getSelectedComponent();
        c.requestFocusInWindow();
    }

    private void openFinder() { new CommandFinder(frame, actions).open(); }

    private void toggleTheme() { setTheme(themes.isDark() ? ThemeChoice.LIGHT : ThemeChoice.DARK); }

    /** Switches the look and remembers the choice. */
    public void setTheme(ThemeChoice choice) {
        themes.switchTo(choice);
        updateSettings(settings.withTheme(choice));
        status.show((themes.isDark() ? "Dark" : "Light") + " look" + (choice == ThemeChoice.SYSTEM ? ", following the system" : ""));
    }

    private void showDemo() {
        if (!confirmDiscard()) return;
        session.showFresh(demo());
    }

    private void quit() {
        if (!confirmDiscard()) return;
        services.recovery().clear();
        dispose();
    }

    /** Closes the window, the notes index and the worker threads (waiting for pending writes). */
    public void dispose() {
        frame.dispose();
        services.shutdown();
        if (notesStore != null) notesStore.close();
    }

    private boolean confirmDiscard() {
        if (!session.isDirty()) return true;
        int answer = JOptionPane.showConfirmDialog(frame, "Save the changes to " + session.title().replace("• ", "") + "?",
                "Unsaved changes", JOptionPane.YES_NO_CANCEL_OPTION);
        if (answer == JOptionPane.CANCEL_OPTION || answer == JOptionPane.CLOSED_OPTION) return false;
        if (answer == JOptionPane.YES_OPTION) save();
        return !session.isDirty() || answer == JOptionPane.NO_OPTION;
    }

    // ---- state ----

    private void sessionChanged() {
        frame.setTitle(session.title() + " — Arcwright");
        status.feature(session.selected().map(f -> f.id() + " · " + f.status().label()).orElse("no feature"));
        actions.refresh();
        autosaver.sessionChanged(session);
    }

    private void remember(Path file) {
        updateSettings(settings.withRecent(file.toAbsolutePath().toString()));
        rebuildRecent();
    }

    private void updateSettings(Settings next) {
        settings = next;
        services.io().execute(() -> services.settings().save(next));
    }

    private void rebuildRecent() {
        recentMenu.removeAll();
        for (String f : settings.recentFiles()) {
            JMenuItem item = new JMenuItem(Path.of(f).getFileName().toString());
            item.setToolTipText(f);
            item.addActionListener(e -> openRecent(f));
            recentMenu.add(item);
        }
        recentMenu.setEnabled(!settings.recentFiles().isEmpty());
        recentMenu.setToolTipText(settings.recentFiles().isEmpty() ? "Unavailable: no worksheet opened or saved yet" : null);
    }

    private void openRecent(String f) {
        if (confirmDiscard()) open(Path.of(f));
    }

    private PartWorksheet demo() { return readDemo(services.files()); }

    /** The bundled demo worksheet of an invented part. */
    public static PartWorksheet readDemo(WorksheetFiles files) {
        try (InputStream in = MainWindow.class.getResourceAsStream(DEMO_RESOURCE)) {
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
    public static Opening opening(Settings settings, WorksheetFiles files) {
        if (settings.demoShown()) {
            for (String f : settings.recentFiles()) {
                Path p = Path.of(f);
                if (!Files.isRegularFile(p)) continue;
                try {
                    return new Opening(files.read(p), p);
                } catch (RuntimeException e) {
                    break;
                }
            }
        }
        return new Opening(readDemo(files), null);
    }

    /** The first run shows the demo; later runs offer an autosave left behind, else reopen the last file. */
    private void restoreWork() {
        Optional<RecoveryStore.Recovered> recovered = services.recovery().find();
        if (recovered.isPresent()) {
            RecoveryStore.Recovered r = recovered.get();
            notice.show("Unsaved changes to " + r.worksheet().part().number() + " were kept from your last session ("
                    + r.savedAt() + ").", "Restore them", () -> restore(r), "Discard", this::discardRecovery);
            return;
        }
        if (!settings.demoShown()) {
            updateSettings(settings.withDemoShown());
            notice.show("This is a demo worksheet of an invented part, Tarnbeck Drives' output shaft: select a feature "
                    + "and look at each panel.", "Start a new worksheet", this::newWorksheet, "Keep exploring", null);
            return;
        }
        session.file().ifPresent(f -> status.show("Reopened " + f.getFileName()));
    }

    private void restore(RecoveryStore.Recovered r) {
        session.showUnsaved(r.worksheet(), r.sourcePath().orElse(null));
        status.show("Restored the autosaved worksheet: save it to keep it");
    }

    private void discardRecovery() {
        services.io().execute(services.recovery()::clear);
        status.show("Discarded the autosave");
    }

    private void loadPacksInBackground() {
        List<Path> team = new ArrayList<>();
        for (String t : settings.teamPacks()) team.add(Path.of(t));
        Path personal = personalPackPath();
        new SwingWorker<Loaded, Void>() {
            @Override
            protected Loaded doInBackground() {
                NotesPaths.ensurePersonalPack(personal);
                PackStack stack = PackStack.load(team, personal);
                RuleBook book = RuleBook.load(stack);
                return new Loaded(stack, FilletMechanics.load(stack), book, MechanicsChecks.standard(stack),
                        FrameRenderer.withBundledFont(), NoteTemplates.load(stack));
            }

            @Override
            protected void done() { packsLoaded(this); }
        }.execute();
    }

    /** The personal pack folder: the one in the settings, else the default under the user's config. */
    private Path personalPackPath() {
        return settings.personalPack() == null ? services.defaultPersonalPack() : Path.of(settings.personalPack());
    }

    /**
     * Reloads the packs, the rule book and the note templates off the UI thread after a rule or a
     * template was saved, then gives the
     * advisor (with the open notes, if any) and the Practice editor the new book.
     */
    private void reloadRulesInBackground() {
        if (core == null) return;
        List<Path> team = new ArrayList<>();
        for (String t : settings.teamPacks()) team.add(Path.of(t));
        Path personal = personalPackPath();
        status.progress("Reloading the packs…", -1, null);
        java.util.concurrent.CompletableFuture.supplyAsync(() -> {
            PackStack stack = PackStack.load(team, personal);
            return new Loaded(stack, core.mechanics(), RuleBook.load(stack), core.checks(), core.frames(), NoteTemplates.load(stack));
        }, services.background()).whenComplete((loaded, e) -> javax.swing.SwingUtilities.invokeLater(() -> {
            if (e != null) {
                status.done("The packs could not reload: " + (e.getCause() != null ? e.getCause().getMessage() : e.getMessage()));
                return;
            }
            core = loaded;
            packs = loaded.packs();
            NotesStore store = notesStore;
            NoteLinker linker = store == null ? NoteLinker.NONE : (tags, text, limit) -> store.related(tags, text, limit)
                    .stream().map(h -> new NoteLink(h.id(), h.title(), h.pack())).toList();
            Advisor advisor = new Advisor(loaded.book(), loaded.checks(), linker);
            useAdvisor(advisor);
            practiceTab.whenBuilt(p -> p.setRules(loaded.packs(), loaded.book(), advisor));
            status.done("Packs reloaded: " + loaded.book().entries().size() + " rules and "
                    + loaded.templates().names().size() + " note templates in force");
        }));
    }

    /** What loads in the background after the window shows. */
    private record Loaded(PackStack packs, FilletMechanics mechanics, RuleBook book, MechanicsChecks checks,
                          FrameRenderer frames, NoteTemplates templates) {}

    private void packsLoaded(SwingWorker<Loaded, Void> worker) {
        try {
            Loaded loaded = worker.get();
            packs = loaded.packs();
            StringBuilder names = new StringBuilder();
            packs.packs().forEach(p -> names.append(p.name()).append(" (").append(p.layer()).append(")<br>"));
            status.packs("Packs: " + packs.packs().size(), "<html>" + names + "</html>");
            status.done("Ready");
            stressTab.whenBuilt(p -> p.setMechanics(loaded.mechanics()));
            core = loaded;
            Advisor plain = new Advisor(loaded.book(), loaded.checks(), NoteLinker.NONE);
            useAdvisor(plain);
            practiceTab.whenBuilt(p -> p.setRules(loaded.packs(), loaded.book(), plain));
            decideTab.whenBuilt(p -> p.setFrames((r, ink) -> loaded.frames().image(r.callout(), decideForm.standard(),
                    decideForm.units(), 110, ink)));
            actions.refresh();
            openNotesInBackground(packs);
            if (!packs.problems().isEmpty()) {
                notice.show("A practice pack could not be opened: " + packs.problems().get(0).getMessage(), "OK", null, null, null);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (java.util.concurrent.ExecutionException e) {
            status.done("Practice packs failed to load: " + e.getCause().getMessage());
            status.packs("Packs: none", null);
        }
    }

    private void openNotesInBackground(PackStack stack) {
        status.progress("Opening the notes index…", -1, null);
        PackStack s = stack;
        java.util.concurrent.CompletableFuture
                .supplyAsync(() -> NotesStore.open(s, NotesStore.indexFolderFor(services.notesIndexRoot(), s)), services.background())
                .whenComplete((store, e) -> javax.swing.SwingUtilities.invokeLater(() -> notesOpened(store, e)));
    }

    private void notesOpened(NotesStore store, Throwable e) {
        if (e != null) {
            status.done("The notes index could not open: " + (e.getCause() != null ? e.getCause().getMessage() : e.getMessage()));
            return;
        }
        notesStore = store;
        notesPanel.setStore(store);
        if (core != null) {
            NoteLinker linker = (tags, text, limit) -> store.related(tags, text, limit).stream()
                    .map(h -> new NoteLink(h.id(), h.title(), h.pack())).toList();
            useAdvisor(new Advisor(core.book(), core.checks(), linker));
        }
        status.done("Ready · " + store.report().describe());
    }

    private void useAdvisor(Advisor a) {
        decideTab.whenBuilt(p -> p.setAdviceSource(AdviceSource.advisor(c -> a.advise(c).recommendations(), 90)));
    }

    private void exportSheet() {
        JFileChooser c = new JFileChooser(session.file().map(p -> p.toAbsolutePath().getParent().toFile()).orElse(null));
        c.setFileFilter(new FileNameExtensionFilter("Sheets (*.pdf, *.html, *.md)", "pdf", "html", "md"));
        c.setSelectedFile(new java.io.File(session.worksheet().part().number() + ".pdf"));
        if (c.showSaveDialog(frame) == JFileChooser.APPROVE_OPTION) export(c.getSelectedFile().toPath());
    }

    /** Exports the sheet to {@code out} (PDF, HTML or Markdown by extension) in the background, with progress. */
    public void export(Path out) {
        Loaded loaded = core;
        PartWorksheet ws = session.worksheet();
        java.util.concurrent.Future<?>[] job = new java.util.concurrent.Future<?>[1];
        status.progress("Exporting " + out.getFileName() + "…", 0, () -> cancelExport(job[0]));
        job[0] = services.background().submit(() -> {
            try {
                SheetExporter.withBundledFont().export(ws, loaded.templates(), "Arcwright", out,
                        (done, total, step) -> javax.swing.SwingUtilities.invokeLater(() ->
                                status.progress("Exporting: " + step, total == 0 ? -1 : 100 * done / total, () -> cancelExport(job[0]))));
                javax.swing.SwingUtilities.invokeLater(() -> status.done("Exported " + out.getFileName()));
            } catch (RuntimeException e) {
                javax.swing.SwingUtilities.invokeLater(() -> status.done("Export failed: " + e.getMessage()));
            }
        });
    }

    private void cancelExport(java.util.concurrent.Future<?> job) {
        if (job != null) job.cancel(true);
        status.done("Export cancelled");
    }

    public NotesPanel notesPanel() { return notesPanel; }

    public StressViewPanel stressPanel() { return stressTab.panel(); }

    public PracticeEditorPanel practicePanel() { return practiceTab.panel(); }

    public CheckPanel checkPanel() { return checkTab.panel(); }

    /** The Swing action of command {@code id}, for tests and toolbars. */
    public Action action(String id) { return actions.get(id); }
}
