package org.arcwright.tolerance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The built-in general-tolerance tables against ISO 2768-1:1989 "General tolerances — Part 1:
 * Tolerances for linear and angular dimensions without individual tolerance indications", Tables 1
 * to 3. Each boundary is checked on both sides: a range "over 3 up to 6" holds 6 but not 3.
 */
class Iso2768TablesTest {
    private static GeneralToleranceTables tables;

    @BeforeAll
    static void load() {
        tables = GeneralToleranceTables.load(PackStack.builtIn().files("tables", ".json").stream().map(f -> new GeneralToleranceTables.TableFile(f.path(), f.pack().root())).toList());
    }

    /** ISO 2768-1:1989 Table 2 (broken edges: external radii and chamfer heights), every cell. */
    @ParameterizedTest(name = "class {0}, r = {1} mm -> ±{2}")
    @CsvSource({
            // class, size, expected ±, range
            "f, 0.5, 0.2, 0.5 up to 3",
            "f, 3,   0.2, 0.5 up to 3",
            "f, 3.001, 0.5, over 3 up to 6",
            "f, 6,   0.5, over 3 up to 6",
            "f, 6.001, 1, over 6",
            "m, 0.5, 0.2, 0.5 up to 3",
            "m, 3,   0.2, 0.5 up to 3",
            "m, 3.001, 0.5, over 3 up to 6",
            "m, 6,   0.5, over 3 up to 6",
            "m, 6.001, 1, over 6",
            "c, 0.5, 0.4, 0.5 up to 3",
            "c, 3,   0.4, 0.5 up to 3",
            "c, 3.001, 1, over 3 up to 6",
            "c, 6,   1, over 3 up to 6",
            "c, 6.001, 2, over 6",
            "v, 0.5, 0.4, 0.5 up to 3",
            "v, 3,   0.4, 0.5 up to 3",
            "v, 3.001, 1, over 3 up to 6",
            "v, 6,   1, over 3 up to 6",
            "v, 6.001, 2, over 6",
            "m, 250, 1, over 6",
    })
    void radiusAndChamferTableMatchesIso2768Table2(String cls, double size, double expected, String range) {
        GeneralTolerance t = tables.iso(ToleranceQuantity.RADIUS_CHAMFER).lookup(cls, size);
        assertThat(t.plusMinus()).isEqualTo(expected);
        assertThat(t.range()).isEqualTo(range);
    }

    /** ISO 2768-1:1989 Table 1 (linear dimensions), one row per class across every range. */
    @ParameterizedTest(name = "class {0}")
    @CsvSource({
            "f, 0.05, 0.05, 0.1, 0.15, 0.2, 0.3, 0.5, -",
            "m, 0.1,  0.1,  0.2, 0.3,  0.5, 0.8, 1.2, 2",
            "c, 0.2,  0.3,  0.5, 0.8,  1.2, 2,   3,   4",
            "v, -,    0.5,  1,   1.5,  2.5, 4,   6,   8",
    })
    void linearTableMatchesIso2768Table1(String cls, String r1, String r2, String r3, String r4, String r5, String r6,
                                         String r7, String r8) {
        // Range upper bounds: 3, 6, 30, 120, 400, 1000, 2000, 4000; lower bounds exclusive after the first.
        double[] upper = {3, 6, 30, 120, 400, 1000, 2000, 4000};
        double[] lower = {0.5, 3, 6, 30, 120, 400, 1000, 2000};
        String[] expected = {r1, r2, r3, r4, r5, r6, r7, r8};
        GeneralToleranceTable table = tables.iso(ToleranceQuantity.LINEAR);
        for (int i = 0; i < upper.length; i++) {
            double[] probes = i == 0 ? new double[] {lower[i], upper[i]} : new double[] {Math.nextUp(lower[i]), upper[i]};
            for (double size : probes) {
                if (expected[i].equals("-")) {
                    assertThatThrownBy(() -> table.lookup(cls, size)).isInstanceOf(InputProblem.class)
                            .hasMessageContaining("no general tolerance for class " + cls);
                } else {
                    assertThat(table.lookup(cls, size).plusMinus()).as("class %s size %s", cls, size)
                            .isEqualTo(Double.parseDouble(expected[i]));
                }
            }
        }
    }

    /** ISO 2768-1:1989 Table 3 (angular dimensions by length of the shorter side), one row per class. */
    @ParameterizedTest(name = "class {0}")
    @CsvSource({
            // up to 10 | over 10 up to 50 | over 50 up to 120 | over 120 up to 400 | over 400, in minutes of arc
            "f, 60, 30, 20, 10, 5",
            "m, 60, 30, 20, 10, 5",
            "c, 90, 60, 30, 15, 10",
            "v, 180, 120, 60, 30, 20",
    })
    void angularTableMatchesIso2768Table3(String cls, int m1, int m2, int m3, int m4, int m5) {
        GeneralToleranceTable table = tables.iso(ToleranceQuantity.ANGULAR);
        double[][] probes = {{1, 10}, {Math.nextUp(10.0), 50}, {Math.nextUp(50.0), 120}, {Math.nextUp(120.0), 400},
                {Math.nextUp(400.0), 5000}};
        int[] minutes = {m1, m2, m3, m4, m5};
        for (int i = 0; i < probes.length; i++) {
            for (double side : probes[i]) {
                assertThat(table.lookup(cls, side).plusMinus() * 60).as("class %s side %s", cls, side)
                        .isCloseTo(minutes[i], within(1e-9));
            }
        }
    }

    @Test
    void angularToleranceIsWrittenInDegreesAndMinutes() {
        // ISO 2768-1:1989 Table 3: class m, shorter side over 10 up to 50 mm: ±0°30'.
        assertThat(tables.iso(ToleranceQuantity.ANGULAR).lookup("m", 35).formatted()).isEqualTo("±0°30'");
        assertThat(tables.iso(ToleranceQuantity.ANGULAR).lookup("v", 5).formatted()).isEqualTo("±3°");
    }

    @Test
    void sizeBelowTheSmallestRangeMustBeToleranced() {
        // ISO 2768-1:1989 Tables 1 and 2 start at 0.5 mm; smaller sizes carry their own tolerance.
        assertThatThrownBy(() -> tables.iso(ToleranceQuantity.RADIUS_CHAMFER).lookup("m", 0.3))
                .isInstanceOf(InputProblem.class).hasMessageContaining("outside every range");
    }

    @Test
    void sizeAboveTheLargestLinearRangeIsAnError() {
        assertThatThrownBy(() -> tables.iso(ToleranceQuantity.LINEAR).lookup("m", 4000.5))
                .isInstanceOf(InputProblem.class).hasMessageContaining("outside every range");
    }

    @Test
    void unknownClassListsTheKnownOnes() {
        assertThatThrownBy(() -> tables.iso(ToleranceQuantity.LINEAR).lookup("k", 10))
                .isInstanceOf(InputProblem.class).hasMessageContaining("known classes: f, m, c, v");
    }
}
