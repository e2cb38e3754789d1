package org.arcwright.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
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
import org.arcwright.inspect.Verdict;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointExcesses;
import org.arcwright.inspect.PointSet;
import org.arcwright.inspect.ProfileOutcome;
import org.arcwright.inspect.Registration;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;
import org.arcwright.zone.RadiusZone;
import org.arcwright.zone.Segment;

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
    private static final int TOP = 140;
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
            org.jfree.svg.SVGGraphics2D g = new org.jfree.svg.SVGGraphics2D(WIDTH, HEIGHT);
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

    /** Draws the plot on any Graphics2D of {@link #WIDTH} × {@link #HEIGHT}. */
    public void draw(InspectionResult r, Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(background);
        g.fillRect(0, 0, WIDTH, HEIGHT);
        InspectionRequest q = r.request();
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

        // Magnification: the larger of the zone and the deviations shows as ~7% of the view.
        double[] view = view(q, drawn);
        double span = Math.max(view[2] - view[0], view[3] - view[1]);
        double[] m4 = new double[4], w5 = new double[5];
        double maxDev = 0;
        for (double[] p : drawn) {
            nominal.measure(p[0], p[1], m4, w5);
            maxDev = Math.max(maxDev, Math.abs(m4[0]));
        }
        double mag = niceFactor(0.12 * span / Math.max(Math.max(visibleBand(q, po), maxDev), 1e-12 * span));
        double sx = (WIDTH - 120) / (view[2] - view[0]), sy = (HEIGHT - 200) / (view[3] - view[1]);
        double scale = Math.min(sx, sy);
        double ox = 60 + ((WIDTH - 120) - scale * (view[2] - view[0])) / 2 - scale * view[0];
        double oy = TOP + 5 + ((HEIGHT - 200) + scale * (view[3] - view[1])) / 2 + scale * view[1];
        Mapper map = new Mapper(nominal, mag, scale, ox, oy);

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
                g.setColor(r.worst().excess() > 0 ? OUT : nominalInk);
                g.setStroke(new BasicStroke(1.5f));
                g.draw(new Ellipse2D.Double(s[0] - 9, s[1] - 9, 18, 18));
                g.draw(new Line2D.Double(s[0] + 7, s[1] - 7, s[0] + 30, s[1] - 30));
                g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
                String t = String.format(Locale.ROOT, "worst #%d: %s by %s %s (%s)", r.worst().index(),
                        r.worst().excess() > 0 ? "outside" : "inside", fmt(Math.abs(r.worst().excess())), r.worst().unit(),
                        r.worst().measure());
                g.drawString(t, (float) Math.min(s[0] + 32, WIDTH - 10 - g.getFontMetrics().stringWidth(t)), (float) Math.max(s[1] - 32, 110));
            }
        }
        labels(g, r, mag, q.units().symbol());
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
            return (rl.max() - rl.min()) * (1 / Math.sin(cb.corner().halfAngle()) - 1);
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

    /** 1, 2 or 5 times a power of ten, at most {@code raw}, at least 1. */
    static double niceFactor(double raw) {
        if (!(raw > 1)) return 1;
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / p;
        return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
    }

    private void labels(Graphics2D g, InspectionResult r, double mag, String units) {
        InspectionRequest q = r.request();
        g.setColor(r.verdict() == Verdict.PASS ? OK : r.verdict() == Verdict.FAIL ? OUT : NEAR);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 22));
        String word = r.verdict() == Verdict.INDETERMINATE ? "UNDECIDED" : r.verdict().key().toUpperCase(Locale.ROOT);
        g.drawString(word, 24, 38);
        int titleX = r.verdict() == Verdict.INDETERMINATE ? 170 : 100;
        g.setColor(nominalInk);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 16));
        g.drawString(q.callout().describe() + "   (" + units + ", " + q.points().size() + " points"
                + (q.uncertainty() > 0 ? ", U = " + fmt(q.uncertainty()) + " " + units : "") + ")", titleX, 36);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        List<String> lines = new ArrayList<>();
        if (r.radius() != null) {
            lines.add("envelope: radius smallest " + Inspector.down(r.radius().smallest(), q.resolution()) + ", largest "
                    + Inspector.up(r.radius().largest(), q.resolution()) + " " + units
                    + "   (limit arcs tangent to the fitted surfaces, in blue)");
        }
        if (r.controlled() != null) {
            lines.add("local radius " + fmt(r.controlled().localMin()) + " to " + fmt(r.controlled().localMax()) + " " + units + " (± up to "
                    + fmt(r.controlled().uncertainty()) + "), reversals " + r.controlled().reversals().size() + ", flat windows "
                    + r.controlled().flats() + ", undecided windows " + r.controlled().indeterminate().size());
        }
        if (r.profile() != null) {
            lines.add("needs zone " + Inspector.up(r.profile().requiredZone(), Inspector.PROFILE_SLACK) + " " + units + "; deviation "
                    + fmt(r.profile().maxOutward()) + " outward, " + fmt(r.profile().maxInward()) + " inward (after registration)");
        }
        if (r.tiers() != null) {
            StringBuilder sb = new StringBuilder("tiers:");
            for (int i = 0; i < r.tiers().size(); i++) {
                ProfileOutcome t = r.tiers().get(i);
                Verdict tv = Inspector.profileVerdict(t, q.uncertainty());
                sb.append(String.format(Locale.ROOT, "  %d) %s zone %s needs %s", i + 1, tv == Verdict.FAIL ? "FAIL" : tv.key(),
                        fmt(t.zone().width()), Inspector.up(t.requiredZone(), Inspector.PROFILE_SLACK)));
            }
            lines.add(sb + " " + units + "   (tier 1 zone drawn)");
        }
        if (r.fits() != null) {
            lines.add("least-squares R " + fmt(r.fits().leastSquares().circle().r()) + ", minimum zone " + fmt(r.fits().minimumZone().inner())
                    + " to " + fmt(r.fits().minimumZone().outer()) + ", steps at the fitted surfaces " + fmt(r.fits().stepA()) + " / "
                    + fmt(r.fits().stepB()) + " " + units);
        }
        float y = 62;
        for (String s : lines) {
            g.drawString(s, 24, y);
            y += 18;
        }
        // legend and scale
        int ly = HEIGHT - 22;
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        g.setColor(nominalInk);
        g.drawString("deviations from nominal magnified ×" + fmt(mag) + "   - - nominal", 24, ly);
        int x = 420;
        Object[][] keys = {{OK, "within"}, {NEAR, "within 15% of a limit"}, {OUT, "outside"}, {IDLE, "not judged"}, {zoneInk, "zone boundary"}};
        for (Object[] k : keys) {
            g.setColor((Color) k[0]);
            g.fill(new Ellipse2D.Double(x, ly - 9, 9, 9));
            g.setColor(nominalInk);
            g.drawString((String) k[1], x + 13, ly);
            x += 20 + g.getFontMetrics().stringWidth((String) k[1]) + 10;
        }
    }

    private static Path2D reverse(Path2D p) {
        List<double[]> pts = new ArrayList<>();
        double[] c = new double[6];
        for (java.awt.geom.PathIterator it = p.getPathIterator(null); !it.isDone(); it.next()) {
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
        if (v == 0) return "0";
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /** World to screen, with deviations from the nominal magnified. */
    private static final class Mapper {
        private final Contour nominal;
        private final double mag, scale, ox, oy;
        private final double[] m = new double[4], w = new double[5];

        Mapper(Contour nominal, double mag, double scale, double ox, double oy) {
            this.nominal = nominal; this.mag = mag; this.scale = scale; this.ox = ox; this.oy = oy;
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
                    if (sc[0] < 8 || sc[0] > WIDTH - 8 || sc[1] < TOP || sc[1] > HEIGHT - 45) {
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
