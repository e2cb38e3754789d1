package org.arcwright.bench;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.render.FrameRenderer;
import org.arcwright.render.SheetContent;
import org.arcwright.render.SheetExporter;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * Cost of drawing output as the app uses it: a frame preview image, a PNG and an SVG export of one
 * frame, and the PDF sheet of the five-feature demo part.
 * Run: {@code mvn -B -o -Pbench test-compile exec:exec -Dbench=RenderBench -Dbench.args="-f 1 -wi 3 -i 5 -w 1s -r 1s"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class RenderBench {
    private final FrameRenderer renderer = FrameRenderer.withBundledFont();
    private final Callout frame = new Callout.Profile(0.06, 0.02,
            List.of(DatumReference.parse("A"), DatumReference.parse("B(M)")), false, Extent.between("J", "K"));
    private final SheetExporter exporter = SheetExporter.withBundledFont();
    private final PartWorksheet demo = new WorksheetFiles(new JsonFiles())
            .read(Path.of("examples/tarnbeck-output-shaft-decided.arcpart"));
    private final NoteTemplates templates = NoteTemplates.load(PackStack.builtIn());

    @Benchmark
    public Object previewImage150dpi() { return renderer.image(frame, DrawingStyle.ASME, Units.MM, 150); }

    @Benchmark
    public byte[] png300dpi() { return renderer.png(frame, DrawingStyle.ASME, Units.MM, 300); }

    @Benchmark
    public String svg() { return renderer.svg(frame, DrawingStyle.ASME, Units.MM); }

    @Benchmark
    public byte[] demoSheetPdf() {
        SheetContent c = exporter.content(demo, templates, "bench");
        return exporter.pdf(c, null);
    }
}
