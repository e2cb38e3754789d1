package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.io.OutputFiles;
import org.arcwright.render.FrameRenderer;
import org.arcwright.render.PngPainter;
import org.arcwright.render.RenderRequest;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright render FILE}: draws a callout as a feature control frame or dimension. */
@Command(name = "render", mixinStandardHelpOptions = true,
        description = {"Draws a callout: feature control frame, R or CR dimension, or title-block note.",
                "FILE is JSON: {\"units\": \"mm\", \"standard\": \"asme\", \"callout\": {\"type\": \"profile\", \"zone\": 0.1, \"datums\": [\"A\", \"B\"]}}.",
                "Without --out, prints the plain and the Unicode text forms."})
final class RenderCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "The callout file (JSON).")
    Path file;

    @Option(names = "--out", paramLabel = "OUT", description = "OUT.svg, OUT.png or OUT.txt.")
    Path out;

    @Option(names = "--dpi", paramLabel = "N", defaultValue = "300",
            description = "Resolution of PNG output, dots per inch (default: ${DEFAULT-VALUE}).")
    int dpi;

    @Option(names = "--unicode", description = "Write .txt output with the GD&T code points instead of ASCII boxes.")
    boolean unicode;

    @Override
    public Integer call() {
        if (dpi < PngPainter.MIN_DPI || dpi > PngPainter.MAX_DPI) {
            throw InputProblem.ofField("--dpi", "must be between " + PngPainter.MIN_DPI + " and "
                    + PngPainter.MAX_DPI + ", got " + dpi);
        }
        if (out != null) OutputFiles.requireWritable(out, "--out", file);
        RenderRequest r = RenderRequest.read(file, new JsonFiles());
        FrameRenderer renderer = FrameRenderer.withBundledFont();
        PrintWriter pw = spec.commandLine().getOut();
        if (out == null) {
            pw.print(renderer.plainText(r.callout(), r.standard(), r.units()));
            pw.print(renderer.unicodeText(r.callout(), r.standard(), r.units()));
        } else {
            renderer.write(out, r.callout(), r.standard(), r.units(), dpi, unicode);
            pw.println("wrote " + out);
        }
        for (String remark : renderer.remarks(r.callout(), r.standard(), r.units())) {
            spec.commandLine().getErr().println("note: " + remark);
        }
        pw.flush();
        return Cli.OK;
    }
}
