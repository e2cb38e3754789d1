package org.arcwright.app.model;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Objects;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackLayer;
import org.arcwright.rules.RuleBook;

/**
 * Saves a rule edited in the Practice editor. A rule of a team or personal pack is written back in
 * place, in its own file, beside the other rules of that file. A built-in rule lives in the jar and
 * cannot change, so it is saved as an override in the personal pack: the rule in its own file under
 * {@code rules/} and its id listed under {@code overrides} in the pack's {@code pack.json}, as pack
 * layering requires (DEVELOPERS.md, rules). A draft that does not read is never written.
 *
 * <p>A new rule starts as a draft that reads ({@link #skeleton}) with an id no rule in force has
 * ({@link #freshId}); it reaches the disk only when saved ({@link #saveNew}), in its own file in the
 * personal pack, so a half-written rule never advises. {@link #remove} takes a team or personal
 * rule out of its file: a rule that overrides a lower one is thereby reverted to it. The built-in
 * pack is never written.
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
        LinkedHashMap<Path, AtomicFiles.Writer> writes = new LinkedHashMap<>();
        writes.put(file, utf8(pretty(content)));
        if (!listed) {
            overrides.add(id);
            writes.put(manifest, utf8(pretty(pack)));
        }
        AtomicFiles.writeAll(writes);
        return file;
    }

    /** The first id of the form {@code my.rule-N} that is not in {@code taken}. */
    public static String freshId(Collection<String> taken) {
        for (int n = 1; ; n++) {
            String id = "my.rule-" + n;
            if (!taken.contains(id)) return id;
        }
    }

    /**
     * The text a new rule starts from: every field a lead engineer fills, with words saying what
     * goes there, conditions that fire only on the case it names and the lowest ordinary weight.
     * It reads as it is, so the form opens on a rule, not on an error.
     */
    public static String skeleton(String id) {
        return "{\n"
                + "  \"id\" : \"" + id + "\",\n"
                + "  \"summary\" : \"Say in one line what this rule recommends, and for which corners\",\n"
                + "  \"when\" : {\n    \"function\" : \"cosmetic\",\n    \"kind\" : \"round\"\n  },\n"
                + "  \"recommend\" : {\n    \"callout\" : \"radius\",\n    \"size\" : {\n      \"basis\" : \"capability\"\n    }\n  },\n"
                + "  \"weight\" : 50,\n"
                + "  \"because\" : [ \"Say why, in the words you would use with a colleague.\" ],\n"
                + "  \"cautions\" : [ ],\n"
                + "  \"references\" : [ \"common practice\" ],\n"
                + "  \"noteTags\" : [ ],\n"
                + "  \"examples\" : [ ]\n"
                + "}";
    }

    /** Where a new rule {@code id} is written in {@code personalPack}. */
    public static Path newRuleFile(Path personalPack, String id) {
        return personalPack.resolve("rules").resolve(id + ".json");
    }

    /**
     * Writes a new rule into its own file in {@code personalPack}'s {@code rules/} folder.
     *
     * @param inForce the ids of the rules in force: a new rule may not take one (that would be an override)
     * @throws InputProblem when the draft does not read, its id is taken or its file exists already
     */
    public Path saveNew(RuleDraft draft, Path personalPack, Collection<String> inForce) {
        if (draft.problem().isPresent()) throw draft.problem().get();
        String id = draft.rule().orElseThrow().id();
        if (inForce.contains(id)) {
            throw InputProblem.ofField("id", "a rule '" + id + "' is in force already; give the new rule an id of its own, "
                    + "or edit that rule to change it");
        }
        Path manifest = personalPack.resolve("pack.json");
        if (!Files.isRegularFile(manifest)) {
            throw new InputProblem(manifest.toString(), 0, 0, null, "the personal pack has no pack.json; nothing was written");
        }
        Path file = newRuleFile(personalPack, id);
        if (Files.exists(file)) {
            throw new InputProblem(file.toString(), 0, 0, "id", "this file exists already and was not written over; "
                    + "give the new rule another id");
        }
        ObjectNode content = json.mapper().createObjectNode();
        content.putArray("rules").add(json.parse(draft.text(), "rule", JsonNode.class));
        AtomicFiles.writeString(file, pretty(content));
        return file;
    }

    /**
     * Takes team or personal rule {@code e} out of its pack: out of its file (the file goes when it
     * holds no other rule), then out of the pack's {@code overrides}. When the rule overrode a lower
     * one, that one is in force again after a reload. Each file is replaced atomically; should the
     * second write fail, the manifest lists an override with nothing behind it, which loads as before.
     *
     * @return the rule file changed or removed
     * @throws InputProblem for a built-in rule, or when the file no longer holds the rule
     */
    public Path remove(RuleBook.Entry e) {
        String id = e.rule().id();
        if (e.layer() == PackLayer.BUILT_IN) {
            throw new InputProblem(e.file(), 0, 0, "id", "rule '" + id + "' is built in and cannot be deleted; "
                    + "list its id under \"disables\" in a pack's pack.json to switch it off");
        }
        Path file = Path.of(e.file());
        Path manifest = file.getParent().getParent().resolve("pack.json");
        JsonNode tree = json.readTree(file);
        if (!(tree.path("rules") instanceof ArrayNode)) {
            throw new InputProblem(file.toString(), 0, 0, "rules", "the file has no list of rules; nothing was deleted");
        }
        ArrayNode rules = (ArrayNode) tree.path("rules");
        int at = -1;
        for (int i = 0; i < rules.size(); i++) if (id.equals(rules.get(i).path("id").asText())) at = i;
        if (at < 0) throw new InputProblem(file.toString(), 0, 0, "rules", "no rule '" + id + "' in this file any more");
        rules.remove(at);
        if (rules.isEmpty()) {
            try {
                Files.delete(file);
            } catch (IOException ex) {
                throw new UncheckedIOException("could not delete " + file + ": " + ex.getMessage(), ex);
            }
        } else {
            AtomicFiles.writeString(file, pretty(tree));
        }
        if (Files.isRegularFile(manifest) && json.readTree(manifest) instanceof ObjectNode pack
                && pack.path("overrides") instanceof ArrayNode overrides) {
            boolean listed = false;
            for (int i = overrides.size() - 1; i >= 0; i--) {
                if (id.equals(overrides.get(i).asText())) {
                    overrides.remove(i);
                    listed = true;
                }
            }
            if (listed) AtomicFiles.writeString(manifest, pretty(pack));
        }
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
        return out -> out.write(text.getBytes(StandardCharsets.UTF_8));
    }

    private String pretty(JsonNode tree) {
        try {
            return json.mapper().writerWithDefaultPrettyPrinter().writeValueAsString(tree) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
