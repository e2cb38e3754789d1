package org.arcwright.render;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import org.arcwright.callout.Callout;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.Recommendation;
import org.arcwright.templates.CalloutText;
import org.arcwright.templates.Figures;
import org.arcwright.templates.NoteContext;
import org.arcwright.templates.NoteTemplate;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;

/**
 * What the tolerancing sheet of a part says, independent of its file format: facts of the part, a
 * summary table, the general notes, one section per feature, and the cautions with the deferral
 * to the governing standard at the end. Markdown, HTML and PDF writers all render this.
 *
 * @param title the sheet's title
 * @param partNumber the part number with its revision, for running footers
 * @param partFacts label and value pairs about the part
 * @param summary one row per feature
 * @param generalNotes filled title-block and edge-break note templates, may be empty
 * @param features one section per feature, in drawing order
 * @param cautions the usual cautions, then every feature's prefixed with the ids of the features it
 *     concerns, each text once
 * @param deferral the closing deferral to the governing standard
 * @param generatedBy program and version
 * @param style the part's drawing style
 * @param units the part's units
 */
public record SheetContent(String title, String partNumber, List<Fact> partFacts, List<SummaryRow> summary, List<String> generalNotes,
                           List<FeatureSection> features, List<String> cautions, String deferral, String generatedBy,
                           DrawingStyle style, Units units) {

    /** The usual cautions, always on the sheet (common practice; README "Cautions"). */
    public static final List<String> USUAL_CAUTIONS = List.of(
            "A ± or limit radius bounds size only: flats, dips and a step at the tangent point can still pass. "
                    + "Where form or location matters, use a controlled radius or a profile of a surface tolerance.",
            "Stress concentration figures are handbook estimates from curve fits; fatigue-critical parts need "
                    + "analysis or test to the governing code.",
            "Arcwright's readings of ASME Y14.5 and ISO 1101 are summaries, not the standards' text.");

    /**
     * The usual cautions in the words of the part's standard: ISO defines no controlled radius, so an
     * ISO sheet points to a profile tolerance only.
     */
    public static List<String> usualCautions(DrawingStyle style) {
        if (style == DrawingStyle.ASME) return USUAL_CAUTIONS;
        List<String> iso = new ArrayList<>(USUAL_CAUTIONS);
        iso.set(0, "A ± or limit radius bounds size only: flats, dips and a step at the tangent point can still pass. "
                + "Where form or location matters, use a profile of a surface tolerance (ISO 1101).");
        return List.copyOf(iso);
    }

    /** Closing words of every sheet. */
    public static final String DEFERRAL = "This sheet is design guidance, not approval. Parts fail and people get hurt "
            + "when a stress-relief fillet is wrong: the governing standard (ASME Y14.5-2018 or ISO 1101 as the drawing "
            + "states), the company's own practice and licensed engineering judgement decide.";

    public SheetContent {
        partFacts = List.copyOf(partFacts);
        summary = List.copyOf(summary);
        generalNotes = List.copyOf(generalNotes);
        features = List.copyOf(features);
        cautions = List.copyOf(cautions);
    }

    /** A labelled fact. */
    public record Fact(String label, String value) {}

    /**
     * One row of the summary table.
     *
     * @param problems every open problem of the feature, in words (empty when none)
     */
    public record SummaryRow(String id, String feature, String function, String control, String callout, String status,
                             List<String> problems) {
        public SummaryRow {
            problems = List.copyOf(problems);
        }
    }

    /**
     * One feature's section.
     *
     * @param id feature id
     * @param heading the feature's name
     * @param caseLine what the engineer said about it, in one line
     * @param callout the chosen control, or null while undecided
     * @param calloutPlain plain one-line text of the control, or empty
     * @param calloutUnicode Unicode one-line text, or empty
     * @param calloutWords the control in words, or empty
     * @param because reasoning
     * @param figures the numbers behind the choice
     * @param cautions what to watch
     * @param references standards and handbooks
     * @param notes linked practice notes
     * @param drawingNote the filled per-callout note template, or empty
     * @param inspectionNote the filled inspection-plan template, or empty
     * @param inspection the latest inspection, in words, or empty
     * @param demoted true when the chosen recommendation failed one of its checks
     * @param suggestion for an undecided feature, the advisor's first recommendation in words
     *     (plainly marked as not chosen), or empty
     */
    public record FeatureSection(String id, String heading, String caseLine, Callout callout, String calloutPlain,
                                 String calloutUnicode, String calloutWords, List<String> because,
                                 List<Figures.Figure> figures, List<String> cautions, List<String> references,
                                 List<NoteLink> notes, String drawingNote, String inspectionNote, String inspection,
                                 boolean demoted, String suggestion) {
        /** True when a control is chosen. */
        public boolean decided() { return callout != null; }
    }

    /**
     * Builds the content of {@code ws}'s sheet, filling the templates {@code title-block-notes},
     * {@code edge-break-notes}, {@code callout-note} and {@code inspection-plan} where the packs
     * have them.
     */
    public static SheetContent of(PartWorksheet ws, NoteTemplates templates, String generatedBy) {
        return of(ws, templates, generatedBy, null);
    }

    /**
     * As {@link #of(PartWorksheet, NoteTemplates, String)}, and for each undecided feature the
     * advisor's first recommendation from {@code suggest} (null for none), shown as a suggestion
     * that nobody has chosen yet.
     */
    public static SheetContent of(PartWorksheet ws, NoteTemplates templates, String generatedBy,
                                  Function<DesignCase, Optional<Recommendation>> suggest) {
        Objects.requireNonNull(ws, "worksheet");
        Objects.requireNonNull(templates, "templates");
        CalloutText text = new CalloutText(ws.standard(), ws.units());
        NoteContext ctx = new NoteContext(ws, generatedBy);
        PartWorksheet.PartInfo p = ws.part();
        String title = "Tolerancing sheet: " + p.number() + (p.name() == null ? "" : " " + p.name())
                + (p.revision() == null ? "" : ", rev " + p.revision());
        List<Fact> facts = new ArrayList<>();
        facts.add(new Fact("Part", p.number() + (p.name() == null ? "" : " — " + p.name())));
        if (p.company() != null) facts.add(new Fact("Company", p.company()));
        if (p.material() != null) facts.add(new Fact("Material", p.material()));
        if (p.revision() != null) facts.add(new Fact("Revision", p.revision()));
        facts.add(new Fact("Standard", ws.standard() == DrawingStyle.ASME ? "ASME Y14.5-2018" : "ISO 1101 / ISO 129-1"));
        facts.add(new Fact("Units", ws.units() == Units.MM ? "millimetres" : "inches"));
        facts.add(new Fact("Title block", CalloutText.tableText(ws.titleBlock().table(), ws.titleBlock().toleranceClass())
                + (SheetProblems.mixedGeneralTolerance(ws).isPresent() ? " (another standard's table: see the cautions)" : "")));
        long decided = ws.features().stream().filter(f -> f.chosen() != null).count();
        facts.add(new Fact("Features", ws.features().size() + " (" + decided + " decided, "
                + (ws.features().size() - decided) + " undecided)"));

        List<String> general = new ArrayList<>();
        for (String name : List.of("title-block-notes", "edge-break-notes")) {
            templates.find(name).filter(t -> !t.perFeature()).map(t -> t.fill(ctx.forPart()).strip())
                    .filter(t -> !t.isEmpty()).ifPresent(general::add);
        }

        List<SummaryRow> rows = new ArrayList<>();
        List<FeatureSection> sections = new ArrayList<>();
        Map<String, List<String>> byCaution = new LinkedHashMap<>();
        for (RadiusFeature f : ws.features()) {
            DesignCase c = f.designCase();
            String heading = c.feature() == null ? f.id() : c.feature();
            Recommendation r = f.chosen();
            String status = r == null ? "undecided" : f.status().label() + (r.demoted() ? " (demoted)" : "");
            rows.add(new SummaryRow(f.id(), heading, c.function().key(),
                    r == null ? "—" : CalloutText.controlName(r.callout(), ws.standard()),
                    r == null ? "undecided" : text.line(r.callout(), false).replace("\n", " / "), status,
                    SheetProblems.of(f, ws)));
            String caseLine = c.kind().key() + ", " + c.function().key() + ", "
                    + (c.loading() == Loading.NONE ? "no service load" : c.loading().key() + " loading")
                    + ", "
                    + c.process().key() + ", nominal R" + text.value(c.nominalRadius()) + " " + ws.units().symbol()
                    + (c.datums().isEmpty() ? "" : ", datums " + String.join(", ", c.datums()))
                    + (c.tolerance() == null ? "" : ", intent " + c.tolerance());
            if (r == null) {
                String suggestion = "";
                if (suggest != null) {
                    suggestion = suggest.apply(c).map(s -> text.line(s.callout(), false).replace("\n", " / ") + " — "
                            + text.words(s.callout()) + " (rule " + s.ruleId() + (s.demoted() ? ", demoted" : "")
                            + ")").orElse("");
                }
                sections.add(new FeatureSection(f.id(), heading, caseLine, null, "", "", "", List.of(), List.of(),
                        List.of(), List.of(), List.of(), "", "", inspection(f.inspection(), ctx), false, suggestion));
                continue;
            }
            List<String> featureCautions = new ArrayList<>(styleRemarks(r.callout(), ws));
            featureCautions.addAll(r.cautions());
            for (String fc : featureCautions) byCaution.computeIfAbsent(fc, k -> new ArrayList<>()).add(f.id());
            sections.add(new FeatureSection(f.id(), heading, caseLine, r.callout(), text.line(r.callout(), false),
                    text.line(r.callout(), true), text.words(r.callout()), r.because(), Figures.of(r.numbers().asMap(), text),
                    featureCautions, r.references(), r.notes(), fill(templates, "callout-note", ctx, f),
                    fill(templates, "inspection-plan", ctx, f), inspection(f.inspection(), ctx), r.demoted(), ""));
        }
        Set<String> cautions = new LinkedHashSet<>(usualCautions(ws.standard()));
        SheetProblems.mixedGeneralTolerance(ws).ifPresent(cautions::add);
        SheetProblems.generalToleranceScope(ws).ifPresent(cautions::add);
        for (Map.Entry<String, List<String>> e : byCaution.entrySet()) {
            cautions.add(String.join(", ", e.getValue()) + ": " + e.getKey());
        }
        return new SheetContent(title, p.number() + (p.revision() == null ? "" : " rev " + p.revision()), facts, rows, general, sections, List.copyOf(cautions), DEFERRAL,
                generatedBy == null ? "Arcwright" : generatedBy, ws.standard(), ws.units());
    }

    /** What the drawing style says beyond the text, e.g. that ISO has no controlled radius. */
    private static List<String> styleRemarks(Callout c, PartWorksheet ws) {
        if (c instanceof Callout.SizeLimits s) return ws.standard().remarks(s.toRadiusCallout(ws.units(), 4));
        return List.of();
    }

    private static String fill(NoteTemplates templates, String name, NoteContext ctx, RadiusFeature f) {
        NoteTemplate t = templates.find(name).orElse(null);
        if (t == null) return "";
        return (t.perFeature() ? t.fill(ctx.forFeature(f)) : t.fill(ctx.forPart())).strip();
    }

    private static String inspection(InspectionRecord i, NoteContext ctx) {
        if (i == null) return "";
        StringBuilder sb = new StringBuilder(i.passed() ? "PASS" : i.undecided() ? "INDETERMINATE (neither conformance nor non-conformance proven)" : "FAIL");
        if (i.measuredOn() != null) sb.append(", measured ").append(i.measuredOn());
        if (i.source() != null) sb.append(" (").append(i.source()).append(')');
        List<Map<String, Object>> figs = ctx.figures(i.figures());
        for (Map<String, Object> m : figs) sb.append("; ").append(m.get("label")).append(' ').append(m.get("value"));
        return sb.toString();
    }

    /** The sheet's text as blocks in reading order: the one model every writer lays out. */
    public List<SheetBlock> blocks() {
        List<SheetBlock> b = new ArrayList<>();
        b.add(new SheetBlock.Title(title));
        b.add(new SheetBlock.Facts(partFacts));
        b.add(new SheetBlock.Heading("Summary", null));
        List<List<String>> rows = new ArrayList<>();
        for (SummaryRow r : summary) {
            rows.add(List.of(r.id(), r.feature(), r.function(), r.control(), r.callout(), r.status(),
                    r.problems().isEmpty() ? "none" : String.join("; ", r.problems())));
        }
        b.add(new SheetBlock.Table(List.of("ID", "Feature", "Function", "Control", "Callout", "Status", "Open problems"),
                rows, 4, 0, List.of(5, 24, 13, 15, 20, 12, 30)));
        if (!generalNotes.isEmpty()) {
            b.add(new SheetBlock.Heading("General notes", null));
            for (String n : generalNotes) b.add(new SheetBlock.Preformatted(n));
        }
        for (FeatureSection f : features) featureBlocks(f, b);
        b.add(new SheetBlock.Heading("Cautions", null));
        b.add(new SheetBlock.Cautions(cautions, deferral));
        b.add(new SheetBlock.Colophon(generatedBy));
        return List.copyOf(b);
    }

    private void featureBlocks(FeatureSection f, List<SheetBlock> b) {
        b.add(new SheetBlock.Heading(f.id() + " " + f.heading(), f.id()));
        b.add(new SheetBlock.Paragraph("", f.caseLine(), SheetBlock.Tone.CASE));
        SummaryRow row = summary.stream().filter(r -> r.id().equals(f.id())).findFirst().orElse(null);
        if (row != null && !row.problems().isEmpty()) {
            b.add(new SheetBlock.Paragraph("Open problems:", String.join("; ", row.problems()) + ".", SheetBlock.Tone.ALERT));
        }
        if (!f.decided()) {
            b.add(new SheetBlock.Paragraph("Undecided:", "no control is chosen for this feature yet.", SheetBlock.Tone.WARNING));
            if (!f.suggestion().isEmpty()) {
                b.add(new SheetBlock.Paragraph("", "The advisor suggests (not chosen, to be reviewed): " + f.suggestion(),
                        SheetBlock.Tone.PLAIN));
            }
            if (!f.inspection().isEmpty()) b.add(new SheetBlock.Paragraph("Last inspection:", f.inspection(), SheetBlock.Tone.PLAIN));
            return;
        }
        if (f.demoted()) {
            b.add(new SheetBlock.Paragraph("Demoted:", "the chosen control failed one of its checks; see the cautions.",
                    SheetBlock.Tone.ALERT));
        }
        b.add(new SheetBlock.Paragraph("Callout:", f.calloutWords(), SheetBlock.Tone.PLAIN));
        b.add(new SheetBlock.Frame(f.id(), f.calloutPlain().replace("\n", " / "), f.calloutUnicode()));
        list(b, "Why", f.because());
        if (!f.figures().isEmpty()) {
            b.add(new SheetBlock.Subheading("Numbers"));
            List<List<String>> rows = new ArrayList<>();
            for (Figures.Figure g : f.figures()) rows.add(List.of(g.label(), g.value()));
            b.add(new SheetBlock.Table(List.of("Figure", "Value"), rows, -1, -1, List.of(45, 55)));
        }
        list(b, "Cautions", f.cautions());
        list(b, "References", f.references());
        List<String> notes = new ArrayList<>();
        for (NoteLink n : f.notes()) notes.add(n.title() + " (" + n.id() + ", " + n.pack() + ")");
        list(b, "Linked notes", notes);
        if (!f.drawingNote().isEmpty()) {
            b.add(new SheetBlock.Subheading("Drawing note"));
            b.add(new SheetBlock.Preformatted(f.drawingNote()));
        }
        if (!f.inspectionNote().isEmpty()) {
            b.add(new SheetBlock.Subheading("Inspection plan"));
            b.add(new SheetBlock.Preformatted(f.inspectionNote()));
        }
        if (!f.inspection().isEmpty()) b.add(new SheetBlock.Paragraph("Last inspection:", f.inspection(), SheetBlock.Tone.PLAIN));
    }

    private static void list(List<SheetBlock> b, String title, List<String> items) {
        if (items.isEmpty()) return;
        b.add(new SheetBlock.Subheading(title));
        b.add(new SheetBlock.Bullets(items));
    }
}
