package org.arcwright.mechanics;

import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * Where a value that is well formed but wrong (D &le; d, a radius larger than the step) stands in
 * its file, so that the problem is reported there: the JSON boundary ({@link JsonFiles#locate})
 * finds the field's value, or the object that should hold a missing field.
 */
final class FieldLocations {
    private final String source;
    private final String text;

    private FieldLocations(String source, String text) {
        this.source = source;
        this.text = text;
    }

    /** Locations of the fields in {@code text}; text that does not parse gives no locations. */
    static FieldLocations of(String source, String text) {
        return new FieldLocations(source, text);
    }

    /** The same problem, placed at its field's line and column in this file. */
    InputProblem locate(InputProblem p) {
        InputProblem here = new InputProblem(source, 0, 0, p.field(), p.problem(), p);
        return p.field() == null ? here : JsonFiles.locate(here, text);
    }
}
