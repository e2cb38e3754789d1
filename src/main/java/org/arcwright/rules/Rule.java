package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.HashSet;
import java.util.List;

/**
 * One piece of tolerancing practice: when a case's facts match, recommend a control, add needs the feature has
 * by the company's practice, or state which controls the company prefers, with the reasoning an engineer would give
 * and the cautions that go with it. A rule does at least one of the three. Rules are data in a practice pack's
 * {@code rules/*.json}; the format is described in DEVELOPERS.md and decision records 0400 and 0404.
 *
 * @param id unique across the packs in force; a later pack replaces it only by declaring an override
 * @param summary one line saying what the rule recommends
 * @param when the conditions on case facts; required ({@code {}} for a rule that applies to every case)
 * @param recommend the control and how to size it, or null for a rule that only adds needs or a preference
 * @param weight rank among the rules that fire, 1 to 1000, higher first; 0 for a rule that only adds needs
 *     (it ranks nothing)
 * @param because the reasoning, in the engineer's words
 * @param cautions what to watch
 * @param references standards and handbooks by clause topic (never copied text)
 * @param noteTags tags of practice notes to link
 * @param examples self-tests: cases and the rule that must come first
 * @param needs needs the rule adds to every case it fires on, proved per candidate like the derived ones
 * @param prefer controls the company prefers among cards that meet every need, most preferred first
 */
public record Rule(String id, String summary, When when, CalloutPlan recommend, int weight, List<String> because,
                   List<String> cautions, List<String> references, List<String> noteTags, List<RuleExample> examples,
                   List<RuleNeed> needs, List<CalloutPlan.CalloutKind> prefer) {

    /** Reads a rule: {@code weight} may be left out only by a rule that only adds needs. */
    @JsonCreator
    public static Rule read(@JsonProperty(value = "id", required = true) String id,
                            @JsonProperty(value = "summary", required = true) String summary,
                            @JsonProperty("when") When when,
                            @JsonProperty("recommend") CalloutPlan recommend,
                            @JsonProperty("weight") Integer weight,
                            @JsonProperty(value = "because", required = true) List<String> because,
                            @JsonProperty("cautions") List<String> cautions,
                            @JsonProperty("references") List<String> references,
                            @JsonProperty("noteTags") List<String> noteTags,
                            @JsonProperty("examples") List<RuleExample> examples,
                            @JsonProperty("needs") List<RuleNeed> needs,
                            @JsonProperty("prefer") List<CalloutPlan.CalloutKind> prefer) {
        if (weight == null && (recommend != null || prefer != null && !prefer.isEmpty())) {
            throw new IllegalArgumentException("weight is required (1 to 1000) when the rule recommends a control or "
                    + "states a preference");
        }
        return new Rule(id, summary, when, recommend, weight == null ? 0 : weight, because, cautions, references,
                noteTags, examples, needs, prefer);
    }

    public Rule {
        if (id == null || !id.matches("[a-z0-9][a-z0-9.-]*")) {
            throw new IllegalArgumentException("id must be lower-case letters, digits, dots and hyphens, got '" + id + "'");
        }
        if (summary == null || summary.isBlank()) throw new IllegalArgumentException("summary must not be blank");
        if (when == null) {
            throw new IllegalArgumentException("when is missing or null; a rule that applies to every case says so "
                    + "with \"when\": {}");
        }
        needs = needs == null ? List.of() : List.copyOf(needs);
        prefer = prefer == null ? List.of() : List.copyOf(prefer);
        if (recommend == null && needs.isEmpty() && prefer.isEmpty()) {
            throw new IllegalArgumentException("a rule must recommend a control (\"recommend\"), add needs (\"needs\") "
                    + "or state a preference (\"prefer\")");
        }
        if (prefer.size() != new HashSet<>(prefer).size()) {
            throw new IllegalArgumentException("prefer lists a control twice: " + prefer);
        }
        boolean ranks = recommend != null || !prefer.isEmpty();
        if (ranks ? weight < 1 || weight > 1000 : weight < 0 || weight > 1000) {
            throw new IllegalArgumentException("weight must be 1 to 1000, got " + weight);
        }
        if (because == null || because.isEmpty()) {
            throw new IllegalArgumentException("because must give the reasoning: at least one sentence");
        }
        because = List.copyOf(because);
        cautions = cautions == null ? List.of() : List.copyOf(cautions);
        references = references == null ? List.of() : List.copyOf(references);
        noteTags = noteTags == null ? List.of() : List.copyOf(noteTags);
        examples = examples == null ? List.of() : List.copyOf(examples);
    }

    /** A rule that recommends a control, as every rule did before rules could add needs. */
    public Rule(String id, String summary, When when, CalloutPlan recommend, int weight, List<String> because,
                List<String> cautions, List<String> references, List<String> noteTags, List<RuleExample> examples) {
        this(id, summary, when, recommend, weight, because, cautions, references, noteTags, examples, null, null);
    }

    /** A rule file: {@code {"rules": [ ... ]}}. */
    public record File(List<Rule> rules) {
        @JsonCreator
        public File(@JsonProperty(value = "rules", required = true) List<Rule> rules) {
            if (rules == null) throw new IllegalArgumentException("rules must be a list of rules, got null");
            for (int i = 0; i < rules.size(); i++) {
                if (rules.get(i) == null) throw new IllegalArgumentException("rules[" + i + "] is null; expected a rule");
            }
            this.rules = List.copyOf(rules);
        }
    }
}
