package org.arcwright.app.zoneview;

import com.formdev.flatlaf.FlatClientProperties;
import java.util.Hashtable;
import java.util.Optional;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.model.ZonePicture;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.app.model.ZoneScene;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The Zone view of the selected feature: its chosen control's zone (or, before a choice, the zone of
 * the tolerance intent) about the nominal blend, with a magnification for deviations, and the
 * measured points of the feature's last check in this session, magnified alike and coloured by excess.
 */
public final class ZoneViewPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient WorksheetSession session;
    private final ZoneCanvas canvas = new ZoneCanvas();
    private final JSlider magnification = new JSlider(0, 100, 50);
    private final JLabel magnificationText = new JLabel();
    /** The feature and zone the slider was last set for. */
    private String framed = "";
    private final JLabel what = new JLabel();
    private final WrapLabel caption = new WrapLabel("", "Label.font", null);
    private final WrapLabel width = new WrapLabel("", "Label.font", null);
    private final WrapLabel pointsCaption = new WrapLabel("", "Label.font", null);
    private final WrapLabel distortion = new WrapLabel("", "Label.font", "Arcwright.fail.foreground");

    public ZoneViewPanel(WorksheetSession session) {
        super(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", ""));
        this.session = session;
        setName("zoneView");
        magnification.setName("magnification");
        magnification.setToolTipText("Multiplies deviations from nominal so a narrow zone can be seen; the figures stay true");
        magnification.addChangeListener(e -> redraw());
        Hashtable<Integer, JLabel> labels = new Hashtable<>();
        labels.put(0, new JLabel("×1"));
        labels.put(50, new JLabel("×10"));
        labels.put(100, new JLabel("×100"));
        magnification.setLabelTable(labels);
        magnification.setPaintLabels(true);
        JButton fit = new JButton("Fit");
        fit.setName("zoneFit");
        fit.setToolTipText("Frame the zone and the points it judges; undo zoom and pan (wheel zooms, drag pans)");
        fit.addActionListener(e -> canvas.fit());
        JButton all = new JButton("All points");
        all.setName("zoneAllPoints");
        all.setToolTipText("Frame every measured point, those along the surfaces too");
        all.addActionListener(e -> canvas.fitEveryPoint());
        JButton in = new JButton("+");
        in.setToolTipText("Zoom in");
        in.addActionListener(e -> canvas.zoomBy(1.5));
        JButton out = new JButton("−");
        out.setToolTipText("Zoom out");
        out.addActionListener(e -> canvas.zoomBy(1 / 1.5));
        // insets as wide as the buttons' focus ring, which would otherwise be cut at the bar's edges
        JPanel bar = new JPanel(new MigLayout("insets 2, gap 8", "[grow,fill][][][][]", "[]"));
        what.setName("zoneWhat");
        what.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        add(what, "wmin 10");
        bar.add(new JLabel(), "");
        bar.add(new JLabel("Deviation magnification"));
        bar.add(magnification, "wmin 5sp, w 14sp");
        bar.add(magnificationText, "w 3sp!");
        bar.add(in, "split 4");
        bar.add(out);
        bar.add(fit);
        bar.add(all);
        add(bar, "wmin 10, hmin pref");
        caption.setName("zoneCaption");
        width.setName("zoneWidth");
        pointsCaption.setName("zonePointsCaption");
        distortion.setName("zoneDistortion");
        add(caption, "wmin 10, hidemode 3");
        add(width, "wmin 10, hidemode 3");
        add(pointsCaption, "wmin 10, hidemode 3");
        add(distortion, "wmin 10, hidemode 3");
        add(canvas, "push, grow, wmin 10, hmin 10");
        session.listeners().add(this::redraw);
        redraw();
    }

    /** Moves the slider to {@code factor} (1 to 100), which redraws the view. */
    public void setMagnification(double factor) {
        int value = (int) Math.round(50 * Math.log10(Math.max(1, Math.min(100, factor))));
        if (magnification.getValue() == value) redraw();
        else magnification.setValue(value);
    }

    /** The magnification the slider stands at: 1 to 100 on a logarithmic scale. */
    public double magnification() {
        return Math.round(Math.pow(10, magnification.getValue() / 50.0));
    }

    private void redraw() {
        magnificationText.setText("×" + (long) magnification());
        Optional<RadiusFeature> f = session.selected();
        if (f.isEmpty()) {
            what.setText("No feature selected");
            captions(null, "mm");
            canvas.show(null, "mm", null);
            return;
        }
        RadiusFeature feature = f.get();
        ZoneScene scene = ZoneScene.of(feature, session.measured(feature.id()), magnification());
        String shown = feature.id() + "|" + scene.picture().spec();
        if (!shown.equals(framed)) {
            // a new feature or zone starts at the magnification that suits it; the slider then stays where the user puts it
            framed = shown;
            setMagnification(scene.picture().spec().suggestedMagnification());
            return;
        }
        what.setText(scene.heading());
        captions(scene, feature.designCase().units().symbol());
        canvas.show(scene, feature.designCase().units().symbol(), feature.designCase().kind());
    }

    /** The words about the drawing, above it rather than over it, with their units. */
    private void captions(ZoneScene scene, String units) {
        ZonePicture p = scene == null ? null : scene.picture();
        set(caption, p == null ? "" : p.caption() + " · material shaded");
        set(width, p == null || Double.isNaN(p.crescentWidth()) ? ""
                : "Zone width on the bisector: " + Numbers.fixed(p.crescentWidth(), 4) + " " + units
                + (p.magnification() > 1 ? " (deviations shown ×" + Numbers.trim(p.magnification()) + "; figures are true size)" : ""));
        set(pointsCaption, scene == null ? "" : scene.pointsCaption());
        set(distortion, p == null ? "" : p.distortion());
    }

    private static void set(WrapLabel l, String text) {
        l.setText(text);
        l.setVisible(!text.isEmpty());
    }

    /** The warning shown when the magnification misdraws a boundary; empty when none (tests). */
    public String distortionWarning() { return distortion.isVisible() ? distortion.getText() : ""; }

    /** The caption lines shown above the drawing (tests). */
    public String captionText() {
        return String.join("\n", caption.getText(), width.getText(), pointsCaption.getText());
    }

    /** How many measured points the view plots for the selected feature (tests). */
    public int plottedPoints() { return canvas.plottedPoints(); }

    /** What hovering over plotted point {@code i} shows (tests). */
    public String pointTooltip(int i) { return canvas.tooltipOfPoint(i); }

    /** Width and height, in part units, of what the view frames at zoom 1 (tests). */
    public double[] framedSize() { return canvas.framedSize(); }
}
