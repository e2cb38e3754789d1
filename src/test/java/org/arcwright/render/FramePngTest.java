package org.arcwright.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import javax.imageio.metadata.IIOMetadataNode;
import org.arcwright.callout.Callout;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.assertj.core.api.Assertions;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * PNG output decoded back: the frame's cells are where the layout says, rows are twice the
 * lettering height and the symbol cell square (ISO 7083 and ASME Y14.5-2018 frame proportions,
 * from memory), and the text lies inside its cells. The images are also left in
 * {@code target/rendered/} for a reviewer to look at.
 */
class FramePngTest {
    private static final int DPI = 300;
    private static FrameRenderer renderer;

    @BeforeAll
    static void font() {
        renderer = FrameRenderer.withBundledFont();
    }

    private static BufferedImage decode(byte[] png) throws Exception {
        return ImageIO.read(new ByteArrayInputStream(png));
    }

    private static boolean dark(BufferedImage img, int x, int y) {
        if (x < 0 || y < 0 || x >= img.getWidth() || y >= img.getHeight()) return false;
        int rgb = img.getRGB(x, y);
        int grey = ((rgb >> 16 & 0xff) + (rgb >> 8 & 0xff) + (rgb & 0xff)) / 3;
        return grey < 128;
    }

    /** x positions (pixels) of dark vertical runs crossing row y, each run reported at its centre. */
    private static List<Integer> verticalLinesAcross(BufferedImage img, int y) {
        List<Integer> xs = new ArrayList<>();
        int start = -1;
        for (int x = 0; x <= img.getWidth(); x++) {
            boolean d = x < img.getWidth() && dark(img, x, y);
            if (d && start < 0) start = x;
            if (!d && start >= 0) {
                xs.add((start + x - 1) / 2);
                start = -1;
            }
        }
        return xs;
    }

    @Test
    void decodedFrameHasItsCellBordersWhereTheLayoutPutsThem() throws Exception {
        Callout c = CalloutCatalogue.all().get("profile-datum-modifiers").callout();
        CalloutDrawing d = renderer.layout(c, DrawingStyle.ASME, Units.MM);
        BufferedImage img = decode(renderer.png(c, DrawingStyle.ASME, Units.MM, DPI));
        double s = PngPainter.pixelsPerMillimetre(DPI);
        assertThat(img.getWidth()).isEqualTo((int) Math.ceil(d.width() * s));

        List<CalloutDrawing.Cell> cells = d.cells();
        assertThat(cells).extracting(CalloutDrawing.Cell::role).containsExactly(CalloutDrawing.Role.SYMBOL,
                CalloutDrawing.Role.TOLERANCE, CalloutDrawing.Role.DATUM, CalloutDrawing.Role.DATUM, CalloutDrawing.Role.DATUM);
        // scan just below the top border, where only the vertical cell borders are dark
        Rectangle2D sym = cells.get(0).bounds();
        int y = (int) Math.round((sym.getY() + 0.08 * sym.getHeight()) * s);
        List<Integer> lines = verticalLinesAcross(img, y);
        List<Double> expected = new ArrayList<>();
        expected.add(sym.getX());
        for (CalloutDrawing.Cell cell : cells) expected.add(cell.bounds().getMaxX());
        assertThat(lines).hasSize(expected.size());
        for (int i = 0; i < expected.size(); i++) {
            assertThat((double) lines.get(i)).isCloseTo(expected.get(i) * s, Offset.offset(2.0));
        }
        // a row is 2h tall and the symbol cell square: 7 mm at 3.5 mm lettering = 82.7 px at 300 dpi
        double h = CalloutLayout.DEFAULT_LETTER_HEIGHT;
        assertThat(sym.getHeight()).isEqualTo(2 * h);
        assertThat(sym.getWidth()).isEqualTo(sym.getHeight());
        int top = firstDarkDown(img, (int) Math.round(sym.getCenterX() * s), 0);
        int bottom = firstDarkUp(img, (int) Math.round(sym.getCenterX() * s), img.getHeight() - 1);
        assertThat((double) (bottom - top)).isCloseTo(2 * h * s, Offset.offset(3.0));
    }

    private static int firstDarkDown(BufferedImage img, int x, int y) {
        while (y < img.getHeight() && !dark(img, x, y)) y++;
        return y;
    }

    private static int firstDarkUp(BufferedImage img, int x, int y) {
        while (y > 0 && !dark(img, x, y)) y--;
        return y;
    }

    @Test
    void textOfEveryFrameLiesInsideItsCellAndInkIsThere() throws Exception {
        DrawingFont font = DrawingFont.bundled();
        double s = PngPainter.pixelsPerMillimetre(DPI);
        Path out = Path.of("target/rendered");
        Files.createDirectories(out);
        for (CalloutCatalogue.Entry e : CalloutCatalogue.all().values()) {
            CalloutDrawing d = renderer.layout(e.callout(), e.style(), e.units());
            byte[] png = renderer.png(e.callout(), e.style(), e.units(), DPI);
            Files.write(out.resolve(e.name() + ".png"), png);
            BufferedImage img = decode(png);
            for (CalloutDrawing.Mark m : d.marks()) {
                if (!(m instanceof CalloutDrawing.Label t)) continue;
                Rectangle2D ink = font.inkBounds(t.text(), t.size(), t.x(), t.baseline());
                CalloutDrawing.Cell home = d.cells().stream()
                        .filter(c -> c.bounds().contains(ink.getCenterX(), ink.getCenterY())).findFirst().orElse(null);
                assertThat(home).as("%s: label '%s' has a cell", e.name(), t.text()).isNotNull();
                if (home.role() != CalloutDrawing.Role.TEXT) {
                    assertThat(home.bounds().contains(ink)).as("%s: '%s' inside its %s cell", e.name(), t.text(), home.role())
                            .isTrue();
                }
                int darkPixels = 0;
                for (int x = (int) (ink.getMinX() * s); x <= (int) (ink.getMaxX() * s); x++) {
                    for (int y = (int) (ink.getMinY() * s); y <= (int) (ink.getMaxY() * s); y++) {
                        if (dark(img, x, y)) darkPixels++;
                    }
                }
                assertThat(darkPixels).as("%s: ink of '%s'", e.name(), t.text()).isGreaterThan(20);
            }
        }
    }

    @Test
    void resolutionScalesTheImageAndIsRecordedInTheFile() throws Exception {
        Callout c = CalloutCatalogue.all().get("profile-no-datums").callout();
        BufferedImage low = decode(renderer.png(c, DrawingStyle.ASME, Units.MM, 150));
        BufferedImage high = decode(renderer.png(c, DrawingStyle.ASME, Units.MM, 600));
        assertThat((double) high.getWidth() / low.getWidth()).isCloseTo(4.0, Offset.offset(0.05));
        var reader = ImageIO.getImageReadersByFormatName("png").next();
        reader.setInput(ImageIO.createImageInputStream(new ByteArrayInputStream(renderer.png(c, DrawingStyle.ASME, Units.MM, 600))));
        var meta = (IIOMetadataNode) reader.getImageMetadata(0).getAsTree("javax_imageio_1.0");
        var hps = (IIOMetadataNode) meta.getElementsByTagName("HorizontalPixelSize").item(0);
        assertThat(Double.parseDouble(hps.getAttribute("value"))).isCloseTo(25.4 / 600, Offset.offset(1e-4));
    }

    @Test
    void anOutOfRangeResolutionIsBadInput() {
        Callout c = CalloutCatalogue.all().get("profile-no-datums").callout();
        Assertions.assertThatThrownBy(() -> renderer.png(c, DrawingStyle.ASME, Units.MM, 5))
                .isInstanceOf(InputProblem.class).hasMessageContaining("dpi");
    }

    @Test
    void aPaletteDrawsTheSameMarksInItsColoursAndTheDefaultStaysBlackOnWhite() {
        Callout c = CalloutCatalogue.all().get("profile-no-datums").callout();
        BufferedImage light = renderer.image(c, DrawingStyle.ASME, Units.MM, 110);
        Color ground = new Color(0x3a3d40), ink = new Color(0xdfe1e5);
        BufferedImage dark = renderer.image(c, DrawingStyle.ASME, Units.MM, 110, new Palette(ground, ink, ink));
        assertThat(light.getRGB(0, 0) & 0xffffff).isEqualTo(0xffffff);
        assertThat(dark.getRGB(0, 0) & 0xffffff).isEqualTo(0x3a3d40);
        int inked = 0;
        for (int y = 0; y < light.getHeight(); y++) {
            for (int x = 0; x < light.getWidth(); x++) {
                if ((light.getRGB(x, y) & 0xffffff) == 0) {
                    inked++;
                    // a fully inked pixel is the ink, give or take rounding in the compositing
                    Color got = new Color(dark.getRGB(x, y));
                    assertThat(Math.abs(got.getRed() - ink.getRed()) + Math.abs(got.getBlue() - ink.getBlue())).isLessThan(12);
                }
            }
        }
        assertThat(inked).isPositive();
    }
}
