package org.arcwright.services;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.Verdict;
import org.arcwright.io.JsonFiles;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Recommendation;
import org.arcwright.simulate.Example;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * The shared builder of a case's simulation: the chosen callout marked once, limits off the nominal
 * judged with the process aimed at their middle, and every example part judged again by the
 * inspection as the run judged it (so a plot of an escape shows a passing section). The case is F2 of
 * the invented Tarnbeck output shaft.
 */
@Tag("slow")
class CaseSimulationsTest {
    private static final Path DECIDED = Path.of("examples/tarnbeck-output-shaft-decided.arcpart");

    private static RadiusFeature f2() {
        return new WorksheetFiles(new JsonFiles()).read(DECIDED).features().get(1);
    }

    @Test
    void theChosenCalloutIsMarkedOnItsCardOrAddedAfterTheCards() {
        Practice practice = Practice.load(List.of(), null);
        RadiusFeature f = f2();
        Advice advice = practice.advisor().advise(f.designCase());
        ProcessModel base = CaseSimulations.process(f.designCase(), ProcessDefaults.load(practice.packs()).orElseThrow(),
                practice.book().capability()).model();
        // F2 chose R0.8 ±0.1, which no card proposes: added last
        List<CaseSimulations.Candidate> added = CaseSimulations.candidates(advice.recommendations(), f.chosen(), base, true);
        assertThat(added).hasSize(advice.recommendations().size() + 1);
        assertThat(added.get(added.size() - 1).chosen()).isTrue();
        assertThat(added.stream().filter(CaseSimulations.Candidate::chosen)).hasSize(1);
        // choosing the first card marks that card, and adds nothing
        Recommendation first = advice.recommendations().get(0);
        List<CaseSimulations.Candidate> marked = CaseSimulations.candidates(advice.recommendations(), first, base, true);
        assertThat(marked).hasSize(advice.recommendations().size());
        assertThat(marked.get(0).chosen()).isTrue();
        assertThat(marked.stream().filter(CaseSimulations.Candidate::chosen)).hasSize(1);
        // no choice: nothing marked
        assertThat(CaseSimulations.candidates(advice.recommendations(), null, base, true)).noneMatch(CaseSimulations.Candidate::chosen);
    }

    @Test
    void limitsOffTheNominalAreJudgedWithTheProcessAimedAtTheirMiddle() {
        Practice practice = Practice.load(List.of(), null);
        RadiusFeature f = f2();
        ProcessModel base = CaseSimulations.process(f.designCase(), ProcessDefaults.load(practice.packs()).orElseThrow(),
                practice.book().capability()).model();
        // a shop centres on the drawn band (common practice): R 0.7-0.8 on nominal R0.8 is made about 0.75
        ProcessModel aimed = CaseSimulations.aimedFor(base, new Callout.Radius(0.7, 0.8, 0.8), true);
        assertThat(aimed.nominalRadius()).isEqualTo(0.75);
        assertThat(aimed.radius().mean()).isEqualTo(0.75);
        assertThat(aimed.radius().sd()).isEqualTo(base.radius().sd());
        assertThat(aimed.flat()).isEqualTo(base.flat());
        assertThat(CaseSimulations.aimedFor(base, new Callout.Radius(0.7, 0.8, 0.8), false)).isSameAs(base);
        assertThat(CaseSimulations.aimedFor(base, new Callout.Radius(0.7, 0.9, 0.8), true)).isSameAs(base);
    }

    @Test
    void everyExamplePartIsJudgedAgainAsTheRunJudgedIt() {
        Practice practice = Practice.load(List.of(), null);
        RadiusFeature f = f2();
        Advice advice = practice.advisor().advise(f.designCase());
        CaseSimulations.CaseProcess process = CaseSimulations.process(f.designCase(), ProcessDefaults.load(practice.packs()).orElseThrow(),
                practice.book().capability());
        List<CaseSimulations.Candidate> candidates = CaseSimulations.candidates(advice.recommendations(), f.chosen(), process.model(), true);
        List<CaseSimulations.Judged> rows = CaseSimulations.run(candidates, CaseSimulations.needs(advice.needs()).needs(), 300, 19);
        int judged = 0;
        for (CaseSimulations.Judged row : rows) {
            if (row.result() == null) continue;
            for (Outcome o : Outcome.values()) {
                for (Example e : row.callout().examples(o)) {
                    Verdict v = CaseSimulations.inspect(row.result(), e).verdict();
                    boolean accepted = o == Outcome.ACCEPTED_GOOD || o == Outcome.ESCAPE;
                    assertThat(v == Verdict.PASS).as(row.callout().text() + " " + e.part().describe("mm")).isEqualTo(accepted);
                    judged++;
                }
            }
        }
        assertThat(judged).isGreaterThanOrEqualTo(8);
    }
}
