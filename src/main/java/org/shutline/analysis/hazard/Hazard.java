package org.shutline.analysis.hazard;

import java.util.List;
import org.shutline.model.Severity;

/**
 * One hazard found in the state after a step (step 0 = the network as recorded): the
 * rule's code, severity, the step, the features concerned (input ids), a position
 * (NaN when none), what is wrong, and the action to take.
 */
public record Hazard(String code, Severity severity, int step, List<String> features, double x, double y,
                     String message, String action) {
    public Hazard {
        features = List.copyOf(features);
    }

    /** Identity of the condition, used to tell a new hazard from one continuing from an earlier step. */
    public String key() {
        return code + "|" + String.join(",", features);
    }
}
