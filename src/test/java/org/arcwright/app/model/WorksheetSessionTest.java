package org.arcwright.app.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import org.arcwright.io.InputProblem;
import org.arcwright.rules.Recommendation;
import org.arcwright.worksheet.RadiusFeature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WorksheetSessionTest {
    @TempDir
    Path dir;

    private final WorksheetSession session = new WorksheetSession(Fixtures.files(), Fixtures.twoFeatures(), null);

    @Test
    void aFreshSessionSelectsTheFirstFeatureAndIsNotDirty() {
        assertThat(session.selected().map(RadiusFeature::id)).contains("F1");
        assertThat(session.isDirty()).isFalse();
        assertThat(session.canUndo()).isFalse();
    }

    @Test
    void addingAFeaturePlacesItAfterTheSelectionAndSelectsIt() {
        RadiusFeature f = session.addFeature();
        assertThat(f.id()).isEqualTo("F3");
        assertThat(session.worksheet().features()).extracting(RadiusFeature::id).containsExactly("F1", "F3", "F2");
        assertThat(session.selected()).contains(f);
        assertThat(session.isDirty()).isTrue();
    }

    @Test
    void undoAndRedoWalkBackAndForthThroughEdits() {
        session.addFeature();
        session.duplicateSelected();
        assertThat(session.worksheet().features()).hasSize(4);
        assertThat(session.undoLabel()).contains("Duplicate F3");
        session.undo();
        session.undo();
        assertThat(session.worksheet()).isEqualTo(Fixtures.twoFeatures());
        assertThat(session.isDirty()).isFalse();
        session.redo();
        assertThat(session.worksheet().features()).hasSize(3);
        assertThat(session.canRedo()).isTrue();
    }

    @Test
    void deletingSelectsTheNeighbourAndUndoBringsTheFeatureBack() {
        session.select("F1");
        assertThat(session.deleteSelected()).isTrue();
        assertThat(session.selected().map(RadiusFeature::id)).contains("F2");
        session.undo();
        assertThat(session.worksheet().feature("F1")).isPresent();
    }

    @Test
    void choosingARecommendationDecidesTheFeature() {
        Recommendation r = IntentCard.of(Fixtures.fillet(2, "R2 ±0.2"), 90).orElseThrow();
        session.choose("F1", Fixtures.fillet(2, "R2 ±0.2"), r);
        assertThat(session.worksheet().feature("F1").orElseThrow().status()).isEqualTo(RadiusFeature.Status.DECIDED);
        assertThat(session.undoLabel()).hasValueSatisfying(l -> assertThat(l).contains("R2 ±0.2").contains("F1"));
    }

    @Test
    void savingWritesTheFileAddsTheExtensionAndClearsDirty() {
        session.addFeature();
        session.saveAs(dir.resolve("shaft"));
        assertThat(session.file()).contains(dir.resolve("shaft.arcpart"));
        assertThat(session.isDirty()).isFalse();
        WorksheetSession reopened = new WorksheetSession(Fixtures.files(), Fixtures.twoFeatures(), null);
        reopened.open(dir.resolve("shaft.arcpart"));
        assertThat(reopened.worksheet()).isEqualTo(session.worksheet());
        assertThat(reopened.canUndo()).isFalse();
    }

    @Test
    void openingABadFileKeepsTheCurrentWorksheetAndNamesTheProblem() throws Exception {
        Path bad = dir.resolve("bad.arcpart");
        Files.writeString(bad, "{ \"format\": 1, \"part\": {\"number\": \"X\"}, \"units\": \"furlongs\" }");
        assertThatThrownBy(() -> session.open(bad)).isInstanceOf(InputProblem.class).hasMessageContaining("bad.arcpart");
        assertThat(session.worksheet()).isEqualTo(Fixtures.twoFeatures());
    }

    @Test
    void everyChangeTellsTheListeners() {
        AtomicInteger fired = new AtomicInteger();
        session.listeners().add(fired::incrementAndGet);
        session.select("F2");
        session.addFeature();
        session.undo();
        assertThat(fired.get()).isGreaterThanOrEqualTo(3);
    }
}
