package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.arcwright.pack.PackStack;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.junit.jupiter.api.Test;

class TemplatePreviewTest {
    private final List<TemplatePreview.Entry> entries = TemplatePreview.entries(PackStack.builtIn());

    private TemplatePreview.Entry named(String name) {
        return entries.stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow();
    }

    /** The repository's invented example: F1 to F4 decided, F5 undecided. */
    private static PartWorksheet decided() {
        return Fixtures.files().read(Path.of("examples/tarnbeck-output-shaft-decided.arcpart"));
    }

    @Test
    void theBuiltInTemplatesAreListedAndFillForTheSelectedFeature() {
        assertThat(entries).extracting(TemplatePreview.Entry::name).contains("callout-note", "title-block-notes");
        PartWorksheet ws = decided();
        TemplatePreview.Entry e = named("callout-note");
        TemplatePreview.Result r = TemplatePreview.fill(e, TemplatePreview.text(e), ws, ws.features().get(0));
        assertThat(r.ok()).isTrue();
        assertThat(r.note()).startsWith("F1 ");
        assertThat(r.notice()).isNull();
    }

    @Test
    void anUndecidedFeatureIsSkippedAsTheSheetDoesNotPreviewedAsADanglingLine() {
        PartWorksheet ws = decided();
        RadiusFeature f5 = ws.features().get(4);
        assertThat(f5.chosen()).isNull();
        TemplatePreview.Entry e = named("callout-note");
        TemplatePreview.Result r = TemplatePreview.fill(e, TemplatePreview.text(e), ws, f5);
        assertThat(r.ok()).isTrue();
        // it was "F5 <label>: " with nothing after the colon
        assertThat(r.note()).doesNotContain("F5").startsWith("F1 ");
        assertThat(r.notice()).contains("F5 has no callout chosen yet").contains("shown for F1");
        // the command line skips it the same way: every decided feature, F5 not among them
        String cli = NoteTemplates.load(PackStack.builtIn()).fill("callout-note", ws, null, "test");
        assertThat(cli).contains("F1 ").doesNotContain("F5 ");
    }

    @Test
    void aPartWithNothingDecidedSaysSoInsteadOfAnEmptyCallout() {
        PartWorksheet ws = Fixtures.twoFeatures();
        TemplatePreview.Entry e = named("callout-note");
        TemplatePreview.Result r = TemplatePreview.fill(e, TemplatePreview.text(e), ws, ws.features().get(0));
        assertThat(r.ok()).isTrue();
        assertThat(r.note()).startsWith("No callout chosen yet");
        assertThat(r.notice()).startsWith("F1 has no callout chosen yet");
    }

    @Test
    void anUnknownFieldIsReportedWithItsLineAndName() {
        PartWorksheet ws = Fixtures.twoFeatures();
        TemplatePreview.Entry e = named("callout-note");
        TemplatePreview.Result r = TemplatePreview.fill(e, "first line\n{{feature.nonsense}}\n", ws, ws.features().get(0));
        assertThat(r.ok()).isFalse();
        assertThat(r.problem().line()).isEqualTo(2);
        assertThat(r.problem().getMessage()).contains("nonsense");
    }
}
