package org.arcwright.render;

import java.util.List;
import org.arcwright.rules.NoteLink;
import org.arcwright.templates.Figures;

/**
 * The tolerancing sheet as Markdown. Frames are referenced as SVG files in a folder beside the
 * sheet (written by {@link SheetExporter}); the Unicode line of each callout is there as well, for
 * readers that show no images.
 */
final class MarkdownSheet {
    private MarkdownSheet() {}

    /**
     * @param framesDir the folder name, relative to the sheet, holding {@code ID.svg} per decided feature
     */
    static String write(SheetContent s, String framesDir) {
        StringBuilder sb = new StringBuilder();
        sb.append("# ").append(s.title()).append("\n\n");
        for (SheetContent.Fact f : s.partFacts()) sb.append("- **").append(f.label()).append(":** ").append(esc(f.value())).append('\n');
        sb.append("\n## Summary\n\n");
        sb.append("| ID | Feature | Function | Control | Callout | Status |\n");
        sb.append("|---|---|---|---|---|---|\n");
        for (SheetContent.SummaryRow r : s.summary()) {
            sb.append("| ").append(r.id()).append(" | ").append(cell(r.feature())).append(" | ").append(r.function())
                    .append(" | ").append(cell(r.control())).append(" | `").append(r.callout().replace("|", "\\|"))
                    .append("` | ").append(r.status()).append(" |\n");
        }
        if (!s.generalNotes().isEmpty()) {
            sb.append("\n## General notes\n\n");
            for (String n : s.generalNotes()) sb.append("```text\n").append(n).append("\n```\n\n");
        }
        for (SheetContent.FeatureSection f : s.features()) {
            sb.append("\n## ").append(f.id()).append(" ").append(esc(f.heading())).append("\n\n");
            sb.append("*").append(esc(f.caseLine())).append("*\n\n");
            if (!f.decided()) {
                sb.append("**Undecided:** no control is chosen for this feature yet.\n");
                if (!f.suggestion().isEmpty()) {
                    sb.append("\nThe advisor suggests (not chosen, to be reviewed): ").append(esc(f.suggestion())).append('\n');
                }
                if (!f.inspection().isEmpty()) sb.append("\nLast inspection: ").append(esc(f.inspection())).append('\n');
                continue;
            }
            if (f.demoted()) sb.append("**Demoted:** the chosen control failed one of its checks; see the cautions.\n\n");
            sb.append("**Callout:** ").append(esc(f.calloutWords())).append("\n\n");
            sb.append("![").append(f.id()).append(" callout](").append(framesDir).append('/').append(f.id()).append(".svg)\n\n");
            sb.append("```text\n").append(f.calloutUnicode()).append("\n```\n\n");
            list(sb, "Why", f.because());
            if (!f.figures().isEmpty()) {
                sb.append("**Numbers**\n\n| Figure | Value |\n|---|---|\n");
                for (Figures.Figure g : f.figures()) sb.append("| ").append(cell(g.label())).append(" | ").append(cell(g.value())).append(" |\n");
                sb.append('\n');
            }
            list(sb, "Cautions", f.cautions());
            list(sb, "References", f.references());
            if (!f.notes().isEmpty()) {
                sb.append("**Linked notes**\n\n");
                for (NoteLink n : f.notes()) sb.append("- ").append(esc(n.title())).append(" (`").append(n.id()).append("`, ").append(esc(n.pack())).append(")\n");
                sb.append('\n');
            }
            if (!f.drawingNote().isEmpty()) sb.append("**Drawing note**\n\n```text\n").append(f.drawingNote()).append("\n```\n\n");
            if (!f.inspectionNote().isEmpty()) sb.append("**Inspection plan**\n\n```text\n").append(f.inspectionNote()).append("\n```\n\n");
            if (!f.inspection().isEmpty()) sb.append("**Last inspection:** ").append(esc(f.inspection())).append("\n\n");
        }
        sb.append("\n## Cautions\n\n");
        for (String c : s.cautions()) sb.append("- ").append(esc(c)).append('\n');
        sb.append("\n").append(esc(s.deferral())).append("\n\n");
        sb.append("*Made by ").append(s.generatedBy()).append(".*\n");
        return sb.toString();
    }

    private static void list(StringBuilder sb, String title, List<String> items) {
        if (items.isEmpty()) return;
        sb.append("**").append(title).append("**\n\n");
        for (String i : items) sb.append("- ").append(esc(i)).append('\n');
        sb.append('\n');
    }

    private static String cell(String s) { return esc(s).replace("|", "\\|"); }

    private static String esc(String s) {
        return s.replace("\\", "\\\\").replace("*", "\\*").replace("_", "\\_").replace("<", "&lt;");
    }
}
