package org.arcwright.app.simulate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.cli.CliRun;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.services.CaseSimulations;
import org.arcwright.services.Practice;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * The desktop's simulation of a feature gives the figures {@code advise --simulate} gives for the
 * same case, seed and parts: both build it with {@link CaseSimulations}. The worksheet is the invented
 * Tarnbeck output shaft; the shares themselves are checked against closed forms in the simulate tests.
 */
@Tag("slow")
class FeatureSimulationTest {
    private static final Path DECIDED = Path.of("examples/tarnbeck-output-shaft-decided.arcpart");
    private static final int PARTS = 300;

    @Test
    void everyFeatureGetsTheCommandLinesCountsOnEachAdvisorCardAndItsChosenCalloutMarked() throws Exception {
        CliRun run = CliRun.of("advise", DECIDED.toString(), "--simulate", "--simulate-parts", Integer.toString(PARTS), "--no-notes",
                "--no-settings", "--format", "json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode features = new ObjectMapper().readTree(run.out()).path("features");
        PartWorksheet ws = new WorksheetFiles(new JsonFiles()).read(DECIDED);
        Practice practice = Practice.load(List.of(), null);
        var table = ProcessDefaults.load(practice.packs());
        assertThat(features.size()).isEqualTo(ws.features().size());
        int compared = 0;
        for (int i = 0; i < ws.features().size(); i++) {
            RadiusFeature f = ws.features().get(i);
            FeatureSimulation plan = FeatureSimulation.of(f, practice, table);
            assertThat(plan.unavailable()).as(f.id()).isNull();
            FeatureSimulation.Figures d = plan.defaults();
            assertThat(d.parts()).isEqualTo(CaseSimulations.DEFAULT_PARTS);
            assertThat(d.seed()).isEqualTo(CaseSimulations.DEFAULT_SEED);
            FeatureSimulation.Figures figures = new FeatureSimulation.Figures(d.radiusMean(), d.radiusSd(), d.positionSd(), d.flatRate(),
                    d.stepRate(), d.noise(), d.points(), PARTS, d.seed());
            List<CaseSimulations.Judged> rows = CaseSimulations.run(plan.candidates(figures), plan.needs().needs(), PARTS, d.seed());
            JsonNode cards = features.get(i).path("recommendations");
            assertThat(rows.size()).as(f.id()).isGreaterThanOrEqualTo(cards.size());
            for (int k = 0; k < cards.size(); k++) {
                JsonNode s = cards.get(k).path("simulation");
                CaseSimulations.Judged row = rows.get(k);
                assertThat(row.candidate().recommendation().text()).isEqualTo(cards.get(k).path("text").asText());
                assertThat(row.result() != null).as(f.id() + " card " + k).isEqualTo(s.path("simulated").asBoolean());
                if (row.result() == null) {
                    assertThat(row.notSimulated()).isEqualTo(s.path("reason").asText());
                    continue;
                }
                compared++;
                assertThat(row.callout().text()).isEqualTo(s.path("callout").asText());
                assertThat(row.good().count()).isEqualTo(s.path("good").path("count").asLong());
                assertThat(row.callout().accepted()).isEqualTo(s.path("accepted").path("count").asLong());
                assertThat(row.callout().escapes()).isEqualTo(s.path("escapes").path("count").asLong());
                assertThat(row.callout().falseRejects()).isEqualTo(s.path("falseRejects").path("count").asLong());
            }
            // the chosen callout is marked once: on the card that proposes it, else added after the cards
            long chosen = rows.stream().filter(r -> r.candidate().chosen()).count();
            assertThat(chosen).as(f.id()).isEqualTo(f.chosen() == null ? 0 : 1);
            if (rows.size() > cards.size()) {
                assertThat(rows.size()).isEqualTo(cards.size() + 1);
                assertThat(rows.get(rows.size() - 1).candidate().chosen()).isTrue();
            }
        }
        assertThat(compared).isGreaterThanOrEqualTo(8);
    }

    @Test
    void aFigureOutOfRangeIsNamedAsTheViewLabelsIt() {
        Practice practice = Practice.load(List.of(), null);
        RadiusFeature f2 = new WorksheetFiles(new JsonFiles()).read(DECIDED).features().get(1);
        FeatureSimulation plan = FeatureSimulation.of(f2, practice, ProcessDefaults.load(practice.packs()));
        FeatureSimulation.Figures d = plan.defaults();
        assertThatThrownBy(() -> new FeatureSimulation.Figures(d.radiusMean(), -0.01, d.positionSd(), d.flatRate(), d.stepRate(),
                d.noise(), d.points(), d.parts(), d.seed())).isInstanceOf(InputProblem.class).hasMessageContaining("Radius sd");
        assertThatThrownBy(() -> new FeatureSimulation.Figures(d.radiusMean(), d.radiusSd(), d.positionSd(), 1.5, d.stepRate(),
                d.noise(), d.points(), d.parts(), d.seed())).isInstanceOf(InputProblem.class).hasMessageContaining("Flats on")
                .hasMessageContaining("0 to 100 %");
        assertThatThrownBy(() -> new FeatureSimulation.Figures(d.radiusMean(), d.radiusSd(), d.positionSd(), d.flatRate(), d.stepRate(),
                d.noise(), 2, d.parts(), d.seed())).isInstanceOf(InputProblem.class).hasMessageContaining("Points");
    }

    @Test
    void theDefaultFiguresRebuildTheTablesModelExactly() {
        Practice practice = Practice.load(List.of(), null);
        RadiusFeature f2 = new WorksheetFiles(new JsonFiles()).read(DECIDED).features().get(1);
        FeatureSimulation plan = FeatureSimulation.of(f2, practice, ProcessDefaults.load(practice.packs()));
        assertThat(plan.defaults().model(plan.process().model())).isEqualTo(plan.process().model());
    }
}
