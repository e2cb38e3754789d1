package org.arcwright.app.widgets;

import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.LayoutManager;
import java.awt.RenderingHints;
import javax.swing.JPanel;
import javax.swing.UIManager;

/**
 * A rounded panel with the theme's card background and border, used for recommendation cards,
 * cautions and figure boxes. {@code style} picks the key family: {@code card} or {@code caution}.
 */
public class Card extends JPanel {
    private static final long serialVersionUID = 1L;
    private final String style;
    private boolean selected;

    public Card(LayoutManager layout, String style) {
        super(layout);
        this.style = style;
        setOpaque(false);
    }

    public void setSelected(boolean selected) {
        this.selected = selected;
        repaint();
    }

    @Override
    protected void paintComponent(Graphics g) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            int arc = UIManager.getInt("Component.arc") * 2;
            g2.setColor(Themes.color("Arcwright." + style + ".background"));
            g2.fillRoundRect(0, 0, getWidth() - 1, getHeight() - 1, arc, arc);
            g2.setColor(Themes.color(selected ? "Arcwright.card.selectedBorder" : "Arcwright." + style + ".border"));
            g2.drawRoundRect(0, 0, getWidth() - 1, getHeight() - 1, arc, arc);
        } finally {
            g2.dispose();
        }
        super.paintComponent(g);
    }
}
