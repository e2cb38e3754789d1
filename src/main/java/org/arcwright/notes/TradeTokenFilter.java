package org.arcwright.notes;

import java.io.IOException;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.lucene.analysis.TokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.KeywordAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.util.AttributeSource;

/**
 * Splits and stacks the trade's compound tokens (input already lower-cased), and marks every token
 * with a digit in it, and every unit split from a number, as a keyword, so the stemmer leaves
 * {@code r0.5} and {@code 2768-m} alone and the unit {@code in} is not taken for a function word.
 *
 * <ul>
 *   <li>A number glued to a unit ({@code 0.5mm}, {@code r3mm}, {@code 90deg}) becomes the number
 *       and the unit, one after the other, on both the index and the query side.</li>
 *   <li>On the index side only, a compound ({@code 2768-m}, {@code y14.5-2018}, {@code h7/g6})
 *       also yields its parts, and a radius token ({@code r0.5}, {@code cr1.5}) also yields its
 *       prefix and number, stacked at the same position. So {@code 2768} or {@code cr} find a note
 *       that writes {@code 2768-m} or {@code CR 1.5}, while a query {@code R0.5} stays exact.</li>
 * </ul>
 */
final class TradeTokenFilter extends TokenFilter {
    private static final Pattern WITH_UNIT =
            Pattern.compile("((?:[a-z]{0,3})?\\.?\\d+(?:\\.\\d+)?)(mm|µm|um|in|deg|mpa|ksi|ra)");
    private static final Pattern RADIUS = Pattern.compile("(r|cr|sr|csr)(\\.?\\d[\\d.]*)");

    private final boolean indexSide;
    private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
    private final PositionIncrementAttribute posInc = addAttribute(PositionIncrementAttribute.class);
    private final KeywordAttribute keyword = addAttribute(KeywordAttribute.class);
    private final Deque<Pending> pending = new ArrayDeque<>();

    private record Pending(AttributeSource.State state, String text, int increment, boolean unit) {}

    TradeTokenFilter(TokenStream in, boolean indexSide) {
        super(in);
        this.indexSide = indexSide;
    }

    @Override
    public boolean incrementToken() throws IOException {
        if (!pending.isEmpty()) {
            Pending p = pending.removeFirst();
            restoreState(p.state());
            term.setEmpty().append(p.text());
            posInc.setPositionIncrement(p.increment());
            keyword.setKeyword(p.unit() || hasDigit(term.buffer(), term.length()));
            return true;
        }
        if (!input.incrementToken()) return false;
        if (!needsWork(term.buffer(), term.length())) return true;
        keyword.setKeyword(hasDigit(term.buffer(), term.length()));
        String t = term.toString();
        Matcher unit = WITH_UNIT.matcher(t);
        if (unit.matches() && unit.group(1).chars().anyMatch(Character::isDigit)) {
            String number = unit.group(1);
            State s = captureState();
            term.setEmpty().append(number);
            keyword.setKeyword(true);
            stackParts(number, s);
            pending.addLast(new Pending(s, unit.group(2), 1, true));
            return true;
        }
        if (indexSide) stackParts(t, captureState());
        return true;
    }

    private void stackParts(String t, State s) {
        if (!indexSide) return;
        Matcher r = RADIUS.matcher(t);
        if (r.matches()) {
            pending.addFirst(new Pending(s, r.group(2), 0, false));
            pending.addFirst(new Pending(s, r.group(1), 0, false));
            return;
        }
        if (t.indexOf('-') >= 0 || t.indexOf('/') >= 0) {
            String[] parts = t.split("[-/]");
            for (int i = parts.length - 1; i >= 0; i--) {
                if (!parts[i].isEmpty() && !parts[i].equals(t)) pending.addFirst(new Pending(s, parts[i], 0, false));
            }
        }
    }

    /** Only tokens with a digit, a hyphen or a slash can be split or stacked; most words skip the regexes. */
    private static boolean needsWork(char[] b, int len) {
        for (int i = 0; i < len; i++) {
            char c = b[i];
            if ((c >= '0' && c <= '9') || c == '-' || c == '/') return true;
        }
        return false;
    }

    private static boolean hasDigit(char[] b, int len) {
        for (int i = 0; i < len; i++) {
            if (b[i] >= '0' && b[i] <= '9') return true;
        }
        return false;
    }

    @Override
    public void reset() throws IOException {
        super.reset();
        pending.clear();
    }
}
