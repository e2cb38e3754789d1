package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executor;
import org.arcwright.notes.NoteFacet;
import org.arcwright.notes.SearchResult;
import org.junit.jupiter.api.Test;

class NoteSearchTest {
    private final List<NoteSearch.Query> asked = new ArrayList<>();
    private final List<SearchResult> delivered = new ArrayList<>();
    private final List<Runnable> queued = new ArrayList<>();
    private final Executor later = queued::add;

    private NoteSearch search() {
        return new NoteSearch(q -> {
            asked.add(q);
            return new SearchResult(q.text(), 0, List.of(), Map.of());
        }, later, delivered::add);
    }

    @Test
    void onlyTheLatestQueryIsSearchedWhenTypingOutrunsTheSearches() {
        NoteSearch s = search();
        s.setQuery("f");
        s.setQuery("fa");
        s.setQuery("fatigue");
        queued.forEach(Runnable::run);
        assertThat(asked).extracting(NoteSearch.Query::text).containsExactly("fatigue");
        assertThat(delivered).extracting(SearchResult::query).containsExactly("fatigue");
    }

    @Test
    void tickedFacetValuesBecomeFilters() {
        NoteSearch s = search();
        s.tick(NoteFacet.PROCESS, "cast", true);
        s.tick(NoteFacet.FUNCTION, "sealing", true);
        s.tick(NoteFacet.FUNCTION, "sealing", false);
        assertThat(s.isTicked(NoteFacet.PROCESS, "cast")).isTrue();
        assertThat(s.filters().values()).containsOnlyKeys(NoteFacet.PROCESS);
    }

    @Test
    void snippetMarksBecomeBoldAndOtherMarkupIsEscaped() {
        assertThat(NoteSearch.snippetHtml("a **fatigue** <fillet> & **r"))
                .isEqualTo("a <b>fatigue</b> &lt;fillet&gt; &amp; <b>r</b>");
    }
}
