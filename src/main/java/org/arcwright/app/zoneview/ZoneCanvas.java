package org.arcwright.app.zoneview;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Point;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.NoninvertibleTransformException;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComponent;
import org.arcwright.app.model.MeasuredPoints;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.model.ZonePicture;
import org.arcwright.app.model.ZoneScene;
import org.arcwright.app.widgets.Themes;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;

/**
 * Draws a {@link ZoneScene}: the zone between its boundaries filled, the boundaries, the nominal
 * contour on top, and the measured points coloured by their grade. Wheel zooms about the cursor,
 * drag pans; hovering a point shows its deviation and excess, elsewhere the position and its
 * distance from nominal.
 */
final class ZoneCanvas extends JComponent {
    private static final long serialVersionUID = 1L;
    private static final double HOVER_PIXELS = 6;
    private transient ZonePicture picture;
    private transient ZoneScene scene;
    private double zoom = 1;
    private double panX;
    private double panY;
    private Point dragFrom;
    private String units = "mm";
    private BlendKind kind = BlendKind.FILLET;
    private double angle = 90;
    /** True when the view frames every measured point, false when the zone and the points it judges. */
    private boolean everyPoint;

    ZoneCanvas() {
        setName("zoneCanvas");
        setToolTipText("");
        MouseAdapter m = new MouseAdapter() {
            @Override public void mousePressed(MouseEvent e) { dragStarted(e.getPoint()); }
            @Override public void mouseDragged(MouseEvent e) { dragged(e.getPoint()); }
            @Override public void mouseWheelMoved(MouseWheelEvent e) { wheeled(e); }
        };
        addMouseListener(m);
        addMouseMotionListener(m);
        addMouseWheelListener(m);
    }

    void show(ZoneScene s, String unitSymbol, BlendKind blendKind) {
        this.scene = s;
        this.picture = s == null ? null : s.picture();
        this.kind = blendKind;
        this.angle = s == null ? ZoneScene.DEFAULT_ANGLE : s.picture().spec().angleDeg();
        this.units = unitSymbol;
        repaint();
    }

    int plottedPoints() { return scene == null ? 0 : scene.placed().size(); }

    /** What hovering over plotted point {@code i} shows, through the same path as the mouse (tests). */
    String tooltipOfPoint(int i) {
        Point2D s = transform().transform(new Point2D.Double(scene.placed().get(i).x(), scene.placed().get(i).y()), null);
        return getToolTipText(new MouseEvent(this, MouseEvent.MOUSE_MOVED, 0, 0, (int) Math.round(s.getX()),
                (int) Math.round(s.getY()), 0, false));
    }

    /** Frames the zone and the points it judges; undoes zoom and pan. */
    void fit() {
        frame(false);
    }

    /** Frames every measured point, those along the surfaces too; undoes zoom and pan. */
    void fitEveryPoint() {
        frame(true);
    }

    private void frame(boolean every) {
        everyPoint = every;
        zoom = 1;
        panX = 0;
        panY = 0;
        repaint();
    }

    /** Width and height of the part-coordinate box the view frames at zoom 1, for tests. */
    double[] framedSize() {
        double[] box = box(everyPoint ? scene.extent() : scene.zoneExtent());
        return new double[] {box[2] - box[0], box[3] - box[1]};
    }

    /** minX, minY, maxX, maxY of {@code pts} and the origin. */
    private static double[] box(List<Point2> pts) {
        double minX = 0, minY = 0, maxX = 0, maxY = 0;
        for (Point2 p : pts) {
            minX = Math.min(minX, p.x());
            minY = Math.min(minY, p.y());
            maxX = Math.max(maxX, p.x());
            maxY = Math.max(maxY, p.y());
        }
        return new double[] {minX, minY, maxX, maxY};
    }

    void zoomBy(double factor) {
        zoom = Math.max(0.2, Math.min(200, zoom * factor));
        repaint();
    }

    private void dragStarted(Point p) { dragFrom = p; }

    private void dragged(Point p) {
        if (dragFrom == null) return;
        panX += p.x - dragFrom.x;
        panY += p.y - dragFrom.y;
        dragFrom = p;
        repaint();
    }

    private void wheeled(MouseWheelEvent e) {
        double f = Math.pow(1.15, -e.getPreciseWheelRotation());
        double before = zoom;
        zoom = Math.max(0.2, Math.min(200, zoom * f));
        double k = zoom / before;
        // keep the point under the cursor still
        double cx = getWidth() / 2.0 + panX;
        double cy = getHeight() / 2.0 + panY;
        panX += (e.getX() - cx) * (1 - k);
        panY += (e.getY() - cy) * (1 - k);
        repaint();
    }

    /** Part coordinates to screen: fit the drawing, then zoom and pan; y up. */
    private AffineTransform transform() {
        double[] box = box(everyPoint ? scene.extent() : scene.zoneExtent());
        double minX = box[0], minY = box[1], maxX = box[2], maxY = box[3];
        double w = Math.max(1e-9, maxX - minX);
        double h = Math.max(1e-9, maxY - minY);
        double margin = 40;
        double s = Math.min((getWidth() - 2 * margin) / w, (getHeight() - 2 * margin) / h) * zoom;
        AffineTransform t = new AffineTransform();
        t.translate(getWidth() / 2.0 + panX, getHeight() / 2.0 + panY);
        t.scale(s, -s);
        t.translate(-(minX + maxX) / 2, -(minY + maxY) / 2);
        return t;
    }

    @Override
    public String getToolTipText(MouseEvent e) {
        if (picture == null) return null;
        int near = nearestPoint(e.getPoint());
        if (near >= 0) return scene.describe(near, units);
        try {
            Point2D p = transform().inverseTransform(e.getPoint(), null);
            double d = picture.distanceToNominal(new Point2(p.getX(), p.getY()));
            double m = picture.magnification();
            return "x " + Numbers.fixed(p.getX(), 3) + ", y " + Numbers.fixed(p.getY(), 3) + " " + units
                    + (m > 1 ? " · " + Numbers.fixed(d / m, 4) + " " + units + " from nominal (shown ×" + Numbers.trim(m) + ")"
                    : " · " + Numbers.fixed(d, 4) + " " + units + " from nominal");
        } catch (NoninvertibleTransformException ex) {
            return null;
        }
    }

    /** The measured point drawn within a few pixels of {@code at}, or -1. */
    private int nearestPoint(Point at) {
        if (scene == null || scene.placed().isEmpty()) return -1;
        AffineTransform t = transform();
        double best = HOVER_PIXELS * HOVER_PIXELS;
        int found = -1;
        Point2D s = new Point2D.Double();
        List<Point2> placed = scene.placed();
        for (int i = 0; i < placed.size(); i++) {
            t.transform(new Point2D.Double(placed.get(i).x(), placed.get(i).y()), s);
            double d = s.distanceSq(at);
            if (d <= best) {
                best = d;
                found = i;
            }
        }
        return found;
    }

    /** The theme colour of a grade of point. */
    private static Color gradeColour(MeasuredPoints.Grade g) {
        switch (g) {
            case WITHIN:
                return Themes.color("Arcwright.zone.pointOk");
            case NEAR_LIMIT:
                return Themes.color("Arcwright.zone.pointNear");
            case OUTSIDE:
                return Themes.color("Arcwright.zone.pointBad");
            case FAR_OUTSIDE:
                return Themes.color("Arcwright.zone.pointFar");
            default:
                return Themes.color("Arcwright.zone.pointIdle");
        }
    }

    private void paintPoints(Graphics2D g2, AffineTransform t) {
        List<MeasuredPoints.Point> pts = scene.measured().points();
        double dot = pts.size() > 2000 ? 3 : 6;
        Point2D s = new Point2D.Double();
        // the worse grades last, so that a point outside is never hidden under one inside
        MeasuredPoints.Grade[] order = {MeasuredPoints.Grade.NOT_JUDGED, MeasuredPoints.Grade.WITHIN,
            MeasuredPoints.Grade.NEAR_LIMIT, MeasuredPoints.Grade.OUTSIDE, MeasuredPoints.Grade.FAR_OUTSIDE};
        for (MeasuredPoints.Grade grade : order) {
            g2.setColor(gradeColour(grade));
            for (int i = 0; i < pts.size(); i++) {
                if (pts.get(i).grade() != grade) continue;
                t.transform(new Point2D.Double(scene.placed().get(i).x(), scene.placed().get(i).y()), s);
                g2.fill(new Ellipse2D.Double(s.getX() - dot / 2, s.getY() - dot / 2, dot, dot));
            }
        }
    }

    /** The colours of the grades present, bottom left, wrapping onto more rows when narrow. */
    private void paintLegend(Graphics2D g2) {
        FontMetrics fm = g2.getFontMetrics();
        int d = fm.getAscent() * 2 / 3;
        List<MeasuredPoints.Grade> shown = new ArrayList<>();
        for (MeasuredPoints.Grade grade : MeasuredPoints.Grade.values()) {
            if (scene.measured().count(grade) > 0) shown.add(grade);
        }
        List<int[]> at = new ArrayList<>();
        int x = 10;
        int row = 0;
        for (MeasuredPoints.Grade grade : shown) {
            int w = d + 5 + fm.stringWidth(grade.words());
            if (x > 10 && x + w > getWidth() - 10) {
                x = 10;
                row++;
            }
            at.add(new int[] {x, row});
            x += w + 18;
        }
        int bottom = getHeight() - 10 - row * fm.getHeight();
        // on the view's own background, so the shading under it never muddles the words
        int right = 0;
        for (int i = 0; i < shown.size(); i++) right = Math.max(right, at.get(i)[0] + d + 5 + fm.stringWidth(shown.get(i).words()));
        Color bg = Themes.color("Arcwright.zone.background");
        g2.setColor(new Color(bg.getRed(), bg.getGreen(), bg.getBlue(), 225));
        g2.fillRoundRect(4, bottom - fm.getAscent() - 4, right + 2, (row + 1) * fm.getHeight() + 6, 8, 8);
        for (int i = 0; i < shown.size(); i++) {
            int y = bottom + at.get(i)[1] * fm.getHeight();
            g2.setColor(gradeColour(shown.get(i)));
            g2.fill(new Ellipse2D.Double(at.get(i)[0], y - d, d, d));
            g2.setColor(Themes.color("Label.foreground"));
            g2.drawString(shown.get(i).words(), at.get(i)[0] + d + 5, y);
        }
    }

    @Override
    protected void paintComponent(Graphics g) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setColor(Themes.color("Arcwright.zone.background"));
            g2.fillRect(0, 0, getWidth(), getHeight());
            if (picture == null || getWidth() < 10 || getHeight() < 10) return;
            AffineTransform t = transform();
            g2.setColor(Themes.color("Arcwright.zone.material"));
            Path2D material = path(picture.material(kind, angle), true);
            g2.fill(t.createTransformedShape(material));
            if (!picture.lower().isEmpty()) {
                Path2D band = path(picture.lower(), false);
                List<Point2> up = picture.upper();
                for (int i = up.size() - 1; i >= 0; i--) band.lineTo(up.get(i).x(), up.get(i).y());
                band.closePath();
                g2.setColor(Themes.color("Arcwright.zone.band"));
                g2.fill(t.createTransformedShape(band));
                g2.setColor(Themes.color("Arcwright.zone.limit"));
                g2.setStroke(new BasicStroke(1.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 1, new float[] {6, 4}, 0));
                g2.draw(t.createTransformedShape(path(picture.lower(), false)));
                g2.draw(t.createTransformedShape(path(picture.upper(), false)));
            }
            g2.setColor(Themes.color("Arcwright.zone.nominal"));
            g2.setStroke(new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g2.draw(t.createTransformedShape(path(picture.nominal(), false)));
            if (scene != null && scene.measured() != null) {
                paintPoints(g2, t);
                // the captions are labels above the canvas, so zoomed geometry never runs under words;
                // only the legend is drawn here, on its own background
                g2.setFont(Themes.font("Arcwright.figure.font"));
                paintLegend(g2);
            }
        } finally {
            g2.dispose();
        }
    }

    private static Path2D path(List<Point2> pts, boolean close) {
        Path2D p = new Path2D.Double();
        for (int i = 0; i < pts.size(); i++) {
            if (i == 0) p.moveTo(pts.get(i).x(), pts.get(i).y()); else p.lineTo(pts.get(i).x(), pts.get(i).y());
        }
        if (close) p.closePath();
        return p;
    }
}
