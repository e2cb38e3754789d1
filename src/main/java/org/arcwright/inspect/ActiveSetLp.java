package org.arcwright.inspect;

import java.util.Arrays;

/**
 * Solves a linear programme with few variables and very many constraints (one or two per measured
 * point) by an active set: solve on a small working set with {@link SmallLp}, check every constraint
 * against the answer, add the worst violators, repeat until none is violated. The answer is then
 * optimal for the whole set, because the working set's optimum satisfies all constraints (a standard
 * cutting-plane argument). Working sets stay at tens of constraints, so each pass costs one scan.
 */
final class ActiveSetLp {
    /** The constraints {@code a_j·z <= b_j} of a problem, generated on demand. */
    interface Problem {
        int variables();

        int constraints();

        /** Writes row {@code j} into {@code row} and returns {@code b_j}. */
        double row(int j, double[] row);

        /** {@code a_j·z - b_j}: positive when constraint {@code j} is violated. */
        double violation(int j, double[] z);

        double[] objective();
    }

    /** The optimum and the constraints that were in the working set (for a warm start). */
    record Result(double[] z, int[] working, int passes) {}

    private static final int ADD_PER_PASS = 24;

    private ActiveSetLp() {}

    /**
     * @param initial indices of constraints to start from (must make the problem bounded, e.g. box
     *     constraints on every variable)
     * @param tol violation below which a constraint counts as met
     * @return the optimum, or a result with {@code z == null} when infeasible
     */
    static Result solve(Problem p, int[] initial, double tol) {
        int n = p.variables();
        int total = p.constraints();
        int[] work = Arrays.copyOf(initial, Math.max(16, initial.length * 2));
        int size = initial.length;
        boolean[] inWork = new boolean[total];
        for (int j : initial) inWork[j] = true;
        double[] row = new double[n];
        int[] topIdx = new int[ADD_PER_PASS];
        double[] topVal = new double[ADD_PER_PASS];
        for (int pass = 1; pass <= 500; pass++) {
            double[] a = new double[size * n];
            double[] b = new double[size];
            for (int k = 0; k < size; k++) {
                b[k] = p.row(work[k], row);
                System.arraycopy(row, 0, a, k * n, n);
            }
            SmallLp.Solution s = SmallLp.solve(n, size, a, b, p.objective());
            if (s.z() == null) return new Result(null, Arrays.copyOf(work, size), pass);
            double[] z = s.z();
            int found = 0;
            int minSlot = 0;
            for (int j = 0; j < total; j++) {
                double v = p.violation(j, z);
                if (v <= tol || (v <= 1e3 * tol && inWork[j])) continue;
                if (found < ADD_PER_PASS) {
                    topIdx[found] = j;
                    topVal[found] = v;
                    found++;
                    if (found == ADD_PER_PASS) minSlot = argMin(topVal, found);
                } else if (v > topVal[minSlot]) {
                    topIdx[minSlot] = j;
                    topVal[minSlot] = v;
                    minSlot = argMin(topVal, found);
                }
            }
            int added = 0;
            if (size + found > work.length) work = Arrays.copyOf(work, (size + found) * 2);
            for (int k = 0; k < found; k++) {
                if (!inWork[topIdx[k]]) {
                    inWork[topIdx[k]] = true;
                    work[size++] = topIdx[k];
                    added++;
                }
            }
            // nothing new: the violations left are the working set's own rounding
            if (added == 0) return new Result(z, Arrays.copyOf(work, size), pass);
        }
        throw new IllegalStateException("active set did not settle");
    }

    private static int argMin(double[] v, int n) {
        int m = 0;
        for (int i = 1; i < n; i++) if (v[i] < v[m]) m = i;
        return m;
    }
}
