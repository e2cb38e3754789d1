package org.arcwright.app.decide;

import java.util.Map;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JLabel;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.shell.Card;
import org.arcwright.app.shell.Icons;
import org.arcwright.app.shell.Themes;
import org.arcwright.app.shell.WrapLabel;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.Recommendation;

/** One recommendation: the callout as drawn, its figures, the reasoning, cautions and notes. */
final class RecommendationCard extends Card {
    private static final long serialVersionUID = 1L;

    RecommendationCard(int rank, Recommendation r, java.awt.image.BufferedImage frame, Consumer<Recommendation> onChoose,
                       Consumer<Recommendation> onCopy, Consumer<Recommendation> onCopyFrame, boolean chosen) {
        super(new MigLayout("insets 10 12 10 12, wrap 2, gap 6 3", "[][grow,fill]", ""), "card");
        setName("card" + rank);
        setSelected(chosen);
        JLabel head = new JLabel(rank + ".  " + (r.text() == null ? r.callout().typeName() : r.text()));
        head.setName("cardCallout");
        head.setFont(Themes.font("Arcwright.callout.font"));
        add(head, "span 2, split 2");
        JLabel tag = new JLabel(r.demoted() ? "demoted" : chosen ? "on the worksheet" : r.ruleId());
        tag.putClientProperty("FlatLaf.styleClass", "small");
        tag.setForeground(Themes.color(r.demoted() ? "Arcwright.error.foreground" : "Arcwright.help.foreground"));
        add(tag, "gapleft push");
        if (frame != null) {
            JLabel preview = new JLabel(new javax.swing.ImageIcon(frame));
            preview.setName("cardFrame");
            preview.setToolTipText("The feature control frame as drawn");
            add(preview, "span 2, left, gaptop 2, gapbottom 2");
        }
        if (!r.numbers().isEmpty()) {
            StringBuilder sb = new StringBuilder();
            for (Map.Entry<String, Object> e : r.numbers().entrySet()) {
                if (sb.length() > 0) sb.append("  ·  ");
                sb.append(label(e.getKey())).append(" ").append(value(e.getValue()));
            }
            WrapLabel numbers = new WrapLabel(sb.toString(), "Arcwright.figure.font", null);
            numbers.setName("cardNumbers");
            add(numbers, "span 2, growx, wmin 10");
        }
        for (String b : r.because()) add(wrap("• " + b, null), "span 2, growx, wmin 10");
        for (String c : r.cautions()) {
            add(new JLabel(Icons.get("caution")), "top");
            add(wrap(c, null), "growx, wmin 10");
        }
        for (NoteLink n : r.notes()) add(wrap("Note: " + n.title() + " (" + n.pack() + ")", "Arcwright.help.foreground"), "span 2, growx, wmin 10");
        if (!r.references().isEmpty()) {
            add(wrap("References: " + String.join("; ", r.references()), "Arcwright.help.foreground"), "span 2, growx, wmin 10");
        }
        JButton choose = new JButton(chosen ? "Chosen" : "Put on worksheet");
        choose.setName("choose" + rank);
        choose.setEnabled(!chosen);
        choose.setToolTipText(chosen ? "Already the callout of this feature" : "Make this the feature's callout (undo with Ctrl+Z)");
        choose.addActionListener(e -> onChoose.accept(r));
        JButton copy = new JButton("Copy text", Icons.get("copy"));
        copy.setName("copy" + rank);
        copy.setToolTipText("Copy the callout text to the clipboard");
        copy.addActionListener(e -> onCopy.accept(r));
        JButton copyFrame = new JButton("Copy frame");
        copyFrame.setName("copyFrame" + rank);
        copyFrame.setEnabled(frame != null);
        copyFrame.setToolTipText(frame != null ? "Copy the feature control frame as an image"
                : "Unavailable: this callout has no frame drawing");
        copyFrame.addActionListener(e -> onCopyFrame.accept(r));
        add(choose, "span 2, gaptop 6");
        add(copy, "span 2, split 2");
        add(copyFrame);
    }

    /** Gives the keyboard focus to the card's first enabled button. */
    void focusFirstButton() {
        for (java.awt.Component c : getComponents()) {
            if (c instanceof JButton && c.isEnabled()) {
                c.requestFocusInWindow();
                return;
            }
        }
    }

    private static WrapLabel wrap(String text, String colourKey) {
        return new WrapLabel(text, "Label.font", colourKey);
    }

    private static String label(String key) {
        StringBuilder sb = new StringBuilder();
        for (char ch : key.toCharArray()) {
            if (Character.isUpperCase(ch)) sb.append(' ').append(Character.toLowerCase(ch)); else sb.append(ch);
        }
        return sb.toString();
    }

    private static String value(Object v) {
        if (v instanceof Double) return Numbers.trim(Math.round((Double) v * 1e4) / 1e4);
        return String.valueOf(v);
    }
}
