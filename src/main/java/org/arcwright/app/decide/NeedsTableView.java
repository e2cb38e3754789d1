package org.arcwright.app.decide;

import com.formdev.flatlaf.FlatClientProperties;
import javax.swing.JLabel;
import javax.swing.SwingConstants;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.NeedsSummary;
import org.arcwright.app.widgets.Card;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.WrapLabel;

/**
 * The needs of the feature with a tick or cross per card, the same table the text output prints. Each
 * mark also says met or not met in its tooltip and accessible name, so the colour is never the only cue.
 */
final class NeedsTableView extends Card {
    private static final long serialVersionUID = 1L;

    NeedsTableView(NeedsSummary s) {
        super(new MigLayout("insets 10 12 10 12, wrap " + (2 + s.cards()) + ", gap 10 2",
                "[][grow,fill]" + "[center]".repeat(s.cards()), ""), "card");
        setName("needsTable");
        WrapLabel title = new WrapLabel("Needs of this feature (✓ met, ✗ not met, ? not proven, by card)",
                "Arcwright.heading.font", null);
        add(title, "span, growx, wmin 10");
        add(help("need"));
        add(help("limit"));
        for (int i = 1; i <= s.cards(); i++) add(help("#" + i));
        int row = 0;
        for (NeedsSummary.Row r : s.rows()) {
            add(new JLabel(r.key()), "top");
            add(new WrapLabel(r.limit(), "Label.font", null), "top, wmin 10");
            int card = 1;
            for (NeedsSummary.Mark m : r.marks()) {
                JLabel mark = new JLabel(m.symbol(), SwingConstants.CENTER);
                mark.setName("need." + r.key() + "." + card);
                mark.setToolTipText("Card " + card + ": " + r.key() + " " + m.words());
                mark.getAccessibleContext().setAccessibleName("Card " + card + " " + m.words());
                if (m != NeedsSummary.Mark.NOT_PROVEN) {
                    mark.setForeground(Themes.color(
                            m == NeedsSummary.Mark.MET ? "Arcwright.pass.foreground" : "Arcwright.fail.foreground"));
                }
                add(mark, "top");
                card++;
            }
            WrapLabel why = new WrapLabel(r.why(), "Arcwright.help.font", "Arcwright.help.foreground");
            why.setName("needWhy" + row++);
            add(why, "skip 1, span, growx, wmin 10, gapbottom 4");
        }
    }

    private static JLabel help(String text) {
        JLabel l = new JLabel(text);
        l.putClientProperty(FlatClientProperties.STYLE_CLASS, "small");
        return l;
    }
}
