package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.notes.NotesPaths;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.RuleBook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RuleSaverTest {
    private static final String RULE = "{\n  \"id\": \"demo.rule\",\n  \"summary\": \"A demo rule\",\n"
            + "  \"when\": {\"function\": \"cosmetic\"},\n  \"recommend\": {\"callout\": \"radius\"},\n"
            + "  \"because\": [\"invented for the test\"],\n  \"weight\": 50\n}";
    private static final String OTHER = RULE.replace("demo.rule", "demo.other").replace("A demo rule", "Another");
    private final JsonFiles json = new JsonFiles();

    @Test
    void aTeamRuleIsSavedInPlaceBesideTheOtherRulesOfItsFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("demo.json");
        Files.writeString(file, "{\"rules\": [" + RULE + ", " + OTHER + "]}");
        RuleDraft d = RuleDraft.fromFile(json, file, "demo.rule");
        d.setText(d.text().replace("A demo rule", "A demo rule, edited"));
        new RuleSaver(json).saveInPlace(d, "demo.rule", file);
        assertThat(RuleDraft.fromFile(json, file, "demo.rule").rule().orElseThrow().summary()).isEqualTo("A demo rule, edited");
        assertThat(RuleDraft.fromFile(json, file, "demo.other").rule().orElseThrow().summary()).isEqualTo("Another");
    }

    @Test
    void aDraftThatDoesNotReadIsNeverWritten(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("demo.json");
        String before = "{\"rules\": [" + RULE + "]}";
        Files.writeString(file, before);
        RuleDraft d = new RuleDraft(json, file.toString(), RULE.replace("\"weight\": 50", "\"weight\": \"heavy\""));
        assertThatThrownBy(() -> new RuleSaver(json).saveInPlace(d, "demo.rule", file)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("weight");
        assertThat(Files.readString(file)).isEqualTo(before);
    }

    @Test
    void aBuiltInRuleIsSavedAsAnOverrideThatThePackStackLoads(@TempDir Path dir) {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        RuleBook.Entry builtIn = RuleBook.load(PackStack.load(List.of(), personal)).entries().get(0);
        String id = builtIn.rule().id();
        Path builtInFile = null;
        for (PackStack.PackFile f : PackStack.builtIn().files("rules", ".json")) {
            if (f.path().toString().equals(builtIn.file())) builtInFile = f.path();
        }
        RuleDraft d = RuleDraft.fromFile(json, builtInFile, id);
        d.setText(d.text().replace(builtIn.rule().summary(), "Edited in the personal pack"));
        Path written = new RuleSaver(json).saveOverride(d, id, personal);
        assertThat(written).isEqualTo(RuleSaver.overrideFile(personal, id));
        RuleBook reloaded = RuleBook.load(PackStack.load(List.of(), personal));
        assertThat(reloaded.entries()).anySatisfy(e -> {
            assertThat(e.rule().id()).isEqualTo(id);
            assertThat(e.rule().summary()).isEqualTo("Edited in the personal pack");
        });
        // saving again keeps one override entry in pack.json
        new RuleSaver(json).saveOverride(d, id, personal);
        assertThat(json.readTree(personal.resolve("pack.json")).path("overrides").size()).isEqualTo(1);
    }

    @Test
    void aNewRuleStartsFromASkeletonThatReadsWithAFreshIdAndIsWrittenOnlyWhenSaved(@TempDir Path dir) throws Exception {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        RuleBook book = RuleBook.load(PackStack.load(List.of(), personal));
        List<String> ids = book.entries().stream().map(e -> e.rule().id()).toList();
        String id = RuleSaver.freshId(ids);
        assertThat(id).isEqualTo("my.rule-1");
        assertThat(RuleSaver.freshId(List.of("my.rule-1"))).isEqualTo("my.rule-2");
        RuleDraft d = new RuleDraft(json, "new", RuleSaver.skeleton(id));
        assertThat(d.problem()).isEmpty();
        assertThat(Files.exists(personal.resolve("rules"))).isFalse();
        Path written = new RuleSaver(json).saveNew(d, personal, ids);
        assertThat(written).isEqualTo(RuleSaver.newRuleFile(personal, id));
        RuleBook reloaded = RuleBook.load(PackStack.load(List.of(), personal));
        assertThat(reloaded.problems()).isEmpty();
        assertThat(reloaded.entries()).anySatisfy(e -> assertThat(e.rule().id()).isEqualTo(id));
        // a second save under the same id would be an override nobody asked for: refused, naming the field
        assertThatThrownBy(() -> new RuleSaver(json).saveNew(d, personal,
                reloaded.entries().stream().map(e -> e.rule().id()).toList()))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.field()).isEqualTo("id"));
    }

    @Test
    void revertingAnOverrideRemovesItsFileAndListingAndTheBuiltInRuleIsInForceAgain(@TempDir Path dir) {
        Path personal = NotesPaths.ensurePersonalPack(dir.resolve("personal"));
        RuleBook.Entry builtIn = RuleBook.load(PackStack.load(List.of(), personal)).entries().get(0);
        String id = builtIn.rule().id();
        RuleDraft d = new RuleDraft(json, "x", RuleForm.write(draftOf(builtIn).text(), RuleForm.Field.SUMMARY, "Mine"));
        new RuleSaver(json).saveOverride(d, id, personal);
        RuleBook.Entry override = RuleBook.load(PackStack.load(List.of(), personal)).entries().stream()
                .filter(e -> e.rule().id().equals(id)).findFirst().orElseThrow();
        assertThat(override.replaces()).isNotNull();
        new RuleSaver(json).remove(override);
        assertThat(Files.exists(RuleSaver.overrideFile(personal, id))).isFalse();
        assertThat(json.readTree(personal.resolve("pack.json")).path("overrides").size()).isZero();
        RuleBook reverted = RuleBook.load(PackStack.load(List.of(), personal));
        assertThat(reverted.problems()).isEmpty();
        assertThat(reverted.entries()).anySatisfy(e -> {
            assertThat(e.rule().id()).isEqualTo(id);
            assertThat(e.layer()).isEqualTo(PackLayer.BUILT_IN);
            assertThat(e.rule().summary()).isEqualTo(builtIn.rule().summary());
        });
        // the built-in pack itself is never written
        assertThatThrownBy(() -> new RuleSaver(json).remove(builtIn)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("built in");
    }

    @Test
    void deletingATeamRuleKeepsTheOtherRulesOfItsFile(@TempDir Path dir) throws Exception {
        Path team = dir.resolve("team");
        Files.createDirectories(team.resolve("rules"));
        Files.writeString(team.resolve("pack.json"), "{\"name\": \"Kestrel Works practice\"}");
        Files.writeString(team.resolve("rules").resolve("demo.json"), "{\"rules\": [" + RULE + ", " + OTHER + "]}");
        RuleBook.Entry demo = RuleBook.load(PackStack.load(List.of(team), null)).entries().stream()
                .filter(e -> e.rule().id().equals("demo.rule")).findFirst().orElseThrow();
        new RuleSaver(json).remove(demo);
        RuleBook after = RuleBook.load(PackStack.load(List.of(team), null));
        assertThat(after.entries()).noneMatch(e -> e.rule().id().equals("demo.rule"))
                .anyMatch(e -> e.rule().id().equals("demo.other"));
        assertThatThrownBy(() -> new RuleSaver(json).remove(demo)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("no rule 'demo.rule'");
    }

    private RuleDraft draftOf(RuleBook.Entry e) {
        for (PackStack.PackFile f : PackStack.builtIn().files("rules", ".json")) {
            if (f.path().toString().equals(e.file())) return RuleDraft.fromFile(json, f.path(), e.rule().id());
        }
        throw new AssertionError(e.file());
    }
}
