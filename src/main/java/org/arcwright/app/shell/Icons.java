package org.arcwright.app.shell;

import com.formdev.flatlaf.extras.FlatSVGIcon;
import javax.swing.Icon;

/** Arcwright's own SVG icons, sharp at any scale, recoloured by FlatLaf for the dark look. */
public final class Icons {
    private Icons() {}

    /** The icon {@code name}.svg from {@code org/arcwright/app/icons}, at 16×16. */
    public static Icon get(String name) {
        return new FlatSVGIcon("org/arcwright/app/icons/" + name + ".svg");
    }

    /** The icons the first frame paints: toolbars, tabs, the Notes panel and the pending Decide tab. */
    private static final java.util.List<String> FIRST_FRAME = java.util.List.of("new", "open", "save", "undo", "redo",
            "copy", "export", "finder", "theme", "decide", "zone", "stress", "check", "practice", "add", "duplicate",
            "delete", "notes");

    /**
     * Settles whether the look is dark, which every icon asks first; call after the look is installed
     * and before the event thread builds the window, so that {@link #preload()} may then run beside it.
     */
    public static void prepare() {
        FlatSVGIcon.isDarkLaf();
    }

    /**
     * Parses the first frame's SVG files into FlatLaf's shared (synchronised) document cache, on the
     * calling thread; the event thread then finds them parsed when it lays out and paints the window.
     */
    public static void preload() {
        for (String name : FIRST_FRAME) new FlatSVGIcon("org/arcwright/app/icons/" + name + ".svg").hasFound();
    }

    /** A larger variant for headers. */
    public static Icon get(String name, int size) {
        return new FlatSVGIcon("org/arcwright/app/icons/" + name + ".svg", size, size);
    }
}
