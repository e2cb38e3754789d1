package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.Map;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;

class RuleFormTest {
    private final JsonFiles json = new JsonFiles();
    private static final String RULE = "{\n  \"id\": \"demo.rule\",\n  \"summary\": \"A demo rule\",\n"
            + "  \"when\": {\"function\": \"sealing\", \"formMatters\": true, \"loading\": [\"static\", \"fatigue\"],"
            + " \"nominalRadiusMm\": {\"min\": 0.5, \"below\": 3}},\n"
            + "  \"recommend\": {\"callout\": \"profile\", \"extent\": \"with-adjacent\"},\n"
            + "  \"because\": [\"invented for the test\", \"a second sentence\"],\n  \"weight\": 50,\n"
            + "  \"noteTags\": [\"sealing\", \"profile\"]\n}";

    @Test
    void everyBuiltInRuleRoundTripsThroughTheFormFieldByField() {
        int rules = 0;
        for (PackStack.PackFile f : PackStack.builtIn().files("rules", ".json")) {
            for (JsonNode r : json.readTree(f.path()).path("rules")) {
                String text = r.toPrettyString();
                Map<RuleForm.Field, String> form = RuleForm.read(text).orElseThrow();
                String rewritten = text;
                for (RuleForm.Field field : RuleForm.Field.values()) rewritten = RuleForm.write(rewritten, field, form.get(field));
                assertThat(json.parse(rewritten, "x", JsonNode.class)).as(r.path("id").asText()).isEqualTo(r);
                rules++;
            }
        }
        assertThat(rules).isGreaterThan(10);
    }

    @Test
    void theExampleTeamPacksRulesWithNeedsAndPreferencesRoundTripThroughTheForm() {
        // the Practice editor's form had no fields for a rule's needs and preferences: they could be
        // edited only on the JSON tab
        JsonNode rules = json.readTree(Path.of("shared/rules/tarnbeck-needs.json")).path("rules");
        assertThat(rules).isNotEmpty();
        for (JsonNode r : rules) {
            String text = r.toPrettyString();
            Map<RuleForm.Field, String> form = RuleForm.read(text).orElseThrow();
            String rewritten = text;
            for (RuleForm.Field field : RuleForm.Field.values()) rewritten = RuleForm.write(rewritten, field, form.get(field));
            assertThat(json.parse(rewritten, "x", JsonNode.class)).as(r.path("id").asText()).isEqualTo(r);
            assertThat(new RuleDraft(json, "x", rewritten).problem()).as(r.path("id").asText()).isEmpty();
        }
        Map<RuleForm.Field, String> floor = RuleForm.read(rules.get(0).toPrettyString()).orElseThrow();
        assertThat(floor.get(RuleForm.Field.NEEDS)).contains("\"id\" : \"radius-floor\"", "\"min\" : 0.8");
        assertThat(floor.get(RuleForm.Field.RECOMMEND)).isEmpty();
        Map<RuleForm.Field, String> prefer = RuleForm.read(rules.get(1).toPrettyString()).orElseThrow();
        assertThat(prefer.get(RuleForm.Field.PREFER)).isEqualTo("profile, composite-profile");
    }

    @Test
    void needsAndPreferencesWrittenOnTheFormReadAsARule() {
        String withNeeds = RuleForm.write(RULE, RuleForm.Field.NEEDS, "[{\"id\": \"radius-ceiling\", \"max\": 3, "
                + "\"units\": \"mm\", \"why\": \"the seal's groove\", \"source\": \"common practice\"}]");
        String both = RuleForm.write(withNeeds, RuleForm.Field.PREFER, "profile, radius");
        JsonNode tree = json.parse(both, "x", JsonNode.class);
        assertThat(tree.path("needs").get(0).path("max").asDouble()).isEqualTo(3.0);
        assertThat(tree.path("prefer").get(1).asText()).isEqualTo("radius");
        assertThat(new RuleDraft(json, "x", both).problem()).isEmpty();
        RuleDraft badKind = new RuleDraft(json, "x", RuleForm.write(RULE, RuleForm.Field.PREFER, "a round one"));
        assertThat(badKind.problem()).isPresent();
        assertThatThrownBy(() -> RuleForm.write(RULE, RuleForm.Field.NEEDS, "{\"id\": \"form\"}"))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.field()).isEqualTo("needs"));
    }

    @Test
    void conditionsReadOneALineWithWordsBareAndOtherValuesAsJson() {
        Map<RuleForm.Field, String> form = RuleForm.read(RULE).orElseThrow();
        assertThat(form.get(RuleForm.Field.WHEN)).isEqualTo("function: sealing\nformMatters: true\n"
                + "loading: [\"static\",\"fatigue\"]\nnominalRadiusMm: {\"min\":0.5,\"below\":3}");
        assertThat(form.get(RuleForm.Field.BECAUSE)).isEqualTo("invented for the test\na second sentence");
        assertThat(form.get(RuleForm.Field.NOTE_TAGS)).isEqualTo("sealing, profile");
        assertThat(form.get(RuleForm.Field.WEIGHT)).isEqualTo("50");
        assertThat(form.get(RuleForm.Field.CAUTIONS)).isEmpty();
    }

    @Test
    void aFieldWrittenFromTheFormReplacesOnlyThatFieldAndTheRuleStillReads() {
        String edited = RuleForm.write(RULE, RuleForm.Field.WHEN, "function: sealing\nprocess: {\"noneOf\": [\"cast\"]}");
        JsonNode tree = json.parse(edited, "x", JsonNode.class);
        assertThat(tree.path("when").path("process").path("noneOf").get(0).asText()).isEqualTo("cast");
        assertThat(tree.path("when").has("formMatters")).isFalse();
        assertThat(tree.path("summary").asText()).isEqualTo("A demo rule");
        // field order kept: id still first, when still third
        assertThat(tree.fieldNames().next()).isEqualTo("id");
        assertThat(new RuleDraft(json, "x", edited).problem()).isEmpty();
        // a word that reads as JSON is written quoted, so it comes back a word
        String quoted = RuleForm.write(RULE, RuleForm.Field.RECOMMEND, "callout: radius\nclass: \"true\"");
        assertThat(RuleForm.read(quoted).orElseThrow().get(RuleForm.Field.RECOMMEND)).isEqualTo("callout: radius\nclass: \"true\"");
        // an empty optional list is left out rather than written as []
        assertThat(json.parse(RuleForm.write(RULE, RuleForm.Field.CAUTIONS, ""), "x", JsonNode.class).has("cautions")).isFalse();
    }

    @Test
    void aFormValueThatCannotBeWrittenNamesTheFieldAndLine() {
        assertThatThrownBy(() -> RuleForm.write(RULE, RuleForm.Field.WEIGHT, "heavy"))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.field()).isEqualTo("weight");
                    assertThat(p.getMessage()).contains("weight").contains("heavy");
                });
        assertThatThrownBy(() -> RuleForm.write(RULE, RuleForm.Field.WHEN, "function: sealing\nformMatters"))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.field()).isEqualTo("when");
                    assertThat(p.line()).isEqualTo(2);
                });
        assertThatThrownBy(() -> RuleForm.write(RULE, RuleForm.Field.EXAMPLES, "[ {\"name\": }"))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.field()).isEqualTo("examples"));
    }

    @Test
    void theReadersProblemsAreMappedToTheFormFieldTheyConcern() {
        RuleDraft weight = new RuleDraft(json, "x", RULE.replace("\"weight\": 50", "\"weight\": 0"));
        assertThat(RuleForm.fieldOf(weight.problem().orElseThrow())).contains(RuleForm.Field.WEIGHT);
        RuleDraft fact = new RuleDraft(json, "x", RULE.replace("\"function\": \"sealing\"", "\"function\": \"seal\""));
        assertThat(RuleForm.fieldOf(fact.problem().orElseThrow())).contains(RuleForm.Field.WHEN);
        RuleDraft because = new RuleDraft(json, "x", RULE.replace("\"invented for the test\", \"a second sentence\"", ""));
        assertThat(RuleForm.fieldOf(because.problem().orElseThrow())).contains(RuleForm.Field.BECAUSE);
    }

    @Test
    void textThatIsNotAnObjectHasNoForm() {
        assertThat(RuleForm.read("{ \"id\": ")).isEmpty();
        assertThat(RuleForm.read("[1]")).isEmpty();
    }
}
