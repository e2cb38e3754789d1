package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.arcwright.io.JsonFiles;
import org.arcwright.io.OutputFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.render.SheetExporter;
import org.arcwright.services.Practice;
import org.arcwright.services.SheetService;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright sheet PART --out OUT}: the part's tolerancing sheet as Markdown, HTML or PDF. */
@Command(name = "sheet", mixinStandardHelpOptions = true,
        description = {"Exports a part's tolerancing sheet as Markdown, HTML or PDF, chosen by the extension of OUT.",
                "A summary table, then per feature the callout, its frame, the reasoning, the numbers, cautions and",
                "notes; the cautions and the deferral to the governing standard at the end. Undecided features",
                "show the advisor's first recommendation, marked as not chosen (--no-suggest leaves it out)."})
final class SheetCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PART", description = "The part worksheet (.arcpart, JSON).")
    Path part;

    @Option(names = "--out", required = true, paramLabel = "OUT", description = "OUT.md, OUT.html or OUT.pdf.")
    Path out;

    @Mixin
    PackOptions packs;

    @Option(names = "--no-suggest", description = "Do not show the advisor's suggestion for undecided features.")
    boolean noSuggest;

    @Override
    public Integer call() {
        SheetExporter.Format.of(out);
        OutputFiles.requireWritable(out, "--out", part);
        PackStack stack = packs.load("sheet", spec.commandLine().getErr());
        if (!stack.problems().isEmpty()) throw stack.problems().get(0);
        PartWorksheet ws = new WorksheetFiles(new JsonFiles()).read(part);
        SheetService.withBundledFont().export(ws, Practice.of(stack), !noSuggest, out, SheetExporter.Progress.NONE);
        PrintWriter pw = spec.commandLine().getOut();
        long open = ws.features().stream().filter(f -> f.chosen() == null).count();
        pw.println("wrote " + out + ": " + ws.features().size() + " features" + (open == 0 ? "" : ", " + open + " undecided"));
        pw.flush();
        return Cli.OK;
    }
}
