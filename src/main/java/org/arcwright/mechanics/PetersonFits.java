package org.arcwright.mechanics;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.mechanics.PetersonFit.Branch;
import org.arcwright.mechanics.PetersonFit.Coefficient;

/**
 * The catalogue of shoulder-fillet fits: stepped round shaft in tension, bending and torsion, and
 * stepped flat bar in tension and bending.
 *
 * <p>Source: W. D. Pilkey and D. F. Pilkey, <i>Peterson's Stress Concentration Factors</i>, 3rd ed.,
 * Wiley 2008, chapter 3 (shoulder fillets). The chart numbers given with each fit are
 * {@code from memory}. The shaft fits are checked against the worked values of Roark's Formulas for
 * Stress and Strain (Table 17.1, Roark's own fit, within 2%) and Shigley's Table 7-1 estimates.
 *
 * <p><b>Checks and corrections.</b> Copies of these fits circulate with sign errors (for example
 * {@code C2 = -3.813 - 0.968√(h/r) ...} or {@code C3 = 7.423 - 4.868√(h/r) - 0.869 h/r} in the
 * upper branch of the shaft in bending, and {@code C4 = -1.061 + 0.171√(h/r) - 0.086 h/r} in
 * torsion). Each such flip breaks either the continuity of the two branches at h/r = 2 (they must
 * agree within about 0.01) or the worked values of Roark and Shigley; the coefficients below pass
 * both, and {@code PetersonFitsTest} keeps them that way. See decision record 0800.
 *
 * <p>The flat-bar tension fit is written {@code from memory}; a variant in circulation
 * (C1 = 1.006 + 1.008√(h/r) - 0.044 h/r, ...) gives K<sub>t</sub> within about 1% of it over the
 * charted range. None of these fits states a D/d limit of its own; flat-bar fits assume the
 * shoulders are long enough that the two ends do not interact (Peterson's L/H condition).
 */
public final class PetersonFits {
    private static final String BOOK = "Pilkey & Pilkey, Peterson's Stress Concentration Factors, 3rd ed. (2008)";

    private final Map<ShoulderShape, Map<LoadCase, PetersonFit>> fits;

    /** A catalogue holding the given fits (a later fit for the same shape and load replaces an earlier one). */
    public PetersonFits(List<PetersonFit> list) {
        Map<ShoulderShape, Map<LoadCase, PetersonFit>> m = new EnumMap<>(ShoulderShape.class);
        for (PetersonFit f : list) m.computeIfAbsent(f.shape(), k -> new EnumMap<>(LoadCase.class)).put(f.load(), f);
        this.fits = m;
    }

    /** The published fits listed in the class comment. */
    public static PetersonFits published() {
        return new PetersonFits(List.of(shaftTension(), shaftBending(), shaftTorsion(), barTension(), barBending()));
    }

    /** All fits in the catalogue. */
    public List<PetersonFit> all() {
        return fits.values().stream().flatMap(m -> m.values().stream()).toList();
    }

    /** The fit for a shape and load, if there is one. */
    public Optional<PetersonFit> find(ShoulderShape shape, LoadCase load) {
        Map<LoadCase, PetersonFit> byLoad = fits.get(shape);
        return Optional.ofNullable(byLoad == null ? null : byLoad.get(load));
    }

    /** The fit for a shape and load, or an {@link InputProblem} on field {@code load} naming what there is. */
    public PetersonFit require(ShoulderShape shape, LoadCase load) {
        return find(shape, load).orElseThrow(() -> InputProblem.ofField("load",
                "no stress-concentration fit for a " + shape.description() + " in " + load.key()
                        + "; fits exist for " + available(shape)));
    }

    private String available(ShoulderShape shape) {
        Map<LoadCase, PetersonFit> byLoad = fits.get(shape);
        if (byLoad == null || byLoad.isEmpty()) return "no load on this shape";
        return String.join(", ", byLoad.keySet().stream().map(LoadCase::key).toList());
    }

    private static Coefficient c(double a, double b, double c) { return new Coefficient(a, b, c); }

    /** Stepped round shaft in tension (Chart 3.4, from memory). */
    static PetersonFit shaftTension() {
        return new PetersonFit(ShoulderShape.STEPPED_SHAFT, LoadCase.TENSION, "Peterson stepped shaft, tension",
                BOOK + ", chapter 3 (shoulder fillets)", List.of(
                new Branch(0.1, 2.0,
                        c(0.926, 1.157, -0.099), c(0.012, -3.036, 0.961),
                        c(-0.302, 3.977, -1.744), c(0.365, -2.098, 0.878)),
                new Branch(2.0, 20.0,
                        c(1.200, 0.860, -0.022), c(-1.805, -0.346, -0.038),
                        c(2.198, -0.486, 0.165), c(-0.593, -0.028, -0.106))));
    }

    /** Stepped round shaft in bending (Chart 3.10, from memory). */
    static PetersonFit shaftBending() {
        return new PetersonFit(ShoulderShape.STEPPED_SHAFT, LoadCase.BENDING, "Peterson stepped shaft, bending",
                BOOK + ", chapter 3 (shoulder fillets)", List.of(
                new Branch(0.1, 2.0,
                        c(0.947, 1.206, -0.131), c(0.022, -3.405, 0.915),
                        c(0.869, 1.777, -0.555), c(-0.810, 0.422, -0.260)),
                new Branch(2.0, 20.0,
                        c(1.232, 0.832, -0.008), c(-3.813, 0.968, -0.260),
                        c(7.423, -4.868, 0.869), c(-3.839, 3.070, -0.600))));
    }

    /** Stepped round shaft in torsion (Chart 3.12, from memory): one range, 0.25 &le; h/r &le; 4. */
    static PetersonFit shaftTorsion() {
        return new PetersonFit(ShoulderShape.STEPPED_SHAFT, LoadCase.TORSION, "Peterson stepped shaft, torsion",
                BOOK + ", chapter 3 (shoulder fillets)", List.of(
                new Branch(0.25, 4.0,
                        c(0.905, 0.783, -0.075), c(-0.437, -1.969, 0.553),
                        c(1.557, 1.073, -0.578), c(-1.061, 0.171, 0.086))));
    }

    /** Stepped flat bar in tension (Chart 3.1, from memory). */
    static PetersonFit barTension() {
        return new PetersonFit(ShoulderShape.STEPPED_BAR, LoadCase.TENSION, "Peterson stepped flat bar, tension",
                BOOK + ", chapter 3 (shoulder fillets)", List.of(
                new Branch(0.1, 2.0,
                        c(1.007, 1.000, -0.031), c(-0.114, -0.585, 0.314),
                        c(0.241, -0.992, -0.271), c(-0.134, 0.577, -0.012)),
                new Branch(2.0, 20.0,
                        c(1.042, 0.982, -0.036), c(-0.074, -0.156, -0.010),
                        c(-3.418, 1.220, -0.005), c(3.450, -2.046, 0.051))));
    }

    /** Stepped flat bar in bending (Chart 3.8, from memory). */
    static PetersonFit barBending() {
        return new PetersonFit(ShoulderShape.STEPPED_BAR, LoadCase.BENDING, "Peterson stepped flat bar, bending",
                BOOK + ", chapter 3 (shoulder fillets)", List.of(
                new Branch(0.1, 2.0,
                        c(1.006, 0.967, 0.013), c(-0.270, -2.372, 0.708),
                        c(0.662, 1.157, -0.908), c(-0.405, 0.249, 0.200)),
                new Branch(2.0, 20.0,
                        c(1.058, 1.002, -0.038), c(-3.652, 1.639, -0.436),
                        c(6.170, -5.687, 1.175), c(-2.558, 3.046, -0.701))));
    }
}
