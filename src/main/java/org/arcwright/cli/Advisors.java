package org.arcwright.cli;

import org.arcwright.rules.Advisor;
import org.arcwright.rules.FilletChecks;
import org.arcwright.rules.NoteLinker;
import org.arcwright.rules.RuleBook;

/** Builds the advisor the commands use, with the collaborators available in this build. */
final class Advisors {
    private Advisors() {}

    static Advisor standard(RuleBook book) {
        return new Advisor(book, FilletChecks.NONE, NoteLinker.NONE);
    }
}
