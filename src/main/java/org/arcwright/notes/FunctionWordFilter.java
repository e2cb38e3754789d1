package org.arcwright.notes;

import java.io.IOException;
import java.util.Set;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.TokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.KeywordAttribute;

/**
 * Drops English function words (Lucene's English stop set, less {@code no} and {@code not}, on which
 * a requirement's meaning turns) and closes the gap they leave: the next word takes the dropped
 * word's position. So {@code profile of a surface} reads as {@code profile surface} in notes,
 * queries and synonym rules alike, and phrases and multi-word synonyms still line up word for
 * word. A third of the words of ordinary prose are such words; none of them helps find a note.
 * Keywords (tokens with a digit, units such as {@code in}) always pass. See decision record 0505.
 */
final class FunctionWordFilter extends TokenFilter {
    static final CharArraySet WORDS = words();

    private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
    private final KeywordAttribute keyword = addAttribute(KeywordAttribute.class);

    FunctionWordFilter(TokenStream in) {
        super(in);
    }

    @Override
    public boolean incrementToken() throws IOException {
        while (input.incrementToken()) {
            if (keyword.isKeyword() || !WORDS.contains(term.buffer(), 0, term.length())) return true;
        }
        return false;
    }

    private static CharArraySet words() {
        CharArraySet set = new CharArraySet(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET.size(), false);
        for (Object w : EnglishAnalyzer.ENGLISH_STOP_WORDS_SET) {
            String s = new String((char[]) w);
            if (!Set.of("no", "not").contains(s)) set.add(s);
        }
        return CharArraySet.unmodifiableSet(set);
    }
}
