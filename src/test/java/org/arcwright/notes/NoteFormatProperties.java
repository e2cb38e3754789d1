package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** The note file format round-trips: a note formatted and parsed again is the same note (jqwik, apart from the JUnit tests so each engine reports its own). */
class NoteFormatProperties {
    @Property(tries = 200, seed = "20261130")
    void formatThenParseGivesTheSameNote(@ForAll("notes") Note note) {
        assertThat(NoteFormat.parse(NoteFormat.format(note), "p.md")).isEqualTo(note);
    }

    @Provide
    Arbitrary<Note> notes() {
        Arbitrary<String> id = Arbitraries.strings().withChars("abcdefghijklmnopqrstuvwxyz0123456789-").ofMinLength(1).ofMaxLength(30)
                .filter(s -> Character.isLetterOrDigit(s.charAt(0)));
        Arbitrary<String> words = Arbitraries.strings().withChars("abcdefgh RCR0.5±-").ofMinLength(1).ofMaxLength(20)
                .filter(s -> !s.isBlank());
        Arbitrary<String> label = Arbitraries.strings().withChars("abcdefgh-").ofMinLength(1).ofMaxLength(10)
                .filter(s -> !s.isBlank());
        Arbitrary<List<String>> labels = label.list().ofMaxSize(4).map(l -> l.stream().map(Note::label).distinct().toList());
        Arbitrary<String> body = Arbitraries.strings().withChars("abc xyz\n#*R0.5").ofMaxLength(200).map(String::strip);
        Arbitrary<LocalDate> date = Arbitraries.integers().between(0, 20000).map(d -> LocalDate.of(2000, 1, 1).plusDays(d));
        return Combinators.combine(id, words, labels, labels, body, date)
                .as((i, t, tags, fns, b, d) -> new Note(i, t, tags, fns, List.of("ISO 1101"), List.of("machined"), "lead", d,
                        b.startsWith("---") ? "x" + b : b));
    }
}
