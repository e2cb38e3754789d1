package org.arcwright.callout;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;

/**
 * One tier (segment) of a composite profile frame.
 *
 * @param zone total zone width, > 0
 * @param datums datum references of this tier; the lower tiers of an ASME composite frame repeat
 *     some of the upper tier's datums in the same order and control orientation only (ASME
 *     Y14.5-2018 composite profile, from memory)
 */
public record ProfileTier(double zone, List<DatumReference> datums) {

    @JsonCreator
    public ProfileTier(@JsonProperty(value = "zone", required = true) double zone,
                       @JsonProperty("datums") List<DatumReference> datums) {
        Callout.requirePositive("zone", zone);
        this.zone = zone;
        this.datums = datums == null ? List.of() : List.copyOf(datums);
    }
}
