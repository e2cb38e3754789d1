package org.arcwright.render;

import java.util.List;
import java.util.Map;

/**
 * Lays out the tolerancing sheet's blocks ({@link SheetContent#blocks()}) as one self-contained
 * HTML page, frames inlined as SVG.
 */
final class HtmlSheet {
    private HtmlSheet() {}

    private static final String CSS = "body{font-family:'DejaVu Sans',sans-serif;max-width:60em;margin:2em auto;"
            + "padding:0 1em;color:#111;line-height:1.4}h1{font-size:1.5em}h2{font-size:1.2em;border-bottom:1px solid #999;"
            + "margin-top:2em}table{border-collapse:collapse;margin:0.5em 0}td,th{border:1px solid #999;padding:0.2em 0.5em;"
            + "text-align:left;vertical-align:top}th{background:#eee}pre{background:#f5f5f5;padding:0.5em;white-space:pre-wrap}"
            + ".case{font-style:italic;color:#444}.warning{color:#a40}.alert{color:#a00;font-weight:bold}"
            + ".frame svg{max-width:100%;height:auto}.cautions{border:2px solid #a40;padding:0.5em 1em}";

    /** @param frames the SVG element of each decided feature's frame, by feature id */
    static String write(SheetContent s, Map<String, String> frames) {
        StringBuilder sb = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(esc(s.title())).append("</title>\n<style>").append(CSS).append("</style>\n</head>\n<body>\n");
        for (SheetBlock b : s.blocks()) {
            if (b instanceof SheetBlock.Title t) {
                sb.append("<h1>").append(esc(t.text())).append("</h1>\n");
            } else if (b instanceof SheetBlock.Facts f) {
                sb.append("<table class=\"facts\">\n");
                for (SheetContent.Fact x : f.facts()) {
                    sb.append("<tr><th>").append(esc(x.label())).append("</th><td>").append(esc(x.value())).append("</td></tr>\n");
                }
                sb.append("</table>\n");
            } else if (b instanceof SheetBlock.Heading h) {
                sb.append(h.anchor() == null ? "<h2>" : "<h2 id=\"" + esc(h.anchor()) + "\">").append(esc(h.text())).append("</h2>\n");
            } else if (b instanceof SheetBlock.Subheading h) {
                sb.append("<h3>").append(esc(h.text())).append("</h3>\n");
            } else if (b instanceof SheetBlock.Paragraph p) {
                sb.append(open(p.tone()));
                if (!p.lead().isEmpty()) sb.append("<strong>").append(esc(p.lead())).append("</strong> ");
                sb.append(esc(p.text())).append("</p>\n");
            } else if (b instanceof SheetBlock.Table t) {
                table(sb, t);
            } else if (b instanceof SheetBlock.Bullets l) {
                sb.append("<ul>\n");
                for (String i : l.items()) sb.append("<li>").append(esc(i)).append("</li>\n");
                sb.append("</ul>\n");
            } else if (b instanceof SheetBlock.Preformatted p) {
                sb.append("<pre>").append(esc(p.text())).append("</pre>\n");
            } else if (b instanceof SheetBlock.Frame f) {
                String svg = frames.get(f.featureId());
                if (svg != null) sb.append("<div class=\"frame\">").append(svg).append("</div>\n");
                sb.append("<pre>").append(esc(f.unicode())).append("</pre>\n");
            } else if (b instanceof SheetBlock.Cautions c) {
                sb.append("<div class=\"cautions\">\n<ul>\n");
                for (String i : c.items()) sb.append("<li>").append(esc(i)).append("</li>\n");
                sb.append("</ul>\n<p><strong>").append(esc(c.deferral())).append("</strong></p>\n</div>\n");
            } else if (b instanceof SheetBlock.Colophon c) {
                sb.append("<p><small>Made by ").append(esc(c.generatedBy())).append(".</small></p>\n");
            }
        }
        sb.append("</body>\n</html>\n");
        return sb.toString();
    }

    private static String open(SheetBlock.Tone tone) {
        switch (tone) {
            case CASE: return "<p class=\"case\">";
            case WARNING: return "<p class=\"warning\">";
            case ALERT: return "<p class=\"alert\">";
            default: return "<p>";
        }
    }

    private static void table(StringBuilder sb, SheetBlock.Table t) {
        sb.append("<table>\n<tr>");
        for (String h : t.header()) sb.append("<th>").append(esc(h)).append("</th>");
        sb.append("</tr>\n");
        for (List<String> row : t.rows()) {
            sb.append("<tr>");
            for (int i = 0; i < row.size(); i++) {
                String cell = esc(row.get(i));
                if (i == t.anchorColumn()) cell = "<a href=\"#" + cell + "\">" + cell + "</a>";
                if (i == t.codeColumn()) cell = "<code>" + cell + "</code>";
                sb.append("<td>").append(cell).append("</td>");
            }
            sb.append("</tr>\n");
        }
        sb.append("</table>\n");
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
