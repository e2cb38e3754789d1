package org.arcwright.app.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.templates.NoteContext;
import org.arcwright.templates.NoteTemplate;
import org.arcwright.templates.NoteTemplates;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The drawing-note templates of the packs in force, and a template's text filled for the worksheet
 * as it is being edited: checked by the same compiler a pack load uses, so a problem here names the
 * line and field a sheet export would.
 */
public final class TemplatePreview {
    private TemplatePreview() {}

    /**
     * One template of the stack, after later layers replaced earlier ones of the same name.
     *
     * @param layer the layer of the pack that supplies it: a built-in one cannot be written back
     * @param replaces the name of the lower pack whose template of the same name this one replaces, or null
     */
    public record Entry(String name, String pack, Path file, PackLayer layer, String replaces) {
        public Entry(String name, String pack, Path file, PackLayer layer) { this(name, pack, file, layer, null); }

        /** True when deleting this template's file brings back a lower pack's template of the same name. */
        public boolean isOverride() { return replaces != null; }

        @Override
        public String toString() { return name + "   (" + pack + ")"; }
    }

    /**
     * The outcome of a fill: the note, or what is wrong with the template text.
     *
     * @param notice what the preview stands for when it is not the selected feature's note, or null
     */
    public record Result(String note, InputProblem problem, String notice) {
        public Result(String note, InputProblem problem) { this(note, problem, null); }

        public boolean ok() { return problem == null; }
    }

    /** The templates of {@code stack}, by name. */
    public static List<Entry> entries(PackStack stack) {
        Map<String, Entry> byName = new TreeMap<>();
        for (PackStack.PackFile f : stack.files(NoteTemplates.FOLDER, NoteTemplates.EXTENSION)) {
            String file = f.path().getFileName().toString();
            String name = file.substring(0, file.length() - NoteTemplates.EXTENSION.length());
            Entry lower = byName.get(name);
            byName.put(name, new Entry(name, f.pack().name(), f.path(), f.pack().layer(), lower == null ? null : lower.pack()));
        }
        return new ArrayList<>(byName.values());
    }

    /** The text of {@code e} as written in its pack. */
    public static String text(Entry e) {
        // PACK/templates/NAME.mustache: read only from inside PACK, as the CLI does
        return InputFiles.readPackText(e.file(), e.file().getParent().getParent());
    }

    /**
     * Fills {@code text} as template {@code e} for {@code worksheet}: a per-feature template for
     * {@code feature} (the selected one), a part template for the whole part. An undecided feature
     * gets no note, as in the sheet and {@code arcwright drawing-note}, which fill a per-feature
     * template for decided features only: the preview says so and shows the note of the first
     * decided feature instead, never a line with an empty callout.
     */
    public static Result fill(Entry e, String text, PartWorksheet worksheet, RadiusFeature feature) {
        try {
            NoteTemplate t = NoteTemplate.compile(e.name(), text, e.file().toString(), e.pack());
            NoteContext ctx = new NoteContext(worksheet, "Arcwright preview");
            if (!t.perFeature()) return new Result(t.fill(ctx.forPart()), null);
            if (feature == null) return new Result("Select a feature to see this per-feature note filled.", null);
            if (feature.chosen() != null) return new Result(t.fill(ctx.forFeature(feature)), null);
            String skipped = feature.id() + " has no callout chosen yet, so no note is filled for it (the sheet and "
                    + "arcwright drawing-note fill this template for decided features only)";
            for (RadiusFeature f : worksheet.features()) {
                if (f.chosen() != null) {
                    return new Result(t.fill(ctx.forFeature(f)), null, skipped + "; shown for " + f.id()
                            + ", the first decided feature.");
                }
            }
            return new Result("No callout chosen yet: no feature of this part has a note to fill.", null, skipped + ".");
        } catch (InputProblem p) {
            return new Result(null, p);
        } catch (RuntimeException ex) {
            return new Result(null, new InputProblem(e.file().toString(), 0, 0, null, String.valueOf(ex.getMessage())));
        }
    }
}
