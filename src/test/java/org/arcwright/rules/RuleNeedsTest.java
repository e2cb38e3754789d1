package org.arcwright.rules;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Pack rules that add needs or state a preference: the need appears with the rule as its source, in the case's
 * units, and is proved on every card like a derived need; a preference orders cards only within the same needs
 * class; one need per kind when several bounds apply; old rule files load unchanged; bad needs are located errors.
 * The company numbers are invented (the example pack's works standard); the derived ones name their sources.
 */
class RuleNeedsTest {
    @TempDir
    Path dir;

    private Path pack(String name, String rules) throws Exception {
        Path p = dir.resolve(name);
        Files.createDirectories(p.resolve("rules"));
        Files.writeString(p.resolve("pack.json"), "{\"name\": \"" + name + "\"}");
        Files.writeString(p.resolve("rules/r.json"), rules);
        return p;
    }

    private Advisor advisor(String rules) throws Exception {
        PackStack stack = PackStack.load(List.of(pack("team", rules)), null);
        RuleBook book = RuleBook.load(stack);
        assertThat(book.problems()).isEmpty();
        return new Advisor(book, MechanicsChecks.standard(stack), NoteLinker.NONE);
    }

    private static String needRule(String need) {
        return "{\"rules\": [{\"id\": \"team.need\", \"summary\": \"a company need\", \"when\": {},"
                + " \"needs\": [" + need + "], \"because\": [\"the works standard says so\"]}]}";
    }

    private static DesignCase shaft(Units u, DrawingStyle s, double r, Loading loading, List<String> datums) {
        // locationMatters false: a location need comes from the rule alone
        return new DesignCase(u, s, null, BlendKind.FILLET, r, BlendFunction.STRESS_RELIEF, loading, false,
                false, datums, Process.MACHINED, null, null, null);
    }

    @ParameterizedTest(name = "{0} {1}{2} on {3} R{4} -> {0} {5}")
    @CsvSource(delimiter = '|', textBlock = """
            # A company floor in mm on a mm drawing: the floor as written; R0.5 must be raised to it (invented works standard).
            radius-floor   | min | 0.8  | mm | 0.5   | 0.8
            # The same floor on an inch drawing: 0.8 / 25.4 = 0.031496 in (ISO 31 / exact inch, 25.4 mm).
            radius-floor   | min | 0.8  | in | 0.02  | 0.031496
            # A ceiling written in inches on a mm drawing: 0.04 × 25.4 = 1.016 mm; R1.2 must come under it.
            radius-ceiling | max | 0.04 | mm | 1.2   | 1.016
            # A ceiling in mm: the card's largest radius at most 1.0 (invented: a gauge the shop owns).
            radius-ceiling | max | 1.0  | mm | 1.0   | 1.0
            # A form need on a static fillet with nothing else: only a control of form (CR, profile) meets it (ASME Y14.5-2018 CR, from memory).
            form           | -   | -    | mm | 1.0   | -
            # A location need with datums A, B: only a profile to the datums meets it (ASME Y14.5-2018 / ISO 1101 profile with datums).
            location       | -   | -    | mm | 1.0   | -
            """)
    void aRuleNeedIsShownWithTheRuleAsSourceAndMetByTheFirstCard(String id, String bound, String value, String caseUnits,
                                                                  double nominal, String expected) throws Exception {
        String numbers = bound.equals("-") ? "" : ", \"" + bound + "\": " + value + ", \"units\": \""
                + (id.equals("radius-ceiling") && value.equals("0.04") ? "in" : "mm") + "\"";
        Advisor a = advisor(needRule("{\"id\": \"" + id + "\"" + numbers + ", \"why\": \"works standard\", "
                + "\"source\": \"TD-STD-114 (invented)\"}"));
        Units u = Units.parse(caseUnits);
        DesignCase c = shaft(u, DrawingStyle.ASME, nominal, Loading.STATIC,
                id.equals("location") ? List.of("A", "B") : List.of());
        Advice advice = a.advise(c);
        Need n = advice.needs().stream().filter(x -> x.key().equals(id)).findFirst().orElseThrow();
        assertThat(n.source()).startsWith("rule team.need (team): TD-STD-114 (invented)");
        assertThat(n.why()).startsWith("works standard");
        if (!expected.equals("-")) {
            double v = Double.parseDouble(expected);
            assertThat(bound.equals("min") ? n.min() : n.max()).isEqualTo(v);
            assertThat(n.why()).contains(Advisor.plain(v) + " " + u.symbol());
        }
        Recommendation first = advice.first().orElseThrow();
        assertThat(first.meets().get(id)).as(first.text()).isTrue();
        assertThat(first.usable()).isTrue();
        if (bound.equals("min")) assertThat(first.numbers().min()).isGreaterThanOrEqualTo(n.min() - 1e-9);
        if (bound.equals("max")) assertThat(first.numbers().max()).isLessThanOrEqualTo(n.max() + 1e-9);
        for (Recommendation r : advice.recommendations()) {
            if (Boolean.FALSE.equals(r.meets().get(id))) {
                assertThat(r.cautions()).anySatisfy(t -> assertThat(t).startsWith("Does not meet " + id));
            }
        }
    }

    @Test
    void aRuleNeedAppearsInTheAdviceJsonAsANeed() throws Exception {
        Advisor a = advisor(needRule("{\"id\": \"radius-floor\", \"min\": 0.8, \"units\": \"mm\", \"why\": \"works "
                + "standard\", \"source\": \"TD-STD-114 (invented)\"}"));
        Advice advice = a.advise(shaft(Units.MM, DrawingStyle.ISO, 0.5, Loading.FATIGUE, List.of()));
        String json = new ObjectMapper().writeValueAsString(advice.needs());
        assertThat(json).contains("\"id\":\"radius-floor\"", "\"min\":0.8", "rule team.need (team)");
    }

    @Test
    void aRuleFloorAboveAStepCeilingIsAConflictSaidFirst() throws Exception {
        // h = (42 - 35)/2 = 3.5 mm (shoulder geometry); the company floor 4 mm cannot fit under it
        Advisor a = advisor(needRule("{\"id\": \"radius-floor\", \"min\": 4, \"units\": \"mm\", \"why\": \"works "
                + "standard\", \"source\": \"TD-STD-114 (invented)\"}"));
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ASME, null, BlendKind.FILLET, 2, BlendFunction.STRESS_RELIEF,
                Loading.STATIC, false, false, List.of(), Process.MACHINED,
                new DesignCase.StressInputs("stepped-shaft", "bending", 42, 35, null, null), null, null);
        Advice advice = a.advise(c);
        assertThat(advice.anyUsable()).isFalse();
        assertThat(advice.warnings().get(0)).startsWith("Nothing meets every need").contains("4.000", "3.500");
        assertThat(advice.recommendations()).allSatisfy(r -> assertThat(r.meetsAll()).isFalse());
    }

    @Test
    void aPreferencePutsAUsableProfileAheadOfAHeavierRadiusThatAlsoMeetsEveryNeed() throws Exception {
        // built-in mating.fillet.max-radius (weight 80) gives R limits; the team prefers a profile
        Advisor a = advisor("{\"rules\": [{\"id\": \"team.prefer\", \"summary\": \"profile first\", \"when\": {},"
                + " \"prefer\": [\"profile\"], \"weight\": 50, \"because\": [\"we scan on the CMM\"]}]}");
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ISO, null, BlendKind.FILLET, 0.6, BlendFunction.MATING,
                Loading.STATIC, false, false, List.of(), Process.MACHINED, null,
                new DesignCase.MatingCorner("chamfer", 1.0, null), null);
        Advice advice = a.advise(c);
        Recommendation first = advice.first().orElseThrow();
        assertThat(first.callout()).isInstanceOf(Callout.Profile.class);
        assertThat(first.usable()).isTrue();
        assertThat(first.trace()).anySatisfy(t -> assertThat(t).startsWith("preferred control: profile").contains("team.prefer"));
        assertThat(advice.recommendations().get(1).ruleId()).isEqualTo("mating.fillet.max-radius");
        assertThat(advice.recommendations().get(1).usable()).isTrue();
    }

    @Test
    void aPreferenceNeverLiftsACardThatMissesANeed() throws Exception {
        // fatigue needs form (Peterson's, ch. 3, by topic): a radius bounds size only, so a preference for radius
        // limits cannot put one ahead of the controlled radius that meets every need
        Advisor a = advisor("{\"rules\": [{\"id\": \"team.prefer\", \"summary\": \"limits first\", \"when\": {},"
                + " \"prefer\": [\"radius\"], \"weight\": 50, \"because\": [\"gauges are cheap\"]}]}");
        Advice advice = a.advise(shaft(Units.MM, DrawingStyle.ASME, 1.0, Loading.FATIGUE, List.of()));
        Recommendation first = advice.first().orElseThrow();
        assertThat(first.usable()).isTrue();
        assertThat(first.callout()).isInstanceOf(Callout.ControlledRadius.class);
    }

    @Test
    void severalCeilingsMakeOneNeedWhoseMaximumIsTheTighterAndWhoseWordsNameBoth() {
        // a 1.5 × 45° chamfer seats fillets up to 1.5 mm (clearance geometry, decision record 0802); the step
        // h = (42 - 35)/2 = 3.5 mm (shoulder geometry): one ceiling, 1.5, the chamfer binds
        PackStack stack = PackStack.builtIn();
        Advisor real = new Advisor(RuleBook.load(stack), MechanicsChecks.standard(stack), NoteLinker.NONE);
        Advice a = real.advise(matingShoulder(1.5));
        assertThat(a.needs()).filteredOn(n -> n.id() == Need.Kind.RADIUS_CEILING).singleElement().satisfies(n -> {
            assertThat(n.max()).isEqualTo(1.5);
            assertThat(n.why()).contains("chamfer 1.5 × 45°", "step h = (D − d)/2 = 3.500 mm")
                    .endsWith("the lowest ceiling, 1.500 mm from seating under the mating chamfer, binds");
            assertThat(n.source()).contains("mating.corner chamfer", "stress.D, stress.d");
        });
        // a 5 × 45° chamfer seats fillets up to 5 mm: the step binds
        Advice b = real.advise(matingShoulder(5));
        assertThat(b.needs()).filteredOn(n -> n.id() == Need.Kind.RADIUS_CEILING).singleElement().satisfies(n -> {
            assertThat(n.max()).isEqualTo(3.5);
            assertThat(n.why()).endsWith("the lowest ceiling, 3.500 mm from the step height, binds");
        });
        for (Advice x : List.of(a, b)) {
            for (Recommendation r : x.recommendations()) {
                assertThat(r.meets()).containsKey("radius-ceiling");
                assertThat(r.cautions().stream().filter(t -> t.startsWith("Does not meet radius-ceiling")).count())
                        .isLessThanOrEqualTo(1);
            }
        }
    }

    @Test
    void aRuleCeilingMergesWithTheDerivedOnesAndCanBind() throws Exception {
        // step 3.5 mm, chamfer 1.5 mm (as above), the company's 1.2 mm: one ceiling at 1.2 naming the rule
        Advisor a = advisor(needRule("{\"id\": \"radius-ceiling\", \"max\": 1.2, \"units\": \"mm\", \"why\": \"works "
                + "standard\", \"source\": \"TD-STD-114 (invented)\"}"));
        Advice advice = a.advise(matingShoulder(1.5));
        assertThat(advice.needs()).filteredOn(n -> n.id() == Need.Kind.RADIUS_CEILING).singleElement().satisfies(n -> {
            assertThat(n.max()).isEqualTo(1.2);
            assertThat(n.why()).endsWith("the lowest ceiling, 1.200 mm from rule team.need, binds");
            assertThat(n.source()).contains("rule team.need (team)", "mating.corner chamfer", "stress.D");
        });
        assertThat(advice.first().orElseThrow().numbers().max()).isLessThanOrEqualTo(1.2);
    }

    private static DesignCase matingShoulder(double chamfer) {
        return new DesignCase(Units.MM, DrawingStyle.ASME, null, BlendKind.FILLET, 1.0, BlendFunction.MATING,
                Loading.STATIC, false, false, List.of(), Process.MACHINED,
                new DesignCase.StressInputs("stepped-shaft", "bending", 42, 35, null, null),
                new DesignCase.MatingCorner("chamfer", chamfer, null), null);
    }

    @Test
    void oldRuleFilesLoadUnchangedWithNoNeedsOrPreference() {
        RuleBook book = RuleBook.load(PackStack.builtIn());
        assertThat(book.problems()).isEmpty();
        assertThat(book.entries()).allSatisfy(e -> {
            assertThat(e.rule().recommend()).isNotNull();
            assertThat(e.rule().needs()).isEmpty();
            assertThat(e.rule().prefer()).isEmpty();
        });
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            a floor without min       | "needs": [{"id": "radius-floor", "units": "mm", "why": "w", "source": "s"}]                  | takes "min"
            a ceiling with min        | "needs": [{"id": "radius-ceiling", "min": 1, "max": 2, "units": "mm", "why": "w", "source": "s"}] | takes "max"
            a length without units    | "needs": [{"id": "radius-floor", "min": 1, "why": "w", "source": "s"}]                       | units (mm or in)
            a negative length         | "needs": [{"id": "radius-floor", "min": -1, "units": "mm", "why": "w", "source": "s"}]        | positive length
            form with a number        | "needs": [{"id": "form", "min": 1, "units": "mm", "why": "w", "source": "s"}]                | takes no min
            an unknown need           | "needs": [{"id": "radius-flor", "min": 1, "units": "mm", "why": "w", "source": "s"}]         | radius-flor
            a need without source     | "needs": [{"id": "form", "why": "w"}]                                                        | source
            nothing to do             | "cautions": ["c"]                                                                            | must recommend a control
            a preference, no weight   | "prefer": ["profile"]                                                                        | weight: is required
            an unknown preference     | "prefer": ["profil"], "weight": 5                                                            | profil
            """)
    void aBadNeedOrPreferenceIsALocatedProblem(String name, String fields, String says) throws Exception {
        Path p = pack("bad", "{\"rules\": [{\"id\": \"team.bad\", \"summary\": \"s\", \"when\": {},\n " + fields
                + ",\n \"because\": [\"b\"]}]}");
        RuleBook book = RuleBook.load(PackStack.load(List.of(p), null));
        assertThat(book.problems()).singleElement().satisfies(prob -> {
            assertThat(prob.source()).endsWith("r.json");
            assertThat(prob.line()).isPositive();
            assertThat(prob.field() + ": " + prob.problem()).contains(says);
        });
    }
}
