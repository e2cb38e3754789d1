package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.event.KeyEvent;
import java.util.List;
import javax.swing.JFrame;
import javax.swing.JMenuItem;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.rules.Recommendation;
import org.arcwright.worksheet.RadiusFeature;
import org.assertj.swing.core.Robot;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * Walks the main decision flow through the real window: a fatigue-loaded shoulder fillet from the
 * form to a callout on the worksheet, in the light look and again in the dark one.
 */
@Tag("gui")
class DecideFlowGuiTest {
    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension()
            .readyWhen(w -> w.statusLine().message().startsWith("Ready"));

    // filled by the extension
    private static MainWindow window;
    private static FrameFixture fixture;
    private static Robot robot;

    @Test
    void aFatigueLoadedShoulderFilletIsDecidedOntoTheWorksheet() {
        GuiSupport.screenshot(window.frame(), "main-light");
        assertThat(window.notice().message()).contains("demo worksheet");
        fixture.table("featureTable").selectRows(0);
        assertThat(window.session().selected().map(RadiusFeature::id)).contains("F1");
        GuiSupport.onEdt(() -> window.showTab(0));
        fixture.textBox("q.TOLERANCE").deleteText().enterText("R2 +0.3/-0.1");
        GuiSupport.settle(1500);
        assertThat(GuiSupport.onEdt(() -> window.decidePanel().figuresText())).contains("1.9000 mm").contains("2.3000 mm");
        List<Recommendation> shown =
                GuiSupport.onEdt(() -> window.decidePanel().shownRecommendations());
        assertThat(shown).isNotEmpty();
        // the engineer's own intent is offered as written too (last, unless the advisor proposes it)
        assertThat(shown).anySatisfy(r -> assertThat(r.text()).isEqualTo("R2 +0.3/-0.1"));
        GuiSupport.screenshot(window.frame(), "decide-light");
        fixture.button("choose1").click();
        GuiSupport.settle(200);
        RadiusFeature f1 = window.session().worksheet().feature("F1").orElseThrow();
        assertThat(f1.chosen()).isEqualTo(shown.get(0));
        assertThat(f1.status()).isEqualTo(RadiusFeature.Status.DECIDED);
        JTable table = (JTable) fixture.table("featureTable").target();
        assertThat(GuiSupport.onEdt(() -> table.getValueAt(0, 2))).isEqualTo(shown.get(0).text());
        GuiSupport.chord(robot, KeyEvent.VK_Z);
        GuiSupport.settle(100);
        assertThat(window.session().worksheet().feature("F1").orElseThrow().chosen()).isNull();
        GuiSupport.onEdt(() -> window.session().redo());
        GuiSupport.onEdt(() -> window.showTab(1));
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "zone-light");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.onEdt(() -> window.showTab(0));
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "decide-dark");
        GuiSupport.onEdt(() -> window.showTab(1));
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "zone-dark");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    /** Menus are filled when first opened; their items show the shortcuts bound since the first frame. */
    @Test
    void aMenuShowsItsCommandsAndShortcutsWhenOpened() {
        fixture.menuItem("menu.Edit").click();
        JMenuItem undo = (JMenuItem) fixture.menuItem("item.edit.undo").target();
        assertThat(undo.getAccelerator()).isEqualTo(KeyStroke.getKeyStroke("ctrl Z"));
        assertThat(GuiSupport.onEdt(() -> window.frame().getJMenuBar().getMenu(1).getItemCount()))
                .isEqualTo(GuiSupport.onEdt(() -> window.catalog().group("Edit").size()));
        robot.pressAndReleaseKey(KeyEvent.VK_ESCAPE);
        robot.pressAndReleaseKey(KeyEvent.VK_ESCAPE);
        robot.waitForIdle();
    }
}
