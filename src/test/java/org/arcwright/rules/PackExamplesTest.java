package org.arcwright.rules;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;

/** The packs that ship pass their own self-tests, and the example team pack's overrides take effect. */
class PackExamplesTest {
    private static final Path SHARED = Path.of("shared");

    @Test
    void builtInPackPassesItsOwnExamples() {
        Advisor advisor = new Advisor(RuleBook.load(PackStack.builtIn()), FilletChecks.NONE, NoteLinker.NONE);
        PackCheck.Report report = new PackCheck(advisor).run("Arcwright built-in practice");
        assertThat(report.failures()).isEmpty();
        assertThat(report.passed()).isTrue();
        assertThat(report.examples()).hasSizeGreaterThan(20);
    }

    @Test
    void everyBuiltInRuleThatCanComeFirstHasAnExample() {
        RuleBook book = RuleBook.load(PackStack.builtIn());
        assertThat(book.entries()).filteredOn(e -> !e.rule().id().startsWith("fallback.")
                        && !e.rule().id().equals("mating.located.profile-datums"))
                .allSatisfy(e -> assertThat(e.rule().examples()).as(e.rule().id()).isNotEmpty());
    }

    @Test
    void sharedTeamPackPassesAndOverridesBuiltInRules() {
        RuleBook book = RuleBook.load(PackStack.load(List.of(SHARED), null));
        assertThat(book.problems()).isEmpty();
        PackCheck.Report report = new PackCheck(new Advisor(book, FilletChecks.NONE, NoteLinker.NONE))
                .run("Tarnbeck Drives practice");
        assertThat(report.passed()).isTrue();
        assertThat(book.entries()).filteredOn(e -> e.replaces() != null).extracting(e -> e.rule().id())
                .containsExactlyInAnyOrder("stress-relief.fatigue.asme-cr", "cosmetic.asme.title-block");
    }

    @Test
    void theTeamPackExampleFailsOnTheBuiltInPackAloneSoItProvesTheOverride() {
        RuleBook team = RuleBook.load(PackStack.load(List.of(SHARED), null));
        RuleExample ex = team.entries().stream().filter(e -> e.rule().id().equals("stress-relief.fatigue.asme-cr"))
                .findFirst().orElseThrow().rule().examples().get(0);
        Advisor builtIn = new Advisor(RuleBook.load(PackStack.builtIn()), FilletChecks.NONE, NoteLinker.NONE);
        Advisor withTeam = new Advisor(team, FilletChecks.NONE, NoteLinker.NONE);
        assertThat(builtIn.advise(ex.designCase()).first().orElseThrow().text()).doesNotContain(ex.expect().textContains());
        assertThat(withTeam.advise(ex.designCase()).first().orElseThrow().text()).contains(ex.expect().textContains());
    }
}
