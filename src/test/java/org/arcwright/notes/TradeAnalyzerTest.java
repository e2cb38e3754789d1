package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

/** The analysis chain keeps the trade's tokens whole and reads its synonyms. */
class TradeAnalyzerTest {
    private static final TradeAnalyzer INDEX = TradeAnalyzer.forIndexing();
    private static final TradeAnalyzer QUERY = TradeAnalyzer.forQueries();

    @AfterAll
    static void close() {
        INDEX.close();
        QUERY.close();
    }

    /** Tokens, with a leading {@code +} for a token stacked on the previous position. */
    static List<String> tokens(Analyzer a, String text) {
        List<String> out = new ArrayList<>();
        eachToken(a, text, (term, increment) -> out.add((increment == 0 ? "+" : "") + term));
        return out;
    }

    /** Position of each token, counting from 0. */
    static List<Integer> positions(Analyzer a, String text) {
        List<Integer> out = new ArrayList<>();
        int[] pos = {-1};
        eachToken(a, text, (term, increment) -> out.add(pos[0] += increment));
        return out;
    }

    private static void eachToken(Analyzer a, String text, BiConsumer<String, Integer> sink) {
        try (TokenStream ts = a.tokenStream("body", text)) {
            CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
            PositionIncrementAttribute inc = ts.addAttribute(PositionIncrementAttribute.class);
            ts.reset();
            while (ts.incrementToken()) sink.accept(term.toString(), inc.getPositionIncrement());
            ts.end();
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    static List<String> terms(Analyzer a, String text) {
        return tokens(a, text).stream().map(t -> t.startsWith("+") ? t.substring(1) : t).toList();
    }

    @Test
    void radiusValuesStayWholeWhetherOrNotASpaceFollowsTheSymbol() {
        assertThat(tokens(QUERY, "R0.5")).containsExactly("r0.5");
        assertThat(tokens(QUERY, "R 0.5")).containsExactly("r0.5");
        assertThat(tokens(QUERY, "CR 1.5")).containsExactly("cr1.5");
        assertThat(tokens(QUERY, "R .060 MAX")).containsExactly("r.060", "max");
    }

    @Test
    void theIndexAlsoStacksTheSymbolAndNumberOfARadius() {
        assertThat(tokens(INDEX, "CR 1.5")).containsExactly("cr1.5", "+cr", "+1.5");
    }

    @Test
    void standardDesignationsStayWholeAndTheirPartsAreIndexed() {
        assertThat(tokens(QUERY, "ISO 2768-m")).containsExactly("iso", "2768-m");
        assertThat(tokens(INDEX, "ISO 2768-m")).containsExactly("iso", "2768-m", "+2768", "+m");
        assertThat(tokens(QUERY, "ASME Y14.5-2018")).containsExactly("asm", "y14.5-2018");
        assertThat(tokens(QUERY, "H7/g6 fit")).containsExactly("h7/g6", "fit");
    }

    @Test
    void unitsGluedToNumbersAreSplitOff() {
        assertThat(tokens(INDEX, "0.5mm")).containsExactly("0.5", "mm");
        assertThat(tokens(INDEX, "R3mm")).containsExactly("r3", "+r", "+3", "mm");
        assertThat(tokens(QUERY, "0.5mm")).isEqualTo(tokens(QUERY, "0.5 mm"));
    }

    @Test
    void plainWordsAreStemmedAndSplitAtHyphens() {
        assertThat(tokens(INDEX, "fillets")).containsExactly("fillet");
        assertThat(tokens(INDEX, "title-block tolerances")).containsExactly("titl", "block", "toler");
        assertThat(tokens(INDEX, "Peterson's charts")).containsExactly("peterson", "chart");
    }

    @Test
    void plusMinusIsReadAsTheToleranceSign() {
        assertThat(tokens(INDEX, "+/- radius")).containsExactly("±", "radiu");
        assertThat(tokens(QUERY, "±0.05")).containsExactly("±", "0.05");
        assertThat(tokens(QUERY, "+0.2/-0.1")).containsExactly("0.2", "0.1");
    }

    @Test
    void queriesExpandTheTradesSynonyms() {
        assertThat(terms(QUERY, "fillet")).contains("fillet", "round", "blend", "radiu");
        assertThat(terms(QUERY, "moulded")).contains("mould", "mold");
        assertThat(terms(QUERY, "CR")).contains("cr", "control", "radiu");
        assertThat(terms(QUERY, "break all sharp edges")).contains("deburr");
        assertThat(tokens(INDEX, "fillet")).containsExactly("fillet");
    }

    @Test
    void queryLanguageSymbolsProduceNoTokens() {
        assertThat(tokens(QUERY, "\" * ( ) [ ] { } ~ ^ : \\ / !")).isEmpty();
        assertThat(tokens(QUERY, "AND")).isEmpty(); // a function word, dropped like any other
        assertThat(tokens(QUERY, "NOT")).containsExactly("not");
    }

    @Test
    void functionWordsGoWithoutLeavingGaps() {
        // Lucene's English stop set (EnglishAnalyzer.ENGLISH_STOP_WORDS_SET), less "no" and "not"
        assertThat(tokens(INDEX, "profile of a surface")).containsExactly("profil", "surfac");
        assertThat(positions(INDEX, "profile of a surface")).containsExactly(0, 1);
        assertThat(tokens(QUERY, "does not control the form")).containsExactly("doe", "not", "control", "form");
    }

    @Test
    void theInchUnitIsNotTakenForAFunctionWord() {
        assertThat(tokens(INDEX, "0.5in wall")).containsExactly("0.5", "in", "wall");
    }

    @Test
    void accentsAndTypographicApostrophesFoldAsLucenesFiltersWouldFoldThem() {
        // Lucene's ASCIIFoldingFilter and EnglishPossessiveFilter define the expected tokens (Lucene 9.12 documentation)
        assertThat(tokens(INDEX, "Peterson’s façade")).containsExactly("peterson", "facad");
        assertThat(tokens(QUERY, "Größe NAÏVE")).containsExactly("gross", "naiv");
        assertThat(tokens(INDEX, "5µm")).containsExactly("5", "µm"); // the micro sign is not folded
    }

    @Test
    void onlyTokensWithADigitEscapeTheStemmer() {
        assertThat(tokens(INDEX, "2768-fillets")).containsExactly("2768-fillets", "+2768", "+fillet");
        assertThat(tokens(INDEX, "R2 fillets")).containsExactly("r2", "+r", "+2", "fillet");
    }
}
