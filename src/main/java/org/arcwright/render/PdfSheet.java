package org.arcwright.render;

import java.awt.geom.PathIterator;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.arcwright.rules.NoteLink;
import org.arcwright.templates.Figures;

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
            heading(s.title(), 15f);
            for (SheetContent.Fact f : s.partFacts()) paragraph(f.label() + ": " + f.value(), BODY, 0);
            heading("Summary", 12f);
            summary(s);
            if (!s.generalNotes().isEmpty()) {
                heading("General notes", 12f);
                for (String n : s.generalNotes()) block(n);
            }
            int done = 0;
            int total = s.features().size();
            for (SheetContent.FeatureSection f : s.features()) {
                progress.update(done, total, "PDF page for " + f.id());
                feature(f, frames.get(f.id()));
                done++;
            }
            heading("Cautions", 12f);
            for (String c : s.cautions()) bullet(c);
            space(4);
            paragraph(s.deferral(), BODY, 0);
            closeAll();
            footers(s);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not write the PDF", e);
        }
    }

    private void feature(SheetContent.FeatureSection f, CalloutDrawing frame) throws IOException {
        need(80);
        heading(f.id() + " " + f.heading(), 12f);
        paragraph(f.caseLine(), BODY - 1, 0);
        if (!f.decided()) {
            paragraph("Undecided: no control is chosen for this feature yet.", BODY, 0);
            if (!f.suggestion().isEmpty()) {
                paragraph("The advisor suggests (not chosen, to be reviewed): " + f.suggestion(), BODY - 1, 10);
            }
            if (!f.inspection().isEmpty()) paragraph("Last inspection: " + f.inspection(), BODY, 0);
            return;
        }
        if (f.demoted()) paragraph("Demoted: the chosen control failed one of its checks; see the cautions.", BODY, 0);
        paragraph("Callout: " + f.calloutPlain().replace("\n", " / "), BODY, 0);
        paragraph(f.calloutWords(), BODY - 1, 10);
        if (frame != null) drawFrame(frame);
        listSection("Why", f.because());
        if (!f.figures().isEmpty()) {
            subheading("Numbers");
            for (Figures.Figure g : f.figures()) row2(g.label(), g.value());
        }
        listSection("Cautions", f.cautions());
        listSection("References", f.references());
        if (!f.notes().isEmpty()) {
            List<String> notes = new ArrayList<>();
            for (NoteLink n : f.notes()) notes.add(n.title() + " (" + n.id() + ", " + n.pack() + ")");
            listSection("Linked notes", notes);
        }
        if (!f.drawingNote().isEmpty()) {
            subheading("Drawing note");
            block(f.drawingNote());
        }
        if (!f.inspectionNote().isEmpty()) {
            subheading("Inspection plan");
            block(f.inspectionNote());
        }
        if (!f.inspection().isEmpty()) paragraph("Last inspection: " + f.inspection(), BODY, 0);
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
        paragraph(text.toUpperCase(java.util.Locale.ROOT), BODY - 0.5f, 0);
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

    private void summary(SheetContent s) throws IOException {
        float[] cols = {MARGIN, MARGIN + 28, MARGIN + 190, MARGIN + 255, MARGIN + 340, MARGIN + 445};
        String[] head = {"ID", "Feature", "Function", "Control", "Callout", "Status"};
        float size = BODY - 1.5f;
        need(size * 3);
        y -= size * LEADING;
        for (int i = 0; i < head.length; i++) text(head[i], cols[i], y, size);
        y -= 3;
        cs.setLineWidth(0.4f);
        cs.moveTo(MARGIN, y);
        cs.lineTo(MARGIN + width(), y);
        cs.stroke();
        for (SheetContent.SummaryRow r : s.summary()) {
            String[] cells = {r.id(), r.feature(), r.function(), r.control(), r.callout(), r.status()};
            List<List<String>> wrapped = new ArrayList<>();
            int lines = 1;
            for (int i = 0; i < cells.length; i++) {
                float w = (i + 1 < cols.length ? cols[i + 1] : MARGIN + width()) - cols[i] - 4;
                List<String> l = wrap(cells[i], size, w);
                wrapped.add(l);
                lines = Math.max(lines, l.size());
            }
            need(lines * size * LEADING + 4);
            float top = y;
            for (int i = 0; i < cells.length; i++) {
                float yy = top;
                for (String l : wrapped.get(i)) {
                    yy -= size * LEADING;
                    text(l, cols[i], yy, size);
                }
            }
            y = top - lines * size * LEADING - 3;
            cs.setLineWidth(0.2f);
            cs.moveTo(MARGIN, y);
            cs.lineTo(MARGIN + width(), y);
            cs.stroke();
        }
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
