package org.arcwright.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.arcwright.testing.StandardMarks.assertOwnMarks;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.text.PDFTextStripper;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.templates.CalloutText;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every callout kind × standard × units through every output (frame text, SVG, one-line text,
 * words, the built-in drawing notes, the sheet in all three formats), failing on a mark or term of
 * the other standard ({@code testing.StandardMarks}: ASME Y14.5-2018 and ISO 1101:2017, from memory). The
 * advisor's own words are swept by {@code cli.AdviseMarksSweepTest}.
 */
class StandardMarksSweepTest {
    static List<Callout> kinds() {
        List<DatumReference> ab = List.of(DatumReference.parse("A"), DatumReference.parse("B"));
        return List.of(
                new Callout.Radius(1.8, 2.2, 2.0),
                new Callout.ControlledRadius(1.8, 2.2, 2.0),
                new Callout.Profile(0.1, null, List.of(), false, Extent.THIS_RADIUS),
                new Callout.Profile(0.06, 0.02, ab, false, Extent.between("J", "K")),
                new Callout.Profile(0.1, null, List.of(), true, Extent.ALL_AROUND),
                new Callout.Profile(0.1, 0.07, ab, true, Extent.WITH_ADJACENT),
                new Callout.CompositeProfile(List.of(new ProfileTier(0.2, ab), new ProfileTier(0.05, List.of())), Extent.THIS_RADIUS),
                new Callout.General("iso2768-1-radius-chamfer", "m", null));
    }

    private static FrameRenderer frames;
    private static SheetExporter exporter;
    private static NoteTemplates templates;

    @BeforeAll
    static void setUp() {
        frames = FrameRenderer.withBundledFont();
        exporter = SheetExporter.withBundledFont();
        templates = NoteTemplates.load(PackStack.builtIn());
    }

    @Test
    void framesTextAndWordsCarryOnlyTheirStandardsMarks() {
        for (DrawingStyle style : DrawingStyle.values()) {
            for (Units units : Units.values()) {
                for (Callout c : kinds()) {
                    String what = style + " " + units + " " + c;
                    if (refused(c, style)) {
                        assertThatThrownBy(() -> frames.plainText(c, style, units)).as(what).isInstanceOf(InputProblem.class);
                        assertThatThrownBy(() -> frames.svg(c, style, units)).as(what).isInstanceOf(InputProblem.class);
                        continue;
                    }
                    CalloutText text = new CalloutText(style, units);
                    List<String> outputs = List.of(frames.plainText(c, style, units), frames.unicodeText(c, style, units),
                            frames.svg(c, style, units), text.line(c, false), text.line(c, true), text.words(c),
                            CalloutText.controlName(c, style));
                    for (String out : outputs) assertOwnMarks(what, style, out);
                }
            }
        }
    }

    @Test
    void drawingNotesAndSheetsCarryOnlyTheirStandardsMarks(@TempDir Path dir) throws Exception {
        for (DrawingStyle style : DrawingStyle.values()) {
            for (Units units : Units.values()) {
                PartWorksheet ws = worksheet(dir, style, units);
                String what = style + " " + units;
                for (String name : List.of("title-block-notes", "edge-break-notes", "callout-note", "inspection-plan")) {
                    assertOwnMarks(what + " " + name, style, templates.fill(name, ws, null, "t"));
                }
                SheetContent content = exporter.content(ws, templates, "t");
                assertOwnMarks(what + " markdown", style, exporter.markdown(content, "f"));
                assertOwnMarks(what + " html", style, exporter.html(content, null));
                try (var doc = Loader.loadPDF(exporter.pdf(content, null))) {
                    assertOwnMarks(what + " pdf", style, new PDFTextStripper().getText(doc).replaceAll("\\s+", " "));
                }
            }
        }
    }

    private static boolean refused(Callout c, DrawingStyle style) {
        return style == DrawingStyle.ISO && c instanceof Callout.Profile p && p.isUnequal() && p.dynamic();
    }

    /**
     * The demo part rewritten to {@code style} and {@code units}, one decided feature per callout
     * kind the style can write, reasoning texts emptied (they are the advisor's words, not marks).
     */
    private static PartWorksheet worksheet(Path dir, DrawingStyle style, Units units) throws Exception {
        ObjectMapper m = new ObjectMapper();
        ObjectNode root = (ObjectNode) m.readTree(Path.of("examples/tarnbeck-output-shaft-decided.arcpart").toFile());
        String std = style == DrawingStyle.ASME ? "asme" : "iso";
        root.put("standard", std).put("units", units.symbol());
        ObjectNode template = (ObjectNode) root.get("features").get(0).deepCopy();
        ArrayNode features = m.createArrayNode();
        int i = 1;
        for (Callout c : kinds()) {
            if (refused(c, style)) continue;
            ObjectNode f = template.deepCopy();
            f.put("id", "F" + i++);
            f.remove("inspection");
            ObjectNode cs = (ObjectNode) f.get("case");
            cs.put("standard", std).put("units", units.symbol());
            cs.remove("tolerance");
            ObjectNode chosen = (ObjectNode) f.get("chosen");
            chosen.set("callout", m.valueToTree(c));
            chosen.put("text", "");
            for (String list : List.of("because", "cautions", "references", "notes", "trace")) chosen.set(list, m.createArrayNode());
            chosen.set("numbers", m.createObjectNode());
            features.add(f);
        }
        root.set("features", features);
        Path file = dir.resolve(std + "-" + units.symbol() + ".arcpart");
        Files.writeString(file, m.writeValueAsString(root));
        return new WorksheetFiles(new JsonFiles()).read(file);
    }
}
