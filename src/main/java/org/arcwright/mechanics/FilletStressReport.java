package org.arcwright.mechanics;

import java.util.List;

/**
 * The stress concentration a radius tolerance allows: K<sub>t</sub> (and K<sub>f</sub>) at the
 * smallest, nominal and largest radius, and what the smallest costs against the nominal.
 *
 * @param input the case assessed
 * @param atMin at the smallest radius: the one that governs strength
 * @param atNominal at the nominal radius
 * @param atMax at the largest radius
 * @param ktCostOfMinimum K<sub>t</sub>(r min) - K<sub>t</sub>(nominal), &ge; 0 for a sound fit
 * @param kfCostOfMinimum K<sub>f</sub>(r min) - K<sub>f</sub>(nominal), or null without a strength
 * @param notes every extrapolation and clamp, in words
 * @param cautions {@link Cautions#STRESS}
 */
public record FilletStressReport(FilletStressCase input, StressPoint atMin, StressPoint atNominal, StressPoint atMax,
                                 double ktCostOfMinimum, Double kfCostOfMinimum, List<String> notes,
                                 List<String> cautions) {
    public FilletStressReport {
        notes = List.copyOf(notes);
        cautions = List.copyOf(cautions);
    }

    /** True when all three points lie within the fits. */
    public boolean withinFit() { return atMin.withinFit() && atNominal.withinFit() && atMax.withinFit(); }

    /** The cost of the minimum as a percentage of the nominal factor (K<sub>f</sub> when known). */
    public double costPercent() {
        double nominal = atNominal.governing();
        return 100 * (atMin.governing() - nominal) / nominal;
    }
}
