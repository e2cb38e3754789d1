package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.notes.FacetCount;
import org.arcwright.notes.FiledNote;
import org.arcwright.notes.IndexReport;
import org.arcwright.notes.Note;
import org.arcwright.notes.NoteFacet;
import org.arcwright.notes.NoteFilters;
import org.arcwright.notes.NoteFormat;
import org.arcwright.notes.NoteHit;
import org.arcwright.notes.NotesStore;
import org.arcwright.notes.SearchResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code arcwright notes ...}: search, show, add and reindex the practice notes. */
@Command(name = "notes", mixinStandardHelpOptions = true,
        description = {"Practice notes: why your company tolerances radii the way it does.",
                "Notes come from the built-in pack, team packs (--pack) and your personal pack."},
        subcommands = {NotesCommand.Search.class, NotesCommand.Show.class, NotesCommand.Add.class,
                NotesCommand.Reindex.class})
final class NotesCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    private static void warnProblems(CommandSpec spec, NotesStore store) {
        PrintWriter err = spec.commandLine().getErr();
        for (InputProblem p : store.problems()) err.println("arcwright notes: warning: " + p.getMessage());
    }

    /** {@code notes search QUERY...} */
    @Command(name = "search", mixinStandardHelpOptions = true,
            description = {"Search the notes. Words are searched as typed: symbols such as ( \" * are not a query language.",
                    "Example: arcwright notes search R0.5 seal groove --limit 5"})
    static final class Search implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        NotesOptions options;

        @Parameters(paramLabel = "QUERY", arity = "0..*", description = "Words to look for (quoting is optional).")
        List<String> words = new ArrayList<>();

        @Option(names = "--limit", paramLabel = "N", defaultValue = "10", description = "Most hits to show (default: ${DEFAULT-VALUE}).")
        int limit;

        @Option(names = "--function", paramLabel = "F", description = "Only notes for this function, e.g. sealing (repeatable).")
        List<String> functions = new ArrayList<>();

        @Option(names = "--standard", paramLabel = "S", description = "Only notes leaning on this standard, e.g. \"ISO 2768-1\" (repeatable).")
        List<String> standards = new ArrayList<>();

        @Option(names = "--process", paramLabel = "P", description = "Only notes about this process, e.g. cast (repeatable).")
        List<String> processes = new ArrayList<>();

        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
        OutputFormat format;

        @Override
        public Integer call() {
            String query = String.join(" ", words);
            NoteFilters filters = NoteFilters.none()
                    .and(NoteFacet.FUNCTION, functions.toArray(String[]::new))
                    .and(NoteFacet.STANDARD, standards.toArray(String[]::new))
                    .and(NoteFacet.PROCESS, processes.toArray(String[]::new));
            try (NotesStore store = options.open(false, spec.commandLine().getErr())) {
                warnProblems(spec, store);
                SearchResult r = store.search(query, filters, limit);
                PrintWriter out = spec.commandLine().getOut();
                if (format == OutputFormat.json) {
                    out.println(new JsonFiles().write(toJson(r)));
                } else {
                    printText(out, r);
                }
            }
            return Cli.OK;
        }

        static Map<String, Object> toJson(SearchResult r) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("query", r.query());
            m.put("total", r.totalHits());
            List<Map<String, Object>> hits = new ArrayList<>();
            for (NoteHit h : r.hits()) {
                Map<String, Object> x = new LinkedHashMap<>();
                x.put("id", h.id());
                x.put("title", h.title());
                x.put("score", Math.round(h.score() * 1000) / 1000.0);
                x.put("snippet", h.snippet());
                x.put("pack", h.pack());
                x.put("functions", h.functions());
                x.put("standards", h.standards());
                x.put("processes", h.processes());
                hits.add(x);
            }
            m.put("hits", hits);
            Map<String, Object> facets = new LinkedHashMap<>();
            for (Map.Entry<NoteFacet, List<FacetCount>> e : r.facets().entrySet()) {
                if (e.getKey() == NoteFacet.TAG) continue;
                Map<String, Integer> counts = new LinkedHashMap<>();
                for (FacetCount c : e.getValue()) counts.put(c.value(), c.count());
                facets.put(e.getKey().key(), counts);
            }
            m.put("facets", facets);
            return m;
        }

        private static void printText(PrintWriter out, SearchResult r) {
            if (r.hits().isEmpty()) {
                out.println("No notes found for \"" + r.query() + "\".");
                return;
            }
            out.printf("%d of %d notes for \"%s\"%n", r.hits().size(), r.totalHits(), r.query());
            int i = 1;
            for (NoteHit h : r.hits()) {
                out.printf("%n%2d. %s%n", i++, h.title());
                out.printf("    %s · %s · %s · score %s%n", h.id(), h.pack(),
                        h.standards().isEmpty() ? "no source named" : String.join("; ", h.standards()), DecimalText.fixed(h.score(), 2));
                out.println("    " + h.snippet());
            }
            List<FacetCount> fn = r.facets().getOrDefault(NoteFacet.FUNCTION, List.of());
            if (!fn.isEmpty()) {
                StringBuilder sb = new StringBuilder("\nBy function:");
                for (FacetCount c : fn) sb.append(' ').append(c.value()).append(" (").append(c.count()).append(')');
                out.println(sb);
            }
        }
    }

    /** {@code notes show ID} */
    @Command(name = "show", mixinStandardHelpOptions = true, description = "Print one note, and the notes related to it.")
    static final class Show implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        NotesOptions options;

        @Parameters(index = "0", paramLabel = "ID", description = "The note id, e.g. radius-vs-controlled-radius.")
        String id;

        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
        OutputFormat format;

        @Override
        public Integer call() {
            try (NotesStore store = options.open(false, spec.commandLine().getErr())) {
                warnProblems(spec, store);
                FiledNote f = store.get(id).orElseThrow(() -> InputProblem.ofField("ID",
                        "no note '" + id + "'; search with 'arcwright notes search WORDS'"));
                List<NoteHit> related = store.relatedTo(id, 3);
                PrintWriter out = spec.commandLine().getOut();
                Note n = f.note();
                if (format == OutputFormat.json) {
                    Map<String, Object> m = new LinkedHashMap<>();
                    m.put("id", n.id());
                    m.put("title", n.title());
                    m.put("tags", n.tags());
                    m.put("functions", n.functions());
                    m.put("standards", n.standards());
                    m.put("processes", n.processes());
                    m.put("author", n.author());
                    m.put("updated", n.updated() == null ? null : n.updated().toString());
                    m.put("pack", f.pack());
                    m.put("file", f.location());
                    m.put("body", n.body());
                    m.put("related", related.stream().map(NoteHit::id).toList());
                    out.println(new JsonFiles().write(m));
                } else {
                    out.println("# " + n.title());
                    out.println();
                    out.printf("id %s · pack %s · %s%n", n.id(), f.pack(), f.location());
                    if (!n.standards().isEmpty()) out.println("leans on: " + String.join("; ", n.standards()));
                    if (!n.functions().isEmpty()) out.println("functions: " + String.join(", ", n.functions()));
                    if (!n.processes().isEmpty()) out.println("processes: " + String.join(", ", n.processes()));
                    if (n.updated() != null || !n.author().isEmpty()) {
                        out.println("by " + (n.author().isEmpty() ? "unknown" : n.author())
                                + (n.updated() == null ? "" : ", " + n.updated()));
                    }
                    out.println();
                    out.println(n.body());
                    if (!related.isEmpty()) {
                        out.println();
                        out.println("Related:");
                        for (NoteHit h : related) out.println("  " + h.id() + "  " + h.title());
                    }
                }
            }
            return Cli.OK;
        }
    }

    /** {@code notes add FILE} */
    @Command(name = "add", mixinStandardHelpOptions = true,
            description = {"Add a note file to your personal pack and index it.",
                    "The file needs a header: see 'arcwright notes show writing-a-practice-note'."})
    static final class Add implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        NotesOptions options;

        @Parameters(index = "0", paramLabel = "FILE", description = "A Markdown note with a header between '---' lines.")
        Path file;

        @Option(names = "--replace", description = "Replace a note with the same id already in your personal pack.")
        boolean replace;

        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
        OutputFormat format;

        @Override
        public Integer call() {
            NoteFormat.parse(readable(file), file.toString());
            try (NotesStore store = options.open(true, spec.commandLine().getErr())) {
                FiledNote f = store.add(file, replace);
                PrintWriter out = spec.commandLine().getOut();
                if (format == OutputFormat.json) {
                    Map<String, Object> m = new LinkedHashMap<>();
                    m.put("id", f.note().id());
                    m.put("title", f.note().title());
                    m.put("pack", f.pack());
                    m.put("file", f.location());
                    out.println(new JsonFiles().write(m));
                } else {
                    out.printf("Added %s \"%s\" to %s (%s).%n", f.note().id(), f.note().title(), f.pack(), f.location());
                }
            }
            return Cli.OK;
        }

        private static String readable(Path file) {
            return InputFiles.readText(file);
        }
    }

    /** {@code notes reindex} */
    @Command(name = "reindex", mixinStandardHelpOptions = true,
            description = "Rebuild the search index from the note files (it is rebuilt on its own when needed).")
    static final class Reindex implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Mixin
        NotesOptions options;

        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE}).")
        OutputFormat format;

        @Override
        public Integer call() {
            try (NotesStore store = options.open(false, spec.commandLine().getErr())) {
                IndexReport r = store.reindex();
                PrintWriter out = spec.commandLine().getOut();
                if (format == OutputFormat.json) {
                    Map<String, Object> m = new LinkedHashMap<>();
                    m.put("kind", r.kind().name().toLowerCase(Locale.ROOT));
                    m.put("notes", r.notes());
                    m.put("millis", r.millis());
                    m.put("index", store.indexFolder().toString());
                    m.put("problems", store.problems().stream().map(InputProblem::getMessage).toList());
                    out.println(new JsonFiles().write(m));
                } else {
                    out.println(r.describe());
                    out.println("index: " + store.indexFolder());
                    for (InputProblem p : store.problems()) out.println("problem: " + p.getMessage());
                }
            }
            return Cli.OK;
        }
    }
}
