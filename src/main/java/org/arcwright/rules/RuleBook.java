package org.arcwright.rules;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Pattern;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;
import org.arcwright.tolerance.GeneralToleranceTable;
import org.arcwright.tolerance.GeneralToleranceTables;

/**
 * The rules in force after layering every pack, with the tables they size tolerances from, what
 * failed to load, and the conflicts found. Loading never stops at the first bad file: a file that
 * fails is reported in {@link #problems()} and the rest load, so the app starts on what loaded.
 */
public final class RuleBook {
    private final List<Entry> entries;
    private final List<InputProblem> problems;
    private final List<RuleConflict> conflicts;
    private final CapabilityTable capability;
    private final GeneralToleranceTables generalTables;

    /**
     * A rule in force and where it came from.
     *
     * @param rule the rule
     * @param pack the name of the pack that supplied it
     * @param layer that pack's layer
     * @param file the file it was read from
     * @param replaces the name of the lower pack whose rule of the same id it overrides, or null
     * @param describe the rule, its pack and weight in words, as the reasoning trace starts
     */
    public record Entry(Rule rule, String pack, PackLayer layer, String file, String replaces, String describe) {
        public Entry(Rule rule, String pack, PackLayer layer, String file, String replaces) {
            this(rule, pack, layer, file, replaces, "rule " + rule.id() + " from " + pack
                    + (replaces == null ? "" : " (overrides " + replaces + ")")
                    + (rule.weight() == 0 ? ", adds needs" : ", weight " + rule.weight()));
        }

        public Entry {
            Objects.requireNonNull(rule, "rule");
        }
    }

    public RuleBook(List<Entry> entries, List<InputProblem> problems, CapabilityTable capability,
                    GeneralToleranceTables generalTables) {
        List<Entry> sorted = new ArrayList<>(entries);
        sorted.sort(Comparator.comparingInt((Entry e) -> -e.rule().weight()).thenComparing(e -> e.rule().id()));
        this.entries = List.copyOf(sorted);
        this.problems = List.copyOf(problems);
        this.capability = capability;
        this.generalTables = Objects.requireNonNull(generalTables, "generalTables");
        this.conflicts = findConflicts(this.entries);
    }

    /** Loads every pack's rules and tables, lowest layer first, applying overrides and disables. */
    public static RuleBook load(PackStack stack) {
        JsonFiles json = new JsonFiles();
        List<InputProblem> problems = new ArrayList<>(stack.problems());
        Map<String, Entry> byId = new LinkedHashMap<>();
        for (PracticePack pack : stack.packs()) {
            loadPack(pack, json, byId, problems);
        }
        Map<String, CapabilityTable> capabilityTables = new LinkedHashMap<>();
        for (PackStack.PackFile f : stack.files("tables", ".json")) {
            try {
                ObjectNode tree = json.readPackObject(f.path(), f.pack().root());
                if (!"process-capability".equals(tree.path("kind").asText())) continue;
                ObjectNode obj = tree.deepCopy();
                obj.remove("kind");
                CapabilityTable t = json.convert(obj, f.path().toString(), CapabilityTable.class);
                capabilityTables.put(t.id(), t);
            } catch (InputProblem p) {
                problems.add(p);
            }
        }
        CapabilityTable capability = capabilityTables.get(CapabilityTable.DEFAULT_ID);
        GeneralToleranceTables general;
        try {
            general = GeneralToleranceTables.load(stack.files("tables", ".json").stream().map(f -> new GeneralToleranceTables.TableFile(f.path(), f.pack().root())).toList());
        } catch (InputProblem p) {
            problems.add(p);
            general = new GeneralToleranceTables(List.<GeneralToleranceTable>of());
        }
        return new RuleBook(List.copyOf(byId.values()), problems, capability, general);
    }

    private static void loadPack(PracticePack pack, JsonFiles json, Map<String, Entry> byId, List<InputProblem> problems) {
        String manifest = pack.root().resolve("pack.json").toString();
        Set<String> overrides = new HashSet<>(pack.manifest().overrides());
        Set<String> seenHere = new HashSet<>();
        for (String id : pack.manifest().overrides()) {
            if (!byId.containsKey(id)) {
                problems.add(new InputProblem(manifest, 0, 0, "overrides", "overrides rule '" + id
                        + "', but no lower layer has a rule with that id"));
            }
        }
        for (Path file : pack.files("rules", ".json")) {
            Rule.File rf;
            try {
                rf = json.readPackFile(file, pack.root(), Rule.File.class);
            } catch (InputProblem p) {
                problems.add(p);
                continue;
            }
            for (int i = 0; i < rf.rules().size(); i++) {
                Rule r = rf.rules().get(i);
                String field = "rules[" + i + "].id";
                if (!seenHere.add(r.id())) {
                    problems.add(new InputProblem(file.toString(), lineOfId(file, r.id(), true), 0, field,
                            "duplicate rule id '" + r.id() + "' in pack '" + pack.name() + "'; ids must be unique"));
                    continue;
                }
                Entry lower = byId.get(r.id());
                if (lower != null && !overrides.contains(r.id())) {
                    problems.add(new InputProblem(file.toString(), lineOfId(file, r.id(), false), 0, field,
                            "duplicate rule id '" + r.id()
                            + "': pack '" + lower.pack() + "' already has it; list it under \"overrides\" in "
                            + "pack.json to replace it"));
                    continue;
                }
                if (lower == null && overrides.contains(r.id())) continue;
                byId.put(r.id(), new Entry(r, pack.name(), pack.layer(), file.toString(),
                        lower == null ? null : lower.pack()));
            }
        }
        for (String id : pack.manifest().disables()) {
            if (byId.remove(id) == null) {
                problems.add(new InputProblem(manifest, 0, 0, "disables", "disables rule '" + id
                        + "', but no lower layer has a rule with that id"));
            }
        }
    }

    /**
     * The line where {@code "id": "ID"} is written in {@code file} (its last occurrence when
     * {@code last}, else its first), or 0 when it cannot be found; for pointing at duplicates.
     */
    private static int lineOfId(Path file, String id, boolean last) {
        Pattern p = Pattern.compile("\"id\"\\s*:\\s*\"" + Pattern.quote(id) + "\"");
        int found = 0;
        try {
            List<String> lines = Files.readAllLines(file);
            for (int i = 0; i < lines.size(); i++) {
                if (p.matcher(lines.get(i)).find()) {
                    found = i + 1;
                    if (!last) break;
                }
            }
        } catch (IOException e) {
            return 0;
        }
        return found;
    }

    /** The rules in force, highest weight first, then by id. */
    public List<Entry> entries() { return entries; }

    /** Files and packs that failed to load, each naming file, line, column and field where known. */
    public List<InputProblem> problems() { return problems; }

    /** Pairs of equal-weight rules that can fire together and recommend different controls. */
    public List<RuleConflict> conflicts() { return conflicts; }

    /** The process capability table in force, or null when no pack supplies one. */
    public CapabilityTable capability() { return capability; }

    /** The general-tolerance tables in force. */
    public GeneralToleranceTables generalTables() { return generalTables; }

    private static List<RuleConflict> findConflicts(List<Entry> entries) {
        List<RuleConflict> out = new ArrayList<>();
        int start = 0;
        while (start < entries.size()) {
            int w = entries.get(start).rule().weight();
            int end = start;
            while (end < entries.size() && entries.get(end).rule().weight() == w) end++;
            for (int i = start; i < end; i++) {
                Rule a = entries.get(i).rule();
                if (a.recommend() == null) continue;
                for (int j = i + 1; j < end; j++) {
                    Rule b = entries.get(j).rule();
                    if (b.recommend() == null) continue;
                    if (a.recommend().sameControlAs(b.recommend()) || !a.when().overlaps(b.when())) continue;
                    out.add(new RuleConflict(a.id(), b.id(), w, "rules '" + a.id() + "' (" + entries.get(i).pack()
                            + ") and '" + b.id() + "' (" + entries.get(j).pack() + ") can fire on the same case at "
                            + "equal weight " + w + " and recommend different controls (" + a.recommend().callout().key()
                            + " vs " + b.recommend().callout().key() + "); give one a different weight or narrow "
                            + "its conditions"));
                }
            }
            start = end;
        }
        return List.copyOf(out);
    }
}
