package org.arcwright.notes;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.FilteringTokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;

/**
 * Picks the passages of a note body shown under a hit and marks the query's words in them.
 *
 * <p>Why not a Lucene highlighter: it re-analysed each shown body into a one-document index and ran
 * the query against it, about a third of a warm search and several hundred classes to load on the
 * first search. Here the plain body is tokenised once with the index chain (so stemming, stacked
 * compound parts and kept-whole tokens such as {@code R0.5} match exactly as they do in the index),
 * each token is looked up in the set of the query's analysed terms, and the sentences holding the
 * most distinct query terms are shown, in their order in the note.
 */
final class Snippets {
    /** Between two passages of one snippet. */
    static final String GAP = " … ";
    private static final String MARK = "**";
    /** Each further occurrence of a term already counted adds this much to a sentence's score. */
    private static final float REPEAT = 0.25f;
    private static final int REPEATS_COUNTED = 4;

    private Snippets() {}

    /**
     * The analysed terms of {@code query} (synonyms included) worth marking: {@code no} and
     * {@code not}, the only English stop words the query chain keeps, are searched but left unmarked.
     */
    static Set<String> markTerms(Analyzer queryAnalyzer, String field, String query) {
        Set<String> out = new HashSet<>();
        CharArraySet stop = EnglishAnalyzer.ENGLISH_STOP_WORDS_SET;
        try (TokenStream ts = queryAnalyzer.tokenStream(field, query)) {
            CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                if (!stop.contains(term.buffer(), 0, term.length())) out.add(term.toString());
            }
            ts.end();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    /**
     * Up to {@code maxPassages} sentences of {@code plain} with the {@code terms} marked {@code **so**},
     * in the note's order, joined by {@link #GAP}; null when no term occurs (the caller shows the
     * note's summary instead). A sentence ends at {@code .}, {@code !} or {@code ?} followed by
     * white space, or at a line break.
     * The body goes through the index chain, with one shortcut: a plain word (ASCII letters and
     * apostrophes) that does not begin with the leading letters of some term is dropped before
     * stemming, the only step after the tokenizer that changes a plain word ({@link StemPrefixes}).
     */
    static String pick(String plain, Set<String> terms, int maxPassages) {
        if (terms.isEmpty() || plain.isEmpty()) return null;
        int[] sentences = sentenceBounds(plain);
        int count = sentences.length / 2;
        float[] score = new float[count];
        List<Set<String>> seen = new ArrayList<>(count);
        for (int i = 0; i < count; i++) seen.add(null);
        List<int[]> marks = new ArrayList<>();
        int[] repeats = new int[count];
        TradeTokenizer tokens = new TradeTokenizer();
        tokens.setReader(new StringReader(plain));
        try (TokenStream ts = TradeAnalyzer.indexChainAfter(new StemPrefixFilter(tokens, new StemPrefixes(terms)))) {
            CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
            OffsetAttribute offset = ts.addAttribute(OffsetAttribute.class);
            ts.reset();
            int s = 0;
            while (ts.incrementToken()) {
                String t = term.toString();
                if (!terms.contains(t)) continue;
                int start = offset.startOffset();
                int end = offset.endOffset();
                while (s < count - 1 && start >= sentences[2 * s + 1]) s++;
                if (seen.get(s) == null) seen.set(s, new HashSet<>());
                if (seen.get(s).add(t)) {
                    score[s] += 1f;
                } else if (repeats[s] < REPEATS_COUNTED) {
                    repeats[s]++;
                    score[s] += REPEAT;
                }
                int[] last = marks.isEmpty() ? null : marks.get(marks.size() - 1);
                if (last != null && start < last[1]) {
                    last[1] = Math.max(last[1], end);
                } else {
                    marks.add(new int[] {start, end});
                }
            }
            ts.end();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        if (marks.isEmpty()) return null;
        boolean[] chosen = best(score, maxPassages);
        StringBuilder out = new StringBuilder();
        int m = 0;
        for (int i = 0; i < count; i++) {
            if (!chosen[i]) continue;
            int from = sentences[2 * i];
            int to = sentences[2 * i + 1];
            if (out.length() > 0) out.append(GAP);
            while (m < marks.size() && marks.get(m)[1] <= from) m++;
            int at = from;
            for (int k = m; k < marks.size() && marks.get(k)[0] < to; k++) {
                int ms = Math.max(marks.get(k)[0], at);
                int me = Math.min(marks.get(k)[1], to);
                if (ms >= me) continue;
                out.append(plain, at, ms).append(MARK).append(plain, ms, me).append(MARK);
                at = me;
            }
            out.append(plain, at, to);
        }
        return out.toString();
    }

    /**
     * The leading letters a plain word must have to stem to one of the terms. Porter's stemmer only
     * rewrites the end of a word: of the 74,585 all-letter words of a standard English word list
     * (Debian's wamerican), every stem differs from its word in at most its last letter. So a word
     * stemming to {@code t} begins with {@code t}'s first {@code len(t) - 2} letters, one more than
     * that list needs; at most three are compared, at least one.
     */
    static final class StemPrefixes {
        private final boolean[] one = new boolean[26];
        private final boolean[] two = new boolean[26 * 26];
        private final boolean[] three = new boolean[26 * 26 * 26];

        StemPrefixes(Set<String> terms) {
            for (String t : terms) {
                int letters = 0;
                while (letters < t.length() && letters < 3 && isLower(t.charAt(letters))) letters++;
                if (letters == 0) continue;
                int len = Math.min(letters, Math.max(1, t.length() - 2));
                int code = code(t.toCharArray(), len);
                if (len == 1) one[code] = true;
                else if (len == 2) two[code] = true;
                else three[code] = true;
            }
        }

        /** Whether the plain word in {@code b[0..n)} (lower case) may stem to one of the terms. */
        boolean mayMatch(char[] b, int n) {
            for (int len = 1; len <= Math.min(3, n); len++) {
                for (int i = 0; i < len; i++) {
                    if (!isLower(b[i])) return true;
                }
                int code = code(b, len);
                if (len == 1 ? one[code] : len == 2 ? two[code] : three[code]) return true;
            }
            return false;
        }

        private static boolean isLower(char c) {
            return c >= 'a' && c <= 'z';
        }

        private static int code(char[] b, int len) {
            int code = 0;
            for (int i = 0; i < len; i++) code = code * 26 + (b[i] - 'a');
            return code;
        }
    }

    /** Drops plain words that cannot become one of the terms (see {@link #pick}); keeps every other token. */
    private static final class StemPrefixFilter extends FilteringTokenFilter {
        private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
        private final StemPrefixes prefixes;

        StemPrefixFilter(TokenStream in, StemPrefixes prefixes) {
            super(in);
            this.prefixes = prefixes;
        }

        @Override
        protected boolean accept() {
            char[] b = term.buffer();
            int n = term.length();
            if (n == 0) return true;
            for (int i = 0; i < n; i++) {
                char c = b[i];
                if (!((c >= 'a' && c <= 'z') || c == '\'')) return true;
            }
            return prefixes.mayMatch(b, n);
        }
    }

    /** The {@code n} best-scoring sentences with a score above zero; the earlier one wins a tie. */
    private static boolean[] best(float[] score, int n) {
        boolean[] chosen = new boolean[score.length];
        for (int k = 0; k < n; k++) {
            int bestAt = -1;
            for (int i = 0; i < score.length; i++) {
                if (!chosen[i] && score[i] > 0 && (bestAt < 0 || score[i] > score[bestAt])) bestAt = i;
            }
            if (bestAt < 0) break;
            chosen[bestAt] = true;
        }
        return chosen;
    }

    /** Start and end of each sentence, flattened, white space at either end left out; at least one sentence. */
    static int[] sentenceBounds(String text) {
        int[] bounds = new int[32];
        int count = 0;
        int n = text.length();
        int start = 0;
        for (int i = 0; i <= n; i++) {
            if (i < n) {
                char c = text.charAt(i);
                if (c != '\n' && !(isStop(c) && (i + 1 == n || Character.isWhitespace(text.charAt(i + 1))))) continue;
            }
            int a = start;
            int b = i < n && text.charAt(i) != '\n' ? i + 1 : i;
            while (a < b && Character.isWhitespace(text.charAt(a))) a++;
            while (b > a && Character.isWhitespace(text.charAt(b - 1))) b--;
            if (b > a) {
                if (count + 2 > bounds.length) bounds = Arrays.copyOf(bounds, bounds.length * 2);
                bounds[count++] = a;
                bounds[count++] = b;
            }
            start = i + 1;
        }
        if (count == 0) return new int[] {0, n};
        return Arrays.copyOf(bounds, count);
    }

    private static boolean isStop(char c) {
        return c == '.' || c == '!' || c == '?';
    }
}
