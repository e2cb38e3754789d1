package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.arcwright.zone.Point2;
import org.junit.jupiter.api.Test;

/**
 * Picking a CSV's frame with three clicks: the vertex, then a point along each leg, kept to the
 * precision a click has. Steps of 1, 2 and 5 × 10ⁿ are common practice for scales and rounding.
 */
class FramePickTest {
    /** One pixel of the plot stood for 0.025 mm at every click. */
    private static final double PX = 0.025;

    @Test
    void threeClicksGiveTheVertexAndTheLegsToTheClicksPrecision() {
        FramePick p = FramePick.start("mm");
        assertThat(p.prompt()).startsWith("Click the corner's vertex");
        p = p.click(new Point2(10.013, 9.987), PX);
        // a pixel of 0.025 mm rounds to the 0.05 mm step: (10.013, 9.987) is (10, 10)
        assertThat(p.vertexX()).isEqualTo(10.0);
        assertThat(p.vertexY()).isEqualTo(10.0);
        assertThat(p.prompt()).startsWith("Vertex at (10, 10) mm").contains("first leg");
        p = p.click(new Point2(5.01, 10.02), PX);
        // 0.025 mm at 4.99 mm subtends 0.29°, so the step is 0.5°: 179.77° is 180°
        assertThat(p.legDegrees(1)).isEqualTo(180.0);
        assertThat(p.complete()).isFalse();
        p = p.click(new Point2(10.02, 5.0), PX);
        // below +x, the direction is reported in [0, 360): -89.77° is 270°
        assertThat(p.legDegrees(2)).isEqualTo(270.0);
        assertThat(p.complete()).isTrue();
        assertThat(p.prompt()).isEqualTo("Frame picked: vertex (10, 10) mm, legs at 180° and 270°.");
        CheckRequests.Frame f = p.frame();
        CheckRequests.Frame typed = CheckRequests.Frame.ofDegrees(10, 10, 180, 270);
        assertThat(f.vertex()).isEqualTo(typed.vertex());
        assertThat(f.legA().minus(typed.legA()).length()).isLessThan(1e-12);
        assertThat(f.legB().minus(typed.legB()).length()).isLessThan(1e-12);
    }

    @Test
    void aLegClickOnTheVertexGivesNoDirectionAndIsAskedAgain() {
        FramePick p = FramePick.start("in").click(new Point2(0, 0), 0.001);
        FramePick again = p.click(new Point2(0.002, 0.001), 0.001);
        assertThat(again).isEqualTo(p);
        assertThat(again.prompt()).contains("first leg");
        FramePick done = p.click(new Point2(1, 0), 0.001).click(new Point2(0, 1), 0.001);
        assertThat(done.click(new Point2(2, 2), 0.001)).isEqualTo(done);
        assertThatThrownBy(() -> p.frame()).isInstanceOf(IllegalStateException.class);
    }

    @Test
    void aFineClickKeepsFinerFigures() {
        // 0.0004 in per pixel rounds to 0.0005 in; 1.13 in from the vertex it subtends 0.020°, so 0.05° steps
        FramePick p = FramePick.start("in").click(new Point2(0.12345, -0.5), 0.0004).click(new Point2(1.12345, 0.0176), 0.0004);
        assertThat(p.vertexX()).isEqualTo(0.1235, within(1e-12));
        assertThat(p.vertexY()).isEqualTo(-0.5);
        assertThat(p.legDegrees(1)).isEqualTo(27.35, within(1e-9));
    }

    @Test
    void stepsAreOneTwoOrFiveTimesAPowerOfTen() {
        assertThat(FramePick.step(0.025)).isEqualTo(0.05, within(1e-15));
        assertThat(FramePick.step(0.01)).isEqualTo(0.01, within(1e-15));
        assertThat(FramePick.step(0.3)).isEqualTo(0.5, within(1e-15));
        assertThat(FramePick.step(3)).isEqualTo(5, within(1e-12));
        assertThat(FramePick.step(6)).isEqualTo(10, within(1e-12));
    }
}
