package org.arcwright.app.practice;

import com.formdev.flatlaf.util.UIScale;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.Font;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.function.BooleanSupplier;
import java.util.function.Predicate;
import java.util.function.Supplier;
import javax.swing.DefaultListCellRenderer;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import javax.swing.table.DefaultTableModel;
import javax.swing.text.JTextComponent;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.RuleDraft;
import org.arcwright.app.model.RuleForm;
import org.arcwright.app.model.RuleSaver;
import org.arcwright.app.model.TeamPacks;
import org.arcwright.app.model.TemplateFields;
import org.arcwright.app.model.TemplatePreview;
import org.arcwright.app.model.TemplateSaver;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.app.widgets.TextEdits;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.PackCheck;
import org.arcwright.rules.RuleBook;

/**
 * The Practice editor: the rules of the packs in force, one opened as a form (its JSON on a second
 * tab) with the reader's verdict as you type (line, column and field of the first problem), and the
 * examples of the selected rule's pack run with one click against the advisor; the note templates
 * with a live preview and the fields they may use; the packs in force and the team packs of the
 * settings. New, Delete and Revert ask first where anything would go, and the built-in pack is never
 * written: its rules and templates are overridden in the personal pack.
 */
public final class PracticeEditorPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient JsonFiles json;
    private final transient Executor background;
    private transient RuleBook book;
    private transient PackStack stack;
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
    private final RuleFormView form = new RuleFormView(this::formEdited);
    private final JTabbedPane ruleViews = new JTabbedPane();
    private final JButton newRule = new JButton("New rule");
    private final JButton deleteRule = new JButton("Delete…");
    private final JButton revertRule = new JButton("Revert to built-in…");
    private final JButton newTemplate = new JButton("New template");
    private final JButton deleteTemplate = new JButton("Delete…");
    private final JButton revertTemplate = new JButton("Revert to built-in…");
    /** True while the editor holds a new rule that is not on disk yet. */
    private boolean creatingRule;
    /** True while the template editor holds a new template that is not on disk yet. */
    private boolean creatingTemplate;
    /** The rule id or template name to select once the packs have reloaded, or null. */
    private String selectAfterReload;
    private String selectTemplateAfterReload;
    /** What a form field said last when its text could not be written into the rule, or null. */
    private transient InputProblem formProblem;
    private final transient PacksPage packsPage;
    private final transient ReloadingPage<RuleBook.Entry> rulePage = new ReloadingPage<>(entries, list, editor, this::ruleEdited,
            () -> shownRule != null, () -> shownRule = null, this::validateNow, this::clearRule);
    private final transient ReloadingPage<TemplatePreview.Entry> templatePage = new ReloadingPage<>(templates, templateList,
            templateText, this::templateEdited, () -> shownTemplate != null, () -> shownTemplate = null, this::refreshPreview,
            this::clearTemplate);
    private final JTabbedPane pages = new JTabbedPane();

    public PracticeEditorPanel(JsonFiles json, Executor background, WorksheetSession session, Supplier<Path> personalPack,
                               Runnable reloadRules, TeamPackSettings teamPacks) {
        super(new MigLayout("insets 0, fill", "[grow,fill]", "[grow,fill]"));
        this.session = Objects.requireNonNull(session, "session");
        JPanel rulesPage = new JPanel(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[][grow,fill][]"));
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
        list.setCellRenderer(new DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getListCellRendererComponent(JList<?> l, Object v, int i, boolean s, boolean f) {
                RuleBook.Entry e = (RuleBook.Entry) v;
                // the pack only where it is not the built-in one, so the ids stay readable in a narrow list
                String where = e.layer() == PackLayer.BUILT_IN ? "" : "   (" + e.pack()
                        + (e.replaces() == null ? "" : ", overrides " + lowerWord(e.replaces())) + ")";
                Component c = super.getListCellRendererComponent(l, e.rule().id() + where, i, s, f);
                setToolTipText(e.describe());
                return c;
            }
        });
        list.addListSelectionListener(e -> selected(e.getValueIsAdjusting()));
        editor.setFont(new Font(Font.MONOSPACED, Font.PLAIN, editor.getFont().getSize()));
        editor.setTabSize(2);
        TextEdits.onEdit(editor.getDocument(), () -> typed());
        validateLater.setRepeats(false);
        ruleViews.setName("ruleViews");
        ruleViews.addTab("Form", form);
        ruleViews.addTab("JSON", new JScrollPane(editor));
        ruleViews.setToolTipTextAt(0, "The rule field by field");
        ruleViews.setToolTipTextAt(1, "The rule as saved in its pack file (advanced); the form follows it");
        JTable table = new JTable(results);
        table.setName("exampleResults");
        ruleViews.addTab("Examples run", new JScrollPane(table));
        ruleViews.setToolTipTextAt(2, "What Run examples found: each example of the pack, and the rule that came first");
        verdict.setName("ruleVerdict");
        JPanel right = new JPanel(new MigLayout("insets 0 6 0 0, wrap 1, gap 4", "[grow,fill]", "[grow,fill][][]"));
        right.add(ruleViews, "wmin 10, hmin 10");
        right.add(verdict, "wmin 10");
        // insets as wide as the buttons' focus rings, which would otherwise be cut at the row's edges
        JPanel actions = new JPanel(new MigLayout("insets 2, gap 6", "[][]"));
        actions.add(save, "wmin 10");
        actions.add(run);
        right.add(actions, "left, growx 0, wmin 10");
        JScrollPane ruleScroll = new JScrollPane(list);
        // Long rule ids must not push the form off the page: the list starts narrow, and folds away with the arrows.
        ruleScroll.setPreferredSize(new Dimension(UIScale.scale(230),
                ruleScroll.getPreferredSize().height));
        ruleScroll.setMinimumSize(new Dimension(0, 0));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, ruleScroll, right);
        split.setResizeWeight(0.25);
        split.setOneTouchExpandable(true);
        split.setBorder(null);
        rulesPage.add(toolbar(newRule, deleteRule, revertRule), "wmin 10");
        rulesPage.add(split, "wmin 10, hmin 10");
        rulesPage.add(new WrapLabel("Checked as you type, saved only when it reads. The built-in pack never changes: saving a "
                + "built-in rule writes your override into your personal pack, and Revert brings the built-in one back.",
                "Label.font", "Arcwright.help.foreground"), "wmin 10");
        newRule.setName("ruleNew");
        deleteRule.setName("ruleDelete");
        revertRule.setName("ruleRevert");
        newRule.setToolTipText("Start a new rule from a skeleton that reads; it is written to your personal pack when saved");
        newRule.addActionListener(e -> newRule());
        deleteRule.addActionListener(e -> deleteRule());
        revertRule.addActionListener(e -> revertRule());
        ruleButtons();
        this.packsPage = new PacksPage(Objects.requireNonNull(teamPacks, "teamPacks"), new TeamPacks(json), personalPack);
        pages.setName("practicePages");
        pages.addTab("Rules", rulesPage);
        pages.addTab("Note templates", templatesPage());
        pages.addTab("Packs", packsPage);
        add(pages, "wmin 10, hmin 10");
        session.listeners().add(previewLater::restart);
    }

    private static JPanel toolbar(JButton... buttons) {
        JPanel bar = new JPanel(new MigLayout("insets 2, gap 6", ""));
        for (JButton b : buttons) bar.add(b);
        return bar;
    }

    /**
     * The templates page: the packs' templates, the text as written beside the fields it may use,
     * and the note it fills for the selected feature.
     */
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
        TextEdits.onEdit(templateText.getDocument(), () -> templateTyped());
        previewLater.setRepeats(false);
        JPanel centre = new JPanel(new MigLayout("insets 0 6 0 0, wrap 1, gap 4", "[grow,fill]",
                "[grow 55,fill][][grow 45,fill][]"));
        centre.add(new JScrollPane(templateText), "wmin 10, hmin 10");
        centre.add(templateVerdict, "wmin 10");
        centre.add(new JScrollPane(templatePreview), "wmin 10, hmin 10");
        centre.add(templateSave, "left, growx 0, wmin 10");
        TemplateFieldsView fields = new TemplateFieldsView(this::insertField);
        fields.setMinimumSize(new Dimension(0, 0));
        JScrollPane listScroll = new JScrollPane(templateList);
        listScroll.setMinimumSize(new Dimension(0, 0));
        // the templates above the fields they may use, so the text and its preview keep the width
        JSplitPane left = new JSplitPane(JSplitPane.VERTICAL_SPLIT, listScroll, fields);
        left.setName("templateFieldsSplit");
        left.setResizeWeight(0.3);
        left.setBorder(null);
        left.setPreferredSize(new Dimension(UIScale.scale(220), 10));
        left.setMinimumSize(new Dimension(0, 0));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, centre);
        split.setResizeWeight(0.2);
        split.setOneTouchExpandable(true);
        split.setBorder(null);
        templateList.setCellRenderer(new DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getListCellRendererComponent(JList<?> l, Object v, int i, boolean s, boolean f) {
                TemplatePreview.Entry e = (TemplatePreview.Entry) v;
                String where = e.layer() == PackLayer.BUILT_IN ? "" : "   (" + e.pack()
                        + (e.isOverride() ? ", overrides " + lowerWord(e.replaces()) : "") + ")";
                Component c = super.getListCellRendererComponent(l, e.name() + where, i, s, f);
                setToolTipText(e.name() + " from " + e.pack() + ": " + e.file());
                return c;
            }
        });
        newTemplate.setName("templateNew");
        deleteTemplate.setName("templateDelete");
        revertTemplate.setName("templateRevert");
        newTemplate.setToolTipText("Start a new template; it is written to your personal pack when saved");
        newTemplate.addActionListener(e -> newTemplate());
        deleteTemplate.addActionListener(e -> deleteTemplate());
        revertTemplate.addActionListener(e -> revertTemplate());
        templateButtons();
        JPanel page = new JPanel(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[][grow,fill][]"));
        page.add(toolbar(newTemplate, deleteTemplate, revertTemplate), "wmin 10");
        page.add(split, "wmin 10, hmin 10");
        page.add(new WrapLabel("Filled for the selected feature (or the whole part) as you type, saved only when it checks. "
                + "Saving a built-in template writes your override into your personal pack; Revert brings the built-in one back.",
                "Label.font", "Arcwright.help.foreground"), "wmin 10");
        return page;
    }

    /** Puts {@code f} at the caret, with the caret inside a section it opens. */
    private void insertField(TemplateFields.Field f) {
        if (shownTemplate == null) {
            templateVerdict.show("Select or start a template first, then insert fields into it.", "Arcwright.error.foreground");
            return;
        }
        int at = templateText.getSelectionStart();
        templateText.replaceSelection(f.insert());
        int inside = f.insert().indexOf("{{/");
        templateText.setCaretPosition(at + (inside < 0 ? f.insert().length() : inside));
        templateText.requestFocusInWindow();
    }

    private void templateSelected(boolean adjusting) {
        TemplatePreview.Entry e = templateList.getSelectedValue();
        if (adjusting || e == null || reselecting || e.equals(shownTemplate)) return;
        if (shownTemplate != null && templateEdited()) {
            reselect(templateList, creatingTemplate ? null : shownTemplate);
            if (!asking) {
                asking = true;
                SwingUtilities.invokeLater(() -> askBeforeLeavingTemplate(e));
            }
            return;
        }
        openTemplate(e);
    }

    private void openTemplate(TemplatePreview.Entry e) {
        try {
            String text = TemplatePreview.text(e);
            creatingTemplate = false;
            shownTemplate = e;
            templateOpened = text;
            boolean builtIn = e.layer() == PackLayer.BUILT_IN;
            templateSave.setText(builtIn ? "Save as my override" : "Save");
            loading = true;
            templateText.setText(text);
            templateText.setCaretPosition(0);
            loading = false;
            templateButtons();
            refreshPreview();
        } catch (RuntimeException ex) {
            templateVerdict.show(ex.getMessage(), "Arcwright.error.foreground");
        }
    }

    /** Whether the template editor holds text that is not in the template's file (or a new template). */
    public boolean templateEdited() {
        return templateOpened != null && !templateText.getText().equals(templateOpened);
    }

    private void templateTyped() {
        if (!loading) previewLater.restart();
    }

    /** Checks and fills the template being edited, shows the result; true when it checks. */
    private boolean refreshPreview() {
        TemplatePreview.Entry e = shownTemplate;
        if (e == null) return false;
        TemplatePreview.Result r = TemplatePreview.fill(e, templateText.getText(), session.worksheet(),
                session.selected().orElse(null));
        boolean builtIn = e.layer() == PackLayer.BUILT_IN;
        templateSave.setEnabled(r.ok() && templateOpened != null);
        templateSave.setToolTipText(!r.ok() ? "Unavailable: the template does not check; fix what the message under the text says"
                : creatingTemplate ? "Write the new template into your personal pack's templates folder"
                : builtIn ? "The built-in pack cannot change: write the template into your personal pack, where it "
                + "replaces the built-in one of the same name" : "Write the template back into its pack file");
        if (r.ok()) {
            templatePreview.setText(r.note());
            templatePreview.setCaretPosition(0);
            templateVerdict.show(r.notice() == null ? "The template reads; the note as it would be filled:"
                    : "The template reads. " + r.notice(), "Arcwright.pass.foreground");
        } else {
            templateVerdict.show(r.problem().getMessage(), "Arcwright.error.foreground");
        }
        return r.ok();
    }

    private void saveTemplate() {
        TemplatePreview.Entry e = shownTemplate;
        if (e == null || templateOpened == null) return;
        previewLater.stop();
        if (!refreshPreview()) return;
        templateSave.setEnabled(false);
        String text = templateText.getText();
        String opened = templateOpened;
        Path personal = personalPack.get();
        boolean fresh = creatingTemplate;
        List<String> names = templateNames();
        CompletableFuture.supplyAsync(() -> fresh ? TemplateSaver.saveNew(e.name(), text, personal, names)
                        : TemplateSaver.save(e, text, opened, personal), background)
                .whenComplete((written, err) -> SwingUtilities.invokeLater(() -> templateSaved(e.name(), fresh, text, written, err)));
    }

    private List<String> templateNames() {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < templates.size(); i++) names.add(templates.get(i).name());
        return names;
    }

    private void templateSaved(String name, boolean fresh, String text, Path written, Throwable err) {
        templateSave.setEnabled(true);
        if (err != null) {
            Throwable cause = err.getCause() != null ? err.getCause() : err;
            templateSaveMessage = "Not saved: " + cause.getMessage();
            templateVerdict.show(templateSaveMessage, "Arcwright.error.foreground");
            return;
        }
        if (fresh) {
            creatingTemplate = false;
            selectTemplateAfterReload = name;
        }
        templateOpened = text;
        templateSaveMessage = "Saved to " + written + "; reloading the packs…";
        templateVerdict.show(templateSaveMessage, "Arcwright.pass.foreground");
        reloadRules.run();
    }

    /** Starts a new template under a fresh name the user confirms, after asking about an unsaved edit. */
    private void newTemplate() {
        if (shownTemplate != null && templateEdited() && !letGo(templateWhat())) return;
        String fresh = TemplateSaver.freshName(templateNames());
        Object answer = JOptionPane.showInputDialog(this, "Name of the new template (lower-case letters, "
                + "digits and hyphens; the file is NAME.mustache in your personal pack):", "New template",
                JOptionPane.PLAIN_MESSAGE, null, null, fresh);
        if (answer == null) return;
        String name = answer.toString().strip();
        if (!name.matches("[a-z0-9][a-z0-9-]*") || templateNames().contains(name)) {
            templateVerdict.show("Not started: name: '" + name + "' " + (templateNames().contains(name)
                    ? "is a template in force already; select it to edit it" : "must be lower-case letters, digits and hyphens"),
                    "Arcwright.error.foreground");
            return;
        }
        Path personal = personalPack.get();
        creatingTemplate = true;
        shownTemplate = new TemplatePreview.Entry(name, "new, not saved yet", TemplateSaver.overrideFile(personal, name),
                PackLayer.PERSONAL);
        templateOpened = "";
        reselect(templateList, null);
        templateSave.setText("Save the new template");
        loading = true;
        templateText.setText(TemplateSaver.skeleton());
        templateText.setCaretPosition(0);
        loading = false;
        templateButtons();
        refreshPreview();
        templateText.requestFocusInWindow();
    }

    private String templateWhat() {
        return creatingTemplate ? "the new template " + shownTemplate.name() : "template " + shownTemplate.name();
    }

    private void deleteTemplate() {
        TemplatePreview.Entry e = shownTemplate;
        if (e == null || creatingTemplate || e.layer() == PackLayer.BUILT_IN || e.isOverride()) return;
        if (!confirm("Delete template " + e.name() + "?", "The file " + e.file() + " is deleted"
                + (templateEdited() ? ", with the changes you have not saved" : "")
                + ". This cannot be undone in Arcwright.", "Delete the template")) return;
        removeTemplate(e, "Deleted ");
    }

    private void revertTemplate() {
        TemplatePreview.Entry e = shownTemplate;
        if (e == null || creatingTemplate || !e.isOverride()) return;
        if (!confirm("Revert template " + e.name() + " to " + e.replaces() + "?", "Your version, " + e.file() + ", is deleted"
                + (templateEdited() ? " with the changes you have not saved" : "") + ", and the template of " + e.replaces()
                + " is in force again. This cannot be undone in Arcwright.", "Revert to " + lowerWord(e.replaces()))) return;
        selectTemplateAfterReload = e.name();
        removeTemplate(e, "Reverted: deleted ");
    }

    private void removeTemplate(TemplatePreview.Entry e, String done) {
        String opened = templateOpened;
        CompletableFuture.supplyAsync(() -> TemplateSaver.remove(e, opened), background)
                .whenComplete((gone, err) -> SwingUtilities.invokeLater(() -> {
                    if (err != null) {
                        Throwable cause = err.getCause() != null ? err.getCause() : err;
                        templateSaveMessage = "Nothing deleted: " + cause.getMessage();
                        templateVerdict.show(templateSaveMessage, "Arcwright.error.foreground");
                        return;
                    }
                    templateOpened = null;
                    templateSaveMessage = done + gone + "; reloading the packs…";
                    templateVerdict.show(templateSaveMessage, "Arcwright.pass.foreground");
                    reloadRules.run();
                }));
    }

    /** Enables New, Delete and Revert for the template shown, with a tooltip saying why not. */
    private void templateButtons() {
        TemplatePreview.Entry e = creatingTemplate ? null : shownTemplate;
        boolean deletable = e != null && e.layer() != PackLayer.BUILT_IN && !e.isOverride();
        deleteTemplate.setEnabled(deletable);
        deleteTemplate.setToolTipText(deletable ? "Delete " + e.file() + " (asks first)"
                : e == null ? "Unavailable: select a template of a team or your personal pack"
                : e.isOverride() ? "Unavailable: this template overrides " + e.replaces() + "'s; Revert brings that one back"
                : "Unavailable: a built-in template cannot be deleted; a template of the same name in your personal pack "
                + "overrides it");
        revertTemplate.setEnabled(e != null && e.isOverride());
        revertTemplate.setText(e != null && e.isOverride() ? "Revert to " + lowerWord(e.replaces()) + "…" : "Revert to built-in…");
        revertTemplate.setToolTipText(e != null && e.isOverride() ? "Delete this version, " + e.file() + ", so that "
                + e.replaces() + "'s template is in force again (asks first)"
                : "Unavailable: the template shown overrides no other pack's");
    }

    /** "built-in" for the built-in pack, else the pack's name. */
    private String lowerWord(String pack) {
        return stack != null && !stack.packs().isEmpty() && stack.packs().get(0).name().equals(pack) ? "built-in" : pack;
    }

    /** Asks before something is deleted; true only when the user presses {@code yes}. */
    private boolean confirm(String question, String consequence, String yes) {
        Object[] options = {"Cancel", yes};
        int answer = JOptionPane.showOptionDialog(this, question + "\n" + consequence, question,
                JOptionPane.DEFAULT_OPTION, JOptionPane.WARNING_MESSAGE, null, options, options[0]);
        return answer == 1;
    }

    /** What the last template save said: where it wrote, or why it did not (tests). */
    public String templateSaveMessage() { return templateSaveMessage; }

    /** The template save button's text: plain Save, or the override offer for a built-in template (tests). */
    public String templateSaveLabel() { return templateSave.getText(); }

    public String templateVerdictText() { return templateVerdict.getText(); }

    public String templatePreviewText() { return templatePreview.getText(); }

    public JTextArea templateEditor() { return templateText; }

    /** Called once the packs have loaded (and after each reload). */
    public void setRules(PackStack packs, RuleBook b, Advisor a) {
        stack = packs;
        packsPage.packsLoaded(packs);
        String keepTemplate = selectTemplateAfterReload != null ? selectTemplateAfterReload
                : shownTemplate == null || creatingTemplate ? null : shownTemplate.name();
        selectTemplateAfterReload = null;
        // edits typed while the packs reloaded stay in the editor; only the list and the file behind it change
        refill(templatePage, TemplatePreview.entries(packs), t -> t.name().equals(keepTemplate), creatingTemplate);
        templateButtons();
        book = b;
        advisor = a;
        String keep = selectAfterReload != null ? selectAfterReload : shownRule == null || creatingRule ? null : shownRule.rule().id();
        selectAfterReload = null;
        refill(rulePage, b.entries(), e -> e.rule().id().equals(keep), creatingRule);
        ruleButtons();
    }

    /**
     * Refills a page's list from the reloaded packs and keeps the user's place: the entry {@code kept}
     * names is selected again, which opens it from its (perhaps changed) file, and an edit typed before
     * the reload is put back over it, so a reload never loses typing; when the entry is gone, the editor
     * is cleared. A page holding a new entry not yet on disk ({@code creating}) keeps it untouched.
     */
    private <T> void refill(ReloadingPage<T> page, List<? extends T> fresh, Predicate<T> kept, boolean creating) {
        String typed = page.text().getText();
        boolean edited = page.edited().getAsBoolean();
        reselecting = true;
        try {
            page.model().clear();
            for (T t : fresh) page.model().addElement(t);
        } finally {
            reselecting = false;
        }
        if (creating) return;
        page.forget().run();
        int at = -1;
        for (int i = 0; i < page.model().size(); i++) if (kept.test(page.model().get(i))) at = i;
        if (at < 0) {
            page.clear().run();
            return;
        }
        page.view().setSelectedIndex(at);
        page.view().ensureIndexIsVisible(at);
        if (edited && page.opened().getAsBoolean()) {
            loading = true;
            page.text().setText(typed);
            loading = false;
            page.recheck().run();
        }
    }

    /**
     * What the rule page and the template page share when the packs reload (see {@link #refill}): the
     * list and its model, the editor whose typing must survive, and what each page means by an edit, an
     * entry shown, forgetting it, checking the text again and clearing the editor.
     */
    private record ReloadingPage<T>(DefaultListModel<T> model, JList<T> view, JTextArea text, BooleanSupplier edited,
                                    BooleanSupplier opened, Runnable forget, Runnable recheck, Runnable clear) {}

    /** Empties the rule editor when the rule it showed is gone (deleted). */
    private void clearRule() {
        shownRule = null;
        draft = null;
        ruleOpened = null;
        loading = true;
        editor.setText("");
        loading = false;
        form.show("{}");
        list.clearSelection();
        save.setEnabled(false);
        run.setEnabled(false);
        if (!saveMessage.startsWith("Deleted")) verdict.show("Select a rule to see it here.", "Arcwright.help.foreground");
    }

    /** Empties the template editor when the template it showed is gone (deleted). */
    private void clearTemplate() {
        shownTemplate = null;
        templateOpened = null;
        loading = true;
        templateText.setText("");
        loading = false;
        templatePreview.setText("");
        templateSave.setEnabled(false);
        templateList.clearSelection();
    }

    /** Selects {@code value} in {@code l} without treating it as the user's choice (null clears the selection). */
    private <T> void reselect(JList<T> l, T value) {
        reselecting = true;
        try {
            if (value == null) {
                l.clearSelection();
            } else {
                l.setSelectedValue(value, true);
            }
        } finally {
            reselecting = false;
        }
    }

    /** Asks whether to drop the rule edit; if so, opens {@code wanted}, else stays on the edited rule. */
    private void askBeforeLeavingRule(RuleBook.Entry wanted) {
        try {
            if (!ruleEdited() || !letGo(ruleWhat())) return;
            creatingRule = false;
            ruleOpened = editor.getText();
            shownRule = null;
            list.setSelectedValue(wanted, true);
        } finally {
            asking = false;
        }
    }

    /** As {@link #askBeforeLeavingRule}, for a template. */
    private void askBeforeLeavingTemplate(TemplatePreview.Entry wanted) {
        try {
            if (shownTemplate == null || !templateEdited() || !letGo(templateWhat())) return;
            creatingTemplate = false;
            templateOpened = templateText.getText();
            shownTemplate = null;
            templateList.setSelectedValue(wanted, true);
        } finally {
            asking = false;
        }
    }

    private String ruleWhat() {
        return creatingRule ? "the new rule" : "rule " + (shownRule == null ? "" : shownRule.rule().id());
    }

    /** Whether the rule editor holds text that is not in the rule's file (or a new rule). */
    public boolean ruleEdited() { return ruleOpened != null && !editor.getText().equals(ruleOpened); }

    /**
     * Asks before an edit is dropped; true when the user lets it go. Shown only when there is an
     * unsaved edit, so nothing is lost without a word.
     */
    private boolean letGo(String what) {
        Object[] options = {"Keep editing", "Discard the changes"};
        int answer = JOptionPane.showOptionDialog(this, "The changes to " + what + " are not saved.",
                "Changes not saved", JOptionPane.DEFAULT_OPTION, JOptionPane.WARNING_MESSAGE, null,
                options, options[0]);
        return answer == 1;
    }

    public JTextArea editor() { return editor; }

    public String verdictText() { return verdict.getText(); }

    public int resultRows() { return results.getRowCount(); }

    private void selected(boolean adjusting) {
        RuleBook.Entry e = list.getSelectedValue();
        if (adjusting || e == null || reselecting || e.equals(shownRule)) return;
        if ((shownRule != null || creatingRule) && ruleEdited()) {
            // back to the edited rule at once, then ask once the click that moved the selection is over
            reselect(list, creatingRule ? null : shownRule);
            if (!asking) {
                asking = true;
                SwingUtilities.invokeLater(() -> askBeforeLeavingRule(e));
            }
            return;
        }
        Path file = null;
        for (PackStack.PackFile f : stack.files("rules", ".json")) {
            if (f.path().toString().equals(e.file())) file = f.path();
        }
        if (file == null) {
            verdict.show("The file of rule " + e.rule().id() + " is not in the packs in force: " + e.file(), "Arcwright.error.foreground");
            return;
        }
        creatingRule = false;
        draft = RuleDraft.fromFile(json, file, e.rule().id());
        shownRule = e;
        ruleOpened = draft.text();
        loading = true;
        editor.setText(draft.text());
        editor.setCaretPosition(0);
        loading = false;
        form.show(draft.text());
        formProblem = null;
        run.setEnabled(advisor != null);
        run.setToolTipText("Run every example of pack '" + e.pack() + "' against the advisor");
        boolean builtIn = e.layer() == PackLayer.BUILT_IN;
        save.setText(builtIn ? "Save as my override" : "Save");
        ruleButtons();
        showVerdict();
    }

    /** Starts a new rule from the skeleton, after asking about an unsaved edit; nothing is written until Save. */
    private void newRule() {
        if ((shownRule != null || creatingRule) && ruleEdited() && !letGo(ruleWhat())) return;
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) ids.add(entries.get(i).rule().id());
        String text = RuleSaver.skeleton(RuleSaver.freshId(ids));
        creatingRule = true;
        shownRule = null;
        reselect(list, null);
        draft = new RuleDraft(json, "new rule", text);
        ruleOpened = "";
        loading = true;
        editor.setText(text);
        editor.setCaretPosition(0);
        loading = false;
        form.show(text);
        formProblem = null;
        ruleViews.setSelectedIndex(0);
        save.setText("Save the new rule");
        run.setEnabled(false);
        run.setToolTipText("Unavailable: save the new rule first; its examples then run with the personal pack's");
        ruleButtons();
        showVerdict();
        form.control(RuleForm.Field.SUMMARY).requestFocusInWindow();
    }

    private void deleteRule() {
        RuleBook.Entry e = shownRule;
        if (e == null || creatingRule || e.layer() == PackLayer.BUILT_IN || e.replaces() != null) return;
        if (!confirm("Delete rule " + e.rule().id() + "?", "It is taken out of " + e.file() + " (the file goes if it holds "
                + "no other rule)" + (ruleEdited() ? ", with the changes you have not saved" : "")
                + ". This cannot be undone in Arcwright.", "Delete the rule")) return;
        removeRule(e, "Deleted rule " + e.rule().id() + " from ");
    }

    private void revertRule() {
        RuleBook.Entry e = shownRule;
        if (e == null || creatingRule || e.replaces() == null) return;
        if (!confirm("Revert rule " + e.rule().id() + " to " + e.replaces() + "?", "Your version is taken out of " + e.file()
                + (ruleEdited() ? ", with the changes you have not saved," : "") + " and the rule of " + e.replaces()
                + " is in force again. This cannot be undone in Arcwright.", "Revert to " + lowerWord(e.replaces()))) return;
        selectAfterReload = e.rule().id();
        removeRule(e, "Reverted rule " + e.rule().id() + ": took it out of ");
    }

    private void removeRule(RuleBook.Entry e, String done) {
        CompletableFuture.supplyAsync(() -> saver.remove(e), background)
                .whenComplete((file, err) -> SwingUtilities.invokeLater(() -> {
                    if (err != null) {
                        Throwable cause = err.getCause() != null ? err.getCause() : err;
                        saveMessage = "Nothing deleted: " + cause.getMessage();
                        verdict.show(saveMessage, "Arcwright.error.foreground");
                        return;
                    }
                    ruleOpened = editor.getText();
                    saveMessage = done + file + "; reloading the rules…";
                    verdict.show(saveMessage, "Arcwright.pass.foreground");
                    reloadRules.run();
                }));
    }

    /** Enables Delete and Revert for the rule shown, with a tooltip saying why not. */
    private void ruleButtons() {
        RuleBook.Entry e = creatingRule ? null : shownRule;
        boolean deletable = e != null && e.layer() != PackLayer.BUILT_IN && e.replaces() == null;
        deleteRule.setEnabled(deletable);
        deleteRule.setToolTipText(deletable ? "Take this rule out of " + e.file() + " (asks first)"
                : e == null ? "Unavailable: select a rule of a team or your personal pack"
                : e.replaces() != null ? "Unavailable: this rule overrides " + e.replaces() + "'s; Revert brings that one back"
                : "Unavailable: a built-in rule cannot be deleted; list its id under \"disables\" in a pack's pack.json "
                + "to switch it off");
        boolean override = e != null && e.replaces() != null;
        revertRule.setEnabled(override);
        revertRule.setText(override ? "Revert to " + lowerWord(e.replaces()) + "…" : "Revert to built-in…");
        revertRule.setToolTipText(override ? "Take your version out of " + e.file() + " so that " + e.replaces()
                + "'s rule is in force again (asks first)" : "Unavailable: the rule shown overrides no other pack's rule");
    }

    /** A form field was edited: its text goes into the JSON, or the field is marked with what is wrong. */
    private void formEdited(RuleForm.Field f, String text) {
        if (draft == null) return;
        try {
            String next = RuleForm.write(editor.getText(), f, text);
            formProblem = null;
            loading = true;
            editor.setText(next);
            loading = false;
            validateLater.stop();
            draft.setText(next);
            showVerdict();
        } catch (InputProblem p) {
            formProblem = p;
            showVerdict();
        }
    }

    private void typed() {
        if (!loading) validateLater.restart();
    }

    /** The JSON tab was edited: read it, and let the form follow it. */
    private void validateNow() {
        if (draft == null) return;
        draft.setText(editor.getText());
        formProblem = null;
        form.show(editor.getText());
        showVerdict();
    }

    private void showVerdict() {
        Optional<InputProblem> problem = formProblem != null ? Optional.of(formProblem)
                : draft.problem();
        boolean reads = problem.isEmpty();
        save.setEnabled(reads);
        save.setToolTipText(reads ? (creatingRule ? "Write the new rule into your personal pack's rules folder"
                : save.getText().equals("Save") ? "Write the rule back into its pack file"
                : "The built-in pack cannot change: write the rule into your personal pack as an override")
                : "Unavailable: the rule does not read; fix what the message under the form says");
        form.mark(problem.flatMap(RuleForm::fieldOf));
        if (problem.isPresent()) {
            String where = problem.flatMap(RuleForm::fieldOf)
                    .map(f -> "Form field " + f.label() + ": ").orElse("");
            verdict.show(where + problem.get().getMessage(), "Arcwright.error.foreground");
        } else {
            verdict.show("The rule reads: " + draft.rule().get().summary(), "Arcwright.pass.foreground");
        }
    }

    private void save() {
        if ((shownRule == null && !creatingRule) || draft == null) return;
        validateLater.stop();
        if (formProblem == null) draft.setText(editor.getText());
        showVerdict();
        if (formProblem != null || draft.problem().isPresent()) return;
        save.setEnabled(false);
        RuleDraft d = draft;
        savedRuleText = editor.getText();
        Path personal = personalPack.get();
        if (creatingRule) {
            List<String> ids = new ArrayList<>();
            for (int i = 0; i < entries.size(); i++) ids.add(entries.get(i).rule().id());
            String id = d.rule().orElseThrow().id();
            CompletableFuture.supplyAsync(() -> saver.saveNew(d, personal, ids), background)
                    .whenComplete((written, err) -> SwingUtilities.invokeLater(() -> {
                        if (err == null) {
                            creatingRule = false;
                            selectAfterReload = id;
                        }
                        saved(written, err);
                    }));
            return;
        }
        RuleBook.Entry e = shownRule;
        String id = e.rule().id();
        boolean builtIn = e.layer() == PackLayer.BUILT_IN;
        Path file = Path.of(e.file());
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

    /** The form's control for {@code f} (tests). */
    public JTextComponent formControl(RuleForm.Field f) { return form.control(f); }

    /** The packs in force as the Packs page lists them, and what it said last (tests). */
    public List<String> packsInForce() { return packsPage.inForceLines(); }

    public String packsMessage() { return packsPage.lastMessage(); }

    /** The ids of the rules listed, in list order (tests). */
    public List<String> ruleIds() {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) ids.add(entries.get(i).rule().id());
        return ids;
    }

    /** The rule shown: its id, or null (tests). */
    public String shownRuleId() { return shownRule == null ? null : shownRule.rule().id(); }

    /** The template shown: its name, or null (tests). */
    public String shownTemplateName() { return shownTemplate == null ? null : shownTemplate.name(); }

    /** Shows page {@code title} (Rules, Note templates or Packs). */
    public void showPage(String title) { pages.setSelectedIndex(pages.indexOfTab(title)); }

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
        ruleViews.setSelectedIndex(2);
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
