package org.arcwright.app.widgets;

import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;

/**
 * A strip under the toolbar that tells the user something that needs an answer without a blocking
 * dialog: recovered autosave, a pack that failed to load, the first-run demo.
 */
public final class NoticeStrip extends JPanel {
    private static final long serialVersionUID = 1L;
    private final JLabel text = new JLabel();
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
        add(text);
        add(first);
        add(second);
        setVisible(false);
        updateUI();
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
