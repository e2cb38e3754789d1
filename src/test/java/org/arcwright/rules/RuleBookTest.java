package org.arcwright.rules;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Loading rules: what loads, what is reported, and that a bad pack never stops the others. */
class RuleBookTest {
    @TempDir
    Path dir;

    private static final String GOOD_RULE = """
            {"rules": [{"id": "team.sealing.tight", "summary": "tight sealing radius",
              "when": {"function": "sealing"}, "recommend": {"callout": "radius", "size": {"factor": 0.25}},
              "weight": 61, "because": ["the seal maker asks for it"]}]}
            """;

    private Path pack(String name, String manifestExtra, String... files) throws Exception {
        Path p = dir.resolve(name);
        Files.createDirectories(p.resolve("rules"));
        Files.writeString(p.resolve("pack.json"), "{\"name\": \"" + name + "\"" + manifestExtra + "}");
        for (int i = 0; i < files.length; i++) Files.writeString(p.resolve("rules/r" + i + ".json"), files[i]);
        return p;
    }

    private static RuleBook load(Path... packs) {
        return RuleBook.load(PackStack.load(List.of(packs), null));
    }

    @Test
    void builtInPackLoadsWithoutProblemsOrConflicts() {
        RuleBook book = RuleBook.load(PackStack.builtIn());
        assertThat(book.problems()).isEmpty();
        assertThat(book.conflicts()).isEmpty();
        assertThat(book.entries()).hasSizeGreaterThan(20);
        assertThat(book.capability()).isNotNull();
    }

    @Test
    void entriesAreOrderedByWeightThenId() {
        List<RuleBook.Entry> e = RuleBook.load(PackStack.builtIn()).entries();
        for (int i = 1; i < e.size(); i++) {
            Rule a = e.get(i - 1).rule();
            Rule b = e.get(i).rule();
            assertThat(a.weight() > b.weight() || a.weight() == b.weight() && a.id().compareTo(b.id()) < 0).isTrue();
        }
    }

    @Test
    void malformedJsonIsReportedWithFileLineAndColumnAndTheOtherLayersStillLoad() throws Exception {
        Path bad = pack("bad", "", "{\"rules\": [ {\"id\": \"x\",, } ]}", GOOD_RULE);
        RuleBook book = load(bad);
        assertThat(book.problems()).hasSize(1);
        InputProblem p = book.problems().get(0);
        assertThat(p.source()).endsWith("r0.json");
        assertThat(p.line()).isEqualTo(1);
        assertThat(p.column()).isPositive();
        assertThat(book.entries()).extracting(e -> e.rule().id()).contains("team.sealing.tight", "sealing.limits");
    }

    @Test
    void unknownFieldNamesTheFieldAndListsTheKnownOnes() throws Exception {
        RuleBook book = load(pack("p", "", GOOD_RULE.replace("\"weight\"", "\"wieght\": 3, \"weight\"")));
        assertThat(book.problems()).singleElement().satisfies(p -> {
            assertThat(p.field()).isEqualTo("rules[0].wieght");
            assertThat(p.problem()).contains("unknown field 'wieght'").contains("because", "weight");
        });
    }

    @Test
    void unknownFactNameListsTheKnownFacts() throws Exception {
        RuleBook book = load(pack("p", "", GOOD_RULE.replace("\"function\": \"sealing\"", "\"fuction\": \"sealing\"")));
        InputProblem p = book.problems().get(0);
        assertThat(p.field()).isEqualTo("rules[0].when.fuction");
        assertThat(p.problem()).contains("unknown fact 'fuction'").contains("function", "loading", "stress.targetKt",
                "mating.size", "datums.count");
        assertThat(p.line()).isEqualTo(2);
    }

    @Test
    void aValueTheFactCannotTakeIsAnErrorListingTheAllowedOnes() throws Exception {
        RuleBook book = load(pack("p", "", GOOD_RULE.replace("\"function\": \"sealing\"", "\"function\": \"seal\"")));
        assertThat(book.problems().get(0).problem()).contains("'seal' is not a value of 'function'")
                .contains("stress-relief, sealing, cosmetic, mating");
    }

    @Test
    void aRangeOnAWordFactAndAnEmptyRangeAreErrors() throws Exception {
        RuleBook a = load(pack("a", "", GOOD_RULE.replace("\"function\": \"sealing\"", "\"function\": {\"min\": 1}")));
        assertThat(a.problems().get(0).problem()).contains("applies only to numeric facts");
        RuleBook b = load(pack("b", "", GOOD_RULE.replace("\"function\": \"sealing\"",
                "\"nominalRadius\": {\"min\": 3, \"below\": 2}")));
        assertThat(b.problems().get(0).problem()).contains("admits no value");
    }

    @Test
    void duplicateIdsInOnePackAreErrors() throws Exception {
        RuleBook book = load(pack("p", "", GOOD_RULE, GOOD_RULE));
        assertThat(book.problems()).singleElement().satisfies(p -> {
            assertThat(p.problem()).contains("duplicate rule id 'team.sealing.tight'");
            assertThat(p.source()).endsWith("r1.json");
            assertThat(p.line()).isEqualTo(1);
            assertThat(p.field()).isEqualTo("rules[0].id");
        });
    }

    @Test
    void reusingABuiltInIdWithoutDeclaringTheOverrideIsAnError() throws Exception {
        RuleBook book = load(pack("p", "", GOOD_RULE.replace("team.sealing.tight", "sealing.limits")));
        assertThat(book.problems().get(0).problem()).contains("duplicate rule id 'sealing.limits'").contains("overrides");
        assertThat(book.entries()).filteredOn(e -> e.rule().id().equals("sealing.limits"))
                .singleElement().satisfies(e -> assertThat(e.pack()).isEqualTo("Arcwright built-in practice"));
    }

    @Test
    void aDeclaredOverrideReplacesTheLowerRule() throws Exception {
        RuleBook book = load(pack("p", ", \"overrides\": [\"sealing.limits\"]",
                GOOD_RULE.replace("team.sealing.tight", "sealing.limits")));
        assertThat(book.problems()).isEmpty();
        assertThat(book.entries()).filteredOn(e -> e.rule().id().equals("sealing.limits"))
                .singleElement().satisfies(e -> {
                    assertThat(e.pack()).isEqualTo("p");
                    assertThat(e.replaces()).isEqualTo("Arcwright built-in practice");
                });
    }

    @Test
    void overridingOrDisablingAMissingIdIsAnError() throws Exception {
        RuleBook book = load(pack("p", ", \"overrides\": [\"no.such.rule\"], \"disables\": [\"nor.this\"]", GOOD_RULE));
        assertThat(book.problems()).extracting(InputProblem::problem)
                .anySatisfy(m -> assertThat(m).contains("overrides rule 'no.such.rule'"))
                .anySatisfy(m -> assertThat(m).contains("disables rule 'nor.this'"));
    }

    @Test
    void disablingRemovesALowerRule() throws Exception {
        RuleBook book = load(pack("p", ", \"disables\": [\"fallback.title-block\"]"));
        assertThat(book.problems()).isEmpty();
        assertThat(book.entries()).noneMatch(e -> e.rule().id().equals("fallback.title-block"));
    }

    @Test
    void equalWeightRulesThatCanFireTogetherWithDifferentControlsAreReportedNotResolved() throws Exception {
        String clash = """
                {"rules": [{"id": "team.seal.profile", "summary": "s", "when": {"function": "sealing", "formMatters": true},
                  "recommend": {"callout": "profile"}, "weight": 61, "because": ["b"]}]}
                """;
        RuleBook book = load(pack("p", "", GOOD_RULE, clash));
        assertThat(book.problems()).isEmpty();
        assertThat(book.conflicts()).singleElement().satisfies(c -> {
            assertThat(c.first()).isEqualTo("team.seal.profile");
            assertThat(c.second()).isEqualTo("team.sealing.tight");
            assertThat(c.message()).contains("equal weight 61");
        });
    }

    @Test
    void equalWeightRulesThatCannotFireTogetherDoNotConflict() throws Exception {
        String disjoint = """
                {"rules": [{"id": "team.cosmetic.profile", "summary": "s", "when": {"function": "cosmetic"},
                  "recommend": {"callout": "profile"}, "weight": 61, "because": ["b"]},
                 {"id": "team.big.sealing", "summary": "s", "when": {"function": "sealing", "nominalRadius": {"above": 5}},
                  "recommend": {"callout": "profile"}, "weight": 61, "because": ["b"]}]}
                """;
        RuleBook book = load(pack("p", "", GOOD_RULE.replace("\"function\": \"sealing\"",
                "\"function\": \"sealing\", \"nominalRadius\": {\"max\": 5}"), disjoint));
        assertThat(book.conflicts()).isEmpty();
    }

    @Test
    void aMissingPackFolderIsAProblemAndTheBuiltInStillLoads() {
        RuleBook book = load(dir.resolve("nowhere"));
        assertThat(book.problems()).singleElement().satisfies(p -> assertThat(p.problem()).contains("no such directory"));
        assertThat(book.entries()).isNotEmpty();
    }

    @Test
    void aCompositeWithoutDatumsIsRejected() throws Exception {
        RuleBook book = load(pack("p", "", GOOD_RULE.replace("\"callout\": \"radius\", \"size\": {\"factor\": 0.25}",
                "\"callout\": \"composite-profile\", \"tiers\": [2, 1]")));
        assertThat(book.problems().get(0).problem()).contains("upper tier locates: it needs datums");
    }
}
