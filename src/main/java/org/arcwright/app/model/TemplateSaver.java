package org.arcwright.app.model;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
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
