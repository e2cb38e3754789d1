package org.arcwright.render;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.nio.file.Path;
import org.arcwright.callout.Callout;
import org.arcwright.io.JsonFiles;
import org.arcwright.templates.CalloutText;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * What to draw: a callout with the units and drawing standard it is written in. The file form is
 * {@code {"units": "mm", "standard": "asme", "callout": {"type": "profile", "zone": 0.1, ...}}},
 * with the advisor's {@code callout} object as it is.
 */
public record RenderRequest(Units units, DrawingStyle standard, Callout callout) {

    @JsonCreator
    public RenderRequest(@JsonProperty(value = "units", required = true) Units units,
                         @JsonProperty(value = "standard", required = true) DrawingStyle standard,
                         @JsonProperty(value = "callout", required = true) Callout callout) {
        if (units == null) throw new IllegalArgumentException("units is null; use mm or in");
        if (standard == null) throw new IllegalArgumentException("standard is null; use asme or iso");
        if (callout == null) throw new IllegalArgumentException("callout is null; give the callout to draw");
        this.units = units;
        this.standard = standard;
        this.callout = callout;
        if (callout instanceof Callout.Profile p && standard != null) CalloutText.checkMarks(p, standard);
    }

    /** Reads a request file; errors name file, line, column and field. */
    public static RenderRequest read(Path file, JsonFiles json) {
        return json.read(file, RenderRequest.class);
    }
}
