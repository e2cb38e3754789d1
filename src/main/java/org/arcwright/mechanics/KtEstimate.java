package org.arcwright.mechanics;

/**
 * A theoretical stress-concentration factor and how far to trust it.
 *
 * @param kt K<sub>t</sub>, referred to the nominal stress in the smaller section
 * @param withinFit false when h/r lies outside the fit's range and the value is extrapolated
 * @param fitName the fit used, e.g. {@code "Peterson stepped shaft, bending"}
 * @param source the published source of the fit
 * @param stepHeight h = (D - d)/2, in the units of the geometry
 * @param hOverR h/r
 * @param twoHOverD 2h/D
 * @param message why the value is not within the fit, or empty
 */
public record KtEstimate(double kt, boolean withinFit, String fitName, String source, double stepHeight,
                         double hOverR, double twoHOverD, String message) {
    public KtEstimate {
        message = message == null ? "" : message;
    }
}
