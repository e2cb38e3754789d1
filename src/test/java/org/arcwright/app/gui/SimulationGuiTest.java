package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Dimension;
import java.awt.Point;
import java.awt.Rectangle;
import java.awt.event.MouseEvent;
import java.nio.file.Path;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JTabbedPane;
import javax.swing.JTextField;
import javax.swing.JToggleButton;
import javax.swing.SwingUtilities;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.simulate.SimulationView;
import org.arcwright.services.CaseSimulations;
import org.arcwright.simulate.Outcome;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The Simulation view as a user drives it on the invented Tarnbeck output shaft: select a feature,
 * run, see a bar per candidate callout (the chosen one marked), click a segment to see example parts
 * drawn in the zone, select another feature and see the result go, cancel a long run.
 */
@Tag("gui")
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class SimulationGuiTest {
    private static final Path DECIDED = Path.of("examples/tarnbeck-output-shaft-decided.arcpart").toAbsolutePath();

    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension();

    // filled by the extension
    private static MainWindow window;
    private static FrameFixture fixture;

    @BeforeAll
    static void openDecided() {
        GuiSupport.onEdt(() -> window.open(DECIDED));
    }

    private static SimulationView view() {
        return (SimulationView) opened.robot().finder().findByName(window.frame(), "simulationView");
    }

    private static void showSimulation() {
        GuiSupport.onEdt(() -> {
            JTabbedPane work = (JTabbedPane) opened.robot().finder().findByName(window.frame(), "workArea");
            work.setSelectedIndex(work.indexOfTab("Simulation"));
        });
    }

    private static void selectRow(int row) { GuiSupport.selectFeatureRow(fixture, row); }

    private static JButton button(String name) {
        return (JButton) opened.robot().finder().findByName(window.frame(), name);
    }

    /** Presses a button on the event thread (no robot click another window could catch). */
    private static void press(String name) {
        JButton b = button(name);
        SwingUtilities.invokeLater(b::doClick);
        GuiSupport.settle(100);
    }

    /** Opens the figures as a user would ("Change figures") and types the parts. */
    private static void setParts(int n) {
        JToggleButton edit = (JToggleButton) opened.robot().finder().findByName(window.frame(), "simulate.edit");
        if (!GuiSupport.onEdt(edit::isSelected)) SwingUtilities.invokeLater(edit::doClick);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> opened.robot().finder().findByName(window.frame(), "simulate.parts", false).isShowing()), 10);
        GuiSupport.onEdt(() -> ((JTextField) opened.robot().finder().findByName(window.frame(), "simulate.parts")).setText(Integer.toString(n)));
    }

    /** Selects {@code row} and waits until the view shows that feature, ready to run. */
    private static void selectAndWait(int row, String id) {
        selectRow(row);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().subjectText().startsWith(id) && button("simulate.run").isEnabled()), 60);
    }

    private static void runAndWait() {
        press("simulate.run");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().rows() != null), 240);
    }

    @Test
    @Order(1)
    void aRunOfTheSelectedFeatureShowsABarPerCandidateWithTheChosenCalloutMarked() {
        GuiSupport.onEdt(() -> window.frame().setSize(new Dimension(1024, 700)));
        showSimulation();
        selectAndWait(1, "F2");
        setParts(300);
        runAndWait();
        List<CaseSimulations.Judged> rows = GuiSupport.onEdt(() -> view().rows());
        // F2 chose R0.8 ±0.1 (R 0.7-0.9), which no advisor card proposes: it comes last, marked chosen
        CaseSimulations.Judged last = rows.get(rows.size() - 1);
        assertThat(last.candidate().chosen()).isTrue();
        assertThat(last.callout().text()).isEqualTo("R 0.7-0.9");
        assertThat(rows.stream().filter(r -> r.candidate().chosen()).count()).isEqualTo(1);
        assertThat(rows.size()).isGreaterThanOrEqualTo(3);
        for (int i = 0; i < rows.size(); i++) {
            CaseSimulations.Judged r = rows.get(i);
            if (r.result() == null) {
                assertThat(r.notSimulated()).isNotBlank();
                continue;
            }
            int k = i;
            assertThat(r.callout().parts()).isEqualTo(300);
            assertThat(GuiSupport.onEdt(() -> view().bar(k) != null && view().bar(k).isShowing())).isTrue();
        }
        assertThat(GuiSupport.onEdt(() -> view().progressText())).startsWith("done").contains("300 parts each");
        assertThat(GuiSupport.onEdt(() -> view().processText())).contains("300 parts, seed 19").contains("noise 0.001 mm");
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "simulation-1024x700-light");
    }

    @Test
    @Order(2)
    void clickingABarSegmentShowsExamplePartsOfThatKindDrawnInTheZone() {
        List<CaseSimulations.Judged> rows = GuiSupport.onEdt(() -> view().rows());
        int row = rows.size() - 1;
        // the chosen R 0.7-0.9 turns good parts away as well as accepting them: click its false rejects if any, else its accepted
        Outcome kind = rows.get(row).callout().falseRejects() > 0 ? Outcome.FALSE_REJECT : Outcome.ACCEPTED_GOOD;
        GuiSupport.onEdt(() -> view().bar(row).scrollRectToVisible(new Rectangle(0, 0, 10, 30)));
        GuiSupport.settle(200);
        Point p = GuiSupport.onEdt(() -> view().barPoint(row, kind));
        assertThat(p).isNotNull();
        // the segment's tooltip gives its count and 95 % interval
        String tip = GuiSupport.onEdt(() -> view().bar(row).getToolTipText(new MouseEvent(view().bar(row),
                MouseEvent.MOUSE_MOVED, 0, 0, p.x, p.y, 0, false)));
        assertThat(tip).contains(capital(kind.label())).contains("of 300 parts").contains("95 % Wilson interval");
        opened.robot().click(view().bar(row), p);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().examplesShown() > 0 && view().examplePlotted()), 60);
        assertThat(GuiSupport.onEdt(() -> view().examplesHeading())).startsWith(capital(kind.label())).contains("R 0.7-0.9");
        assertThat(GuiSupport.onEdt(() -> view().examplesShown())).isBetween(1, 4);
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "simulation-examples-1024x700-light");
        GuiSupport.onEdt(() -> window.frame().setSize(new Dimension(1600, 1000)));
        GuiSupport.settle(500);
        GuiSupport.screenshot(window.frame(), "simulation-1600x1000-light");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.settle(500);
        GuiSupport.screenshot(window.frame(), "simulation-1600x1000-dark");
        GuiSupport.onEdt(() -> window.frame().setSize(new Dimension(1024, 700)));
        GuiSupport.settle(500);
        GuiSupport.screenshot(window.frame(), "simulation-1024x700-dark");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    @Test
    @Order(3)
    void selectingAnotherFeatureClearsTheResultAndItsExamples() {
        assertThat(GuiSupport.onEdt(() -> view().rows())).isNotNull();
        selectAndWait(4, "F5");
        assertThat(GuiSupport.onEdt(() -> view().rows())).isNull();
        assertThat(GuiSupport.onEdt(() -> view().examplesShown())).isZero();
        assertThat(GuiSupport.onEdt(() -> view().bar(0))).isNull();
        // F5 is undecided: it still has the advisor's candidates, none marked chosen
        assertThat(window.session().selected().orElseThrow().chosen()).isNull();
        setParts(200);
        runAndWait();
        List<CaseSimulations.Judged> f5 = GuiSupport.onEdt(() -> view().rows());
        assertThat(f5).isNotEmpty().noneMatch(r -> r.candidate().chosen());
        assertThat(f5).anyMatch(r -> r.result() != null);
        // and back: F2's old result does not come back, it must be run again; nor does F5's
        selectAndWait(1, "F2");
        assertThat(GuiSupport.onEdt(() -> view().rows())).isNull();
        assertThat(GuiSupport.onEdt(() -> view().examplesShown())).isZero();
    }

    @Test
    @Order(4)
    void aLongRunCanBeCancelledAndARunNeverOutlivesItsFeature() {
        setParts(2_000_000);
        press("simulate.run");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().running() && button("simulate.cancel").isEnabled()), 30);
        assertThat(GuiSupport.onEdt(() -> view().progressText())).contains("% of 2,000,000 parts");
        press("simulate.cancel");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().statusText().startsWith("Cancelled") && !view().running()), 60);
        assertThat(GuiSupport.onEdt(() -> button("simulate.run").isEnabled())).isTrue();
        assertThat(GuiSupport.onEdt(() -> view().rows())).isNull();

        // a run under way when another feature is selected is dropped: no result appears for the new one
        setParts(2_000_000);
        press("simulate.run");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().running()), 30);
        selectAndWait(4, "F5");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> !view().running()), 60);
        GuiSupport.settle(300);
        assertThat(GuiSupport.onEdt(() -> view().rows())).isNull();
        assertThat(GuiSupport.onEdt(() -> view().subjectText())).startsWith("F5");
    }

    private static String capital(String s) { return Character.toUpperCase(s.charAt(0)) + s.substring(1); }
}
