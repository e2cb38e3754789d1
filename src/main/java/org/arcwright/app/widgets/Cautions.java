package org.arcwright.app.widgets;

import javax.swing.JLabel;
import net.miginfocom.swing.MigLayout;

/** The standing caution wherever Arcwright advises: it suggests, engineers and standards decide. */
public final class Cautions {
    /** The text, shown on the Decide panel and the Stress view. */
    public static final String ADVICE = "Arcwright suggests; it does not approve. Check every callout against the "
            + "governing standard (ASME Y14.5 or ISO 1101), your company's own practice and a licensed engineer's "
            + "judgement, above all for fatigue-loaded fillets, where the smallest radius the drawing allows decides "
            + "the life of the part.";

    /** The text shown with every verdict on measured points (the Check view). */
    public static final String VERDICT = "A verdict covers only the points imported, judged against the callout named, "
            + "with no allowance for measurement uncertainty unless one is stated. Conformance is decided by the governing "
            + "standard (ASME Y14.5 or ISO 1101, with the ISO 14253-1 decision rules), your company's inspection practice "
            + "and a licensed engineer's judgement.";

    private Cautions() {}

    /** A caution box holding {@code text}. */
    public static Card box(String text) {
        Card c = new Card(new MigLayout("insets 6 10 6 10, gap 8", "[][grow,fill]", "[]"), "caution");
        c.setName("caution");
        c.add(new JLabel(Icons.get("caution")), "top");
        c.add(new WrapLabel(text, "Label.font", null), "wmin 10");
        return c;
    }
}
