package org.arcwright.app.shell;

import java.awt.Component;
import java.awt.Dimension;
import javax.swing.JOptionPane;
import javax.swing.JScrollPane;
import org.arcwright.app.widgets.Cautions;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.services.SheetService;

/** The Help menu's guide and About box: plain text in the window's look, the cautions included. */
final class HelpDialogs {
    private HelpDialogs() {}

    /** The working order of the window, in a few paragraphs. */
    static final String GUIDE = String.join("\n\n",
            "Arcwright helps you tolerance the fillets, rounds and edge radii of one part, kept in a worksheet (.arcpart).",
            "1. Part (Alt+1): each radius of the part is a feature (F1, F2...). Select one: every view shows that feature.",
            "2. Decide (Alt+2): answer the questions about the selected feature: what the radius does, how it is loaded and made, "
                    + "what matters. 'Keep these answers' puts them on the worksheet; answers you leave without keeping are held "
                    + "and restored when you come back. The recommendations, best first, say which needs each meets and why; "
                    + "'Put on worksheet' chooses one.",
            "3. Zone view (Alt+3): the tolerance zone of the chosen callout at the corner, magnified, with the points last "
                    + "checked.",
            "4. Stress view (Alt+4): the stress concentration across the tolerance of a loaded fillet (Peterson's fits).",
            "5. Check (Alt+5): import measured points (File > Import measured points, Ctrl+I). They are judged against the "
                    + "selected feature's chosen callout; an inspection file's own callout is only shown beside the verdict, "
                    + "and a file describing another corner is refused or judged as the feature only when you confirm. "
                    + "Keep records the verdict with the feature.",
            "6. Notes (Alt+6): search the practice notes; Practice editor (Alt+7): the rules and note templates of the packs.",
            "File > Export the sheet writes the same tolerancing sheet as 'arcwright sheet' on the command line.",
            "Every command is in the menus and in the command finder (Ctrl+K). Ctrl+Z undoes any change to the worksheet.",
            Cautions.ADVICE);

    static void guide(Component parent) {
        WrapLabel text = new WrapLabel(GUIDE, "Label.font", "Label.foreground");
        text.setName("guideText");
        text.setFocusable(true);
        JScrollPane scroll = new JScrollPane(text);
        scroll.setPreferredSize(new Dimension(560, 420));
        JOptionPane.showMessageDialog(parent, scroll, "Arcwright guide", JOptionPane.PLAIN_MESSAGE);
    }

    static void about(Component parent) {
        String text = SheetService.generatedBy() + "\n\nA desktop and command-line assistant for tolerancing fillets, "
                + "rounds and edge radii. Java " + System.getProperty("java.version") + ".\n\n" + Cautions.ADVICE;
        WrapLabel label = new WrapLabel(text, "Label.font", "Label.foreground");
        label.setColumns(40);
        JOptionPane.showMessageDialog(parent, label, "About Arcwright", JOptionPane.PLAIN_MESSAGE);
    }
}
