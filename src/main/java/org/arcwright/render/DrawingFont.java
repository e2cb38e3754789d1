package org.arcwright.render;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.Shape;
import java.awt.font.FontRenderContext;
import java.awt.font.GlyphVector;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The bundled open font (DejaVu Sans, Bitstream Vera licence, file beside it in the resources).
 * Outlines are taken at a large reference size and scaled, so that text has the same shape at
 * every size and on every machine, whatever fonts the system has.
 */
public final class DrawingFont {
    /** Classpath location of the font file. */
    public static final String RESOURCE = "/arcwright/fonts/DejaVuSans.ttf";
    /** Height of a capital letter as a fraction of the font size (DejaVu Sans: 1493 of 2048 units). */
    public static final double CAP_HEIGHT = 1493.0 / 2048.0;

    private static final float REFERENCE_SIZE = 100f;
    private static final FontRenderContext FRC = new FontRenderContext(new AffineTransform(), true, true);

    private final Font font;

    private DrawingFont(Font font) {
        this.font = font;
    }

    /** Loads the bundled font. */
    public static DrawingFont bundled() {
        try (InputStream in = DrawingFont.class.getResourceAsStream(RESOURCE)) {
            if (in == null) throw new IllegalStateException("bundled font missing from the classpath: " + RESOURCE);
            return new DrawingFont(Font.createFont(Font.TRUETYPE_FONT, in).deriveFont(REFERENCE_SIZE));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the bundled font", e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("bundled font is damaged", e);
        }
    }

    /** Advance width of {@code text} at font size {@code size}. */
    public double width(String text, double size) {
        if (text.isEmpty()) return 0;
        GlyphVector gv = font.createGlyphVector(FRC, text);
        return gv.getLogicalBounds().getWidth() * size / REFERENCE_SIZE;
    }

    /** The font size whose capital letters are {@code capHeight} tall. */
    public static double sizeForCapHeight(double capHeight) { return capHeight / CAP_HEIGHT; }

    /** The outline of {@code text} at font size {@code size} with its baseline starting at (x, y). */
    public Shape outline(String text, double size, double x, double y) {
        GlyphVector gv = font.createGlyphVector(FRC, text);
        Shape ref = gv.getOutline();
        AffineTransform t = new AffineTransform();
        t.translate(x, y);
        t.scale(size / REFERENCE_SIZE, size / REFERENCE_SIZE);
        return t.createTransformedShape(ref);
    }

    /** Ink bounds of {@code text} at {@code size} with baseline at (x, y). */
    public Rectangle2D inkBounds(String text, double size, double x, double y) {
        return outline(text, size, x, y).getBounds2D();
    }

    /** True when the font has a glyph for every character of {@code text}. */
    public boolean canDisplay(String text) { return font.canDisplayUpTo(text) < 0; }
}
