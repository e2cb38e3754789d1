package org.arcwright.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The built-in pack's default process models (figures marked common practice in the table). */
class ProcessDefaultsTest {
    private final ProcessDefaults table = ProcessDefaults.load(PackStack.builtIn()).orElseThrow();

    @Test
    void everyProcessOfTheCaseVocabularyHasAModel() {
        assertThat(table.processes()).containsKeys("machined", "molded", "cast", "forged", "additive", "sheet-metal");
        assertThat(table.source()).contains("common practice");
    }

    @Test
    void radiusScatterIsTheHeldToleranceOverThreeAndInchLengthsAreConverted() {
        ProcessModel mm = table.model("machined", Units.MM, Models.FILLET_90, 2.0, 0.1);
        assertThat(mm.radius().sd()).isCloseTo(0.1 / 3, within(1e-12));
        assertThat(mm.noise()).isEqualTo(0.001);
        ProcessModel in = table.model("machined", Units.INCH, Models.FILLET_90, 0.08, 0.004);
        assertThat(in.noise()).isCloseTo(0.001 / 25.4, within(1e-12));
    }

    /** Common practice for pack files here (DEVELOPERS.md): a link leaving the pack is refused, as for every pack table. */
    @Test
    void aTableLinkedFromOutsideThePackIsRefused(@TempDir Path dir) throws Exception {
        Path pack = Files.createDirectories(dir.resolve("pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Quillmoor Gearworks practice (invented)\"}");
        Files.createDirectories(pack.resolve("tables"));
        Path outside = dir.resolve("elsewhere.json");
        Files.copy(Path.of("knowledge/tables/simulation-process-models.json"), outside);
        Files.createSymbolicLink(pack.resolve("tables/process-models.json"), outside);
        assertThatThrownBy(() -> ProcessDefaults.load(PackStack.load(List.of(pack), null)))
                .isInstanceOf(InputProblem.class).hasMessageContaining("process-models.json");
        // the same table inside the pack is read, and wins over the built-in one
        Files.delete(pack.resolve("tables/process-models.json"));
        Files.writeString(pack.resolve("tables/process-models.json"), Files.readString(outside).replace("common practice",
                "house figures (invented)"));
        assertThat(ProcessDefaults.load(PackStack.load(List.of(pack), null)).orElseThrow().source()).contains("house figures");
    }

    @Test
    void unknownProcessIsNamed() {
        assertThatThrownBy(() -> table.model("lasered", Units.MM, Models.FILLET_90, 2.0, 0.1))
                .isInstanceOf(InputProblem.class).hasMessageContaining("lasered").hasMessageContaining("machined");
    }
}
