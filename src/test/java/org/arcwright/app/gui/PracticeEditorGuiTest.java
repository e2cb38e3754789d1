package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Frame;
import java.awt.event.ActionEvent;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import javax.swing.JButton;
import javax.swing.JList;
import javax.swing.SwingUtilities;
import org.arcwright.app.model.RuleForm;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.practice.PracticeEditorPanel;
import org.arcwright.app.shell.MainWindow;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.fixture.JOptionPaneFixture;
import org.assertj.swing.timing.Timeout;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The Practice editor as a lead engineer uses it: a new rule written in the form and saved, deleted
 * and a built-in rule overridden then reverted, each asking first; a new template built from the
 * field list, then deleted; an override of a built-in template reverted; an undecided feature's
 * preview; team packs added and removed in the GUI. Dialog buttons are pressed, not clicked, and each
 * step waits for its effect. The worksheet is the repository's invented example.
 */
@Tag("gui")
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class PracticeEditorGuiTest {
    private static final Path DECIDED = Path.of("examples/tarnbeck-output-shaft-decided.arcpart").toAbsolutePath();

    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension();

    // filled by the extension
    private static Path config;
    private static MainWindow window;
    private static FrameFixture fixture;

    @BeforeAll
    static void openTheDecidedPart() {
        GuiSupport.onEdt(() -> {
            window.frame().setExtendedState(Frame.NORMAL);
            window.frame().setSize(1600, 1000);
            window.open(DECIDED);
        });
        GuiSupport.onEdt(() -> window.showTab(4));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().isShowing()) && fixture.list("ruleList").contents().length > 1, 60);
    }


    private static PracticeEditorPanel panel() { return window.practicePanel(); }

    private static Path personal() { return config.resolve("personal-pack"); }

    /** Presses button {@code name}, which opens no dialog, and lets its events run. */
    private static void click(String name) {
        JButton b = fixture.button(name).target();
        GuiSupport.onEdt((Runnable) b::doClick);
    }

    /** Selects row {@code index} of list {@code name} as a click would; a dialog it leads to opens afterwards. */
    private static void select(String name, int index) {
        JList<?> l = fixture.list(name).target();
        GuiSupport.onEdt(() -> l.setSelectedIndex(index));
    }

    /** Presses {@code name} as a click would, without waiting: it may open a modal dialog. */
    private static void press(String name) {
        JButton b = fixture.button(name).target();
        SwingUtilities.invokeLater(b::doClick);
    }

    /** Presses the dialog's button {@code text} once the dialog with {@code message} shows. */
    private static void answer(String message, String text) {
        JOptionPaneFixture pane = fixture.optionPane(Timeout.timeout(10_000));
        pane.requireMessage(Pattern.compile("(?s).*" + Pattern.quote(message) + ".*"));
        JButton b = pane.buttonWithText(text).target();
        SwingUtilities.invokeLater(b::doClick);
        GuiSupport.waitFor(() -> !GuiSupport.onEdt(b::isShowing), 10);
    }

    private static void setField(RuleForm.Field f, String text) {
        GuiSupport.onEdt(() -> panel().formControl(f).setText(text));
    }

    private static String verdict() { return GuiSupport.onEdt(() -> panel().verdictText()); }

    private static List<String> ruleIds() { return GuiSupport.onEdt(() -> panel().ruleIds()); }

    private static void shots(String name) {
        for (int[] size : new int[][] {{1024, 700}, {1600, 1000}}) {
            GuiSupport.onEdt(() -> {
                window.frame().setSize(size[0], size[1]);
                window.frame().validate();
            });
            for (ThemeChoice theme : new ThemeChoice[] {ThemeChoice.LIGHT, ThemeChoice.DARK}) {
                GuiSupport.onEdt(() -> window.setTheme(theme));
                GuiSupport.settle(400);
                GuiSupport.screenshot(window.frame(), name + "-" + size[0] + "x" + size[1] + "-"
                        + (theme == ThemeChoice.LIGHT ? "light" : "dark"));
            }
        }
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    @Test
    @Order(1)
    void aNewRuleStartsFromASkeletonIsWrittenInTheFormAndSavedInThePersonalPack() throws Exception {
        click("ruleNew");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().formControl(RuleForm.Field.ID).getText()).equals("my.rule-1"), 10);
        assertThat(verdict()).startsWith("The rule reads");
        assertThat(Files.exists(personal().resolve("rules"))).isFalse();
        setField(RuleForm.Field.SUMMARY, "Cast cover rounds at Kestrel Works: a radius sized from the foundry's capability");
        setField(RuleForm.Field.WEIGHT, "heavy");
        GuiSupport.waitFor(() -> verdict().startsWith("Form field Weight"), 10);
        assertThat(fixture.button("ruleSave").target().isEnabled()).isFalse();
        setField(RuleForm.Field.WEIGHT, "40");
        setField(RuleForm.Field.WHEN, "function: cosmetic\nkind: round\nprocess: cast");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().editor().getText()).contains("\"process\" : \"cast\"")
                && verdict().startsWith("The rule reads: Cast cover rounds"), 10);
        // the rule's needs and preferences have fields of their own on the form
        setField(RuleForm.Field.NEEDS, "[{\"id\": \"radius-floor\", \"min\": 1, \"units\": \"mm\", "
                + "\"why\": \"the foundry's smallest reliable round\", \"source\": \"Kestrel Works foundry note (invented)\"}]");
        setField(RuleForm.Field.PREFER, "general, radius");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().editor().getText()).contains("\"radius-floor\"")
                && GuiSupport.onEdt(() -> panel().editor().getText()).contains("\"prefer\" : [ \"general\", \"radius\" ]")
                && verdict().startsWith("The rule reads: Cast cover rounds"), 10);
        shots("practice-rule-form");
        click("ruleSave");
        GuiSupport.waitFor(() -> ruleIds().contains("my.rule-1") && "my.rule-1".equals(GuiSupport.onEdt(() -> panel().shownRuleId())), 30);
        Path file = personal().resolve("rules").resolve("my.rule-1.json");
        assertThat(Files.readString(file)).contains("\"weight\" : 40").contains("Kestrel Works");
        assertThat(GuiSupport.onEdt(() -> panel().ruleEdited())).isFalse();
        assertThat(fixture.button("ruleDelete").target().isEnabled()).isTrue();
        assertThat(fixture.button("ruleRevert").target().isEnabled()).isFalse();
    }

    @Test
    @Order(2)
    void deletingARuleAsksFirstAndCancelKeepsIt() {
        Path file = personal().resolve("rules").resolve("my.rule-1.json");
        press("ruleDelete");
        answer("Delete rule my.rule-1?", "Cancel");
        GuiSupport.settle(300);
        assertThat(file).exists();
        press("ruleDelete");
        answer("Delete rule my.rule-1?", "Delete the rule");
        GuiSupport.waitFor(() -> !Files.exists(file) && !ruleIds().contains("my.rule-1"), 30);
        assertThat(GuiSupport.onEdt(() -> panel().shownRuleId())).isNull();
        assertThat(GuiSupport.onEdt(() -> panel().editor().getText())).isEmpty();
    }

    @Test
    @Order(3)
    void aBuiltInRuleOverriddenInTheFormRevertsToTheBuiltInOneAfterAsking() {
        select("ruleList", 0);
        String id = ruleIds().get(0);
        GuiSupport.waitFor(() -> id.equals(GuiSupport.onEdt(() -> panel().shownRuleId())), 10);
        assertThat(fixture.button("ruleRevert").target().isEnabled()).isFalse();
        assertThat(fixture.button("ruleDelete").target().isEnabled()).isFalse();
        setField(RuleForm.Field.SUMMARY, "Our own words for this rule");
        GuiSupport.waitFor(() -> verdict().startsWith("The rule reads: Our own words"), 10);
        click("ruleSave");
        Path override = personal().resolve("rules").resolve("override-" + id + ".json");
        GuiSupport.waitFor(() -> Files.exists(override) && GuiSupport.onEdt(() -> fixture.button("ruleRevert").target().isEnabled()), 30);
        assertThat(fixture.button("ruleRevert").target().getText()).isEqualTo("Revert to built-in…");
        press("ruleRevert");
        answer("Revert rule " + id, "Revert to built-in");
        GuiSupport.waitFor(() -> !Files.exists(override)
                && GuiSupport.onEdt(() -> panel().saveLabel()).contains("override")
                && id.equals(GuiSupport.onEdt(() -> panel().shownRuleId())), 30);
        assertThat(GuiSupport.onEdt(() -> panel().formControl(RuleForm.Field.SUMMARY).getText())).isNotEqualTo("Our own words for this rule");
    }

    @Test
    @Order(4)
    void aNewRuleNotYetSavedIsNotDroppedWithoutAWord() {
        click("ruleNew");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().formControl(RuleForm.Field.ID).getText()).startsWith("my.rule-"), 10);
        setField(RuleForm.Field.SUMMARY, "Half written");
        GuiSupport.waitFor(() -> verdict().startsWith("The rule reads: Half written"), 10);
        select("ruleList", 1);
        answer("The changes to the new rule are not saved.", "Keep editing");
        assertThat(GuiSupport.onEdt(() -> panel().shownRuleId())).isNull();
        assertThat(GuiSupport.onEdt(() -> panel().formControl(RuleForm.Field.SUMMARY).getText())).isEqualTo("Half written");
        select("ruleList", 1);
        answer("The changes to the new rule are not saved.", "Discard the changes");
        GuiSupport.waitFor(() -> ruleIds().get(1).equals(GuiSupport.onEdt(() -> panel().shownRuleId())), 10);
    }

    @Test
    @Order(5)
    void aNewTemplateIsBuiltFromTheFieldListSavedAndDeleted() {
        GuiSupport.onEdt(() -> window.session().select("F1"));
        GuiSupport.onEdt(() -> panel().showPage("Note templates"));
        GuiSupport.waitFor(() -> fixture.list("templateList").contents().length > 0, 20);
        press("templateNew");
        JOptionPaneFixture name = fixture.optionPane(Timeout.timeout(10_000));
        GuiSupport.onEdt(() -> name.textBox().target().setText("bench-note"));
        JButton ok = name.okButton().target();
        SwingUtilities.invokeLater(ok::doClick);
        GuiSupport.waitFor(() -> "bench-note".equals(GuiSupport.onEdt(() -> panel().shownTemplateName())), 10);
        GuiSupport.onEdt(() -> {
            panel().templateEditor().setCaretPosition(panel().templateEditor().getText().length());
        });
        GuiSupport.onEdt(() -> fixture.textBox("templateFieldFilter").target().setText("feature.datums"));
        GuiSupport.waitFor(() -> fixture.list("templateFieldList").contents().length > 0, 10);
        GuiSupport.onEdt(() -> fixture.list("templateFieldList").target().setSelectedIndex(0));
        assertThat(fixture.list("templateFieldList").selection()).containsExactly("feature.datums");
        GuiSupport.onEdt((Runnable) fixture.button("templateFieldInsert").target()::doClick);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().templateEditor().getText()).contains("{{feature.datums}}"), 10);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().templatePreviewText()).startsWith("F1 "), 10);
        shots("practice-template-fields");
        click("templateSave");
        Path file = personal().resolve("templates").resolve("bench-note.mustache");
        GuiSupport.waitFor(() -> Files.exists(file) && fixture.list("templateList").contents().length > 0
                && GuiSupport.onEdt(() -> fixture.button("templateDelete").target().isEnabled()), 30);
        press("templateDelete");
        answer("Delete template bench-note?", "Delete the template");
        GuiSupport.waitFor(() -> !Files.exists(file) && GuiSupport.onEdt(() -> panel().shownTemplateName()) == null, 30);
    }

    @Test
    @Order(6)
    void anOverriddenBuiltInTemplateRevertsAfterAskingAndAnUndecidedFeatureIsNotADanglingLine() {
        GuiSupport.onEdt(() -> {
            JList<?> l = fixture.list("templateList").target();
            for (int i = 0; i < l.getModel().getSize(); i++) {
                if (l.getModel().getElementAt(i).toString().startsWith("callout-note ")) l.setSelectedIndex(i);
            }
        });
        GuiSupport.waitFor(() -> "callout-note".equals(GuiSupport.onEdt(() -> panel().shownTemplateName())), 10);
        String original = GuiSupport.onEdt(() -> panel().templateEditor().getText());
        GuiSupport.onEdt(() -> panel().templateEditor().setText(original.replaceFirst("\\{\\{feature.id}}", "MINE {{feature.id}}")));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().templatePreviewText()).startsWith("MINE F1"), 10);
        click("templateSave");
        Path override = personal().resolve("templates").resolve("callout-note.mustache");
        GuiSupport.waitFor(() -> Files.exists(override) && GuiSupport.onEdt(() -> fixture.button("templateRevert").target().isEnabled()), 30);
        // F5 has no callout: its note is skipped, as the sheet does, not shown as "F5 …:" and nothing
        GuiSupport.onEdt(() -> window.session().select("F5"));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().templateVerdictText()).contains("F5 has no callout chosen yet"), 10);
        assertThat(GuiSupport.onEdt(() -> panel().templatePreviewText())).doesNotContain("F5").startsWith("MINE F1");
        GuiSupport.screenshot(window.frame(), "practice-template-undecided-light");
        press("templateRevert");
        answer("Revert template callout-note", "Revert to built-in");
        GuiSupport.waitFor(() -> !Files.exists(override)
                && GuiSupport.onEdt(() -> panel().templateEditor().getText()).equals(original), 30);
        GuiSupport.onEdt(() -> window.session().select("F1"));
    }

    @Test
    @Order(7)
    void teamPacksAreChosenInTheEditorAndThePacksInForceFollow() throws Exception {
        Path team = config.resolve("kestrel-team-pack");
        Files.createDirectories(team.resolve("rules"));
        Files.writeString(team.resolve("pack.json"), "{\"name\": \"Kestrel Works practice\"}");
        Files.writeString(team.resolve("rules").resolve("covers.json"), "{\"rules\": [{\"id\": \"kestrel.covers\", "
                + "\"summary\": \"Kestrel cover rounds\", \"when\": {\"function\": \"cosmetic\", \"process\": \"cast\"}, "
                + "\"recommend\": {\"callout\": \"general\"}, \"weight\": 30, \"because\": [\"Invented for the test.\"]}]}");
        Path notAPack = Files.createDirectories(config.resolve("just-a-folder"));
        // an edit typed on each page before the packs reload stays in its editor, over the entry opened again
        GuiSupport.onEdt(() -> panel().showPage("Note templates"));
        select("templateList", 0);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().shownTemplateName()) != null, 10);
        String template = GuiSupport.onEdt(() -> panel().shownTemplateName());
        String templateOpened = GuiSupport.onEdt(() -> panel().templateEditor().getText());
        String templateTyped = templateOpened + "\nTyped before the packs reloaded.";
        GuiSupport.onEdt(() -> panel().templateEditor().setText(templateTyped));
        GuiSupport.onEdt(() -> panel().showPage("Rules"));
        select("ruleList", 0);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().shownRuleId()) != null, 10);
        String rule = GuiSupport.onEdt(() -> panel().shownRuleId());
        String ruleOpened = GuiSupport.onEdt(() -> panel().editor().getText());
        String ruleTyped = ruleOpened.replaceFirst("\\{", "{\n  ");
        GuiSupport.onEdt(() -> panel().editor().setText(ruleTyped));
        assertThat(GuiSupport.onEdt(() -> panel().ruleEdited() && panel().templateEdited())).isTrue();
        // found where a user looks for settings: a View command (and so the command finder) opens the page
        GuiSupport.onEdt(() -> window.action("view.packs").actionPerformed(
                new ActionEvent(window.frame(), ActionEvent.ACTION_PERFORMED, "packs")));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> fixture.button("teamPackAdd").target().isShowing()), 10);
        press("teamPackAdd");
        chooseFolder(notAPack);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().packsMessage()).startsWith("Not added"), 10);
        assertThat(GuiSupport.onEdt(() -> panel().packsMessage())).contains("pack.json");
        press("teamPackAdd");
        chooseFolder(team);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> panel().packsInForce()).stream().anyMatch(l -> l.startsWith("Team: Kestrel Works"))
                && ruleIds().contains("kestrel.covers"), 30);
        assertThat(GuiSupport.onEdt(() -> window.statusLine().packsText())).isEqualTo("Packs: built-in + 1 team + personal");
        assertThat(GuiSupport.onEdt(() -> panel().shownRuleId())).isEqualTo(rule);
        assertThat(GuiSupport.onEdt(() -> panel().editor().getText())).isEqualTo(ruleTyped);
        assertThat(GuiSupport.onEdt(() -> panel().shownTemplateName())).isEqualTo(template);
        assertThat(GuiSupport.onEdt(() -> panel().templateEditor().getText())).isEqualTo(templateTyped);
        GuiSupport.onEdt(() -> panel().editor().setText(ruleOpened));
        GuiSupport.onEdt(() -> panel().templateEditor().setText(templateOpened));
        assertThat(GuiSupport.onEdt(() -> panel().ruleEdited() || panel().templateEdited())).isFalse();
        Path settings = config.resolve("settings.json");
        GuiSupport.waitFor(() -> Files.exists(settings) && read(settings).contains("kestrel-team-pack"), 10);
        shots("practice-packs");
        select("teamPackList", 0);
        click("teamPackRemove");
        GuiSupport.waitFor(() -> !ruleIds().contains("kestrel.covers")
                && GuiSupport.onEdt(() -> window.statusLine().packsText()).equals("Packs: built-in + personal"), 30);
        GuiSupport.waitFor(() -> !read(settings).contains("kestrel-team-pack"), 10);
        assertThat(team.resolve("pack.json")).exists();
    }

    private static String read(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException e) {
            return "";
        }
    }

    /** Picks {@code folder} in the open folder chooser and approves it, pressed rather than clicked. */
    private static void chooseFolder(Path folder) {
        var chooser = fixture.fileChooser(Timeout.timeout(10_000)).target();
        GuiSupport.onEdt(() -> chooser.setSelectedFile(folder.toFile()));
        SwingUtilities.invokeLater(chooser::approveSelection);
        GuiSupport.waitFor(() -> !GuiSupport.onEdt(chooser::isShowing), 10);
    }
}
