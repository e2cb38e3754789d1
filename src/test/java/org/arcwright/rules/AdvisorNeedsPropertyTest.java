package org.arcwright.rules;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * The invariant of the needs-first advisor: a card that says it meets every need admits no radius outside any
 * need's bounds, and when some card can meet every need the first one does. Mechanics are the invented stand-in
 * curves of {@link AdvisorChecksTest.StandIn}, so floors and ceilings vary widely and cheaply. The same holds with
 * a pack rule adding a need of its own (an invented company floor, ceiling, form or location need).
 */
class AdvisorNeedsPropertyTest {
    private static final RuleBook BUILT_IN = RuleBook.load(PackStack.builtIn());
    private static final Advisor ADVISOR = new Advisor(BUILT_IN, new AdvisorChecksTest.StandIn(), NoteLinker.NONE);

    /** The built-in rules plus one that fires on every case and adds {@code need}. */
    private static Advisor withRuleNeed(RuleNeed need) {
        Rule rule = new Rule("team.company-need", "an invented company need", When.ALWAYS, null, 0,
                List.of("the works standard says so"), null, null, null, null, List.of(need), null);
        List<RuleBook.Entry> entries = new ArrayList<>(BUILT_IN.entries());
        entries.add(new RuleBook.Entry(rule, "team", PackLayer.TEAM, "team/rules/r.json", null));
        return new Advisor(new RuleBook(entries, List.of(), BUILT_IN.capability(), BUILT_IN.generalTables()),
                new AdvisorChecksTest.StandIn(), NoteLinker.NONE);
    }

    @Provide
    Arbitrary<RuleNeed> ruleNeeds() {
        Arbitrary<Double> length = Arbitraries.doubles().between(0.2, 6).ofScale(2);
        Arbitrary<Units> units = Arbitraries.of(Units.MM, Units.INCH);
        return Arbitraries.oneOf(
                Combinators.combine(length, units).as((v, u) -> new RuleNeed(Need.Kind.RADIUS_FLOOR,
                        u == Units.INCH ? v / 25.4 : v, null, u, "company floor", "invented")),
                Combinators.combine(length, units).as((v, u) -> new RuleNeed(Need.Kind.RADIUS_CEILING, null,
                        u == Units.INCH ? v / 25.4 : v, u, "company ceiling", "invented")),
                Arbitraries.just(new RuleNeed(Need.Kind.FORM, null, null, null, "company form", "invented")),
                Arbitraries.just(new RuleNeed(Need.Kind.LOCATION, null, null, null, "company location", "invented")));
    }

    @Provide
    Arbitrary<DesignCase> cases() {
        Arbitrary<DrawingStyle> standard = Arbitraries.of(DrawingStyle.values());
        Arbitrary<BlendKind> kind = Arbitraries.of(BlendKind.values());
        Arbitrary<Double> radius = Arbitraries.doubles().between(0.3, 5).ofScale(2);
        Arbitrary<BlendFunction> function = Arbitraries.of(BlendFunction.values());
        Arbitrary<Loading> loading = Arbitraries.of(Loading.values());
        Arbitrary<List<String>> datums = Arbitraries.of(List.<String>of(), List.of("A"), List.of("A", "B"));
        Arbitrary<Process> process = Arbitraries.of(Process.MACHINED, Process.CAST, Process.MOLDED);
        Arbitrary<Double> target = Arbitraries.doubles().between(1.15, 2.5).ofScale(3).injectNull(0.3);
        Arbitrary<Double> mating = Arbitraries.doubles().between(0.3, 5).ofScale(2).injectNull(0.4);
        Arbitrary<Double> step = Arbitraries.doubles().between(1, 8).ofScale(1);
        Arbitrary<Boolean> bool = Arbitraries.of(true, false);
        return Combinators.combine(standard, kind, radius, function, loading, datums, process, target)
                .flatAs((s, k, r, f, l, d, p, t) -> Combinators.combine(mating, step, bool, bool).as((m, h, form, loc) ->
                        new DesignCase(Units.MM, s, null, k, r, f, l, form, loc, d, p,
                                t == null ? null : new DesignCase.StressInputs("stepped-shaft", "bending", 35 + 2 * h, 35,
                                        null, t),
                                m == null ? null : new DesignCase.MatingCorner("radius", m, null), null)));
    }

    @Property(tries = 400, seed = "1414")
    void noCardMeetingEveryNeedAdmitsARadiusOutsideAnyNeedsBounds(@ForAll("cases") DesignCase c) {
        Advice a = ADVISOR.advise(c);
        for (Recommendation r : a.recommendations()) {
            if (!Boolean.TRUE.equals(r.meetsAll())) continue;
            admitsOnlyRadiiWithinTheNeeds(r, a.needs());
        }
    }

    /** A card that meets every need admits no radius outside any need's bounds, and every need is reachable. */
    private static void admitsOnlyRadiiWithinTheNeeds(Recommendation r, List<Need> needs) {
        for (Need n : needs) {
            assertThat(n.reachable()).isTrue();
            if (n.min() != null) assertThat(r.numbers().min()).as(r.text()).isGreaterThanOrEqualTo(n.min() - 1e-9);
            if (n.max() != null) assertThat(r.numbers().max()).as(r.text()).isLessThanOrEqualTo(n.max() + 1e-9);
        }
    }

    @Property(tries = 400, seed = "1415")
    void whenAnyCardIsUsableTheFirstIsAndOtherwiseTheAdviceSaysSo(@ForAll("cases") DesignCase c) {
        Advice a = ADVISOR.advise(c);
        if (a.anyUsable()) {
            assertThat(a.first().orElseThrow().usable()).isTrue();
        } else {
            assertThat(a.warnings()).anySatisfy(w -> assertThat(w).startsWith("Nothing meets every need"));
        }
    }

    @Property(tries = 200, seed = "1416")
    void aRuleAddedNeedIsProvedLikeADerivedOne(@ForAll("cases") DesignCase c, @ForAll("ruleNeeds") RuleNeed need) {
        Advice a = withRuleNeed(need).advise(c);
        assertThat(a.needs()).anySatisfy(n -> assertThat(n.source()).contains("rule team.company-need (team)"));
        assertThat(a.needs()).extracting(Need::id).doesNotHaveDuplicates();
        for (Recommendation r : a.recommendations()) {
            if (!Boolean.TRUE.equals(r.meetsAll())) continue;
            admitsOnlyRadiiWithinTheNeeds(r, a.needs());
            if (need.id() == Need.Kind.FORM) assertThat(Proof.controlsForm(r.callout())).isTrue();
            if (need.id() == Need.Kind.LOCATION) assertThat(Proof.locates(r.callout())).isTrue();
        }
        if (a.anyUsable()) {
            assertThat(a.first().orElseThrow().usable()).isTrue();
        } else {
            assertThat(a.warnings()).anySatisfy(w -> assertThat(w).startsWith("Nothing meets every need"));
        }
    }
}
