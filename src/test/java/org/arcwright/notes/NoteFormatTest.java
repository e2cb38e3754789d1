package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import org.arcwright.io.InputProblem;
import org.junit.jupiter.api.Test;

/** The note file format: what it accepts and how it reports what it does not ({@link NoteFormatProperties}: that it round-trips). */
class NoteFormatTest {
    private static final String GOOD = """
            ---
            id: groove-corners
            title: Corner radii in grooves
            tags: o-ring, Groove Corner
            functions: sealing
            standard: ISO 3601-2, common practice
            process: machined
            author: seals lead
            updated: 2026-11-30
            ---
            Body **text**.
            """;

    @Test
    void parsesAllHeaderKeysAndNormalisesLabels() {
        Note n = NoteFormat.parse(GOOD, "g.md");
        assertThat(n.id()).isEqualTo("groove-corners");
        assertThat(n.tags()).containsExactly("o-ring", "groove-corner");
        assertThat(n.standards()).containsExactly("ISO 3601-2", "common practice");
        assertThat(n.updated()).isEqualTo(LocalDate.of(2026, 11, 30));
        assertThat(n.body()).isEqualTo("Body **text**.");
    }

    @Test
    void aMissingHeaderIsReportedAtLineOne() {
        assertThatThrownBy(() -> NoteFormat.parse("# Just markdown\n", "x.md"))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.source()).isEqualTo("x.md");
                    assertThat(p.line()).isEqualTo(1);
                });
    }

    @Test
    void anUnclosedHeaderAsInATruncatedFileIsReported() {
        String truncated = GOOD.substring(0, GOOD.indexOf("process:"));
        assertThatThrownBy(() -> NoteFormat.parse(truncated, "t.md"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("not closed");
    }

    @Test
    void anUnknownKeyIsNamedWithItsLine() {
        String text = GOOD.replace("author:", "writer:");
        assertThatThrownBy(() -> NoteFormat.parse(text, "u.md"))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.line()).isEqualTo(8);
                    assertThat(p.field()).isEqualTo("writer");
                    assertThat(p.getMessage()).startsWith("u.md:8:1: writer: unknown header key");
                });
    }

    @Test
    void aBadIdNamesTheFieldAndColumn() {
        String text = GOOD.replace("id: groove-corners", "id: Groove Corners");
        assertThatThrownBy(() -> NoteFormat.parse(text, "b.md"))
                .isInstanceOfSatisfying(InputProblem.class, p -> {
                    assertThat(p.field()).isEqualTo("id");
                    assertThat(p.line()).isEqualTo(2);
                    assertThat(p.column()).isEqualTo(5);
                });
    }

    @Test
    void aBadDateAndARepeatedKeyAreErrors() {
        assertThatThrownBy(() -> NoteFormat.parse(GOOD.replace("2026-11-30", "30/11/2026"), "d.md"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("updated");
        assertThatThrownBy(() -> NoteFormat.parse(GOOD.replace("process: machined", "process: machined\ntags: x"), "r.md"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("repeated");
    }

    @Test
    void aMissingTitleIsAnError() {
        assertThatThrownBy(() -> NoteFormat.parse(GOOD.replace("title: Corner radii in grooves\n", ""), "m.md"))
                .isInstanceOfSatisfying(InputProblem.class, p -> assertThat(p.field()).isEqualTo("title"));
    }

    @Test
    void plainTextDropsMarkdownMarks() {
        assertThat(NoteFormat.plainText("## Head\n- **bold** and *it* and `code` [link](http://x)\n"))
                .isEqualTo("Head\nbold and it and code link\n\n");
    }
}
