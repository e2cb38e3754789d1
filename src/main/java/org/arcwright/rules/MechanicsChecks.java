package org.arcwright.rules;

import org.arcwright.mechanics.BearingChamferLimits;
import org.arcwright.model.DesignCase;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.mechanics.BearingSeatTable;
import org.arcwright.mechanics.Cautions;
import org.arcwright.mechanics.ClearanceAnalysis;
import org.arcwright.mechanics.ClearanceCase;
import org.arcwright.mechanics.CornerClearance;
import org.arcwright.mechanics.FilletStressAnalysis;
import org.arcwright.mechanics.FilletStressCase;
import org.arcwright.mechanics.FilletStressReport;
import org.arcwright.mechanics.LoadCase;
import org.arcwright.mechanics.MatingCorner;
import org.arcwright.mechanics.MinimumRadius;
import org.arcwright.mechanics.NotchSensitivity;
import org.arcwright.mechanics.PetersonFits;
import org.arcwright.mechanics.ShoulderShape;
import org.arcwright.mechanics.StressConcentration;
import org.arcwright.mechanics.StressTarget;
import org.arcwright.mechanics.UltimateStrength;
import org.arcwright.pack.PackStack;

/**
 * The advisor's checks over {@code org.arcwright.mechanics}: Peterson's fits for K<sub>t</sub>,
 * Neuber/Shigley notch sensitivity for K<sub>f</sub>, the minimum-radius search, and the
 * mating-corner clearance. This class only translates the case; every figure is the mechanics
 * package's.
 */
public final class MechanicsChecks implements FilletChecks {
    private final FilletStressAnalysis stress;
    private final ClearanceAnalysis clearance;

    public MechanicsChecks(FilletStressAnalysis stress, ClearanceAnalysis clearance) {
        this.stress = Objects.requireNonNull(stress, "stress");
        this.clearance = Objects.requireNonNull(clearance, "clearance");
    }

    /** The published fits and the bearing-seat table of the packs in force. */
    public static MechanicsChecks standard(PackStack stack) {
        return new MechanicsChecks(
                new FilletStressAnalysis(new StressConcentration(PetersonFits.published()), new NotchSensitivity()),
                new ClearanceAnalysis(BearingSeatTable.load(stack, BearingSeatTable.BUILT_IN_ID),
                        BearingChamferLimits.load(stack, BearingChamferLimits.BUILT_IN_ID)));
    }

    @Override
    public Optional<StressFigures> stress(DesignCase c, double rMin, double rMax) {
        DesignCase.StressInputs s = c.stress();
        if (s == null) return Optional.empty();
        double h = (s.bigD() - s.smallD()) / 2;
        List<String> notes = new ArrayList<>();
        if (rMin > h) {
            notes.add("the smallest radius " + Advisor.plain(rMin) + " exceeds the step height h = " + Advisor.plain(h)
                    + ": the fillet cannot be tangent to the shoulder face, so no Kt is given");
            return Optional.of(new StressFigures(Double.NaN, Double.NaN, null, null, false, "none", notes));
        }
        double top = rMax;
        if (rMax > h) {
            notes.add("the largest radius " + Advisor.plain(rMax) + " exceeds the step height h = " + Advisor.plain(h)
                    + "; Kt at the maximum is taken at h");
            top = h;
        }
        FilletStressReport r = stress.report(FilletStressCase.ofLimits(shape(s), load(s), c.units(), s.bigD(), s.smallD(),
                rMin, top, strength(s)));
        notes.addAll(r.notes());
        String method = r.atMin().kt().fitName() + " (" + r.atMin().kt().source() + ")";
        return Optional.of(new StressFigures(r.atMin().kt().kt(), r.atMax().kt().kt(), r.atMin().kf(), r.atMax().kf(),
                r.withinFit() && top == rMax, method, notes));
    }

    /** The governing floor of {@link #minimumRadii}: the largest radius any target asks for, or the first unmet one. */
    @Override
    public Optional<MinimumRadiusFigure> minimumRadius(DesignCase c) {
        List<MinimumRadiusFigure> all = minimumRadii(c);
        MinimumRadiusFigure best = null;
        for (MinimumRadiusFigure m : all) {
            if (!m.found()) return Optional.of(m);
            if (best == null || m.radius() > best.radius()) best = m;
        }
        return Optional.ofNullable(best);
    }

    /**
     * One floor per target the case states: {@code targetKt} is always a K<sub>t</sub> target (geometry only),
     * {@code targetKf} a K<sub>f</sub> target through the notch sensitivity of the stated strength.
     */
    @Override
    public List<MinimumRadiusFigure> minimumRadii(DesignCase c) {
        DesignCase.StressInputs s = c.stress();
        if (s == null) return List.of();
        List<MinimumRadiusFigure> out = new ArrayList<>(2);
        if (s.targetKt() != null) out.add(floor(c, s, "Kt", s.targetKt()));
        if (s.targetKf() != null) out.add(floor(c, s, "Kf", s.targetKf()));
        return out;
    }

    private MinimumRadiusFigure floor(DesignCase c, DesignCase.StressInputs s, String factor, double value) {
        if (value <= 1) {
            return new MinimumRadiusFigure(factor, value, false, Double.NaN,
                    "a target of 1 means no notch at all; no fillet meets it");
        }
        UltimateStrength strength = strength(s);
        StressTarget target = "Kt".equals(factor) ? StressTarget.kt(value) : StressTarget.kf(value);
        double h = s.stepHeight();
        FilletStressCase probe = FilletStressCase.of(shape(s), load(s), c.units(), s.bigD(), s.smallD(),
                Math.min(c.nominalRadius(), h), strength);
        MinimumRadius m = stress.minimumRadius(probe, target);
        return new MinimumRadiusFigure(factor, value, m.found(), m.radius(), m.message());
    }

    @Override
    public Optional<SeatingFigure> seating(DesignCase c, double rMax) {
        DesignCase.MatingCorner m = c.mating();
        if (m == null) return Optional.empty();
        MatingCorner corner = switch (m.corner()) {
            case "chamfer" -> new MatingCorner.Chamfer(m.size(), m.angle() == null ? 45.0 : m.angle());
            case "bearing" -> new MatingCorner.Bearing(m.size() * c.units().millimetres());
            default -> new MatingCorner.Radius(m.size());
        };
        CornerClearance cc;
        try {
            cc = clearance.check(new ClearanceCase(c.units(), rMax, rMax, corner, null, 0.0, null));
        } catch (InputProblem p) {
            throw p.under("mating");
        }
        String message = "fillet max " + Advisor.plain(rMax) + " against the mating " + corner.describe()
                + ": largest fillet that seats " + Advisor.plain(cc.allowedFilletMax()) + ", set by " + cc.governing();
        return Optional.of(new SeatingFigure(cc.seats(), cc.margin(), cc.allowedFilletMax(), message));
    }

    @Override
    public List<String> stressCautions() { return Cautions.STRESS; }

    @Override
    public List<String> seatingCautions() { return Cautions.CLEARANCE; }

    private static ShoulderShape shape(DesignCase.StressInputs s) { return ShoulderShape.parse(s.shape()); }

    private static LoadCase load(DesignCase.StressInputs s) { return LoadCase.parse(s.load()); }

    private static UltimateStrength strength(DesignCase.StressInputs s) {
        return s.ultimateStrength() == null ? null : UltimateStrength.ofMpa(s.ultimateStrength().megapascals());
    }
}
