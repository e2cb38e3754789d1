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
}
