package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/** Invariants of the engine over generated cases. */
class AdvisorPropertiesTest {
    private static final RuleBook BOOK = RuleBook.load(PackStack.builtIn());
    /** A second, independently loaded book: the answer must not depend on the instance. */
    private static final RuleBook OTHER_BOOK = RuleBook.load(PackStack.builtIn());
    private static final JsonFiles JSON = new JsonFiles();

    @Provide
    Arbitrary<DesignCase> cases() {
        Arbitrary<Units> units = Arbitraries.of(Units.values());
        Arbitrary<DrawingStyle> standard = Arbitraries.of(DrawingStyle.values());
        Arbitrary<BlendKind> kind = Arbitraries.of(BlendKind.values());
        Arbitrary<Double> radius = Arbitraries.doubles().between(0.1, 30).ofScale(2);
        Arbitrary<BlendFunction> function = Arbitraries.of(BlendFunction.values());
        Arbitrary<Loading> loading = Arbitraries.of(Loading.values());
        Arbitrary<List<String>> datums = Arbitraries.of(List.<String>of(), List.of("A"), List.of("A", "B"),
                List.of("A", "B", "C"));
        Arbitrary<Process> process = Arbitraries.of(Process.values());
        Arbitrary<Boolean> bool = Arbitraries.of(true, false);
        return Combinators.combine(units, standard, kind, radius, function, loading, datums, process)
                .flatAs((u, s, k, r, f, l, d, p) -> Combinators.combine(bool, bool).as((form, loc) ->
                        new DesignCase(u, s, null, k, r, f, l, form, loc, d, p, null, null, null)));
    }

    @Property(tries = 300, seed = "4711")
    void sameCaseAndPacksGiveTheSameAdvice(@ForAll("cases") DesignCase c) {
        Advice a = new Advisor(BOOK, FilletChecks.NONE, NoteLinker.NONE).advise(c);
        Advice b = new Advisor(OTHER_BOOK, FilletChecks.NONE, NoteLinker.NONE).advise(c);
        assertThat(JSON.write(b)).isEqualTo(JSON.write(a));
    }

    @Property(tries = 300, seed = "4712")
    void everyCaseGetsAtLeastOneRecommendationRankedBestFirst(@ForAll("cases") DesignCase c) {
        Advice a = new Advisor(BOOK, FilletChecks.NONE, NoteLinker.NONE).advise(c);
        assertThat(a.recommendations()).isNotEmpty();
        // needs first: usable, then meets every need but demoted, then the rest; within a class fewer drawing
        // elements, then the higher pack weight
        for (int i = 1; i < a.recommendations().size(); i++) {
            Recommendation prev = a.recommendations().get(i - 1);
            Recommendation r = a.recommendations().get(i);
            assertThat(needsClass(prev)).isLessThanOrEqualTo(needsClass(r));
            if (needsClass(prev) == needsClass(r) && elements(prev) == elements(r)) {
                assertThat(prev.score()).isGreaterThanOrEqualTo(r.score());
            }
        }
    }

    @Property(tries = 300, seed = "4713")
    void limitsArePositiveAndOrdered(@ForAll("cases") DesignCase c) {
        Advice a = new Advisor(BOOK, FilletChecks.NONE, NoteLinker.NONE).advise(c);
        for (Recommendation r : a.recommendations()) {
            double min = (Double) r.numbers().asMap().get("min");
            double max = (Double) r.numbers().asMap().get("max");
            assertThat(min).isPositive();
            assertThat(max).isGreaterThan(min);
        }
    }

    private static int needsClass(Recommendation r) {
        boolean all = Boolean.TRUE.equals(r.meetsAll());
        return all ? (r.demoted() ? 1 : 0) : (r.demoted() ? 3 : 2);
    }

    private static int elements(Recommendation r) { return r.refinement() == null ? 1 : 2; }
}
