package org.arcwright.app.model;

import java.util.List;
import org.arcwright.io.JsonFiles;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;

/** Small invented worksheets for view-model tests (demo data, not published values). */
final class Fixtures {
    private Fixtures() {}

    static WorksheetFiles files() { return new WorksheetFiles(new JsonFiles()); }

    static DesignCase fillet(double r, String tolerance) {
        return new DesignCase(Units.MM, DrawingStyle.ASME, "shoulder", BlendKind.FILLET, r, BlendFunction.STRESS_RELIEF,
                Loading.FATIGUE, true, false, List.of("A"), Process.MACHINED, null, null, tolerance);
    }

    static PartWorksheet twoFeatures() {
        return PartWorksheet.empty(new PartWorksheet.PartInfo("QX-100", "Test shaft", null, "Invented Co", "A"), Units.MM,
                        DrawingStyle.ASME)
                .withFeature(new RadiusFeature("F1", fillet(2, "R2 ±0.2"), null, null))
                .withFeature(new RadiusFeature("F2", fillet(1, null), null, null));
    }
}
