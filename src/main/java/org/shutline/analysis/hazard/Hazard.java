package org.shutline.analysis.hazard;

import java.util.List;
import org.shutline.model.Severity;

/**
 * One hazard found in the state after a step (step 0 = the network as recorded): the
 * rule's code, severity, the step, the features concerned (input ids), a position
 * (NaN when none), what is wrong, the action to take, and what mitigates it in the plan
 * (null when nothing does: for example "station ST-1 attended (attend step 8)"). A
 * mitigated hazard stays listed but does not count as a critical hazard of the plan.
 */
public record Hazard(String code, Severity severity, int step, List<String> features, double x, double y,
                     String message, String action, String mitigatedBy) {
    public Hazard {
        features = List.copyOf(features);
    }

    public Hazard(String code, Severity severity, int step, List<String> features, double x, double y,
                  String message, String action) {
        this(code, severity, step, features, x, y, message, action, null);
    }

    public Hazard withMitigation(String by) {
        return new Hazard(code, severity, step, features, x, y, message, action, by);
    }

    public boolean mitigated() {
        return mitigatedBy != null;
    }

    /** True for an unmitigated critical hazard. */
    public boolean critical() {
        return severity == Severity.CRITICAL && mitigatedBy == null;
    }

    /** Identity of the condition, used to tell a new hazard from one continuing from an earlier step. */
    public String key() {
        return code + "|" + String.join(",", features);
    }
}
