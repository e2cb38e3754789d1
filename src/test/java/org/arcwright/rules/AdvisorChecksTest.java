package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Optional;
import org.arcwright.callout.Callout;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * How the engine acts on the mechanics' numbers: adjusted limits when a control can be tightened,
 * demotion with the reason when it cannot. The mechanics here is a stand-in with invented, simple
 * curves (Kt = 1 + 0.5/sqrt(r); a fillet seats when its largest radius is at most the mating size),
 * so the expectations are worked by hand; the real fits are checked in the mechanics package.
 */
class AdvisorChecksTest {
    private static RuleBook book;

    /** Invented curves for engine tests only. */
    static final class StandIn implements FilletChecks {
        static double kt(double r) { return 1 + 0.5 / Math.sqrt(r); }

        public Optional<StressFigures> stress(DesignCase c, double rMin, double rMax) {
            return Optional.of(new StressFigures(kt(rMin), kt(rMax), null, null, true, "stand-in", List.of()));
        }

        public Optional<MinimumRadiusFigure> minimumRadius(DesignCase c) {
            double t = c.stress().targetKt();
            double r = Math.pow(0.5 / (t - 1), 2);
            boolean found = r <= (c.stress().bigD() - c.stress().smallD()) / 2;
            return Optional.of(new MinimumRadiusFigure("Kt", t, found, found ? r : Double.NaN,
                    found ? "r >= " + r : "no radius up to the step height meets Kt " + t));
        }

        public Optional<SeatingFigure> seating(DesignCase c, double rMax) {
            double size = c.mating().size();
            return Optional.of(new SeatingFigure(rMax <= size + 1e-12, size - rMax, size,
                    rMax <= size ? "clears" : "fouls by " + (rMax - size)));
        }

        public List<String> stressCautions() { return List.of("stand-in stress caution"); }

        public List<String> seatingCautions() { return List.of("stand-in seating caution"); }
    }

    @BeforeAll
    static void load() {
        book = RuleBook.load(PackStack.builtIn());
    }

    private static Advice advise(DesignCase c) {
        return new Advisor(book, new StandIn(), NoteLinker.NONE).advise(c);
    }

    private static DesignCase shoulder(double r, Double targetKt, String tolerance, DesignCase.MatingCorner mating,
                                       BlendFunction f) {
        return new DesignCase(Units.MM, DrawingStyle.ASME, "shoulder", BlendKind.FILLET, r, f, Loading.FATIGUE, true,
                false, List.of(), Process.MACHINED,
                new DesignCase.StressInputs("stepped-shaft", "bending", 42, 35, null, targetKt), mating, tolerance);
    }

    @Test
    void aMinimumBelowTheKtTargetIsRaisedAndSaysWhy() {
        // target Kt 1.3: r >= (0.5/0.3)^2 = 2.778 -> the CR 2 ±0.2 intent is raised to 2.78, band 0.4 kept
        Recommendation r = advise(shoulder(2, 1.3, "R2 ±0.2", null, BlendFunction.STRESS_RELIEF)).first().orElseThrow();
        assertThat(r.ruleId()).isEqualTo("stress-relief.fatigue.asme-cr");
        assertThat(r.demoted()).isFalse();
        Callout.ControlledRadius cr = (Callout.ControlledRadius) r.callout();
        assertThat(cr.min()).isEqualTo(2.78);
        assertThat(cr.max()).isEqualTo(3.18);
        assertThat(r.text()).isEqualTo("CR2.78-3.18");
        assertThat(r.cautions()).anySatisfy(c -> assertThat(c).startsWith("Limits adjusted:").contains("2.78"));
        assertThat(r.numbers().asMap()).containsEntry("adjusted", true).containsKey("ktAtMin").containsKey("minRadiusForTarget");
        assertThat((Double) r.numbers().asMap().get("ktAtMin")).isLessThanOrEqualTo(1.3);
    }

    @Test
    void aMinimumThatMeetsTheTargetIsLeftAlone() {
        // target Kt 1.4: r >= 1.5625; the intent R2 ±0.2 has min 1.8
        Recommendation r = advise(shoulder(2, 1.4, "R2 ±0.2", null, BlendFunction.STRESS_RELIEF)).first().orElseThrow();
        assertThat(r.text()).isEqualTo("CR2 ±0.2");
        assertThat(r.numbers().asMap()).containsEntry("adjusted", false);
        assertThat(r.cautions()).contains("stand-in stress caution", Advisor.GUIDANCE_CAUTION);
    }

    @Test
    void aTargetNoRadiusCanMeetDemotesEveryStressRecommendationWithTheReason() {
        // target Kt 1.05: r >= 100, beyond the step height 3.5
        Advice a = advise(shoulder(2, 1.05, null, null, BlendFunction.STRESS_RELIEF));
        assertThat(a.recommendations()).allSatisfy(r -> {
            assertThat(r.demoted()).isTrue();
            assertThat(r.cautions()).anySatisfy(c -> assertThat(c).startsWith("Demoted:").contains("step height"));
        });
    }

    @Test
    void limitsSqueezedUnderTheStepBelowWhatTheProcessHoldsAreDemotedWithTheNumbersKept() {
        // target Kt 1.27: r >= (0.5/0.27)^2 = 3.429 -> 3.43; the intent band 0.4 cannot fit under h = 3.5, so
        // 3.43 to 3.50 is left, a band of 0.07 where machining near R3.5 holds ±0.2 (built-in capability table,
        // common practice)
        Advice a = advise(shoulder(2, 1.27, "R2 ±0.2", null, BlendFunction.STRESS_RELIEF));
        Recommendation r = a.recommendations().stream().filter(x -> x.ruleId().equals("stress-relief.fatigue.asme-cr"))
                .findFirst().orElseThrow();
        assertThat(r.demoted()).isTrue();
        assertThat(r.text()).isEqualTo("CR3.43-3.50");
        assertThat(r.cautions()).anySatisfy(c -> assertThat(c).startsWith("Demoted:")
                .contains("band of 0.07", "h = 3.50", "±0.2 mm", "larger step", "relief groove", "relaxing the target"));
        assertThat(a.recommendations()).allSatisfy(x -> assertThat(x.demoted()).isTrue());
        assertThat(a.warnings().get(0)).startsWith("Nothing meets every need").contains("3.429", "3.500");
        assertThat(a.designChanges()).extracting(DesignChange::kind).contains(DesignChange.Kind.LARGER_STEP,
                DesignChange.Kind.RELIEF_GROOVE, DesignChange.Kind.STRONGER_MATERIAL);
    }

    @Test
    void aRaisedBandKeptWholeIsNotSecondGuessedEvenWhenTighterThanTheTable() {
        // target Kt 1.29: r >= 2.973 -> 2.98; the capability band of CR2 +0.2/0 (machined ±0.1 at R2, plus-only)
        // moves whole to 2.98 to 3.18, under h = 3.5: the rule's own band, so it stands
        Recommendation r = advise(shoulder(2, 1.29, null, null, BlendFunction.STRESS_RELIEF)).first().orElseThrow();
        assertThat(r.text()).isEqualTo("CR2.98-3.18");
        assertThat(r.demoted()).isFalse();
    }

    @Test
    void aTitleBlockToleranceUnderTheTargetIsDemotedNotAdjusted() {
        Advice a = advise(shoulder(2, 1.3, null, null, BlendFunction.STRESS_RELIEF));
        assertThat(a.recommendations()).filteredOn(r -> r.ruleId().equals("fallback.title-block"))
                .singleElement().satisfies(r -> assertThat(r.demoted()).isTrue());
        assertThat(a.recommendations().get(a.recommendations().size() - 1).demoted()).isTrue();
    }

    @Test
    void aFilletThatFoulsTheMatingCornerHasItsMaximumLowered() {
        // minus-only band of R0.8 machined: 0.70 to 0.80; a mating radius of 0.75 seats only up to 0.75
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ASME, "bearing seat", BlendKind.FILLET, 0.8,
                BlendFunction.MATING, Loading.STATIC, false, false, List.of(), Process.MACHINED, null,
                new DesignCase.MatingCorner("radius", 0.75, null), null);
        Recommendation r = advise(c).first().orElseThrow();
        assertThat(r.ruleId()).isEqualTo("mating.fillet.max-radius");
        Callout.Radius rad = (Callout.Radius) r.callout();
        assertThat(rad.max()).isEqualTo(0.75);
        assertThat(rad.min()).isEqualTo(0.65);
        assertThat(r.numbers().asMap()).containsEntry("seats", true);
        assertThat(r.cautions()).anySatisfy(t -> assertThat(t).startsWith("Limits adjusted:").contains("fouls"));
    }

    @Test
    void aFilletThatCannotBothSeatAndMeetTheKtTargetIsDemoted() {
        // seating needs r <= 1.0, the Kt target needs r >= 2.78: no limits do both
        Advice a = advise(shoulder(2, 1.3, null, new DesignCase.MatingCorner("chamfer", 1.0, null), BlendFunction.MATING));
        assertThat(a.recommendations()).filteredOn(r -> r.callout() instanceof Callout.Radius)
                .allSatisfy(r -> assertThat(r.demoted()).isTrue());
    }

    @Test
    void demotedRecommendationsRankBelowEveryOther() {
        Advice a = advise(shoulder(2, 1.3, null, null, BlendFunction.STRESS_RELIEF));
        boolean seenDemoted = false;
        for (Recommendation r : a.recommendations()) {
            if (seenDemoted) assertThat(r.demoted()).isTrue();
            seenDemoted |= r.demoted();
        }
    }

    @Test
    void theTraceNamesTheRuleThePackAndTheFactsThatFiredIt() {
        Recommendation r = advise(shoulder(2, 1.4, null, null, BlendFunction.STRESS_RELIEF)).first().orElseThrow();
        assertThat(r.trace().get(0)).isEqualTo("rule stress-relief.fatigue.asme-cr from Arcwright built-in practice, weight 90");
        assertThat(r.trace().get(1)).isEqualTo("fired by function=stress-relief, loading=fatigue, standard=asme");
    }

    @Test
    void linkedNotesComeFromTheLinkerWithTheRuleTags() {
        NoteLinker linker = (tags, text, limit) -> List.of(new NoteLink("n1", "Shoulder fillets " + tags, "team"));
        Recommendation r = new Advisor(book, new StandIn(), linker)
                .advise(shoulder(2, 1.4, null, null, BlendFunction.STRESS_RELIEF)).first().orElseThrow();
        assertThat(r.notes()).singleElement().satisfies(n -> assertThat(n.title()).contains("fatigue"));
    }
}
