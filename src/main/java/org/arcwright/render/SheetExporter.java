package org.arcwright.render;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Recommendation;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.worksheet.PartWorksheet;

/**
 * Exports a part's tolerancing sheet as Markdown, HTML or PDF: the service behind
 * {@code arcwright sheet} and the app's export. Every file is written atomically.
 */
public final class SheetExporter {

    /** The formats a sheet can be written in. */
    public enum Format {
        MARKDOWN(".md"), HTML(".html"), PDF(".pdf");

        private final String extension;

        Format(String extension) { this.extension = extension; }

        public String extension() { return extension; }

        /** The format named by a file's extension ({@code .md}, {@code .html}/{@code .htm}, {@code .pdf}). */
        public static Format of(Path file) {
            String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
            if (n.endsWith(".md") || n.endsWith(".markdown")) return MARKDOWN;
            if (n.endsWith(".html") || n.endsWith(".htm")) return HTML;
            if (n.endsWith(".pdf")) return PDF;
            throw InputProblem.ofField("--out", "unknown sheet type '" + file.getFileName() + "'; use .md, .html or .pdf");
        }
    }

    /** Told how far an export has got; called on the exporting thread. */
    @FunctionalInterface
    public interface Progress {
        /**
         * @param done steps finished
         * @param total steps in all
         * @param step what is being done now
         */
        void update(int done, int total, String step);

        /** Ignores progress. */
        Progress NONE = (done, total, step) -> { };
    }

    private final FrameRenderer frames;
    private final DrawingFont font;

    public SheetExporter(FrameRenderer frames, DrawingFont font) {
        this.frames = Objects.requireNonNull(frames, "frames");
        this.font = Objects.requireNonNull(font, "font");
    }

    /** With the bundled font and 3.5 mm lettering. */
    public static SheetExporter withBundledFont() {
        DrawingFont f = DrawingFont.bundled();
        return new SheetExporter(new FrameRenderer(f, CalloutLayout.DEFAULT_LETTER_HEIGHT), f);
    }

    /** The sheet's content, with the templates of {@code templates} filled. */
    public SheetContent content(PartWorksheet ws, NoteTemplates templates, String generatedBy) {
        return SheetContent.of(ws, templates, generatedBy);
    }

    /** A suggestion for an undecided feature's case, e.g. {@code c -> advisor.advise(c).first()}. */
    @FunctionalInterface
    public interface Suggestions extends Function<DesignCase,
            Optional<Recommendation>> {
        /** Suggests nothing. */
        Suggestions NONE = c -> Optional.empty();
    }

    /**
     * Writes the sheet of {@code ws} to {@code out} in the format its extension names. Markdown
     * also writes one SVG per decided feature into a folder {@code NAME-frames} beside it.
     */
    public void export(PartWorksheet ws, NoteTemplates templates, String generatedBy, Path out, Progress progress) {
        export(ws, templates, generatedBy, Suggestions.NONE, out, progress);
    }

    /**
     * As {@link #export(PartWorksheet, NoteTemplates, String, Path, Progress)}, with each undecided
     * feature showing what {@code suggestions} offers, marked as not chosen.
     */
    public void export(PartWorksheet ws, NoteTemplates templates, String generatedBy, Suggestions suggestions, Path out,
                       Progress progress) {
        Progress p = progress == null ? Progress.NONE : progress;
        Format format = Format.of(out);
        p.update(0, 1, "reading the worksheet");
        SheetContent content = SheetContent.of(ws, templates, generatedBy, suggestions == null ? Suggestions.NONE : suggestions);
        int total = content.features().size() + 1;
        switch (format) {
            case MARKDOWN: {
                String base = out.getFileName().toString().replaceFirst("\\.[^.]*$", "");
                String dir = base + "-frames";
                Path frameDir = out.toAbsolutePath().getParent().resolve(dir);
                int i = 0;
                for (SheetContent.FeatureSection f : content.features()) {
                    p.update(i++, total, "frame of " + f.id());
                    if (f.decided()) {
                        AtomicFiles.writeString(frameDir.resolve(f.id() + ".svg"),
                                frames.svg(f.callout(), content.style(), content.units()));
                    }
                }
                AtomicFiles.writeString(out, markdown(content, dir));
                break;
            }
            case HTML:
                AtomicFiles.writeString(out, html(content, p));
                break;
            default:
                AtomicFiles.writeBytes(out, pdf(content, p));
        }
        p.update(total, total, "wrote " + out.getFileName());
    }

    /** The sheet as Markdown, frames referenced in {@code framesDir}. */
    public String markdown(SheetContent content, String framesDir) { return MarkdownSheet.write(content, framesDir); }

    /** The sheet as one HTML page. */
    public String html(SheetContent content, Progress progress) {
        Progress p = progress == null ? Progress.NONE : progress;
        Map<String, String> svgs = new LinkedHashMap<>();
        int i = 0;
        for (SheetContent.FeatureSection f : content.features()) {
            p.update(i++, content.features().size() + 1, "frame of " + f.id());
            if (f.decided()) svgs.put(f.id(), frames.svgElement(f.callout(), content.style(), content.units()));
        }
        return HtmlSheet.write(content, svgs);
    }

    /** The sheet as PDF bytes. */
    public byte[] pdf(SheetContent content, Progress progress) {
        Map<String, CalloutDrawing> drawings = new LinkedHashMap<>();
        for (SheetContent.FeatureSection f : content.features()) {
            if (f.decided()) drawings.put(f.id(), frames.layout(f.callout(), content.style(), content.units()));
        }
        return new PdfSheet(font, progress == null ? Progress.NONE : progress).write(content, drawings);
    }
}
