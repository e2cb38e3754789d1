package org.arcwright.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.templates.NoteTemplate;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.WorksheetFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright drawing-note TEMPLATE PART}: fills one drawing-note template from a part worksheet. */
@Command(name = "drawing-note", mixinStandardHelpOptions = true,
        description = {"Fills one drawing-note template from a part worksheet and prints the drawing note.",
                "TEMPLATE is a template name from the packs (e.g. title-block-notes, callout-note, edge-break-notes,",
                "inspection-plan) or the path of a .mustache file being written."})
final class NoteCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "TEMPLATE", description = "Template name, or a .mustache file.")
    String template;

    @Parameters(index = "1", paramLabel = "PART", description = "The part worksheet (.arcpart, JSON).")
    Path part;

    @Option(names = "--feature", paramLabel = "ID", description = "Fill a per-feature template for this feature only.")
    String feature;

    @Mixin
    PackOptions packs;

    @Override
    public Integer call() throws Exception {
        PackStack stack = packs.load("drawing-note", spec.commandLine().getErr());
        if (!stack.problems().isEmpty()) throw stack.problems().get(0);
        NoteTemplates templates = NoteTemplates.load(stack);
        if (template.endsWith(NoteTemplates.EXTENSION)) {
            Path file = Path.of(template);
            if (!Files.isRegularFile(file)) throw new InputProblem(template, 0, 0, null, "file not found");
            String name = file.getFileName().toString().replace(NoteTemplates.EXTENSION, "");
            NoteTemplate t = NoteTemplate.compile(name, InputFiles.readText(file), file.toString(), "command line");
            templates = new NoteTemplates(List.of(t));
            template = name;
        }
        PartWorksheet ws = new WorksheetFiles(new JsonFiles()).read(part);
        String text = templates.fill(template, ws, feature, new VersionProvider().getVersion()[0]);
        spec.commandLine().getOut().print(text);
        spec.commandLine().getOut().flush();
        return Cli.OK;
    }
}
