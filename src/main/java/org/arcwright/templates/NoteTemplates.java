package org.arcwright.templates;

import java.io.IOException;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The drawing-note templates in force: the {@code templates/*.mustache} files of every pack, a
 * later layer replacing an earlier one's template of the same file name. Every template is checked
 * when loaded, so a bad one fails before any sheet is made.
 */
public final class NoteTemplates {
    /** The folder of a pack that holds templates. */
    public static final String FOLDER = "templates";
    /** The extension of template files. */
    public static final String EXTENSION = ".mustache";

    private final Map<String, NoteTemplate> byName;

    public NoteTemplates(List<NoteTemplate> templates) {
        Map<String, NoteTemplate> m = new TreeMap<>();
        for (NoteTemplate t : templates) m.put(t.name(), t);
        this.byName = Collections.unmodifiableMap(m);
    }

    /** Loads and checks every template of the stack; the first bad one throws. */
    public static NoteTemplates load(PackStack stack) {
        List<NoteTemplate> out = new ArrayList<>();
        for (PackStack.PackFile f : stack.files(FOLDER, EXTENSION)) {
            String file = f.path().getFileName().toString();
            String name = file.substring(0, file.length() - EXTENSION.length());
            String text;
            text = InputFiles.readPackText(f.path(), f.pack().root());
            out.add(NoteTemplate.compile(name, text, f.path().toString(), f.pack().name()));
        }
        return new NoteTemplates(out);
    }

    /** Template names, sorted. */
    public List<String> names() { return List.copyOf(byName.keySet()); }

    public Optional<NoteTemplate> find(String name) { return Optional.ofNullable(byName.get(name)); }

    /** The template {@code name}, or an input problem listing the names there are. */
    public NoteTemplate require(String name) {
        NoteTemplate t = byName.get(name);
        if (t == null) {
            throw InputProblem.ofField("template", "no template named '" + name + "'; there are: "
                    + String.join(", ", byName.keySet()));
        }
        return t;
    }

    /**
     * Fills a template for a part: once for a part-level template; once per decided feature
     * (blocks separated by a blank line) for a per-feature one, or for {@code featureId} alone.
     *
     * @param featureId a feature to fill a per-feature template for, or null for every decided one
     */
    public String fill(String name, PartWorksheet worksheet, String featureId, String generatedBy) {
        NoteTemplate t = require(name);
        NoteContext ctx = new NoteContext(worksheet, generatedBy);
        if (!t.perFeature()) return t.fill(ctx.forPart());
        List<String> blocks = new ArrayList<>();
        for (RadiusFeature f : worksheet.features()) {
            if (featureId != null && f.id().equals(featureId) && f.chosen() == null) {
                // the same rule as for the whole part: a per-feature note is filled for decided features only
                throw InputProblem.ofField("feature", f.id() + " has no callout chosen yet, so there is no note to fill: "
                        + "decide it first (arcwright advise, or the Decide view)");
            }
            if (featureId != null ? f.id().equals(featureId) : f.chosen() != null) {
                blocks.add(t.fill(ctx.forFeature(f)).strip());
            }
        }
        if (featureId != null && blocks.isEmpty()) {
            throw InputProblem.ofField("feature", "no feature '" + featureId + "' in part " + worksheet.part().number());
        }
        return String.join("\n\n", blocks) + (blocks.isEmpty() ? "" : "\n");
    }
}
