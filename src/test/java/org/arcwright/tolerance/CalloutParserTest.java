package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import org.arcwright.io.InputProblem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CalloutParserTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            // text | kind | units | form | min | max
            "R0.55 ±0.05     | R  | mm | equal-bilateral | 0.50 | 0.60",
            "R0.55 +/-0.05   | R  | mm | equal-bilateral | 0.50 | 0.60",
            "R0.55 +-0.05    | R  | mm | equal-bilateral | 0.50 | 0.60",
            "R3 +0.2/-0.1    | R  | mm | deviations      | 2.9  | 3.2",
            "R3 +0.2 -0.1    | R  | mm | deviations      | 2.9  | 3.2",
            "R3 +0.2/0       | R  | mm | deviations      | 3    | 3.2",
            "R3 0/-0.1       | R  | mm | deviations      | 2.9  | 3",
            "CR 1.5-2.0      | CR | mm | limits          | 1.5  | 2.0",
            "cr1.5 - 2.0 mm  | CR | mm | limits          | 1.5  | 2.0",
            "R .060 MAX      | R  | in | single-limit    |      | .060",
            "CR .25 MIN      | CR | in | single-limit    | .25  |",
            "R 2.5           | R  | mm | untoleranced    |      |",
            "R0,55 ±0,05     | R  | mm | equal-bilateral | 0.50 | 0.60",
            "R.250 ±.005 in  | R  | in | equal-bilateral | .245 | .255",
    })
    void readsTheTradesTextForms(String text, String kind, String units, String form, String min, String max) {
        Units defaultUnits = text.contains(".060") || text.contains(".25 MIN") ? Units.INCH : Units.MM;
        RadiusCallout c = CalloutParser.parse(text, defaultUnits);
        assertThat(c.kind().symbol()).isEqualTo(kind);
        assertThat(c.units().symbol()).isEqualTo(units);
        assertThat(c.form().formName()).isEqualTo(form);
        if (min == null) assertThat(c.min()).isEmpty();
        else assertThat(c.form().lower().orElseThrow()).isEqualByComparingTo(new BigDecimal(min));
        if (max == null) assertThat(c.max()).isEmpty();
        else assertThat(c.form().upper().orElseThrow()).isEqualByComparingTo(new BigDecimal(max));
    }

    @Test
    void plusMinusRadiusGivesExactLimits() {
        // common practice: R0.55 ±0.05 allows radii from 0.50 to 0.60, nothing about form or location.
        RadiusCallout c = CalloutParser.parse("R0.55 ±0.05", Units.MM);
        assertThat(c.form().lower().orElseThrow()).isEqualByComparingTo("0.50");
        assertThat(c.form().upper().orElseThrow()).isEqualByComparingTo("0.60");
        assertThat(c.min().getAsDouble()).isEqualTo(0.5);
        assertThat(c.max().getAsDouble()).isEqualTo(0.6);
        assertThat(c.band().getAsDouble()).isEqualTo(0.1);
        assertThat(c.mean().getAsDouble()).isEqualTo(0.55);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "X0.5 ±0.1     | 1 | starts with R or CR",
            "R ±0.1        | 3 | expected a number for the radius",
            "R0.5 ±        | 7 | expected a number for the tolerance",
            "R0.5 ±0.1 abc | 11 | unexpected 'abc'",
            "R3 +0.2       | 8 | expected the second deviation",
            "R NaN         | 3 | NaN",
    })
    void badTextPointsAtTheColumnWhereReadingStopped(String text, int column, String message) {
        assertThatThrownBy(() -> CalloutParser.parse(text, Units.MM))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.column()).isEqualTo(column))
                .hasMessageContaining(message)
                .hasMessageContaining("column " + column);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "R0 ±0.05        | a radius must be greater than zero",
            "R0.05 ±0.1      | the smallest allowed radius must be greater than zero",
            "CR 2.0-1.5      | min 2.0 is greater than max 1.5",
            "CR 1.5-1.5      | no tolerance band",
            "R0 MAX          | a radius must be greater than zero",
            "R0.5 ±0         | must be greater than zero",
    })
    void impossibleRadiiAreRejected(String text, String message) {
        assertThatThrownBy(() -> CalloutParser.parse(text, Units.MM))
                .isInstanceOf(InputProblem.class).hasMessageContaining(message);
    }

    @Test
    void emptyTextIsAnError() {
        assertThatThrownBy(() -> CalloutParser.parse("  ", Units.MM)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("empty radius callout");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "R3 +0.2/31      | 9  | the second deviation 31 has no sign",
            "R3 +0.2/.1      | 9  | the second deviation 0.1 has no sign",
            "R1.5f           | 5  | unexpected 'f'",
            "R0x1p1          | 3  | unexpected 'x1p1'",
    })
    void typosAreRefusedRatherThanReadAsTolerances(String text, int column, String message) {
        // A deviation other than zero is written with its sign (ISO 129-1 and ASME Y14.5 examples, common practice).
        assertThatThrownBy(() -> CalloutParser.parse(text, Units.MM)).isInstanceOf(InputProblem.class)
                .satisfies(e -> assertThat(((InputProblem) e).column()).isEqualTo(column))
                .hasMessageContaining(message);
    }

    @Test
    void anUnsignedZeroDeviationStaysValid() {
        RadiusCallout c = CalloutParser.parse("R3 +0.2/0", Units.MM);
        assertThat(c.min()).hasValue(3.0);
        assertThat(c.max()).hasValue(3.2);
    }

    @Test
    void sameSignDeviationsAreRead() {
        RadiusCallout c = CalloutParser.parse("R3 +0.3/+0.1", Units.MM);
        assertThat(c.min()).hasValue(3.1);
        assertThat(c.max()).hasValue(3.3);
        RadiusCallout d = CalloutParser.parse("R3 -0.1/-0.3", Units.MM);
        assertThat(d.min()).hasValue(2.7);
        assertThat(d.max()).hasValue(2.9);
    }

    @Test
    void aDeviationLargerThanTheRadiusIsFlagged() {
        LimitsReport r = LimitsReport.of(CalloutParser.parse("R3 +31/-0.2", Units.MM), 90);
        assertThat(r.remarks()).anySatisfy(m -> assertThat(m).contains("larger than the radius 3 itself"));
    }
}
