package org.arcwright.notes;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.text.ParseException;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.en.PorterStemFilter;
import org.apache.lucene.analysis.synonym.SolrSynonymParser;
import org.apache.lucene.analysis.synonym.SynonymGraphFilter;
import org.apache.lucene.analysis.synonym.SynonymMap;

/**
 * The analysis chain for practice notes, fitted to how tolerancing is written.
 *
 * <ol>
 *   <li>{@link TradeTokenizer} keeps tokens that contain a digit whole with their inner dots,
 *       hyphens and slashes ({@code R0.5}, {@code 2768-m}, {@code Y14.5-2018}, {@code H7/g6},
 *       {@code .060}), joins a radius symbol to its value ({@code R 0.5} to {@code R0.5}), reads
 *       {@code +/-} as {@code ±}, and splits plain words at hyphens ({@code title-block} is two
 *       words); it also lower-cases, folds to ASCII and drops English possessives, as Lucene's
 *       filters of those names would, without three more filters on every token.</li>
 *   <li>{@link TradeTokenFilter} splits numbers from units and, when indexing, stacks the parts of
 *       compounds; function words go ({@link FunctionWordFilter}); Porter stemming, except for
 *       tokens with a digit in them.</li>
 *   <li>When querying only: the trade's synonyms ({@code fillet}, {@code round}, {@code blend},
 *       {@code radius}; {@code edge break}, {@code broken edge}; {@code CR}, {@code controlled radius};
 *       British and American spellings) from {@code trade-synonyms.txt}, each weighted half as much
 *       as the word typed, so a note using the user's own word ranks first.</li>
 * </ol>
 *
 * <p>English function words are dropped with no gap left behind ({@link FunctionWordFilter}), on
 * both sides and in the synonym rules, so phrases and multi-word synonyms still line up. See
 * decision records 0501 and 0505.
 */
public final class TradeAnalyzer extends Analyzer {
    /** The synonym list on the classpath, Solr format, applied at query time. */
    public static final String SYNONYMS_RESOURCE = "/org/arcwright/notes/trade-synonyms.txt";

    /** Weight of a synonym relative to the word the user typed. */
    static final float SYNONYM_WEIGHT = 0.5f;

    private final boolean querySide;
    private final SynonymMap synonyms;

    private TradeAnalyzer(boolean querySide, SynonymMap synonyms) {
        this.querySide = querySide;
        this.synonyms = synonyms;
    }

    /** The chain used to index notes: no synonyms, compound parts stacked. */
    public static TradeAnalyzer forIndexing() {
        return new TradeAnalyzer(false, null);
    }

    /** The chain used for user queries: compounds kept exact, synonyms expanded. */
    public static TradeAnalyzer forQueries() {
        return new TradeAnalyzer(true, loadSynonyms());
    }

    @Override
    protected TokenStreamComponents createComponents(String fieldName) {
        Tokenizer source = new TradeTokenizer();
        TokenStream s = baseChain(source, !querySide);
        if (querySide && synonyms != null) s = new SynonymWeightFilter(new SynonymGraphFilter(s, synonyms, true), SYNONYM_WEIGHT);
        return new TokenStreamComponents(source, s);
    }

    @Override
    protected TokenStream normalize(String fieldName, TokenStream in) {
        return new LowerCaseFilter(in);
    }

    /**
     * The index chain after {@code in}, for {@link Snippets}, which puts a filter between the
     * tokenizer and the rest (so it cannot use the analyzer's reusable chain).
     */
    static TokenStream indexChainAfter(TokenStream in) {
        return baseChain(in, true);
    }

    private static TokenStream baseChain(TokenStream source, boolean indexSide) {
        return new PorterStemFilter(new FunctionWordFilter(new TradeTokenFilter(source, indexSide)));
    }

    private static SynonymMap loadSynonyms() {
        Analyzer ruleAnalyzer = new Analyzer() {
            @Override
            protected TokenStreamComponents createComponents(String fieldName) {
                Tokenizer source = new TradeTokenizer();
                return new TokenStreamComponents(source, baseChain(source, false));
            }
        };
        try (var in = TradeAnalyzer.class.getResourceAsStream(SYNONYMS_RESOURCE)) {
            if (in == null) throw new IllegalStateException("synonym list missing from the classpath: " + SYNONYMS_RESOURCE);
            SolrSynonymParser parser = new SolrSynonymParser(true, true, ruleAnalyzer);
            parser.parse(new StringReader(new String(in.readAllBytes(), StandardCharsets.UTF_8)));
            return parser.build();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (ParseException e) {
            throw new IllegalStateException("bad synonym list " + SYNONYMS_RESOURCE + " at offset " + e.getErrorOffset(), e);
        } finally {
            ruleAnalyzer.close();
        }
    }
}
