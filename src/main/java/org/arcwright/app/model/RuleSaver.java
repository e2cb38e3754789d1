package org.arcwright.app.model;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * Saves a rule edited in the Practice editor. A rule of a team or personal pack is written back in
 * place, in its own file, beside the other rules of that file. A built-in rule lives in the jar and
 * cannot change, so it is saved as an override in the personal pack: the rule in its own file under
 * {@code rules/} and its id listed under {@code overrides} in the pack's {@code pack.json}, as pack
 * layering requires (DEVELOPERS.md, rules). A draft that does not read is never written.
 */
public final class RuleSaver {
    private final JsonFiles json;

    public RuleSaver(JsonFiles json) { this.json = Objects.requireNonNull(json, "json"); }

    /** Replaces rule {@code id} in {@code file} with the draft; returns the file written. */
    public Path saveInPlace(RuleDraft draft, String id, Path file) {
        JsonNode rule = checked(draft, id);
        JsonNode tree = json.readTree(file);
        if (!(tree.path("rules") instanceof ArrayNode)) {
            throw new InputProblem(file.toString(), 0, 0, "rules", "the file has no list of rules to save into");
        }
        ArrayNode rules = (ArrayNode) tree.path("rules");
        for (int i = 0; i < rules.size(); i++) {
            if (id.equals(rules.get(i).path("id").asText())) {
                rules.set(i, rule);
                AtomicFiles.writeString(file, pretty(tree));
                return file;
            }
        }
        throw new InputProblem(file.toString(), 0, 0, "rules", "no rule '" + id + "' in this file any more");
    }

    /**
     * Writes the draft of built-in rule {@code id} into {@code personalPack}'s {@code rules/} folder
     * and lists the id under the pack's overrides; returns the rule file written.
     */
    public Path saveOverride(RuleDraft draft, String id, Path personalPack) {
        JsonNode rule = checked(draft, id);
        Path manifest = personalPack.resolve("pack.json");
        if (!Files.isRegularFile(manifest)) {
            throw new InputProblem(manifest.toString(), 0, 0, null, "the personal pack has no pack.json");
        }
        ObjectNode pack = (ObjectNode) json.readTree(manifest);
        ArrayNode overrides = pack.path("overrides") instanceof ArrayNode ? (ArrayNode) pack.get("overrides")
                : pack.putArray("overrides");
        boolean listed = false;
        for (JsonNode o : overrides) listed |= id.equals(o.asText());
        Path file = overrideFile(personalPack, id);
        ObjectNode content = json.mapper().createObjectNode();
        content.putArray("rules").add(rule);
        // one transaction: the rule file and the manifest listing it are both saved, or neither
        java.util.LinkedHashMap<Path, AtomicFiles.Writer> writes = new java.util.LinkedHashMap<>();
        writes.put(file, utf8(pretty(content)));
        if (!listed) {
            overrides.add(id);
            writes.put(manifest, utf8(pretty(pack)));
        }
        AtomicFiles.writeAll(writes);
        return file;
    }

    /** Where the override of rule {@code id} goes in {@code personalPack}. */
    public static Path overrideFile(Path personalPack, String id) {
        return personalPack.resolve("rules").resolve("override-" + id + ".json");
    }

    private JsonNode checked(RuleDraft draft, String id) {
        if (draft.problem().isPresent()) throw draft.problem().get();
        if (!id.equals(draft.rule().orElseThrow().id())) {
            throw new InputProblem(null, 0, 0, "id", "the id changed from '" + id + "' to '"
                    + draft.rule().get().id() + "'; keep the id to save over this rule");
        }
        return json.parse(draft.text(), "rule", JsonNode.class);
    }

    private static AtomicFiles.Writer utf8(String text) {
        return out -> out.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    private String pretty(JsonNode tree) {
        try {
            return json.mapper().writerWithDefaultPrettyPrinter().writeValueAsString(tree) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
