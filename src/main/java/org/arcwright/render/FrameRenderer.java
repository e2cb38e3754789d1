package org.arcwright.render;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.arcwright.callout.Callout;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * Draws one callout: the service behind {@code arcwright render} and the app's frame preview.
 * Plain arguments in, text, bytes or an image out; thread-safe once built.
 */
public final class FrameRenderer {
    /** Default resolution of PNG output, dots per inch. */
    public static final int DEFAULT_DPI = 300;

    private final CalloutLayout layout;
    private final SvgPainter svg;
    private final PngPainter png;

    public FrameRenderer(DrawingFont font, double letterHeight) {
        Objects.requireNonNull(font, "font");
        this.layout = new CalloutLayout(font, letterHeight);
        this.svg = new SvgPainter(font);
        this.png = new PngPainter(font);
    }

    /** With the bundled font and 3.5 mm lettering. */
    public static FrameRenderer withBundledFont() {
        return new FrameRenderer(DrawingFont.bundled(), CalloutLayout.DEFAULT_LETTER_HEIGHT);
    }

    /** The laid-out drawing, in millimetres. */
    public CalloutDrawing layout(Callout c, DrawingStyle style, Units units) { return layout.layout(c, style, units); }

    /** A complete SVG document. */
    public String svg(Callout c, DrawingStyle style, Units units) { return svg.document(layout(c, style, units)); }

    /** The SVG element alone, for inlining in HTML. */
    public String svgElement(Callout c, DrawingStyle style, Units units) { return svg.element(layout(c, style, units)); }

    /** The drawing at {@code dpi} as an image (the app's preview). */
    public BufferedImage image(Callout c, DrawingStyle style, Units units, int dpi) {
        return png.image(layout(c, style, units), dpi);
    }

    /** As {@link #image(Callout, DrawingStyle, Units, int)}, in the window's colours rather than black on white. */
    public BufferedImage image(Callout c, DrawingStyle style, Units units, int dpi, Palette palette) {
        return png.image(layout(c, style, units), dpi, palette);
    }

    /** PNG file bytes at {@code dpi}. */
    public byte[] png(Callout c, DrawingStyle style, Units units, int dpi) { return png.png(layout(c, style, units), dpi); }

    /** The plain ASCII form. */
    public String plainText(Callout c, DrawingStyle style, Units units) { return new TextFrames(style, units).plain(c); }

    /** The Unicode form with the GD&amp;T code points. */
    public String unicodeText(Callout c, DrawingStyle style, Units units) {
        return new TextFrames(style, units).unicode(c);
    }

    /**
     * What a reader must be told beyond the drawn callout in this style, e.g. that ISO has no
     * controlled radius and the CR is drawn as R (from {@link DrawingStyle#remarks}).
     */
    public List<String> remarks(Callout c, DrawingStyle style, Units units) {
        if (c instanceof Callout.SizeLimits s) return style.remarks(s.toRadiusCallout(units, 4));
        return List.of();
    }

    /**
     * Writes the callout to {@code out}, the format chosen by its extension: {@code .svg},
     * {@code .png} (at {@code dpi}) or {@code .txt} (plain, or Unicode when {@code unicode}).
     * The file is replaced atomically.
     */
    public void write(Path out, Callout c, DrawingStyle style, Units units, int dpi, boolean unicode) {
        String name = out.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".svg")) {
            AtomicFiles.writeString(out, svg(c, style, units));
        } else if (name.endsWith(".png")) {
            AtomicFiles.writeBytes(out, png(c, style, units, dpi));
        } else if (name.endsWith(".txt")) {
            AtomicFiles.writeString(out, unicode ? unicodeText(c, style, units) : plainText(c, style, units));
        } else {
            throw InputProblem.ofField("--out", "unknown output type '" + out.getFileName() + "'; use .svg, .png or .txt");
        }
    }
}
