package org.arcwright.app.widgets;

import javax.swing.JTextArea;
import javax.swing.UIManager;
import javax.swing.text.DefaultCaret;

/**
 * Plain text that wraps at its width and reads like a label. Cheaper than an HTML label (no HTML
 * parsing, which is what made the first Decide form slow to build) and selectable for copying.
 */
public final class WrapLabel extends JTextArea {
    private static final long serialVersionUID = 1L;
    private final String fontKey;
    private String colourKey;

    public WrapLabel(String text, String fontKey, String colourKey) {
        super(text);
        this.fontKey = fontKey;
        this.colourKey = colourKey;
        setLineWrap(true);
        // A modest preferred width: layouts grow it to the space they have, and the text wraps there.
        setColumns(16);
        setWrapStyleWord(true);
        setEditable(false);
        setFocusable(false);
        setOpaque(false);
        setBorder(null);
        stayPut();
        restyle();
    }

    /** Changes the colour key (e.g. help to error) and the text, only if they differ. */
    public void show(String text, String newColourKey) {
        if (!text.equals(getText())) setText(text);
        if (!newColourKey.equals(colourKey)) {
            colourKey = newColourKey;
            restyle();
        }
    }

    @Override
    public void updateUI() {
        super.updateUI();
        stayPut();
        restyle();
    }

    /**
     * A label never scrolls its caret into view: a text area's caret follows {@code setText} to
     * the end and drags the enclosing scroll pane down with it (cards opened scrolled to the
     * bottom). The caret is replaced with each look, so this runs again on every look change.
     */
    private void stayPut() {
        if (getCaret() instanceof DefaultCaret) ((DefaultCaret) getCaret()).setUpdatePolicy(DefaultCaret.NEVER_UPDATE);
    }

    private void restyle() {
        if (fontKey == null) return;
        setFont(Themes.font(fontKey));
        setForeground(colourKey == null ? UIManager.getColor("Label.foreground") : Themes.color(colourKey));
        setBackground(UIManager.getColor("Label.background"));
    }
}
