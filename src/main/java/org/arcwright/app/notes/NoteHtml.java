package org.arcwright.app.notes;

import java.util.Set;
import org.commonmark.node.Image;
import org.commonmark.node.Link;
import org.commonmark.node.Node;
import org.commonmark.node.Text;
import org.commonmark.parser.Parser;
import org.commonmark.renderer.NodeRenderer;
import org.commonmark.renderer.html.HtmlNodeRendererContext;
import org.commonmark.renderer.html.HtmlRenderer;
import org.commonmark.renderer.html.HtmlWriter;
import org.arcwright.notes.FiledNote;
import org.arcwright.notes.Note;

/**
 * A note as the HTML the reader shows, rendered from its Markdown with commonmark-java. Safe by
 * construction: raw HTML in a note is escaped, links show as their text only (nothing to follow) and
 * images as their alt text (nothing fetched), so a note can never reach the network or run markup.
 */
final class NoteHtml {
    private static final Parser PARSER = Parser.builder().build();
    private static final HtmlRenderer RENDERER = HtmlRenderer.builder()
            .escapeHtml(true)
            .sanitizeUrls(true)
            .nodeRendererFactory(TextOnly::new)
            .build();

    private NoteHtml() {}

    /** The body's Markdown as an HTML fragment. */
    static String body(String markdown) {
        return RENDERER.render(PARSER.parse(markdown == null ? "" : markdown));
    }

    /** A whole page: the title, its standards and pack, then the body. */
    static String page(FiledNote filed) {
        Note n = filed.note();
        String standards = String.join(", ", n.standards());
        return "<html><body><h2>" + escape(n.title()) + "</h2><p><i>"
                + escape((standards.isEmpty() ? "" : standards + " · ") + filed.pack()
                + (n.author().isBlank() ? "" : " · " + n.author()))
                + "</i></p>" + body(n.body()) + "</body></html>";
    }

    static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    /** Renders links as their text and images as their alt text. */
    private static final class TextOnly implements NodeRenderer {
        private final HtmlNodeRendererContext context;
        private final HtmlWriter html;

        TextOnly(HtmlNodeRendererContext context) {
            this.context = context;
            this.html = context.getWriter();
        }

        @Override
        public Set<Class<? extends Node>> getNodeTypes() { return Set.of(Link.class, Image.class); }

        @Override
        public void render(Node node) {
            if (node instanceof Image) {
                StringBuilder alt = new StringBuilder();
                for (Node c = node.getFirstChild(); c != null; c = c.getNext()) if (c instanceof Text t) alt.append(t.getLiteral());
                html.text(alt.toString());
                return;
            }
            for (Node c = node.getFirstChild(); c != null; c = c.getNext()) context.render(c);
        }
    }
}
