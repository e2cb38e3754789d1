package org.arcwright.mechanics;

import java.util.List;
import java.util.Objects;
import org.arcwright.io.DecimalText;

/**
 * One of Peterson's curve fits for a shoulder fillet:
 * K<sub>t</sub> = C1 + C2 (2h/D) + C3 (2h/D)<sup>2</sup> + C4 (2h/D)<sup>3</sup>, h = (D - d)/2,
 * each Ci = a + b&radic;(h/r) + c (h/r), with one coefficient set per range of h/r.
 *
 * <p>Outside the ranges of h/r the nearest branch is evaluated and the caller is told it is an
 * extrapolation (see {@link StressConcentration}). Branches are ordered by h/r and meet end to end.
 *
 * @param name short name of the fit, e.g. {@code "Peterson stepped shaft, bending"}
 * @param source the published source and chart
 * @param branches coefficient sets by ascending range of h/r, contiguous
 */
public record PetersonFit(ShoulderShape shape, LoadCase load, String name, String source, List<Branch> branches) {

    public PetersonFit {
        Objects.requireNonNull(shape, "shape");
        Objects.requireNonNull(load, "load");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(source, "source");
        branches = List.copyOf(branches);
        if (branches.isEmpty()) throw new IllegalArgumentException("a fit needs at least one branch");
        for (int i = 1; i < branches.size(); i++) {
            if (branches.get(i - 1).hrMax() != branches.get(i).hrMin()) {
                throw new IllegalArgumentException("branches of " + name + " do not meet at h/r = "
                        + DecimalText.exact(branches.get(i - 1).hrMax()));
            }
        }
    }

    /** Smallest h/r the fit covers. */
    public double hrMin() { return branches.get(0).hrMin(); }

    /** Largest h/r the fit covers. */
    public double hrMax() { return branches.get(branches.size() - 1).hrMax(); }

    /** True when h/r lies in the fitted range (ends included). */
    public boolean covers(double hOverR) { return hOverR >= hrMin() && hOverR <= hrMax(); }

    /** The branch that governs h/r: the lower one at a shared boundary, the nearest one outside. */
    public Branch branchFor(double hOverR) {
        for (Branch b : branches) if (hOverR <= b.hrMax()) return b;
        return branches.get(branches.size() - 1);
    }

    /** K<sub>t</sub> at h/r and 2h/D (dimensionless), extrapolating with the nearest branch. */
    public double kt(double hOverR, double twoHOverD) {
        return branchFor(hOverR).kt(hOverR, twoHOverD);
    }

    /** Ci = a + b&radic;(h/r) + c (h/r). */
    public record Coefficient(double a, double b, double c) {
        public double at(double hOverR) { return a + b * Math.sqrt(hOverR) + c * hOverR; }
    }

    /** The coefficient set for hrMin &le; h/r &le; hrMax. */
    public record Branch(double hrMin, double hrMax, Coefficient c1, Coefficient c2, Coefficient c3, Coefficient c4) {
        public Branch {
            if (!(hrMin < hrMax)) throw new IllegalArgumentException("branch range must be increasing");
            Objects.requireNonNull(c1, "c1");
            Objects.requireNonNull(c2, "c2");
            Objects.requireNonNull(c3, "c3");
            Objects.requireNonNull(c4, "c4");
        }

        /** The polynomial in t = 2h/D with this branch's coefficients at h/r. */
        public double kt(double hOverR, double t) {
            return c1.at(hOverR) + t * (c2.at(hOverR) + t * (c3.at(hOverR) + t * c4.at(hOverR)));
        }
    }
}
