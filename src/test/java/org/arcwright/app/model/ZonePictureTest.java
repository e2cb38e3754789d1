package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.junit.jupiter.api.Test;

class ZonePictureTest {
    /**
     * The view draws the zone package's geometry, not a copy of it: at a 60° round, each magnified
     * limit arc is the blend {@link org.arcwright.zone.Corner} gives for the magnified radius, and
     * the legs run along the corner's legs (plane geometry of tangent arcs, common practice).
     */
    @Test
    void theLimitArcsAreTheZonePackagesBlendsOfTheMagnifiedRadii() {
        ZoneSpec spec = new ZoneSpec.LimitArcs(2, 1.8, 2.2, 60, BlendKind.ROUND, false);
        ZonePicture p = ZonePicture.of(spec, 3);
        Corner k = ZonePicture.viewCorner(60, BlendKind.ROUND);
        double lo = 2 + 3 * (1.8 - 2), hi = 2 + 3 * (2.2 - 2);
        for (Point2 pt : p.lower().subList(1, p.lower().size() - 1)) {
            assertThat(pt.distance(k.centre(lo))).isEqualTo(lo, within(1e-9));
        }
        for (Point2 pt : p.upper().subList(1, p.upper().size() - 1)) {
            assertThat(pt.distance(k.centre(hi))).isEqualTo(hi, within(1e-9));
        }
        assertThat(p.upper().get(1).distance(k.tangentA(hi))).isLessThan(1e-9);
        assertThat(p.upper().get(p.upper().size() - 2).distance(k.tangentB(hi))).isLessThan(1e-9);
        Point2 farA = p.nominal().get(0);
        assertThat(farA.unit().minus(k.legA()).length()).isLessThan(1e-12);
        // a point on the smaller limit is drawn on the smaller magnified limit arc
        Point2 onMin = k.centre(1.8).minus(k.bisector().times(1.8));
        assertThat(p.place(onMin).distance(k.centre(lo))).isEqualTo(lo, within(1e-9));
    }

    @Test
    void theNominalBlendIsTangentToBothSurfacesOfARightAngle() {
        ZonePicture p = ZonePicture.of(new ZoneSpec.NominalOnly(2, 90, BlendKind.FILLET), 1);
        // centre at (r, r); every arc point lies r from it (tangent-arc geometry, common practice)
        for (Point2 pt : p.nominal().subList(1, p.nominal().size() - 1)) {
            assertThat(Math.hypot(pt.x() - 2, pt.y() - 2)).isEqualTo(2, within(1e-9));
        }
        assertThat(p.distanceToNominal(new Point2(2, 2))).isEqualTo(2, within(1e-3));
    }

    @Test
    void limitArcsAreMagnifiedButTheStatedWidthStaysTrue() {
        ZoneSpec spec = ZoneSpec.of(Fixtures.fillet(0.55, null), new Callout.Radius(0.5, 0.6, 0.55), 90);
        ZonePicture p = ZonePicture.of(spec, 10);
        // crescent 0.1 × (√2 − 1) on the bisector of a 90° corner (see CrescentZone)
        assertThat(p.crescentWidth()).isEqualTo(0.1 * (Math.sqrt(2) - 1), within(1e-12));
        Point2 mid = p.upper().get(p.upper().size() / 2);
        double upperRadiusDrawn = 0.55 + 10 * 0.05;
        assertThat(Math.hypot(mid.x() - upperRadiusDrawn, mid.y() - upperRadiusDrawn)).isEqualTo(upperRadiusDrawn, within(1e-9));
    }

    @Test
    void aProfileBandOfAFilletPutsItsOutwardPartAwayFromTheVertex() {
        ZoneSpec spec = ZoneSpec.of(Fixtures.fillet(2, null), new Callout.Profile(0.2, 0.15, List.of(), false, null), 90);
        ZonePicture p = ZonePicture.of(spec, 1);
        Point2 nomMid = p.nominal().get(p.nominal().size() / 2);
        Point2 lowMid = p.lower().get(p.lower().size() / 2);
        Point2 upMid = p.upper().get(p.upper().size() / 2);
        double toVertexNom = Math.hypot(nomMid.x(), nomMid.y());
        assertThat(toVertexNom - Math.hypot(lowMid.x(), lowMid.y())).isEqualTo(0.05, within(1e-9));
        assertThat(Math.hypot(upMid.x(), upMid.y()) - toVertexNom).isEqualTo(0.15, within(1e-9));
    }

    @Test
    void withoutAToleranceOnlyTheNominalIsDrawn() {
        ZonePicture p = ZonePicture.of(ZoneSpec.ofIntent(Fixtures.fillet(1, null), 90), 5);
        assertThat(p.lower()).isEmpty();
        assertThat(p.crescentWidth()).isNaN();
    }

    @Test
    void startingMagnificationKeepsTheMagnifiedZoneWithinSixtyPercentOfTheRadius() {
        // CR 1.8-2.2 on R2: band 0.4, so x3 (at x10 the smaller limit arc would shrink to the corner)
        assertThat(new ZoneSpec.LimitArcs(2, 1.8, 2.2, 90, BlendKind.FILLET, true).suggestedMagnification()).isEqualTo(3);
        // profile 0.05 on R2: x20 draws a 1.0 band, x30 would draw 1.5 > 1.2
        assertThat(new ZoneSpec.Band(2, 0.05, 0.025, 90, BlendKind.ROUND).suggestedMagnification()).isEqualTo(20);
        // a wide band on a small radius stays at true scale; the nominal alone needs none
        assertThat(new ZoneSpec.LimitArcs(0.4, 0.2, 0.6, 90, BlendKind.ROUND, false).suggestedMagnification()).isEqualTo(1);
        assertThat(new ZoneSpec.NominalOnly(2, 90, BlendKind.FILLET).suggestedMagnification()).isEqualTo(1);
        // a MAX-only radius counts only the side it limits
        assertThat(new ZoneSpec.LimitArcs(1, 0, 1.02, 90, BlendKind.FILLET, false).suggestedMagnification()).isEqualTo(1);
    }
}
