package org.arcwright.render;

import java.util.List;

/**
 * Lays out the tolerancing sheet's blocks ({@link SheetContent#blocks()}) as Markdown. Frames are
 * referenced as SVG files in a folder beside the sheet (written by {@link SheetExporter}); the
 * Unicode line of each callout is there as well, for readers that show no images.
 */
final class MarkdownSheet {
    private MarkdownSheet() {}

    /**
     * @param framesDir the folder name, relative to the sheet, holding {@code ID.svg} per decided feature
     */
    static String write(SheetContent s, String framesDir) {
        StringBuilder sb = new StringBuilder();
        for (SheetBlock b : s.blocks()) {
            if (b instanceof SheetBlock.Title t) {
                sb.append("# ").append(t.text()).append("\n\n");
            } else if (b instanceof SheetBlock.Facts f) {
                for (SheetContent.Fact x : f.facts()) sb.append("- **").append(x.label()).append(":** ").append(esc(x.value())).append('\n');
            } else if (b instanceof SheetBlock.Heading h) {
                if (sb.length() > 0 && !sb.toString().endsWith("\n\n")) sb.append('\n');
                sb.append("## ").append(h.anchor() == null ? h.text() : esc(h.text())).append("\n\n");
            } else if (b instanceof SheetBlock.Subheading h) {
                sb.append("**").append(h.text()).append("**\n\n");
            } else if (b instanceof SheetBlock.Paragraph p) {
                paragraph(sb, p);
            } else if (b instanceof SheetBlock.Table t) {
                table(sb, t);
            } else if (b instanceof SheetBlock.Bullets l) {
                for (String i : l.items()) sb.append("- ").append(esc(i)).append('\n');
                sb.append('\n');
            } else if (b instanceof SheetBlock.Preformatted p) {
                sb.append("```text\n").append(p.text()).append("\n```\n\n");
            } else if (b instanceof SheetBlock.Frame f) {
                sb.append("![").append(f.featureId()).append(" callout](").append(framesDir).append('/').append(f.featureId())
                        .append(".svg)\n\n```text\n").append(f.unicode()).append("\n```\n\n");
            } else if (b instanceof SheetBlock.Cautions c) {
                for (String i : c.items()) sb.append("- ").append(esc(i)).append('\n');
                sb.append("\n").append(esc(c.deferral())).append("\n\n");
            } else if (b instanceof SheetBlock.Colophon c) {
                sb.append("*Made by ").append(c.generatedBy()).append(".*\n");
            }
        }
        return sb.toString();
    }

    private static void paragraph(StringBuilder sb, SheetBlock.Paragraph p) {
        if (p.tone() == SheetBlock.Tone.CASE) {
            sb.append('*').append(esc(p.text())).append("*\n\n");
            return;
        }
        if (!p.lead().isEmpty()) sb.append("**").append(p.lead()).append("** ");
        sb.append(esc(p.text())).append("\n\n");
    }

    private static void table(StringBuilder sb, SheetBlock.Table t) {
        sb.append("| ").append(String.join(" | ", t.header())).append(" |\n|");
        sb.append("---|".repeat(t.header().size())).append('\n');
        for (List<String> row : t.rows()) {
            sb.append('|');
            for (int i = 0; i < row.size(); i++) {
                String cell = row.get(i);
                sb.append(' ').append(i == t.codeColumn() ? "`" + cell.replace("|", "\\|") + "`" : cell(cell)).append(" |");
            }
            sb.append('\n');
        }
        sb.append('\n');
    }

    private static String cell(String s) { return esc(s).replace("|", "\\|"); }

    private static String esc(String s) {
        return s.replace("\\", "\\\\").replace("*", "\\*").replace("_", "\\_").replace("<", "&lt;");
    }
}
