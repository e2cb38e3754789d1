package org.arcwright.app.practice;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.function.Supplier;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.table.DefaultTableModel;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.RuleDraft;
import org.arcwright.app.model.RuleSaver;
import org.arcwright.app.model.TemplatePreview;
import org.arcwright.app.model.TemplateSaver;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackLayer;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.PackCheck;
import org.arcwright.rules.RuleBook;

/**
 * The Practice editor: the rules of the packs in force, one opened as its JSON with the reader's
 * verdict as you type (line, column and field of the first problem), and the examples of the
 * selected rule's pack run with one click against the advisor.
 */
public final class PracticeEditorPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient JsonFiles json;
    private final transient Executor background;
    private transient RuleBook book;
    private transient org.arcwright.pack.PackStack stack;
    private transient Advisor advisor;
    private transient RuleDraft draft;
    /** The rule shown in the editor and its text as opened or last saved: anything else is an unsaved edit. */
    private transient RuleBook.Entry shownRule;
    private String ruleOpened;
    private boolean reselecting;
    private boolean asking;
    private String savedRuleText;
    private transient TemplatePreview.Entry shownTemplate;
    private final DefaultListModel<RuleBook.Entry> entries = new DefaultListModel<>();
    private final JList<RuleBook.Entry> list = new JList<>(entries);
    private final JTextArea editor = new JTextArea();
    private final WrapLabel verdict = new WrapLabel("Select a rule to see it here.", "Label.font", "Arcwright.help.foreground");
    private final JButton run = new JButton("Run examples");
    private final DefaultTableModel results = new DefaultTableModel(new Object[] {"Rule", "Example", "Result", "First"}, 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) { return false; }
    };
    private final JButton save = new JButton("Save");
    private final transient WorksheetSession session;
    private String saveMessage = "";
    private final DefaultListModel<TemplatePreview.Entry> templates = new DefaultListModel<>();
    private final JList<TemplatePreview.Entry> templateList = new JList<>(templates);
    private final JTextArea templateText = new JTextArea();
    private final JTextArea templatePreview = new JTextArea();
    private final WrapLabel templateVerdict = new WrapLabel("Select a template to see the note it fills.", "Label.font",
            "Arcwright.help.foreground");
    private final Timer previewLater = new Timer(250, e -> refreshPreview());
    private final JButton templateSave = new JButton("Save");
    /** The selected template's text as opened (or last saved), so a save never writes over a change on disk. */
    private String templateOpened;
    private String templateSaveMessage = "";
    private final transient Supplier<Path> personalPack;
    private final transient Runnable reloadRules;
    private final transient RuleSaver saver;
    private final Timer validateLater = new Timer(250, e -> validateNow());
    private boolean loading;

    public PracticeEditorPanel(JsonFiles json, Executor background, WorksheetSession session, Supplier<Path> personalPack,
                               Runnable reloadRules) {
        super(new MigLayout("insets 0, fill", "[grow,fill]", "[grow,fill]"));
        this.session = Objects.requireNonNull(session, "session");
        JPanel rulesPage = new JPanel(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[grow 70,fill][grow 30,fill][]"));
        this.json = Objects.requireNonNull(json, "json");
        this.background = Objects.requireNonNull(background, "background");
        this.personalPack = Objects.requireNonNull(personalPack, "personalPack");
        this.reloadRules = Objects.requireNonNull(reloadRules, "reloadRules");
        this.saver = new RuleSaver(json);
        save.setName("ruleSave");
        save.setEnabled(false);
        save.setToolTipText("Unavailable: select a rule first");
        save.addActionListener(e -> save());
        setName("practiceEditor");
        list.setName("ruleList");
        editor.setName("ruleText");
        verdict.setName("ruleVerdict");
        run.setName("runExamples");
        run.setEnabled(false);
        run.setToolTipText("Unavailable: select a rule first");
        run.addActionListener(e -> runExamples());
        list.setCellRenderer(new javax.swing.DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public java.awt.Component getListCellRendererComponent(JList<?> l, Object v, int i, boolean s, boolean f) {
                RuleBook.Entry e = (RuleBook.Entry) v;
                return super.getListCellRendererComponent(l, e.rule().id() + "   (" + e.pack() + ")", i, s, f);
            }
        });
        list.addListSelectionListener(e -> selected(e.getValueIsAdjusting()));
        editor.setFont(new java.awt.Font(java.awt.Font.MONOSPACED, java.awt.Font.PLAIN, editor.getFont().getSize()));
        editor.setTabSize(2);
        editor.getDocument().addDocumentListener(new DocumentListener() {
            public void insertUpdate(DocumentEvent e) { typed(); }
            public void removeUpdate(DocumentEvent e) { typed(); }
            public void changedUpdate(DocumentEvent e) { typed(); }
        });
        validateLater.setRepeats(false);
        JPanel right = new JPanel(new MigLayout("insets 0 6 0 0, wrap 1, gap 4", "[grow,fill]", "[grow,fill][][][]"));
        right.add(new JScrollPane(editor), "wmin 10, hmin 10");
        right.add(verdict, "wmin 10");
        right.add(run, "left, growx 0");
        right.add(save, "left, growx 0, wmin 10");
        JScrollPane ruleScroll = new JScrollPane(list);
        // Long rule ids must not push the editor and its buttons off the page: the list starts narrow.
        ruleScroll.setPreferredSize(new java.awt.Dimension(com.formdev.flatlaf.util.UIScale.scale(280),
                ruleScroll.getPreferredSize().height));
        ruleScroll.setMinimumSize(new java.awt.Dimension(0, 0));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, ruleScroll, right);
        split.setResizeWeight(0.3);
        split.setBorder(null);
        rulesPage.add(split, "wmin 10, hmin 10, h 60%");
        JTable table = new JTable(results);
        table.setName("exampleResults");
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(10, table.getRowHeight() * 6));
        rulesPage.add(new JScrollPane(table), "wmin 10, hmin 10, h 25%");
        rulesPage.add(new WrapLabel("Edits are checked as you type and saved only when they read. A built-in rule is saved as "
                + "an override in your personal pack; the rules reload after each save.",
                "Label.font", "Arcwright.help.foreground"), "wmin 10");
        javax.swing.JTabbedPane pages = new javax.swing.JTabbedPane();
        pages.setName("practicePages");
        pages.addTab("Rules", rulesPage);
        pages.addTab("Note templates", templatesPage());
        add(pages, "wmin 10, hmin 10");
        session.listeners().add(previewLater::restart);
    }

    /** The templates page: the packs' templates, the text as written, and the note it fills for the selected feature. */
    private JPanel templatesPage() {
        templateList.setName("templateList");
        templateText.setName("templateText");
        templatePreview.setName("templatePreview");
        templateVerdict.setName("templateVerdict");
        templateSave.setName("templateSave");
        templateSave.setEnabled(false);
        templateSave.setToolTipText("Unavailable: select a template first");
        templateSave.addActionListener(e -> saveTemplate());
        templateText.setFont(editor.getFont());
        templatePreview.setFont(editor.getFont());
        templatePreview.setEditable(false);
        templateList.addListSelectionListener(e -> templateSelected(e.getValueIsAdjusting()));
        templateText.getDocument().addDocumentListener(new DocumentListener() {
            public void insertUpdate(DocumentEvent e) { templateTyped(); }
            public void removeUpdate(DocumentEvent e) { templateTyped(); }
            public void changedUpdate(DocumentEvent e) { templateTyped(); }
        });
        previewLater.setRepeats(false);
        JPanel right = new JPanel(new MigLayout("insets 0 6 0 0, wrap 1, gap 4", "[grow,fill]",
                "[grow 55,fill][][grow 45,fill][]"));
        right.add(new JScrollPane(templateText), "wmin 10, hmin 10");
        right.add(templateVerdict, "wmin 10");
        right.add(new JScrollPane(templatePreview), "wmin 10, hmin 10");
        right.add(templateSave, "left, growx 0, wmin 10");
        JScrollPane listScroll = new JScrollPane(templateList);
        // wide enough for a template name and the pack it comes from
        listScroll.setPreferredSize(new java.awt.Dimension(com.formdev.flatlaf.util.UIScale.scale(250), 10));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, listScroll, right);
        split.setResizeWeight(0.25);
        split.setBorder(null);
        JPanel page = new JPanel(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[grow,fill][]"));
        page.add(split, "wmin 10, hmin 10");
        page.add(new WrapLabel("The note below is filled for the selected feature (or the whole part) as you type; "
                + "a template is saved only when it checks. A built-in template is saved as an override of the same name in "
                + "your personal pack; the packs reload after each save.", "Label.font", "Arcwright.help.foreground"), "wmin 10");
        return page;
    }

    private void templateSelected(boolean adjusting) {
        TemplatePreview.Entry e = templateList.getSelectedValue();
        if (adjusting || e == null || reselecting || e.equals(shownTemplate)) return;
        if (shownTemplate != null && templateOpened != null && !templateText.getText().equals(templateOpened)) {
            reselect(templateList, shownTemplate);
            if (!asking) {
                asking = true;
                SwingUtilities.invokeLater(() -> askBeforeLeavingTemplate(e));
            }
            return;
        }
        try {
            String text = TemplatePreview.text(e);
            shownTemplate = e;
            templateOpened = text;
            boolean builtIn = e.layer() == PackLayer.BUILT_IN;
            templateSave.setText(builtIn ? "Save as an override in my personal pack" : "Save");
            loading = true;
            templateText.setText(text);
            templateText.setCaretPosition(0);
            loading = false;
            refreshPreview();
        } catch (RuntimeException ex) {
            templateVerdict.show(ex.getMessage(), "Arcwright.error.foreground");
        }
    }

    private void templateTyped() {
        if (!loading) previewLater.restart();
    }

    /** Checks and fills the template being edited, shows the result; true when it checks. */
    private boolean refreshPreview() {
        TemplatePreview.Entry e = templateList.getSelectedValue();
        if (e == null) return false;
        TemplatePreview.Result r = TemplatePreview.fill(e, templateText.getText(), session.worksheet(),
                session.selected().orElse(null));
        boolean builtIn = e.layer() == PackLayer.BUILT_IN;
        templateSave.setEnabled(r.ok() && templateOpened != null);
        templateSave.setToolTipText(!r.ok() ? "Unavailable: the template does not check; fix what the message under the text says"
                : builtIn ? "The built-in pack cannot change: write the template into your personal pack, where it "
                + "replaces the built-in one of the same name" : "Write the template back into its pack file");
        if (r.ok()) {
            templatePreview.setText(r.note());
            templatePreview.setCaretPosition(0);
            templateVerdict.show("The template reads; the note as it would be filled:", "Arcwright.pass.foreground");
        } else {
            templateVerdict.show(r.problem().getMessage(), "Arcwright.error.foreground");
        }
        return r.ok();
    }

    private void saveTemplate() {
        TemplatePreview.Entry e = templateList.getSelectedValue();
        if (e == null || templateOpened == null) return;
        previewLater.stop();
        if (!refreshPreview()) return;
        templateSave.setEnabled(false);
        String text = templateText.getText();
        String opened = templateOpened;
        Path personal = personalPack.get();
        CompletableFuture.supplyAsync(() -> TemplateSaver.save(e, text, opened, personal), background)
                .whenComplete((written, err) -> SwingUtilities.invokeLater(() -> templateSaved(text, written, err)));
    }

    private void templateSaved(String text, Path written, Throwable err) {
        templateSave.setEnabled(true);
        if (err != null) {
            Throwable cause = err.getCause() != null ? err.getCause() : err;
            templateSaveMessage = "Not saved: " + cause.getMessage();
            templateVerdict.show(templateSaveMessage, "Arcwright.error.foreground");
            return;
        }
        templateOpened = text;
        templateSaveMessage = "Saved to " + written + "; reloading the packs…";
        templateVerdict.show(templateSaveMessage, "Arcwright.pass.foreground");
        reloadRules.run();
    }

    /** What the last template save said: where it wrote, or why it did not (tests). */
    public String templateSaveMessage() { return templateSaveMessage; }

    /** The template save button's text: plain Save, or the override offer for a built-in template (tests). */
    public String templateSaveLabel() { return templateSave.getText(); }

    public String templateVerdictText() { return templateVerdict.getText(); }

    public String templatePreviewText() { return templatePreview.getText(); }

    public JTextArea templateEditor() { return templateText; }

    /** Called once the packs have loaded. */
    public void setRules(org.arcwright.pack.PackStack packs, RuleBook b, Advisor a) {
        stack = packs;
        String keepTemplate = templateList.getSelectedValue() == null ? null : templateList.getSelectedValue().name();
        // edits typed while the packs reloaded stay in the editor; only the list and the file behind it change
        String typed = templateText.getText();
        boolean edited = templateOpened != null && !typed.equals(templateOpened);
        shownTemplate = null;
        templates.clear();
        for (TemplatePreview.Entry t : TemplatePreview.entries(packs)) {
            templates.addElement(t);
            if (t.name().equals(keepTemplate)) templateList.setSelectedValue(t, false);
        }
        if (edited && templateList.getSelectedValue() != null) {
            loading = true;
            templateText.setText(typed);
            loading = false;
            refreshPreview();
        }
        book = b;
        advisor = a;
        String keep = list.getSelectedValue() == null ? null : list.getSelectedValue().rule().id();
        // as for templates, a rule edit typed while the packs reloaded stays in the editor
        String typedRule = editor.getText();
        boolean ruleEdited = ruleOpened != null && !typedRule.equals(ruleOpened);
        reselecting = true;
        try {
            entries.clear();
            for (RuleBook.Entry e : b.entries()) entries.addElement(e);
        } finally {
            reselecting = false;
        }
        shownRule = null;
        if (keep != null) {
            for (int i = 0; i < entries.size(); i++) {
                if (entries.get(i).rule().id().equals(keep)) list.setSelectedIndex(i);
            }
        }
        if (ruleEdited && shownRule != null) {
            loading = true;
            editor.setText(typedRule);
            loading = false;
            validateNow();
        }
    }

    /** Selects {@code value} in {@code l} without treating it as the user's choice. */
    private <T> void reselect(javax.swing.JList<T> l, T value) {
        reselecting = true;
        try {
            l.setSelectedValue(value, true);
        } finally {
            reselecting = false;
        }
    }

    /** Asks whether to drop the rule edit; if so, opens {@code wanted}, else stays on the edited rule. */
    private void askBeforeLeavingRule(RuleBook.Entry wanted) {
        try {
            if (shownRule == null || !ruleEdited() || !letGo("rule " + shownRule.rule().id())) return;
            ruleOpened = editor.getText();
            list.setSelectedValue(wanted, true);
        } finally {
            asking = false;
        }
    }

    /** As {@link #askBeforeLeavingRule}, for a template. */
    private void askBeforeLeavingTemplate(TemplatePreview.Entry wanted) {
        try {
            if (shownTemplate == null || templateOpened == null || templateText.getText().equals(templateOpened)
                    || !letGo("template " + shownTemplate.name())) return;
            templateOpened = templateText.getText();
            templateList.setSelectedValue(wanted, true);
        } finally {
            asking = false;
        }
    }

    /** Whether the rule editor holds text that is not in the rule's file. */
    public boolean ruleEdited() { return ruleOpened != null && !editor.getText().equals(ruleOpened); }

    /**
     * Asks before an edit is dropped; true when the user lets it go. Shown only when there is an
     * unsaved edit, so nothing is lost without a word.
     */
    private boolean letGo(String what) {
        Object[] options = {"Keep editing", "Discard the changes"};
        int answer = javax.swing.JOptionPane.showOptionDialog(this, "The changes to " + what + " are not saved.",
                "Changes not saved", javax.swing.JOptionPane.DEFAULT_OPTION, javax.swing.JOptionPane.WARNING_MESSAGE, null,
                options, options[0]);
        return answer == 1;
    }

    public JTextArea editor() { return editor; }

    public String verdictText() { return verdict.getText(); }

    public int resultRows() { return results.getRowCount(); }

    private void selected(boolean adjusting) {
        RuleBook.Entry e = list.getSelectedValue();
        if (adjusting || e == null || reselecting || e.equals(shownRule)) return;
        if (shownRule != null && ruleEdited()) {
            // back to the edited rule at once, then ask once the click that moved the selection is over
            reselect(list, shownRule);
            if (!asking) {
                asking = true;
                SwingUtilities.invokeLater(() -> askBeforeLeavingRule(e));
            }
            return;
        }
        java.nio.file.Path file = null;
        for (org.arcwright.pack.PackStack.PackFile f : stack.files("rules", ".json")) {
            if (f.path().toString().equals(e.file())) file = f.path();
        }
        if (file == null) {
            verdict.show("The file of rule " + e.rule().id() + " is not in the packs in force: " + e.file(), "Arcwright.error.foreground");
            return;
        }
        draft = RuleDraft.fromFile(json, file, e.rule().id());
        shownRule = e;
        ruleOpened = draft.text();
        loading = true;
        editor.setText(draft.text());
        editor.setCaretPosition(0);
        loading = false;
        run.setEnabled(advisor != null);
        run.setToolTipText("Run every example of pack '" + e.pack() + "' against the advisor");
        boolean builtIn = e.layer() == PackLayer.BUILT_IN;
        save.setText(builtIn ? "Save as an override in my personal pack" : "Save");
        showVerdict();
    }

    private void typed() {
        if (!loading) validateLater.restart();
    }

    private void validateNow() {
        if (draft == null) return;
        draft.setText(editor.getText());
        showVerdict();
    }

    private void showVerdict() {
        boolean reads = draft.problem().isEmpty();
        save.setEnabled(reads);
        save.setToolTipText(reads ? (save.getText().equals("Save") ? "Write the rule back into its pack file"
                : "The built-in pack cannot change: write the rule into your personal pack as an override")
                : "Unavailable: the rule does not read; fix what the message under the text says");
        if (draft.problem().isPresent()) {
            verdict.show(draft.problem().get().getMessage(), "Arcwright.error.foreground");
        } else {
            verdict.show("The rule reads: " + draft.rule().get().summary(), "Arcwright.pass.foreground");
        }
    }

    private void save() {
        RuleBook.Entry e = list.getSelectedValue();
        if (e == null || draft == null) return;
        validateLater.stop();
        draft.setText(editor.getText());
        showVerdict();
        if (draft.problem().isPresent()) return;
        save.setEnabled(false);
        RuleDraft d = draft;
        savedRuleText = editor.getText();
        String id = e.rule().id();
        boolean builtIn = e.layer() == PackLayer.BUILT_IN;
        Path file = Path.of(e.file());
        Path personal = personalPack.get();
        CompletableFuture.supplyAsync(() -> builtIn ? saver.saveOverride(d, id, personal) : saver.saveInPlace(d, id, file),
                background).whenComplete((written, err) -> SwingUtilities.invokeLater(() -> saved(written, err)));
    }

    private void saved(Path written, Throwable err) {
        save.setEnabled(true);
        if (err != null) {
            Throwable cause = err.getCause() != null ? err.getCause() : err;
            saveMessage = "Not saved: " + cause.getMessage();
            verdict.show(saveMessage, "Arcwright.error.foreground");
            return;
        }
        ruleOpened = savedRuleText;
        saveMessage = "Saved to " + written + "; reloading the rules…";
        verdict.show(saveMessage, "Arcwright.pass.foreground");
        reloadRules.run();
    }

    /** What the last save said: where it wrote, or why it did not (tests). */
    public String saveMessage() { return saveMessage; }

    /** The save button's text: plain Save, or the override offer for a built-in rule (tests). */
    public String saveLabel() { return save.getText(); }

    private void runExamples() {
        RuleBook.Entry e = list.getSelectedValue();
        if (e == null || advisor == null) return;
        run.setEnabled(false);
        Advisor a = advisor;
        CompletableFuture.supplyAsync(() -> new PackCheck(a).run(e.pack()), background)
                .whenComplete((r, err) -> SwingUtilities.invokeLater(() -> ran(r, err)));
    }

    private void ran(PackCheck.Report r, Throwable err) {
        run.setEnabled(true);
        results.setRowCount(0);
        if (err != null) {
            verdict.show("The examples could not run: " + err.getMessage(), "Arcwright.error.foreground");
            return;
        }
        List<PackCheck.ExampleResult> ex = r.examples();
        for (PackCheck.ExampleResult x : ex) {
            results.addRow(new Object[] {x.ruleId(), x.name(), x.passed() ? "passes" : "FAILS", x.actual()});
        }
        long failed = ex.stream().filter(x -> !x.passed()).count();
        verdict.show(ex.size() + " examples of pack '" + r.pack() + "' run: " + (failed == 0 ? "all pass" : failed + " fail"),
                failed == 0 ? "Arcwright.pass.foreground" : "Arcwright.error.foreground");
    }
}
