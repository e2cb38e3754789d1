package org.arcwright.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

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

    /**
     * The built-in table, every row from r_s min 0.1 to 19, against ISO 582 (chamfer dimension limits for radial
     * bearings, tapered roller bearings excepted) as reprinted in a rolling-bearing maker's catalogue: r_s min,
     * a bore inside the row's range (mm), r_s max radial, r_s max axial.
     */
    @ParameterizedTest(name = "r_s min {0}, d {1}: {2} radial, {3} axial")
    @CsvSource({
            "0.1, 20, 0.2, 0.4", "0.15, 20, 0.3, 0.6", "0.2, 20, 0.5, 0.8",
            "0.3, 40, 0.6, 1", "0.3, 41, 0.8, 1", "0.6, 40, 1, 2", "0.6, 41, 1.3, 2",
            "1, 50, 1.5, 3", "1, 51, 1.9, 3", "1.1, 120, 2, 3.5", "1.1, 121, 2.5, 4",
            "1.5, 120, 2.3, 4", "1.5, 121, 3, 5", "2, 80, 3, 4.5", "2, 220, 3.5, 5", "2, 221, 3.8, 6",
            "2.1, 280, 4, 6.5", "2.1, 281, 4.5, 7", "2.5, 100, 3.8, 6", "2.5, 280, 4.5, 6", "2.5, 281, 5, 7",
            "3, 280, 5, 8", "3, 281, 5.5, 8", "4, 300, 6.5, 9", "5, 300, 8, 10", "6, 300, 10, 13",
            "7.5, 300, 12.5, 17", "9.5, 300, 15, 19", "12, 300, 18, 24", "15, 300, 21, 30", "19, 300, 25, 38",
    })
    void builtInRowsMatchTheIso582TableAsReprinted(double chamferMin, double bore, double radial, double axial) {
        BearingChamferLimits.Row row = BearingChamferLimits.load(PackStack.builtIn(), BearingChamferLimits.BUILT_IN_ID)
                .lookup(chamferMin, bore).row();
        assertThat(row.chamferMin()).isEqualTo(chamferMin);
        assertThat(row.radialMax()).isCloseTo(radial, within(1e-12));
        assertThat(row.axialMax()).isCloseTo(axial, within(1e-12));
    }

    @Test
    void theIssuesRowForTheRevisedBearingSeat() {
        // ISO 582 (as reprinted): r_s min 1.1, bores up to 120 mm: r_s max 2.0 radially, so a 32 mm bore's ring face
        // starts 2.0 from the corner.
        assertThat(BearingChamferLimits.load(PackStack.builtIn(), BearingChamferLimits.BUILT_IN_ID).lookup(1.1, 32.0)
                .row().radialMax()).isEqualTo(2.0);
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
