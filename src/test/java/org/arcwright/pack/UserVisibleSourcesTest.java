package org.arcwright.pack;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.arcwright.cli.CliRun;
import org.arcwright.mechanics.PetersonFit;
import org.arcwright.mechanics.PetersonFits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Users see plain citations: "from memory" belongs in tests, decision records and a table's
 * {@code provenance}, never in a note, a rule, a table's {@code source} or a command's output.
 */
class UserVisibleSourcesTest {

    @Test
    void builtInNotesAndRulesCiteWithoutFromMemory() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.walk(Path.of("knowledge"))) {
            files = s.filter(Files::isRegularFile).filter(p -> p.toString().endsWith(".md") || p.toString().contains("rules")).toList();
        }
        assertThat(files).isNotEmpty();
        for (Path f : files) {
            String text = Files.readString(f).replace("not from memory", "");
            assertThat(text).as(f.toString()).doesNotContainIgnoringCase("from memory");
        }
    }

    @Test
    void tableSourcesShownToUsersAreCitationsOnly() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("knowledge/tables"))) {
            for (Path f : s.toList()) {
                for (String line : Files.readAllLines(f)) {
                    if (line.strip().startsWith("\"source\"")) assertThat(line).as(f.toString()).doesNotContainIgnoringCase("memory");
                }
            }
        }
    }

    /**
     * Every text of every shipped table (rows' sources too), except its {@code provenance}. Before: the cast row of
     * the process-capability table said "(from memory)" and the advisor printed it on every cast card.
     */
    @Test
    void everyTableTextButItsProvenanceIsACitationOnly() throws IOException {
        ObjectMapper json = new ObjectMapper();
        for (String pack : List.of("knowledge/tables", "shared/tables")) {
            try (Stream<Path> s = Files.list(Path.of(pack))) {
                for (Path f : s.filter(p -> p.toString().endsWith(".json")).toList()) {
                    List<String> texts = new ArrayList<>();
                    texts(json.readTree(f.toFile()), texts);
                    assertThat(texts).as(f.toString()).noneMatch(t -> t.toLowerCase().contains("memory"));
                }
            }
        }
    }

    /** The texts of {@code node}, leaving out every {@code provenance} (maintainers' words, never shown). */
    private static void texts(JsonNode node, List<String> out) {
        if (node.isTextual()) out.add(node.asText());
        if (node.isArray()) node.forEach(n -> texts(n, out));
        if (node.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                if (!e.getKey().equals("provenance")) texts(e.getValue(), out);
            }
        }
    }

    /** Demo files, templates, the team pack and the README are what users read first. */
    @Test
    void examplesTemplatesTeamPackAndReadmeCiteWithoutFromMemory() throws IOException {
        List<Path> files = new ArrayList<>();
        for (String dir : List.of("examples", "templates", "shared")) {
            try (Stream<Path> s = Files.walk(Path.of(dir))) {
                s.filter(Files::isRegularFile).filter(p -> !p.toString().contains("tables")).forEach(files::add);
            }
        }
        files.add(Path.of("README.md"));
        for (Path f : files) {
            assertThat(Files.readString(f)).as(f.toString()).doesNotContainIgnoringCase("from memory");
        }
    }

    /**
     * No string literal in the production code says "from memory" (comments may: they are for maintainers).
     * Before: an inspection error message ended "(ASME Y14.5-2018 composite profile, from memory)".
     */
    @Test
    void noMessageInTheCodeSaysFromMemory() throws IOException {
        Pattern literal = Pattern.compile("\"(?:[^\"\\\\]|\\\\.)*\"");
        try (Stream<Path> s = Files.walk(Path.of("src/main/java"))) {
            for (Path f : s.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    String code = line.strip();
                    if (code.startsWith("*") || code.startsWith("//") || code.startsWith("/*")) continue;
                    Matcher m = literal.matcher(code);
                    while (m.find()) assertThat(m.group()).as(f + ": " + code).doesNotContainIgnoringCase("from memory");
                }
            }
        }
    }

    @Test
    void advisingACastPartAndTheDemoSheetCarryNoFromMemory(@TempDir Path dir) throws IOException {
        Path cast = dir.resolve("cast.json");
        Files.writeString(cast, """
                {"units": "mm", "standard": "iso", "kind": "fillet", "nominalRadius": 5, "function": "cosmetic",
                 "loading": "none", "process": "cast"}""");
        CliRun advise = CliRun.of("advise", cast.toString(), "--all", "--no-settings", "--no-notes");
        assertThat(advise.exitCode()).as(advise.err()).isZero();
        assertThat(advise.out()).doesNotContainIgnoringCase("from memory");
        Path sheet = dir.resolve("sheet.md");
        CliRun run = CliRun.of("sheet", "examples/tarnbeck-output-shaft-decided.arcpart", "--out", sheet.toString(), "--no-settings",
                "--no-suggest");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(Files.readString(sheet)).doesNotContainIgnoringCase("from memory");
    }

    @Test
    void stressFitSourcesNameNoUnverifiedChart() {
        // The fits reproduce the published values named in PetersonFitsTest; the chart numbers were recalled, not checked.
        for (PetersonFit fit : PetersonFits.published().all()) {
            assertThat(fit.source()).doesNotContainIgnoringCase("memory").doesNotContainIgnoringCase("chart");
        }
    }

    @Test
    void commandOutputCarriesNoFromMemory() {
        for (String[] args : List.of(
                new String[] {"fillet-stress", "examples/mechanics/drive-shaft-fillet.json"},
                new String[] {"clearance", "examples/mechanics/bearing-seat-clearance.json"},
                new String[] {"limits", "R3 +0.2/-0.1", "--blend", "fillet"},
                new String[] {"general-tolerance", "--class", "m", "--radius", "4"})) {
            CliRun run = CliRun.of(args);
            assertThat(run.out() + run.err()).as(String.join(" ", args)).doesNotContainIgnoringCase("from memory");
        }
    }
}
