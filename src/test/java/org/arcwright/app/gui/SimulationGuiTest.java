package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Dimension;
import java.awt.Point;
import java.nio.file.Path;
import javax.swing.JTabbedPane;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.simulate.SimulationView;
import org.arcwright.simulate.Outcome;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The Simulation view as a user drives it: a process file of an invented part, a run in the
 * background, a click on a callout's escapes to see what slipped through, and a cancelled long run.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class SimulationGuiTest {
    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension();

    // filled by the extension
    private static MainWindow window;
    private static FrameFixture fixture;

    private static SimulationView view() {
        return (SimulationView) opened.robot().finder().findByName(window.frame(), "simulationView");
    }

    @Test
    @Order(1)
    void aRunShowsBarsAndAClickOnEscapesShowsTheEscapedParts() {
        GuiSupport.onEdt(() -> window.frame().setSize(new Dimension(1024, 700)));
        GuiSupport.onEdt(() -> {
            JTabbedPane work = (JTabbedPane) opened.robot().finder().findByName(window.frame(), "workArea");
            work.setSelectedIndex(work.indexOfTab("Simulation"));
        });
        GuiSupport.settle(300);
        Path example = Path.of("examples/simulate/pump-bracket.json").toAbsolutePath();
        fixture.textBox("simulate.file").setText(example.toString());
        fixture.spinner("simulate.parts").enterTextAndCommit("400");
        fixture.button("simulate.run").click();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().result() != null), 180);
        assertThat(GuiSupport.onEdt(() -> view().summaryText())).contains("400 parts").contains("functionally good");
        assertThat(view().result().callouts()).hasSize(4);
        // the R callout lets flats through: its escapes segment is there to click
        assertThat(view().result().callouts().get(0).escapes()).isPositive();
        Point p = GuiSupport.onEdt(() -> view().barPoint(0, Outcome.ESCAPE));
        opened.robot().click(view().bars(), p);
        GuiSupport.settle(300);
        assertThat(GuiSupport.onEdt(() -> view().examplesHeading())).contains("escape").contains("R 1.9-2.1");
        assertThat(GuiSupport.onEdt(() -> view().examplesShown())).isBetween(1, 4);
        GuiSupport.screenshot(window.frame(), "simulation-1024x700");
        GuiSupport.onEdt(() -> window.frame().setSize(new Dimension(1600, 1000)));
        GuiSupport.settle(500);
        GuiSupport.screenshot(window.frame(), "simulation-1600x1000");
    }

    @Test
    @Order(2)
    void aLongRunCanBeCancelled() {
        fixture.spinner("simulate.parts").enterTextAndCommit("2000000");
        fixture.button("simulate.run").click();
        GuiSupport.settle(500);
        fixture.button("simulate.cancel").click();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> view().summaryText()).startsWith("cancelled"), 60);
        assertThat(fixture.button("simulate.run").isEnabled()).isTrue();
    }
}
