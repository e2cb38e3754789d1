package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.notes.NotesPaths;
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
}
