package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.lifecycle.AfterContainer;
import net.jqwik.api.lifecycle.BeforeContainer;
import org.assertj.core.api.Assertions;

/**
 * The fuzz suite: mutated files of every format and random callout text, run through the command
 * line, with three oracles:
 * <ul>
 *   <li>nothing escapes the CLI but a located error with exit 2 (no stack trace, no Java or Jackson
 *       name, never the internal-error code);
 *   <li>a verdict never contradicts its own figures (inspection, clearance);
 *   <li>a number never changes units silently (limits keep the callout's own units and values).
 * </ul>
 * Tries are bounded and seeds fixed so the normal build stays quick and repeatable; the {@code fuzz}
 * tag lets a fast loop leave it out ({@code -DexcludedGroups=fuzz}). Raise the tries with
 * {@code -Djqwik.tries.default=...} for a long hunt.
 */
@Tag("fuzz")
class FuzzedInputsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Set<Integer> CLEAN_EXITS = Set.of(Cli.OK, Cli.FAIL, Cli.BAD_INPUT, 3);
    private static Path dir;

    /** The invented example of each file format, and the command that reads it. */
    private record Format(String command, String example, String extension, List<String> extra) {}

    private static final List<Format> FORMATS = List.of(
            new Format("fillet-stress", "examples/mechanics/drive-shaft-fillet.json", ".json", List.of("--format", "json")),
            new Format("clearance", "examples/mechanics/bearing-seat-clearance.json", ".json", List.of("--format", "json")),
            new Format("inspect", "examples/inspect/bracket-round-r.json", ".json", List.of("--format", "json")),
            new Format("inspect", "examples/inspect/bracket-round-composite.json", ".json", List.of("--format", "json")),
            new Format("advise", "examples/advisor/gear-seat-shoulder.json", ".json", List.of("--no-notes", "--no-settings")),
            new Format("render", "examples/callout-composite.json", ".json", List.of()),
            new Format("drawing-note", "examples/tarnbeck-output-shaft-decided.arcpart", ".arcpart", List.of("--no-settings")),
            new Format("simulate", "examples/simulate/pump-bracket.json", ".json",
                    List.of("--parts", "20", "--points", "40", "--threads", "1", "--format", "json")));

    @BeforeContainer
    static void makeFolder() throws IOException {
        dir = Files.createTempDirectory("arcwright-fuzz");
    }

    @AfterContainer
    static void removeFolder() throws IOException {
        try (var s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) Files.deleteIfExists(p);
        }
    }

    /** One change to a file: a value replaced at a path, a field removed, or the text cut or spliced. */
    private record Mutation(int format, int target, int kind, int position, String raw) {}

    @Provide
    Arbitrary<Mutation> mutations() {
        Arbitrary<String> raws = Arbitraries.of("", "\"\"", "\" \"", "null", "\"abc\"", "NaN", "-1", "0", "1e308",
                "-0.0", "1e-300", "[]", "{}", "true", "\"1.5f\"", "\"0x1p1\"", "[null]", "{\"x\": 1}", "\"\\u0000\"",
                "\"" + "9".repeat(400) + "\"", "1e999", "-1e999");
        return Combinators.combine(Arbitraries.integers().between(0, FORMATS.size() - 1),
                Arbitraries.integers().between(0, 10_000), Arbitraries.integers().between(0, 5),
                Arbitraries.integers().between(0, 1_000_000), raws).as(Mutation::new);
    }

    @Property(tries = 60, seed = "20261205")
    void noExceptionEscapesAnyFileCommand(@ForAll("mutations") Mutation m) throws IOException {
        Format f = FORMATS.get(m.format());
        String original = Files.readString(Path.of(f.example()));
        String text = mutate(original, m);
        Path file = Files.writeString(dir.resolve("fuzzed-" + m.format() + f.extension()), text);
        List<String> args = new ArrayList<>();
        args.add(f.command());
        if (f.command().equals("drawing-note")) args.add(m.target() % 2 == 0 ? "callout-note" : "inspection-plan");
        args.add(file.toString());
        args.addAll(f.extra());
        CliRun r = CliRun.of(args.toArray(new String[0]));
        assertClean(r, text);
        if (r.exitCode() == Cli.BAD_INPUT) assertThat(r.err()).as(text).contains(file.getFileName().toString());
        if (f.command().equals("inspect") && r.exitCode() != Cli.BAD_INPUT) verdictAgreesWithWorstPoint(r);
        if (f.command().equals("clearance") && r.exitCode() != Cli.BAD_INPUT) seatingAgreesWithMargin(r);
    }

    @Property(tries = 25, seed = "20261205")
    void sheetsAndPackFilesNeverCrash(@ForAll("mutations") Mutation m) throws IOException {
        String ws = Files.readString(Path.of("examples/tarnbeck-output-shaft-decided.arcpart"));
        Path part = Files.writeString(dir.resolve("sheet-in.arcpart"), mutate(ws, m));
        assertClean(CliRun.of("sheet", part.toString(), "--out", dir.resolve("sheet-out.md").toString(), "--no-settings",
                "--no-suggest"), "sheet");
        Path pack = Files.createDirectories(dir.resolve("pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Fuzzed pack\", \"version\": \"1\"}");
        Files.createDirectories(pack.resolve("rules"));
        String rules = Files.readString(Path.of("knowledge/rules/cosmetic.json"));
        Files.writeString(pack.resolve("rules").resolve("fuzzed.json"), mutate(rules, m));
        CliRun check = CliRun.of("pack", "check", pack.toString(), "--no-settings");
        assertClean(check, "pack check");
    }

    /** The CSV formats: an advise --batch table and a measured section's points file. */
    @Property(tries = 40, seed = "20261205")
    void tablesNeverCrash(@ForAll("mutations") Mutation m) throws IOException {
        String table = Files.readString(Path.of("examples/advisor/tarnbeck-output-shaft.csv"));
        Path t = Files.writeString(dir.resolve("fuzzed-table.csv"), mutateCsv(table, m));
        CliRun batch = CliRun.of("advise", "--batch", t.toString(), "--no-notes", "--no-settings", "--format", "csv");
        assertClean(batch, "table");
        if (batch.exitCode() == Cli.BAD_INPUT) assertThat(batch.err()).contains("fuzzed-table.csv");
        String points = Files.readString(Path.of("examples/inspect/housing-fillet-section.csv"));
        Path csv = Files.writeString(dir.resolve("fuzzed-points.csv"), mutateCsv(points, m));
        JsonNode section = JSON.readTree(Files.readString(Path.of("examples/inspect/housing-fillet-profile.json")));
        ((ObjectNode) section).put("pointsFile", csv.toString());
        Path f = Files.writeString(dir.resolve("fuzzed-section.json"), section.toString());
        CliRun r = CliRun.of("inspect", f.toString(), "--format", "json");
        assertClean(r, "points");
        if (r.exitCode() != Cli.BAD_INPUT) verdictAgreesWithWorstPoint(r);
    }

    /** Cut, spliced, or one cell replaced (or emptied) among the first lines. */
    private static String mutateCsv(String text, Mutation m) {
        if (m.kind() < 2) return mutate(text, m);
        String[] lines = text.split("\n", -1);
        int line = m.target() % Math.min(lines.length, 12);
        String[] cells = lines[line].split(",", -1);
        cells[m.position() % cells.length] = m.kind() == 2 ? "" : m.raw().replace(",", ";");
        lines[line] = String.join(",", cells);
        return String.join("\n", lines);
    }

    @Provide
    Arbitrary<String> calloutTexts() {
        Arbitrary<String> tokens = Arbitraries.of("R", "CR", "R ", "0", "1", "2.5", ".", "±", "+", "-", "/", " ", "MAX",
                "MIN", "0.1", "+0.2/-0.1", "e", "E9", "NaN", "∞", "(", ")", "x", "1e-300", "1e300", "°", ",");
        return tokens.list().ofMinSize(1).ofMaxSize(8).map(l -> String.join("", l));
    }

    @Property(tries = 100, seed = "20261205")
    void anyCalloutTextIsAnAnswerOrALocatedRefusal(@ForAll("calloutTexts") String text) {
        CliRun r = CliRun.of("limits", text, "--format", "json");
        assertClean(r, text);
        assertThat(r.exitCode()).as(text).isIn(Cli.OK, Cli.BAD_INPUT);
    }

    @Property(tries = 80, seed = "20261205")
    void limitsKeepTheCalloutsUnitsAndValues(@ForAll("sizes") BigDecimal nominal, @ForAll("sizes") BigDecimal plus,
                                             @ForAll("sizes") BigDecimal minus, @ForAll boolean inch) throws IOException {
        if (minus.compareTo(nominal) >= 0) return;
        String callout = "R" + nominal.toPlainString() + " +" + plus.toPlainString() + "/-" + minus.toPlainString();
        CliRun r = CliRun.of("limits", callout, "--units", inch ? "in" : "mm", "--format", "json");
        assertClean(r, callout);
        if (r.exitCode() != Cli.OK) return;
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("units").asText()).as(callout).isEqualTo(inch ? "in" : "mm");
        double tol = 1e-9 * Math.max(1, nominal.doubleValue());
        assertThat(j.get("min").asDouble()).as(callout).isCloseTo(nominal.subtract(minus).doubleValue(),
                Assertions.within(tol));
        assertThat(j.get("max").asDouble()).as(callout).isCloseTo(nominal.add(plus).doubleValue(),
                Assertions.within(tol));
    }

    @Provide
    Arbitrary<BigDecimal> sizes() {
        return Arbitraries.bigDecimals().between(new BigDecimal("0.001"), new BigDecimal("500")).ofScale(3)
                .map(BigDecimal::stripTrailingZeros);
    }

    private static void assertClean(CliRun r, String input) {
        assertThat(r.exitCode()).as("exit for %s%n%s", input, r.err()).isIn(CLEAN_EXITS);
        String all = r.out() + r.err();
        assertThat(all).as(input).doesNotContain("\tat ", "Exception", "java.lang", "com.fasterxml", "org.arcwright.",
                "internal error");
        if (r.exitCode() == Cli.BAD_INPUT) assertThat(r.err()).as(input).startsWith("arcwright");
    }

    /** A pass is never beside a worst point outside its zone, and a fail always has one. */
    private static void verdictAgreesWithWorstPoint(CliRun r) throws IOException {
        JsonNode j = JSON.readTree(r.out());
        String verdict = j.path("verdict").asText();
        JsonNode excess = j.path("worst").path("excess");
        if (excess.isNumber() && verdict.equals("pass")) {
            assertThat(excess.asDouble()).as(r.out()).isLessThanOrEqualTo(1e-9);
        }
        if (verdict.equals("pass")) assertThat(r.exitCode()).isEqualTo(Cli.OK);
        if (verdict.equals("fail")) assertThat(r.exitCode()).isEqualTo(Cli.FAIL);
    }

    /** "Seats" exactly when the margin is not negative, and the exit code says the same. */
    private static void seatingAgreesWithMargin(CliRun r) throws IOException {
        JsonNode j = JSON.readTree(r.out());
        if (!j.has("seats") || !j.get("margin").isNumber()) return;
        boolean seats = j.get("seats").asBoolean();
        assertThat(seats).as(r.out()).isEqualTo(j.get("margin").asDouble() >= -1e-12);
        if (!seats) assertThat(r.exitCode()).isEqualTo(Cli.FAIL);
    }

    private static String mutate(String text, Mutation m) {
        switch (m.kind()) {
            case 0:
                return text.substring(0, m.position() % (text.length() + 1));
            case 1: {
                int at = m.position() % (text.length() + 1);
                return text.substring(0, at) + m.raw() + text.substring(at);
            }
            default:
                return mutateTree(text, m);
        }
    }

    /** Replaces or removes one value of the JSON tree, chosen by {@code target} among all values. */
    private static String mutateTree(String text, Mutation m) {
        JsonNode root;
        try {
            root = JSON.readTree(text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<JsonNode[]> slots = new ArrayList<>();
        collect(root, slots);
        if (slots.isEmpty()) return text;
        JsonNode[] slot = slots.get(m.target() % slots.size());
        JsonNode parent = slot[0];
        String raw = m.raw().isEmpty() ? "null" : m.raw();
        JsonNode value;
        try {
            value = raw.equals("NaN") ? JsonNodeFactory.instance.textNode("\u0000NaN\u0000") : JSON.readTree(raw);
        } catch (IOException e) {
            value = JsonNodeFactory.instance.textNode(raw);
        }
        if (parent instanceof ObjectNode o) {
            String name = slot[1].asText();
            if (m.kind() == 2) o.remove(name);
            else o.set(name, value);
        } else if (parent instanceof ArrayNode a) {
            int i = slot[1].asInt();
            if (m.kind() == 2) a.remove(i);
            else a.set(i, value);
        }
        try {
            return JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root).replace("\"\\u0000NaN\\u0000\"", "NaN");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void collect(JsonNode node, List<JsonNode[]> slots) {
        if (node instanceof ObjectNode o) {
            o.fieldNames().forEachRemaining(n -> {
                slots.add(new JsonNode[] {o, JsonNodeFactory.instance.textNode(n)});
                collect(o.get(n), slots);
            });
        } else if (node instanceof ArrayNode a) {
            for (int i = 0; i < Math.min(a.size(), 8); i++) {
                slots.add(new JsonNode[] {a, JsonNodeFactory.instance.numberNode(i)});
                collect(a.get(i), slots);
            }
        }
    }
}
