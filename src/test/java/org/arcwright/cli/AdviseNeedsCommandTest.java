package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code advise}: the JSON contract of the needs-first advisor, the text needs table, and impossible geometry. */
class AdviseNeedsCommandTest {
    private static final String CONFLICT = """
            {"units": "mm", "standard": "iso", "kind": "fillet", "nominalRadius": 2, "function": "mating",
             "loading": "fatigue", "process": "machined",
             "stress": {"shape": "stepped-shaft", "load": "bending", "D": 42, "d": 35, "targetKt": 1.75},
             "mating": {"corner": "chamfer", "size": 1.5}}
            """;

    @Test
    void aCardSaysWhatItsEquivalentProfileZoneIsAbout(@TempDir Path dir) throws Exception {
        // R3 +0.3/+0.1 at 90°: 2 × 0.3 × (1/sin 45° − 1) = 0.2485 about the drawn R3, the figure `limits` gives
        // (worked by hand). Before: 0.1657 about R3.1, with nothing saying so; JSON nominal 3.1.
        Path f = Files.writeString(dir.resolve("case.json"), """
                {"units": "mm", "standard": "iso", "kind": "fillet", "nominalRadius": 3, "function": "stress-relief",
                 "loading": "fatigue", "formMatters": true, "process": "machined", "tolerance": "R3 +0.3/+0.1"}""");
        CliRun text = CliRun.of("advise", f.toString(), "--no-notes", "--no-settings", "--all");
        assertThat(text.exitCode()).as(text.err()).isZero();
        assertThat(text.out()).contains("limits 3.100 to 3.300 mm; crescent 0.0828; equivalent profile zone 0.2485 about R3");
        JsonNode root = new ObjectMapper().readTree(CliRun.of("advise", f.toString(), "--no-notes", "--no-settings",
                "--format", "json").out());
        assertThat(root.path("recommendations")).anySatisfy(r -> {
            assertThat(r.path("text").asText()).isEqualTo("R3 +0.3/+0.1");
            assertThat(r.at("/numbers/nominal").asDouble()).isEqualTo(3.0);
        });
    }

    @Test
    void jsonCarriesNeedsMeetsAndDesignChanges(@TempDir Path dir) throws Exception {
        Path f = Files.writeString(dir.resolve("case.json"), CONFLICT);
        CliRun run = CliRun.of("advise", f.toString(), "--no-notes", "--no-settings", "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(run.out());
        // K_t 1.75 needs about 2.79 mm (Peterson's fit, bending, D/d = 1.2); a 1.5 × 45° chamfer admits up to 1.5
        assertThat(root.path("needs")).anySatisfy(n -> {
            assertThat(n.path("id").asText()).isEqualTo("radius-floor");
            assertThat(n.path("min").asDouble()).isBetween(2.78, 2.80);
            assertThat(n.has("why") && n.has("source")).isTrue();
        });
        assertThat(root.path("needs")).anySatisfy(n -> {
            assertThat(n.path("id").asText()).isEqualTo("radius-ceiling");
            assertThat(n.path("max").asDouble()).isEqualTo(1.5);
        });
        assertThat(root.path("designChanges").size()).isPositive();
        assertThat(root.path("designChanges").get(0).has("kind")).isTrue();
        assertThat(root.path("designChanges").get(0).has("numbers")).isTrue();
        for (JsonNode r : root.path("recommendations")) {
            assertThat(r.path("meetsAll").asBoolean()).isFalse();
            assertThat(r.path("meets").path("radius-floor").isBoolean()).isTrue();
            assertThat(r.path("numbers").has("min") && r.path("numbers").has("max")).isTrue();
        }
    }

    @Test
    void textPutsTheDesignChangesOnTopAndANeedsTableWithTicks(@TempDir Path dir) throws Exception {
        Path f = Files.writeString(dir.resolve("case.json"), CONFLICT);
        CliRun run = CliRun.of("advise", f.toString(), "--no-notes", "--no-settings");
        String out = run.out();
        assertThat(out.indexOf("What would work (design changes):")).isPositive().isLessThan(out.indexOf("1. "));
        assertThat(out.indexOf("warning   Nothing meets every need")).isLessThan(out.indexOf("1. "));
        assertThat(out).contains("radius-floor", "✗", "relief-groove", "spacer");
    }

    @Test
    void aBatchRowWithAFilletLargerThanItsStepDoesNotStopTheRun(@TempDir Path dir) throws Exception {
        // defect: one row with R4 on a 3.5 mm step (h = (42 - 35)/2) killed the whole --batch run
        Path csv = Files.writeString(dir.resolve("part.csv"), """
                feature,units,standard,kind,nominalRadius,function,process,loading,stress.shape,stress.load,stress.D,stress.d,stress.targetKt
                F1,mm,asme,fillet,4,stress-relief,machined,fatigue,stepped-shaft,bending,42,35,1.9
                F2,mm,asme,fillet,1,stress-relief,machined,static,,,,,
                """);
        CliRun run = CliRun.of("advise", "--batch", csv.toString(), "--no-notes", "--no-settings", "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertThat(root.path("features").size()).isEqualTo(2);
        JsonNode f1 = root.path("features").get(0);
        assertThat(f1.path("warnings").get(0).asText()).contains("cannot be built as drawn");
        assertThat(f1.path("recommendations").get(0).path("numbers").path("max").asDouble()).isLessThanOrEqualTo(3.5);
    }

    @Test
    void theMechanicsRefuseAFilletLargerThanItsStepAsALocatedError(@TempDir Path dir) throws Exception {
        Path f = Files.writeString(dir.resolve("fillet.json"), """
                {"units": "mm", "shape": "stepped-shaft", "load": "bending", "D": 42, "d": 35, "r": 4}
                """);
        CliRun run = CliRun.of("fillet-stress", f.toString());
        assertThat(run.exitCode()).isEqualTo(Cli.BAD_INPUT);
        assertThat(run.err()).contains("fillet.json", "larger than the step");
    }
}
