package org.arcwright.worksheet;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Recommendation;

/**
 * One fillet, round or edge of the part.
 *
 * @param id short id on the drawing, e.g. {@code F3}
 * @param designCase what the engineer said about it
 * @param chosen the recommendation put on the drawing, or null while undecided
 * @param inspection the latest inspection of a measured contour, or null
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record RadiusFeature(String id, DesignCase designCase, Recommendation chosen, InspectionRecord inspection) {

    @JsonCreator
    public RadiusFeature(@JsonProperty(value = "id", required = true) String id,
                         @JsonProperty(value = "case", required = true) DesignCase designCase,
                         @JsonProperty("chosen") Recommendation chosen,
                         @JsonProperty("inspection") InspectionRecord inspection) {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("feature id must not be blank");
        if (designCase == null) throw new IllegalArgumentException("feature " + id + " needs a case");
        this.id = id.trim();
        this.designCase = designCase;
        this.chosen = chosen;
        this.inspection = inspection;
    }

    @JsonProperty("case")
    public DesignCase designCase() { return designCase; }

    /** Where the feature stands, derived from what it holds. */
    @JsonIgnore
    public Status status() {
        if (chosen == null) return Status.OPEN;
        if (inspection == null) return Status.DECIDED;
        if (inspection.undecided()) return Status.MEASURED_INDETERMINATE;
        return inspection.passed() ? Status.MEASURED_PASS : Status.MEASURED_FAIL;
    }

    public RadiusFeature withCase(DesignCase c) { return new RadiusFeature(id, c, null, inspection); }

    public RadiusFeature withChosen(Recommendation r) { return new RadiusFeature(id, designCase, r, inspection); }

    public RadiusFeature withInspection(InspectionRecord i) { return new RadiusFeature(id, designCase, chosen, i); }

    public RadiusFeature withId(String newId) { return new RadiusFeature(newId, designCase, chosen, inspection); }

    /** Progress of a feature from question to measured part. */
    public enum Status {
        /** No control chosen yet. */
        OPEN("open"),
        /** A control is chosen. */
        DECIDED("decided"),
        /** A measured contour conforms to the chosen control. */
        MEASURED_PASS("measured: pass"),
        /** A measured contour does not conform. */
        MEASURED_FAIL("measured: fail"),
        /** A measured contour was judged, but its uncertainty straddles a limit: neither proven. */
        MEASURED_INDETERMINATE("measured: indeterminate");

        private final String label;

        Status(String label) { this.label = label; }

        public String label() { return label; }
    }
}
