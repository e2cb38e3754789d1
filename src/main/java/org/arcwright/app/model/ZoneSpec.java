package org.arcwright.app.model;

import java.util.Optional;
import org.arcwright.callout.Callout;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.RadiusKind;

/**
 * What the Zone view draws for one feature: the nominal blend at its corner and the zone its control
 * allows, either limit arcs (R, CR) or a band about the nominal contour (profile of a surface).
 */
public sealed interface ZoneSpec {
    double nominal();

    double angleDeg();

    BlendKind kind();

    /**
     * A starting magnification for this zone: the largest of 1, 2, 3, 5, 10, 20, 30, 50, 100 at which
     * the magnified zone is no wider than 60 % of the nominal radius, so the limit arcs keep their
     * shape (a CR 1.8-2.2 on R2 drawn ×10 would shrink its smaller arc to the sharp corner) while a
     * narrow profile zone is still visible.
     */
    default double suggestedMagnification() {
        double width;
        if (this instanceof LimitArcs) {
            LimitArcs a = (LimitArcs) this;
            width = Math.max(a.max() - nominal(), 0) + Math.max(nominal() - a.min(), 0);
        } else if (this instanceof Band) {
            width = ((Band) this).zone();
        } else {
            return 1;
        }
        if (!(width > 0) || !(nominal() > 0)) return 1;
        double best = 1;
        for (double m : new double[] {2, 3, 5, 10, 20, 30, 50, 100}) if (m * width <= 0.6 * nominal() * (1 + 1e-9)) best = m;
        return best;
    }

    /** Limit arcs of a radius tolerance. {@code min} may be 0 for a MAX-only radius. */
    record LimitArcs(double nominal, double min, double max, double angleDeg, BlendKind kind, boolean controlled)
            implements ZoneSpec {}

    /**
     * A profile band about the nominal contour.
     *
     * @param zone total width
     * @param outward the part of the zone on the add-material side
     */
    record Band(double nominal, double zone, double outward, double angleDeg, BlendKind kind) implements ZoneSpec {}

    /** The nominal alone: no tolerance known yet. */
    record NominalOnly(double nominal, double angleDeg, BlendKind kind) implements ZoneSpec {}

    /**
     * The zone of {@code callout} for {@code c}; a general tolerance or an open callout falls back on
     * the tolerance intent of the case, else the nominal alone.
     */
    static ZoneSpec of(DesignCase c, Callout callout, double angleDeg) {
        double nom = c.nominalRadius();
        if (callout instanceof Callout.Radius r) {
            return new LimitArcs(r.nominal() == null ? (r.min() + r.max()) / 2 : r.nominal(), r.min(), r.max(), angleDeg,
                    c.kind(), false);
        }
        if (callout instanceof Callout.ControlledRadius r) {
            return new LimitArcs(r.nominal() == null ? (r.min() + r.max()) / 2 : r.nominal(), r.min(), r.max(), angleDeg,
                    c.kind(), true);
        }
        if (callout instanceof Callout.Profile p) {
            double out = p.outward() == null ? p.zone() / 2 : p.outward();
            return new Band(nom, p.zone(), out, angleDeg, c.kind());
        }
        if (callout instanceof Callout.CompositeProfile cp) {
            double z = cp.tiers().get(0).zone();
            return new Band(nom, z, z / 2, angleDeg, c.kind());
        }
        return ofIntent(c, angleDeg);
    }

    /** The zone of the case's tolerance intent, or the nominal alone. */
    static ZoneSpec ofIntent(DesignCase c, double angleDeg) {
        Optional<RadiusCallout> rc = Optional.empty();
        if (c.tolerance() != null) {
            try {
                rc = Optional.of(CalloutParser.parse(c.tolerance(), c.units()));
            } catch (RuntimeException e) {
                rc = Optional.empty();
            }
        }
        if (rc.isPresent() && rc.get().max().isPresent()) {
            RadiusCallout r = rc.get();
            double min = r.min().orElse(0);
            double max = r.max().getAsDouble();
            double nom = Math.min(Math.max(r.nominalOrMean(), min), max);
            return new LimitArcs(nom, min, max, angleDeg, c.kind(), r.kind() == RadiusKind.CR);
        }
        return new NominalOnly(c.nominalRadius(), angleDeg, c.kind());
    }
}
