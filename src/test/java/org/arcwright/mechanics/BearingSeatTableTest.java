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

/** The bearing-seat table is pack data: built in, replaceable by a team pack, checked when read. */
class BearingSeatTableTest {

    @Test
    void builtInTableNamesItsSourceWithoutABrand() {
        BearingSeatTable t = BearingSeatTable.load(PackStack.builtIn(), BearingSeatTable.BUILT_IN_ID);
        assertThat(t.source()).contains("ISO 582");
        assertThat(t.rows()).allSatisfy(r -> assertThat(r.filletMax()).isLessThanOrEqualTo(r.chamferMin()));
    }

    @Test
    void teamPackReplacesTheBuiltInTableById(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("pack.json"), "{\"name\": \"Quillmoor Gearworks practice\"}");
        Files.createDirectories(dir.resolve("tables"));
        Files.writeString(dir.resolve("tables/bearing.json"), """
                {"kind": "bearing-fillet", "id": "rolling-bearing-fillet", "title": "house table",
                 "source": "house standard QG-12 (invented)", "units": "mm",
                 "rows": [{"chamferMin": 1.5, "filletMax": 1.2}]}
                """);
        BearingSeatTable t = BearingSeatTable.load(PackStack.load(List.of(dir), null), BearingSeatTable.BUILT_IN_ID);
        assertThat(t.lookup(1.5).row().filletMax()).isEqualTo(1.2);
    }

    @Test
    void malformedTableNamesTheFileAndField(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("pack.json"), "{\"name\": \"Quillmoor Gearworks practice\"}");
        Files.createDirectories(dir.resolve("tables"));
        Files.writeString(dir.resolve("tables/bearing.json"), """
                {"kind": "bearing-fillet", "id": "x", "title": "t", "source": "s",
                 "rows": [{"chamferMin": 1.0, "filletMax": 1.5}]}
                """);
        assertThatThrownBy(() -> BearingSeatTable.load(PackStack.load(List.of(dir), null), "x"))
                .isInstanceOf(InputProblem.class).hasMessageContaining("bearing.json")
                .hasMessageContaining("filletMax may not exceed chamferMin");
    }
}
