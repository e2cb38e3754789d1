package org.arcwright.app.simulate;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.UIManager;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.PointSet;
import org.arcwright.simulate.CalloutResult;
import org.arcwright.simulate.Example;
import org.arcwright.simulate.Outcome;
import org.arcwright.simulate.Part;
import org.arcwright.simulate.PartGenerator;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.zone.Contour;

/**
 * A few example parts of one outcome under one callout, each drawn unrolled along its section:
 * station along the nominal contour across, deviation from the nominal magnified up, with the zone
 * the callout allows (the limit arcs of R and CR, the profile zone about the nominal).
 */
final class ExamplesPlot extends JComponent {
    private static final long serialVersionUID = 1L;
    private transient List<Drawn> drawn = List.of();
    private String heading = "Click a bar above to see example parts of that kind.";

    ExamplesPlot() {
        setName("simulate.examples");
    }

    String heading() { return heading; }

    int shown() { return drawn.size(); }

    void clear(String text) {
        drawn = List.of();
        heading = text;
        repaint();
    }

    void show(ProcessModel model, CalloutResult c, Outcome o) {
        List<Example> ex = c.examples(o);
        String unit = model.units().symbol();
        heading = ex.isEmpty() ? "No part was " + o.label() + " under " + c.text() + "."
                : "Parts " + o.label() + " under " + c.text() + ": deviation from nominal along the section, magnified (×1000 "
                        + unit + " up, " + unit + " across); shaded: the zone " + c.text() + " allows"
                        + (c.callout() instanceof InspectionCallout.ProfileTolerance pt && !pt.free().isEmpty()
                                ? " at its nominal place (it may move)" : "");
        Contour nominal = model.corner().contour(model.nominalRadius(), 6 * model.corner().tangentDistance(model.nominalRadius()) + 1);
        double[][] zone = zoneOf(model, c.callout(), nominal);
        List<Drawn> list = new ArrayList<>();
        for (Example e : ex) list.add(new Drawn(e.part(), curve(nominal, e.section()), zone, o, unit));
        drawn = List.copyOf(list);
        repaint();
    }

    /** Station and deviation of each point against the nominal contour. */
    private static double[][] curve(Contour nominal, PointSet p) {
        double[] dev = new double[p.size()], st = new double[p.size()];
        nominal.measureAll(p.xs(), p.ys(), p.size(), dev, null, null, st);
        return new double[][] {st, dev};
    }

    /** Lower and upper zone limits as curves {station, low, high}. */
    private static double[][] zoneOf(ProcessModel model, InspectionCallout c, Contour nominal) {
        if (c instanceof InspectionCallout.RadiusLimits rl) {
            PartGenerator g = new PartGenerator(model.withPoints(240));
            double[][] a = limit(g, nominal, rl.min()), b = limit(g, nominal, rl.max());
            // resample both limit arcs at the stations of the first
            double[] hi = new double[a[0].length];
            for (int i = 0; i < hi.length; i++) hi[i] = interpolate(b[0], b[1], a[0][i]);
            double[] lo = new double[a[0].length];
            for (int i = 0; i < lo.length; i++) {
                lo[i] = Math.min(a[1][i], hi[i]);
                hi[i] = Math.max(a[1][i], hi[i]);
            }
            return new double[][] {a[0], lo, hi};
        }
        double width, outward;
        if (c instanceof InspectionCallout.ProfileTolerance pt) {
            width = pt.zone().width();
            outward = pt.zone().outward();
        } else {
            width = ((InspectionCallout.CompositeProfile) c).tiers().get(0).zone();
            outward = width / 2;
        }
        double len = nominal.length();
        return new double[][] {{0, len}, {outward - width, outward - width}, {outward, outward}};
    }

    private static double[][] limit(PartGenerator g, Contour nominal, double r) {
        PartGenerator.Scan s = g.newScan();
        g.measure(new Part(-1, Math.max(r, 1e-9), 0, 0, Double.NaN, Double.NaN, 0, false), () -> 0, s);
        double[] dev = new double[s.size()], st = new double[s.size()];
        nominal.measureAll(s.xs(), s.ys(), s.size(), dev, null, null, st);
        return new double[][] {st, dev};
    }

    private static double interpolate(double[] xs, double[] ys, double x) {
        if (x <= xs[0]) return ys[0];
        for (int i = 1; i < xs.length; i++) {
            if (x <= xs[i]) {
                double t = (x - xs[i - 1]) / Math.max(1e-300, xs[i] - xs[i - 1]);
                return ys[i - 1] + t * (ys[i] - ys[i - 1]);
            }
        }
        return ys[ys.length - 1];
    }

    private record Drawn(Part part, double[][] points, double[][] zone, Outcome outcome, String unit) {}

    @Override
    public Dimension getPreferredSize() { return new Dimension(300, 360); }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setFont(UIManager.getFont("Label.font"));
        g.setColor(UIManager.getColor("Label.foreground"));
        g.drawString(heading, 8, 16);
        int n = drawn.size();
        if (n > 0) {
            int cols = n == 1 || getWidth() < 520 ? 1 : 2;
            // as many as fit at a readable height (at least one)
            n = Math.max(1, Math.min(n, cols * Math.max(1, (getHeight() - 28) / 110)));
            int rows = (n + cols - 1) / cols;
            int w = (getWidth() - 16) / cols, h = (getHeight() - 28) / rows;
            for (int i = 0; i < n; i++) {
                paintOne(g, drawn.get(i), 8 + (i % cols) * w, 26 + (i / cols) * h, w - 8, h - 8);
            }
        }
        g.dispose();
    }

    private static Color ink(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c != null ? c : fallback;
    }

    private static void paintOne(Graphics2D g, Drawn d, int x, int y, int w, int h) {
        g.setColor(ink("Arcwright.zone.background", Color.WHITE));
        g.fillRect(x, y, w, h);
        g.setColor(ink("Arcwright.zone.grid", Color.LIGHT_GRAY));
        g.drawRect(x, y, w, h);
        double[] st = d.points()[0], dev = d.points()[1];
        double s0 = st[0], s1 = st[0], extent = 1e-12;
        for (int i = 0; i < st.length; i++) {
            s0 = Math.min(s0, st[i]);
            s1 = Math.max(s1, st[i]);
            extent = Math.max(extent, Math.abs(dev[i]));
        }
        double[][] z = d.zone();
        for (int i = 0; i < z[0].length; i++) {
            if (z[0][i] >= s0 && z[0][i] <= s1) extent = Math.max(extent, Math.max(Math.abs(z[1][i]), Math.abs(z[2][i])));
        }
        extent *= 1.15;
        int top = y + 22, plotH = h - 40;
        double fs0 = s0, fs1 = Math.max(s1, s0 + 1e-9), fext = extent;
        java.util.function.DoubleUnaryOperator px = s -> x + 6 + (s - fs0) / (fs1 - fs0) * (w - 12);
        java.util.function.DoubleUnaryOperator py = v -> top + plotH / 2.0 - v / fext * (plotH / 2.0);
        Path2D band = new Path2D.Double();
        boolean started = false;
        List<double[]> upper = new ArrayList<>();
        for (int i = 0; i < z[0].length; i++) {
            double s = Math.max(s0, Math.min(s1, z[0][i]));
            if (!started) {
                band.moveTo(px.applyAsDouble(s), py.applyAsDouble(z[1][i]));
                started = true;
            } else {
                band.lineTo(px.applyAsDouble(s), py.applyAsDouble(z[1][i]));
            }
            upper.add(new double[] {s, z[2][i]});
        }
        for (int i = upper.size() - 1; i >= 0; i--) band.lineTo(px.applyAsDouble(upper.get(i)[0]), py.applyAsDouble(upper.get(i)[1]));
        band.closePath();
        g.setColor(ink("Arcwright.zone.band", new Color(0x3574f040, true)));
        g.fill(band);
        g.setColor(ink("Arcwright.zone.limit", Color.BLUE));
        g.setStroke(new BasicStroke(1f));
        g.draw(band);
        g.setColor(ink("Arcwright.zone.nominal", Color.DARK_GRAY));
        g.drawLine(x + 6, (int) py.applyAsDouble(0), x + w - 6, (int) py.applyAsDouble(0));
        Path2D line = new Path2D.Double();
        for (int i = 0; i < st.length; i++) {
            if (i == 0) line.moveTo(px.applyAsDouble(st[i]), py.applyAsDouble(dev[i]));
            else line.lineTo(px.applyAsDouble(st[i]), py.applyAsDouble(dev[i]));
        }
        g.setColor(d.outcome() == Outcome.ESCAPE || d.outcome() == Outcome.REJECTED_BAD ? ink("Arcwright.zone.pointBad", Color.RED)
                : ink("Arcwright.zone.pointOk", Color.GREEN.darker()));
        g.setStroke(new BasicStroke(1.6f));
        g.draw(line);
        g.setColor(UIManager.getColor("Label.foreground"));
        g.drawString(d.part().describe(d.unit()), x + 6, y + 15);
        g.setColor(UIManager.getColor("Arcwright.help.foreground"));
        String scale = d.unit().equals("mm") ? String.format(java.util.Locale.ROOT, "±%.1f µm full height", 1000 * extent)
                : String.format(java.util.Locale.ROOT, "±%.2f thou full height", 1000 * extent);
        g.drawString(scale, x + 6, y + h - 5);
    }
}
