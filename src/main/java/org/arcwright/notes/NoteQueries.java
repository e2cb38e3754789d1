package org.arcwright.notes;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.synonym.SynonymGraphFilter;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionLengthAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.ReaderUtil;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.BoostQuery;
import org.apache.lucene.search.ConstantScoreQuery;
import org.apache.lucene.search.DisjunctionMaxQuery;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.MultiPhraseQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.ScoreMode;
import org.apache.lucene.search.Scorer;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.search.TwoPhaseIterator;
import org.apache.lucene.search.Weight;
import org.apache.lucene.util.QueryBuilder;

/**
 * The Lucene queries of a search, built from what the user typed: functions of the text, the query
 * analyser and the filters only, so they are tested without an index. The text is analysed, never
 * parsed as a query language.
 */
final class NoteQueries {
    static final float TITLE_BOOST = 3.0f;
    static final float TAGS_BOOST = 2.5f;
    static final float BODY_BOOST = 1.0f;
    static final float PHRASE_BOOST = 1.5f;
    /** How many of the best hits proximity rescoring looks at. */
    static final int RESCORE_WINDOW = 50;
    /** Score a label earns in a related-notes query when it is one of a note's tags, functions or processes (the best one counts). */
    static final float TAG_MATCH = 4f;
    static final float FUNCTION_MATCH = 3f;
    static final float PROCESS_MATCH = 2f;
    /**
     * Words of a query that count; the rest of a longer text is left out. A search is a few words; a
     * pasted paragraph is still found by its first 64, and the synonym graph of 64 words stays far
     * below Lucene's limits on graph analysis (1,000 positions) and on boolean clauses (1,024).
     */
    static final int MAX_QUERY_WORDS = 64;

    private NoteQueries() {}

    /** {@code text} cut to its first {@link #MAX_QUERY_WORDS} words (runs of non-blank characters). */
    static String capped(String text) {
        String t = text.strip();
        int words = 0;
        boolean inWord = false;
        for (int i = 0; i < t.length(); i++) {
            boolean blank = Character.isWhitespace(t.charAt(i));
            if (!blank && !inWord && ++words > MAX_QUERY_WORDS) return t.substring(0, i).strip();
            inWord = !blank;
        }
        return t;
    }

    /**
     * The main query: the text over title, tags and body with their weights, a word's one-word
     * synonyms as one {@code SynonymQuery} ({@link TradeQueryBuilder}); null when no word is left
     * after analysis.
     */
    static Query textQuery(Analyzer queryAnalyzer, String text) {
        QueryBuilder qb = new TradeQueryBuilder(queryAnalyzer);
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        boolean any = false;
        String[] fields = {NoteDocuments.TITLE, NoteDocuments.TAGS, NoteDocuments.BODY};
        float[] boosts = {TITLE_BOOST, TAGS_BOOST, BODY_BOOST};
        for (int i = 0; i < fields.length; i++) {
            Query q = qb.createBooleanQuery(fields[i], text, Occur.SHOULD);
            if (q != null) {
                b.add(new BoostQuery(q, boosts[i]), Occur.SHOULD);
                any = true;
            }
        }
        return any ? b.build() : null;
    }

    /**
     * Words of the query found near each other in the body: applied to the best
     * {@link #RESCORE_WINDOW} notes only (rescoring), since a sloppy phrase over every match is the
     * most expensive part of a search. One sloppy {@link MultiPhraseQuery}
     * over the words typed, each position also accepting its one-word synonyms: the phrase query the
     * analyser's synonym graph would give is one sloppy phrase per path through the graph (32 for
     * {@code kt at the minimum radius}), each weighed and scored on its own. Multi-word synonyms
     * still count in the main query, not here. Null for a one-word query.
     */
    static Query phraseQuery(Analyzer queryAnalyzer, String text) {
        List<int[]> spans = new ArrayList<>();
        List<String> words = new ArrayList<>();
        List<Boolean> typed = new ArrayList<>();
        try (TokenStream ts = queryAnalyzer.tokenStream(NoteDocuments.BODY, text)) {
            var term = ts.addAttribute(CharTermAttribute.class);
            var inc = ts.addAttribute(PositionIncrementAttribute.class);
            var len = ts.addAttribute(PositionLengthAttribute.class);
            var type = ts.addAttribute(TypeAttribute.class);
            ts.reset();
            int pos = -1;
            while (ts.incrementToken()) {
                pos += inc.getPositionIncrement();
                spans.add(new int[] {pos, pos + len.getPositionLength()});
                words.add(term.toString());
                typed.add(!SynonymGraphFilter.TYPE_SYNONYM.equals(type.type()));
            }
            ts.end();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        MultiPhraseQuery.Builder b = new MultiPhraseQuery.Builder().setSlop(3);
        int at = 0;
        for (int i = 0; i < words.size(); i++) {
            if (!typed.get(i)) continue;
            List<Term> alternatives = new ArrayList<>();
            alternatives.add(new Term(NoteDocuments.BODY, words.get(i)));
            for (int j = 0; j < words.size(); j++) {
                if (!typed.get(j) && spans.get(j)[0] == spans.get(i)[0] && spans.get(j)[1] == spans.get(i)[1]) {
                    alternatives.add(new Term(NoteDocuments.BODY, words.get(j)));
                }
            }
            b.add(alternatives.toArray(new Term[0]), at++);
        }
        return at < 2 ? null : b.build();
    }

    /** {@code main} restricted to the filters: any of a facet's values, every facet. */
    static Query withFilters(Query main, NoteFilters filters) {
        if (filters.isEmpty()) return main;
        BooleanQuery.Builder b = new BooleanQuery.Builder().add(main, Occur.MUST);
        for (Map.Entry<NoteFacet, Set<String>> e : filters.values().entrySet()) {
            BooleanQuery.Builder any = new BooleanQuery.Builder();
            for (String v : e.getValue()) any.add(new TermQuery(new Term(NoteDocuments.filterField(e.getKey()), v)), Occur.SHOULD);
            b.add(any.build(), Occur.FILTER);
        }
        return b.build();
    }

    /**
     * One clause per label for related notes: a fixed score when a note has the label as a tag
     * ({@link #TAG_MATCH}), function or process, the best of the three, however rare it is.
     */
    static List<Query> labelClauses(Collection<String> labels) {
        List<Query> out = new ArrayList<>();
        for (String t : labels) {
            if (t == null || t.isBlank()) continue;
            String label = Note.label(t);
            out.add(new DisjunctionMaxQuery(List.of(
                    labelQuery(NoteFacet.TAG, label, TAG_MATCH),
                    labelQuery(NoteFacet.FUNCTION, label, FUNCTION_MATCH),
                    labelQuery(NoteFacet.PROCESS, label, PROCESS_MATCH)), 0f));
        }
        return out;
    }

    private static Query labelQuery(NoteFacet facet, String label, float weight) {
        return new BoostQuery(new ConstantScoreQuery(new TermQuery(new Term(NoteDocuments.filterField(facet), label))), weight);
    }

    /**
     * Adds {@link #PHRASE_BOOST} times the phrase score to each hit whose body has the words near
     * each other, and keeps the best {@code limit}. Visits the hits in document order with one
     * phrase scorer per segment (setting up a scorer costs more than checking a document), and
     * checks each hit's own document only.
     */
    static TopDocs rescoreByProximity(IndexSearcher s, TopDocs top, Query phrase, int limit) throws IOException {
        Weight w = s.createWeight(s.rewrite(phrase), ScoreMode.COMPLETE, 1f);
        List<LeafReaderContext> leaves = s.getIndexReader().leaves();
        ScoreDoc[] docs = top.scoreDocs.clone();
        Integer[] byDoc = new Integer[docs.length];
        for (int i = 0; i < byDoc.length; i++) byDoc[i] = i;
        Arrays.sort(byDoc, Comparator.comparingInt(i -> docs[i].doc));
        LeafReaderContext leaf = null;
        Scorer sc = null;
        TwoPhaseIterator two = null;
        DocIdSetIterator approx = null;
        for (int k : byDoc) {
            ScoreDoc sd = docs[k];
            if (leaf == null || sd.doc >= leaf.docBase + leaf.reader().maxDoc()) {
                leaf = leaves.get(ReaderUtil.subIndex(sd.doc, leaves));
                sc = w.scorer(leaf);
                two = sc == null ? null : sc.twoPhaseIterator();
                approx = sc == null ? null : two != null ? two.approximation() : sc.iterator();
            }
            if (sc == null) continue;
            int target = sd.doc - leaf.docBase;
            int at = approx.docID() >= target ? approx.docID() : approx.advance(target);
            if (at == target && (two == null || two.matches())) {
                docs[k] = new ScoreDoc(sd.doc, sd.score + PHRASE_BOOST * sc.score());
            }
        }
        Arrays.sort(docs, (a, b) -> a.score != b.score ? Float.compare(b.score, a.score) : Integer.compare(a.doc, b.doc));
        return new TopDocs(top.totalHits, Arrays.copyOf(docs, Math.min(limit, docs.length)));
    }
}
