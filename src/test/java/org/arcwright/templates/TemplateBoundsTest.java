package org.arcwright.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import org.junit.jupiter.api.Test;

/** Templates cannot make Arcwright overflow its stack or fill the memory. */
class TemplateBoundsTest {
    private final PartWorksheet demo = new WorksheetFiles(new JsonFiles())
            .read(Path.of("examples/tarnbeck-output-shaft-decided.arcpart"));

    @Test
    void fiveThousandNestedSectionsAreRefusedAtTheDepthLimit() {
        String text = "{{#part}}".repeat(5000) + "x" + "{{/part}}".repeat(5000);
        assertThatThrownBy(() -> NoteTemplate.compile("deep", text, "deep.mustache", "t"))
                .isInstanceOf(InputProblem.class)
                .hasMessageContaining("deep.mustache:1:")
                .hasMessageContaining("nested more than " + TemplateChecker.MAX_DEPTH);
    }

    @Test
    void elevenNestedFeatureListsAreRefused() {
        String text = "{{#features}}".repeat(11) + "{{id}}" + "{{/features}}".repeat(11);
        assertThatThrownBy(() -> NoteTemplate.compile("loop", text, "loop.mustache", "t"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("features").hasMessageContaining("inside itself");
    }

    @Test
    void listsNestedBeyondTheLimitAreRefused() {
        String text = "{{#features}}{{#decidedFeatures}}{{#edgeFeatures}}{{#because}}{{.}}"
                + "{{/because}}{{/edgeFeatures}}{{/decidedFeatures}}{{/features}}";
        assertThatThrownBy(() -> NoteTemplate.compile("lists", text, "lists.mustache", "t"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("nested more than " + TemplateChecker.MAX_LIST_DEPTH);
    }

    @Test
    void aNoteLongerThanTheCapIsRefusedNotBuilt() {
        String body = "X".repeat(40_000);
        String text = "{{#features}}{{#decidedFeatures}}{{#because}}" + body
                + "{{/because}}{{/decidedFeatures}}{{/features}}";
        NoteTemplate t = NoteTemplate.compile("big", text, "big.mustache", "t");
        assertThatThrownBy(() -> new NoteTemplates(List.of(t)).fill("big", demo, null, "t"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("big.mustache")
                .hasMessageContaining("longer than " + NoteTemplate.MAX_OUTPUT);
    }

    @Test
    void theBuiltInTemplatesStayWellWithinTheBounds() {
        NoteTemplates all = NoteTemplates.load(PackStack.builtIn());
        for (String name : all.names()) {
            assertThat(all.fill(name, demo, null, "t").length()).as(name).isLessThan(NoteTemplate.MAX_OUTPUT / 100);
        }
    }
}
