package org.arcwright.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.PathIterator;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointExcesses;
import org.arcwright.inspect.PointSet;
import org.arcwright.inspect.ProfileOutcome;
import org.arcwright.inspect.Registration;
import org.arcwright.inspect.Verdict;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;
import org.arcwright.zone.RadiusZone;
import org.arcwright.zone.Segment;
import org.jfree.svg.SVGGraphics2D;

/**
 * Plots a measured section against its zone: the nominal contour, the zone's boundaries, the points
 * coloured by how close they come to the limits, and the deciding values. Deviations from the
 * nominal are magnified by a stated factor (a fillet tolerance is invisible at true scale), so every
 * point is drawn at {@code foot + M·deviation·normal}; the zone boundaries are drawn the same way.
 */
public final class ContourPlot {
    /** Plot size in pixels (PNG) or user units (SVG). */
    public static final int WIDTH = 1000, HEIGHT = 760;
    private static final int MAX_DRAWN = 20_000;
    /** The type the files are drawn in; a window passes its own. */
    private static final Font FILE_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    /** The printed colours: files keep these whatever the window's look. */
    private static final Palette PRINTED = new Palette(Color.WHITE, new Color(0x30, 0x30, 0x30), new Color(0x1f, 0x5f, 0xbf));
    private static final Color OK = new Color(0x1a, 0x8f, 0x3c),
            NEAR = new Color(0xd9, 0x8a, 0x00), OUT = new Color(0xd0, 0x21, 0x21), IDLE = new Color(0x9a, 0x9a, 0x9a);

    private final Color background, nominalInk, zoneInk, zoneFill;

    /** The plot in its printed colours. */
    public ContourPlot() {
        this(PRINTED);
    }

    /** The plot on the palette's background, text and nominal in its foreground, the zone in its accent. */
    public ContourPlot(Palette palette) {
        background = palette.background();
        nominalInk = palette.foreground();
        zoneInk = palette.accent();
        zoneFill = new Color(zoneInk.getRed(), zoneInk.getGreen(), zoneInk.getBlue(), 0x22);
    }

    /** Writes the plot to {@code out}: SVG if the name ends in {@code .svg}, else PNG. */
    public void write(InspectionResult r, Path out) {
        String name = out.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".svg")) {
            SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
            g.setDefsKeyPrefix("arcwright-");
            draw(r, g);
            AtomicFiles.writeString(out, g.getSVGDocument());
        } else if (name.endsWith(".png")) {
            AtomicFiles.writeBytes(out, png(r));
        } else {
            throw InputProblem.ofField("--plot", "give a .png or .svg file name");
        }
    }

    /** The plot as PNG bytes. */
    public byte[] png(InspectionResult r) {
        BufferedImage img = new BufferedImage(WIDTH, HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        draw(r, g);
        g.dispose();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    /** Draws the plot on any Graphics2D of {@link #WIDTH} × {@link #HEIGHT}, as files show it. */
    public void draw(InspectionResult r, Graphics2D g) {
        draw(r, g, WIDTH, HEIGHT, FILE_FONT, true);
    }

    /**
     * Draws the plot at {@code width} × {@code height} with text in {@code font} (the other sizes
     * follow it): the file output and the desktop's Check view both come through here, so the panel
     * draws vectors at its own size and the window's type size rather than a scaled picture.
     *
     * @param summary whether to draw the verdict, the callout and the figures above the plot (a
     *     window that shows them beside the plot leaves them out)
     */
    public void draw(InspectionResult r, Graphics2D g, int width, int height, Font font, boolean summary) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(background);
        g.fillRect(0, 0, width, height);
        Type type = new Type(font);
        InspectionRequest q = r.request();
        String units = q.units().symbol();
        Contour nominal = Inspector.nominalContour(q);
        PointSet pts = q.points();
        int n = pts.size();

        // Points as drawn (after any registration) and their excess.
        PointExcesses excesses = PointExcesses.of(r);
        ProfileOutcome po = excesses.profile();
        Registration reg = excesses.registration();
        int stride = Math.max(1, n / MAX_DRAWN);
        List<double[]> drawn = new ArrayList<>();
        double[] moved = new double[2];
        RadiusZone rz = excesses.radiusZone();
        double band = excesses.allowance();
        for (int i = 0; i < n; i += stride) addPoint(i, pts, reg, excesses, drawn, moved);
        if (r.worst() != null && r.worst().index() % stride != 0) addPoint(r.worst().index(), pts, reg, excesses, drawn, moved);

        double[] view = view(q, drawn);
        double span = Math.max(view[2] - view[0], view[3] - view[1]);
        double[] m4 = new double[4], w5 = new double[5];
        double maxDev = 0;
        for (double[] p : drawn) {
            nominal.measure(p[0], p[1], m4, w5);
            maxDev = Math.max(maxDev, Math.abs(m4[0]));
        }
        // Magnification: the larger of the zone and the deviations shows as ~7% of the view.
        double mag = niceFactor(0.12 * span / Math.max(Math.max(visibleBand(q, po), maxDev), 1e-12 * span));
        // Where the words go: the summary above, the legend below, the plot between.
        List<String> head = summary ? wrap(g, type.body, summaryLines(r, units), width - 2 * type.margin) : List.of();
        int top = summary ? (int) Math.ceil(type.firstLine + type.line * Math.max(4, head.size()) + 6 * type.k) : (int) (8 * type.k);
        List<List<Legend>> rows = legendRows(g, type, mag, width);
        int bottom = (int) Math.ceil(33 * type.k + type.line * (rows.size() - 1) + 22 * type.k);
        double side = Math.min(60, 0.06 * width);
        double plotW = Math.max(1, width - 2 * side), plotH = Math.max(1, height - top - 5 - bottom);
        double scale = Math.min(plotW / (view[2] - view[0]), plotH / (view[3] - view[1]));
        double ox = side + (plotW - scale * (view[2] - view[0])) / 2 - scale * view[0];
        double oy = top + 5 + (plotH + scale * (view[3] - view[1])) / 2 + scale * view[1];
        Mapper map = new Mapper(nominal, mag, scale, ox, oy, new double[] {8, top, width - 8, height - bottom + 10});

        // Zone.
        g.setStroke(new BasicStroke(1.6f));
        if (rz != null) {
            // the limit arcs tangent to the fitted adjacent surfaces, which the verdict read
            double reach = Math.hypot(view[2] - view[0], view[3] - view[1]) * 2;
            Path2D lo = map.path(rz.corner().contour(rz.min(), reach), 0), hi = map.path(rz.corner().contour(rz.max(), reach), 0);
            g.setColor(zoneInk);
            g.draw(lo);
            g.draw(hi);
        } else if (po != null) {
            ProfileZone z = po.zone();
            double off = reg == null ? 0 : reg.offset();
            Path2D outer = map.path(nominal, z.outward() + off), inner = map.path(nominal, -z.inward() + off);
            g.setColor(zoneFill);
            Path2D fill = new Path2D.Double(outer);
            fill.append(reverse(inner), true);
            fill.closePath();
            g.fill(fill);
            g.setColor(zoneInk);
            g.draw(outer);
            g.draw(inner);
        }
        // Nominal.
        g.setColor(nominalInk);
        g.setStroke(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10, new float[] {8, 5}, 0));
        g.draw(map.path(nominal, 0));

        // Points.
        g.setStroke(new BasicStroke(1f));
        double dot = n > 2000 ? 2.2 : 4.5;
        for (double[] p : drawn) {
            double[] s = map.screen(p[0], p[1]);
            g.setColor(colour(p[2], band));
            g.fill(new Ellipse2D.Double(s[0] - dot / 2, s[1] - dot / 2, dot, dot));
        }
        // Worst point.
        if (r.worst() != null) {
            double[] w = null;
            for (double[] p : drawn) if ((int) p[3] == r.worst().index()) w = p;
            if (w != null) {
                double[] s = map.screen(w[0], w[1]);
                // beyond a limit but within the uncertainty is not a proven excess (ISO 14253-1): not drawn as one
                boolean unproven = r.worst().excess() > 0 && r.verdict() == Verdict.INDETERMINATE;
                g.setColor(unproven ? NEAR : r.worst().excess() > 0 ? OUT : nominalInk);
                g.setStroke(new BasicStroke(1.5f));
                g.draw(new Ellipse2D.Double(s[0] - 9, s[1] - 9, 18, 18));
                g.draw(new Line2D.Double(s[0] + 7, s[1] - 7, s[0] + 30, s[1] - 30));
                g.setFont(type.body);
                String t = Inspector.worstLabel(r) + (unproven ? ", within the uncertainty: not proven" : "");
                float tx = (float) Math.max(8, Math.min(s[0] + 32, width - 10 - g.getFontMetrics().stringWidth(t)));
                float ty = (float) Math.max(s[1] - 32, summary ? 110 * type.k : top + g.getFontMetrics().getAscent());
                g.drawString(t, tx, ty);
            }
        }
        if (summary) summary(g, type, r, units, head);
        legend(g, type, rows, height);
    }

    /**
     * The measured points alone, at true scale with equal axes, for picking the corner's frame on a
     * CSV that states none: the points, the axes where they are in view, a scale bar with its unit,
     * and what has been picked so far (the vertex, then the legs as rays from it).
     *
     * @param picked up to three points: the vertex, then a point along each leg
     * @return the mapping from the points' coordinates to the drawing's, to read a click back
     */
    public AffineTransform drawPoints(PointSet points, List<Point2> picked, String units, Graphics2D g, int width,
                                      int height, Font font) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(background);
        g.fillRect(0, 0, width, height);
        Type type = new Type(font);
        double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < points.size(); i++) {
            minX = Math.min(minX, points.xs()[i]); maxX = Math.max(maxX, points.xs()[i]);
            minY = Math.min(minY, points.ys()[i]); maxY = Math.max(maxY, points.ys()[i]);
        }
        for (Point2 p : picked) {
            minX = Math.min(minX, p.x()); maxX = Math.max(maxX, p.x());
            minY = Math.min(minY, p.y()); maxY = Math.max(maxY, p.y());
        }
        if (!(maxX >= minX)) {
            minX = minY = -1;
            maxX = maxY = 1;
        }
        double pad = 0.15 * Math.max(Math.max(maxX - minX, maxY - minY), 1e-9);
        minX -= pad; maxX += pad; minY -= pad; maxY += pad;
        double bottom = type.line * 2 + 12 * type.k, margin = type.margin;
        double plotW = Math.max(1, width - 2 * margin), plotH = Math.max(1, height - margin - bottom);
        double scale = Math.min(plotW / (maxX - minX), plotH / (maxY - minY));
        double ox = margin + (plotW - scale * (maxX - minX)) / 2 - scale * minX;
        double oy = margin + (plotH + scale * (maxY - minY)) / 2 + scale * minY;
        AffineTransform toScreen = new AffineTransform(scale, 0, 0, -scale, ox, oy);
        double[] s = new double[2];
        // axes through the origin, where it is in view
        g.setColor(new Color(nominalInk.getRed(), nominalInk.getGreen(), nominalInk.getBlue(), 0x50));
        g.setStroke(new BasicStroke(1f));
        if (minX < 0 && maxX > 0) g.draw(new Line2D.Double(ox, 0, ox, height - bottom));
        if (minY < 0 && maxY > 0) g.draw(new Line2D.Double(0, oy, width, oy));
        g.setColor(nominalInk);
        double dot = points.size() > 2000 ? 2.2 : 4.5;
        for (int i = 0; i < points.size(); i++) {
            toScreen.transform(new double[] {points.xs()[i], points.ys()[i]}, 0, s, 0, 1);
            g.fill(new Ellipse2D.Double(s[0] - dot / 2, s[1] - dot / 2, dot, dot));
        }
        // the picked vertex and legs
        g.setColor(zoneInk);
        g.setStroke(new BasicStroke(2f));
        if (!picked.isEmpty()) {
            double[] v = new double[2];
            toScreen.transform(new double[] {picked.get(0).x(), picked.get(0).y()}, 0, v, 0, 1);
            g.draw(new Ellipse2D.Double(v[0] - 7, v[1] - 7, 14, 14));
            g.draw(new Line2D.Double(v[0] - 11, v[1], v[0] + 11, v[1]));
            g.draw(new Line2D.Double(v[0], v[1] - 11, v[0], v[1] + 11));
            double reach = Math.hypot(width, height);
            for (Point2 p : picked.subList(1, picked.size())) {
                toScreen.transform(new double[] {p.x(), p.y()}, 0, s, 0, 1);
                double dx = s[0] - v[0], dy = s[1] - v[1], l = Math.hypot(dx, dy);
                if (l > 0) g.draw(new Line2D.Double(v[0], v[1], v[0] + dx / l * reach, v[1] + dy / l * reach));
            }
        }
        // scale bar: a round length near a fifth of the width, with its unit
        double bar = niceFactorBelow(0.2 * plotW / scale);
        float y = (float) (height - type.line - 4 * type.k);
        g.setColor(nominalInk);
        g.setStroke(new BasicStroke(1.5f));
        g.draw(new Line2D.Double(margin, y, margin + bar * scale, y));
        g.draw(new Line2D.Double(margin, y - 4, margin, y + 4));
        g.draw(new Line2D.Double(margin + bar * scale, y - 4, margin + bar * scale, y + 4));
        g.setFont(type.body);
        g.drawString(fmt(bar) + " " + units + " (true scale; x to the right, y up, as in the file)",
                (float) (margin + bar * scale + 10), y + g.getFontMetrics().getAscent() / 2f - 1);
        return toScreen;
    }

    /** Sizes of the plot's words, from the body font ({@code k}: its size over the file's 13). */
    private static final class Type {
        final Font body, small, title, word;
        final double k, line, firstLine, margin;

        Type(Font font) {
            body = font.deriveFont(Font.PLAIN);
            k = body.getSize2D() / FILE_FONT.getSize2D();
            small = body.deriveFont(body.getSize2D() * 12 / 13);
            title = body.deriveFont(Font.BOLD, body.getSize2D() * 16 / 13);
            word = body.deriveFont(Font.BOLD, body.getSize2D() * 22 / 13);
            line = 18 * k;
            firstLine = 62 * k;
            margin = 24 * k;
        }
    }

    private static void addPoint(int i, PointSet pts, Registration reg, PointExcesses excesses, List<double[]> drawn,
                                 double[] moved) {
        double x = pts.xs()[i], y = pts.ys()[i];
        if (reg != null) {
            reg.apply(x, y, moved);
            x = moved[0];
            y = moved[1];
        }
        drawn.add(new double[] {x, y, excesses.excess(i), i});
    }

    /** Width of the zone as drawn: the crescent on the bisector for R/CR, the zone for profile. */
    private static double visibleBand(InspectionRequest q, ProfileOutcome po) {
        if (q.callout() instanceof InspectionCallout.RadiusLimits rl && q.nominal() instanceof Nominal.CornerBlend cb) {
            return (rl.max() - rl.min()) * CrescentZone.factor(cb.corner().includedAngleDeg());
        }
        return po == null ? 0 : po.zone().width();
    }

    private static Color colour(double excess, double band) {
        if (Double.isNaN(excess)) return IDLE;
        if (excess > 0) return OUT;
        if (excess > -PointExcesses.NEAR_SHARE * band) return NEAR;
        return OK;
    }

    /** World bounds to show: the blend and a stretch of each leg for a corner, else all points. */
    private static double[] view(InspectionRequest q, List<double[]> drawn) {
        double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        List<Point2> keep = new ArrayList<>();
        double limit = Double.POSITIVE_INFINITY;
        Point2 v = null;
        if (q.nominal() instanceof Nominal.CornerBlend cb) {
            Corner c = cb.corner();
            double r = cb.radius();
            if (q.callout() instanceof InspectionCallout.RadiusLimits rl) r = Math.max(r, rl.max());
            double t = c.tangentDistance(r) * 1.6;
            v = c.vertex();
            keep.add(c.vertex());
            keep.add(c.vertex().plus(c.legA().times(t)));
            keep.add(c.vertex().plus(c.legB().times(t)));
            keep.add(c.centre(cb.radius()));
            limit = t * 1.05;
        }
        for (Point2 p : keep) {
            minX = Math.min(minX, p.x()); maxX = Math.max(maxX, p.x());
            minY = Math.min(minY, p.y()); maxY = Math.max(maxY, p.y());
        }
        if (v == null) {
            for (double[] p : drawn) {
                minX = Math.min(minX, p[0]); maxX = Math.max(maxX, p[0]);
                minY = Math.min(minY, p[1]); maxY = Math.max(maxY, p[1]);
            }
        }
        double pad = 0.08 * Math.max(maxX - minX, maxY - minY);
        if (!(pad > 0)) pad = 1;
        if (v != null) {
            final double lim = limit;
            final Point2 vv = v;
            drawn.removeIf(p -> Math.hypot(p[0] - vv.x(), p[1] - vv.y()) > lim);
        }
        return new double[] {minX - pad, minY - pad, maxX + pad, maxY + pad};
    }

    /** 1, 2 or 5 times a power of ten, at most {@code raw} (any positive size; a scale bar's length). */
    static double niceFactorBelow(double raw) {
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / p;
        return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
    }

    /** 1, 2 or 5 times a power of ten, at most {@code raw}, at least 1. */
    static double niceFactor(double raw) {
        if (!(raw > 1)) return 1;
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / p;
        return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
    }

    /** The figures the verdict read, one line each, as the summary above a file's plot states them. */
    private static List<String> summaryLines(InspectionResult r, String units) {
        InspectionRequest q = r.request();
        List<String> lines = new ArrayList<>();
        if (r.radius() != null) {
            lines.add("envelope: radius smallest " + Inspector.down(r.radius().smallest(), q.resolution()) + ", largest "
                    + Inspector.up(r.radius().largest(), q.resolution()) + " " + units
                    + "   (limit arcs tangent to the fitted surfaces, in blue)");
        }
        if (r.controlled() != null) {
            lines.add("local radius " + fmt(r.controlled().localMin()) + " to " + fmt(r.controlled().localMax()) + " " + units + " (± up to "
                    + Inspector.length(r.controlled().uncertainty(), q.units(), 4) + " " + units + "), reversals " + r.controlled().reversals().size() + ", flat windows "
                    + r.controlled().flats() + ", undecided windows " + r.controlled().indeterminate().size());
        }
        if (r.profile() != null) {
            lines.add("needs zone " + Inspector.lengthUp(r.profile().requiredZone(), Inspector.PROFILE_SLACK, q.units()) + " " + units + "; deviation "
                    + Inspector.length(r.profile().maxOutward(), q.units(), 4) + " outward, " + Inspector.length(r.profile().maxInward(), q.units(), 4)
                    + " inward (after registration)");
        }
        if (r.tiers() != null) {
            StringBuilder sb = new StringBuilder("tiers:");
            for (int i = 0; i < r.tiers().size(); i++) {
                ProfileOutcome t = r.tiers().get(i);
                Verdict tv = Inspector.profileVerdict(t, q.uncertainty());
                sb.append(String.format(Locale.ROOT, "  %d) %s zone %s needs %s", i + 1, tv == Verdict.FAIL ? "FAIL" : tv.key(),
                        fmt(t.zone().width()), Inspector.lengthUp(t.requiredZone(), Inspector.PROFILE_SLACK, q.units())));
            }
            lines.add(sb + " " + units + "   (tier 1 zone drawn)");
        }
        if (r.fits() != null) {
            lines.add("least-squares R " + fmt(r.fits().leastSquares().circle().r()) + ", minimum zone " + fmt(r.fits().minimumZone().inner())
                    + " to " + fmt(r.fits().minimumZone().outer()) + ", steps at the fitted surfaces " + Inspector.length(r.fits().stepA(), q.units(), 4)
                    + " / " + Inspector.length(r.fits().stepB(), q.units(), 4) + " " + units);
        }
        lines.add(InspectionResult.CAUTION);
        return lines;
    }

    /** Breaks each line at spaces so that none is wider than {@code width}; a single long word stays whole. */
    private static List<String> wrap(Graphics2D g, Font font, List<String> lines, double width) {
        FontMetrics fm = g.getFontMetrics(font);
        List<String> out = new ArrayList<>();
        for (String line : lines) {
            StringBuilder cur = new StringBuilder();
            for (String word : line.split("(?<= )")) {
                if (cur.length() > 0 && fm.stringWidth((cur + word).stripTrailing()) > width) {
                    out.add(cur.toString().stripTrailing());
                    cur.setLength(0);
                }
                cur.append(word);
            }
            out.add(cur.toString().stripTrailing());
        }
        return out;
    }

    private void summary(Graphics2D g, Type type, InspectionResult r, String units, List<String> lines) {
        InspectionRequest q = r.request();
        g.setColor(r.verdict() == Verdict.PASS ? OK : r.verdict() == Verdict.FAIL ? OUT : NEAR);
        g.setFont(type.word);
        String word = r.verdict().key().toUpperCase(Locale.ROOT);
        g.drawString(word, (float) type.margin, (float) (38 * type.k));
        float titleX = (float) (type.margin + g.getFontMetrics().stringWidth(word) + 16 * type.k);
        g.setColor(nominalInk);
        g.setFont(type.title);
        g.drawString(q.callout().describe() + "   (" + units + ", " + q.points().size() + " points"
                + (q.uncertainty() > 0 ? ", U = " + fmt(q.uncertainty()) + " " + units : "") + ")", titleX, (float) (36 * type.k));
        g.setFont(type.body);
        double y = type.firstLine;
        for (String s : lines) {
            g.drawString(s, (float) type.margin, (float) y);
            y += type.line;
        }
    }

    /** One entry of the legend: a colour key (or none, for the magnification) and its words. */
    private record Legend(Color key, String text, double x, double width) {}

    /** The legend's entries flowed into rows that fit {@code width}: the magnification first, then the colour keys. */
    private List<List<Legend>> legendRows(Graphics2D g, Type type, double mag, int width) {
        FontMetrics fm = g.getFontMetrics(type.small);
        List<List<Legend>> rows = new ArrayList<>();
        List<Legend> row = new ArrayList<>();
        rows.add(row);
        String first = "deviations from nominal magnified ×" + fmt(mag) + "   - - nominal";
        row.add(new Legend(null, first, type.margin, fm.stringWidth(first)));
        double x = Math.max(420 * type.k, type.margin + fm.stringWidth(first) + type.margin);
        Object[][] keys = {{OK, "within"}, {NEAR, "within 15% of a limit"}, {OUT, "outside"}, {IDLE, "not judged"}, {zoneInk, "zone boundary"}};
        for (Object[] k : keys) {
            String t = (String) k[1];
            double w = 13 * type.k + fm.stringWidth(t);
            if (x + w > width - 8 && x > type.margin) {
                row = new ArrayList<>();
                rows.add(row);
                x = type.margin;
            }
            row.add(new Legend((Color) k[0], t, x, w));
            x += w + 17 * type.k;
        }
        return rows;
    }

    private void legend(Graphics2D g, Type type, List<List<Legend>> rows, int height) {
        g.setFont(type.small);
        double d = 9 * type.k;
        for (int i = 0; i < rows.size(); i++) {
            float ly = (float) (height - 22 * type.k - type.line * (rows.size() - 1 - i));
            for (Legend e : rows.get(i)) {
                float tx = (float) e.x();
                if (e.key() != null) {
                    g.setColor(e.key());
                    g.fill(new Ellipse2D.Double(e.x(), ly - d, d, d));
                    tx += (float) (13 * type.k);
                }
                g.setColor(nominalInk);
                g.drawString(e.text(), tx, ly);
            }
        }
    }

    private static Path2D reverse(Path2D p) {
        List<double[]> pts = new ArrayList<>();
        double[] c = new double[6];
        for (PathIterator it = p.getPathIterator(null); !it.isDone(); it.next()) {
            it.currentSegment(c);
            pts.add(new double[] {c[0], c[1]});
        }
        Path2D out = new Path2D.Double();
        for (int i = pts.size() - 1; i >= 0; i--) {
            if (i == pts.size() - 1) out.moveTo(pts.get(i)[0], pts.get(i)[1]);
            else out.lineTo(pts.get(i)[0], pts.get(i)[1]);
        }
        return out;
    }

    private static String fmt(double v) {
        if (Double.isNaN(v)) return "none";
        if (Double.isInfinite(v)) return "infinite";
        return DecimalText.significant(v, 4);
    }

    /** World to screen, with deviations from the nominal magnified. */
    private static final class Mapper {
        private final Contour nominal;
        private final double mag, scale, ox, oy;
        /** The plot area (left, top, right, bottom), below the words above and above the legend. */
        private final double[] area;
        private final double[] m = new double[4], w = new double[5];

        Mapper(Contour nominal, double mag, double scale, double ox, double oy, double[] area) {
            this.nominal = nominal; this.mag = mag; this.scale = scale; this.ox = ox; this.oy = oy; this.area = area;
        }

        double[] screen(double x, double y) {
            nominal.measure(x, y, m, w);
            double k = (mag - 1) * m[0];
            double ex = x + k * m[1], ey = y + k * m[2];
            return new double[] {ox + scale * ex, oy - scale * ey};
        }

        /** The contour offset by {@code offset} toward air (true size), drawn magnified. */
        Path2D path(Contour c, double offset) {
            Path2D p = new Path2D.Double();
            boolean first = true;
            double[] mm = new double[4], ww = new double[5];
            for (Segment s : c.segments()) {
                int steps = s instanceof Segment.Arc ? 90 : 60;
                for (int i = 0; i <= steps; i++) {
                    double t = (double) i / steps;
                    double x, y;
                    if (s instanceof Segment.Arc a) {
                        double ang = a.startAngle() + a.sweep() * t;
                        x = a.centre().x() + a.radius() * Math.cos(ang);
                        y = a.centre().y() + a.radius() * Math.sin(ang);
                    } else {
                        x = s.start().x() + (s.end().x() - s.start().x()) * t;
                        y = s.start().y() + (s.end().y() - s.start().y()) * t;
                    }
                    if (offset != 0) {
                        c.measure(x, y, mm, ww);
                        x += offset * mm[1];
                        y += offset * mm[2];
                    }
                    double[] sc = screen(x, y);
                    // the plot area, below the labels and above the legend (no clip paths: not every SVG viewer has them)
                    if (sc[0] < area[0] || sc[0] > area[2] || sc[1] < area[1] || sc[1] > area[3]) {
                        first = true;
                        continue;
                    }
                    if (first) p.moveTo(sc[0], sc[1]);
                    else p.lineTo(sc[0], sc[1]);
                    first = false;
                }
            }
            return p;
        }
    }
}
