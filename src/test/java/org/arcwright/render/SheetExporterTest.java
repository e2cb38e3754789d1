package org.arcwright.render;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.MechanicsChecks;
import org.arcwright.rules.NoteLinker;
import org.arcwright.rules.RuleBook;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.testing.Golden;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The tolerancing sheet of the demo part (an invented company and part) in all three formats. */
class SheetExporterTest {
    private static SheetExporter exporter;
    private static NoteTemplates templates;
    private static PartWorksheet demo;

    @BeforeAll
    static void setUp() {
        exporter = SheetExporter.withBundledFont();
        templates = NoteTemplates.load(PackStack.builtIn());
        demo = new WorksheetFiles(new JsonFiles()).read(Path.of("examples/tarnbeck-output-shaft-decided.arcpart"));
    }

    @Test
    void pdfParsedBackHoldsEveryFeaturesCalloutTheSummaryAndTheDeferral(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("td-2207-b.pdf");
        exporter.export(demo, templates, "Arcwright test", out, null);
        String text;
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            assertThat(doc.getNumberOfPages()).isBetween(2, 8);
            text = new PDFTextStripper().getText(doc);
        }
        SheetContent content = exporter.content(demo, templates, "t");
        for (SheetContent.FeatureSection f : content.features()) {
            assertThat(text).contains(f.id() + " " + f.heading());
            if (f.decided()) assertThat(text).as(f.id()).contains(f.calloutPlain().replace("\n", " / "));
        }
        assertThat(text).contains("Summary", "undecided", "Kt at the smallest radius", "1.94", "seating margin", "0.1 mm",
                "crescent width", "0.1657 mm", "governing standard", "licensed engineering judgement", "page 1 of");
        // the frame's own text is real text in the PDF, not only outlines
        assertThat(text).contains("0.06", "CR2 ±0.2");
        Golden.assertMatches("sheets/tarnbeck-output-shaft.pdf.txt", text.replace("\r\n", "\n"));
    }

    @Test
    void everyFormatStatesEachFeaturesOpenProblems(@TempDir Path dir) throws Exception {
        // F1 shows "measured: pass" while its CR2 ±0.2 gives Kt 1.94 against the target 1.6 stated on the same sheet.
        SheetContent content = exporter.content(demo, templates, "t");
        SheetContent.SummaryRow f1 = content.summary().get(0);
        assertThat(f1.status()).isEqualTo("measured: pass");
        assertThat(f1.problems()).anySatisfy(p -> assertThat(p).contains("stress target not met"));
        assertThat(content.summary().get(4).problems()).contains("no control chosen");
        Path pdf = dir.resolve("s.pdf");
        exporter.export(demo, templates, "t", pdf, null);
        String pdfText;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            pdfText = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        for (String text : List.of(exporter.markdown(content, "x"), exporter.html(content, null), pdfText)) {
            assertThat(text).contains("stress target not met").contains("Open problems")
                    .contains("Standards mixed: the part is drawn to ASME Y14.5-2018 but its title block invokes ISO 2768");
        }
    }

    @Test
    void aCastOrMouldedRadiusUnderAnIso2768TitleBlockIsFlaggedOnThePartAndItsRow(@TempDir Path dir) throws Exception {
        // ISO 2768-1:1989, scope: parts made by metal removal or formed from sheet metal, not castings or mouldings.
        // Before: a cast F4 left to "ISO 2768-m" passed the sheet without a word.
        ObjectMapper m = new ObjectMapper();
        ObjectNode root = (ObjectNode)
                m.readTree(Path.of("examples/tarnbeck-output-shaft-decided.arcpart").toFile());
        root.put("standard", "iso");
        for (JsonNode f : root.get("features")) {
            ((ObjectNode) f.get("case")).put("standard", "iso");
            if (f.get("id").asText().equals("F4")) ((ObjectNode) f.get("case")).put("process", "cast");
            if (f.get("id").asText().equals("F2")) ((ObjectNode) f.get("case")).put("process", "molded");
        }
        Path file = dir.resolve("cast.arcpart");
        Files.writeString(file, m.writeValueAsString(root));
        PartWorksheet cast = new WorksheetFiles(new JsonFiles()).read(file);
        SheetContent content = exporter.content(cast, templates, "t");
        assertThat(content.cautions()).anySatisfy(c -> assertThat(c).contains("ISO 2768-1 covers parts made by metal removal")
                .contains("F4 (cast)").contains("F2 (molded)").contains("ISO 8062-3"));
        // F4 is left to the title block: its row says so; F2 has a tolerance of its own, so its row does not.
        assertThat(content.summary().get(3).problems()).anySatisfy(p -> assertThat(p).contains("general tolerance out of scope"));
        assertThat(content.summary().get(1).problems()).noneSatisfy(p -> assertThat(p).contains("out of scope"));
        // a machined part with the same title block gets neither
        assertThat(exporter.content(demo, templates, "t").cautions()).noneSatisfy(c -> assertThat(c).contains("metal removal"));
    }

    @Test
    void everyRadiusCarriesItsOwnCalloutOnlyWhenEveryFeatureIsDecided() {
        // Four of five features decided: the edge note must not claim every radius has its own callout.
        SheetContent content = exporter.content(demo, templates, "t");
        assertThat(String.join("\n", content.generalNotes())).doesNotContain("EVERY RADIUS CARRIES ITS OWN CALLOUT");
        // Only F1-F3, each with its own callout: now the claim is true and stated.
        PartWorksheet decided = demo.withoutFeature("F4").withoutFeature("F5");
        assertThat(String.join("\n", exporter.content(decided, templates, "t").generalNotes()))
                .contains("EVERY RADIUS CARRIES ITS OWN CALLOUT");
    }

    @Test
    void undecidedFeaturesAreSaidToBeUndecided() {
        SheetContent content = exporter.content(demo, templates, "t");
        SheetContent.FeatureSection f5 = content.features().get(4);
        assertThat(f5.decided()).isFalse();
        assertThat(content.summary().get(4).status()).isEqualTo("undecided");
        assertThat(exporter.markdown(content, "x")).contains("**Undecided:** no control is chosen");
    }

    @Test
    void markdownMatchesItsGoldenFileAndWritesOneSvgPerDecidedFeature(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("sheet.md");
        exporter.export(demo, templates, "Arcwright test", out, null);
        Golden.assertMatches("sheets/tarnbeck-output-shaft.md", Files.readString(out));
        for (RadiusFeature f : demo.features()) {
            assertThat(dir.resolve("sheet-frames/" + f.id() + ".svg")).matches(p -> Files.exists(p) == (f.chosen() != null));
        }
    }

    @Test
    void htmlIsOnePageWithTheFramesInlined(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("sheet.html");
        exporter.export(demo, templates, "Arcwright test", out, null);
        String html = Files.readString(out);
        assertThat(html).startsWith("<!DOCTYPE html>").contains("<h2>Summary</h2>", "<h2>Cautions</h2>");
        assertThat(html.split("<svg ", -1)).hasSize(1 + 4);
        assertThat(html.indexOf("Summary")).isLessThan(html.indexOf("id=\"F1\""));
        assertThat(html.lastIndexOf("governing standard")).isGreaterThan(html.indexOf("id=\"F5\""));
        Golden.assertMatches("sheets/tarnbeck-output-shaft.html", html);
    }

    @Test
    void progressIsReportedInOrderUpToTheTotal(@TempDir Path dir) {
        List<int[]> steps = new ArrayList<>();
        exporter.export(demo, templates, "t", dir.resolve("s.pdf"), (done, total, step) -> steps.add(new int[] {done, total}));
        assertThat(steps).isNotEmpty();
        int[] last = steps.get(steps.size() - 1);
        assertThat(last[0]).isEqualTo(last[1]);
        for (int i = 1; i < steps.size(); i++) {
            assertThat((double) steps.get(i)[0] / steps.get(i)[1])
                    .isGreaterThanOrEqualTo((double) steps.get(i - 1)[0] / steps.get(i - 1)[1]);
        }
    }

    @Test
    void theSheetOfAPartWithNoDecisionsStillRenders(@TempDir Path dir) throws Exception {
        PartWorksheet open = new WorksheetFiles(new JsonFiles()).read(Path.of("examples/tarnbeck-output-shaft.arcpart"));
        Path out = dir.resolve("open.pdf");
        exporter.export(open, templates, "t", out, null);
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            assertThat(new PDFTextStripper().getText(doc)).contains("0 decided, 5 undecided");
        }
    }

    @Test
    void anIsoSheetSaysThatIsoHasNoControlledRadius() {
        PartWorksheet iso = new PartWorksheet(1, demo.part(), demo.units(), DrawingStyle.ISO,
                demo.titleBlock(), demo.features());
        SheetContent content = exporter.content(iso, templates, "t");
        SheetContent.FeatureSection f1 = content.features().get(0);
        assertThat(f1.calloutPlain()).isEqualTo("R2 ±0.2");
        assertThat(f1.cautions().get(0)).contains("no ISO equivalent");
    }

    /**
     * A kept verdict the measurement could not decide (ISO 14253-1 default decision rule) reads as such
     * on the sheet, in the summary's status and among the feature's open problems: never as a pass or a fail.
     */
    @Test
    void anIndeterminateMeasurementIsAnOpenProblemNotAPassOrAFail() {
        RadiusFeature f1 = demo.features().get(0);
        PartWorksheet ws = demo.withFeature(f1.withInspection(new InspectionRecord("indeterminate", "cmm/f1.csv", "2026-12-05",
                Map.of("callout", "CR 1.8-2.2", "units", "mm", "uncertainty", 0.01))));
        SheetContent content = exporter.content(ws, templates, "t");
        SheetContent.SummaryRow row = content.summary().get(0);
        assertThat(row.status()).isEqualTo("measured: indeterminate");
        assertThat(row.problems()).anySatisfy(p -> assertThat(p).contains("no verdict").contains("ISO 14253-1"));
        assertThat(exporter.markdown(content, "x")).contains("INDETERMINATE").doesNotContain("FAIL, measured 2026-12-05");
    }

    @Test
    void aLongUnbrokenPathIsWrappedInsideThePage(@TempDir Path dir) throws Exception {
        String path = "cmm/" + "very-long-inspection-folder-name-".repeat(8) + "f1.csv";
        RadiusFeature f1 = demo.features().get(0);
        PartWorksheet ws = demo.withFeature(f1.withInspection(
                new InspectionRecord("pass", path, "2026-11-20", Map.of())));
        Path out = dir.resolve("long.pdf");
        exporter.export(ws, templates, "t", out, null);
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            PDFTextStripper strip = new PDFTextStripper();
            String text = strip.getText(doc);
            assertThat(text.replace("\n", "").replace("\r", "")).contains(path);
            for (String line : text.split("\n")) assertThat(line.length()).as(line).isLessThan(140);
        }
    }

    @Test
    void undecidedFeaturesShowTheAdvisorsSuggestionMarkedAsNotChosen() {
        PackStack stack = PackStack.builtIn();
        Advisor advisor = new Advisor(RuleBook.load(stack),
                MechanicsChecks.standard(stack), NoteLinker.NONE);
        SheetContent content = SheetContent.of(demo, templates, "t", c -> advisor.advise(c).first());
        SheetContent.FeatureSection f5 = content.features().get(4);
        assertThat(f5.decided()).isFalse();
        assertThat(f5.suggestion()).isNotEmpty().contains("(rule ");
        assertThat(content.summary().get(4).status()).isEqualTo("undecided");
        assertThat(content.features().get(0).suggestion()).as("decided features get no suggestion").isEmpty();
        assertThat(exporter.markdown(content, "x")).contains("The advisor suggests (not chosen, to be reviewed): ");
    }

    @Test
    void aPartDecidedByTheAdvisorRendersEveryCalloutAndFigure(@TempDir Path dir) throws Exception {
        PackStack stack = PackStack.builtIn();
        Advisor advisor = new Advisor(RuleBook.load(stack),
                MechanicsChecks.standard(stack), NoteLinker.NONE);
        PartWorksheet open = new WorksheetFiles(new JsonFiles()).read(Path.of("examples/tarnbeck-output-shaft.arcpart"));
        PartWorksheet decided = open;
        for (RadiusFeature f : open.features()) {
            decided = decided.withFeature(f.withChosen(advisor.advise(f.designCase()).first().orElseThrow()));
        }
        Path out = dir.resolve("advised.pdf");
        exporter.export(decided, templates, "t", out, null);
        SheetContent content = exporter.content(decided, templates, "t");
        String text;
        try (PDDocument doc = Loader.loadPDF(out.toFile())) {
            text = new PDFTextStripper().getText(doc).replace("\r", "");
        }
        String flat = text.replaceAll("\\s+", " ");
        for (SheetContent.FeatureSection f : content.features()) {
            assertThat(f.decided()).isTrue();
            assertThat(flat).as(f.id()).contains(f.calloutPlain().replace("\n", " / ").replaceAll("\\s+", " "));
            assertThat(f.figures()).as(f.id() + " figures").isNotEmpty();
            assertThat(f.figures()).allMatch(g -> !g.value().contains("E-") && !g.value().contains("NaN"));
        }
        assertThat(text).contains("5 decided, 0 undecided");
    }
}
