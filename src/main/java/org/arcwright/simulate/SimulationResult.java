package org.arcwright.simulate;

import java.util.List;

/**
 * The outcome of a simulation: how many parts were functionally good and, per callout, what it
 * accepted, let through and turned away.
 *
 * @param simulation what was run
 * @param good parts meeting every need (judged on the true geometry)
 * @param callouts per candidate callout, in the order given
 */
public record SimulationResult(Simulation simulation, long good, List<CalloutResult> callouts) {
    /** The caution every report of a simulation carries. */
    public static final String CAUTION = "A simulated process is a model, not the shop's capability data: check the scatter, "
            + "defect rates and measuring noise against the shop's own records. Decisions defer to the governing standard, "
            + "company practice and licensed engineering judgement.";

    public SimulationResult {
        callouts = List.copyOf(callouts);
    }

    public int parts() { return simulation.parts(); }

    public Share goodShare() { return Share.of(good, simulation.parts()); }
}
