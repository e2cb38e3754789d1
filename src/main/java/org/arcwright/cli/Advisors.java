package org.arcwright.cli;

import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.MechanicsChecks;
import org.arcwright.rules.NoteLinker;
import org.arcwright.rules.RuleBook;

/** Builds the advisor the commands use, with the collaborators available in this build. */
final class Advisors {
    private Advisors() {}

    /** Rules of {@code stack}, the mechanics checks; notes are linked once the notes store lands. */
    static Advisor standard(PackStack stack, RuleBook book) {
        return new Advisor(book, MechanicsChecks.standard(stack), NoteLinker.NONE);
    }
}
