package org.arcwright.app.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.arcwright.notes.FiledNote;
import org.arcwright.notes.Note;
import org.arcwright.pack.PackLayer;
import org.junit.jupiter.api.Test;

/** The note form's rules, without Swing; invented notes. */
class NoteDraftsTest {
    private static final Note BUILT_IN = new Note("shoulder-fillets", "Shoulder fillets on shafts", List.of(), List.of(),
            List.of(), List.of(), "Arcwright", LocalDate.of(2026, 1, 5), "Use *generous* radii.");
    private static final FiledNote FILED = new FiledNote(BUILT_IN, "Built-in notes", PackLayer.BUILT_IN, "built-in");

    @Test
    void aNewNoteGetsAnIdNoNoteHas() {
        assertThat(NoteDrafts.freshId(id -> id.equals("my-note-1") ? Optional.of(FILED) : Optional.empty()))
                .isEqualTo("my-note-2");
    }

    @Test
    void okOnANewNoteNeverReplacesABuiltInNote() {
        assertThat(NoteDrafts.refusal(NoteDrafts.Purpose.NEW, BUILT_IN, Optional.of(FILED), null))
                .hasValueSatisfying(r -> assertThat(r).contains("taken").contains("Override"));
        assertThat(NoteDrafts.refusal(NoteDrafts.Purpose.NEW, BUILT_IN, Optional.empty(), null)).isEmpty();
    }

    @Test
    void anOverrideKeepsTheIdAndDropsTheAuthor() {
        assertThat(NoteDrafts.purposeFor(FILED)).isEqualTo(NoteDrafts.Purpose.OVERRIDE);
        assertThat(NoteDrafts.overrideOf(BUILT_IN).author()).isEmpty();
        assertThat(NoteDrafts.refusal(NoteDrafts.Purpose.OVERRIDE, BUILT_IN, Optional.of(FILED), "shoulder-fillets")).isEmpty();
    }

    @Test
    void markdownIsRenderedAndNothingRemoteOrRawGetsThrough() {
        assertThat(NoteHtml.body("See *Peterson's* table.")).contains("<em>Peterson").doesNotContain("*");
        String unsafe = NoteHtml.body("<script>x()</script>\n\n![logo](http://example.invalid/a.png) [go](http://example.invalid/)");
        assertThat(unsafe).doesNotContain("<script").doesNotContain("<img").doesNotContain("href").contains("logo").contains("go");
        assertThat(NoteHtml.page(FILED)).contains("<h2>Shoulder fillets on shafts</h2>");
    }
}
