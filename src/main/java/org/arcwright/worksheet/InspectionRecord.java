package org.arcwright.worksheet;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The outcome of inspecting one measured contour of a feature, kept with the worksheet.
 *
 * @param verdict {@code pass} or {@code fail}
 * @param source the points file or inspection file it came from
 * @param measuredOn ISO date of the measurement, or null
 * @param figures the key figures (envelope, required zone, fitted radius...)
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record InspectionRecord(String verdict, String source, String measuredOn, Map<String, Object> figures) {

    @JsonCreator
    public InspectionRecord(@JsonProperty(value = "verdict", required = true) String verdict,
                            @JsonProperty("source") String source,
                            @JsonProperty("measuredOn") String measuredOn,
                            @JsonProperty("figures") Map<String, Object> figures) {
        if (!"pass".equals(verdict) && !"fail".equals(verdict)) {
            throw new IllegalArgumentException("verdict must be pass or fail, got '" + verdict + "'");
        }
        this.verdict = verdict;
        this.source = source;
        this.measuredOn = measuredOn;
        this.figures = figures == null ? Map.of() : Collections.unmodifiableMap(new LinkedHashMap<>(figures));
    }

    public boolean passed() { return "pass".equals(verdict); }

    /**
     * What was judged and against what, for a status line: "measured: pass against CR 1.8-2.2 (mm),
     * 2026-11-20". A record written before verdicts named their callout says so, since a verdict
     * without its callout cannot be checked against the one now chosen.
     */
    public String describe() {
        Object callout = figures.get("callout"), units = figures.get("units");
        String against = callout == null ? " (the callout judged is not recorded)"
                : " against " + callout + (units == null ? "" : " (" + units + ")");
        return "measured: " + verdict + against + (measuredOn == null ? "" : ", " + measuredOn);
    }
}
