package org.arcwright.app.widgets;

import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;

/**
 * A strip under the toolbar that tells the user something that needs an answer without a blocking
 * dialog: recovered autosave, a pack that failed to load, the first-run demo.
 */
public final class NoticeStrip extends JPanel {
    private static final long serialVersionUID = 1L;
    /** Wraps, so a long message in a narrow window leaves room for the answers beside it. */
    private final WrapLabel text = new WrapLabel("", "Label.font", "Label.foreground");
    private final JButton first = new JButton();
    private final JButton second = new JButton();
    private transient Runnable firstAction;
    private transient Runnable secondAction;

    public NoticeStrip() {
        super(new MigLayout("insets 6 10 6 10, hidemode 3", "[grow,fill][][]", "[]"));
        setName("notice");
        first.setName("noticeFirst");
        second.setName("noticeSecond");
        first.addActionListener(e -> firstPressed());
        second.addActionListener(e -> secondPressed());
        add(text, "wmin 10");
        add(first, "aligny top");
        add(second, "aligny top");
        setVisible(false);
        updateUI();
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { refit(); }
        });
    }

    /** A new width wraps the message to another number of lines: lay the window out again for the strip's height. */
    private void refit() {
        if (!isVisible() || getParent() == null) return;
        // the cached sizes were measured at the old width: drop them here and in the panel above,
        // which sets this strip's height from them
        invalidate();
        getParent().invalidate();
        if (getParent() instanceof JComponent p) p.revalidate();
    }

    /** Whether the whole message shows: the strip is as high as its wrapped lines need (tests). */
    public boolean messageFullyShown() {
        return !isVisible() || (getHeight() >= getPreferredSize().height && text.getHeight() >= text.getPreferredSize().height);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setBackground(Themes.color("Arcwright.notice.background"));
    }

    /** Shows {@code message} with up to two answers (null label: no button). */
    public void show(String message, String firstLabel, Runnable onFirst, String secondLabel, Runnable onSecond) {
        text.setText(message);
        first.setText(firstLabel);
        first.setVisible(firstLabel != null);
        second.setText(secondLabel);
        second.setVisible(secondLabel != null);
        firstAction = onFirst;
        secondAction = onSecond;
        setVisible(true);
        revalidate();
    }

    public String message() { return text.getText(); }

    public void dismiss() {
        setVisible(false);
        revalidate();
    }

    private void firstPressed() {
        dismiss();
        if (firstAction != null) firstAction.run();
    }

    private void secondPressed() {
        dismiss();
        if (secondAction != null) secondAction.run();
    }
}
