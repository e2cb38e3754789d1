package org.arcwright.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.arcwright.io.InputProblem;

/**
 * Validates a practice pack layered over the ones below it and runs the examples of every rule in
 * force. A pack passes when it loaded without problems, adds no conflicts, and its own rules'
 * examples give the expected first recommendation. Examples of lower layers that the pack changes
 * are reported, not failed: changing the defaults is what a team pack is for.
 */
public final class PackCheck {
    private final Advisor advisor;

    public PackCheck(Advisor advisor) {
        this.advisor = Objects.requireNonNull(advisor, "advisor");
    }

    /**
     * The outcome of one example.
     *
     * @param ruleId the rule that carries it
     * @param pack the pack that supplied the rule
     * @param name the example's name
     * @param own true when the rule belongs to the pack under check
     * @param passed true when the expected rule (and callout type, if given) came first
     * @param expected what was expected, in words
     * @param actual what came first, in words
     */
    public record ExampleResult(String ruleId, String pack, String name, boolean own, boolean passed, String expected,
                                String actual) {}

    /**
     * The whole check.
     *
     * @param pack the name of the pack checked
     * @param problems what failed to load
     * @param conflicts equal-weight rules that can fire together with different controls
     * @param examples every example's outcome, the checked pack's first
     */
    public record Report(String pack, List<InputProblem> problems, List<RuleConflict> conflicts,
                         List<ExampleResult> examples) {
        public Report {
            problems = List.copyOf(problems);
            conflicts = List.copyOf(conflicts);
            examples = List.copyOf(examples);
        }

        /** True when nothing failed. */
        public boolean passed() {
            return problems.isEmpty() && conflicts.isEmpty() && examples.stream().filter(ExampleResult::own)
                    .allMatch(ExampleResult::passed);
        }

        /** The checked pack's own examples that failed. */
        public List<ExampleResult> failures() {
            return examples.stream().filter(e -> e.own() && !e.passed()).toList();
        }

        /** Lower layers' examples whose outcome the checked pack changes. */
        public List<ExampleResult> changed() {
            return examples.stream().filter(e -> !e.own() && !e.passed()).toList();
        }
    }

    /** Runs the check for the pack named {@code packName} (the top layer of the advisor's rule book). */
    public Report run(String packName) {
        List<ExampleResult> own = new ArrayList<>();
        List<ExampleResult> others = new ArrayList<>();
        for (RuleBook.Entry e : advisor.book().entries()) {
            for (RuleExample ex : e.rule().examples()) {
                boolean isOwn = e.pack().equals(packName);
                (isOwn ? own : others).add(runOne(e, ex, isOwn));
            }
        }
        own.addAll(others);
        return new Report(packName, advisor.book().problems(), advisor.book().conflicts(), own);
    }

    private static String keys(List<Need.Kind> kinds) {
        List<String> out = new ArrayList<>(kinds.size());
        for (Need.Kind k : kinds) out.add(k.key());
        return String.join(", ", out);
    }

    private ExampleResult runOne(RuleBook.Entry e, RuleExample ex, boolean own) {
        RuleExample.Expectation want = ex.expect();
        String expected = want.first() + (want.callout() == null ? "" : " (" + want.callout().key() + ")")
                + (want.textContains() == null ? "" : " drawn with \"" + want.textContains() + "\"")
                + (want.needs().isEmpty() ? "" : ", meeting " + keys(want.needs()) + " added by " + e.rule().id());
        String actual;
        boolean passed;
        try {
            Advice advice = advisor.advise(ex.designCase());
            if (advice.first().isEmpty()) {
                actual = "no recommendation";
                passed = false;
            } else {
                Recommendation r = advice.first().get();
                actual = r.ruleId() + " (" + r.callout().typeName() + ")" + (r.demoted() ? " demoted" : "") + ": " + r.text();
                passed = r.ruleId().equals(want.first())
                        && (want.callout() == null || r.callout().typeName().equals(want.callout().key()))
                        && (want.textContains() == null || r.text().contains(want.textContains()));
                for (Need.Kind k : want.needs()) {
                    boolean added = advice.needs().stream().anyMatch(n -> n.id() == k
                            && n.source().contains("rule " + e.rule().id() + " ("));
                    boolean met = Boolean.TRUE.equals(r.meets().get(k.key()));
                    if (!added || !met) {
                        passed = false;
                        actual += added ? "; does not meet " + k.key() : "; no " + k.key() + " need from " + e.rule().id();
                    }
                }
            }
        } catch (InputProblem p) {
            actual = "error: " + p.getMessage();
            passed = false;
        }
        return new ExampleResult(e.rule().id(), e.pack(), ex.name(), own, passed, expected, actual);
    }
}
