package org.arcwright.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Recommendation;
import org.arcwright.testing.Golden;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NoteTemplatesTest {
    static final Path DEMO = Path.of("examples/tarnbeck-output-shaft-decided.arcpart");
    private final PartWorksheet demo = new WorksheetFiles(new JsonFiles()).read(DEMO);

    private static InputProblem problemOf(String text) {
        try {
            NoteTemplate.compile("bad", text, "bad.mustache", "test");
        } catch (InputProblem p) {
            return p;
        }
        throw new AssertionError("expected the template to be rejected: " + text);
    }

    @Test
    void builtInTemplatesLoadAndPassTheFieldCheck() {
        NoteTemplates t = NoteTemplates.load(PackStack.builtIn());
        assertThat(t.names()).contains("title-block-notes", "callout-note", "edge-break-notes", "inspection-plan");
        assertThat(t.require("callout-note").perFeature()).isTrue();
        assertThat(t.require("title-block-notes").perFeature()).isFalse();
    }

    @Test
    void builtInNotesOfTheDemoPartMatchTheirGoldenFiles() {
        NoteTemplates t = NoteTemplates.load(PackStack.builtIn());
        for (String name : t.names()) {
            Golden.assertMatches("notes/" + name + ".txt", t.fill(name, demo, null, "Arcwright test"));
        }
    }

    @Test
    void anUnknownFieldIsRejectedWithFileLineColumnAndField() {
        InputProblem p = problemOf("NOTES:\n1. {{part.number}}\n2. {{part.colour}}\n");
        assertThat(p.source()).isEqualTo("bad.mustache");
        assertThat(p.line()).isEqualTo(3);
        assertThat(p.column()).isEqualTo(4);
        assertThat(p.field()).isEqualTo("part.colour");
        assertThat(p.getMessage()).contains("bad.mustache:3:4", "unknown field 'colour' in part", "number");
    }

    @Test
    void anUnknownTopLevelFieldListsTheKnownOnes() {
        InputProblem p = problemOf("{{#features}}{{idd}}{{/features}}");
        assertThat(p.field()).isEqualTo("idd");
        assertThat(p.problem()).contains("unknown field 'idd'", "label", "part");
    }

    @Test
    void fieldsOfAListElementAreKnownOnlyInsideItsSection() {
        assertThat(problemOf("{{label}}").field()).isEqualTo("label");
        NoteTemplate ok = NoteTemplate.compile("ok", "{{#features}}{{id}} {{label}} {{part.number}}\n{{/features}}", "ok", "t");
        assertThat(ok.perFeature()).isFalse();
    }

    @Test
    void aListWrittenAsTextIsRejected() {
        assertThat(problemOf("{{features}}").problem()).contains("a list", "{{#features}}");
    }

    @Test
    void unclosedAndMismatchedSectionsAreRejected() {
        assertThat(problemOf("line\n{{#asme}}text").problem()).contains("never closed");
        assertThat(problemOf("{{#asme}}{{#iso}}{{/asme}}{{/iso}}").problem()).contains("close the inner section first");
        assertThat(problemOf("{{/asme}}").problem()).contains("never opened");
    }

    @Test
    void partialsInheritanceAndDelimiterChangesAreRejected() {
        assertThat(problemOf("{{> other}}").problem()).contains("cannot include");
        assertThat(problemOf("{{< parent}}{{/parent}}").problem()).contains("cannot include");
        assertThat(problemOf("{{=<% %>=}}").problem()).contains("delimiter");
    }

    @Test
    void aTeamPackTemplateOverridesTheBuiltInOneByName(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("pack.json"), "{\"name\": \"Tarnbeck drafting\"}");
        Files.createDirectories(dir.resolve("templates"));
        Files.writeString(dir.resolve("templates/title-block-notes.mustache"),
                "TARNBECK NOTES FOR {{part.number}}: GENERAL TOLERANCES {{titleBlock.text}}\n");
        NoteTemplates t = NoteTemplates.load(PackStack.load(List.of(dir), null));
        assertThat(t.require("title-block-notes").pack()).isEqualTo("Tarnbeck drafting");
        assertThat(t.fill("title-block-notes", demo, null, "t")).isEqualTo("TARNBECK NOTES FOR TD-2207-B: GENERAL TOLERANCES ISO 2768-m\n");
        assertThat(t.require("callout-note").pack()).isNotEqualTo("Tarnbeck drafting");
    }

    @Test
    void aBadTemplateInAPackFailsTheLoadNamingItsFile(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("pack.json"), "{\"name\": \"broken\"}");
        Files.createDirectories(dir.resolve("templates"));
        Files.writeString(dir.resolve("templates/callout-note.mustache"), "{{feature.id}}\n{{feature.zoen}}\n");
        assertThatThrownBy(() -> NoteTemplates.load(PackStack.load(List.of(dir), null)))
                .isInstanceOf(InputProblem.class)
                .hasMessageContaining("callout-note.mustache:2:1")
                .hasMessageContaining("feature.zoen");
    }

    @Test
    void numbersArriveFormattedInThePartsStyleNotByTheTemplate() {
        NoteTemplate t = NoteTemplate.compile("n", "{{#feature.isProfile}}{{feature.zone}} {{feature.outward}} {{feature.isoOffset}}{{/feature.isProfile}}",
                "n", "t");
        String asme = new NoteTemplates(List.of(t)).fill("n", demo, "F3", "t");
        assertThat(asme).isEqualTo("0.06 0.02 -0.01\n");
        PartWorksheet inch = new PartWorksheet(1, demo.part(), Units.INCH, demo.standard(),
                demo.titleBlock(), demo.features());
        assertThat(new NoteTemplates(List.of(t)).fill("n", inch, "F3", "t")).isEqualTo(".060 .020 -.010\n");
    }

    @Test
    void aPerFeatureTemplateIsFilledOncePerDecidedFeature() {
        NoteTemplate t = NoteTemplate.compile("ids", "{{feature.id}}:{{feature.status}}", "ids", "t");
        assertThat(new NoteTemplates(List.of(t)).fill("ids", demo, null, "t"))
                .isEqualTo("F1:measured: pass\n\nF2:decided\n\nF3:decided\n\nF4:decided\n");
    }

    @Test
    void radiusAndControlledRadiusNotesSayWhatEachCalloutRequires() {
        // ASME Y14.5-2018 radius and controlled radius (from memory): both zones are two arcs tangent
        // to the adjacent surfaces; R leaves form inside the zone free (flats and reversals pass), CR
        // adds a fair curve without flats or reversals and every radius along it within the limits.
        // Before: the R note read "SIZE ONLY: FORM AND LOCATION ARE NOT CONTROLLED" and the CR note
        // did not ask for the local radii.
        NoteTemplates t = NoteTemplates.load(PackStack.builtIn());
        for (DrawingStyle style : DrawingStyle.values()) {
            PartWorksheet part = new PartWorksheet(1, demo.part(), demo.units(), style, demo.titleBlock(), demo.features());
            for (String name : List.of("callout-note", "inspection-plan")) {
                String cr = t.fill(name, part, "F1", "t").toUpperCase(java.util.Locale.ROOT);
                String r = t.fill(name, part, "F2", "t").toUpperCase(java.util.Locale.ROOT);
                assertThat(r).as(name + " R, " + style).contains("TANGENT TO THE ADJACENT SURFACES").contains("FLATS AND REVERSALS")
                        .doesNotContain("SIZE ONLY").doesNotContain("FAIR CURVE").doesNotContain("EVERY POINT BETWEEN");
                assertThat(cr).as(name + " CR, " + style).containsAnyOf("WITHOUT FLATS OR REVERSALS", "NO FLATS, NO REVERSALS").containsAnyOf("EVERY LOCAL RADIUS", "AT EVERY POINT BETWEEN");
                if (style == DrawingStyle.ASME || name.equals("inspection-plan")) {
                    assertThat(cr).as(name + " CR, " + style).contains("TANGENT TO THE ADJACENT SURFACES");
                }
            }
        }
    }

    @Test
    void aCompositeProfilePlanSaysWhatEachTierRequires() {
        // ASME Y14.5-2018 composite profile (from memory): every tier's zone holds the surface; the
        // upper tier is located by its datums, a lower tier only oriented by the datums it repeats.
        // Before: "upper tier in the datum reference frame — zone 0.5 to A, B — zone 0.1 to A".
        Callout comp = new Callout.CompositeProfile(List.of(
                new ProfileTier(0.5, List.of(DatumReference.parse("A"), DatumReference.parse("B"))),
                new ProfileTier(0.1, List.of(DatumReference.parse("A"))), new ProfileTier(0.05, List.of())), Extent.THIS_RADIUS);
        Recommendation rec = new Recommendation("demo", comp, "composite", 1.0, List.of("why"), List.of(), List.of(),
                Map.of("zone", 0.5), List.of(), List.of(), false);
        PartWorksheet w = demo.withFeature(demo.features().get(2).withChosen(rec));
        String plan = NoteTemplates.load(PackStack.builtIn()).fill("inspection-plan", w, "F3", "t");
        assertThat(plan).contains("every point within each tier's zone about the true profile")
                .contains("0.5 mm to A, B; 0.1 mm to A; 0.05 mm with no datums;")
                .contains("the upper tier located and oriented by its datums").contains("free in location");
    }

    @Test
    void anUnknownTemplateNameListsTheTemplatesThereAre() {
        NoteTemplates t = NoteTemplates.load(PackStack.builtIn());
        assertThatThrownBy(() -> t.require("title-notes")).isInstanceOf(InputProblem.class)
                .hasMessageContaining("title-block-notes");
    }
}
