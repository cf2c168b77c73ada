package org.shutline.plan;

import java.util.List;
import org.shutline.trace.NetworkState;

/**
 * The network around one step: the state it is carried out in ({@code before}), the
 * state it leaves ({@code after}), its work points, the mains it added (tie-in links,
 * bypass hoses: indices in {@code after}), and plain notices (for example "valve V-3
 * was already closed").
 */
public record StepState(Step step, NetworkState before, NetworkState after, List<WorkPoint> workPoints,
                        List<Integer> addedMains, List<String> notices) {
    public StepState {
        workPoints = List.copyOf(workPoints);
        addedMains = List.copyOf(addedMains);
        notices = List.copyOf(notices);
    }
}
