package org.arcwright.app.model;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackLayer;
import org.arcwright.templates.NoteTemplate;
import org.arcwright.templates.NoteTemplates;

/**
 * Saves a drawing-note template edited in the Practice editor, the way rules are saved. A template
 * of a team or personal pack is written back to its own file. A built-in template lives in the jar
 * and cannot change, so it is saved as an override in the personal pack: a file of the same name in
 * its {@code templates/} folder, which replaces the built-in one because templates layer by file
 * name ({@code PackStack.files("templates", ".mustache")}, later layer wins; no {@code overrides}
 * entry, which lists rule ids only).
 *
 * <p>Nothing already saved is lost: a template that does not check is never written (the problem
 * names line and field, as a pack load would); a file changed on disk since it was opened is not
 * written over; an override never replaces a personal template the list did not show; every write
 * is atomic.
 *
 * <p>A new template starts as a draft ({@link #skeleton}) under a name no template in force has
 * ({@link #freshName}) and reaches the disk only when saved ({@link #saveNew}), in the personal
 * pack. {@link #remove} deletes a team or personal template's file; when it replaced a lower pack's
 * template of the same name, that one is in force again (a revert). The built-in pack is never written.
 */
public final class TemplateSaver {
    private TemplateSaver() {}

    /**
     * Writes {@code text} as template {@code e}: in place for a team or personal template, as an
     * override in {@code personalPack} for a built-in one. Returns the file written.
     *
     * @param asOpened the template's text when it was opened, to notice a change on disk since
     * @throws InputProblem when the text does not check or saving would lose something saved
     */
    public static Path save(TemplatePreview.Entry e, String text, String asOpened, Path personalPack) {
        Path target = e.layer() == PackLayer.BUILT_IN ? overrideFile(personalPack, e.name()) : e.file();
        NoteTemplate.compile(e.name(), text, target.toString(), e.pack());
        if (e.layer() == PackLayer.BUILT_IN) {
            Path manifest = personalPack.resolve("pack.json");
            if (!Files.isRegularFile(manifest)) {
                throw new InputProblem(manifest.toString(), 0, 0, null, "the personal pack has no pack.json; nothing was written");
            }
            if (Files.exists(target)) {
                throw new InputProblem(target.toString(), 0, 0, null, "your personal pack already has a template '" + e.name()
                        + "' that the list does not show yet; nothing was written: reload the packs and edit that one");
            }
        } else if (!Files.isRegularFile(target)) {
            throw new InputProblem(target.toString(), 0, 0, null,
                    "the file was moved or deleted since it was opened; nothing was written: reload the packs");
        } else if (!read(target).equals(asOpened)) {
            throw new InputProblem(target.toString(), 0, 0, null,
                    "the file changed on disk since it was opened; nothing was written: select the template again to see it");
        }
        AtomicFiles.writeString(target, text);
        return target;
    }

    /** The first name of the form {@code my-note-N} that is not in {@code taken}. */
    public static String freshName(Collection<String> taken) {
        for (int n = 1; ; n++) {
            String name = "my-note-" + n;
            if (!taken.contains(name)) return name;
        }
    }

    /** The text a new template starts from: a comment saying how it fills, and one per-feature line. */
    public static String skeleton() {
        return "{{! Filled once for each decided feature, because it names feature. Numbers arrive formatted: "
                + "place them, never add digits. }}\n"
                + "{{feature.id}} {{feature.label}}: {{feature.callout}}\n";
    }

    /**
     * Writes new template {@code name} into {@code personalPack}'s {@code templates/} folder.
     *
     * @param inForce the names of the templates in force: a new template may not take one (saving over
     *     a built-in one is an override, made by editing that template)
     * @throws InputProblem when the name is not usable or taken, the text does not check, or the file exists
     */
    public static Path saveNew(String name, String text, Path personalPack, Collection<String> inForce) {
        if (name == null || !name.matches("[a-z0-9][a-z0-9-]*")) {
            throw InputProblem.ofField("name", "a template name is lower-case letters, digits and hyphens, e.g. "
                    + "bench-note; got '" + name + "'");
        }
        if (inForce.contains(name)) {
            throw InputProblem.ofField("name", "a template '" + name + "' is in force already; choose another name, "
                    + "or edit that template");
        }
        Path target = overrideFile(personalPack, name);
        NoteTemplate.compile(name, text, target.toString(), "personal");
        Path manifest = personalPack.resolve("pack.json");
        if (!Files.isRegularFile(manifest)) {
            throw new InputProblem(manifest.toString(), 0, 0, null, "the personal pack has no pack.json; nothing was written");
        }
        if (Files.exists(target)) {
            throw new InputProblem(target.toString(), 0, 0, "name", "this file exists already and was not written over; "
                    + "choose another name");
        }
        AtomicFiles.writeString(target, text);
        return target;
    }

    /**
     * Deletes team or personal template {@code e}'s file, so that a lower pack's template of the same
     * name (if any) is in force again after a reload.
     *
     * @param asOpened the text when it was opened: a file changed on disk since is not deleted
     * @throws InputProblem for a built-in template, or a file moved or changed since it was opened
     */
    public static Path remove(TemplatePreview.Entry e, String asOpened) {
        if (e.layer() == PackLayer.BUILT_IN) {
            throw new InputProblem(e.file().toString(), 0, 0, null, "template '" + e.name()
                    + "' is built in and cannot be deleted");
        }
        Path target = e.file();
        if (!Files.isRegularFile(target)) {
            throw new InputProblem(target.toString(), 0, 0, null, "the file was moved or deleted since it was opened: reload the packs");
        }
        if (asOpened != null && !read(target).equals(asOpened)) {
            throw new InputProblem(target.toString(), 0, 0, null,
                    "the file changed on disk since it was opened; nothing was deleted: select the template again to see it");
        }
        try {
            Files.delete(target);
        } catch (IOException ex) {
            throw new UncheckedIOException("could not delete " + target + ": " + ex.getMessage(), ex);
        }
        return target;
    }

    /** Where the override of built-in template {@code name} goes in {@code personalPack}. */
    public static Path overrideFile(Path personalPack, String name) {
        return personalPack.resolve(NoteTemplates.FOLDER).resolve(name + NoteTemplates.EXTENSION);
    }

    private static String read(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException ex) {
            throw new UncheckedIOException("could not read " + file + ": " + ex.getMessage(), ex);
        }
    }
}
