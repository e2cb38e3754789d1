package org.arcwright.worksheet;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.junit.jupiter.api.Test;

/** A kept verdict says what it judged, against what and in which units, or that it cannot. */
class InspectionRecordTest {
    @Test
    void aVerdictNamesTheCalloutItJudgedAndItsUnits() {
        InspectionRecord r = new InspectionRecord("fail", "f1.json", "2026-12-05", Map.of("callout", "CR 1.8-2.2", "units", "mm"));
        assertThat(r.describe()).isEqualTo("measured: fail against CR 1.8-2.2 (mm), 2026-12-05");
    }

    @Test
    void aRecordWithoutItsCalloutSaysSoRatherThanAPlainPass() {
        InspectionRecord r = new InspectionRecord("pass", "cmm/f1.csv", "2026-11-20", Map.of("points", 48));
        assertThat(r.describe()).isEqualTo("measured: pass (the callout judged is not recorded), 2026-11-20");
    }
}
