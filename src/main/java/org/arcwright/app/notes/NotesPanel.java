package org.arcwright.app.notes;

import com.formdev.flatlaf.FlatClientProperties;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.function.Consumer;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JEditorPane;
import javax.swing.JSplitPane;
import java.awt.Dimension;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.NoteSearch;
import org.arcwright.app.widgets.Icons;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.TextEdits;
import org.arcwright.notes.FacetCount;
import org.arcwright.notes.FiledNote;
import org.arcwright.notes.Note;
import org.arcwright.notes.NoteFacet;
import org.arcwright.notes.NoteHit;
import org.arcwright.notes.NoteLibrary;
import org.arcwright.notes.SearchResult;

/**
 * The Notes side panel: search the practice notes as you type (debounced, searched off the UI
 * thread), matched words in bold in each snippet, facets to narrow by function, standard, process
 * and pack, a note opened below the list, and a form to write a note into the personal pack.
 */
public final class NotesPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    /** The least height of the list part and of the reader part: each stays usable at 1024x700. */
    private static final int MIN_PART = 150;
    private static final int PREFERRED_WIDTH = 220;
    private static final List<NoteFacet> FACETS = List.of(NoteFacet.FUNCTION, NoteFacet.PROCESS, NoteFacet.STANDARD,
            NoteFacet.PACK);
    private final transient Executor background;
    private final transient Consumer<String> status;
    private transient NoteLibrary store;
    private transient NoteSearch search;
    private final JTextField query = new JTextField();
    private final DefaultListModel<NoteHit> hits = new DefaultListModel<>();
    private final JList<NoteHit> list = new JList<>(hits);
    private final JPanel facets = new JPanel(new MigLayout("insets 0, wrap 1, gap 0 0", "[grow,fill]", ""));
    private final JLabel count = new JLabel("Notes load after the window opens…");
    private final JEditorPane reader = new JEditorPane();
    private final JButton write = new JButton("Write a note…", Icons.get("notes"));
    private final JButton override = new JButton("Override this note…");
    private final JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, true) {
        private static final long serialVersionUID = 1L;

        /** Keeps both parts at least MIN_PART high whenever the panel is laid out (after a search, a save, a resize). */
        @Override
        public void doLayout() {
            super.doLayout();
            int most = getHeight() - getDividerSize() - MIN_PART;
            int at = getDividerLocation();
            int kept = Math.max(MIN_PART, Math.min(at, most));
            if (most >= MIN_PART && kept != at) {
                setDividerLocation(kept);
                super.doLayout();
            }
        }
    };
    private transient FiledNote shown;
    private final Timer debounce = new Timer(150, e -> searchNow());
    private boolean rebuildingFacets;

    /** @param searchThread a single thread for searches, so they run in order off the UI thread */
    public NotesPanel(ExecutorService searchThread, Executor background, Consumer<String> status) {
        super(new MigLayout("insets 8, wrap 1, gap 4", "[grow,fill]", "[][][][grow,fill]"));
        this.background = background;
        this.status = status;
        setName("notesPanel");
        query.setName("notesQuery");
        list.setName("notesHits");
        reader.setName("notesReader");
        query.putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT, "Search notes…");
        query.putClientProperty(FlatClientProperties.TEXT_FIELD_LEADING_ICON, Icons.get("finder"));
        query.putClientProperty(FlatClientProperties.TEXT_FIELD_SHOW_CLEAR_BUTTON, true);
        query.setEnabled(false);
        query.setToolTipText("Unavailable until the notes index has opened");
        write.setEnabled(false);
        write.setToolTipText("Unavailable until the notes index has opened");
        write.setName("notesWrite");
        write.addActionListener(e -> writeNote());
        override.setName("notesOverride");
        override.setEnabled(false);
        override.setToolTipText("Open a note to override it or edit it");
        override.addActionListener(e -> overrideNote());
        count.putClientProperty(FlatClientProperties.STYLE_CLASS, "small");
        count.setName("notesCount");
        list.setCellRenderer(new HitCell());
        list.addListSelectionListener(e -> opened(e.getValueIsAdjusting()));
        reader.setEditable(false);
        reader.setContentType("text/html");
        reader.putClientProperty(JEditorPane.HONOR_DISPLAY_PROPERTIES, Boolean.TRUE);
        facets.setOpaque(false);
        debounce.setRepeats(false);
        TextEdits.onEdit(query.getDocument(), () -> typed());
        JLabel title = new JLabel("Notes");
        title.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        add(title, "split 2");
        add(write, "gapleft push, wmin 10");
        add(query, "wmin 10");
        add(count);
        JScrollPane facetScroll = new JScrollPane(facets);
        facetScroll.setBorder(null);
        facetScroll.getVerticalScrollBar().setUnitIncrement(16);
        JPanel top = new JPanel(new MigLayout("insets 0, wrap 1, gap 4", "[grow,fill]", "[grow,fill][]"));
        top.add(new JScrollPane(list), "wmin 10, hmin 90");
        top.add(facetScroll, "wmin 10, hmin 0, hmax 160");
        top.setMinimumSize(new Dimension(10, MIN_PART));
        // a long note or title must not widen the column: the panel's width comes from the window
        top.setPreferredSize(new Dimension(PREFERRED_WIDTH, 2 * MIN_PART));
        JPanel bottom = new JPanel(new MigLayout("insets 0, wrap 1, gap 4", "[grow,fill]", "[][grow,fill]"));
        bottom.add(override, "growx 0, alignx right, wmin 10");
        bottom.add(new JScrollPane(reader), "wmin 10, hmin 60");
        bottom.setMinimumSize(new Dimension(10, MIN_PART));
        bottom.setPreferredSize(new Dimension(PREFERRED_WIDTH, 2 * MIN_PART));
        split.setName("notesListReaderSplit");
        split.setTopComponent(top);
        split.setBottomComponent(bottom);
        split.setResizeWeight(0.5);
        split.setBorder(null);
        add(split, "wmin 10, hmin " + (2 * MIN_PART));
        this.search = null;
        this.searchThread = searchThread;
    }

    private final transient ExecutorService searchThread;

    /** Called once the notes store has opened; enables searching and lists every note. */
    public void setStore(NoteLibrary s) {
        this.store = s;
        this.search = new NoteSearch(q -> s.search(q.text(), q.filters(), q.limit()), searchThread,
                r -> SwingUtilities.invokeLater(() -> show(r)));
        query.setEnabled(true);
        query.setToolTipText("Words of the note: matched in titles, tags and text, as you type");
        write.setEnabled(true);
        write.setToolTipText("Write a practice note into your personal pack");
        search.run();
    }

    /** Moves the keyboard focus to the search field. */
    public void focusSearch() { query.requestFocusInWindow(); }

    public JTextField queryField() { return query; }

    /** Titles of the notes listed now, for tests. */
    public List<String> listedTitles() {
        return Arrays.stream(hits.toArray()).map(h -> ((NoteHit) h).title()).toList();
    }

    private void typed() { debounce.restart(); }

    private void searchNow() { if (search != null) search.setQuery(query.getText()); }

    private void show(SearchResult r) {
        if (!r.query().equals(search.query())) return;
        NoteHit selected = list.getSelectedValue();
        hits.clear();
        for (NoteHit h : r.hits()) hits.addElement(h);
        count.setText(r.totalHits() + (r.totalHits() == 1 ? " note" : " notes") + (r.query().isBlank() ? "" : " for '" + r.query() + "'"));
        if (selected != null) {
            for (int i = 0; i < hits.size(); i++) if (hits.get(i).id().equals(selected.id())) list.setSelectedIndex(i);
        }
        showFacets(r.facets());
    }

    private void showFacets(Map<NoteFacet, List<FacetCount>> counts) {
        rebuildingFacets = true;
        facets.removeAll();
        for (NoteFacet f : FACETS) {
            List<FacetCount> values = counts.getOrDefault(f, List.of());
            if (values.isEmpty()) continue;
            JLabel l = new JLabel(f.key());
            l.putClientProperty(FlatClientProperties.STYLE_CLASS, "small");
            l.setForeground(Themes.color("Arcwright.help.foreground"));
            facets.add(l, "gaptop 4");
            int shown = 0;
            for (FacetCount c : values) {
                if (shown++ == 4) break;
                JCheckBox b = new JCheckBox(c.value() + " (" + c.count() + ")", search.isTicked(f, c.value()));
                b.addActionListener(e -> ticked(f, c.value(), b.isSelected()));
                facets.add(b, "wmin 10");
            }
        }
        rebuildingFacets = false;
        facets.revalidate();
        facets.repaint();
    }

    private void ticked(NoteFacet f, String value, boolean on) {
        if (!rebuildingFacets) search.tick(f, value, on);
    }

    private void opened(boolean adjusting) {
        NoteHit h = list.getSelectedValue();
        if (adjusting || h == null || store == null) return;
        NoteLibrary s = store;
        CompletableFuture.supplyAsync(() -> s.get(h.id()), background)
                .whenComplete((n, e) -> SwingUtilities.invokeLater(() -> read(n.orElse(null))));
    }

    private void read(FiledNote n) {
        if (n == null) return;
        shown = n;
        reader.setText(NoteHtml.page(n));
        reader.setCaretPosition(0);
        boolean own = NoteDrafts.purposeFor(n) == NoteDrafts.Purpose.EDIT;
        override.setText(own ? "Edit my note…" : "Override this note…");
        override.setToolTipText(own ? "Edit your own note '" + n.note().id() + "' in your personal pack"
                : "Write your own version of '" + n.note().id() + "' (" + n.pack() + ") into your personal pack; it replaces this note for you");
        override.setEnabled(store != null);
    }

    /** The reader, for tests. */
    public JEditorPane reader() { return reader; }

    private void writeNote() {
        if (store == null) return;
        edit(NoteDrafts.Purpose.NEW, NoteEditor.empty(NoteDrafts.freshId(store::get)), "Write a new practice note", null);
    }

    private void overrideNote() {
        FiledNote n = shown;
        if (n == null || store == null) return;
        NoteDrafts.Purpose purpose = NoteDrafts.purposeFor(n);
        if (purpose == NoteDrafts.Purpose.EDIT) {
            edit(purpose, NoteEditor.over(n.note()), "Edit my note '" + n.note().id() + "'", n.note().id());
        } else {
            edit(purpose, NoteEditor.over(NoteDrafts.overrideOf(n.note())),
                    "Override '" + n.note().id() + "' (" + n.pack() + ") with my own note", n.note().id());
        }
    }

    private void edit(NoteDrafts.Purpose purpose, NoteEditor editor, String heading, String opened) {
        int answer = JOptionPane.showConfirmDialog(this, editor, heading, JOptionPane.OK_CANCEL_OPTION,
                JOptionPane.PLAIN_MESSAGE);
        if (answer != JOptionPane.OK_OPTION) return;
        Note note;
        try {
            note = editor.note(LocalDate.now());
        } catch (IllegalArgumentException e) {
            status.accept("Note not saved: " + e.getMessage());
            JOptionPane.showMessageDialog(this, "Not saved yet: " + e.getMessage() + ".", heading, JOptionPane.WARNING_MESSAGE);
            edit(purpose, editor, heading, opened);
            return;
        }
        Optional<String> refused = NoteDrafts.refusal(purpose, note, store.get(note.id()), opened);
        if (refused.isPresent()) {
            status.accept("Note not saved: " + refused.get());
            JOptionPane.showMessageDialog(this, "Not saved yet: " + refused.get() + ".", heading, JOptionPane.WARNING_MESSAGE);
            edit(purpose, editor, heading, opened);
            return;
        }
        NoteLibrary s = store;
        CompletableFuture.supplyAsync(() -> s.save(note), background)
                .whenComplete((f, e) -> SwingUtilities.invokeLater(() -> saved(f, e)));
    }

    private void saved(FiledNote f, Throwable e) {
        if (e != null) {
            status.accept("Note not saved: " + (e.getCause() != null ? e.getCause().getMessage() : e.getMessage()));
            return;
        }
        status.accept("Saved note " + f.note().id() + " to " + f.location());
        search.run();
    }
}
