package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The ring chamfer limits are pack data, read as every pack table is: from inside the pack only. */
class BearingChamferLimitsTest {
    private static final String TABLE = """
            {"kind": "bearing-chamfer-limits", "id": "iso582-radial-bearings", "title": "house table",
             "source": "house standard QG-14 (invented)", "units": "mm",
             "rows": [{"chamferMin": 1.5, "radialMax": 2.5, "axialMax": 3.5}]}
            """;

    private static Path pack(Path dir) throws Exception {
        Path pack = Files.createDirectories(dir.resolve("pack"));
        Files.writeString(pack.resolve("pack.json"), "{\"name\": \"Quillmoor Gearworks practice\"}");
        Files.createDirectories(pack.resolve("tables"));
        return pack;
    }

    @Test
    void teamPackReplacesTheBuiltInLimitsById(@TempDir Path dir) throws Exception {
        Path pack = pack(dir);
        Files.writeString(pack.resolve("tables/limits.json"), TABLE);
        BearingChamferLimits t = BearingChamferLimits.load(PackStack.load(List.of(pack), null), BearingChamferLimits.BUILT_IN_ID);
        assertThat(t.source()).contains("QG-14");
    }

    /** Common practice for pack files here (DEVELOPERS.md): a link leaving the pack is refused, as for the seat table. */
    @Test
    void aTableLinkedFromOutsideThePackIsRefused(@TempDir Path dir) throws Exception {
        Path pack = pack(dir);
        Path outside = Files.writeString(dir.resolve("elsewhere.json"), TABLE);
        Files.createSymbolicLink(pack.resolve("tables/limits.json"), outside);
        assertThatThrownBy(() -> BearingChamferLimits.load(PackStack.load(List.of(pack), null), BearingChamferLimits.BUILT_IN_ID))
                .isInstanceOf(InputProblem.class).hasMessageContaining("limits.json");
    }
}
