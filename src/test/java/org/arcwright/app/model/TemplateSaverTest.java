package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.notes.NotesPaths;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.RuleBook;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.worksheet.PartWorksheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TemplateSaverTest {

    private static TemplatePreview.Entry named(PackStack stack, String name) {
        return TemplatePreview.entries(stack).stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow();
    }

    /** A team pack with one template of its own, invented for the test. */
    private static Path teamPack(Path dir, String template) throws Exception {
        Path team = dir.resolve("team");
        Files.createDirectories(team.resolve("templates"));
        Files.writeString(team.resolve("pack.json"), "{\"name\": \"Kestrel Works practice\"}");
        Files.writeString(team.resolve("templates").resolve("bench-note.mustache"), template);
        return team;
    }

    @Test
    void aTeamTemplateIsSavedBackToItsFileAndLoadsAsSaved(@TempDir Path dir) throws Exception {
        String original = "BENCH NOTE FOR {{part.number}}\n";
        Path team = teamPack(dir, original);
        PackStack stack = PackStack.load(List.of(team), null);
        TemplatePreview.Entry e = named(stack, "bench-note");
        assertThat(e.layer()).isEqualTo(PackLayer.TEAM);
        String edited = "BENCH NOTE FOR {{part.number}} ({{units}})\n";
        Path written = TemplateSaver.save(e, edited, TemplatePreview.text(e), dir.resolve("unused"));
        assertThat(written).isEqualTo(team.resolve("templates").resolve("bench-note.mustache"));
        assertThat(Files.readString(written)).isEqualTo(edited);
        PartWorksheet ws = Fixtures.twoFeatures();
        String note = NoteTemplates.load(PackStack.load(List.of(team), null)).fill("bench-note", ws, null, "test");
        assertThat(note).contains("(" + ws.units().symbol() + ")");
        // no temporary file left beside it for the loader to trip on
        try (var files = Files.list(team.resolve("templates"))) {
            assertThat(files.map(p -> p.getFileName().toString()).toList()).containsExactly("bench-note.mustache");
        }
    }

    @Test
    void aBuiltInTemplateIsSavedAsAPersonalOverrideThatReplacesItByName(@TempDir Path dir) {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        PackStack stack = PackStack.load(List.of(), personal);
        TemplatePreview.Entry builtIn = named(stack, "callout-note");
        assertThat(builtIn.layer()).isEqualTo(PackLayer.BUILT_IN);
        String edited = "OVERRIDDEN {{feature.id}}: {{feature.callout}}\n";
        Path written = TemplateSaver.save(builtIn, edited, TemplatePreview.text(builtIn), personal);
        assertThat(written).isEqualTo(TemplateSaver.overrideFile(personal, "callout-note"));
        PackStack reloaded = PackStack.load(List.of(), personal);
        TemplatePreview.Entry now = named(reloaded, "callout-note");
        assertThat(now.layer()).isEqualTo(PackLayer.PERSONAL);
        // a per-feature note is filled for a decided feature (the invented demo part's F1)
        PartWorksheet ws = Fixtures.files().read(Path.of("examples/tarnbeck-output-shaft-decided.arcpart"));
        String id = ws.features().get(0).id();
        assertThat(NoteTemplates.load(reloaded).fill("callout-note", ws, id, "test")).startsWith("OVERRIDDEN " + id);
        // the built-in template itself is untouched, read afresh
        assertThat(TemplatePreview.text(named(PackStack.builtIn(), "callout-note"))).doesNotContain("OVERRIDDEN");
        // the pack still loads its rules: no rule override was declared for a template
        assertThat(RuleBook.load(reloaded).problems()).isEmpty();
    }

    @Test
    void aTemplateThatDoesNotCheckIsNeverSavedAndTheProblemNamesLineAndField(@TempDir Path dir) throws Exception {
        String original = "BENCH NOTE FOR {{part.number}}\n";
        Path team = teamPack(dir, original);
        TemplatePreview.Entry e = named(PackStack.load(List.of(team), null), "bench-note");
        assertThatThrownBy(() -> TemplateSaver.save(e, "first line\n{{feature.nonsense}}\n", original, dir))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.line()).isEqualTo(2);
                    assertThat(p.getMessage()).contains("nonsense");
                });
        assertThat(Files.readString(e.file())).isEqualTo(original);
    }

    @Test
    void aFileChangedOnDiskSinceItWasOpenedIsNotWrittenOver(@TempDir Path dir) throws Exception {
        String original = "BENCH NOTE FOR {{part.number}}\n";
        Path team = teamPack(dir, original);
        TemplatePreview.Entry e = named(PackStack.load(List.of(team), null), "bench-note");
        String savedElsewhere = "SAVED BY A COLLEAGUE {{part.number}}\n";
        Files.writeString(e.file(), savedElsewhere);
        assertThatThrownBy(() -> TemplateSaver.save(e, "MINE {{part.number}}\n", original, dir))
                .isInstanceOf(InputProblem.class).hasMessageContaining("changed on disk");
        assertThat(Files.readString(e.file())).isEqualTo(savedElsewhere);
    }

    @Test
    void aFileDeletedSinceItWasOpenedIsAClearProblemAndNothingIsWritten(@TempDir Path dir) throws Exception {
        String original = "BENCH NOTE FOR {{part.number}}\n";
        Path team = teamPack(dir, original);
        TemplatePreview.Entry e = named(PackStack.load(List.of(team), null), "bench-note");
        Files.delete(e.file());
        assertThatThrownBy(() -> TemplateSaver.save(e, "MINE {{part.number}}\n", original, dir))
                .isInstanceOf(InputProblem.class).hasMessageContaining("moved or deleted");
        assertThat(e.file()).doesNotExist();
    }

    @Test
    void anOverrideNeverReplacesAPersonalTemplateTheListDidNotShow(@TempDir Path dir) throws Exception {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        TemplatePreview.Entry builtIn = named(PackStack.builtIn(), "callout-note");
        Path existing = TemplateSaver.overrideFile(personal, "callout-note");
        Files.createDirectories(existing.getParent());
        Files.writeString(existing, "ALREADY MINE {{feature.id}}\n");
        assertThatThrownBy(() -> TemplateSaver.save(builtIn, "NEW {{feature.id}}\n", TemplatePreview.text(builtIn), personal))
                .isInstanceOf(InputProblem.class).hasMessageContaining("already has");
        assertThat(Files.readString(existing)).isEqualTo("ALREADY MINE {{feature.id}}\n");
    }

    @Test
    void aNewTemplateIsWrittenOnlyWhenSavedUnderAFreeName(@TempDir Path dir) throws Exception {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        List<String> names = TemplatePreview.entries(PackStack.load(List.of(), personal)).stream()
                .map(TemplatePreview.Entry::name).toList();
        String name = TemplateSaver.freshName(names);
        assertThat(name).isEqualTo("my-note-1");
        Path written = TemplateSaver.saveNew(name, TemplateSaver.skeleton(), personal, names);
        assertThat(Files.readString(written)).isEqualTo(TemplateSaver.skeleton());
        TemplatePreview.Entry mine = named(PackStack.load(List.of(), personal), name);
        assertThat(mine.layer()).isEqualTo(PackLayer.PERSONAL);
        assertThat(mine.isOverride()).isFalse();
        assertThatThrownBy(() -> TemplateSaver.saveNew("callout-note", "X\n", personal, names))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.field()).isEqualTo("name"));
        assertThatThrownBy(() -> TemplateSaver.saveNew("Bad Name", "X\n", personal, names))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.field()).isEqualTo("name"));
    }

    @Test
    void revertingAnOverriddenTemplateDeletesTheOverrideOnlyAsItWasOpened(@TempDir Path dir) throws Exception {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        TemplatePreview.Entry builtIn = named(PackStack.load(List.of(), personal), "callout-note");
        String edited = "OVERRIDDEN {{feature.id}}\n";
        TemplateSaver.save(builtIn, edited, TemplatePreview.text(builtIn), personal);
        TemplatePreview.Entry override = named(PackStack.load(List.of(), personal), "callout-note");
        assertThat(override.isOverride()).isTrue();
        assertThat(override.replaces()).isEqualTo(builtIn.pack());
        // changed on disk since it was opened: not deleted
        assertThatThrownBy(() -> TemplateSaver.remove(override, "something else\n")).isInstanceOf(InputProblem.class)
                .hasMessageContaining("changed on disk");
        assertThat(Files.exists(override.file())).isTrue();
        TemplateSaver.remove(override, edited);
        assertThat(named(PackStack.load(List.of(), personal), "callout-note").layer()).isEqualTo(PackLayer.BUILT_IN);
        assertThatThrownBy(() -> TemplateSaver.remove(builtIn, null)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("built in");
    }
}
