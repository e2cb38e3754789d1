package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Rectangle;
import java.util.List;
import java.util.Locale;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.SwingUtilities;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.app.zoneview.ZoneViewPanel;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Need;
import org.arcwright.rules.Recommendation;
import org.arcwright.callout.Callout.SizeLimits;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The Decide cards show what the text output of {@code advise} shows: the needs with a tick or cross per
 * card and, when no card meets every need, the statement and the design changes above the cards. The
 * case is an invented gear seat: a fatigue fillet whose K_t target needs about 2.79 mm under a mating
 * 1.5 × 45° chamfer that admits at most 1.5 mm, so nothing can meet every need.
 */
@Tag("gui")
class DecideNeedsGuiTest {
    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension()
            .readyWhen(w -> w.statusLine().message().startsWith("Ready"));

    // filled by the extension
    private static MainWindow window;
    private static FrameFixture fixture;

    private static DesignCase gearSeat() {
        return new DesignCase(Units.MM, DrawingStyle.ISO, "gear seat", BlendKind.FILLET, 2, BlendFunction.MATING,
                Loading.FATIGUE, true, false, List.of(), Process.MACHINED,
                new DesignCase.StressInputs("stepped-shaft", "bending", 42, 35, new DesignCase.Strength(900, "MPa"), 1.75, null),
                new DesignCase.MatingCorner("chamfer", 1.5, null), null);
    }

    @Test
    void whenNothingMeetsEveryNeedTheStatementAndDesignChangesComeFirstAndEveryCardSaysWhatItMisses() {
        fixture.table("featureTable").selectRows(0);
        GuiSupport.onEdt(() -> window.showTab(0));
        GuiSupport.onEdt(() -> window.session().updateCase("F1", gearSeat()));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> find("needsTable") != null && find("card1") != null), 30);
        GuiSupport.settle(500);

        JComponent block = GuiSupport.onEdt(() -> find("nothingMeets"));
        assertThat(block).as("the nothing-meets block").isNotNull();
        String statement = GuiSupport.onEdt(() -> ((WrapLabel) find("nothingMeetsStatement")).getText());
        assertThat(statement).startsWith("Nothing meets every need").contains("2.789", "1.500");
        String changes = GuiSupport.onEdt(() -> texts(block));
        assertThat(changes).contains("What would work (design changes):", "relief-groove", "larger-mating-chamfer");
        // on top: above the table and above the first card
        assertThat(GuiSupport.onEdt(() -> yOf(block))).isLessThan(GuiSupport.onEdt(() -> yOf(find("needsTable"))));
        assertThat(GuiSupport.onEdt(() -> yOf(find("needsTable")))).isLessThan(GuiSupport.onEdt(() -> yOf(find("card1"))));

        // the table has one mark per need and card, as the advisor proved them
        Advice advice = GuiSupport.onEdt(() -> window.decidePanel().shownAdvice());
        assertThat(advice.anyUsable()).isFalse();
        for (Need n : advice.needs()) {
            for (int i = 0; i < advice.recommendations().size(); i++) {
                Recommendation r = advice.recommendations().get(i);
                String name = "need." + n.key() + "." + (i + 1);
                String mark = GuiSupport.onEdt(() -> ((JLabel) find(name)).getText());
                Boolean ok = r.meets().get(n.key());
                assertThat(mark).as(name).isEqualTo(ok == null ? "?" : ok ? "✓" : "✗");
            }
        }
        assertThat(GuiSupport.onEdt(() -> texts(find("needsTable")))).contains("radius-floor", "r ≥ 2.789 mm",
                "radius-ceiling", "r ≤ 1.5 mm");
        // no card looks like a clean headline: each says which needs it misses
        for (int i = 1; i <= advice.recommendations().size(); i++) {
            int rank = i;
            String verdict = GuiSupport.onEdt(() -> verdictOf(find("card" + rank)));
            assertThat(verdict).as("card " + rank).isNotNull().doesNotStartWith("Meets every need")
                    .doesNotContain("radius-ceiling, radius-ceiling");
        }
        shoot("decide-needs");
        GuiSupport.onEdt(() -> window.frame().setSize(1600, 1000));
        GuiSupport.settle(400);
        GuiSupport.onEdt(() -> {
            JComponent t = find("needsTable");
            t.scrollRectToVisible(new Rectangle(0, 0, t.getWidth(), t.getHeight()));
        });
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "decide-needs-table-light-1600");
    }

    /**
     * R2 ±0.2 at ×100: the R1.8 limit would be drawn with radius 2 + 100 × (−0.2) &lt; 0, a sharp corner; the
     * view says so in words, the captions carry units and sit above the drawing, not on it.
     */
    @Test
    void theZoneViewWarnsWhenTheMagnificationDrawsALimitArcAsASharpCorner() {
        fixture.table("featureTable").selectRows(0);
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ISO, "shoulder", BlendKind.FILLET, 2, BlendFunction.STRESS_RELIEF,
                Loading.STATIC, false, false, List.of(), Process.MACHINED, null, null, "R2 ±0.2");
        GuiSupport.onEdt(() -> window.session().updateCase("F1", c));
        GuiSupport.onEdt(() -> window.showTab(1));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> find(window.frame(), "zoneView") != null), 30);
        ZoneViewPanel zone =
                GuiSupport.onEdt(() -> (ZoneViewPanel) find(window.frame(), "zoneView"));
        GuiSupport.onEdt(() -> zone.setMagnification(100));
        GuiSupport.settle(300);
        assertThat(GuiSupport.onEdt(zone::distortionWarning)).contains("×100", "R1.8 mm", "sharp corner");
        assertThat(GuiSupport.onEdt(zone::captionText)).contains("R limits 1.8 to 2.2 mm", "Zone width on the bisector: ")
                .contains(" mm (deviations shown ×100");
        // the words sit above the drawing: the canvas starts below the last caption
        JComponent canvas = GuiSupport.onEdt(() -> find(zone, "zoneCanvas"));
        JComponent warning = GuiSupport.onEdt(() -> find(zone, "zoneDistortion"));
        assertThat(GuiSupport.onEdt(() -> canvas.getY())).isGreaterThanOrEqualTo(
                GuiSupport.onEdt(() -> warning.getY() + warning.getHeight()));
        shootZone("zone-x100", zone);
        GuiSupport.onEdt(() -> zone.setMagnification(5));
        GuiSupport.settle(300);
        assertThat(GuiSupport.onEdt(zone::distortionWarning)).isEmpty();
        GuiSupport.onEdt(() -> window.showTab(0));
    }

    /**
     * A tolerance with deviations of the same sign, typed as the engineer's intent: R3 +0.3/+0.1. The
     * Decide panel advises on it and shows it as a card holding the limits R3.1-3.3. Before
     * the fix the form refused the tolerance ("the nominal radius 3 lies outside these limits") and the
     * card could not be built (its nominal lies outside its limits): no advice at all.
     */
    @Test
    void aSameSignToleranceIsShownAsTheEngineersOwnCard() {
        fixture.table("featureTable").selectRows(0);
        GuiSupport.onEdt(() -> window.showTab(0));
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ASME, "boss fillet", BlendKind.FILLET, 3, BlendFunction.COSMETIC,
                Loading.STATIC, false, false, List.of(), Process.MACHINED, null, null, "R3 +0.3/+0.1");
        GuiSupport.onEdt(() -> window.session().updateCase("F1", c));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> {
            Advice a = window.decidePanel().shownAdvice();
            return a != null && a.recommendations().stream().anyMatch(r -> "R3 +0.3/+0.1".equals(r.text()));
        }), 30);
        Recommendation intent = GuiSupport.onEdt(() -> window.decidePanel().shownAdvice().recommendations().stream()
                .filter(r -> "R3 +0.3/+0.1".equals(r.text())).findFirst().orElseThrow());
        // the card judged and kept is the zone R3.1-R3.3 the tolerance allows
        assertThat(((SizeLimits) intent.callout()).min()).isEqualTo(3.1, within(1e-9));
        assertThat(((SizeLimits) intent.callout()).max()).isEqualTo(3.3, within(1e-9));
        GuiSupport.settle(300);
        shoot("decide-same-sign");
    }

    private static void shootZone(String name, ZoneViewPanel zone) {
        for (ThemeChoice theme : List.of(ThemeChoice.LIGHT, ThemeChoice.DARK)) {
            GuiSupport.onEdt(() -> window.setTheme(theme));
            for (Dimension d : List.of(new Dimension(1024, 700), new Dimension(1600, 1000))) {
                GuiSupport.onEdt(() -> window.frame().setSize(d));
                GuiSupport.settle(600);
                GuiSupport.screenshot(window.frame(), name + "-" + theme.name().toLowerCase(Locale.ROOT)
                        + "-" + d.width);
            }
        }
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    private static void shoot(String name) {
        for (ThemeChoice theme : List.of(ThemeChoice.LIGHT, ThemeChoice.DARK)) {
            GuiSupport.onEdt(() -> window.setTheme(theme));
            for (Dimension d : List.of(new Dimension(1024, 700), new Dimension(1600, 1000))) {
                GuiSupport.onEdt(() -> window.frame().setSize(d));
                GuiSupport.settle(600);
                GuiSupport.screenshot(window.frame(), name + "-" + theme.name().toLowerCase(Locale.ROOT)
                        + "-" + d.width);
            }
        }
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    private static JComponent find(String name) {
        return find(window.decidePanel(), name);
    }

    private static JComponent find(Component c, String name) {
        if (c instanceof JComponent && name.equals(c.getName()) && c.isShowing()) return (JComponent) c;
        if (c instanceof Container) {
            for (Component k : ((Container) c).getComponents()) {
                JComponent f = find(k, name);
                if (f != null) return f;
            }
        }
        return null;
    }

    private static int yOf(Component c) {
        return SwingUtilities.convertPoint(c.getParent(), c.getLocation(), window.decidePanel()).y;
    }

    private static String verdictOf(Component card) {
        JComponent v = find(card, "cardVerdict");
        return v == null ? null : ((WrapLabel) v).getText();
    }

    private static String texts(Component c) {
        StringBuilder sb = new StringBuilder();
        if (c instanceof WrapLabel) sb.append(((WrapLabel) c).getText()).append('\n');
        else if (c instanceof JLabel) sb.append(((JLabel) c).getText()).append('\n');
        if (c instanceof Container) for (Component k : ((Container) c).getComponents()) sb.append(texts(k));
        return sb.toString();
    }
}
