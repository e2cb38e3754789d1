package org.arcwright.inspect;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.arcwright.io.InputProblem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A points file's header and numbers: a typo is an error, never a header or a value. */
class PointsCsvNumbersTest {
    @TempDir
    Path dir;

    private Path csv(String text) throws Exception {
        Path f = dir.resolve("points.csv");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void aMistypedFirstPointIsAnErrorNotAHeader() throws Exception {
        // "2.O3" (letter O for zero) was once taken as a header and the point dropped without a word.
        Path f = csv("2.O3,0.0004\n2.04,0.0005\n");
        assertThatThrownBy(() -> PointsCsv.read(f)).isInstanceOf(InputProblem.class)
                .satisfies(e -> {
                    InputProblem p = (InputProblem) e;
                    assertThat(p.line()).isEqualTo(1);
                    assertThat(p.field()).isEqualTo("x");
                });
    }

    @Test
    void aLineOfWordsIsStillAHeader() throws Exception {
        PointSet s = PointsCsv.read(csv("x (mm),y (mm)\n2.03,0.0004\n"));
        assertThat(s.size()).isEqualTo(1);
    }

    @Test
    void javaLiteralFormsAreNotNumbers() throws Exception {
        for (String typo : new String[] {"1.5f", "0x1p1", "3d"}) {
            Path f = csv("x,y\n1.0," + typo + "\n");
            assertThatThrownBy(() -> PointsCsv.read(f)).as(typo).isInstanceOf(InputProblem.class)
                    .hasMessageContaining("not a number");
        }
    }
}
