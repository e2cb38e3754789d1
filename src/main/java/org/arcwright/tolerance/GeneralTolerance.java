package org.arcwright.tolerance;

import org.arcwright.io.DecimalText;

/**
 * One cell of a general-tolerance table: the ± value that the title block grants a size.
 *
 * @param tableId the table it came from
 * @param source the standard or company document the table reproduces
 * @param toleranceClass the class, e.g. {@code m}
 * @param quantity what the table applies to
 * @param size the size looked up (mm, or the shorter side for angles)
 * @param range the range that holds it, in the table's words
 * @param plusMinus the permissible deviation, ± (degrees for angles)
 */
public record GeneralTolerance(String tableId, String source, String toleranceClass, ToleranceQuantity quantity,
                               double size, String range, double plusMinus) {

    /** The deviation as a drawing would state it: mm as a number, angles in degrees and minutes. */
    public String formatted() {
        if (quantity != ToleranceQuantity.ANGULAR) {
            return "±" + DecimalText.exact(plusMinus);
        }
        int totalMinutes = (int) Math.round(plusMinus * 60);
        int deg = totalMinutes / 60;
        int min = totalMinutes % 60;
        return min == 0 ? "±" + deg + "°" : "±" + deg + "°" + min + "'";
    }
}
