package org.arcwright.app.decide;

import javax.swing.JLabel;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.NeedsSummary;
import org.arcwright.app.widgets.Card;
import org.arcwright.app.widgets.Icons;
import org.arcwright.app.widgets.WrapLabel;

/**
 * The block above the cards when no card meets every need: the advisor's statement, then the design
 * changes that would work, with their numbers. Also shown, with a milder heading, when a card meets every
 * need and changes are still worth weighing.
 */
final class NothingMeetsBlock extends Card {
    private static final long serialVersionUID = 1L;

    NothingMeetsBlock(NeedsSummary s) {
        super(new MigLayout("insets 10 12 10 12, wrap 2, gap 6 3", "[][grow,fill]", ""), "caution");
        setName("nothingMeets");
        if (s.nothingMeets()) {
            add(new JLabel(Icons.get("caution")), "top");
            WrapLabel statement = new WrapLabel(s.statement(), "Arcwright.heading.font", "Arcwright.fail.foreground");
            statement.setName("nothingMeetsStatement");
            add(statement, "growx, wmin 10");
            add(new WrapLabel("No card below is a usable answer as it stands: each misses a need marked ✗ in the table.",
                    "Label.font", null), "skip 1, growx, wmin 10");
        }
        if (!s.changes().isEmpty()) {
            WrapLabel title = new WrapLabel(s.changesTitle(), "Arcwright.heading.font", null);
            title.setName("designChangesTitle");
            add(title, "span 2, growx, wmin 10, gaptop 4");
            int i = 0;
            for (String c : s.changes()) {
                WrapLabel line = new WrapLabel("• " + c, "Label.font", null);
                line.setName("designChange" + i++);
                add(line, "span 2, growx, wmin 10");
            }
        }
        add(new WrapLabel("Check every change against the governing standard, company practice and licensed engineering "
                + "judgement before it reaches a drawing.", "Arcwright.help.font", "Arcwright.help.foreground"),
                "span 2, growx, wmin 10, gaptop 4");
    }
}
