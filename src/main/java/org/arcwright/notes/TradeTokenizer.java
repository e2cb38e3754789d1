package org.arcwright.notes;

import java.io.IOException;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.miscellaneous.ASCIIFoldingFilter;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.util.ArrayUtil;

/**
 * Splits note text into the trade's tokens, lower-cased and folded to ASCII, in one pass (a hand-written loop: a regular expression
 * here cost most of the indexing time).
 *
 * <ul>
 *   <li>A token containing a digit keeps its inner dots, hyphens and slashes and up to four leading
 *       letters: {@code R0.5}, {@code .060}, {@code 2768-m}, {@code Y14.5-2018}, {@code H7/g6}.</li>
 *   <li>A radius symbol followed by spaces and a value is one token without the spaces:
 *       {@code R 0.5} gives {@code R0.5}, {@code CR 1.5} gives {@code CR1.5}.</li>
 *   <li>Plain words are runs of letters, with inner apostrophes ({@code Peterson's}); hyphens
 *       between letters split them ({@code title-block} is two words).</li>
 *   <li>{@code ±}, and {@code +/-} or {@code +-} written for it, give the token {@code ±}.</li>
 *   <li>Everything else (punctuation, query-language symbols) separates tokens and is dropped.</li>
 * </ul>
 */
final class TradeTokenizer extends Tokenizer {
    private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
    private final OffsetAttribute offset = addAttribute(OffsetAttribute.class);
    private final StringBuilder text = new StringBuilder();
    private char[] folded = new char[64];
    private int pos;
    private boolean read;

    @Override
    public boolean incrementToken() throws IOException {
        if (!read) fill();
        clearAttributes();
        int n = text.length();
        while (pos < n) {
            char c = text.charAt(pos);
            if (c == '±') {
                emitSign(pos, pos + 1);
                return true;
            }
            if (c == '+') {
                int end = plusMinusEnd(pos);
                if (end > 0) {
                    emitSign(pos, end);
                    return true;
                }
                pos++;
                continue;
            }
            if (Character.isLetter(c)) return word();
            if (isDigit(c) || (c == '.' && pos + 1 < n && isDigit(text.charAt(pos + 1)))) return number(pos, pos);
            pos++;
        }
        return false;
    }

    private boolean word() {
        int n = text.length();
        int start = pos;
        int i = pos;
        while (i < n && Character.isLetter(text.charAt(i))) i++;
        int letters = i - start;
        if (letters <= 4 && i < n && startsValue(i)) return number(start, i);
        if (isRadiusSymbol(start, i)) {
            int j = i;
            while (j < n && text.charAt(j) == ' ') j++;
            if (j > i && j < n && startsValue(j)) {
                term.setEmpty().append(text, start, i);
                pos = j;
                return numberTail(start);
            }
        }
        while (i + 1 < n && (text.charAt(i) == '\'' || text.charAt(i) == '’') && Character.isLetter(text.charAt(i + 1))) {
            i++;
            while (i < n && Character.isLetter(text.charAt(i))) i++;
        }
        term.setEmpty().append(text, start, i);
        normalise();
        stripPossessive();
        setOffsets(start, i);
        pos = i;
        return true;
    }

    /** A token with a digit: {@code start} is its first char, {@code from} where the value begins. */
    private boolean number(int start, int from) {
        term.setEmpty().append(text, start, from);
        pos = from;
        return numberTail(start);
    }

    private boolean numberTail(int start) {
        int n = text.length();
        int i = pos;
        if (i < n && text.charAt(i) == '.') term.append(text.charAt(i++));
        while (i < n && Character.isLetterOrDigit(text.charAt(i))) term.append(text.charAt(i++));
        while (i + 1 < n && isJoiner(text.charAt(i)) && Character.isLetterOrDigit(text.charAt(i + 1))) {
            term.append(text.charAt(i++));
            while (i < n && Character.isLetterOrDigit(text.charAt(i))) term.append(text.charAt(i++));
        }
        normalise();
        setOffsets(start, i);
        pos = i;
        return true;
    }

    private void emitSign(int start, int end) {
        term.setEmpty().append('±');
        normalise();
        setOffsets(start, end);
        pos = end;
    }

    /**
     * Lower case, then ASCII folding, as Lucene's {@code LowerCaseFilter} and
     * {@code ASCIIFoldingFilter} would do after this tokenizer: tokens never hold surrogates
     * (they are not letters or digits here), so lower-casing char by char is the same as by code
     * point. Done here, not by two more filters, because every token of every note passes.
     */
    private void normalise() {
        char[] b = term.buffer();
        int len = term.length();
        boolean ascii = true;
        for (int k = 0; k < len; k++) {
            char c = b[k];
            if (c < 0x80) {
                if (c >= 'A' && c <= 'Z') b[k] = (char) (c + ('a' - 'A'));
            } else {
                b[k] = Character.toLowerCase(c);
                ascii = false;
            }
        }
        if (ascii) return;
        int max = 4 * len;
        if (folded.length < max) folded = new char[ArrayUtil.oversize(max, Character.BYTES)];
        int out = ASCIIFoldingFilter.foldToASCII(b, 0, folded, 0, len);
        term.copyBuffer(folded, 0, out);
    }

    /** Drops a trailing {@code 's} as Lucene's {@code EnglishPossessiveFilter} does (after folding, the apostrophe is ASCII). */
    private void stripPossessive() {
        char[] b = term.buffer();
        int len = term.length();
        if (len >= 2 && (b[len - 2] == '\'' || b[len - 2] == '\u2019' || b[len - 2] == '\uFF07') && b[len - 1] == 's') {
            term.setLength(len - 2);
        }
    }

    /** End of {@code +/-} or {@code +-} (the latter only before a value), or -1. */
    private int plusMinusEnd(int at) {
        int n = text.length();
        int i = at + 1;
        while (i < n && text.charAt(i) == ' ') i++;
        if (i < n && text.charAt(i) == '/') {
            i++;
            while (i < n && text.charAt(i) == ' ') i++;
            return i < n && text.charAt(i) == '-' ? i + 1 : -1;
        }
        if (i == at + 1 && i < n && text.charAt(i) == '-') {
            int j = i + 1;
            while (j < n && text.charAt(j) == ' ') j++;
            return j < n && startsValue(j) ? i + 1 : -1;
        }
        return -1;
    }

    private boolean startsValue(int i) {
        int n = text.length();
        char c = text.charAt(i);
        return isDigit(c) || (c == '.' && i + 1 < n && isDigit(text.charAt(i + 1)));
    }

    /** {@code r}, {@code cr}, {@code sr} or {@code csr} in any case; compared char by char, as most words of three letters or fewer pass here. */
    private boolean isRadiusSymbol(int start, int end) {
        int len = end - start;
        if (len < 1 || len > 3) return false;
        char last = Character.toLowerCase(text.charAt(end - 1));
        if (last != 'r') return false;
        if (len == 1) return true;
        char first = Character.toLowerCase(text.charAt(start));
        if (len == 2) return first == 'c' || first == 's';
        return first == 'c' && Character.toLowerCase(text.charAt(start + 1)) == 's';
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static boolean isJoiner(char c) {
        return c == '.' || c == '-' || c == '/';
    }

    private void setOffsets(int start, int end) {
        offset.setOffset(correctOffset(start), correctOffset(end));
    }

    private void fill() throws IOException {
        text.setLength(0);
        char[] buf = new char[4096];
        int r;
        while ((r = input.read(buf)) > 0) text.append(buf, 0, r);
        read = true;
    }

    @Override
    public void end() throws IOException {
        super.end();
        int last = correctOffset(text.length());
        offset.setOffset(last, last);
    }

    @Override
    public void reset() throws IOException {
        super.reset();
        pos = 0;
        read = false;
        text.setLength(0);
    }
}
