package org.arcwright.app.widgets;

import java.awt.Dimension;
import java.awt.LayoutManager;
import java.awt.Rectangle;
import javax.swing.JPanel;
import javax.swing.Scrollable;

/** A panel that tracks its viewport's width, so text wraps instead of scrolling sideways. */
public final class ScrollablePanel extends JPanel implements Scrollable {
    private static final long serialVersionUID = 1L;

    public ScrollablePanel(LayoutManager layout) { super(layout); }

    public Dimension getPreferredScrollableViewportSize() { return getPreferredSize(); }

    public int getScrollableUnitIncrement(Rectangle r, int orientation, int direction) { return 16; }

    public int getScrollableBlockIncrement(Rectangle r, int orientation, int direction) { return r.height - 32; }

    public boolean getScrollableTracksViewportWidth() { return true; }

    public boolean getScrollableTracksViewportHeight() { return false; }
}
