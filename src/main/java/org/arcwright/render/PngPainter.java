package org.arcwright.render;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Objects;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.arcwright.io.InputProblem;

/** A {@link CalloutDrawing} as a raster image at a chosen resolution, black on white. */
public final class PngPainter {
    /** Lowest and highest resolutions accepted, dots per inch. */
    public static final int MIN_DPI = 36;
    public static final int MAX_DPI = 2400;

    private final Java2DPainter painter;

    public PngPainter(DrawingFont font) {
        this.painter = new Java2DPainter(Objects.requireNonNull(font, "font"));
    }

    /** The drawing rendered at {@code dpi}. */
    public BufferedImage image(CalloutDrawing d, int dpi) {
        return image(d, dpi, Palette.LIGHT);
    }

    /** The drawing rendered at {@code dpi} in the palette's foreground on its background (the app's dark look). */
    public BufferedImage image(CalloutDrawing d, int dpi, Palette palette) {
        if (dpi < MIN_DPI || dpi > MAX_DPI) {
            throw InputProblem.ofField("dpi", "must be between " + MIN_DPI + " and " + MAX_DPI + ", got " + dpi);
        }
        double scale = pixelsPerMillimetre(dpi);
        int w = (int) Math.ceil(d.width() * scale);
        int h = (int) Math.ceil(d.height() * scale);
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setColor(palette.background());
            g.fillRect(0, 0, w, h);
            painter.paint(g, d, scale, palette.foreground());
        } finally {
            g.dispose();
        }
        return img;
    }

    /** Pixels per millimetre at {@code dpi}. */
    public static double pixelsPerMillimetre(int dpi) { return dpi / 25.4; }

    /** PNG file bytes, with the resolution recorded in the file (pHYs). */
    public byte[] png(CalloutDrawing d, int dpi) {
        return encode(image(d, dpi), dpi);
    }

    /** Encodes an image as PNG bytes with its resolution recorded. */
    public static byte[] encode(BufferedImage img, int dpi) {
        try {
            ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
            IIOMetadata meta = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(img), null);
            String perMetre = Long.toString(Math.round(dpi / 0.0254));
            IIOMetadataNode phys = new IIOMetadataNode("pHYs");
            phys.setAttribute("pixelsPerUnitXAxis", perMetre);
            phys.setAttribute("pixelsPerUnitYAxis", perMetre);
            phys.setAttribute("unitSpecifier", "meter");
            IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
            root.appendChild(phys);
            meta.mergeTree("javax_imageio_png_1.0", root);
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            try (ImageOutputStream out = ImageIO.createImageOutputStream(bytes)) {
                writer.setOutput(out);
                writer.write(new IIOImage(img, null, meta));
            } finally {
                writer.dispose();
            }
            return bytes.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not encode PNG", e);
        }
    }
}
