package org.arcwright.render;

import java.awt.geom.PathIterator;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * The tolerancing sheet as a PDF (PDFBox): A4 pages, text in the embedded DejaVu Sans, frames as
 * vector paths with real text so that the callouts can be searched and copied, page numbers in
 * the footer. Characters the font lacks (the GD&amp;T code points) never reach the PDF: it shows the
 * plain form of each callout, and the frame drawing shows the symbols.
 */
final class PdfSheet {
    private static final float MARGIN = 50f;
    private static final float BODY = 9.5f;
    private static final float LEADING = 1.35f;
    private static final double PT_PER_MM = 72.0 / 25.4;

    private final DrawingFont drawingFont;
    private final SheetExporter.Progress progress;
    private PDDocument doc;
    private PDType0Font font;
    private PDPageContentStream cs;
    private float y;
    private final List<PDPageContentStream> open = new ArrayList<>();

    PdfSheet(DrawingFont drawingFont, SheetExporter.Progress progress) {
        this.drawingFont = drawingFont;
        this.progress = progress;
    }

    byte[] write(SheetContent s, Map<String, CalloutDrawing> frames) {
        try (PDDocument d = new PDDocument()) {
            doc = d;
            try (InputStream in = PdfSheet.class.getResourceAsStream(DrawingFont.RESOURCE)) {
                font = PDType0Font.load(doc, in, true);
            }
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(s.title());
            info.setCreator(s.generatedBy());
            info.setProducer(s.generatedBy());
            info.setCreationDate(null);
            newPage();
            List<SheetBlock> blocks = s.blocks();
            int done = 0;
            int total = s.features().size();
            for (SheetBlock b : blocks) {
                if (b instanceof SheetBlock.Heading h && h.anchor() != null) {
                    progress.update(done++, total, "PDF page for " + h.anchor());
                    need(80);
                }
                block(b, frames);
            }
            closeAll();
            footers(s);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not write the PDF", e);
        }
    }

    /** Lays out one block of the sheet's text. */
    private void block(SheetBlock b, Map<String, CalloutDrawing> frames) throws IOException {
        if (b instanceof SheetBlock.Title t) {
            heading(t.text(), 15f);
        } else if (b instanceof SheetBlock.Facts f) {
            for (SheetContent.Fact x : f.facts()) paragraph(x.label() + ": " + x.value(), BODY, 0);
        } else if (b instanceof SheetBlock.Heading h) {
            heading(h.text(), 12f);
        } else if (b instanceof SheetBlock.Subheading h) {
            subheading(h.text());
        } else if (b instanceof SheetBlock.Paragraph p) {
            String text = p.lead().isEmpty() ? p.text() : p.lead() + " " + p.text();
            paragraph(text, p.tone() == SheetBlock.Tone.CASE ? BODY - 1 : BODY, 0);
        } else if (b instanceof SheetBlock.Table t) {
            if (t.header().size() == 2) {
                for (List<String> row : t.rows()) row2(row.get(0), row.get(1));
            } else {
                table(t);
            }
        } else if (b instanceof SheetBlock.Bullets l) {
            for (String i : l.items()) bullet(i);
        } else if (b instanceof SheetBlock.Preformatted p) {
            block(p.text());
        } else if (b instanceof SheetBlock.Frame f) {
            paragraph(f.plain(), BODY, 10);
            CalloutDrawing d = frames.get(f.featureId());
            if (d != null) drawFrame(d);
        } else if (b instanceof SheetBlock.Cautions c) {
            for (String i : c.items()) bullet(i);
            space(4);
            paragraph(c.deferral(), BODY, 0);
        } else if (b instanceof SheetBlock.Colophon c) {
            space(4);
            paragraph("Made by " + c.generatedBy() + ".", BODY - 1.5f, 0);
        }
    }

    // ---- layout primitives ---------------------------------------------------------------------

    private float width() { return PDRectangle.A4.getWidth() - 2 * MARGIN; }

    private void newPage() throws IOException {
        PDPage page = new PDPage(PDRectangle.A4);
        doc.addPage(page);
        cs = new PDPageContentStream(doc, page);
        open.add(cs);
        y = PDRectangle.A4.getHeight() - MARGIN;
    }

    private void need(float height) throws IOException {
        if (y - height < MARGIN + 20) newPage();
    }

    private void space(float pt) { y -= pt; }

    private void heading(String text, float size) throws IOException {
        need(size * 3);
        space(size * 0.8f);
        List<String> lines = wrap(text, size, width());
        for (String l : lines) {
            y -= size * LEADING;
            text(l, MARGIN, y, size);
        }
        y -= 2;
        cs.setLineWidth(0.5f);
        cs.moveTo(MARGIN, y);
        cs.lineTo(MARGIN + width(), y);
        cs.stroke();
        y -= 4;
    }

    private void subheading(String text) throws IOException {
        need(BODY * 3);
        space(3);
        paragraph(text.toUpperCase(Locale.ROOT), BODY - 0.5f, 0);
    }

    private void paragraph(String text, float size, float indent) throws IOException {
        for (String l : wrap(text, size, width() - indent)) {
            need(size * LEADING);
            y -= size * LEADING;
            text(l, MARGIN + indent, y, size);
        }
    }

    private void bullet(String text) throws IOException {
        List<String> lines = wrap(text, BODY, width() - 12);
        for (int i = 0; i < lines.size(); i++) {
            need(BODY * LEADING);
            y -= BODY * LEADING;
            if (i == 0) text("•", MARGIN + 2, y, BODY);
            text(lines.get(i), MARGIN + 12, y, BODY);
        }
    }

    private void listSection(String title, List<String> items) throws IOException {
        if (items.isEmpty()) return;
        subheading(title);
        for (String i : items) bullet(i);
    }

    private void row2(String label, String value) throws IOException {
        float valueX = MARGIN + 230;
        List<String> labels = wrap(label, BODY, valueX - MARGIN - 20);
        List<String> values = wrap(value, BODY, MARGIN + width() - valueX);
        int lines = Math.max(labels.size(), values.size());
        need(lines * BODY * LEADING);
        for (int i = 0; i < lines; i++) {
            y -= BODY * LEADING;
            if (i < labels.size()) text(labels.get(i), MARGIN + 12, y, BODY);
            if (i < values.size()) text(values.get(i), valueX, y, BODY);
        }
    }

    private void block(String text) throws IOException {
        for (String raw : text.split("\n")) {
            List<String> lines = wrap(raw, BODY - 1, width() - 16);
            for (String l : lines) {
                need(BODY * LEADING);
                y -= (BODY - 1) * LEADING;
                text(l, MARGIN + 8, y, BODY - 1);
            }
        }
        y -= 4;
    }

    /** A table with columns as wide as its weights share of the text width. */
    private void table(SheetBlock.Table t) throws IOException {
        int n = t.header().size();
        float[] cols = new float[n];
        int sum = t.weights().stream().mapToInt(Integer::intValue).sum();
        float x = MARGIN;
        for (int i = 0; i < n; i++) {
            cols[i] = x;
            x += width() * t.weights().get(i) / sum;
        }
        float size = BODY - 1.5f;
        need(size * 3);
        tableRow(t.header(), cols, size);
        cs.setLineWidth(0.4f);
        cs.moveTo(MARGIN, y);
        cs.lineTo(MARGIN + width(), y);
        cs.stroke();
        for (List<String> row : t.rows()) {
            tableRow(row, cols, size);
            cs.setLineWidth(0.2f);
            cs.moveTo(MARGIN, y);
            cs.lineTo(MARGIN + width(), y);
            cs.stroke();
        }
    }

    private void tableRow(List<String> cells, float[] cols, float size) throws IOException {
        List<List<String>> wrapped = new ArrayList<>();
        int lines = 1;
        for (int i = 0; i < cells.size(); i++) {
            float w = (i + 1 < cols.length ? cols[i + 1] : MARGIN + width()) - cols[i] - 4;
            List<String> l = wrap(cells.get(i), size, w);
            wrapped.add(l);
            lines = Math.max(lines, l.size());
        }
        need(lines * size * LEADING + 4);
        float top = y;
        for (int i = 0; i < cells.size(); i++) {
            float yy = top;
            for (String l : wrapped.get(i)) {
                yy -= size * LEADING;
                text(l, cols[i], yy, size);
            }
        }
        y = top - lines * size * LEADING - 3;
    }

    private void drawFrame(CalloutDrawing d) throws IOException {
        float k = (float) PT_PER_MM;
        float h = (float) d.height() * k;
        need(h + 8);
        y -= 4;
        float left = MARGIN + 10;
        float top = y;
        cs.setLineWidth((float) d.lineWidth() * k);
        for (CalloutDrawing.Mark m : d.marks()) {
            if (m instanceof CalloutDrawing.Line l) {
                path(l.shape().getPathIterator(null), left, top, k);
                cs.stroke();
            } else if (m instanceof CalloutDrawing.Solid so) {
                path(so.shape().getPathIterator(null), left, top, k);
                cs.fill();
            } else {
                CalloutDrawing.Label t = (CalloutDrawing.Label) m;
                text(t.text(), left + (float) t.x() * k, top - (float) t.baseline() * k, (float) t.size() * k);
            }
        }
        y = top - h - 4;
    }

    private void path(PathIterator it, float left, float top, float k) throws IOException {
        double[] c = new double[6];
        while (!it.isDone()) {
            int type = it.currentSegment(c);
            switch (type) {
                case PathIterator.SEG_MOVETO:
                    cs.moveTo(left + (float) c[0] * k, top - (float) c[1] * k);
                    break;
                case PathIterator.SEG_LINETO:
                    cs.lineTo(left + (float) c[0] * k, top - (float) c[1] * k);
                    break;
                case PathIterator.SEG_QUADTO:
                    cs.curveTo1(left + (float) c[0] * k, top - (float) c[1] * k, left + (float) c[2] * k, top - (float) c[3] * k);
                    break;
                case PathIterator.SEG_CUBICTO:
                    cs.curveTo(left + (float) c[0] * k, top - (float) c[1] * k, left + (float) c[2] * k,
                            top - (float) c[3] * k, left + (float) c[4] * k, top - (float) c[5] * k);
                    break;
                default:
                    cs.closePath();
            }
            it.next();
        }
    }

    private void text(String s, float x, float yy, float size) throws IOException {
        cs.beginText();
        cs.setFont(font, size);
        cs.newLineAtOffset(x, yy);
        cs.showText(safe(s));
        cs.endText();
    }

    private String safe(String s) {
        StringBuilder sb = new StringBuilder();
        s.codePoints().forEach(cp -> {
            String ch = new String(Character.toChars(cp));
            sb.append(cp == '\t' ? "    " : drawingFont.canDisplay(ch) && cp >= 32 ? ch : "?");
        });
        return sb.toString();
    }

    private List<String> wrap(String text, float size, float maxWidth) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String whole : safe(text).split(" ")) {
            for (String word : breakLong(whole, size, maxWidth)) {
                String candidate = line.length() == 0 ? word : line + " " + word;
                if (line.length() > 0 && font.getStringWidth(candidate) / 1000 * size > maxWidth) {
                    lines.add(line.toString());
                    line = new StringBuilder(word);
                } else {
                    line = new StringBuilder(candidate);
                }
            }
        }
        lines.add(line.toString());
        return lines;
    }

    /** A word wider than the line (a long file path) cut into pieces that fit. */
    private List<String> breakLong(String word, float size, float maxWidth) throws IOException {
        List<String> parts = new ArrayList<>();
        if (font.getStringWidth(word) / 1000 * size <= maxWidth) {
            parts.add(word);
            return parts;
        }
        StringBuilder piece = new StringBuilder();
        for (int i = 0; i < word.length(); i++) {
            String next = piece.toString() + word.charAt(i);
            if (piece.length() > 0 && font.getStringWidth(next) / 1000 * size > maxWidth) {
                parts.add(piece.toString());
                piece = new StringBuilder().append(word.charAt(i));
            } else {
                piece = new StringBuilder(next);
            }
        }
        parts.add(piece.toString());
        return parts;
    }

    private void closeAll() throws IOException {
        for (PDPageContentStream s : open) s.close();
        open.clear();
    }

    private void footers(SheetContent s) throws IOException {
        int n = doc.getNumberOfPages();
        String footer = "Tolerancing sheet " + s.partNumber();
        for (int i = 0; i < n; i++) {
            PDPage page = doc.getPage(i);
            try (PDPageContentStream f = new PDPageContentStream(doc, page, PDPageContentStream.AppendMode.APPEND, true, true)) {
                f.beginText();
                f.setFont(font, 7.5f);
                f.newLineAtOffset(MARGIN, MARGIN - 20);
                f.showText(safe(footer + "  —  page " + (i + 1) + " of " + n
                        + "  —  design guidance: the governing standard decides"));
                f.endText();
            }
        }
    }
}
