package org.arcwright.render.plot;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Font;
import java.awt.font.FontRenderContext;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.arcwright.mechanics.FilletStressAnalysis;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.LoadCase;
import org.arcwright.mechanics.NotchSensitivity;
import org.arcwright.mechanics.PetersonFits;
import org.arcwright.mechanics.ShoulderShape;
import org.arcwright.mechanics.StressConcentration;
import org.arcwright.mechanics.StressPoint;
import org.arcwright.mechanics.StressTarget;
import org.arcwright.mechanics.UltimateStrength;
import org.arcwright.tolerance.Units;
import org.jfree.chart.JFreeChart;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/** The K<sub>t</sub>/K<sub>f</sub> chart: what it draws, and that both formats come out readable. */
class StressPlotTest {
    private static final Path GOLDEN = Path.of("src/test/resources/golden/mechanics/stress-plot-curves.csv");

    private final FilletStressAnalysis analysis =
            new FilletStressAnalysis(new StressConcentration(PetersonFits.published()), new NotchSensitivity());
    private final StressPlot plot = new StressPlot(analysis);
    private final FilletStressCase shaft = FilletStressCase.ofLimits(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING,
            Units.MM, 38, 32, 0.8, 1.2, UltimateStrength.ofMpa(690));

    /** Golden file of the sampled curves; regenerate with -Darcwright.updateGolden=true after a reviewed change. */
    @Test
    void sampledCurvesMatchTheGoldenFile() throws Exception {
        StringBuilder sb = new StringBuilder("r,kt,q,kf,withinFit\n");
        for (StressPoint p : plot.curves(shaft).samples()) {
            sb.append(String.format(Locale.ROOT, "%.6f,%.6f,%.6f,%.6f,%s%n", p.r(), p.kt().kt(), p.q(), p.kf(), p.withinFit()));
        }
        if (Boolean.getBoolean("arcwright.updateGolden")) Files.writeString(GOLDEN, sb.toString());
        assertThat(sb.toString()).isEqualTo(Files.readString(GOLDEN, StandardCharsets.UTF_8));
    }

    @Test
    void pngShowsTheShadedToleranceBand() throws Exception {
        JFreeChart chart = plot.chart(shaft, StressTarget.kf(2.0), analysis.minimumRadius(shaft, StressTarget.kf(2.0)));
        byte[] png = plot.png(chart);
        // for a look by eye after a change (as FramePngTest does for frames)
        Files.createDirectories(Path.of("target/rendered"));
        Files.write(Path.of("target/rendered/stress-plot.png"), png);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        assertThat(img.getWidth()).isEqualTo(StressPlot.WIDTH);
        assertThat(img.getHeight()).isEqualTo(StressPlot.HEIGHT);
        int greenish = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                if (g > r + 12 && g > b + 5) greenish++;
            }
        }
        assertThat(greenish).as("pixels of the shaded band").isGreaterThan(20_000);
    }

    @Test
    void svgIsRepeatableAndCarriesTitleBandTargetAndCaution() {
        JFreeChart chart = plot.chart(shaft, StressTarget.kf(2.0), analysis.minimumRadius(shaft, StressTarget.kf(2.0)));
        String svg = plot.svg(chart);
        assertThat(plot.svg(plot.chart(shaft, StressTarget.kf(2.0), analysis.minimumRadius(shaft, StressTarget.kf(2.0)))))
                .isEqualTo(svg);
        assertThat(svg).startsWith("<?xml").contains("Kt and Kf across the fillet tolerance")
                .contains("tolerance  R 0.8 – 1.2").contains("target Kf ≤ 2").contains("licensed engineer")
                .contains("rgb(31,78,154)");
    }

    /**
     * Golden SVG. Text positions depend on the machine's fonts, so the comparison runs only where
     * the SansSerif font measures as it did when the golden file was made (the fingerprint file).
     * Regenerate with -Darcwright.updateGolden=true after looking at the new chart.
     */
    @Test
    void svgMatchesTheGoldenFileWhereTheFontsMatch() throws Exception {
        Path golden = Path.of("src/test/resources/golden/mechanics/stress-plot.svg");
        Path fonts = Path.of("src/test/resources/golden/mechanics/stress-plot.svg.fonts");
        String svg = plot.svg(plot.chart(shaft, StressTarget.kf(2.0), analysis.minimumRadius(shaft, StressTarget.kf(2.0))));
        if (Boolean.getBoolean("arcwright.updateGolden")) {
            Files.writeString(golden, svg);
            Files.writeString(fonts, fontFingerprint());
        }
        Assumptions.assumeTrue(fontFingerprint().equals(Files.readString(fonts)),
                "this machine's SansSerif font differs from the one the golden SVG was drawn with");
        assertThat(svg).isEqualTo(Files.readString(golden, StandardCharsets.UTF_8));
    }

    private static String fontFingerprint() {
        Font f = new Font("SansSerif", Font.PLAIN, 13);
        double w = f.getStringBounds("Kt and Kf across the fillet tolerance 0123456789 ≤ –",
                new FontRenderContext(null, true, true)).getWidth();
        return String.format(Locale.ROOT, "SansSerif 13 width %.4f%n", w);
    }

    /** Sharp torsion runs outside the fit: the chart draws a separate, dashed stretch for it. */
    @Test
    void extrapolatedStretchIsItsOwnSeries() {
        FilletStressCase sharp = FilletStressCase.ofLimits(ShoulderShape.STEPPED_SHAFT, LoadCase.TORSION, Units.MM,
                45, 30, 1.0, 2.0, null);
        JFreeChart chart = plot.chart(sharp, null, null);
        var data = (XYSeriesCollection) chart.getXYPlot().getDataset();
        assertThat(data.getSeries(0).getItemCount()).isPositive();
        assertThat(data.getSeries(1).getItemCount()).as("extrapolated stretch").isPositive();
    }
}
