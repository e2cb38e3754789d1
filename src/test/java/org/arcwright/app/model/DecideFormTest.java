package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.model.DesignCase;
import org.arcwright.tolerance.LimitsReport;
import org.junit.jupiter.api.Test;

class DecideFormTest {
    private final DecideForm form = new DecideForm();

    @Test
    void anEmptyFormAsksForTheNominalRadius() {
        assertThat(form.problem(Question.NOMINAL)).contains("Enter the nominal radius.");
        assertThat(form.toCase()).isEmpty();
    }

    @Test
    void aLoadedCaseComesBackUnchanged() {
        DesignCase c = Fixtures.fillet(2, "R2 ±0.2");
        form.load(c);
        assertThat(form.isValid()).isTrue();
        assertThat(form.toCase()).contains(c);
    }

    @Test
    void theCornerAngleReachesTheCaseAndComesBackFromIt() {
        form.load(Fixtures.fillet(2, "R2 ±0.2"));
        assertThat(form.toCase().orElseThrow().cornerAngle()).isNull();
        form.setText(Question.ANGLE, "120");
        DesignCase c = form.toCase().orElseThrow();
        assertThat(c.cornerAngleDegrees()).isEqualTo(120);
        DecideForm again = new DecideForm();
        again.load(c);
        assertThat(again.text(Question.ANGLE)).isEqualTo("120");
    }

    @Test
    void aBadToleranceIsReportedBesideItsField() {
        form.load(Fixtures.fillet(2, null));
        form.setText(Question.TOLERANCE, "R2 ±");
        assertThat(form.problem(Question.TOLERANCE)).hasValueSatisfying(p -> assertThat(p).contains("tolerance"));
        assertThat(form.toCase()).isEmpty();
        form.setText(Question.TOLERANCE, "R2 ±0.2");
        assertThat(form.isValid()).isTrue();
    }

    @Test
    void aNominalOutsideTheLimitsIsRejected() {
        form.load(Fixtures.fillet(3, null));
        form.setText(Question.TOLERANCE, "R2 ±0.2");
        assertThat(form.problem(Question.TOLERANCE)).hasValueSatisfying(p -> assertThat(p).contains("drawn about R2, not about the nominal radius 3"));
        form.setText(Question.TOLERANCE, "R1.8-2.2");
        assertThat(form.problem(Question.TOLERANCE)).hasValueSatisfying(p -> assertThat(p).contains("outside these limits"));
    }

    /**
     * Deviations of the same sign draw the nominal outside its limits (R3 +0.3/+0.1 allows R3.1 to R3.3;
     * ASME Y14.5-2018 and ISO 129-1 allow a nominal with two deviations of one sign, common practice).
     * Before the fix the form refused it as "the nominal radius 3 lies outside these limits".
     */
    @Test
    void aSameSignToleranceAboutTheNominalIsAccepted() {
        form.load(Fixtures.fillet(3, null));
        form.setText(Question.TOLERANCE, "R3 +0.3/+0.1");
        assertThat(form.problem(Question.TOLERANCE)).isEmpty();
        LimitsReport r = form.limits().orElseThrow();
        assertThat(r.min()).isEqualTo(3.1, within(1e-12));
        assertThat(r.max()).isEqualTo(3.3, within(1e-12));
    }

    @Test
    void liveLimitsShowTheCrescentOfAPlusMinusTolerance() {
        form.load(Fixtures.fillet(0.55, "R0.55 ±0.05"));
        LimitsReport r = form.limits().orElseThrow();
        assertThat(r.min()).isEqualTo(0.5, within(1e-12));
        assertThat(r.max()).isEqualTo(0.6, within(1e-12));
        // crescent on the bisector of a 90° corner: 0.1 × (√2 − 1) = 0.0414 (geometry of tangent arcs, common practice)
        assertThat(r.crescent().width()).isEqualTo(0.1 * (Math.sqrt(2) - 1), within(1e-12));
    }

    @Test
    void stressInputsAreRequiredOnlyWhenTheCheckIsTicked() {
        form.load(Fixtures.fillet(2, null));
        form.setStressEnabled(true);
        assertThat(form.problem(Question.BIG_D)).isPresent();
        form.setText(Question.BIG_D, "42");
        form.setText(Question.SMALL_D, "45");
        assertThat(form.problem(Question.SMALL_D)).contains("d must be smaller than D.");
        form.setText(Question.SMALL_D, "35");
        form.setText(Question.TARGET_KT, "0.5");
        assertThat(form.problem(Question.TARGET_KT)).isPresent();
        form.setText(Question.TARGET_KT, "1,6");
        assertThat(form.toCase().orElseThrow().stress().targetKt()).isEqualTo(1.6);
        form.setStressEnabled(false);
        assertThat(form.toCase().orElseThrow().stress()).isNull();
    }

    @Test
    void datumsMustBeCapitalLetters() {
        form.load(Fixtures.fillet(2, null));
        form.setText(Question.DATUMS, "A, b");
        assertThat(form.problem(Question.DATUMS)).isPresent();
        form.setText(Question.DATUMS, "A, B");
        assertThat(form.toCase().orElseThrow().datums()).containsExactly("A", "B");
    }

    @Test
    void everyQuestionHasHelpText() {
        for (Question q : Question.values()) assertThat(q.help()).as(q.name()).hasSizeGreaterThan(20);
    }
}
