package org.arcwright.render;

import java.awt.Color;
import java.util.Objects;

/**
 * The colours a drawing is made in, so that a window in a dark look can show the same drawing
 * dark. Files (CLI output, golden files) always use {@link #LIGHT}.
 *
 * @param background what the drawing is painted on
 * @param foreground lines, text and the nominal contour
 * @param accent zone boundaries and other highlighted lines
 */
public record Palette(Color background, Color foreground, Color accent) {
    /** Black on white with a blue accent: the printed look. */
    public static final Palette LIGHT = new Palette(Color.WHITE, Color.BLACK, new Color(0x1f, 0x5f, 0xbf));

    public Palette {
        Objects.requireNonNull(background, "background");
        Objects.requireNonNull(foreground, "foreground");
        Objects.requireNonNull(accent, "accent");
    }
}
