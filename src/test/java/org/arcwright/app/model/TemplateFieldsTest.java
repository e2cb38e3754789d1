package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.arcwright.templates.NoteTemplate;
import org.junit.jupiter.api.Test;

class TemplateFieldsTest {
    @Test
    void everyFieldOfferedChecksWhereItsEntrySaysItMaySit() {
        List<TemplateFields.Field> all = TemplateFields.all();
        assertThat(all).hasSizeGreaterThan(60);
        for (TemplateFields.Field f : all) {
            StringBuilder open = new StringBuilder(), close = new StringBuilder();
            for (String w : f.within()) {
                open.append("{{#").append(w).append("}}");
                close.insert(0, "{{/" + w + "}}");
            }
            String text = "line\n" + open + f.insert() + close + "\n";
            NoteTemplate.compile("probe", text, "probe.mustache", "test");
        }
    }

    @Test
    void perFeatureFieldsComeFirstAndListsInsideListsAreWrittenByTheirOwnName() {
        List<TemplateFields.Field> all = TemplateFields.all();
        assertThat(all.get(0).path()).isEqualTo("feature");
        assertThat(all).filteredOn(f -> f.path().equals("feature.callout")).singleElement()
                .satisfies(f -> assertThat(f.insert()).isEqualTo("{{feature.callout}}"));
        assertThat(all).filteredOn(f -> f.path().equals("features[].tiers[].zone")).singleElement()
                .satisfies(f -> {
                    assertThat(f.insert()).isEqualTo("{{zone}}");
                    assertThat(f.within()).containsExactly("features", "tiers");
                });
        assertThat(all).filteredOn(f -> f.path().equals("feature.because")).singleElement()
                .satisfies(f -> assertThat(f.insert()).isEqualTo("{{#feature.because}}{{.}}{{/feature.because}}"));
        // the lists of features repeat no fields: decidedFeatures is listed alone
        assertThat(all).noneMatch(f -> f.path().startsWith("decidedFeatures[]"));
        assertThat(TemplateFields.matching("datum")).isNotEmpty().allMatch(f -> f.matches("datum"));
    }
}
