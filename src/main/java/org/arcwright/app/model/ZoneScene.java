package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.zone.Point2;

/**
 * What the Zone view shows for the selected feature: the picture of its zone, and the measured
 * points of its last inspection in this session placed at the same magnification, with the words
 * for the heading, the caption and a point's tooltip. The view only draws and transforms.
 *
 * @param picture the zone, at the corner angle of the measured points when there are some, else 90°
 * @param heading one line saying what is drawn
 * @param measured the points, or null
 * @param placed where each point is drawn (magnified like the zone), index for index with the points
 * @param pointsCaption the line about the points, empty without points
 */
public record ZoneScene(ZonePicture picture, String heading, MeasuredPoints measured, List<Point2> placed,
                        String pointsCaption) {
    /** The corner the view draws when no measured corner says otherwise. */
    public static final double DEFAULT_ANGLE = 90;

    public ZoneScene {
        placed = List.copyOf(placed);
    }

    public static ZoneScene of(RadiusFeature feature, Optional<MeasuredPoints> points, double magnification) {
        double angle = points.map(MeasuredPoints::angleDeg).orElse(DEFAULT_ANGLE);
        ZoneSpec spec = feature.chosen() != null ? ZoneSpec.of(feature.designCase(), feature.chosen().callout(), angle)
                : ZoneSpec.ofIntent(feature.designCase(), angle);
        ZonePicture picture = ZonePicture.of(spec, magnification, feature.designCase().units().symbol());
        String heading = feature.id() + " · " + (feature.chosen() != null ? "chosen: " + feature.chosen().text()
                : "not decided: showing the tolerance intent") + " · " + Numbers.trim(Math.round(angle * 10) / 10.0)
                + "° corner";
        if (points.isEmpty()) return new ZoneScene(picture, heading, null, List.of(), "");
        MeasuredPoints m = points.get();
        List<Point2> placed = new ArrayList<>(m.points().size());
        for (MeasuredPoints.Point p : m.points()) placed.add(picture.place(p.at()));
        int out = m.count(MeasuredPoints.Grade.OUTSIDE) + m.count(MeasuredPoints.Grade.FAR_OUTSIDE);
        StringBuilder caption = new StringBuilder().append(m.total()).append(" measured points");
        if (m.points().size() < m.total()) caption.append(" (").append(m.points().size()).append(" drawn)");
        caption.append(", ").append(out == 0 ? "none" : Integer.toString(out)).append(" outside ")
                .append(m.callout().describe()).append(' ').append(feature.designCase().units().symbol());
        String mismatch = m.mismatch(spec, feature);
        if (!mismatch.isEmpty()) caption.append(" · ").append(mismatch);
        return new ZoneScene(picture, heading, m, placed, caption.toString());
    }

    /**
     * Everything drawn: the zone, the nominal, the shaded material and every measured point as
     * placed, so that framing it leaves no point outside the view.
     */
    public List<Point2> extent() {
        List<Point2> all = new ArrayList<>(picture.allPoints());
        all.addAll(picture.material(picture.spec().kind(), picture.spec().angleDeg()));
        all.addAll(placed);
        return all;
    }

    /**
     * The zone, the nominal, the shaded material and the points the zone judged: what the view
     * frames first. Points along the surfaces beyond the zone's extent are left out, since a scan
     * that runs far along the legs would otherwise shrink the zone to a corner of the view; with no
     * judged point at all, every point is framed.
     */
    public List<Point2> zoneExtent() {
        List<Point2> all = new ArrayList<>(picture.allPoints());
        all.addAll(picture.material(picture.spec().kind(), picture.spec().angleDeg()));
        if (measured == null) return all;
        boolean anyJudged = false;
        for (int i = 0; i < placed.size(); i++) {
            if (measured.points().get(i).grade() != MeasuredPoints.Grade.NOT_JUDGED) {
                all.add(placed.get(i));
                anyJudged = true;
            }
        }
        if (!anyJudged) all.addAll(placed);
        return all;
    }

    /** The tooltip of point {@code i} of {@link #measured()}: which point, its deviation and its excess. */
    public String describe(int i, String units) {
        MeasuredPoints.Point p = measured.points().get(i);
        double dev = picture.deviationTowardAir(p.at());
        String excess = Double.isNaN(p.excess()) ? "not judged (beyond the zone's extent)"
                : (p.excess() > 0 ? "outside by " : "inside by ") + Numbers.fixed(Math.abs(p.excess()), 4) + " " + units
                        + " (" + p.measure() + ")";
        return "point #" + p.index() + " · deviation " + (dev >= 0 ? "+" : "") + Numbers.fixed(dev, 4) + " " + units
                + (dev >= 0 ? " (air side)" : " (material side)") + " · " + excess;
    }
}
