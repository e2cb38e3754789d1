package org.arcwright.app.decide;

import java.awt.Component;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.CardFigures;
import org.arcwright.app.widgets.Card;
import org.arcwright.app.widgets.Icons;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;

/** One recommendation: the callout as drawn, its figures, the reasoning, cautions and notes. */
final class RecommendationCard extends Card {
    private static final long serialVersionUID = 1L;

    RecommendationCard(int rank, Recommendation r, String verdict, DrawingStyle style, BufferedImage frame,
                       Consumer<Recommendation> onChoose,
                       Consumer<Recommendation> onCopy, Consumer<Recommendation> onCopyFrame, boolean chosen) {
        super(new MigLayout("insets 10 12 10 12, wrap 2, gap 6 3", "[][grow,fill]", ""), "card");
        setName("card" + rank);
        setSelected(chosen);
        WrapLabel head = new WrapLabel(rank + ".  " + (r.text() == null ? r.callout().typeName() : r.text()),
                "Arcwright.callout.font", null);
        head.setName("cardCallout");
        add(head, "span 2, growx, wmin 10");
        WrapLabel tag = new WrapLabel(r.demoted() ? "demoted · " + r.ruleId()
                : chosen ? "on the worksheet · " + r.ruleId() : r.ruleId(), "Arcwright.help.font",
                r.demoted() ? "Arcwright.error.foreground" : "Arcwright.help.foreground");
        tag.setName("cardRule");
        add(tag, "span 2, growx, wmin 10");
        if (!verdict.isEmpty()) {
            boolean meets = Boolean.TRUE.equals(r.meetsAll());
            if (!meets) add(new JLabel(Icons.get("caution")), "top");
            WrapLabel v = new WrapLabel(verdict, "Label.font", meets ? "Arcwright.pass.foreground" : "Arcwright.fail.foreground");
            v.setName("cardVerdict");
            add(v, (meets ? "span 2, " : "") + "growx, wmin 10");
        }
        if (frame != null) {
            FramePreview preview = new FramePreview(frame);
            preview.setName("cardFrame");
            preview.setToolTipText("The feature control frame as drawn");
            add(preview, "span 2, left, growx, wmin 10, wmax " + frame.getWidth() + ", gaptop 2, gapbottom 2");
        }
        List<CardFigures.Figure> figures = CardFigures.of(r.numbers().asMap(), style);
        if (!figures.isEmpty()) {
            JPanel grid = new JPanel(new MigLayout("insets 0, wrap 2, gap 10 2", "[45%,fill][55%,fill]", ""));
            grid.setOpaque(false);
            grid.setName("cardNumbers");
            for (CardFigures.Figure f : figures) {
                grid.add(new WrapLabel(f.label(), "Arcwright.help.font", "Arcwright.help.foreground"), "wmin 10, top");
                grid.add(new WrapLabel(f.value(), "Label.font", null), "wmin 10, top");
            }
            add(grid, "span 2, growx, wmin 10, gaptop 4, gapbottom 4");
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
        for (Component c : getComponents()) {
            if (c instanceof JButton && c.isEnabled()) {
                c.requestFocusInWindow();
                return;
            }
        }
    }

    private static WrapLabel wrap(String text, String colourKey) {
        return new WrapLabel(text, "Label.font", colourKey);
    }
}
