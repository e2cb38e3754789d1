package org.arcwright.app.model;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.rules.Rule;

/**
 * A rule being edited in the Practice editor: its JSON text as typed, and what is wrong with it,
 * found by the same reader the advisor loads packs with (so a message here is the message a pack
 * load would give, with line, column and field).
 */
public final class RuleDraft {
    private final JsonFiles json;
    private final String source;
    private String text;
    private InputProblem problem;
    private Rule rule;

    public RuleDraft(JsonFiles json, String source, String text) {
        this.json = Objects.requireNonNull(json, "json");
        this.source = source;
        setText(text);
    }

    /**
     * A draft of rule {@code id} as written in its pack file {@code file}: the rule's own JSON object,
     * re-indented, so the editor shows what the lead engineer wrote rather than a re-serialisation.
     */
    public static RuleDraft fromFile(JsonFiles json, Path file, String id) {
        JsonNode tree = json.readTree(file);
        for (JsonNode r : tree.path("rules")) {
            if (id.equals(r.path("id").asText())) {
                try {
                    return new RuleDraft(json, file.toString(), json.mapper().writerWithDefaultPrettyPrinter().writeValueAsString(r));
                } catch (JsonProcessingException e) {
                    throw new IllegalStateException(e);
                }
            }
        }
        throw new InputProblem(file.toString(), 0, 0, "rules", "no rule '" + id + "' in this file");
    }

    public String text() { return text; }

    public void setText(String t) {
        text = t == null ? "" : t;
        try {
            rule = json.parse(text, source, Rule.class);
            problem = null;
        } catch (InputProblem p) {
            rule = null;
            problem = p;
        } catch (IllegalArgumentException e) {
            rule = null;
            problem = new InputProblem(source, 0, 0, null, e.getMessage());
        }
    }

    /** What is wrong, with line and column where the reader knows them; empty when the rule reads. */
    public Optional<InputProblem> problem() { return Optional.ofNullable(problem); }

    /** The rule the text makes, when it reads. */
    public Optional<Rule> rule() { return Optional.ofNullable(rule); }
}
