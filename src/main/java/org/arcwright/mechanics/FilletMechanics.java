package org.arcwright.mechanics;

import java.util.Objects;
import org.arcwright.pack.PackStack;

/**
 * The mechanics services wired together, for callers (the advisor, the shells) that want all of
 * them: built from a fit catalogue and a bearing-seat table, or from the packs in force.
 */
public final class FilletMechanics {
    private final StressConcentration stressConcentration;
    private final NotchSensitivity notchSensitivity;
    private final FilletStressAnalysis stressAnalysis;
    private final ClearanceAnalysis clearance;

    public FilletMechanics(PetersonFits fits, BearingSeatTable bearingTable, BearingChamferLimits chamferLimits) {
        this.stressConcentration = new StressConcentration(Objects.requireNonNull(fits, "fits"));
        this.notchSensitivity = new NotchSensitivity();
        this.stressAnalysis = new FilletStressAnalysis(stressConcentration, notchSensitivity);
        this.clearance = new ClearanceAnalysis(bearingTable, chamferLimits);
    }

    /** The published fits and the bearing tables (seat fillet, ring chamfer limits) of the packs in force. */
    public static FilletMechanics load(PackStack stack) {
        return new FilletMechanics(PetersonFits.published(), BearingSeatTable.load(stack, BearingSeatTable.BUILT_IN_ID),
                BearingChamferLimits.load(stack, BearingChamferLimits.BUILT_IN_ID));
    }

    public StressConcentration stressConcentration() { return stressConcentration; }

    public NotchSensitivity notchSensitivity() { return notchSensitivity; }

    public FilletStressAnalysis stressAnalysis() { return stressAnalysis; }

    public ClearanceAnalysis clearance() { return clearance; }
}
