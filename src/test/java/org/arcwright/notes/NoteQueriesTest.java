package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.apache.lucene.search.BooleanClause;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.MultiPhraseQuery;
import org.apache.lucene.search.Query;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The queries built from what the user typed, checked without an index. */
class NoteQueriesTest {
    private static TradeAnalyzer analyzer;

    @BeforeAll
    static void chain() {
        analyzer = TradeAnalyzer.forQueries();
    }

    @AfterAll
    static void close() {
        analyzer.close();
    }

    private static String words(int n) {
        // words with multi-word synonyms (corner radius, edge break, controlled radius): a graph
        String[] w = {"fillet", "corner", "radius", "edge", "break", "seal", "groove", "shaft", "cr", "profile"};
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) b.append(w[i % w.length]).append(i % 7 == 0 ? "\n" : " ");
        return b.toString();
    }

    @Test
    void aLongTextIsCutToItsFirstWords() {
        String capped = NoteQueries.capped(words(1000));
        assertThat(capped.split("\\s+")).hasSize(NoteQueries.MAX_QUERY_WORDS);
        assertThat(words(1000)).startsWith(capped);
        assertThat(NoteQueries.capped("  R0.5  seal\tgroove ")).isEqualTo("R0.5  seal\tgroove");
        assertThat(NoteQueries.capped("")).isEmpty();
    }

    @Test
    void aThousandWordQueryBuildsWithoutErrorOnceCapped() {
        Query q = NoteQueries.textQuery(analyzer, NoteQueries.capped(words(1000)));
        assertThat(q).isInstanceOf(BooleanQuery.class);
        assertThat(((BooleanQuery) q).clauses()).hasSize(3);
        assertThat(NoteQueries.phraseQuery(analyzer, NoteQueries.capped(words(1000)))).isInstanceOf(MultiPhraseQuery.class);
    }

    @Test
    void titleTagsAndBodyAreSearchedWithTheirWeights() {
        String q = NoteQueries.textQuery(analyzer, "R0.5 seal groove").toString();
        assertThat(q).contains("title:r0.5").contains("tags:r0.5").contains("body:r0.5")
                .contains(")^" + NoteQueries.TITLE_BOOST).contains(")^" + NoteQueries.TAGS_BOOST);
    }

    @Test
    void onlyFunctionWordsGiveNoQueryAndOneWordNoPhrase() {
        assertThat(NoteQueries.textQuery(analyzer, "the of and")).isNull();
        assertThat(NoteQueries.phraseQuery(analyzer, "groove")).isNull();
        assertThat(NoteQueries.phraseQuery(analyzer, "seal groove")).isNotNull();
    }

    @Test
    void filtersRestrictWithoutScoring() {
        Query main = NoteQueries.textQuery(analyzer, "groove");
        assertThat(NoteQueries.withFilters(main, NoteFilters.none())).isSameAs(main);
        BooleanQuery f = (BooleanQuery) NoteQueries.withFilters(main, NoteFilters.none().and(NoteFacet.FUNCTION, "sealing"));
        assertThat(f.clauses()).extracting(BooleanClause::getOccur)
                .containsExactly(BooleanClause.Occur.MUST, BooleanClause.Occur.FILTER);
    }

    @Test
    void relatedLabelsSkipBlanksAndAreLowerCasedLabels() {
        List<Query> clauses = NoteQueries.labelClauses(Arrays.asList("Stress Relief", " ", null, "cast"));
        assertThat(clauses).hasSize(2);
        assertThat(clauses.get(0).toString()).contains("stress-relief");
        assertThat(NoteQueries.labelClauses(Collections.emptyList())).isEmpty();
    }
}
