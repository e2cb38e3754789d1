package org.arcwright.app.widgets;

import com.formdev.flatlaf.extras.FlatSVGIcon;
import javax.swing.Icon;

/** Arcwright's own SVG icons, sharp at any scale, recoloured by FlatLaf for the dark look. */
public final class Icons {
    private Icons() {}

    /** The icon {@code name}.svg from {@code org/arcwright/app/icons}, at 16×16. */
    public static Icon get(String name) {
        return new FlatSVGIcon("org/arcwright/app/icons/" + name + ".svg");
    }

    /** A larger variant for headers. */
    public static Icon get(String name, int size) {
        return new FlatSVGIcon("org/arcwright/app/icons/" + name + ".svg", size, size);
    }
}
