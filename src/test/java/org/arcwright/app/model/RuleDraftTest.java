package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.arcwright.io.JsonFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RuleDraftTest {
    private static final String RULE = "{\n  \"id\": \"demo.rule\",\n  \"summary\": \"A demo rule\",\n"
            + "  \"when\": {\"function\": \"cosmetic\"},\n  \"recommend\": {\"callout\": \"radius\"},\n"
            + "  \"because\": [\"invented for the test\"],\n  \"weight\": 50\n}";

    @Test
    void aWellFormedRuleReads() {
        RuleDraft d = new RuleDraft(new JsonFiles(), "rules/demo.json", RULE);
        assertThat(d.problem()).isEmpty();
        assertThat(d.rule().orElseThrow().id()).isEqualTo("demo.rule");
    }

    @Test
    void aWrongValueIsReportedWithItsLineAndFieldAndTheFixClearsIt() {
        RuleDraft d = new RuleDraft(new JsonFiles(), "rules/demo.json", RULE.replace("\"weight\": 50", "\"weight\": \"heavy\""));
        assertThat(d.problem()).hasValueSatisfying(p -> {
            assertThat(p.getMessage()).contains("rules/demo.json").contains("weight");
            assertThat(p.line()).isEqualTo(7);
        });
        d.setText(RULE);
        assertThat(d.problem()).isEmpty();
    }

    @Test
    void aRuleOpensAsWrittenInItsPackFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("demo.json");
        Files.writeString(file, "{\"rules\": [" + RULE + "]}");
        RuleDraft d = RuleDraft.fromFile(new JsonFiles(), file, "demo.rule");
        assertThat(d.text()).contains("\"function\" : \"cosmetic\"");
        assertThat(d.rule()).isEqualTo(new RuleDraft(new JsonFiles(), "x", RULE).rule());
    }
}
