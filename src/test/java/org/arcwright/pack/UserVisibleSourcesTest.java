package org.arcwright.pack;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.arcwright.cli.CliRun;
import org.arcwright.mechanics.PetersonFit;
import org.arcwright.mechanics.PetersonFits;
import org.junit.jupiter.api.Test;

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
