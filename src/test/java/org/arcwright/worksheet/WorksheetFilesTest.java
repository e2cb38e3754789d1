package org.arcwright.worksheet;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.rules.Recommendation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WorksheetFilesTest {
    private final WorksheetFiles files = new WorksheetFiles(new JsonFiles());

    @Test
    void demoWorksheetLoadsWithEveryFeature() {
        PartWorksheet w = files.read(Path.of("examples/tarnbeck-output-shaft.arcpart"));
        assertThat(w.features()).extracting(RadiusFeature::id).containsExactly("F1", "F2", "F3", "F4", "F5");
        assertThat(w.features().get(0).designCase().stress().bigD()).isEqualTo(42);
        assertThat(w.features()).allMatch(f -> f.status() == RadiusFeature.Status.OPEN);
    }

    @Test
    void savedWorksheetReadsBackEqual(@TempDir Path dir) {
        PartWorksheet w = files.read(Path.of("examples/tarnbeck-output-shaft.arcpart"));
        Callout profile = new Callout.Profile(0.1, null, List.of(DatumReference.parse("A"), DatumReference.parse("B(M)")),
                false, Extent.WITH_ADJACENT);
        Recommendation rec = new Recommendation("demo", profile, "profile 0.1 A B(M)", 1.0, List.of("why"),
                List.of(), List.of(), Map.of("zone", 0.1), List.of(), List.of(), false);
        w = w.withFeature(w.features().get(2).withChosen(rec));
        Path file = dir.resolve("part" + WorksheetFiles.EXTENSION);
        files.write(file, w);
        PartWorksheet back = files.read(file);
        assertThat(back).isEqualTo(w);
        assertThat(back.feature("F3").orElseThrow().status()).isEqualTo(RadiusFeature.Status.DECIDED);
    }

    @Test
    void badFeatureNamesFileLineAndField(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("bad.arcpart");
        Files.writeString(file, "{\n \"part\": {\"number\": \"X1\"},\n \"units\": \"mm\",\n \"standard\": \"asme\",\n"
                + " \"features\": [{\"id\": \"F1\", \"case\": {\"units\": \"mm\", \"standard\": \"asme\", \"kind\": \"fillet\",\n"
                + "   \"nominalRadius\": -1, \"function\": \"sealing\", \"process\": \"machined\"}}]\n}\n");
        assertThatThrownBy(() -> files.read(file))
                .isInstanceOf(InputProblem.class)
                .hasMessageContaining("bad.arcpart:")
                .hasMessageContaining("features[0].case")
                .hasMessageContaining("nominalRadius: must be a number greater than zero");
    }
}
