package org.arcwright.app.shell;

import java.awt.BorderLayout;
import java.awt.event.HierarchyEvent;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.JComponent;
import javax.swing.JPanel;

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

    public LazyTab(String name, Supplier<T> factory) {
        super(new BorderLayout());
        this.factory = factory;
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

    /** Applies {@code change} to the panel now if it exists, else when it is built. */
    public void whenBuilt(Consumer<T> change) {
        if (panel != null) change.accept(panel); else pending = pending.andThen(change);
    }

    private void shownMaybe(HierarchyEvent e) {
        if ((e.getChangeFlags() & HierarchyEvent.SHOWING_CHANGED) != 0 && isShowing()) panel();
    }
}
