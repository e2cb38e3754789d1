package org.arcwright.services;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.arcwright.mechanics.FilletMechanics;
import org.arcwright.notes.NotesStore;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.MechanicsChecks;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.NoteLinker;
import org.arcwright.rules.RuleBook;
import org.arcwright.templates.NoteTemplates;

/**
 * The practice in force: the packs layered (built-in, team, personal), the rule book read from
 * them, the mechanics data and checks, and the drawing-note templates. Loaded in one place so the
 * desktop and the command line advise from the same rules and write the same sheets.
 *
 * @param packs the packs in force, with what failed to open
 * @param book the rules after layering
 * @param mechanics the stress-concentration fits and tables of the packs
 * @param checks the mechanics checks the advisor applies
 * @param templates the drawing-note templates in force
 */
public record Practice(PackStack packs, RuleBook book, FilletMechanics mechanics, MechanicsChecks checks,
                       NoteTemplates templates) {
    public Practice {
        Objects.requireNonNull(packs, "packs");
        Objects.requireNonNull(book, "book");
        Objects.requireNonNull(mechanics, "mechanics");
        Objects.requireNonNull(checks, "checks");
        Objects.requireNonNull(templates, "templates");
    }

    /**
     * Loads the practice of {@code stack}.
     *
     * @throws org.arcwright.io.InputProblem when a pack's content cannot be read at all
     */
    public static Practice of(PackStack stack) {
        return new Practice(stack, RuleBook.load(stack), FilletMechanics.load(stack), MechanicsChecks.standard(stack),
                NoteTemplates.load(stack));
    }

    /**
     * Layers the built-in pack, {@code team} (lowest first) and {@code personal} (null for none),
     * then loads what they hold.
     */
    public static Practice load(List<Path> team, Path personal) {
        return of(PackStack.load(team, personal));
    }

    /** The same practice read again from the packs (after a rule or template was saved), keeping the mechanics. */
    public Practice reloaded(List<Path> team, Path personal) {
        PackStack stack = PackStack.load(team, personal);
        return new Practice(stack, RuleBook.load(stack), mechanics, checks, NoteTemplates.load(stack));
    }

    /** The advisor over these rules and checks, with notes linked by {@code linker}. */
    public Advisor advisor(NoteLinker linker) {
        return new Advisor(book, checks, linker);
    }

    /** The advisor with no notes linked. */
    public Advisor advisor() { return advisor(NoteLinker.NONE); }

    /** Links recommendations to the notes of {@code store}: the one adapter both shells use. */
    public static NoteLinker linker(NotesStore store) {
        Objects.requireNonNull(store, "store");
        return (tags, text, limit) -> store.related(tags, text, limit).stream()
                .map(h -> new NoteLink(h.id(), h.title(), h.pack())).toList();
    }
}
