package org.arcwright.app.shell;

import com.formdev.flatlaf.extras.FlatSVGIcon;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.datatransfer.StringSelection;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.function.Supplier;
import javax.swing.Action;
import javax.swing.ActionMap;
import javax.swing.Icon;
import javax.swing.InputMap;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JToolBar;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.Timer;
import javax.swing.WindowConstants;
import javax.swing.event.MenuEvent;
import javax.swing.event.MenuListener;
import org.arcwright.app.decide.DecidePanel;
import org.arcwright.app.model.AdviceSource;
import org.arcwright.app.model.AnswerDrafts;
import org.arcwright.app.model.Autosaver;
import org.arcwright.app.model.Command;
import org.arcwright.app.model.CommandCatalog;
import org.arcwright.app.model.DecideForm;
import org.arcwright.app.model.RecoveryStore;
import org.arcwright.app.model.Settings;
import org.arcwright.app.model.TeamPacks;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.part.PartPanel;
import org.arcwright.app.simulate.SimulationView;
import org.arcwright.app.zoneview.ZoneViewPanel;
import org.arcwright.app.check.CheckPanel;
import org.arcwright.app.model.CheckRequests;
import org.arcwright.app.notes.NotesPanel;
import org.arcwright.app.stress.StressViewPanel;
import org.arcwright.app.practice.PracticeEditorPanel;
import org.arcwright.app.practice.TeamPackSettings;
import org.arcwright.notes.NotesPaths;
import org.arcwright.notes.NotesStore;
import org.arcwright.render.FrameRenderer;
import org.arcwright.rules.Advisor;
import org.arcwright.services.Practice;
import org.arcwright.pack.PackStack;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.NoticeStrip;
import org.arcwright.app.widgets.LazyTab;
import org.arcwright.app.widgets.Icons;

/**
 * The Arcwright window: the Part panel on the left, the work area (Decide, Zone view, Stress view,
 * Check, Practice editor) in the centre, Notes on the right, the status line below; every command in
 * the menus, on shortcuts and in the command finder.
 */
public final class MainWindow {
    /** Class-path location of the first-run demo worksheet. */
    public static final String DEMO_RESOURCE = FileCommands.DEMO_RESOURCE;
    /** The packs start loading this long after the window opens even if it has not painted. */
    private static final int PACKS_AT_THE_LATEST_MS = 1000;
    /** Shares of the window's width for the Part and the Notes panels; the work area has the rest. */
    private static final double PART_SHARE = 0.24, NOTES_SHARE = 0.2;
    /**
     * Below this window width the Notes column starts collapsed (its divider's arrow opens it), so the
     * work area keeps room for the Decide form beside its results and for the Check plot at 1024×700.
     */
    private static final int NARROW_WIDTH = 1280;
    /** Whether the columns were last set out for a narrow window; null before the first layout. */
    private Boolean narrowColumns;

    private final AppServices services;
    private final Themes themes;
    private final JFrame frame = new JFrame("Arcwright");
    private final WorksheetSession session;
    private final DecideForm decideForm = new DecideForm();
    private final AnswerDrafts answerDrafts = new AnswerDrafts();
    private final CommandCatalog catalog = new CommandCatalog();
    private final StatusLine status = new StatusLine();
    private final NoticeStrip notice = new NoticeStrip();
    private final JTabbedPane work = new JTabbedPane();
    private final Autosaver autosaver;
    private final CommandActions actions;
    private final FileCommands files;
    private final JMenu recentMenu = new JMenu("Open recent");
    private Settings settings;
    private JSplitPane main;
    private JSplitPane right;
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
    /** True when the team packs changed: the notes index reopens over the new packs after the reload. */
    private boolean reopenNotes;
    /** True when the team packs changed while the packs were first loading. */
    private boolean reloadWhenLoaded;

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
        this.files = new FileCommands(frame, session, services, status, notice,
                () -> decideTab != null && decideTab.isBuilt() ? decideTab.panel().unkeptAnswers() : List.of(),
                () -> core == null ? null : core.practice(), this::remember);
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
                Timer fallback = new Timer(PACKS_AT_THE_LATEST_MS, t -> loadPacksOnce());
                fallback.setRepeats(false);
                fallback.start();
            }
        });
        decideTab.whenBuilt(p -> SwingUtilities.invokeLater(() -> {
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
            frame.setIconImages(List.of(((FlatSVGIcon) Icons.get("zone", 32)).getImage()));
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
        decideTab = new LazyTab<>("decide", () -> new DecidePanel(decideForm, session, answerDrafts, AdviceSource.intentOnly(90),
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
                session, this::personalPackPath, this::reloadRulesInBackground, new TeamPackSettings() {
                    @Override
                    public List<String> teamPacks() { return settings.teamPacks(); }

                    @Override
                    public void setTeamPacks(List<String> folders) { changeTeamPacks(folders); }
                }));
        work.addTab("Practice editor", Icons.get("practice"), practiceTab, "Rules of the practice packs (Alt+7)");
        work.addTab("Simulation", null, new LazyTab<>("simulation", () -> new SimulationView(session,
                () -> core == null ? null : core.practice())), "What each candidate callout of the selected feature lets through");
        notesPanel = new NotesPanel(services.search(), services.background(), status::show);
        // the side panels collapse with the divider's arrows, and each column keeps its share of any
        // window width: the weights equal the initial shares (Part 24 %, Notes 20 %, the work area the rest)
        work.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT);
        work.setMinimumSize(new Dimension(440, 0));
        partPanel.setMinimumSize(new Dimension(0, 0));
        notesPanel.setMinimumSize(new Dimension(0, 0));
        right = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, work, notesPanel);
        right.setName("notesSplit");
        right.setResizeWeight(1 - NOTES_SHARE / (1 - PART_SHARE));
        right.setOneTouchExpandable(true);
        right.setContinuousLayout(true);
        right.setBorder(null);
        main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, partPanel, right);
        main.setName("partSplit");
        main.setResizeWeight(PART_SHARE);
        main.setOneTouchExpandable(true);
        main.setContinuousLayout(true);
        main.setBorder(null);
        JPanel top = new JPanel(new BorderLayout());
        top.add(toolBar(), BorderLayout.NORTH);
        top.add(notice, BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout());
        content.add(top, BorderLayout.NORTH);
        content.add(main, BorderLayout.CENTER);
        content.add(status, BorderLayout.SOUTH);
        frame.setContentPane(content);
        Rectangle screen = GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
        int w = Math.min(1480, screen.width);
        frame.setSize(w, Math.min(900, screen.height));
        int partWidth = (int) Math.round(w * PART_SHARE);
        main.setDividerLocation(partWidth);
        right.setDividerLocation(w - partWidth - (int) Math.round(w * NOTES_SHARE));
        main.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { fitColumns(); }
        });
        frame.setLocationRelativeTo(null);
        rebuildRecent();
    }

    /**
     * Sets the columns out again when the window crosses {@link #NARROW_WIDTH}: Part keeps its share,
     * Notes collapses below the width and takes its share again above it. Between crossings the
     * dividers stay where the user put them, and the resize weights share any change of width.
     */
    private void fitColumns() {
        int w = main.getWidth();
        if (w <= 0) return;
        boolean narrow = w < NARROW_WIDTH;
        if (Boolean.valueOf(narrow).equals(narrowColumns)) return;
        narrowColumns = narrow;
        int part = (int) Math.round(w * PART_SHARE);
        int rightWidth = w - part - main.getDividerSize();
        main.setDividerLocation(part);
        right.setDividerLocation(narrow ? rightWidth - right.getDividerSize() : rightWidth - (int) Math.round(w * NOTES_SHARE));
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
            menu.addMenuListener(new MenuListener() {
                public void menuSelected(MenuEvent e) {
                    if (menu.getMenuComponentCount() == 0) fillMenu(menu, group);
                    actions.refresh();
                }
                public void menuDeselected(MenuEvent e) { }
                public void menuCanceled(MenuEvent e) { }
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
        InputMap keys = frame.getRootPane().getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW);
        ActionMap map = frame.getRootPane().getActionMap();
        for (Command c : catalog.all()) {
            if (c.shortcut() == null) continue;
            keys.put(KeyStroke.getKeyStroke(c.shortcut()), c.id());
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
        catalog.add(Command.always("file.new", "New worksheet", "File", "ctrl N", files::newWorksheet));
        catalog.add(Command.always("file.open", "Open worksheet…", "File", "ctrl O", files::openChosen));
        catalog.add(Command.always("file.save", "Save", "File", "ctrl S", files::save));
        catalog.add(Command.always("file.saveAs", "Save as…", "File", "ctrl shift S", files::saveAs));
        catalog.add(new Command("file.export", "Export the sheet (PDF, HTML, Markdown)…", "File", "ctrl E",
                () -> core == null ? Optional.of("the practice packs and templates are still loading") : Optional.empty(),
                files::exportSheet));
        catalog.add(new Command("file.importPoints", "Import measured points to check…", "File", "ctrl I",
                () -> session.selected().isPresent() ? Optional.empty() : Optional.of("no feature is selected"),
                this::importPoints));
        catalog.add(Command.always("file.quit", "Quit", "File", "ctrl Q", this::quit));
        catalog.add(new Command("edit.undo", "Undo", "Edit", "ctrl Z",
                () -> session.canUndo() ? Optional.empty() : Optional.of("there is nothing to undo"), this::undo));
        catalog.add(new Command("edit.redo", "Redo", "Edit", "ctrl shift Z",
                () -> session.canRedo() ? Optional.empty() : Optional.of("there is nothing to redo"), this::redo));
        catalog.add(new Command("edit.copyCallout", "Copy the chosen callout", "Edit", "ctrl shift C",
                this::whyNoCopy, this::copyCallout));
        catalog.add(Command.always("part.add", "Add feature", "Part", "ctrl shift N", this::addFeature));
        catalog.add(new Command("part.duplicate", "Duplicate feature", "Part", "ctrl D", needsSelection,
                this::duplicateFeature));
        catalog.add(new Command("part.delete", "Delete feature", "Part", "ctrl DELETE", needsSelection,
                this::deleteFeature));
        catalog.add(Command.always("view.part", "Go to Part", "View", "alt 1", this::focusPart));
        // in the order of their shortcuts: the work-area views, then Notes (Alt+6), then the Practice editor
        String[] tabs = {"Decide", "Zone view", "Stress view", "Check", "Practice editor"};
        String[] keys = {"alt 2", "alt 3", "alt 4", "alt 5", "alt 7"};
        for (int i = 0; i < tabs.length; i++) {
            int tab = i;
            if (keys[i].equals("alt 7")) catalog.add(Command.always("view.notes", "Go to Notes", "View", "alt 6", this::focusNotes));
            catalog.add(Command.always("view.tab" + i, "Go to " + tabs[i], "View", keys[i], () -> showTab(tab)));
        }
        catalog.add(Command.always("view.packs", "Practice packs in force and team packs…", "View", null, this::showPacks));
        catalog.add(Command.always("view.finder", "Find a command", "View", "ctrl K", this::openFinder));
        catalog.add(Command.always("view.toggleTheme", "Switch light/dark look", "View", "ctrl alt T", this::toggleTheme));
        catalog.add(Command.always("view.light", "Light look", "View", null, () -> setTheme(ThemeChoice.LIGHT)));
        catalog.add(Command.always("view.dark", "Dark look", "View", null, () -> setTheme(ThemeChoice.DARK)));
        catalog.add(Command.always("view.system", "Follow the system's look", "View", null, () -> setTheme(ThemeChoice.SYSTEM)));
        catalog.add(Command.always("help.guide", "Guide", "Help", "F1", this::showGuide));
        catalog.add(Command.always("help.keys", "Keyboard shortcuts and commands", "Help", null, this::openFinder));
        catalog.add(Command.always("help.demo", "Open the demo worksheet", "Help", null, files::showDemo));
        catalog.add(Command.always("help.about", "About Arcwright", "Help", null, this::showAbout));
    }

    // ---- commands ----

    /** Opens {@code file}; a bad file is reported and the current worksheet kept. */
    public void open(Path file) { files.open(file); }

    /** Saves atomically to {@code file}; a failed save leaves the old file and says why. */
    public void saveTo(Path file) { files.saveTo(file); }

    /** Exports the sheet to {@code out} (PDF, HTML or Markdown by extension) in the background, with progress. */
    public void export(Path out) { files.export(out); }

    /** The bundled demo worksheet of an invented part. */
    public static PartWorksheet readDemo(WorksheetFiles files) { return FileCommands.readDemo(files); }

    /**
     * What to open with: after the first run, the most recent worksheet that still reads; else the
     * demo. Runs before the window exists, so it may run on any thread.
     */
    public static Opening opening(Settings settings, WorksheetFiles files) { return FileCommands.opening(settings, files); }

    /** Why the chosen callout cannot be copied now, or empty when it can. */
    private Optional<String> whyNoCopy() {
        Optional<RadiusFeature> f = session.selected();
        if (f.isEmpty()) return Optional.of("no feature is selected");
        return f.get().chosen() == null ? Optional.of(f.get().id() + " has no callout chosen yet") : Optional.empty();
    }

    private void importPoints() {
        showTab(3);
        checkTab.panel().importPoints();
    }

    private void undo() {
        String what = session.undoLabel().orElse(null);
        session.undo();
        if (what != null) status.show("Undid: " + what + " (Ctrl+Shift+Z redoes it)");
    }

    private void redo() {
        String what = session.redoLabel().orElse(null);
        session.redo();
        if (what != null) status.show("Redid: " + what);
    }

    private void showGuide() { HelpDialogs.guide(frame); }

    private void showAbout() { HelpDialogs.about(frame); }

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

    private void quit() {
        if (!files.confirmDiscard()) return;
        services.recovery().clear();
        dispose();
    }

    /** Closes the window, the notes index and the worker threads (waiting for pending writes). */
    public void dispose() {
        frame.dispose();
        services.shutdown();
        if (notesStore != null) notesStore.close();
    }

    // ---- state ----

    private void sessionChanged() {
        frame.setTitle(session.title() + " — Arcwright");
        // the short state in the line (it must fit at 1024 px); what a kept verdict judged, against which callout, in the tooltip
        status.feature(session.selected().map(f -> f.id() + " · " + f.status().label()).orElse("no feature"),
                session.selected().map(f -> f.inspection() == null ? null : f.id() + " " + f.inspection().describe()).orElse(null));
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
            item.addActionListener(e -> files.openRecent(f));
            recentMenu.add(item);
        }
        recentMenu.setEnabled(!settings.recentFiles().isEmpty());
        recentMenu.setToolTipText(settings.recentFiles().isEmpty() ? "Unavailable: no worksheet opened or saved yet" : null);
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
                    + "and look at each panel.", "Start a new worksheet", files::newWorksheet, "Keep exploring", null);
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
        List<Path> team = teamPacks();
        Path personal = personalPackPath();
        new SwingWorker<Loaded, Void>() {
            @Override
            protected Loaded doInBackground() {
                NotesPaths.ensurePersonalPack(personal);
                return new Loaded(Practice.load(team, personal), FrameRenderer.withBundledFont());
            }

            @Override
            protected void done() { packsLoaded(this); }
        }.execute();
    }

    private List<Path> teamPacks() {
        List<Path> team = new ArrayList<>();
        for (String t : settings.teamPacks()) team.add(Path.of(t));
        return team;
    }

    /** The personal pack folder: the one in the settings, else the default under the user's config. */
    private Path personalPackPath() {
        return settings.personalPack() == null ? services.defaultPersonalPack() : Path.of(settings.personalPack());
    }

    /**
     * The team packs chosen on the Practice editor's Packs page: written to the settings (atomically,
     * on the settings thread), then the packs, rules, templates and the notes index follow them.
     */
    private void changeTeamPacks(List<String> folders) {
        updateSettings(settings.withPacks(folders, settings.personalPack()));
        reopenNotes = true;
        // while the first load is still running, it read the old list: reload once it is done
        if (core == null) {
            reloadWhenLoaded = true;
        } else {
            reloadRulesInBackground();
        }
    }

    /**
     * Reloads the packs, the rule book and the note templates off the UI thread after a rule or a
     * template was saved, then gives the advisor (with the open notes, if any) and the Practice
     * editor the new book.
     */
    private void reloadRulesInBackground() {
        if (core == null) return;
        List<Path> team = teamPacks();
        Path personal = personalPackPath();
        Loaded before = core;
        status.progress("Reloading the packs…", -1, null);
        CompletableFuture.supplyAsync(() -> new Loaded(before.practice().reloaded(team, personal), before.frames()),
                services.background()).whenComplete((loaded, e) -> SwingUtilities.invokeLater(() -> {
            if (e != null) {
                status.done("The packs could not reload: " + (e.getCause() != null ? e.getCause().getMessage() : e.getMessage()));
                return;
            }
            core = loaded;
            packs = loaded.practice().packs();
            Advisor advisor = advisorWithNotes(loaded.practice());
            useAdvisor(advisor);
            practiceTab.whenBuilt(p -> p.setRules(packs, loaded.practice().book(), advisor));
            showPacks(packs);
            status.done("Packs reloaded: " + loaded.practice().book().entries().size() + " rules and "
                    + loaded.practice().templates().names().size() + " note templates in force");
            if (reopenNotes) {
                reopenNotes = false;
                openNotesInBackground(packs);
            }
        }));
    }

    /** Opens the Practice editor's Packs page, where the team packs are chosen. */
    private void showPacks() {
        showTab(4);
        practiceTab.whenBuilt(p -> p.showPage("Packs"));
    }

    /** Says in the status line which packs are in force; the tooltip names each, lowest layer first. */
    private void showPacks(PackStack stack) {
        TeamPacks.Summary summary = TeamPacks.summary(stack);
        StringBuilder lines = new StringBuilder("<html>");
        for (String line : summary.lines()) {
            lines.append(line.replace("&", "&amp;").replace("<", "&lt;")).append("<br>");
        }
        status.packs(summary.text(), lines.append("</html>").toString());
    }

    /** The advisor over {@code practice}, with the notes linked once the notes index is open. */
    private Advisor advisorWithNotes(Practice practice) {
        return notesStore == null ? practice.advisor() : practice.advisor(Practice.linker(notesStore));
    }

    /** What loads in the background after the window shows: the practice shared with the CLI, and the frame drawer. */
    private record Loaded(Practice practice, FrameRenderer frames) {}

    private void packsLoaded(SwingWorker<Loaded, Void> worker) {
        try {
            Loaded loaded = worker.get();
            packs = loaded.practice().packs();
            showPacks(packs);
            status.done("Ready");
            stressTab.whenBuilt(p -> p.setMechanics(loaded.practice().mechanics()));
            core = loaded;
            Advisor plain = loaded.practice().advisor();
            useAdvisor(plain);
            practiceTab.whenBuilt(p -> p.setRules(packs, loaded.practice().book(), plain));
            decideTab.whenBuilt(p -> p.setFrames((r, ink) -> loaded.frames().image(r.callout(), decideForm.standard(),
                    decideForm.units(), 110, ink)));
            actions.refresh();
            if (reloadWhenLoaded) {
                reloadWhenLoaded = false;
                reloadRulesInBackground();
            } else {
                reopenNotes = false;
                openNotesInBackground(packs);
            }
            if (!packs.problems().isEmpty()) {
                notice.show("A practice pack could not be opened: " + packs.problems().get(0).getMessage(), "OK", null, null, null);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (ExecutionException e) {
            status.done("Practice packs failed to load: " + e.getCause().getMessage());
            status.packs("Packs: none", null);
        }
    }

    private void openNotesInBackground(PackStack stack) {
        status.progress("Opening the notes index…", -1, null);
        PackStack s = stack;
        CompletableFuture
                .supplyAsync(() -> NotesStore.open(s, NotesStore.indexFolderFor(services.notesIndexRoot(), s)), services.background())
                .whenComplete((store, e) -> SwingUtilities.invokeLater(() -> notesOpened(store, e)));
    }

    private void notesOpened(NotesStore store, Throwable e) {
        if (e != null) {
            status.done("The notes index could not open: " + (e.getCause() != null ? e.getCause().getMessage() : e.getMessage()));
            return;
        }
        NotesStore before = notesStore;
        notesStore = store;
        notesPanel.setStore(store);
        // after a change of team packs: the old index closes once the searches queued on it have run
        if (before != null && before != store) services.search().execute(before::close);
        if (core != null) useAdvisor(advisorWithNotes(core.practice()));
        status.done("Ready · " + store.report().describe());
    }

    private void useAdvisor(Advisor a) {
        decideTab.whenBuilt(p -> p.setAdviceSource(AdviceSource.advisor(a::advise, 90)));
    }

    public NotesPanel notesPanel() { return notesPanel; }

    public StressViewPanel stressPanel() { return stressTab.panel(); }

    public PracticeEditorPanel practicePanel() { return practiceTab.panel(); }

    public CheckPanel checkPanel() { return checkTab.panel(); }

    /** The widths of the Part panel, the work area and the Notes panel, as laid out now (tests). */
    public int[] columnWidths() { return new int[] {partPanel.getWidth(), work.getWidth(), notesPanel.getWidth()}; }

    /** The Swing action of command {@code id}, for tests and toolbars. */
    public Action action(String id) { return actions.get(id); }
}
