package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.StringReader;
import java.util.Set;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.core.KeywordTokenizer;
import org.apache.lucene.analysis.en.PorterStemFilter;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The snippet under a hit: the sentences holding the query's words, with those words marked. */
class SnippetsTest {
    private static final TradeAnalyzer QUERY = TradeAnalyzer.forQueries();

    private static String snippet(String query, String body) {
        Set<String> terms = Snippets.markTerms(QUERY, NoteDocuments.BODY, query);
        return Snippets.pick(body, terms, 2);
    }

    @Test
    void theSentenceWithMostQueryWordsIsShownWithTheWordsMarked() {
        String body = "Drawings vary. The shaft shoulder needs a generous fillet for fatigue. Paint is grey.";
        assertThat(snippet("fillet fatigue shaft", body))
                .isEqualTo("The **shaft** shoulder needs a generous **fillet** for **fatigue**.");
    }

    @Test
    void twoPassagesKeepTheNotesOrderAndAreJoinedByAGap() {
        String body = "A fillet here.\nNothing relevant.\nThe shaft there.\nMore filler.";
        assertThat(snippet("fillet shaft", body)).isEqualTo("A **fillet** here." + Snippets.GAP + "The **shaft** there.");
    }

    @Test
    void aRadiusCalloutIsMarkedWhole() {
        assertThat(snippet("R0.5", "Break the edge. Use R0.5 on the lip.")).isEqualTo("Use **R0.5** on the lip.");
    }

    @Test
    void stemmingAndSynonymsFindTheWordsAsTheSearchDoes() {
        assertThat(snippet("fillets", "Blend the lip. Nothing else.")).isEqualTo("**Blend** the lip.");
    }

    @Test
    void stopWordsOfAQuestionAreNotMarked() {
        assertThat(snippet("kt at the minimum radius", "Check Kt at the minimum radius."))
                .isEqualTo("Check **Kt** at the **minimum** **radius**.");
    }

    @Test
    void wordsWhoseStemChangesTheirEndAreStillMarked() {
        assertThat(snippet("relational sensibility", "Relations matter. Sensible radii, happily."))
                .isEqualTo("**Relations** matter." + Snippets.GAP + "**Sensible** radii, happily.");
    }

    @Test
    void aBodyWithoutTheWordsGivesNoSnippet() {
        assertThat(snippet("gasket", "Nothing about it here.")).isNull();
    }

    @Test
    void sentencesEndAtStopsFollowedBySpaceNotInsideNumbers() {
        int[] b = Snippets.sentenceBounds("Use R0.5 here. Then 2.5 there.");
        assertThat(b).containsExactly(0, 14, 15, 30);
    }

    /** Reference: Lucene's PorterStemFilter (M. F. Porter, "An algorithm for suffix stripping", Program 14, 1980). */
    private static String porter(String word) {
        KeywordTokenizer whole = new KeywordTokenizer();
        whole.setReader(new StringReader(word));
        try (TokenStream ts = new PorterStemFilter(whole)) {
            CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            ts.incrementToken();
            String stem = term.toString();
            ts.end();
            return stem;
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"sky", "ties", "relational", "possibly", "sensibility", "organization", "valency", "conflated",
            "hopefulness", "electrical", "generalizations", "oscillators", "filleting", "radii", "radius", "bled", "ays",
            "dying", "controlling", "callouts", "tangency", "gauging", "mouldings", "deburring", "concentrations"})
    void aWordIsNeverDroppedBeforeStemmingWhenItStemsToATerm(String word) {
        String stem = porter(word);
        Snippets.StemPrefixes prefixes = new Snippets.StemPrefixes(Set.of(stem));
        assertThat(prefixes.mayMatch(word.toCharArray(), word.length())).as(word + " -> " + stem).isTrue();
        assertThat(Snippets.pick("A " + word + " here.", Set.of(stem), 1)).contains("**" + word + "**");
    }
}
