package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Frame;
import java.awt.event.KeyEvent;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.swing.Action;
import javax.swing.JMenu;
import javax.swing.SwingUtilities;
import org.arcwright.app.model.Sections;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.zoneview.ZoneViewPanel;
import org.arcwright.cli.Cli;
import org.arcwright.io.JsonFiles;
import org.arcwright.rules.RuleBook;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.io.TempDir;

/**
 * One feature, one truth: the Check view judges the selected feature's chosen callout, and what it
 * shows never outlives the feature, the callout or the worksheet it was for. Each test drives the
 * steps a user took when the defect was found, on the repository's invented example worksheet.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class FeatureBoundViewsGuiTest {
    private static final Path DECIDED = Path.of("examples/tarnbeck-output-shaft-decided.arcpart").toAbsolutePath();
    private static final Path HOUSING = Path.of("examples/inspect/housing-fillet-profile.json").toAbsolutePath();
    private static final Path BRACKET_R = Path.of("examples/inspect/bracket-round-r.json").toAbsolutePath();

    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension();

    // filled by the extension
    private static Path config;
    private static MainWindow window;
    private static FrameFixture fixture;

    @BeforeAll
    static void openTheDecidedPart() {
        GuiSupport.onEdt(() -> window.open(DECIDED));
    }

    private static void selectRow(int row) { GuiSupport.selectFeatureRow(fixture, row); }

    private static String verdict() { return GuiSupport.checkVerdict(window); }

    private static void checkAndWait(Path file) { GuiSupport.checkAndWait(window, file); }

    @Test
    @Order(1)
    void aProfileFileIsJudgedAgainstF1sChosenCrAndKeepRecordsThatVerdict() {
        selectRow(0);
        GuiSupport.onEdt(() -> window.showTab(3));
        checkAndWait(HOUSING);
        String v = verdict();
        // the headline names the feature and its chosen callout (CR2 ±0.2 is CR 1.8-2.2), never the file's profile
        assertThat(v).contains("F1").contains("CR 1.8-2.2").contains("(mm)").doesNotContain("profile");
        assertThat(v).matches("The measured contour of F1 (conforms|does not conform) to its chosen callout.*");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().fileSaysText())).startsWith("The file says: profile 0.1");
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "check-bound-light");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isTrue();
        fixture.button("checkKeep").click();
        RadiusFeature f1 = window.session().worksheet().feature("F1").orElseThrow();
        assertThat(f1.inspection().figures()).containsEntry("callout", "CR 1.8-2.2");
        assertThat(f1.inspection().passed()).isEqualTo(v.contains(" conforms to "));
        // the status line says against what the kept verdict was judged, in which units
        GuiSupport.waitFor(() -> String.valueOf(GuiSupport.onEdt(() -> window.statusLine().featureDetail()))
                .contains("against CR 1.8-2.2 (mm)"), 10);
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isFalse();
    }

    @Test
    @Order(2)
    void selectingAnotherFeatureClearsTheResultAndKeep() {
        selectRow(0);
        GuiSupport.onEdt(() -> window.showTab(3));
        checkAndWait(HOUSING);
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().comparisonRows())).isPositive();
        selectRow(1);
        assertThat(verdict()).isEqualTo("No contour checked for F2 yet.");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().targetText())).startsWith("F2,").doesNotContain("F1");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().comparisonRows())).isZero();
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isFalse();
    }

    @Test
    @Order(3)
    void anUndecidedFeatureIsNotCheckedAndNoEarlierTableStaysBelowTheMessage() {
        selectRow(0);
        checkAndWait(HOUSING);
        selectRow(4);
        checkAndWait(HOUSING);
        assertThat(verdict()).startsWith("Not checked: F5 has no callout chosen yet");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().comparisonRows())).isZero();
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isFalse();
        assertThat(window.session().worksheet().feature("F5").orElseThrow().inspection()).isNull();
    }

    @Test
    @Order(4)
    void aSectionOfAnR2RoundIsNotTakenForTheR04FilletWithoutConfirmation() {
        // F3: an R0.4 fillet with a profile callout; the file is a section of an R2 round
        selectRow(2);
        checkAndWait(BRACKET_R);
        assertThat(verdict()).startsWith("Not checked yet").contains("nominal radius is 2 mm").contains("F3's is 0.4 mm")
                .contains("round");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().confirmOffered())).isTrue();
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isFalse();
        GuiSupport.screenshot(window.frame(), "check-confirm-light");
        selectRow(3);
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().confirmOffered())).isFalse();
    }

    @Test
    @Order(5)
    void openingAnotherWorksheetClearsTheCheck() {
        selectRow(0);
        checkAndWait(HOUSING);
        assertThat(verdict()).startsWith("The measured contour of F1");
        GuiSupport.onEdt(() -> window.session().showFresh(MainWindow.readDemo(new WorksheetFiles(
                new JsonFiles()))));
        GuiSupport.settle(100);
        assertThat(verdict()).isEqualTo("No contour checked for F1 yet.");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().targetText())).contains("no callout chosen yet");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isFalse();
        GuiSupport.onEdt(() -> window.open(DECIDED));
    }

    @Test
    @Order(6)
    void decideAnswersTypedForOneFeatureSurviveSelectingAnother() {
        selectRow(1);
        GuiSupport.onEdt(() -> window.showTab(0));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.decidePanel().isShowing()), 10);
        fixture.textBox("q.NOMINAL").deleteText().enterText("0.9");
        GuiSupport.settle(100);
        selectRow(4);
        // nothing was put on the worksheet, and nothing was dropped either
        assertThat(window.session().worksheet().feature("F2").orElseThrow().designCase().nominalRadius()).isEqualTo(0.8);
        assertThat(GuiSupport.onEdt(() -> window.decidePanel().unkeptAnswers())).containsExactly("F2");
        selectRow(1);
        assertThat(fixture.textBox("q.NOMINAL").text()).isEqualTo("0.9");
        assertThat(fixture.textBox("unkeptAnswers").target().isVisible()).isTrue();
        GuiSupport.screenshot(window.frame(), "decide-unkept-light");
        fixture.button("keepAnswers").click();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.session().worksheet().feature("F2").orElseThrow()
                .designCase().nominalRadius()) == 0.9, 10); // the click is handled on the event thread
        assertThat(window.session().worksheet().feature("F2").orElseThrow().designCase().nominalRadius()).isEqualTo(0.9);
        assertThat(GuiSupport.onEdt(() -> window.decidePanel().unkeptAnswers())).isEmpty();
        GuiSupport.onEdt(() -> window.session().undo());
    }

    @Test
    @Order(7)
    void recommendationsOpenAtTheBestCard() {
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.notesPanel().queryField().isEnabled()), 60);
        selectRow(0);
        GuiSupport.onEdt(() -> window.showTab(0));
        GuiSupport.waitFor(() -> !GuiSupport.onEdt(() -> window.decidePanel().shownRecommendations()).isEmpty(), 30);
        GuiSupport.settle(500);
        assertThat(GuiSupport.onEdt(() -> window.decidePanel().resultsScrolledBy())).isZero();
        fixture.button("choose1").click();
        GuiSupport.settle(500);
        assertThat(GuiSupport.onEdt(() -> window.decidePanel().resultsScrolledBy())).isZero();
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.settle(800);
        assertThat(GuiSupport.onEdt(() -> window.decidePanel().resultsScrolledBy())).isZero();
        GuiSupport.screenshot(window.frame(), "decide-cards-dark");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
        GuiSupport.onEdt(() -> window.session().undo());
    }

    @Test
    @Order(8)
    void anUnsavedRuleEditIsNotDroppedWhenAnotherRuleIsClicked() {
        GuiSupport.onEdt(() -> window.showTab(4));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().isShowing())
                && fixture.list("ruleList").contents().length > 1, 30);
        fixture.list("ruleList").selectItem(0);
        GuiSupport.settle(200);
        String edited = GuiSupport.onEdt(() -> window.practicePanel().editor().getText()).replaceFirst("\\{", "{\n  ");
        // the JSON stays available as the advanced tab beside the form
        fixture.tabbedPane("ruleViews").selectTab("JSON");
        fixture.textBox("ruleText").setText(edited);
        fixture.list("ruleList").selectItem(1);
        var keep = fixture.optionPane().requireMessage("The changes to rule " + firstRuleId() + " are not saved.")
                .buttonWithText("Keep editing");
        // pressed, not clicked: a real click can land on another window left above the dialog (a notice, a
        // tooltip), which leaves the modal dialog open and every later step blocked behind it
        SwingUtilities.invokeLater(keep.target()::doClick);
        GuiSupport.waitFor(() -> !keep.target().isShowing(), 10);
        GuiSupport.settle(200);
        assertThat(fixture.list("ruleList").target().getSelectedIndex()).isZero();
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().editor().getText())).isEqualTo(edited);
        fixture.list("ruleList").selectItem(1);
        var discard = fixture.optionPane().buttonWithText("Discard the changes");
        SwingUtilities.invokeLater(discard.target()::doClick);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> fixture.list("ruleList").target().getSelectedIndex()) == 1, 10);
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().ruleEdited())).isFalse();
    }

    @Test
    @Order(9)
    void theDesktopExportWritesTheSameSheetAsTheCommandLine() throws Exception {
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.action("file.export").isEnabled()), 60);
        Path saved = config.resolve("same.arcpart");
        GuiSupport.onEdt(() -> window.saveTo(saved));
        // the same file name in two folders: a Markdown sheet names its frames folder after itself
        Path desk = config.resolve("desk").resolve("sheet.md");
        Files.createDirectories(desk.getParent());
        GuiSupport.onEdt(() -> window.export(desk));
        GuiSupport.waitFor(() -> Files.exists(desk)
                && GuiSupport.onEdt(() -> window.statusLine().message()).startsWith("Exported"), 60);
        Path cli = config.resolve("cli").resolve("sheet.md");
        Files.createDirectories(cli.getParent());
        StringWriter out = new StringWriter();
        int code = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(out, true))
                .execute("sheet", saved.toString(), "--out", cli.toString(), "--no-settings",
                        "--personal", config.resolve("personal-pack").toString());
        assertThat(code).as(out.toString()).isZero();
        String a = Files.readString(desk), b = Files.readString(cli);
        // the undecided F5 shows the advisor's suggestion in both, and both name the same producer
        assertThat(a).contains("F5");
        assertThat(a).isEqualTo(b);
    }

    @Test
    @Order(10)
    void commandsAreWhereAUserLooksForThem() {
        selectRow(0);
        // F1 has a chosen callout: Copy is available (it said "no feature is selected")
        assertThat(GuiSupport.onEdt(() -> window.action("edit.copyCallout").isEnabled())).isTrue();
        selectRow(4);
        assertThat(GuiSupport.onEdt(() -> (String) window.action("edit.copyCallout").getValue(Action.SHORT_DESCRIPTION)))
                .contains("F5 has no callout chosen yet");
        // import measured points is a command: in the File menu and so in the command finder
        assertThat(GuiSupport.onEdt(() -> window.catalog().group("File").stream().map(c -> c.id()).toList()))
                .contains("file.importPoints");
        fixture.menuItemWithPath("View").click();
        List<String> view = GuiSupport.onEdt(() -> {
            List<String> names = new ArrayList<>();
            JMenu m = window.frame().getJMenuBar().getMenu(3);
            for (int i = 0; i < m.getItemCount(); i++) if (m.getItem(i) != null) names.add(m.getItem(i).getText());
            return names;
        });
        fixture.pressAndReleaseKeys(KeyEvent.VK_ESCAPE, KeyEvent.VK_ESCAPE);
        assertThat(view.indexOf("Go to Check")).isLessThan(view.indexOf("Go to Notes"));
        assertThat(view.indexOf("Go to Notes")).isLessThan(view.indexOf("Go to Practice editor"));
        assertThat(GuiSupport.onEdt(() -> window.catalog().group("Help").stream().map(c -> c.title()).toList()))
                .contains("Guide", "About Arcwright");
        // undo says what it undid
        GuiSupport.onEdt(() -> window.session().addFeature());
        fixture.button("tool.edit.undo").click();
        assertThat(GuiSupport.onEdt(() -> window.statusLine().message())).startsWith("Undid: Add F6");
    }

    @Test
    @Order(11)
    void atBothWindowSizesTheColumnsShareTheWidthAndTheTabsStayInOneRow() {
        selectRow(0);
        int[] small = null;
        for (int[] size : new int[][] {{1024, 700}, {1600, 1000}}) {
            GuiSupport.onEdt(() -> {
                window.frame().setExtendedState(Frame.NORMAL);
                window.frame().setSize(size[0], size[1]);
                window.frame().validate();
            });
            GuiSupport.settle(300);
            int[] widths = GuiSupport.onEdt(() -> window.columnWidths());
            if (size[0] == 1024) {
                small = widths;
                // the work area keeps a usable width, and its tabs one row in a fixed order
                assertThat(widths[1]).isGreaterThanOrEqualTo(440);
                assertThat(GuiSupport.onEdt(() -> window.workArea().getTabRunCount())).isEqualTo(1);
            } else {
                // a larger window widens the side panels too, not only the work area
                assertThat(widths[0]).isGreaterThan(small[0]);
                assertThat(widths[2]).isGreaterThan(small[2]);
            }
            for (ThemeChoice theme : new ThemeChoice[] {
                ThemeChoice.LIGHT, ThemeChoice.DARK}) {
                String look = theme == ThemeChoice.LIGHT ? "light" : "dark";
                GuiSupport.onEdt(() -> window.setTheme(theme));
                GuiSupport.onEdt(() -> window.showTab(3));
                checkAndWait(HOUSING);
                GuiSupport.settle(400);
                GuiSupport.screenshot(window.frame(), "check-" + size[0] + "x" + size[1] + "-" + look);
                GuiSupport.onEdt(() -> window.showTab(0));
                GuiSupport.settle(600);
                GuiSupport.screenshot(window.frame(), "decide-" + size[0] + "x" + size[1] + "-" + look);
                GuiSupport.onEdt(() -> window.showTab(4));
                GuiSupport.settle(400);
                GuiSupport.screenshot(window.frame(), "practice-" + size[0] + "x" + size[1] + "-" + look);
            }
        }
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    /**
     * A file stating its uncertainty U, checked for F1 (CR 1.8-2.2): the command line calls it
     * indeterminate (ISO 14253-1 default decision rule), so the Check view must too, and Keep must keep
     * "indeterminate", never "fail" or "pass". Before the fix the view dropped U and said "does not conform".
     */
    @Test
    @Order(12)
    void aVerdictTheUncertaintyCannotDecideIsShownAndKeptAsIndeterminate(@TempDir Path dir) throws Exception {
        Path file = Sections.uncertainHousing(dir, 0.01);
        selectRow(0);
        GuiSupport.onEdt(() -> window.showTab(3));
        checkAndWait(file);
        assertThat(verdict()).startsWith("The measured contour of F1 can be neither accepted nor rejected against its chosen "
                + "callout, CR 1.8-2.2 (mm)").contains("U = 0.01 mm").doesNotContain("does not conform");
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "check-indeterminate-light");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "check-indeterminate-dark");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
        fixture.button("checkKeep").click();
        GuiSupport.waitFor(() -> window.session().worksheet().feature("F1").orElseThrow().inspection().undecided(), 10);
        RadiusFeature f1 = window.session().worksheet().feature("F1").orElseThrow();
        assertThat(f1.inspection().verdict()).isEqualTo("indeterminate");
        assertThat(f1.status()).isEqualTo(RadiusFeature.Status.MEASURED_INDETERMINATE);
        // the Part table says so in the feature's row
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> {
            var t = fixture.table("featureTable").target();
            for (int c = 0; c < t.getColumnCount(); c++) {
                if ("measured: indeterminate".equals(String.valueOf(t.getValueAt(0, c)))) return true;
            }
            return false;
        }), 10);
    }

    /**
     * The Zone view after checking the housing section for F1 (CR 1.8-2.2): point #15 lies 0.00086 mm
     * beyond fitted surface a, and its tooltip says so in those words. Before the fix it read
     * "outside by 1.8009 mm", the lower limit plus that depth, which an inspector reads as 1.8 mm out.
     */
    @Test
    @Order(13)
    void aPointBeyondASurfaceIsDescribedByItsDistanceInTheZoneView() {
        selectRow(0);
        GuiSupport.onEdt(() -> window.showTab(3));
        checkAndWait(HOUSING);
        GuiSupport.onEdt(() -> window.showTab(1));
        ZoneViewPanel zone = (ZoneViewPanel) fixture.panel("zoneView").target();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(zone::plottedPoints) > 0, 10);
        List<String> tips = GuiSupport.onEdt(() -> {
            List<String> t = new ArrayList<>();
            for (int i = 0; i < zone.plottedPoints(); i++) t.add(zone.pointTooltip(i));
            return t;
        });
        assertThat(tips).filteredOn(t -> t.startsWith("point #15 "))
                .singleElement().asString().contains("outside by 0.0009 mm (distance beyond surface)");
        assertThat(tips).noneSatisfy(t -> assertThat(t).contains("outside by 1.8"));
    }

    private static String firstRuleId() {
        return GuiSupport.onEdt(() -> ((RuleBook.Entry) fixture.list("ruleList").target().getModel()
                .getElementAt(0)).rule().id());
    }
}
