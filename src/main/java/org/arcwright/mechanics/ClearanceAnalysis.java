package org.arcwright.mechanics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.arcwright.io.DecimalText;

/**
 * Mating-corner clearance: does the largest fillet let the mating part seat flush against the
 * shoulder, by how much, and what flat is left on the shoulder to carry it. The condition is
 * derived in {@link MatingCorner}.
 */
public final class ClearanceAnalysis {
    private final BearingSeatTable bearingTable;
    private final BearingChamferLimits chamferLimits;

    /**
     * @param bearingTable the largest fillet for a {@link MatingCorner.Bearing}'s r<sub>s min</sub>
     * @param chamferLimits the ring's largest chamfer r<sub>s max</sub>, where the shoulder's support starts
     */
    public ClearanceAnalysis(BearingSeatTable bearingTable, BearingChamferLimits chamferLimits) {
        this.bearingTable = Objects.requireNonNull(bearingTable, "bearingTable");
        this.chamferLimits = Objects.requireNonNull(chamferLimits, "chamferLimits");
    }

    public CornerClearance check(ClearanceCase c) {
        Objects.requireNonNull(c, "case");
        List<String> notes = new ArrayList<>();
        double alongSeat;
        double alongShoulder;
        double supportFrom;
        double allowed;
        String governing;
        MatingCorner corner = c.corner();
        if (corner instanceof MatingCorner.Chamfer ch) {
            alongSeat = ch.alongSeat();
            alongShoulder = ch.alongShoulder();
            allowed = Math.min(alongSeat, alongShoulder);
            governing = alongSeat == alongShoulder ? "both legs of the chamfer (equal)"
                    : alongSeat < alongShoulder ? "the chamfer's leg along the seat" : "the chamfer's leg up the shoulder";
            supportFrom = alongShoulder;
        } else if (corner instanceof MatingCorner.Radius rad) {
            alongSeat = rad.min();
            alongShoulder = rad.min();
            allowed = rad.min();
            governing = "the mating radius at its minimum";
            supportFrom = alongShoulder;
        } else if (corner instanceof MatingCorner.Bearing b) {
            double perMm = c.units().millimetres();
            BearingSeatTable.Lookup found = bearingTable.lookup(b.chamferMin());
            if (!found.note().isEmpty()) notes.add(found.note());
            allowed = found.row().filletMax() / perMm;
            alongSeat = b.chamferMin() / perMm;
            alongShoulder = alongSeat;
            governing = String.format(Locale.ROOT, "the bearing-seat table (%s): r_s min %s mm admits fillets up to %s mm",
                    bearingTable.id(), DecimalText.exact(found.row().chamferMin()), DecimalText.exact(found.row().filletMax()));
            notes.add("source: " + bearingTable.source());
            // The ring's face starts beyond its chamfer, which may reach r_s max (radial), not r_s min.
            BearingChamferLimits.Lookup limit = chamferLimits.lookup(b.chamferMin(), b.bore());
            supportFrom = limit.row().radialMax() / perMm;
            notes.add("ring chamfer: the ring's face starts beyond its chamfer, which may reach r_s max; row used: "
                    + limit.row().describe() + " (" + chamferLimits.source() + ")");
            if (!limit.note().isEmpty()) notes.add(limit.note());
        } else {
            throw new IllegalStateException("unknown mating corner " + corner);
        }
        double margin = allowed - c.filletMax();
        boolean seats = margin >= -1e-12 * Math.max(1, allowed);
        CornerClearance.ShoulderSupport support = null;
        if (c.shoulderHeight() != null) {
            double from = Math.max(c.filletMax(), supportFrom);
            double to = c.shoulderHeight() - c.shoulderEdgeBreak();
            double flat = to - from;
            Boolean enough = c.requiredSupport() == null ? null : flat >= c.requiredSupport();
            support = new CornerClearance.ShoulderSupport(from, to, flat, c.requiredSupport(), enough);
            if (flat <= 0) notes.add("nothing of the shoulder face is left to carry the mating part");
        }
        return new CornerClearance(c, seats, allowed, margin, governing, alongSeat, alongShoulder, support, notes,
                Cautions.CLEARANCE);
    }
}
