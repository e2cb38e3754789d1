package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.math.RoundingMode;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** Formatting never changes what a callout allows: parse(format(c)) has the same form and limits as c. */
class CalloutRoundTripProperties {

    @Property(tries = 500, seed = "20261201")
    void formattingKeepsValueAndForm(@ForAll("callouts") RadiusCallout c) {
        for (DrawingStyle style : DrawingStyle.values()) {
            String text = style.format(c);
            RadiusCallout back = CalloutParser.parse(text, c.units());
            assertThat(back.form().formName()).as(text).isEqualTo(c.form().formName());
            assertThat(back.units()).isEqualTo(c.units());
            if (style == DrawingStyle.ASME) assertThat(back.kind()).isEqualTo(c.kind());
            assertSame(back.form().lower().orElse(null), c.form().lower().orElse(null), text);
            assertSame(back.form().upper().orElse(null), c.form().upper().orElse(null), text);
            assertSame(back.form().nominal().orElse(null), c.form().nominal().orElse(null), text);
        }
    }

    private static void assertSame(BigDecimal a, BigDecimal b, String text) {
        if (a == null || b == null) {
            assertThat(a).as(text).isEqualTo(b);
        } else {
            assertThat(a).as(text).isEqualByComparingTo(b);
        }
    }

    @Provide
    Arbitrary<RadiusCallout> callouts() {
        Arbitrary<RadiusKind> kind = Arbitraries.of(RadiusKind.class);
        Arbitrary<Units> units = Arbitraries.of(Units.class);
        Arbitrary<Integer> places = Arbitraries.integers().between(0, 3);
        Arbitrary<Integer> nominalUnits = Arbitraries.integers().between(100, 50000);
        Arbitrary<Integer> tolUnits = Arbitraries.integers().between(1, 99);
        Arbitrary<Integer> formKind = Arbitraries.integers().between(0, 5);
        return Combinators.combine(kind, units, places, nominalUnits, tolUnits, formKind)
                .as((k, u, p, n, t, f) -> build(k, u, p, n, t, f))
                .filter(c -> c != null);
    }

    private static RadiusCallout build(RadiusKind k, Units u, int p, int n, int t, int f) {
        BigDecimal nominal = BigDecimal.valueOf(n, 3).setScale(Math.max(p, 0), RoundingMode.HALF_UP);
        BigDecimal tol = BigDecimal.valueOf(t, 3);
        if (nominal.signum() <= 0 || nominal.compareTo(tol.add(BigDecimal.valueOf(1, 3))) <= 0) return null;
        ToleranceForm form = switch (f) {
            case 0 -> new ToleranceForm.EqualBilateral(nominal, tol);
            case 1 -> new ToleranceForm.Deviations(nominal, tol, tol.negate().divide(BigDecimal.valueOf(2)));
            case 2 -> new ToleranceForm.Deviations(nominal, tol, BigDecimal.ZERO);
            case 3 -> new ToleranceForm.Limits(nominal, nominal.add(tol));
            case 4 -> new ToleranceForm.SingleLimit(nominal, t % 2 == 0 ? LimitSide.MAX : LimitSide.MIN);
            default -> new ToleranceForm.Untoleranced(nominal);
        };
        return new RadiusCallout(k, u, form);
    }
}
