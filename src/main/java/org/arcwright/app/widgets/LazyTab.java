package org.arcwright.app.widgets;

import java.awt.BorderLayout;
import java.awt.Graphics;
import java.awt.event.HierarchyEvent;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.SwingUtilities;

/**
 * A work-area tab whose panel is built the first time it is shown, so that what a tab needs (the
 * chart library for the Stress view, say) is not loaded before the window opens.
 *
 * @param <T> the panel
 */
public final class LazyTab<T extends JComponent> extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient Supplier<T> factory;
    private transient T panel;
    private transient Consumer<T> pending = p -> { };
    private final boolean afterPaint;
    private boolean scheduled;

    public LazyTab(String name, Supplier<T> factory) {
        this(name, factory, false);
    }

    /**
     * A tab built when first shown or, with {@code afterPaint}, just after its empty area has been
     * painted once: for the tab the window opens on, so the first frame does not wait for it.
     */
    public LazyTab(String name, Supplier<T> factory, boolean afterPaint) {
        super(new BorderLayout());
        this.factory = factory;
        this.afterPaint = afterPaint;
        setName(name + "Tab");
        addHierarchyListener(e -> shownMaybe(e));
    }

    /** The panel, building it now if needed. */
    public T panel() {
        if (panel == null) {
            panel = factory.get();
            add(panel, BorderLayout.CENTER);
            pending.accept(panel);
            pending = p -> { };
            revalidate();
        }
        return panel;
    }

    /** Whether the panel exists yet. */
    public boolean isBuilt() { return panel != null; }

    /** Applies {@code change} to the panel now if it exists, else when it is built. */
    public void whenBuilt(Consumer<T> change) {
        if (panel != null) change.accept(panel); else pending = pending.andThen(change);
    }

    private void shownMaybe(HierarchyEvent e) {
        if (!afterPaint && (e.getChangeFlags() & HierarchyEvent.SHOWING_CHANGED) != 0 && isShowing()) panel();
    }

    @Override
    protected void paintComponent(Graphics g) {
        super.paintComponent(g);
        if (afterPaint && panel == null && !scheduled) {
            scheduled = true;
            SwingUtilities.invokeLater(this::panel);
        }
    }
}
