package org.arcwright.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.Closeable;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.model.DesignCase;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.CaseTable;
import org.arcwright.rules.Recommendation;
import org.arcwright.rules.RuleBook;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright advise}: ranked callout recommendations for a radius, a part file or a CSV table of radii. */
@Command(name = "advise", mixinStandardHelpOptions = true,
        description = {"Recommend how to tolerance a radius, with the numbers, the reasoning and the cautions.",
                "FILE is a case (.json) or a part worksheet (.arcpart, every feature); --batch reads a CSV table of radii.",
                "Design guidance only: defer to the governing standard, your company's practice and licensed engineering judgement."})
final class AdviseCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "A case (.json) or a part worksheet (.arcpart).")
    Path file;

    @Option(names = "--batch", paramLabel = "PART.csv", description = "A CSV table of radii, one row per feature (columns in the README).")
    Path batch;

    @Mixin
    PackOptions packs;

    @Option(names = "--format", defaultValue = "text", paramLabel = "text|json|csv",
            description = "text, json, or csv (one row per feature; part files and --batch only). Default: ${DEFAULT-VALUE}.")
    String format;

    @Option(names = "--all", description = "In text, list every recommendation, not only the first three.")
    boolean all;

    @Option(names = "--simulate", description = "Add to each card what its callout lets through over a simulated population "
            + "from the pack's default process model for the case's process (evidence only; the ranking does not change).")
    boolean simulate;

    @Option(names = "--simulate-parts", paramLabel = "N", description = "Parts per simulated population with --simulate. Default: 2000.")
    Integer simulateParts;

    @Option(names = "--simulate-seed", paramLabel = "S", description = "Seed of the simulation with --simulate. Default: 19.")
    Long simulateSeed;

    @Option(names = "--no-notes", description = "Do not link practice notes (skips opening the notes index).")
    boolean noNotes;

    @Option(names = "--notes-index", paramLabel = "DIR", hidden = true, description = "Where the notes index is cached.")
    Path notesIndex;

    @Override
    public Integer call() {
        if ((file == null) == (batch == null)) {
            throw InputProblem.ofField("FILE", "give a case or part file, or --batch PART.csv (one of them)");
        }
        if (!List.of("text", "json", "csv").contains(format)) {
            throw InputProblem.ofField("--format", "use text, json or csv, got '" + format + "'");
        }
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        PackStack stack = packs.load("advise", err);
        RuleBook book = RuleBook.load(stack);
        for (InputProblem p : book.problems()) err.println("arcwright advise: pack problem, skipped: " + p.getMessage());
        Advisors.WithNotes wn = noNotes ? new Advisors.WithNotes(Advisors.standard(stack, book), () -> { })
                : Advisors.withNotes(stack, book, notesIndex, w -> err.println("arcwright advise: " + w));
        try (Closeable store = wn.store()) {
            return advise(wn.advisor(), stack, book, out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private int advise(Advisor advisor, PackStack stack, RuleBook book, PrintWriter out) {
        List<String[]> cases = new ArrayList<>();
        List<DesignCase> designCases = new ArrayList<>();
        boolean single = false;
        if (batch != null) {
            for (CaseTable.Row row : CaseTable.read(batch)) {
                cases.add(new String[] {row.feature()});
                designCases.add(row.designCase());
            }
        } else if (file.getFileName().toString().endsWith(WorksheetFiles.EXTENSION)) {
            PartWorksheet ws = new WorksheetFiles(new JsonFiles()).read(file);
            for (RadiusFeature f : ws.features()) {
                cases.add(new String[] {f.id() + (f.designCase().feature() == null ? "" : " " + f.designCase().feature())});
                designCases.add(f.designCase());
            }
        } else {
            DesignCase c = new JsonFiles().read(file, DesignCase.class);
            cases.add(new String[] {c.feature()});
            designCases.add(c);
            single = true;
        }
        if (single && format.equals("csv")) throw InputProblem.ofField("--format", "csv is for part files and --batch");
        if (!simulate && (simulateParts != null || simulateSeed != null)) {
            throw InputProblem.ofField(simulateParts != null ? "--simulate-parts" : "--simulate-seed", "needs --simulate");
        }
        if (simulateParts != null && simulateParts < 1) throw InputProblem.ofField("--simulate-parts", "must be at least 1, got " + simulateParts);
        if (simulate && format.equals("csv")) throw InputProblem.ofField("--simulate", "is for text and json output, not csv");
        List<Advice> advice = new ArrayList<>();
        for (int i = 0; i < designCases.size(); i++) {
            try {
                advice.add(advisor.advise(designCases.get(i)));
            } catch (InputProblem p) {
                throw p.under(cases.get(i)[0] == null ? "case" : cases.get(i)[0]);
            }
        }
        List<AdviceSimulation.Report> sims = new ArrayList<>();
        if (simulate) {
            var defaults = ProcessDefaults.load(stack);
            int n = simulateParts == null ? AdviceSimulation.DEFAULT_PARTS : simulateParts;
            long seed = simulateSeed == null ? AdviceSimulation.DEFAULT_SEED : simulateSeed;
            for (int i = 0; i < advice.size(); i++) {
                try {
                    sims.add(AdviceSimulation.run(advice.get(i), defaults, book.capability(), n, seed));
                } catch (InputProblem p) {
                    throw p.under(cases.get(i)[0] == null ? "case" : cases.get(i)[0]);
                }
            }
        }
        AdviceOutput o = new AdviceOutput();
        List<String> packNames = stack.packs().stream().map(PracticePack::name).toList();
        switch (format) {
            case "json" -> {
                if (single) {
                    ObjectNode n = o.toJson(cases.get(0)[0], advice.get(0));
                    if (simulate) AdviceSimulation.addJson(n, sims.get(0));
                    n.setAll(o.packs(book, packNames));
                    out.println(o.write(n));
                } else {
                    ObjectNode root = o.packs(book, packNames);
                    ArrayNode features = root.putArray("features");
                    for (int i = 0; i < advice.size(); i++) {
                        ObjectNode f = o.toJson(cases.get(i)[0], advice.get(i));
                        if (simulate) AdviceSimulation.addJson(f, sims.get(i));
                        features.add(f);
                    }
                    out.println(o.write(root));
                }
            }
            case "csv" -> printCsv(out, cases, advice);
            default -> {
                out.println("Packs: " + String.join(" < ", packNames));
                for (int i = 0; i < advice.size(); i++) {
                    out.println();
                    if (!single) out.println("== " + cases.get(i)[0]);
                    int limit = all ? Integer.MAX_VALUE : single ? 3 : 1;
                    if (simulate) {
                        AdviceSimulation.Report r = sims.get(i);
                        o.printText(out, advice.get(i), limit, () -> AdviceSimulation.printHeader(out, r), k -> AdviceSimulation.cardLines(r, k));
                    } else {
                        o.printText(out, advice.get(i), limit);
                    }
                }
            }
        }
        return Cli.OK;
    }

    /** Columns of the batch CSV output, in order. */
    static final List<String> CSV_COLUMNS = List.of("feature", "rule", "type", "text", "score", "demoted", "min", "max",
            "zone", "ktAtMin", "kfAtMin", "minRadiusForTarget", "seats", "seatingMargin", "second", "cautions");

    private static void printCsv(PrintWriter out, List<String[]> cases, List<Advice> advice) {
        out.println(String.join(",", CSV_COLUMNS));
        for (int i = 0; i < advice.size(); i++) {
            Advice a = advice.get(i);
            List<String> cells = new ArrayList<>();
            cells.add(cases.get(i)[0]);
            if (a.first().isEmpty()) {
                for (int k = 1; k < CSV_COLUMNS.size(); k++) cells.add("");
            } else {
                Recommendation r = a.first().get();
                Map<String, Object> n = r.numbers().asMap();
                cells.add(r.ruleId());
                cells.add(r.callout().typeName());
                cells.add(r.text());
                cells.add(DecimalText.significant(r.score(), 4));
                cells.add(Boolean.toString(r.demoted()));
                for (String k : List.of("min", "max", "zone", "ktAtMin", "kfAtMin", "minRadiusForTarget", "seats", "seatingMargin")) {
                    Object v = n.get(k);
                    cells.add(v == null ? "" : v instanceof Double d ? DecimalText.significant(d, 4) : v.toString());
                }
                cells.add(a.recommendations().size() > 1 ? a.recommendations().get(1).ruleId() : "");
                cells.add(String.join(" | ", r.cautions()));
            }
            out.println(String.join(",", cells.stream().map(AdviseCommand::csv).toList()));
        }
    }

    private static String csv(String s) {
        if (s == null) return "";
        if (s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("|")) return "\"" + s.replace("\"", "\"\"") + "\"";
        return s;
    }
}
