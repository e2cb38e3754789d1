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
 * @param verdict {@code pass}, {@code fail} or {@code indeterminate}: the ISO 14253-1 default decision
 *     rule proves neither conformance nor non-conformance when the measurement uncertainty straddles a
 *     limit, and a kept record must not turn that into either
 * @param source the points file or inspection file it came from
 * @param measuredOn ISO date of the measurement, or null
 * @param figures the key figures (envelope, required zone, fitted radius...)
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record InspectionRecord(String verdict, String source, String measuredOn, Map<String, Object> figures) {

    /** The word kept for a verdict that the data could not decide. */
    public static final String INDETERMINATE = "indeterminate";

    @JsonCreator
    public InspectionRecord(@JsonProperty(value = "verdict", required = true) String verdict,
                            @JsonProperty("source") String source,
                            @JsonProperty("measuredOn") String measuredOn,
                            @JsonProperty("figures") Map<String, Object> figures) {
        if (!"pass".equals(verdict) && !"fail".equals(verdict) && !INDETERMINATE.equals(verdict)) {
            throw new IllegalArgumentException("verdict must be pass, fail or indeterminate, got '" + verdict + "'");
        }
        this.verdict = verdict;
        this.source = source;
        this.measuredOn = measuredOn;
        this.figures = figures == null ? Map.of() : Collections.unmodifiableMap(new LinkedHashMap<>(figures));
    }

    public boolean passed() { return "pass".equals(verdict); }

    /** Whether the measurement decided nothing: neither conformance nor non-conformance is proven. */
    public boolean undecided() { return INDETERMINATE.equals(verdict); }

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
