package org.arcwright.rules;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;

/**
 * One piece of tolerancing practice: when a case's facts match, recommend a control, with the
 * reasoning an engineer would give and the cautions that go with it. Rules are data in a practice
 * pack's {@code rules/*.json}; the format is described in DEVELOPERS.md and decision record 0400.
 *
 * @param id unique across the packs in force; a later pack replaces it only by declaring an override
 * @param summary one line saying what the rule recommends
 * @param when the conditions on case facts; required ({@code {}} for a rule that applies to every case)
 * @param recommend the control and how to size it
 * @param weight rank among the rules that fire, 1 to 1000, higher first
 * @param because the reasoning, in the engineer's words
 * @param cautions what to watch
 * @param references standards and handbooks by clause topic (never copied text)
 * @param noteTags tags of practice notes to link
 * @param examples self-tests: cases and the rule that must come first
 */
public record Rule(String id, String summary, When when, CalloutPlan recommend, int weight, List<String> because,
                   List<String> cautions, List<String> references, List<String> noteTags, List<RuleExample> examples) {

    @JsonCreator
    public Rule(@JsonProperty(value = "id", required = true) String id,
                @JsonProperty(value = "summary", required = true) String summary,
                @JsonProperty("when") When when,
                @JsonProperty(value = "recommend", required = true) CalloutPlan recommend,
                @JsonProperty(value = "weight", required = true) int weight,
                @JsonProperty(value = "because", required = true) List<String> because,
                @JsonProperty("cautions") List<String> cautions,
                @JsonProperty("references") List<String> references,
                @JsonProperty("noteTags") List<String> noteTags,
                @JsonProperty("examples") List<RuleExample> examples) {
        if (id == null || !id.matches("[a-z0-9][a-z0-9.-]*")) {
            throw new IllegalArgumentException("id must be lower-case letters, digits, dots and hyphens, got '" + id + "'");
        }
        if (summary == null || summary.isBlank()) throw new IllegalArgumentException("summary must not be blank");
        if (when == null) {
            throw new IllegalArgumentException("when is missing or null; a rule that applies to every case says so "
                    + "with \"when\": {}");
        }
        if (weight < 1 || weight > 1000) throw new IllegalArgumentException("weight must be 1 to 1000, got " + weight);
        if (because == null || because.isEmpty()) {
            throw new IllegalArgumentException("because must give the reasoning: at least one sentence");
        }
        this.id = id;
        this.summary = summary;
        this.when = when;
        this.recommend = recommend;
        this.weight = weight;
        this.because = List.copyOf(because);
        this.cautions = cautions == null ? List.of() : List.copyOf(cautions);
        this.references = references == null ? List.of() : List.copyOf(references);
        this.noteTags = noteTags == null ? List.of() : List.copyOf(noteTags);
        this.examples = examples == null ? List.of() : List.copyOf(examples);
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
