package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.model.BlendKind;
import org.arcwright.zone.Point2;
import org.junit.jupiter.api.Test;

/**
 * The Zone view says in words when the magnification misdraws a boundary, names the units of every
 * figure it shows, and fits the measured points with the zone. A limit arc of radius ρ is drawn with
 * radius r + M(ρ − r), so R2 ±0.2 keeps an arc for its R1.8 limit while 2 − 0.2 M &gt; 0, that is up to
 * ×9 (tangent-arc geometry, common practice).
 */
class ZoneDistortionTest {
    private static ZoneSpec r2PlusMinus02() {
        return ZoneSpec.of(Fixtures.fillet(2, null), new Callout.Radius(1.8, 2.2, 2.0), 90);
    }

    @Test
    void atX100OnR2PlusMinus02TheSmallerLimitArcIsSaidToBeDrawnAsASharpCorner() {
        ZonePicture p = ZonePicture.of(r2PlusMinus02(), 100, "mm");
        assertThat(p.distortion()).contains("×100", "R1.8 mm", "sharp corner", "smallest radius is 1.8 mm",
                "-18.000 mm", "×9 or less");
    }

    @Test
    void upToX9TheSmallerLimitIsStillAnArcAndNoWarningIsGiven() {
        assertThat(ZonePicture.of(r2PlusMinus02(), 9, "mm").distortion()).isEmpty();
        assertThat(ZonePicture.of(r2PlusMinus02(), 10, "mm").distortion()).contains("sharp corner");
    }

    @Test
    void aProfileBandWhoseCentreSideFoldsOverIsWarnedToo() {
        // 0.4 mm equally disposed about R0.5: the centre side 0.2 mm × 3 = 0.6 mm exceeds the radius
        ZonePicture p = ZonePicture.of(new ZoneSpec.Band(0.5, 0.4, 0.2, 90, BlendKind.FILLET), 3, "mm");
        assertThat(p.distortion()).contains("folds over", "0.4 mm", "×2 or less");
        assertThat(ZonePicture.of(new ZoneSpec.Band(0.5, 0.4, 0.2, 90, BlendKind.FILLET), 2, "mm").distortion()).isEmpty();
    }

    @Test
    void theLimitsAndTheZoneCarryTheirUnits() {
        assertThat(ZonePicture.of(r2PlusMinus02(), 5, "mm").caption()).isEqualTo("R limits 1.8 to 2.2 mm");
        assertThat(ZonePicture.of(new ZoneSpec.Band(0.5, 0.04, 0.02, 90, BlendKind.FILLET), 5, "in").caption())
                .isEqualTo("profile zone 0.04 in equally disposed");
    }

    @Test
    void fitTakesInTheMeasuredPointsAsPlaced() {
        ZonePicture p = ZonePicture.of(r2PlusMinus02(), 5, "mm");
        Point2 far = new Point2(40, -3);
        ZoneScene scene = new ZoneScene(p, "F1", null, List.of(far), "");
        assertThat(scene.extent()).contains(far).containsAll(p.allPoints());
    }
}
