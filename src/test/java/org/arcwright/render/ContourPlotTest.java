package org.arcwright.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Verdict;
import org.arcwright.io.JsonFiles;
import org.arcwright.testing.Golden;
import org.arcwright.tolerance.RadiusKind;
import org.jfree.svg.SVGGraphics2D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The plot's content against golden files: every label drawn and how many points got each colour.
 * Positions depend on the fonts installed, so they are left out. Regenerate with
 * {@code -Dgolden.update=true} and review the diff.
 */
class ContourPlotTest {
    @TempDir
    Path dir;

    private InspectionResult inspect(String example) {
        Path file = Path.of("examples/inspect", example);
        return new Inspector().inspect(new InspectionFiles(new JsonFiles()).read(file).withCompare(false));
    }

    static String content(String svg) {
        List<String> lines = new ArrayList<>();
        Matcher t = Pattern.compile("<text[^>]*>([^<]*)</text>").matcher(svg);
        while (t.find()) lines.add("text: " + t.group(1).replace("&gt;", ">").replace("&lt;", "<").replace("&amp;", "&"));
        Map<String, Integer> fills = new TreeMap<>();
        Matcher e = Pattern.compile("<ellipse [^>]*rx='(\\d+\\.?\\d*)'[^>]*style='fill:(rgb\\([^)]*\\))").matcher(svg);
        while (e.find()) fills.merge("dots r=" + e.group(1) + " " + e.group(2), 1, Integer::sum);
        fills.forEach((k, v) -> lines.add(k + ": " + v));
        return String.join("\n", lines) + "\n";
    }

    @Test
    void radiusPlotShowsVerdictEnvelopeFitsWorstPointAndMagnification() throws IOException {
        Path svg = dir.resolve("r.svg");
        new ContourPlot().write(inspect("bracket-round-r.json"), svg);
        String text = Files.readString(svg);
        assertThat(text).as("no clip paths, which some SVG viewers ignore").doesNotContain("clip-path");
        Golden.assertMatches("inspect/plot-bracket-round-r.txt", content(text));
    }

    @Test
    void theWorstPointsLabelSaysWhatItsFigureMeasures() throws IOException {
        // before: "worst #44: outside by 4.665 mm (local radius)", which reads as a point 4.7 mm
        // out; the figure is how much larger than its 2.1 limit the window's local radius is
        Path svg = dir.resolve("cr.svg");
        new ContourPlot().write(inspect("bracket-round-cr-flat.json"), svg);
        String worst = content(Files.readString(svg)).lines().filter(l -> l.startsWith("text: worst")).findFirst().orElseThrow();
        assertThat(worst).doesNotContain("outside by").containsPattern("local radius [0-9.]+ mm ± [0-9.]+ mm, limit 2\\.1 mm");
        new ContourPlot().write(inspect("bracket-round-r.json"), svg);
        worst = content(Files.readString(svg)).lines().filter(l -> l.startsWith("text: worst")).findFirst().orElseThrow();
        assertThat(worst).contains("mm of radius");
    }

    @Test
    void filletProfilePlotShowsZoneDispositionAndRequiredZone() throws IOException {
        Path svg = dir.resolve("p.svg");
        new ContourPlot().write(inspect("housing-fillet-profile.json"), svg);
        Golden.assertMatches("inspect/plot-housing-fillet-profile.txt", content(Files.readString(svg)));
    }

    /**
     * A window draws the plot at its own size and type: nothing lands outside the size given, the
     * summary and the legend wrap to it, and the crescent's magnification is the file's.
     */
    @Test
    void drawnAtAPanelsSizeEverythingStaysInsideIt() {
        InspectionResult r = inspect("bracket-round-r.json");
        int w = 420, h = 360, margin = 60;
        for (boolean summary : new boolean[] {false, true}) {
            BufferedImage img = new BufferedImage(w + 2 * margin, h + 2 * margin, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            g.setColor(Color.MAGENTA);
            g.fillRect(0, 0, img.getWidth(), img.getHeight());
            g.translate(margin, margin);
            new ContourPlot().draw(r, g, w, h, new Font(Font.SANS_SERIF, Font.PLAIN, 15), summary);
            g.dispose();
            int outside = 0;
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    boolean in = x >= margin && x < margin + w && y >= margin && y < margin + h;
                    if (!in && img.getRGB(x, y) != Color.MAGENTA.getRGB()) outside++;
                }
            }
            assertThat(outside).as("pixels drawn outside %d x %d (summary %s)", w, h, summary).isZero();
        }
        SVGGraphics2D svg = new SVGGraphics2D(w, h);
        new ContourPlot().draw(r, svg, w, h, new Font(Font.SANS_SERIF, Font.PLAIN, 15), false);
        String text = content(svg.getSVGDocument());
        // the same magnification as the file's plot (golden plot-bracket-round-r.txt), no summary
        assertThat(text).contains("text: deviations from nominal magnified ×5").doesNotContain("text: PASS")
                .contains("text: zone boundary");
    }

    /**
     * A worst window beyond a limit by less than its uncertainty is not a proven excess (ISO 14253-1
     * default decision rule): the label says so, where it read as a plain "outside" before.
     */
    @Test
    void anUnprovenExcessIsLabelledAsSuch() throws IOException {
        InspectionRequest file = new InspectionFiles(new JsonFiles()).read(Path.of("examples/inspect/housing-fillet-profile.json"));
        InspectionResult r = new Inspector().inspect(file.withCompare(false)
                .withCallout(new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.8, 2.2)).withUncertainty(0.01));
        assertThat(r.verdict()).isEqualTo(Verdict.INDETERMINATE);
        assertThat(r.worst().excess()).isPositive();
        Path svg = dir.resolve("u.svg");
        new ContourPlot().write(r, svg);
        assertThat(content(Files.readString(svg))).containsPattern(
                "text: worst #\\d+[^\\n]*, within the uncertainty: not proven");
    }

    @Test
    void pngIsTheStatedSize() throws IOException {
        byte[] png = new ContourPlot().png(inspect("bracket-round-cr-flat.json"));
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        assertThat(img.getWidth()).isEqualTo(ContourPlot.WIDTH);
        assertThat(img.getHeight()).isEqualTo(ContourPlot.HEIGHT);
    }
}
