package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading a part's radii from CSV. */
class CaseTableTest {
    @TempDir
    Path dir;

    private Path csv(String text) throws Exception {
        Path f = dir.resolve("part.csv");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void readsEveryColumnIncludingNestedStressAndMating() throws Exception {
        List<CaseTable.Row> rows = CaseTable.read(csv(String.join(",", CaseTable.COLUMNS) + "\n"
                + "F1,mm,asme,fillet,2,stress-relief,fatigue,yes,no,A B,machined,R2 ±0.2,stepped-shaft,bending,42,35,900,1.6,radius,1.1,,120,1.5\n"));
        DesignCase c = rows.get(0).designCase();
        assertThat(rows.get(0).line()).isEqualTo(2);
        assertThat(c.formMatters()).isTrue();
        assertThat(c.datums()).containsExactly("A", "B");
        assertThat(c.stress().bigD()).isEqualTo(42);
        assertThat(c.stress().ultimateStrength().megapascals()).isEqualTo(900);
        assertThat(c.stress().targetKt()).isEqualTo(1.6);
        assertThat(c.stress().targetKf()).isEqualTo(1.5);
        assertThat(c.mating().size()).isEqualTo(1.1);
        assertThat(c.tolerance()).isEqualTo("R2 ±0.2");
        assertThat(c.cornerAngle()).isEqualTo(120.0);
    }

    @Test
    void aBadValueNamesLineAndColumn() throws Exception {
        Path f = csv("feature,units,standard,kind,nominalRadius,function,process\nF1,mm,asme,fillet,2,stress,machined\n");
        assertThatThrownBy(() -> CaseTable.read(f)).isInstanceOf(InputProblem.class)
                .satisfies(e -> {
                    InputProblem p = (InputProblem) e;
                    assertThat(p.line()).isEqualTo(2);
                    assertThat(p.field()).isEqualTo("function");
                    assertThat(p.problem()).contains("unknown value 'stress'");
                });
    }

    @Test
    void aMissingRequiredColumnIsNamed() throws Exception {
        Path f = csv("feature,units,standard,kind,function,process\nF1,mm,asme,fillet,cosmetic,cast\n");
        assertThatThrownBy(() -> CaseTable.read(f)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("missing column 'nominalRadius'");
    }

    @Test
    void notANumberIsRejected() throws Exception {
        Path f = csv("feature,units,standard,kind,nominalRadius,function,process\nF1,mm,asme,fillet,NaN,cosmetic,cast\n");
        assertThatThrownBy(() -> CaseTable.read(f)).isInstanceOf(InputProblem.class)
                .hasMessageContaining("nominalRadius").hasMessageContaining("not a number: 'NaN'");
    }

    @Test
    void sourceCodeNumberFormsAreTyposNotSizes() throws Exception {
        // Double.parseDouble takes 1.5f and 0x1p1 (the Java Language Specification's literals); a drawing's numbers do not.
        for (String typo : List.of("1.5f", "0x1p1", "2d", "Infinity")) {
            Path f = csv("feature,units,standard,kind,nominalRadius,function,process\nF1,mm,asme,fillet," + typo + ",cosmetic,cast\n");
            assertThatThrownBy(() -> CaseTable.read(f)).as(typo).isInstanceOf(InputProblem.class)
                    .hasMessageContaining("nominalRadius").hasMessageContaining("not a number");
        }
    }

    @Test
    void aDuplicatedColumnIsRefusedRatherThanTheLastValueKept() throws Exception {
        Path f = csv("feature,units,standard,kind,nominalRadius,function,process,units\nF1,mm,asme,fillet,2,cosmetic,cast,in\n");
        assertThatThrownBy(() -> CaseTable.read(f)).isInstanceOf(InputProblem.class)
                .satisfies(e -> {
                    InputProblem p = (InputProblem) e;
                    assertThat(p.line()).isEqualTo(1);
                    assertThat(p.field()).isEqualTo("units");
                    assertThat(p.problem()).contains("appears twice");
                });
    }
}
