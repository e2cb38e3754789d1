package org.arcwright.simulate;

import org.arcwright.inspect.InspectionResult;

/** What an inspection said of one simulated section. */
public enum Verdict {
    ACCEPTED,
    REJECTED,
    /** No verdict could be given (the engine said so, or the section could not be judged): not accepted. */
    INDETERMINATE;

    /** The verdict of an inspection result. */
    static Verdict of(InspectionResult r) {
        switch (r.verdict()) {
            case PASS: return ACCEPTED;
            case INDETERMINATE: return INDETERMINATE;
            default: return REJECTED;
        }
    }
}
