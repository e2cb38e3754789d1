package org.arcwright.rules;

import java.util.Comparator;
import org.arcwright.callout.Callout;

/**
 * The order of the cards. First every card that meets every need and passes its checks, then those that meet
 * every need but are demoted (a band the process does not hold, a title block with no value), then the rest. Within
 * each class: the controls the pack rules prefer first ({@link Preference}, in their order), then fewer drawing
 * elements, then the pack's weight, then easier inspection, then lower process cost, then the rule id.
 *
 * <p>The pack's weight comes before Arcwright's own inspectability and cost classes: a pack weight is the
 * company's encoding of its practice, inspection means and shop costs included, and the coarse classes below only
 * separate candidates the pack does not weigh differently (for example the advisor's own {@code needs.*}
 * candidates, which all carry the lowest weight).
 *
 * @param recommendation the card
 * @param preferred its control's place in the packs' preference, {@link Preference#UNLISTED} when not named
 * @param elements drawing elements it adds (a frame, a radius dimension; a profile with a radius refinement is two)
 * @param inspection 0 title block, 1 radius gauge, 2 form check (comparator or CMM without datums), 3 CMM in a
 *     datum reference frame (common practice)
 * @param cost 0 when the band is at least what the process holds, 1 when tighter (common practice: a band under
 *     the process capability needs extra operations or sorting)
 */
record Ranking(Recommendation recommendation, int preferred, int elements, int inspection, int cost) {

    /** Best first. */
    static final Comparator<Ranking> ORDER = Ranking::compare;

    /** Needs class, preference, elements, score (higher first), inspection, cost, rule id: written out, as it runs per case. */
    private static int compare(Ranking a, Ranking b) {
        int c = Integer.compare(a.needsClass(), b.needsClass());
        if (c != 0) return c;
        c = Integer.compare(a.preferred, b.preferred);
        if (c != 0) return c;
        c = Integer.compare(a.elements, b.elements);
        if (c != 0) return c;
        c = Double.compare(b.recommendation.score(), a.recommendation.score());
        if (c != 0) return c;
        c = Integer.compare(a.inspection, b.inspection);
        if (c != 0) return c;
        c = Integer.compare(a.cost, b.cost);
        if (c != 0) return c;
        return a.recommendation.ruleId().compareTo(b.recommendation.ruleId());
    }

    /** 0 usable, 1 meets every need but demoted, 2 not demoted but misses a need, 3 both. */
    int needsClass() {
        Recommendation r = recommendation;
        boolean all = Boolean.TRUE.equals(r.meetsAll());
        return all ? (r.demoted() ? 1 : 0) : (r.demoted() ? 3 : 2);
    }

    static Ranking of(Recommendation r, double processBand, Preference preference) {
        Callout c = r.callout();
        int elements = r.refinement() == null ? 1 : 2;
        int inspection;
        if (c instanceof Callout.General) inspection = 0;
        else if (c instanceof Callout.Radius) inspection = 1;
        else if (c instanceof Callout.ControlledRadius) inspection = 2;
        else inspection = Proof.locates(c) ? 3 : 2;
        Double band = r.numbers().band();
        int cost = band != null && Double.isFinite(processBand) && band < processBand - 1e-9 ? 1 : 0;
        int preferred = preference.isEmpty() ? Preference.UNLISTED : preference.rank(c.typeName());
        return new Ranking(r, preferred, elements, inspection, cost);
    }
}
