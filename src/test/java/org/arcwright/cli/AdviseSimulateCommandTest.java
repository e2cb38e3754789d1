package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.ProfileTier;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.zone.ProfileZone;
import org.junit.jupiter.api.Test;

/**
 * {@code advise --simulate}: shares on every card that can be simulated, the ranking unchanged, the
 * same figures for the same seed. The case is the invented gear-seat shoulder of examples/advisor.
 * The shares themselves are checked against closed forms in the simulate package's tests; here only
 * the bookkeeping holds (share = count / parts; the 95 % Wilson interval contains the share, Wilson 1927,
 * up to rounding at a count of 0).
 */
class AdviseSimulateCommandTest {
    private static final String CASE = "examples/advisor/gear-seat-shoulder.json";
    private final ObjectMapper mapper = new ObjectMapper();

    private JsonNode advise(String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of("advise", CASE, "--no-notes", "--no-settings", "--format", "json"));
        args.addAll(List.of(extra));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        return mapper.readTree(run.out());
    }

    @Test
    void everyCardGetsSharesOrAReasonAndTheRankingIsUnchanged() throws Exception {
        JsonNode plain = advise();
        JsonNode sim = advise("--simulate", "--simulate-parts", "300");
        JsonNode a = plain.path("recommendations"), b = sim.path("recommendations");
        assertThat(b.size()).isEqualTo(a.size()).isPositive();
        for (int i = 0; i < a.size(); i++) {
            assertThat(b.get(i).path("rule").asText()).isEqualTo(a.get(i).path("rule").asText());
            assertThat(b.get(i).path("text").asText()).isEqualTo(a.get(i).path("text").asText());
            assertThat(b.get(i).path("score").asDouble()).isEqualTo(a.get(i).path("score").asDouble());
            assertThat(a.get(i).has("simulation")).isFalse();
        }
        assertThat(plain.has("simulation")).isFalse();

        int simulated = 0;
        for (JsonNode r : b) {
            JsonNode s = r.path("simulation");
            String type = r.path("callout").path("type").asText();
            if ("general".equals(type)) {
                assertThat(s.path("simulated").asBoolean()).isFalse();
                assertThat(s.path("reason").asText()).contains("general tolerance");
                continue;
            }
            assertThat(s.path("simulated").asBoolean()).as(s.toString()).isTrue();
            simulated++;
            assertThat(s.path("parts").asLong()).isEqualTo(300);
            for (String k : List.of("good", "accepted", "escapes", "falseRejects")) {
                JsonNode x = s.path(k);
                double share = x.path("share").asDouble();
                assertThat(share).as(k).isEqualTo(x.path("count").asLong() / 300.0);
                assertThat(x.path("interval95").get(0).asDouble()).as(k).isLessThanOrEqualTo(share + 1e-12);
                assertThat(x.path("interval95").get(1).asDouble()).as(k).isGreaterThanOrEqualTo(share - 1e-12);
            }
            // escapes are accepted parts; false rejects are good parts not accepted
            assertThat(s.path("escapes").path("count").asLong()).isLessThanOrEqualTo(s.path("accepted").path("count").asLong());
            assertThat(s.path("falseRejects").path("count").asLong())
                    .isLessThanOrEqualTo(Math.min(s.path("good").path("count").asLong(), 300 - s.path("accepted").path("count").asLong()));
        }
        assertThat(simulated).isGreaterThanOrEqualTo(2);

        JsonNode top = sim.path("simulation");
        assertThat(top.path("processModel").asText()).isEqualTo("machined");
        assertThat(top.path("seed").asLong()).isEqualTo(AdviceSimulation.DEFAULT_SEED);
        assertThat(top.path("parts").asInt()).isEqualTo(300);
        assertThat(top.path("caution").asText()).contains("a model, not the shop's capability data", "licensed engineering judgement");
        assertThat(top.path("table").asText()).contains("common practice");
        // the case's form need is no radius limit: said, not silently dropped
        assertThat(top.path("needsNotJudged").toString()).contains("form");
    }

    @Test
    void theSameSeedGivesTheSameFiguresAndTheSeedIsHonoured() throws Exception {
        JsonNode one = advise("--simulate", "--simulate-parts", "256");
        JsonNode two = advise("--simulate", "--simulate-parts", "256");
        JsonNode other = advise("--simulate", "--simulate-parts", "256", "--simulate-seed", "7");
        List<JsonNode> a = sims(one), b = sims(two), c = sims(other);
        assertThat(b).isEqualTo(a);
        assertThat(other.path("simulation").path("seed").asLong()).isEqualTo(7);
        assertThat(c).isNotEqualTo(a);
    }

    @Test
    void textShowsSharesOnTheCardsAndTheCaution() {
        CliRun run = CliRun.of("advise", CASE, "--no-notes", "--no-settings", "--simulate", "--simulate-parts", "256");
        assertThat(run.exitCode()).as(run.err()).isZero();
        String out = run.out();
        assertThat(out).contains("Simulated (evidence only, ranking unchanged): 256 parts, seed 19",
                "caution   A simulated process is a model", "accepted ", "escapes ", "false rejects ", "95 % Wilson interval",
                "simulated not simulated: a title-block general tolerance");
        assertThat(out.indexOf("Simulated (evidence only")).isLessThan(out.indexOf("1. "));
    }

    @Test
    void simulationOptionsWithoutSimulateAreALocatedError() {
        CliRun run = CliRun.of("advise", CASE, "--no-notes", "--no-settings", "--simulate-parts", "100");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("--simulate-parts", "needs --simulate");
    }

    @Test
    void profilesFloatWithoutDatumsAndLocateWithThem() {
        // ASME Y14.5-2018 profile and composite profile, from memory: no datums = floating zone;
        // a lower composite tier repeating datums refines orientation, not location
        List<DatumReference> a = List.of(new DatumReference("A", null));
        assertThat(AdviceSimulation.toInspection(new Callout.Profile(0.1, null, List.of(), false, null)))
                .isEqualTo(new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.1), EnumSet.allOf(Freedom.class), false));
        assertThat(AdviceSimulation.toInspection(new Callout.Profile(0.1, null, a, false, null)))
                .isEqualTo(new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(0.1), EnumSet.noneOf(Freedom.class), false));
        InspectionCallout cp = AdviceSimulation.toInspection(new Callout.CompositeProfile(
                List.of(new ProfileTier(0.2, a), new ProfileTier(0.1, a), new ProfileTier(0.05, List.of())), null));
        assertThat(cp).isEqualTo(new InspectionCallout.CompositeProfile(List.of(
                new InspectionCallout.Tier(0.2, EnumSet.noneOf(Freedom.class)),
                new InspectionCallout.Tier(0.1, EnumSet.of(Freedom.X, Freedom.Y)),
                new InspectionCallout.Tier(0.05, EnumSet.allOf(Freedom.class)))));
        assertThat(AdviceSimulation.toInspection(new Callout.ControlledRadius(1.9, 2.1, null)))
                .isEqualTo(new InspectionCallout.RadiusLimits(RadiusKind.CR, 1.9, 2.1));
    }

    private static List<JsonNode> sims(JsonNode root) {
        List<JsonNode> out = new ArrayList<>();
        for (JsonNode r : root.path("recommendations")) out.add(r.path("simulation"));
        return out;
    }
}
