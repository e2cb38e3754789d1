package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.arcwright.pack.PackStack;
import org.arcwright.worksheet.PartWorksheet;
import org.junit.jupiter.api.Test;

class TemplatePreviewTest {
    private final List<TemplatePreview.Entry> entries = TemplatePreview.entries(PackStack.builtIn());

    private TemplatePreview.Entry named(String name) {
        return entries.stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void theBuiltInTemplatesAreListedAndFillForTheSelectedFeature() {
        assertThat(entries).extracting(TemplatePreview.Entry::name).contains("callout-note", "title-block-notes");
        PartWorksheet ws = Fixtures.twoFeatures();
        TemplatePreview.Entry e = named("callout-note");
        TemplatePreview.Result r = TemplatePreview.fill(e, TemplatePreview.text(e), ws, ws.features().get(0));
        assertThat(r.ok()).isTrue();
        assertThat(r.note()).contains(ws.features().get(0).id());
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
