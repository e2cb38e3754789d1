package org.arcwright.render;

import java.util.List;
import org.arcwright.rules.NoteLink;
import org.arcwright.templates.Figures;

/** The tolerancing sheet as one self-contained HTML page, frames inlined as SVG. */
final class HtmlSheet {
    private HtmlSheet() {}

    private static final String CSS = "body{font-family:'DejaVu Sans',sans-serif;max-width:60em;margin:2em auto;"
            + "padding:0 1em;color:#111;line-height:1.4}h1{font-size:1.5em}h2{font-size:1.2em;border-bottom:1px solid #999;"
            + "margin-top:2em}table{border-collapse:collapse;margin:0.5em 0}td,th{border:1px solid #999;padding:0.2em 0.5em;"
            + "text-align:left;vertical-align:top}th{background:#eee}pre{background:#f5f5f5;padding:0.5em;white-space:pre-wrap}"
            + ".case{font-style:italic;color:#444}.undecided{color:#a40}.demoted{color:#a00;font-weight:bold}"
            + ".frame svg{max-width:100%;height:auto}.cautions{border:2px solid #a40;padding:0.5em 1em}";

    /** @param frames the SVG element of each decided feature's frame, by feature id */
    static String write(SheetContent s, java.util.Map<String, String> frames) {
        StringBuilder sb = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(esc(s.title())).append("</title>\n<style>").append(CSS).append("</style>\n</head>\n<body>\n");
        sb.append("<h1>").append(esc(s.title())).append("</h1>\n<table class=\"facts\">\n");
        for (SheetContent.Fact f : s.partFacts()) {
            sb.append("<tr><th>").append(esc(f.label())).append("</th><td>").append(esc(f.value())).append("</td></tr>\n");
        }
        sb.append("</table>\n<h2>Summary</h2>\n<table class=\"summary\">\n<tr><th>ID</th><th>Feature</th><th>Function</th>"
                + "<th>Control</th><th>Callout</th><th>Status</th></tr>\n");
        for (SheetContent.SummaryRow r : s.summary()) {
            sb.append("<tr><td><a href=\"#").append(esc(r.id())).append("\">").append(esc(r.id())).append("</a></td><td>")
                    .append(esc(r.feature())).append("</td><td>").append(esc(r.function())).append("</td><td>")
                    .append(esc(r.control())).append("</td><td><code>").append(esc(r.callout())).append("</code></td><td>")
                    .append(esc(r.status())).append("</td></tr>\n");
        }
        sb.append("</table>\n");
        if (!s.generalNotes().isEmpty()) {
            sb.append("<h2>General notes</h2>\n");
            for (String n : s.generalNotes()) sb.append("<pre>").append(esc(n)).append("</pre>\n");
        }
        for (SheetContent.FeatureSection f : s.features()) {
            sb.append("<h2 id=\"").append(esc(f.id())).append("\">").append(esc(f.id())).append(' ').append(esc(f.heading()))
                    .append("</h2>\n<p class=\"case\">").append(esc(f.caseLine())).append("</p>\n");
            if (!f.decided()) {
                sb.append("<p class=\"undecided\"><strong>Undecided:</strong> no control is chosen for this feature yet.</p>\n");
                if (!f.suggestion().isEmpty()) {
                    sb.append("<p>The advisor suggests (not chosen, to be reviewed): ").append(esc(f.suggestion())).append("</p>\n");
                }
                if (!f.inspection().isEmpty()) sb.append("<p>Last inspection: ").append(esc(f.inspection())).append("</p>\n");
                continue;
            }
            if (f.demoted()) sb.append("<p class=\"demoted\">Demoted: the chosen control failed one of its checks; see the cautions.</p>\n");
            sb.append("<p><strong>Callout:</strong> ").append(esc(f.calloutWords())).append("</p>\n");
            String svg = frames.get(f.id());
            if (svg != null) sb.append("<div class=\"frame\">").append(svg).append("</div>\n");
            sb.append("<pre>").append(esc(f.calloutUnicode())).append("</pre>\n");
            list(sb, "Why", f.because());
            if (!f.figures().isEmpty()) {
                sb.append("<h3>Numbers</h3>\n<table>\n");
                for (Figures.Figure g : f.figures()) {
                    sb.append("<tr><td>").append(esc(g.label())).append("</td><td>").append(esc(g.value())).append("</td></tr>\n");
                }
                sb.append("</table>\n");
            }
            list(sb, "Cautions", f.cautions());
            list(sb, "References", f.references());
            if (!f.notes().isEmpty()) {
                sb.append("<h3>Linked notes</h3>\n<ul>\n");
                for (NoteLink n : f.notes()) {
                    sb.append("<li>").append(esc(n.title())).append(" (<code>").append(esc(n.id())).append("</code>, ")
                            .append(esc(n.pack())).append(")</li>\n");
                }
                sb.append("</ul>\n");
            }
            if (!f.drawingNote().isEmpty()) sb.append("<h3>Drawing note</h3>\n<pre>").append(esc(f.drawingNote())).append("</pre>\n");
            if (!f.inspectionNote().isEmpty()) sb.append("<h3>Inspection plan</h3>\n<pre>").append(esc(f.inspectionNote())).append("</pre>\n");
            if (!f.inspection().isEmpty()) sb.append("<p><strong>Last inspection:</strong> ").append(esc(f.inspection())).append("</p>\n");
        }
        sb.append("<h2>Cautions</h2>\n<div class=\"cautions\">\n<ul>\n");
        for (String c : s.cautions()) sb.append("<li>").append(esc(c)).append("</li>\n");
        sb.append("</ul>\n<p><strong>").append(esc(s.deferral())).append("</strong></p>\n</div>\n");
        sb.append("<p><small>Made by ").append(esc(s.generatedBy())).append(".</small></p>\n</body>\n</html>\n");
        return sb.toString();
    }

    private static void list(StringBuilder sb, String title, List<String> items) {
        if (items.isEmpty()) return;
        sb.append("<h3>").append(title).append("</h3>\n<ul>\n");
        for (String i : items) sb.append("<li>").append(esc(i)).append("</li>\n");
        sb.append("</ul>\n");
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
