package org.arcwright.app.shell;

import com.formdev.flatlaf.FlatClientProperties;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JButton;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.widgets.Themes;

/**
 * The strip along the bottom of the window: the latest message, the progress of background work
 * with its cancel button, the selected feature, and which practice packs are in force.
 */
public final class StatusLine extends JPanel {
    private static final long serialVersionUID = 1L;
    private final JLabel message = new JLabel(" ");
    private final JLabel feature = new JLabel();
    private final JLabel packs = new JLabel("Packs: loading…");
    private final JProgressBar progress = new JProgressBar(0, 100);
    private final JButton cancel = new JButton("Cancel");
    private transient Runnable cancelAction;

    public StatusLine() {
        super(new MigLayout("insets 2 8 2 8, gap 12, hidemode 3", "[grow,fill][][][][]", "[]"));
        setName("statusLine");
        message.setName("statusMessage");
        progress.setVisible(false);
        cancel.setVisible(false);
        cancel.putClientProperty(FlatClientProperties.BUTTON_TYPE, FlatClientProperties.BUTTON_TYPE_BORDERLESS);
        cancel.addActionListener(e -> cancelPressed());
        add(message);
        add(progress, "w 120!");
        add(cancel);
        add(feature);
        add(packs);
        setBackground(Themes.color("Arcwright.statusLine.background"));
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setBackground(Themes.color("Arcwright.statusLine.background"));
    }

    public void show(String text) { message.setText(text == null || text.isEmpty() ? " " : text); }

    public String message() { return message.getText(); }

    public void feature(String text) { feature(text, null); }

    /** What a kept verdict of the selected feature judged (the feature field's tooltip), or null. */
    public String featureDetail() { return feature.getToolTipText(); }

    /** The selected feature's state in a few words, and the whole sentence (what a kept verdict judged) as its tooltip. */
    public void feature(String text, String detail) {
        feature.setText(text);
        feature.setToolTipText(detail);
    }

    /** What the status line says about the packs in force. */
    public String packsText() { return packs.getText(); }

    public void packs(String text, String tooltip) {
        packs.setText(text);
        packs.setToolTipText(tooltip);
    }

    /** Shows progress of background work; {@code onCancel} runs when the user presses Cancel. */
    public void progress(String what, int percent, Runnable onCancel) {
        show(what);
        progress.setVisible(true);
        progress.setIndeterminate(percent < 0);
        if (percent >= 0) progress.setValue(percent);
        cancelAction = onCancel;
        cancel.setVisible(onCancel != null);
    }

    /** Shows {@code text} and hides the bar, stopping its animation (a hidden indeterminate bar keeps it). */
    public void done(String text) {
        progress.setIndeterminate(false);
        progress.setVisible(false);
        cancel.setVisible(false);
        cancelAction = null;
        show(text);
    }

    private void cancelPressed() {
        if (cancelAction != null) cancelAction.run();
    }
}
