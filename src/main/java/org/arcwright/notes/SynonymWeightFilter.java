package org.arcwright.notes;

import java.io.IOException;
import org.apache.lucene.analysis.TokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.synonym.SynonymGraphFilter;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.search.BoostAttribute;

/**
 * Gives tokens injected by {@link SynonymGraphFilter} a lower weight than the words the user typed;
 * {@link org.apache.lucene.util.QueryBuilder} carries the weight into the query.
 */
final class SynonymWeightFilter extends TokenFilter {
    private final TypeAttribute type = addAttribute(TypeAttribute.class);
    private final BoostAttribute boost = addAttribute(BoostAttribute.class);
    private final float weight;

    SynonymWeightFilter(TokenStream in, float weight) {
        super(in);
        this.weight = weight;
    }

    @Override
    public boolean incrementToken() throws IOException {
        if (!input.incrementToken()) return false;
        boost.setBoost(SynonymGraphFilter.TYPE_SYNONYM.equals(type.type()) ? weight : 1.0f);
        return true;
    }
}
