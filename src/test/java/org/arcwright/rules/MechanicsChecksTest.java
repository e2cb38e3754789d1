package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.io.JsonFiles;
import org.arcwright.mechanics.FilletStressAnalysis;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.LoadCase;
import org.arcwright.mechanics.NotchSensitivity;
import org.arcwright.mechanics.PetersonFits;
import org.arcwright.mechanics.ShoulderShape;
import org.arcwright.mechanics.StressConcentration;
import org.arcwright.mechanics.UltimateStrength;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The advisor wired to the real mechanics, on the demo part's features. The figures themselves are
 * checked against Peterson's and Shigley's in the mechanics package's tests; here the point is that
 * the advisor passes the right case and acts on the verdicts.
 */
class MechanicsChecksTest {
    private static Advisor advisor;
    private static PartWorksheet part;

    @BeforeAll
    static void load() {
        PackStack stack = PackStack.builtIn();
        advisor = new Advisor(RuleBook.load(stack), MechanicsChecks.standard(stack), NoteLinker.NONE);
        part = new WorksheetFiles(new JsonFiles()).read(Path.of("examples/tarnbeck-output-shaft.arcpart"));
    }

    private static DesignCase feature(String id) {
        return part.feature(id).orElseThrow().designCase();
    }

    @Test
    void fatigueShoulderUnderItsKfTargetHasItsMinimumRaisedAndStaysUnderTheStepHeight() {
        Recommendation r = advisor.advise(feature("F1")).first().orElseThrow();
        Callout.ControlledRadius cr = (Callout.ControlledRadius) r.callout();
        double minNeeded = (Double) r.numbers().asMap().get("minRadiusForTarget");
        assertThat(cr.min()).isGreaterThanOrEqualTo(minNeeded);
        assertThat(cr.max()).isLessThanOrEqualTo(3.5); // h = (42 - 35)/2
        assertThat((Double) r.numbers().asMap().get("kfAtMin")).isLessThanOrEqualTo(1.6 + 1e-6);
        assertThat(r.cautions()).anySatisfy(c -> assertThat(c).startsWith("Limits adjusted"));
    }

    @Test
    void theKtAtTheMinimumIsTheMechanicsPackagesFigure() {
        Recommendation r = advisor.advise(feature("F1")).first().orElseThrow();
        double min = ((Callout.ControlledRadius) r.callout()).min();
        FilletStressAnalysis a = new FilletStressAnalysis(new StressConcentration(PetersonFits.published()),
                new NotchSensitivity());
        var point = a.point(FilletStressCase.of(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, Units.MM, 42, 35, min,
                UltimateStrength.ofMpa(900)), min);
        assertThat((Double) r.numbers().asMap().get("ktAtMin")).isCloseTo(point.kt().kt(), Offset.offset(1e-6));
    }

    @Test
    void bearingSeatFilletUnderALargerMatingRadiusSeatsWithItsMargin() {
        // fillet 0.70-0.80 under a mating radius of 1.1 min: margin 1.1 - 0.8 = 0.3 (ASME/ISO-neutral geometry, decision 0802)
        Advice a = advisor.advise(feature("F2"));
        Recommendation r = a.recommendations().stream().filter(x -> x.ruleId().equals("mating.fillet.max-radius"))
                .findFirst().orElseThrow();
        assertThat(r.numbers().asMap()).containsEntry("seats", true);
        assertThat((Double) r.numbers().asMap().get("seatingMargin")).isCloseTo(0.3, Offset.offset(1e-9));
        // F2's location matters and it has datums A B: the located profile ranks first, its largest admitted radius
        // checked the same way (margin 1.1 minus that radius)
        Recommendation first = a.first().orElseThrow();
        assertThat(first.ruleId()).isEqualTo("mating.located.profile-datums");
        assertThat(first.meetsAll()).isTrue();
        assertThat(first.numbers().seatingMargin()).isCloseTo(1.1 - first.numbers().max(),
                Offset.offset(1e-6));
    }

    @Test
    void aFilletThatWouldFoulAFortyFiveDegreeChamferHasItsMaximumLoweredToTheLeg() {
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ISO, null, BlendKind.FILLET, 1.0,
                BlendFunction.MATING, Loading.STATIC, false, false, List.of(), Process.MACHINED, null,
                new DesignCase.MatingCorner("chamfer", 0.9, null), null);
        Recommendation r = advisor.advise(c).first().orElseThrow();
        Callout.Radius rad = (Callout.Radius) r.callout();
        // a 45° chamfer with legs 0.9 admits fillets up to 0.9 (both legs equal; common practice, decision 0802)
        assertThat(rad.max()).isEqualTo(0.9);
        assertThat(r.numbers().asMap()).containsEntry("seats", true);
    }

    @Test
    void forStackBuildsTheSameAdvisorFromAPackStack() {
        Advisor a = Advisor.forStack(PackStack.builtIn(), NoteLinker.NONE);
        assertThat(a.book().problems()).isEmpty();
        assertThat(a.advise(feature("F2")).first().orElseThrow().text())
                .isEqualTo(advisor.advise(feature("F2")).first().orElseThrow().text());
    }

    @Test
    void theDemoPartIsAdvisedWithoutConflictsAndOnlyItsUnreachableShoulderIsDemoted() {
        for (var f : part.features()) {
            Advice a = advisor.advise(f.designCase());
            assertThat(a.first()).isPresent();
            assertThat(a.first().get().demoted()).as(f.id()).isEqualTo(f.id().equals("F1"));
            assertThat(a.conflicts()).as(f.id()).isEmpty();
        }
    }

    @Test
    void theDemoShoulderIsNotSqueezedIntoABandNoShopCanHold() {
        // F1: Kf target 1.6 at a Ø42/Ø35 shoulder in bending needs r >= 3.479 (Peterson fit with Neuber's q, as above),
        // under a step of h = 3.5: only 3.48 to 3.50 would do, against ±0.2 held near R3.5 by machining
        // (built-in capability table, common practice). The numbers stay; the control is demoted and says what would work.
        Recommendation r = advisor.advise(feature("F1")).first().orElseThrow();
        assertThat(r.demoted()).isTrue();
        assertThat(r.text()).isEqualTo("CR3.48-3.50");
        assertThat(r.cautions()).anySatisfy(c -> assertThat(c).startsWith("Demoted:").contains("band of 0.02", "larger step"));
        // the title block cannot be tightened, and its caution must not send the engineer to limits that cannot be made
        Recommendation titleBlock = advisor.advise(feature("F1")).recommendations().stream()
                .filter(x -> x.ruleId().equals("fallback.title-block")).findFirst().orElseThrow();
        assertThat(titleBlock.cautions()).anySatisfy(c -> assertThat(c).contains("Own limits would not help either")
                .contains("band of 0.02", "0.40"));
    }
}
