package org.shutline.plan;

import java.util.List;
import org.shutline.trace.NetworkState;

/** A plan applied to a network: the base state and one {@link StepState} per step, in order. */
public record PlanStates(Plan plan, NetworkState base, List<StepState> steps) {
    public PlanStates {
        steps = List.copyOf(steps);
    }

    /** The state after the last step of phase {@code phase}, or the base state when the phase is empty. */
    public NetworkState afterPhase(int phase) {
        NetworkState s = base;
        for (StepState st : steps) if (st.step().phase() <= phase) s = st.after();
        return s;
    }
}
