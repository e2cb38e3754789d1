package org.arcwright.app.widgets;

import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.Document;

/**
 * Tells of every edit of a text: a character typed or removed, a paste, a replaced text. Swing's
 * listener has three methods for this; a panel wants one call, and only that call (the listener
 * dispatches, the panel decides).
 */
public final class TextEdits {
    private TextEdits() {}

    /** Calls {@code edited} after each change to {@code document}'s text or attributes. */
    public static void onEdit(Document document, Runnable edited) {
        document.addDocumentListener(new DocumentListener() {
            @Override public void insertUpdate(DocumentEvent e) { edited.run(); }
            @Override public void removeUpdate(DocumentEvent e) { edited.run(); }
            @Override public void changedUpdate(DocumentEvent e) { edited.run(); }
        });
    }
}
