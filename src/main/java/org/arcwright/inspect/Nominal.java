package org.arcwright.inspect;

import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;

/** The nominal shape of the section: a blended corner (the common case) or a general chain. */
public sealed interface Nominal {
    /**
     * A corner with a blend of the nominal radius tangent to both legs.
     *
     * @param corner the adjacent surfaces
     * @param radius nominal radius, > 0
     */
    record CornerBlend(Corner corner, double radius) implements Nominal {
        public CornerBlend {
            if (corner == null) throw InputProblem.ofField("corner", "missing");
            if (!Double.isFinite(radius) || radius <= 0) throw InputProblem.ofField("nominalRadius", "must be above zero, got " + DecimalText.exact(radius));
        }
    }

    /** A general chain of lines and arcs (profile callouts only). */
    record Chain(Contour contour) implements Nominal {
        public Chain {
            if (contour == null) throw InputProblem.ofField("contour", "missing");
        }
    }
}
