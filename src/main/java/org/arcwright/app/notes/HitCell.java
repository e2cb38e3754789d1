package org.arcwright.app.notes;

import java.awt.Color;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.font.FontRenderContext;
import java.awt.font.LineBreakMeasurer;
import java.awt.font.TextAttribute;
import java.awt.font.TextLayout;
import java.text.AttributedString;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.swing.JComponent;
import javax.swing.JList;
import javax.swing.ListCellRenderer;
import javax.swing.UIManager;
import org.arcwright.app.widgets.Themes;
import org.arcwright.notes.NoteHit;

/**
 * Paints one search hit: the title in bold with its pack, then up to three lines of the snippet with
 * the matched words in bold. Drawn with text layouts rather than an HTML label, so that listing
 * thirty hits as the user types costs the event thread next to nothing.
 */
final class HitCell extends JComponent implements ListCellRenderer<NoteHit> {
    private static final long serialVersionUID = 1L;
    private static final int SNIPPET_LINES = 3;
    private transient NoteHit hit;
    private boolean selected;
    private Color background;
    private Color foreground;
    /** Laid-out snippets of the hits listed lately; a few screens' worth is plenty. */
    private final transient Map<LayoutKey, List<TextLayout>> layouts = new LinkedHashMap<>(64, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<LayoutKey, List<TextLayout>> eldest) { return size() > 200; }
    };

    @Override
    public Component getListCellRendererComponent(JList<? extends NoteHit> list, NoteHit value, int index,
                                                  boolean isSelected, boolean focus) {
        hit = value;
        selected = isSelected;
        background = isSelected ? list.getSelectionBackground() : list.getBackground();
        foreground = isSelected ? list.getSelectionForeground() : list.getForeground();
        setFont(list.getFont());
        setToolTipText(value == null ? null : value.title() + "  (" + value.pack() + ")");
        return this;
    }

    @Override
    public Dimension getPreferredSize() {
        FontMetrics fm = getFontMetrics(UIManager.getFont("List.font"));
        return new Dimension(120, fm.getHeight() * (1 + SNIPPET_LINES) + 10);
    }

    @Override
    protected void paintComponent(Graphics g) {
        if (hit == null) return;
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g2.setColor(background);
            g2.fillRect(0, 0, getWidth(), getHeight());
            Font base = getFont();
            FontMetrics fm = g2.getFontMetrics(base);
            int x = 6;
            int y = 4 + fm.getAscent();
            g2.setFont(base.deriveFont(Font.BOLD));
            g2.setColor(foreground);
            String title = clipped(hit.title(), g2.getFontMetrics(), getWidth() - 2 * x);
            g2.drawString(title, x, y);
            int w = g2.getFontMetrics().stringWidth(title);
            g2.setFont(base.deriveFont(base.getSize2D() - 1));
            g2.setColor(selected ? foreground : Themes.color("Arcwright.help.foreground"));
            g2.drawString("  " + hit.pack(), x + w, y);
            paintSnippet(g2, base.deriveFont(base.getSize2D() - 1), x, y + fm.getDescent(), getWidth() - 2 * x);
        } finally {
            g2.dispose();
        }
    }

    /** {@code text} cut to {@code width} with an ellipsis; the tooltip carries the whole title. */
    static String clipped(String text, FontMetrics fm, int width) {
        if (fm.stringWidth(text) <= width) return text;
        String ellipsis = "…";
        int end = text.length();
        while (end > 0 && fm.stringWidth(text.substring(0, end).stripTrailing() + ellipsis) > width) end--;
        return text.substring(0, end).stripTrailing() + ellipsis;
    }

    private void paintSnippet(Graphics2D g2, Font font, int x, int top, int width) {
        if (width < 20) return;
        g2.setColor(selected ? foreground : UIManager.getColor("Label.foreground"));
        float y = top;
        for (TextLayout layout : lines(g2.getFontRenderContext(), font, width)) {
            y += layout.getAscent();
            layout.draw(g2, x, y);
            y += layout.getDescent() + layout.getLeading();
        }
    }

    /**
     * The snippet's first lines at {@code width}, laid out once per hit and width: measuring the whole
     * snippet on every paint held the event thread for over 100 ms when thirty hits arrived.
     */
    private List<TextLayout> lines(FontRenderContext frc, Font font, int width) {
        LayoutKey key = new LayoutKey(hit.snippet(), width, font, frc);
        List<TextLayout> cached = layouts.get(key);
        if (cached != null) return cached;
        List<TextLayout> out = layOut(frc, font, width);
        layouts.put(key, out);
        return out;
    }

    private List<TextLayout> layOut(FontRenderContext frc, Font font, int width) {
        String marked = hit.snippet() == null ? "" : hit.snippet().replaceAll("\\s+", " ").strip();
        // only what can fill the lines shown is measured: a generous bound of characters per line
        int budget = SNIPPET_LINES * (width / Math.max(1, getFontMetrics(font).charWidth('i')) + 1);
        StringBuilder plain = new StringBuilder();
        List<int[]> bold = new ArrayList<>();
        int i = 0;
        int start = -1;
        while (i < marked.length() && plain.length() < budget) {
            if (marked.startsWith("**", i)) {
                if (start < 0) start = plain.length(); else { bold.add(new int[] {start, plain.length()}); start = -1; }
                i += 2;
            } else {
                plain.append(marked.charAt(i++));
            }
        }
        if (start >= 0) bold.add(new int[] {start, plain.length()});
        List<TextLayout> out = new ArrayList<>();
        if (plain.length() == 0) return out;
        AttributedString text = new AttributedString(plain.toString());
        text.addAttribute(TextAttribute.FONT, font);
        Font boldFont = font.deriveFont(Font.BOLD);
        for (int[] b : bold) if (b[1] > b[0]) text.addAttribute(TextAttribute.FONT, boldFont, b[0], b[1]);
        LineBreakMeasurer m = new LineBreakMeasurer(text.getIterator(), frc);
        for (int line = 0; line < SNIPPET_LINES && m.getPosition() < plain.length(); line++) out.add(m.nextLayout(width));
        return out;
    }

    /** What a snippet's layout depends on. */
    private record LayoutKey(String snippet, int width, Font font, FontRenderContext frc) {}

}
