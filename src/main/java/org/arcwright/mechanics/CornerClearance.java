package org.arcwright.mechanics;

import java.util.List;

/**
 * Whether the largest fillet lets the mating part seat flush, and the shoulder support left.
 *
 * @param input the case checked
 * @param seats true when the fillet at its largest stays within the mating corner's relief
 * @param allowedFilletMax the largest fillet the mating corner admits
 * @param margin allowedFilletMax - fillet max: room to spare (&ge; 0) or interference (&lt; 0)
 * @param governing which dimension of the mating corner limits the fillet, in words
 * @param reliefAlongSeat how far the relief reaches along the seat
 * @param reliefAlongShoulder how far the relief reaches up the shoulder face
 * @param support the flat left on the shoulder, or null when no shoulder height was given
 * @param notes remarks (table row used, conversions)
 * @param cautions {@link Cautions#CLEARANCE}
 */
public record CornerClearance(ClearanceCase input, boolean seats, double allowedFilletMax, double margin,
                              String governing, double reliefAlongSeat, double reliefAlongShoulder,
                              ShoulderSupport support, List<String> notes, List<String> cautions) {
    public CornerClearance {
        notes = List.copyOf(notes);
        cautions = List.copyOf(cautions);
    }

    /** True when the part seats and, where a support height was asked, the shoulder gives it. */
    public boolean passes() { return seats && (support == null || support.sufficient() == null || support.sufficient()); }

    /**
     * The shoulder face left to carry the mating part.
     *
     * @param contactFrom height where contact starts: above the fillet and the mating relief
     * @param contactTo height where it ends: the shoulder height less its edge break
     * @param flat contactTo - contactFrom (negative when nothing is left)
     * @param required the flat asked for, or null
     * @param sufficient flat &ge; required, or null when nothing was asked
     */
    public record ShoulderSupport(double contactFrom, double contactTo, double flat, Double required, Boolean sufficient) {}
}
