package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.ConfigDirectory;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackSettings;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;
import org.arcwright.rules.PackCheck;
import org.arcwright.rules.RuleBook;
import org.arcwright.rules.RuleConflict;
import org.arcwright.templates.NoteTemplate;
import org.arcwright.templates.NoteTemplates;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright pack}: work on practice packs. */
@Command(name = "pack", mixinStandardHelpOptions = true, description = "Work on practice packs.",
        subcommands = {PackCommand.Check.class})
final class PackCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** {@code arcwright pack check DIR}. */
    @Command(name = "check", mixinStandardHelpOptions = true,
            description = {"Validate a practice pack layered over the built-in one and run its rules' examples.",
                    "Exit 0 when it loads cleanly, adds no conflicts and its examples pass; 1 otherwise."})
    static final class Check implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(index = "0", paramLabel = "DIR", description = "The pack folder (with pack.json).")
        Path dir;

        @Option(names = "--pack", paramLabel = "DIR",
                description = "Packs to layer below the one checked (repeatable; default: the team packs of your settings listed below DIR, or all of them when DIR is not one).")
        List<Path> below = List.of();

        @Option(names = "--no-settings", description = "Ignore the team packs chosen in your settings.")
        boolean noSettings;

        @Option(names = "--config-dir", paramLabel = "DIR", hidden = true, description = "The config folder holding settings.json.")
        Path configDir;

        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
        OutputFormat format;

        @Override
        public Integer call() {
            PracticePack checked = PracticePack.open(dir, PackLayer.TEAM, new JsonFiles());
            PackStack stack;
            PracticePack builtIn = PracticePack.open(PackStack.builtInRoot(), PackLayer.BUILT_IN, new JsonFiles());
            if (checked.name().equals(builtIn.name()) && below.isEmpty()) {
                // the built-in pack itself, e.g. knowledge/ while editing it: check it alone
                stack = new PackStack(List.of(PracticePack.open(dir, PackLayer.BUILT_IN, new JsonFiles())), List.of());
            } else {
                List<Path> layers = new ArrayList<>(below.isEmpty() ? settingsBelow() : below);
                layers.add(dir);
                stack = PackStack.load(layers, null);
            }
            RuleBook book = RuleBook.load(stack);
            PackCheck.Report report = new PackCheck(Advisors.standard(stack, book)).run(checked.name());
            List<InputProblem> problems = new ArrayList<>(report.problems());
            problems.addAll(templateProblems(stack, checked.name()));
            report = new PackCheck.Report(report.pack(), problems, report.conflicts(), report.examples());
            PrintWriter out = spec.commandLine().getOut();
            if (format == OutputFormat.json) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("pack", report.pack());
                m.put("passed", report.passed());
                m.put("problems", report.problems().stream().map(InputProblem::getMessage).toList());
                m.put("conflicts", report.conflicts().stream().map(RuleConflict::message).toList());
                m.put("examples", report.examples());
                out.println(new JsonFiles().write(m));
            } else {
                printText(out, report, book);
            }
            return report.passed() ? Cli.OK : Cli.FAIL;
        }

        /**
         * Every template of the checked pack compiled on its own: a template that breaks (too deep, a
         * list inside itself, a link out of the pack) would otherwise refuse every sheet and drawing
         * note made with the pack, long after the check said it passed.
         */
        private static List<InputProblem> templateProblems(PackStack stack, String packName) {
            List<InputProblem> out = new ArrayList<>();
            for (PackStack.PackFile f : stack.files(NoteTemplates.FOLDER, NoteTemplates.EXTENSION)) {
                if (!f.pack().name().equals(packName)) continue;
                String file = f.path().getFileName().toString();
                try {
                    NoteTemplate.compile(file.substring(0, file.length() - NoteTemplates.EXTENSION.length()),
                            InputFiles.readPackText(f.path(), f.pack().root()), f.path().toString(), packName);
                } catch (InputProblem p) {
                    out.add(p);
                }
            }
            return out;
        }

        /** The settings' team packs under the checked one: those listed before it, or all when it is not listed. */
        private List<Path> settingsBelow() {
            if (noSettings) return List.of();
            PackSettings settings = PackSettings.read(configDir != null ? configDir : ConfigDirectory.ofSystem(), new JsonFiles());
            settings.problem().ifPresent(p -> spec.commandLine().getErr().println("arcwright pack check: settings not used: " + p.getMessage()));
            Path self = dir.toAbsolutePath().normalize();
            List<Path> out = new ArrayList<>();
            for (Path p : settings.teamPacks()) {
                if (p.toAbsolutePath().normalize().equals(self)) return out;
                if (Files.isRegularFile(p.resolve("pack.json"))) {
                    out.add(p);
                } else {
                    spec.commandLine().getErr().println("arcwright pack check: pack from your settings skipped: " + p + ": no pack.json");
                }
            }
            return out;
        }

        private static void printText(PrintWriter out, PackCheck.Report r, RuleBook book) {
            long own = r.examples().stream().filter(PackCheck.ExampleResult::own).count();
            long ownRules = book.entries().stream().filter(e -> e.pack().equals(r.pack())).count();
            out.printf("Pack '%s': %d rules in force (%d its own), %d examples of its own%n", r.pack(),
                    book.entries().size(), ownRules, own);
            for (InputProblem p : r.problems()) out.println("  PROBLEM   " + p.getMessage());
            for (RuleConflict c : r.conflicts()) out.println("  CONFLICT  " + c.message());
            for (PackCheck.ExampleResult e : r.examples()) {
                if (!e.own()) continue;
                out.printf("  %s  %s: %s%n", e.passed() ? "pass" : "FAIL", e.ruleId(), e.name());
                if (!e.passed()) {
                    out.println("        expected " + e.expected());
                    out.println("        got      " + e.actual());
                }
            }
            for (PackCheck.ExampleResult e : r.changed()) {
                out.printf("  changed   %s (%s): %s now gives %s%n", e.ruleId(), e.pack(), e.name(), e.actual());
            }
            for (RuleBook.Entry e : book.entries()) {
                if (e.pack().equals(r.pack()) && e.replaces() != null) {
                    out.printf("  override  %s replaces the rule of the same id from %s%n", e.rule().id(), e.replaces());
                }
            }
            out.println(r.passed() ? "PASS" : "FAIL: " + r.problems().size() + " problem(s), " + r.conflicts().size()
                    + " conflict(s), " + r.failures().size() + " failed example(s)");
        }
    }
}
