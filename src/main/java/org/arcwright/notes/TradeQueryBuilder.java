package org.arcwright.notes;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.BoostQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.SynonymQuery;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.util.QueryBuilder;

/**
 * Builds the main query from the query chain's synonym graph, with the one-word alternatives of a
 * word (the word typed and its one-word synonyms, each with its weight) as one {@link SynonymQuery}
 * instead of one clause each.
 *
 * <p>Why: where a word also has multi-word synonyms ({@code fillet}: {@code corner radius},
 * {@code inside corner}), Lucene's builder makes a clause per path through the graph, so a
 * three-word query became some fifty term scorers over three fields, half the time of a warm search.
 * A synonym query reads its terms' postings as one term, and scores a note by the weighted sum of
 * their frequencies, so a note is not rewarded twice for saying both {@code fillet} and
 * {@code round}. Multi-word synonyms stay clauses of their own.
 */
final class TradeQueryBuilder extends QueryBuilder {
    TradeQueryBuilder(Analyzer analyzer) {
        super(analyzer);
    }

    @Override
    protected Query newGraphSynonymQuery(Iterator<Query> queries) {
        List<Query> others = new ArrayList<>();
        SynonymQuery.Builder single = null;
        int singles = 0;
        Query firstSingle = null;
        while (queries.hasNext()) {
            Query q = queries.next();
            float boost = 1f;
            Query inner = q;
            if (inner instanceof BoostQuery) {
                boost = ((BoostQuery) inner).getBoost();
                inner = ((BoostQuery) inner).getQuery();
            }
            if (inner instanceof TermQuery && boost > 0f && boost <= 1f) {
                Term t = ((TermQuery) inner).getTerm();
                if (single == null) single = new SynonymQuery.Builder(t.field());
                single.addTerm(t, boost);
                if (singles++ == 0) firstSingle = q;
            } else {
                others.add(q);
            }
        }
        if (single != null) others.add(0, singles == 1 ? firstSingle : single.build());
        if (others.size() == 1) return others.get(0);
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        for (Query q : others) b.add(q, Occur.SHOULD);
        return b.build();
    }

}
