package org.arcwright.mechanics;

import java.util.List;

/** The cautions every mechanics result carries; the shells print them with the numbers. */
public final class Cautions {
    private Cautions() {}

    /** With every stress-concentration or notch-sensitivity figure. */
    public static final List<String> STRESS = List.of(
            "Handbook estimates for design guidance only (Peterson's curve fits, Neuber/Shigley notch sensitivity for steels).",
            "Fatigue-critical parts need analysis or test to the governing code and a licensed engineer's judgement; "
                    + "defer to the governing standard and your company's practice.");

    /** With every mating-corner or bearing-seat check. */
    public static final List<String> CLEARANCE = List.of(
            "Nominal geometry only: check the mating part's drawing or the bearing maker's data for its own chamfer limits, "
                    + "and allow for form error, coating and burrs.",
            "Defer to the governing standard, your company's practice and licensed engineering judgement.");
}
