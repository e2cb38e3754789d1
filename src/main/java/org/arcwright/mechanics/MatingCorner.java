package org.arcwright.mechanics;

import java.util.Locale;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.Units;

/**
 * The corner of the part that seats against a shoulder: its relief is what room the fillet has.
 *
 * <p>Geometry (decision record 0802): the fillet is a quarter arc of radius R tangent to the seat
 * (the smaller diameter) and to the shoulder face; its material fills the corner out to R along
 * each face. The mating part's relief is a chamfer with legs along the seat and along the shoulder,
 * or a convex radius. The fillet's material region lies within the triangle of its two tangent
 * points and the corner, and the arc comes closest to a chamfer's hypotenuse at a tangent point (the
 * distance along the arc, A cos &psi; + B sin &psi;, is least at an end of [0, &pi;/2]). So for any
 * chamfer angle the part seats flush exactly when R<sub>max</sub> &le; the shorter leg; for a mating
 * radius, when R<sub>max</sub> &le; r<sub>m</sub> min (the relief regions are similar figures).
 */
public sealed interface MatingCorner permits MatingCorner.Chamfer, MatingCorner.Radius, MatingCorner.Bearing {

    /** Words for reports, e.g. {@code "chamfer 1.5 × 30°"}. */
    String describe();

    /**
     * Words for a report of a file in {@code fileUnits}: lengths as the file gives them. Chamfers and radii are held
     * in the file's units already; a bearing's are held in mm (its tables are metric) and are shown in both.
     */
    default String describe(Units fileUnits) {
        return describe();
    }

    /**
     * A chamfer on the mating part.
     *
     * @param leg its smallest leg along the seat (the mating part's bore or face that slides along d)
     * @param angleDeg its angle from the seat, degrees, 0 &lt; angle &lt; 90 (45 for an equal-leg chamfer)
     */
    record Chamfer(double leg, double angleDeg) implements MatingCorner {
        public Chamfer {
            StressConcentration.positive("mating.leg", leg);
            if (!Double.isFinite(angleDeg) || angleDeg <= 0 || angleDeg >= 90) {
                throw InputProblem.ofField("mating.angle", "must lie between 0 and 90 degrees (exclusive), got " + DecimalText.exact(angleDeg));
            }
        }

        /** The leg along the seat. */
        public double alongSeat() { return leg; }

        /** The leg up the shoulder face: leg × tan(angle). */
        public double alongShoulder() { return leg * Math.tan(Math.toRadians(angleDeg)); }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "chamfer %s × %s°", DecimalText.significant(leg, 4), DecimalText.significant(angleDeg, 4));
        }
    }

    /**
     * A convex radius on the mating part's corner.
     *
     * @param min its smallest allowed radius
     */
    record Radius(double min) implements MatingCorner {
        public Radius {
            StressConcentration.positive("mating.rMin", min);
        }

        @Override
        public String describe() { return "radius " + DecimalText.significant(min, 4) + " min"; }
    }

    /**
     * A rolling bearing's ring, known by its smallest chamfer dimension r<sub>s min</sub> (ISO 582);
     * the largest fillet comes from a {@link BearingSeatTable}, the largest chamfer r<sub>s max</sub>
     * from {@link BearingChamferLimits}. Both in mm whatever the file's units: bearing tables are
     * metric, so a file's inch values are converted where it is read.
     *
     * @param chamferMin r<sub>s min</sub> in mm
     * @param bore the ring's bore d in mm, or null when not given (the worst bore range is then used)
     */
    record Bearing(double chamferMin, Double bore) implements MatingCorner {
        public Bearing {
            StressConcentration.positive("mating.chamferMin", chamferMin);
            if (bore != null) StressConcentration.positive("mating.bore", bore);
        }

        /** A ring of unknown bore. */
        public Bearing(double chamferMin) {
            this(chamferMin, null);
        }

        @Override
        public String describe() {
            return "rolling-bearing ring, r_s min " + DecimalText.significant(chamferMin, 4) + " mm" + (bore == null ? "" : ", bore " + DecimalText.significant(bore, 4) + " mm");
        }

        /** In an inch file: {@code r_s min 0.06 in (1.524 mm)}, the inch value as converted back to 4 significant digits. */
        @Override
        public String describe(Units fileUnits) {
            if (fileUnits != Units.INCH) return describe();
            double per = fileUnits.millimetres();
            return "rolling-bearing ring, r_s min " + both(chamferMin, per) + (bore == null ? "" : ", bore " + both(bore, per));
        }

        private static String both(double mm, double perUnit) {
            return DecimalText.significant(mm / perUnit, 4) + " in (" + DecimalText.significant(mm, 4) + " mm)";
        }
    }

}
