package org.arcwright.render;

import static org.assertj.core.api.Assertions.assertThat;

import org.arcwright.testing.Golden;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * SVG and text output of every callout kind and modifier, against reviewed golden files in
 * {@code src/test/resources/golden/frames/}. Regenerate with {@code -Darcwright.golden.update=true}
 * and look at the SVGs before committing.
 */
class FrameGoldenTest {
    private static FrameRenderer renderer;

    @BeforeAll
    static void font() {
        renderer = FrameRenderer.withBundledFont();
    }

    @Test
    void svgOfEveryCalloutMatchesItsGoldenFile() {
        for (CalloutCatalogue.Entry e : CalloutCatalogue.all().values()) {
            String svg = renderer.svg(e.callout(), e.style(), e.units());
            assertThat(svg).startsWith("<?xml").contains("viewBox=");
            Golden.assertMatches("frames/" + e.name() + ".svg", svg);
        }
    }

    @Test
    void plainAndUnicodeTextOfEveryCalloutMatchTheGoldenFile() {
        StringBuilder sb = new StringBuilder();
        for (CalloutCatalogue.Entry e : CalloutCatalogue.all().values()) {
            sb.append("== ").append(e.name()).append(" (").append(e.style().key()).append(", ").append(e.units())
                    .append(")\n");
            sb.append(renderer.plainText(e.callout(), e.style(), e.units()));
            sb.append(renderer.unicodeText(e.callout(), e.style(), e.units()));
            sb.append('\n');
        }
        Golden.assertMatches("frames/callouts.txt", sb.toString());
    }

    @Test
    void svgTextIsDrawnAsOutlinesSoNoFontIsNeededToView() {
        String svg = renderer.svg(CalloutCatalogue.all().get("profile-between").callout(),
                DrawingStyle.ASME, Units.MM);
        assertThat(svg).doesNotContain("<text").contains("<path");
    }
}
