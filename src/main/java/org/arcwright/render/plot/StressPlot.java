package org.arcwright.render.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.function.Predicate;
import java.util.function.ToDoubleFunction;
import javax.imageio.ImageIO;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.mechanics.Cautions;
import org.arcwright.mechanics.FilletStressAnalysis;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.MinimumRadius;
import org.arcwright.mechanics.StressPoint;
import org.arcwright.mechanics.StressTarget;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.LengthAdjustmentType;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * K<sub>t</sub> (and K<sub>f</sub> with a strength) against the fillet radius, with the tolerance
 * band shaded, the three evaluated points marked, extrapolated stretches dashed, and the target
 * and the smallest radius that meets it when asked for.
 */
public final class StressPlot {
    /** Size of the image, pixels (PNG) or user units (SVG). */
    public static final int WIDTH = 900;
    public static final int HEIGHT = 560;
    private static final int SAMPLES = 160;
    private static final String FONT = "SansSerif";

    /**
     * The colours and label fonts a chart is drawn in, so that a window in a dark look can draw it
     * dark and legible. Files (CLI output, golden files) always use {@link #PRINTED}.
     *
     * @param background around the plot
     * @param plotBackground inside the axes
     * @param text titles, axis labels, tick labels and the legend
     * @param note the caution under the chart
     * @param axisLine axis lines and tick marks
     * @param grid grid lines
     * @param outline the plot's outline
     * @param kt the K<sub>t</sub> curve
     * @param kf the K<sub>f</sub> curve
     * @param band the tolerance band (shaded translucent)
     * @param bandText the band's label
     * @param target the target line, the smallest-radius line and their labels
     * @param marks the dots at the smallest, nominal and largest radius
     * @param labelBackground behind the labels that sit over curves and grid (translucent)
     * @param labelFont the factor label at the smallest radius; the band label is its bold
     * @param markerFont the labels of the target and smallest-radius lines
     */
    public record Inks(Color background, Color plotBackground, Color text, Color note, Color axisLine, Color grid,
                       Color outline, Color kt, Color kf, Color band, Color bandText, Color target, Color marks,
                       Color labelBackground, Font labelFont, Font markerFont) {
        /** The printed look: dark ink on white. */
        public static final Inks PRINTED = new Inks(Color.WHITE, Color.WHITE, Color.BLACK, new Color(0x555555), Color.GRAY,
                new Color(0xdddddd), new Color(0x999999), new Color(0x1f4e9a), new Color(0xc0571b), new Color(0x3c9d5d),
                new Color(0x3c9d5d).darker(), new Color(0xb0182b), Color.BLACK, new Color(255, 255, 255, 210),
                new Font(FONT, Font.PLAIN, 13), new Font(FONT, Font.PLAIN, 12));

        public Inks {
            for (Object o : new Object[] {background, plotBackground, text, note, axisLine, grid, outline, kt, kf, band,
                bandText, target, marks, labelBackground, labelFont, markerFont}) {
                Objects.requireNonNull(o, "ink");
            }
        }
    }

    private final FilletStressAnalysis analysis;

    public StressPlot(FilletStressAnalysis analysis) {
        this.analysis = Objects.requireNonNull(analysis, "analysis");
    }

    /** The curves the chart draws, sampled over the plotted range of r (exposed for tests and tables). */
    public record Curves(List<StressPoint> samples, double rFrom, double rTo) {}

    /** Samples K<sub>t</sub>/K<sub>f</sub> from half the smallest radius to twice the largest (within the step). */
    public Curves curves(FilletStressCase c) {
        return curves(c, Double.NaN);
    }

    /** As {@link #curves(FilletStressCase)}, widened to show {@code alsoShow} (NaN for nothing) with some room. */
    public Curves curves(FilletStressCase c, double alsoShow) {
        double h = c.stepHeight();
        double from = Math.max(h / 40, c.rMin() / 2);
        double to = Math.min(h, Math.max(2 * c.rMax(), c.rMax() + 2 * (c.rMax() - c.rMin())));
        if (Double.isFinite(alsoShow)) {
            from = Math.max(h / 40, Math.min(from, alsoShow / 1.3));
            to = Math.min(h, Math.max(to, alsoShow * 1.3));
        }
        if (to <= from) from = to / 2;
        List<StressPoint> pts = new ArrayList<>();
        for (int i = 0; i <= SAMPLES; i++) pts.add(analysis.point(c, from + (to - from) * i / SAMPLES));
        return new Curves(pts, from, to);
    }

    /**
     * The chart.
     *
     * @param target the target asked for, or null
     * @param minimum the smallest radius for the target, or null
     */
    public JFreeChart chart(FilletStressCase c, StressTarget target, MinimumRadius minimum) {
        return chart(c, target, minimum, Inks.PRINTED);
    }

    /** As {@link #chart(FilletStressCase, StressTarget, MinimumRadius)}, drawn in {@code ink}. */
    public JFreeChart chart(FilletStressCase c, StressTarget target, MinimumRadius minimum, Inks ink) {
        Curves curves = curves(c, minimum != null && minimum.found() ? minimum.radius() : Double.NaN);
        boolean withKf = c.strength() != null;
        XYSeriesCollection data = new XYSeriesCollection();
        XYSeries kt = new XYSeries("Kt  (Peterson's fit)", false, true);
        XYSeries ktOut = new XYSeries("Kt  extrapolated, outside the fit", false, true);
        XYSeries kf = new XYSeries("Kf  (Neuber, " + strengthText(c) + ")", false, true);
        XYSeries kfOut = new XYSeries("Kf  extrapolated", false, true);
        List<StressPoint> pts = curves.samples();
        stretch(pts, kt, true, p -> p.kt().withinFit(), p -> p.kt().kt());
        stretch(pts, ktOut, false, p -> p.kt().withinFit(), p -> p.kt().kt());
        data.addSeries(kt);
        data.addSeries(ktOut);
        if (withKf) {
            stretch(pts, kf, true, StressPoint::withinFit, StressPoint::kf);
            stretch(pts, kfOut, false, StressPoint::withinFit, StressPoint::kf);
            data.addSeries(kf);
            data.addSeries(kfOut);
        }
        XYSeries marks = new XYSeries(c.hasTolerance() ? "at r min, nominal, max" : "at R " + DecimalText.significant(c.rNominal(), 4), false, true);
        StressPoint[] three = {analysis.point(c, c.rMin()), analysis.point(c, c.rNominal()), analysis.point(c, c.rMax())};
        for (StressPoint p : three) {
            marks.add(p.r(), p.kt().kt());
            if (withKf) marks.add(p.r(), p.kf());
        }
        data.addSeries(marks);

        String u = c.units().symbol();
        NumberAxis x = new NumberAxis("fillet radius r (" + u + ")");
        x.setAutoRangeIncludesZero(false);
        x.setRange(curves.rFrom(), curves.rTo());
        NumberAxis y = new NumberAxis("stress-concentration factor");
        y.setAutoRangeIncludesZero(false);
        y.setAutoRangeMinimumSize(0.2);
        Font axisFont = new Font(FONT, Font.PLAIN, 14);
        x.setLabelFont(axisFont);
        y.setLabelFont(axisFont);
        x.setTickLabelFont(new Font(FONT, Font.PLAIN, 12));
        y.setTickLabelFont(new Font(FONT, Font.PLAIN, 12));
        for (NumberAxis a : new NumberAxis[] {x, y}) {
            a.setLabelPaint(ink.text());
            a.setTickLabelPaint(ink.text());
            a.setAxisLinePaint(ink.axisLine());
            a.setTickMarkPaint(ink.axisLine());
        }

        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(true);
        BasicStroke solid = new BasicStroke(2.4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        BasicStroke dashed = new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {7f, 5f}, 0f);
        int s = 0;
        r.setSeriesPaint(s, ink.kt());
        r.setSeriesStroke(s++, solid);
        r.setSeriesPaint(s, ink.kt());
        r.setSeriesStroke(s++, dashed);
        if (withKf) {
            r.setSeriesPaint(s, ink.kf());
            r.setSeriesStroke(s++, solid);
            r.setSeriesPaint(s, ink.kf());
            r.setSeriesStroke(s++, dashed);
        }
        r.setSeriesLinesVisible(s, false);
        r.setSeriesShapesVisible(s, true);
        r.setSeriesPaint(s, ink.marks());
        r.setSeriesShape(s, new Ellipse2D.Double(-4.5, -4.5, 9, 9));
        for (int i = 0; i < data.getSeriesCount(); i++) {
            if (data.getSeries(i).getItemCount() == 0) r.setSeriesVisibleInLegend(i, false);
        }

        XYPlot plot = new XYPlot(data, x, y, r);
        plot.setBackgroundPaint(ink.plotBackground());
        plot.setDomainGridlinePaint(ink.grid());
        plot.setRangeGridlinePaint(ink.grid());
        plot.setOutlinePaint(ink.outline());
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);

        Color bandInk = ink.band();
        IntervalMarker band = new IntervalMarker(c.rMin(), c.rMax(), alpha(bandInk, 60),
                new BasicStroke(1f), null, null, 1f);
        if (c.rMax() - c.rMin() < (curves.rTo() - curves.rFrom()) / 300) {
            band = new IntervalMarker(c.rMin() - (curves.rTo() - curves.rFrom()) / 600,
                    c.rMax() + (curves.rTo() - curves.rFrom()) / 600, alpha(bandInk, 90));
        }
        band.setLabel(c.hasTolerance() ? "tolerance  R " + DecimalText.significant(c.rMin(), 4) + " – " + DecimalText.significant(c.rMax(), 4) : "R " + DecimalText.significant(c.rNominal(), 4));
        band.setLabelFont(ink.labelFont().deriveFont(Font.BOLD));
        band.setLabelPaint(ink.bandText());
        band.setLabelAnchor(RectangleAnchor.TOP);
        band.setLabelTextAnchor(TextAnchor.TOP_CENTER);
        band.setLabelOffset(new RectangleInsets(6, 0, 0, 0));
        band.setLabelBackgroundColor(alpha(ink.labelBackground(), 0));
        plot.addDomainMarker(band, Layer.BACKGROUND);

        StressPoint atMin = three[0];
        String minText = String.format(Locale.ROOT, "at %s %s:  Kt %s%s", c.hasTolerance() ? "r min" : "R", DecimalText.significant(c.rMin(), 4),
                DecimalText.fixed(atMin.kt().kt(), 2),
                withKf ? ", Kf " + DecimalText.fixed(atMin.kf(), 2) : "");
        double dx = (curves.rTo() - curves.rFrom()) / 120;
        boolean rightHalf = c.rMin() > (curves.rFrom() + curves.rTo()) / 2;
        XYTextAnnotation label = new XYTextAnnotation(minText, c.rMin() + (rightHalf ? -dx : dx), atMin.kt().kt());
        label.setFont(ink.labelFont());
        label.setPaint(ink.text());
        label.setTextAnchor(rightHalf ? TextAnchor.BOTTOM_RIGHT : TextAnchor.BOTTOM_LEFT);
        label.setBackgroundPaint(ink.labelBackground());
        label.setOutlineVisible(false);
        plot.addAnnotation(label);

        if (target != null) {
            ValueMarker tm = new ValueMarker(target.value(), ink.target(), dashed);
            tm.setLabel("target " + target.factor().symbol() + " ≤ " + DecimalText.significant(target.value(), 4));
            tm.setLabelFont(ink.markerFont());
            tm.setLabelPaint(ink.target());
            // above its line, on a background, so the dashes never run through the words
            tm.setLabelAnchor(RectangleAnchor.LEFT);
            tm.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            tm.setLabelOffset(new RectangleInsets(0, 6, 3, 0));
            tm.setLabelOffsetType(LengthAdjustmentType.EXPAND);
            tm.setLabelBackgroundColor(ink.labelBackground());
            plot.addRangeMarker(tm);
        }
        if (minimum != null && minimum.found() && minimum.radius() >= curves.rFrom() && minimum.radius() <= curves.rTo()) {
            ValueMarker mm = new ValueMarker(minimum.radius(), ink.target(), new BasicStroke(1.2f));
            mm.setLabel((minimum.limitedByFit() ? "sharpest r the fit covers: " : "smallest r for target: ")
                    + DecimalText.significant(minimum.radius(), 4));
            mm.setLabelFont(ink.markerFont());
            mm.setLabelPaint(ink.target());
            boolean right = minimum.radius() > (curves.rFrom() + curves.rTo()) / 2;
            // at the top, below the band's label, clear of the target line and its label near the foot
            mm.setLabelAnchor(right ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
            mm.setLabelTextAnchor(right ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
            mm.setLabelOffset(new RectangleInsets(28, 4, 0, 4));
            mm.setLabelBackgroundColor(alpha(ink.labelBackground(), 200));
            plot.addDomainMarker(mm);
        }

        JFreeChart chart = new JFreeChart(null, new Font(FONT, Font.BOLD, 17), plot, false);
        chart.setBackgroundPaint(ink.background());
        chart.setPadding(new RectangleInsets(6, 8, 4, 22));
        TextTitle title = new TextTitle((withKf ? "Kt and Kf" : "Kt") + " across the fillet tolerance", new Font(FONT, Font.BOLD, 17));
        title.setPaint(ink.text());
        chart.setTitle(title);
        TextTitle sub = new TextTitle(String.format(Locale.ROOT, "%s in %s,  D %s / d %s %s,  h = %s %s   (%s)",
                c.shape().description(), c.load().key(), DecimalText.significant(c.bigD(), 4), DecimalText.significant(c.smallD(), 4), u, DecimalText.significant(c.stepHeight(), 4), u,
                atMin.kt().fitName()), new Font(FONT, Font.PLAIN, 13));
        sub.setPaint(ink.text());
        chart.addSubtitle(sub);
        LegendTitle legend = new LegendTitle(plot);
        legend.setItemFont(new Font(FONT, Font.PLAIN, 12));
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setFrame(BlockBorder.NONE);
        legend.setItemPaint(ink.text());
        TextTitle caution = new TextTitle(Cautions.STRESS.get(0) + " " + Cautions.STRESS.get(1), new Font(FONT, Font.ITALIC, 11));
        caution.setPosition(RectangleEdge.BOTTOM);
        caution.setPaint(ink.note());
        caution.setMaximumLinesToDisplay(3);
        caution.setPadding(new RectangleInsets(6, 12, 4, 12));
        chart.addSubtitle(caution);
        chart.addSubtitle(legend);
        chart.setRenderingHints(new RenderingHints(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON));
        chart.getRenderingHints().put(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        return chart;
    }

    /** The chart as PNG bytes. */
    public byte[] png(JFreeChart chart) {
        BufferedImage img = chart.createBufferedImage(WIDTH, HEIGHT);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** The chart as an SVG document. */
    public String svg(JFreeChart chart) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        g.setDefsKeyPrefix("arcwright-stress-");
        // JFreeChart's axes save and restore this hint; JFreeSVG starts without it and rejects a null restore
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_NORMALIZE);
        chart.draw(g, new Rectangle(0, 0, WIDTH, HEIGHT));
        return g.getSVGDocument();
    }

    /**
     * Writes the chart to {@code out} as PNG or SVG by its extension, atomically.
     *
     * @throws InputProblem on {@code --plot} for any other extension
     */
    public void write(Path out, JFreeChart chart) {
        String name = out.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".png")) {
            AtomicFiles.writeBytes(out, png(chart));
        } else if (name.endsWith(".svg")) {
            AtomicFiles.writeString(out, svg(chart));
        } else {
            throw InputProblem.ofField("--plot", "give a file ending in .png or .svg, got " + out.getFileName());
        }
    }

    /**
     * Adds to {@code series} the samples in stretches where {@code fit} equals {@code wanted}, plus
     * the sample on each side so adjoining stretches join; a gap (null) separates stretches.
     */
    private static void stretch(List<StressPoint> pts, XYSeries series, boolean wanted,
                                Predicate<StressPoint> fit,
                                ToDoubleFunction<StressPoint> y) {
        for (int i = 0; i < pts.size(); i++) {
            boolean self = fit.test(pts.get(i)) == wanted;
            boolean prev = i > 0 && fit.test(pts.get(i - 1)) == wanted;
            boolean next = i + 1 < pts.size() && fit.test(pts.get(i + 1)) == wanted;
            if (self || prev || next) {
                series.add(pts.get(i).r(), y.applyAsDouble(pts.get(i)));
            } else if (series.getItemCount() > 0 && series.getY(series.getItemCount() - 1) != null) {
                series.add(pts.get(i).r(), null);
            }
        }
    }

    /** {@code c} with alpha {@code a} (0-255). */
    private static Color alpha(Color c, int a) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), a);
    }

    private static String strengthText(FilletStressCase c) {
        if (c.strength() == null) return "";
        return DecimalText.significant(c.strength().value(), 4) + " " + c.strength().unit().symbol();
    }

}
