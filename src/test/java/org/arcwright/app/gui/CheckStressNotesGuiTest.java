package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.zoneview.ZoneViewPanel;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.Inspector;
import org.arcwright.io.JsonFiles;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.worksheet.RadiusFeature;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * Walks the flows that need the core loaded after the window opens: a measured contour to its
 * verdict, the stress view of a fatigue-loaded fillet, and a notes search while the UI stays live.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
@Tag("gui")
class CheckStressNotesGuiTest {
    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension()
            .readyWhen(w -> w.notesPanel().queryField().isEnabled());

    // filled by the extension
    private static Path config;
    private static MainWindow window;
    private static FrameFixture fixture;

    @Test
    @Order(1)
    void aMeasuredContourGetsItsVerdictAndGoesOnTheWorksheet() {
        // F1, the invented shaft's R2 shoulder fillet, decided as CR 1.8-2.2; an example section of an R2 fillet
        GuiSupport.onEdt(() -> {
            window.session().select("F1");
            RadiusFeature f1 = window.session().selected().orElseThrow();
            window.session().choose("F1", f1.designCase(), new Recommendation("demo",
                    new Callout.ControlledRadius(1.8, 2.2, 2.0), "CR 1.8-2.2", 0, List.of(),
                    List.of(), List.of(), Map.of(), List.of(), List.of(), false));
        });
        GuiSupport.onEdt(() -> window.showTab(3));
        Path example = Path.of("examples/inspect/housing-fillet-profile.json").toAbsolutePath();
        boolean corePass = new Inspector()
                .inspect(new InspectionFiles(new JsonFiles()).read(example)
                        .withCallout(new InspectionCallout.RadiusLimits(
                                RadiusKind.CR, 1.8, 2.2))).pass();
        GuiSupport.onEdt(() -> window.checkPanel().check(example));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.checkPanel().verdictText().startsWith("The measured")), 30);
        // the panel shows the inspection core's verdict for F1's chosen callout
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().verdictText()))
                .contains(corePass ? " conforms to" : " does not conform to").contains("CR 1.8-2.2");
        assertThat(fixture.table("checkComparisons").rowCount()).isGreaterThan(0);
        GuiSupport.settle(200);
        // the verdict wraps rather than being cut short, and the comparison table shows several rows
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().verdictFullyShown())).isTrue();
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().visibleComparisonRows())).isGreaterThanOrEqualTo(3);
        GuiSupport.screenshot(window.frame(), "check-light");
        fixture.button("checkKeep").click();
        RadiusFeature kept = window.session().worksheet().feature("F1").orElseThrow();
        assertThat(kept.inspection()).isNotNull();
        assertThat(kept.inspection().verdict()).isEqualTo(corePass ? "pass" : "fail");
        assertThat(kept.inspection().figures()).containsEntry("callout", "CR 1.8-2.2");
    }

    @Test
    @Order(2)
    void pointsImportedInCheckArePlottedInTheZoneViewColouredByExcess() throws Exception {
        // decide F1 (the invented shaft's R2 shoulder fillet) as CR 1.8-2.2, then import a section with a dip
        GuiSupport.onEdt(() -> {
            window.session().select("F1");
            RadiusFeature f1 = window.session().selected().orElseThrow();
            window.session().choose("F1", f1.designCase(), new Recommendation("demo",
                    new Callout.ControlledRadius(1.8, 2.2, 2.0), "CR 1.8-2.2", 0, List.of(),
                    List.of(), List.of(), Map.of(), List.of(), List.of(), false));
        });
        Path csv = config.resolve("shoulder-section.csv");
        Files.writeString(csv, dippedSection());
        GuiSupport.onEdt(() -> window.showTab(3));
        GuiSupport.onEdt(() -> window.checkPanel().check(csv));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.checkPanel().verdictText().startsWith("The measured")), 30);
        GuiSupport.onEdt(() -> window.showTab(1));
        ZoneViewPanel zone =
                (ZoneViewPanel) fixture.panel("zoneView").target();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(zone::plottedPoints) > 0, 10);
        assertThat(GuiSupport.onEdt(zone::plottedPoints)).isEqualTo(dippedSection().split("\n").length - 1);
        // ×5: the dip shows inside the drawing (at ×10 this band's lower limit arc shrinks to the sharp corner)
        fixture.slider("magnification").slideTo(35);
        GuiSupport.settle(200);
        // hovering a point gives its deviation and its excess; the dip's points are outside
        List<String> tips = GuiSupport.onEdt(() -> {
            List<String> t = new ArrayList<>();
            for (int i = 0; i < zone.plottedPoints(); i++) t.add(zone.pointTooltip(i));
            return t;
        });
        assertThat(tips).allSatisfy(t -> assertThat(t).startsWith("point #").contains("deviation"));
        assertThat(tips).anySatisfy(t -> assertThat(t).contains("outside by"));
        GuiSupport.screenshot(window.frame(), "zone-points-light");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "zone-points-dark");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
        GuiSupport.onEdt(() -> window.session().undo());
    }

    /**
     * An invented section of an R2 fillet at a right angle (vertex at the origin, legs along +x and
     * +y): the blend every 3°, with a dip to R1.72 around 55° that leaves CR 1.8-2.2, and the legs.
     */
    private static String dippedSection() {
        StringBuilder sb = new StringBuilder("x,y\n");
        for (double x = 4; x > 2.05; x -= 0.25) sb.append(String.format(Locale.ROOT, "%.5f,%.5f%n", x, 0.0));
        for (int deg = 0; deg <= 90; deg += 3) {
            double phi = Math.toRadians(deg);
            double rho = 2.0 - 0.28 * Math.exp(-Math.pow((deg - 55) / 12.0, 2));
            sb.append(String.format(Locale.ROOT, "%.5f,%.5f%n", rho - rho * Math.cos(phi), rho - rho * Math.sin(phi)));
        }
        for (double y = 2.25; y <= 4.01; y += 0.25) sb.append(String.format(Locale.ROOT, "%.5f,%.5f%n", 0.0, y));
        return sb.toString();
    }

    @Test
    @Order(2)
    void theStressViewShowsKtAcrossTheToleranceOfTheShoulderFillet() {
        GuiSupport.onEdt(() -> window.session().select("F1"));
        GuiSupport.onEdt(() -> window.showTab(2));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.stressPanel().summaryText().contains("Kt")), 30);
        assertThat(GuiSupport.onEdt(() -> window.stressPanel().summaryText())).contains("at r min").contains("Kf");
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "stress-light");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "stress-dark");
        GuiSupport.onEdt(() -> window.showTab(3));
        GuiSupport.settle(200);
        GuiSupport.screenshot(window.frame(), "check-dark");
        assertThat(GuiSupport.onEdt(() -> window.checkPanel().verdictFullyShown())).isTrue();
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    @Test
    @Order(3)
    void typingANotesSearchListsTheNotesFound() {
        // Functional check only: how long typing holds the event thread is measured by
        // bench.TypingStallHarness (speed targets live in harnesses, not in unit tests).
        fixture.textBox("notesQuery").click().enterText("fatigue fillet");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> !window.notesPanel().listedTitles().isEmpty()
                && fixture.label("notesCount").target().getText().contains("fatigue")), 20);
        assertThat(GuiSupport.onEdt(() -> window.notesPanel().listedTitles())).isNotEmpty();
        GuiSupport.screenshot(window.frame(), "notes-light");
    }

    @Test
    @Order(4)
    void aRuleEditedWrongShowsWhereAndTheFixClearsIt() {
        GuiSupport.onEdt(() -> window.showTab(4));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().isShowing()) && fixture.list("ruleList").contents().length > 0, 20);
        fixture.list("ruleList").selectItem(0);
        GuiSupport.settle(200);
        String original = GuiSupport.onEdt(() -> window.practicePanel().editor().getText());
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().verdictText())).startsWith("The rule reads");
        String broken = original.replaceFirst("\"weight\"\\s*:\\s*\\d+", "\"weight\" : \"heavy\"");
        assertThat(broken).isNotEqualTo(original);
        fixture.tabbedPane("ruleViews").selectTab("JSON");
        fixture.textBox("ruleText").setText(broken);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().verdictText()).contains("weight"), 10);
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().verdictText())).matches("(?s).*line \\d+.*|(?s).*:\\d+:\\d+.*");
        GuiSupport.screenshot(window.frame(), "practice-error-light");
        fixture.textBox("ruleText").setText(original);
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().verdictText()).startsWith("The rule reads"), 10);
        fixture.button("runExamples").click();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().resultRows()) > 0, 30);
        GuiSupport.screenshot(window.frame(), "practice-light");
        // the first rule is built in: it is saved as an override in the personal pack, and the rules reload
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().saveLabel())).contains("override");
        fixture.button("ruleSave").click();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().saveMessage()).startsWith("Saved to"), 20);
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().saveMessage())).contains("override-");
    }

    @Test
    @Order(5)
    void aTemplateIsPreviewedForTheSelectedFeatureAsItIsEdited() {
        GuiSupport.onEdt(() -> window.session().select("F1"));
        GuiSupport.onEdt(() -> window.showTab(4));
        fixture.tabbedPane("practicePages").selectTab("Note templates");
        GuiSupport.waitFor(() -> fixture.list("templateList").contents().length > 0, 20);
        fixture.list("templateList").selectItem(Pattern.compile("callout-note.*"));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().templatePreviewText()).contains("F1"), 10);
        GuiSupport.screenshot(window.frame(), "templates-light");
        String original = GuiSupport.onEdt(() -> window.practicePanel().templateEditor().getText());
        fixture.textBox("templateText").setText("PREVIEW OF {{feature.id}}\n{{feature.nonsense}}\n");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().templateVerdictText()).contains("nonsense"), 10);
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().templateVerdictText())).contains("nonsense");
        GuiSupport.screenshot(window.frame(), "templates-error-light");
        fixture.textBox("templateText").setText(original.replaceFirst("\\{\\{feature.id}}", "NOTE {{feature.id}}"));
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().templatePreviewText()).contains("NOTE F1"), 10);
        // the built-in template is saved as an override of the same name in the personal pack, then the packs reload
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().templateSaveLabel())).contains("override");
        fixture.button("templateSave").click();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().templateSaveMessage()).startsWith("Saved to"), 20);
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().templateSaveMessage())).contains("callout-note.mustache");
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.practicePanel().templateSaveLabel()).equals("Save"), 20);
        assertThat(GuiSupport.onEdt(() -> window.practicePanel().templateEditor().getText())).contains("NOTE {{feature.id}}");
        GuiSupport.screenshot(window.frame(), "templates-saved-light");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.DARK));
        GuiSupport.settle(300);
        GuiSupport.screenshot(window.frame(), "templates-saved-dark");
        GuiSupport.onEdt(() -> window.setTheme(ThemeChoice.LIGHT));
    }

    @Test
    @Order(5)
    void theSheetExportsInTheBackground() {
        Path out = config.resolve("sheet.html");
        // the rules reload after the previous test's save would otherwise replace the export's message
        GuiSupport.waitFor(() -> !GuiSupport.onEdt(() -> window.statusLine().message()).startsWith("Reloading"), 60);
        GuiSupport.onEdt(() -> window.export(out));
        try {
            GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.statusLine().message()).startsWith("Exported"), 60);
        } catch (AssertionError e) {
            throw new AssertionError("status line says: " + GuiSupport.onEdt(() -> window.statusLine().message()), e);
        }
        assertThat(out).exists();
        assertThat(out.toFile().length()).isGreaterThan(100);
    }
}
