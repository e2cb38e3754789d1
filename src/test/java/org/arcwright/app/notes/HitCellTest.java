package org.arcwright.app.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.List;
import javax.swing.JList;
import org.arcwright.notes.NoteHit;
import org.arcwright.pack.PackLayer;
import org.junit.jupiter.api.Test;

/** A title too long for the list is cut with an ellipsis, and the tooltip carries it whole. */
class HitCellTest {
    private static FontMetrics metrics() {
        Graphics2D g = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
        return g.getFontMetrics(new Font(Font.SANS_SERIF, Font.BOLD, 13));
    }

    @Test
    void aLongTitleIsClippedWithAnEllipsisWithinTheWidth() {
        FontMetrics fm = metrics();
        String title = "Notch sensitivity: why small fillets hurt less than Kt says (and when they don't)";
        String shown = HitCell.clipped(title, fm, 150);
        assertThat(shown).endsWith("…").isNotEqualTo(title);
        assertThat(fm.stringWidth(shown)).isLessThanOrEqualTo(150);
        assertThat(HitCell.clipped("Short", fm, 150)).isEqualTo("Short");
    }

    @Test
    void theTooltipIsTheWholeTitle() {
        NoteHit hit = new NoteHit("long-title", "A title far longer than any side panel is wide, for sure", 1f, "snippet",
                "Built-in notes", PackLayer.BUILT_IN, List.of(), List.of(), List.of(), List.of());
        HitCell cell = new HitCell();
        cell.getListCellRendererComponent(new JList<>(), hit, 0, false, false);
        assertThat(cell.getToolTipText()).contains("A title far longer than any side panel is wide, for sure");
    }
}
