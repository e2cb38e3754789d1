package org.arcwright.app.widgets;

import com.formdev.flatlaf.FlatClientProperties;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;

/** Stands in for a panel whose core capability is not in this build yet, and says so plainly. */
public final class PendingPanel extends JPanel {
    private static final long serialVersionUID = 1L;

    public PendingPanel(String name, String title, String whatItDoes, String icon) {
        super(new MigLayout("insets 24, wrap 1, gap 8", "[grow,fill]", "push[][][]push"));
        setName(name);
        add(new JLabel(Icons.get(icon, 48)), "center");
        JLabel t = new JLabel(title);
        t.putClientProperty(FlatClientProperties.STYLE_CLASS, "h2");
        add(t, "center");
        add(new WrapLabel(whatItDoes + "\n\nNot available in this build yet: its calculation is still being added to "
                + "Arcwright's core.", "Label.font", "Arcwright.help.foreground"), "wmin 10, wmax 420lp, center");
    }
}
