package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.worksheet.RadiusFeature;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
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

    @TempDir
    static Path config;

    private static GuiSupport.OpenWindow opened;
    private static MainWindow window;
    private static FrameFixture fixture;

    @BeforeAll
    static void openWindow() {
        opened = GuiSupport.openWindow(config);
        window = opened.window();
        fixture = opened.fixture();
        GuiSupport.onEdt(() -> window.open(DECIDED));
    }

    @AfterAll
    static void closeWindow() {
        if (opened != null) opened.close();
    }

    private static void selectRow(int row) {
        fixture.table("featureTable").selectRows(row);
        GuiSupport.settle(100);
    }

    private static String verdict() { return GuiSupport.onEdt(() -> window.checkPanel().verdictText()); }

    private static void checkAndWait(Path file) {
        GuiSupport.onEdt(() -> window.checkPanel().check(file));
        GuiSupport.waitFor(() -> verdict().startsWith("The measured contour") || verdict().startsWith("Not checked")
                || verdict().startsWith("Cannot check"), 30);
    }

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
        GuiSupport.onEdt(() -> window.session().showFresh(MainWindow.readDemo(new org.arcwright.worksheet.WorksheetFiles(
                new org.arcwright.io.JsonFiles()))));
        GuiSupport.settle(100);
        assertThat(verdict()).isEqualTo("No contour checked for F1 yet.");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().targetText())).contains("no callout chosen yet");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().canKeep())).isFalse();
        GuiSupport.onEdt(() -> window.open(DECIDED));
    }
}
