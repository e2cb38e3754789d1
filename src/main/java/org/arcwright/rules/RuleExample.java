package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Objects;

/**
 * A pack's self-test: a case and the recommendation that must come first for it.
 *
 * @param name what the example shows
 * @param designCase the case
 * @param expect what must come first
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record RuleExample(String name, DesignCase designCase, Expectation expect) {

    @JsonCreator
    public RuleExample(@JsonProperty("name") String name,
                       @JsonProperty(value = "case", required = true) DesignCase designCase,
                       @JsonProperty(value = "expect", required = true) Expectation expect) {
        this.name = name == null ? "" : name;
        this.designCase = Objects.requireNonNull(designCase, "case");
        this.expect = Objects.requireNonNull(expect, "expect");
    }

    @JsonProperty("case")
    public DesignCase designCase() { return designCase; }

    /**
     * @param first the rule id that must rank first
     * @param callout the callout type it must carry, or null for any
     * @param textContains text the drawn callout must contain, or null
     * @param needs kinds of need the example's rule must add (shown with the rule as source) and the first card
     *     must meet; empty for none
     */
    @JsonInclude(JsonInclude.Include.NON_EMPTY)
    public record Expectation(String first, CalloutPlan.CalloutKind callout, String textContains, List<Need.Kind> needs) {
        @JsonCreator
        public Expectation(@JsonProperty(value = "first", required = true) String first,
                           @JsonProperty("callout") CalloutPlan.CalloutKind callout,
                           @JsonProperty("textContains") String textContains,
                           @JsonProperty("needs") List<Need.Kind> needs) {
            if (first == null || first.isBlank()) throw new IllegalArgumentException("expect.first must name a rule id");
            this.first = first;
            this.callout = callout;
            this.textContains = textContains;
            this.needs = needs == null ? List.of() : List.copyOf(needs);
        }

        public Expectation(String first, CalloutPlan.CalloutKind callout, String textContains) {
            this(first, callout, textContains, null);
        }
    }
}
