package org.arcwright.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStream;
import java.util.List;
import java.util.Properties;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The inks the chart and the Zone view's points are drawn in must read in both looks. Contrast
 * ratio and relative luminance as defined by WCAG 2.1 (W3C Recommendation, 2018): at least 4.5:1
 * for text (success criterion 1.4.3), at least 3:1 for lines and marks (1.4.11, non-text contrast).
 */
class ThemeInksContrastTest {

    @ParameterizedTest
    @ValueSource(strings = {"FlatIntelliJLaf", "FlatDarculaLaf"})
    void chartLabelsAndPointsStandOutFromWhatTheyAreDrawnOn(String look) throws Exception {
        Properties p = new Properties();
        try (InputStream in = getClass().getResourceAsStream("/org/arcwright/app/themes/" + look + ".properties")) {
            p.load(in);
        }
        double[] plot = rgba(p.getProperty("Arcwright.zone.background"));
        double[] label = over(rgba(p.getProperty("Arcwright.stress.labelBackground")), plot);
        double[] band = over(withAlpha(rgba(p.getProperty("Arcwright.stress.band")), 60 / 255.0), plot);
        // text: the target's words on their label background, the band's words on the band
        assertThat(contrast(rgba(p.getProperty("Arcwright.stress.target")), label)).as("target label").isGreaterThanOrEqualTo(4.5);
        assertThat(contrast(rgba(p.getProperty("Arcwright.stress.bandText")), band)).as("band label").isGreaterThanOrEqualTo(4.5);
        // lines and marks on the plot
        for (String k : List.of("kt", "kf", "marks", "target")) {
            assertThat(contrast(rgba(p.getProperty("Arcwright.stress." + k)), plot)).as(k).isGreaterThanOrEqualTo(3);
        }
        for (String k : List.of("pointOk", "pointNear", "pointBad", "pointFar")) {
            assertThat(contrast(rgba(p.getProperty("Arcwright.zone." + k)), plot)).as(k).isGreaterThanOrEqualTo(3);
        }
    }

    /** {@code #rrggbb} or {@code #rrggbbaa} as r, g, b, a in 0..1. */
    private static double[] rgba(String hex) {
        String h = hex.trim().substring(1);
        double a = h.length() == 8 ? Integer.parseInt(h.substring(6, 8), 16) / 255.0 : 1;
        return new double[] {Integer.parseInt(h.substring(0, 2), 16) / 255.0, Integer.parseInt(h.substring(2, 4), 16) / 255.0,
            Integer.parseInt(h.substring(4, 6), 16) / 255.0, a};
    }

    private static double[] withAlpha(double[] c, double a) { return new double[] {c[0], c[1], c[2], a}; }

    /** {@code top} composited over the opaque {@code under}. */
    private static double[] over(double[] top, double[] under) {
        double a = top[3];
        return new double[] {top[0] * a + under[0] * (1 - a), top[1] * a + under[1] * (1 - a), top[2] * a + under[2] * (1 - a), 1};
    }

    private static double luminance(double[] c) {
        double[] l = new double[3];
        for (int i = 0; i < 3; i++) l[i] = c[i] <= 0.03928 ? c[i] / 12.92 : Math.pow((c[i] + 0.055) / 1.055, 2.4);
        return 0.2126 * l[0] + 0.7152 * l[1] + 0.0722 * l[2];
    }

    private static double contrast(double[] a, double[] b) {
        double la = luminance(a), lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }
}
