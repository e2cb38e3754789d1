package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The store's public behaviour on small packs of invented notes, with a real index in a temporary folder. */
class NotesStoreTest {
    @TempDir
    Path tmp;

    private Path base() {
        Path base = TestPacks.pack(tmp.resolve("base"), "Base");
        TestPacks.note(base, "groove.md", TestPacks.text("groove-corners", "Corner radii in O-ring grooves",
                "o-ring, groove", "sealing", "Keep the groove corner at R0.2 max so the O-ring seats; the sealing land stays sharp-free."));
        TestPacks.note(base, "fatigue.md", TestPacks.text("shoulder-fatigue", "Shoulder fillets on rotating shafts",
                "shaft, shoulder, kt", "stress-relief", "The smallest allowed fillet sets the stress concentration; check Kt at the minimum radius."));
        TestPacks.note(base, "break.md", TestPacks.text("edge-breaks", "Edge breaks on handled parts",
                "edge break, deburr", "edge-finish", "Break sharp edges 0.2 to 0.5mm; ISO 13715 gives the symbols."));
        return base;
    }

    private NotesStore open(PackStack stack) {
        return NotesStore.open(stack, tmp.resolve("index"));
    }

    @Test
    void searchFindsTheNoteByTitleWordsAndReportsItsPack() {
        try (NotesStore store = open(TestPacks.stack(base()))) {
            SearchResult r = store.search("o-ring groove", NoteFilters.none(), 5);
            assertThat(r.hits()).isNotEmpty();
            NoteHit top = r.hits().get(0);
            assertThat(top.id()).isEqualTo("groove-corners");
            assertThat(top.pack()).isEqualTo("Base");
            assertThat(top.snippet()).contains("**");
            assertThat(r.facets().get(NoteFacet.FUNCTION)).extracting(FacetCount::value).contains("sealing");
        }
    }

    @Test
    void lucenesNoticesAboutTheJdkAreQuietedOnceAStoreIsOpenedAndItsErrorsStillShow() {
        // on JDK 21 and later Lucene wrote two notices (its file access; the vector API) to standard
        // error at every notes command and window start
        try (NotesStore store = open(TestPacks.stack(base()))) {
            assertThat(store.search("groove", NoteFilters.none(), 1).hits()).isNotEmpty();
        }
        for (String name : List.of("org.apache.lucene.store.MemorySegmentIndexInputProvider",
                "org.apache.lucene.internal.vectorization.VectorizationProvider")) {
            Logger logger = Logger.getLogger(name);
            assertThat(logger.isLoggable(Level.WARNING)).as(name).isFalse();
            assertThat(logger.isLoggable(Level.SEVERE)).as(name).isTrue();
        }
    }

    @Test
    void synonymsFindAFilletNoteWhenTheUserTypesRound() {
        try (NotesStore store = open(TestPacks.stack(base()))) {
            assertThat(store.search("round shaft shoulder", NoteFilters.none(), 3).hits().get(0).id())
                    .isEqualTo("shoulder-fatigue");
        }
    }

    @Test
    void aThousandWordQuerySearchesByItsFirstWordsInsteadOfFailing() {
        // a pasted page: 1,000 words, several with multi-word synonyms; Lucene's graph analysis gave up
        // ("Exceeded maximum recursion level") before the query was capped
        StringBuilder page = new StringBuilder("shoulder fillet kt ");
        String[] w = {"corner", "radius", "edge", "break", "seal", "groove", "shaft", "cr", "profile", "fillet"};
        for (int i = 0; page.toString().split(" ").length < 1000; i++) page.append(w[i % w.length]).append(' ');
        try (NotesStore store = open(TestPacks.stack(base()))) {
            SearchResult r = store.search(page.toString(), NoteFilters.none(), 3);
            assertThat(r.hits()).extracting(NoteHit::id).contains("shoulder-fatigue");
            assertThat(r.query()).isEqualTo(page.toString());
        }
    }

    @Test
    void aLongQueryOfWordsWithSynonymsStillSearches() {
        // six words, several with trade synonyms: the proximity phrase would expand past Lucene's
        // 1,024-clause limit (found by the typing-stall harness); the search runs without that boost
        try (NotesStore store = open(TestPacks.stack(base()))) {
            assertThat(store.search("fatigue fillet shoulder radius stress kt", NoteFilters.none(), 5).hits()).isNotEmpty();
        }
    }

    @Test
    void queryLanguageCharactersAreSearchedNotErrors() {
        try (NotesStore store = open(TestPacks.stack(base()))) {
            for (String q : List.of("R0.5 (", "\"", "*", "AND", "title:", "a OR b) [", "~2^3", "\\", "R0.2 max")) {
                SearchResult r = store.search(q, NoteFilters.none(), 5);
                assertThat(r.query()).isEqualTo(q);
            }
            assertThat(store.search("R0.2 (", NoteFilters.none(), 5).hits()).extracting(NoteHit::id).contains("groove-corners");
        }
    }

    @Test
    void filtersRestrictHitsByFunction() {
        try (NotesStore store = open(TestPacks.stack(base()))) {
            SearchResult r = store.search("radius", NoteFilters.none().and(NoteFacet.FUNCTION, "stress-relief"), 5);
            assertThat(r.hits()).extracting(NoteHit::id).containsExactly("shoulder-fatigue");
            SearchResult all = store.search("", NoteFilters.none().and(NoteFacet.FUNCTION, "sealing", "edge-finish"), 5);
            assertThat(all.hits()).extracting(NoteHit::id).containsExactlyInAnyOrder("groove-corners", "edge-breaks");
        }
    }

    @Test
    void aLaterLayerReplacesANoteWithTheSameId() {
        Path base = base();
        Path team = TestPacks.pack(tmp.resolve("team"), "Team");
        TestPacks.note(team, "ours.md", TestPacks.text("edge-breaks", "Edge breaks: our shop's rule",
                "edge break", "edge-finish", "We break every edge 0.3 +/-0.1 unless drawn."));
        try (NotesStore store = open(TestPacks.stack(base, team))) {
            FiledNote n = store.get("edge-breaks").orElseThrow();
            assertThat(n.note().title()).isEqualTo("Edge breaks: our shop's rule");
            assertThat(n.pack()).isEqualTo("Team");
            assertThat(store.size()).isEqualTo(3);
        }
    }

    @Test
    void relatedFindsNotesByTagsAndText() {
        try (NotesStore store = open(TestPacks.stack(base()))) {
            assertThat(store.related(List.of("sealing"), "", 3)).extracting(NoteHit::id).first().isEqualTo("groove-corners");
            assertThat(store.related(List.of(), "stress concentration at the smallest fillet", 3))
                    .extracting(NoteHit::id).first().isEqualTo("shoulder-fatigue");
            assertThat(store.related(List.of(), "", 3)).isEmpty();
            assertThat(store.relatedTo("groove-corners", 5)).extracting(NoteHit::id).doesNotContain("groove-corners");
        }
    }

    @Test
    void addWritesIntoThePersonalPackAndIndexesAtOnce() throws Exception {
        Path base = base();
        Path personal = NotesPaths.ensurePersonalPack(tmp.resolve("personal"));
        Path draft = tmp.resolve("draft.md");
        Files.writeString(draft, TestPacks.text("knurl-runout", "Runout of knurls into fillets", "knurl", "general",
                "Knurls stop short of a fillet by two pitches."));
        try (NotesStore store = open(TestPacks.stack(base, personal))) {
            FiledNote added = store.add(draft, false);
            assertThat(added.layer()).isEqualTo(PackLayer.PERSONAL);
            assertThat(personal.resolve("notes/knurl-runout.md")).exists();
            assertThat(store.search("knurl", NoteFilters.none(), 3).hits()).extracting(NoteHit::id).containsExactly("knurl-runout");
            assertThatThrownBy(() -> store.add(draft, false)).isInstanceOf(InputProblem.class).hasMessageContaining("already");
        }
        try (NotesStore again = open(TestPacks.stack(base, personal))) {
            assertThat(again.report().kind()).isEqualTo(IndexReport.Kind.OPENED);
            assertThat(again.get("knurl-runout")).isPresent();
        }
    }

    @Test
    void saveEditsANoteAndTheIndexFollows() {
        Path base = base();
        Path personal = NotesPaths.ensurePersonalPack(tmp.resolve("personal"));
        try (NotesStore store = open(TestPacks.stack(base, personal))) {
            Note old = store.get("groove-corners").orElseThrow().note();
            Note edited = new Note(old.id(), "Groove corners for face seals", old.tags(), old.functions(), old.standards(),
                    old.processes(), "lead engineer", old.updated(), old.body() + "\n\nFace seals want a burr-free land.");
            store.save(edited);
            FiledNote now = store.get("groove-corners").orElseThrow();
            assertThat(now.note().title()).isEqualTo("Groove corners for face seals");
            assertThat(now.layer()).isEqualTo(PackLayer.PERSONAL);
            assertThat(store.search("burr-free land", NoteFilters.none(), 1).hits().get(0).id()).isEqualTo("groove-corners");
            assertThat(store.size()).isEqualTo(3);
        }
    }

    @Test
    void reopeningWithChangedNotesUpdatesOnlyThoseNotes() throws Exception {
        Path base = base();
        try (NotesStore store = open(TestPacks.stack(base))) {
            assertThat(store.report().kind()).isEqualTo(IndexReport.Kind.REBUILT);
        }
        TestPacks.note(base, "break.md", TestPacks.text("edge-breaks", "Edge breaks on handled parts, revised",
                "edge break", "edge-finish", "Revised."));
        Files.delete(base.resolve("notes/groove.md"));
        try (NotesStore store = open(TestPacks.stack(base))) {
            assertThat(store.report().kind()).isEqualTo(IndexReport.Kind.UPDATED);
            assertThat(store.report().written()).isEqualTo(1);
            assertThat(store.report().removed()).isEqualTo(1);
            assertThat(store.get("edge-breaks").orElseThrow().note().title()).endsWith("revised");
            assertThat(store.get("groove-corners")).isEmpty();
        }
    }

    @Test
    void aLongSnippetStartsNearItsFirstHighlight() {
        String filler = "word ".repeat(120);
        String snippet = NoteHits.trimSnippet(filler + "the **R0.5** fillet " + filler);
        assertThat(snippet).startsWith("… ").contains("**R0.5**").hasSizeLessThan(330);
        assertThat(NoteHits.trimSnippet("short **one**")).isEqualTo("short **one**");
    }

    @Test
    void anUncheckedOpenSearchesAtOnceAndRefreshPicksUpChangedNotes() throws Exception {
        Path base = base();
        try (NotesStore store = open(TestPacks.stack(base))) {
            assertThat(store.size()).isEqualTo(3);
        }
        TestPacks.note(base, "late.md", TestPacks.text("late-note", "Knurl runout", "knurl", "general", "Added while closed."));
        try (NotesStore store = NotesStore.openUnchecked(TestPacks.stack(base), tmp.resolve("index"))) {
            assertThat(store.report().reason()).contains("not checked");
            assertThat(store.get("late-note")).isEmpty();
            IndexReport r = store.refresh();
            assertThat(r.kind()).isEqualTo(IndexReport.Kind.UPDATED);
            assertThat(store.get("late-note")).isPresent();
            assertThat(store.refresh().kind()).isEqualTo(IndexReport.Kind.OPENED);
        }
    }
}
