package org.shutline.model;

import java.util.List;
import java.util.Objects;

/**
 * The one located statement of the program, for a data finding of the network as read,
 * a hazard of a work-plan step, or any other review of a network state: code,
 * severity, the ids of the features concerned, a position "at or near" the problem (NaN
 * when there is none), a plain message, the layer it came from (may be null), the plan
 * step it belongs to ({@link #NO_STEP} for data findings; 0 for the network as recorded
 * when a plan is checked), the action to take (null when the finding gives none), and
 * what in the plan mitigates it (null when nothing does: for example "station ST-1
 * attended (attend step 8)"). A mitigated finding stays listed but does not count as a
 * critical one. Findings are data, shared by the command line, the window and the
 * reports, which all show them in one shape.
 */
public record Finding(String code, Severity severity, List<String> features,
                      double x, double y, String message, String layer,
                      int step, String action, String mitigatedBy) {
    /** The step of a finding that belongs to no plan step (a data finding). */
    public static final int NO_STEP = -1;

    public Finding {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(message, "message");
        features = List.copyOf(features);
    }

    /** A data finding: no step, no action. */
    public Finding(String code, Severity severity, List<String> features, double x, double y, String message, String layer) {
        this(code, severity, features, x, y, message, layer, NO_STEP, null, null);
    }

    public static Finding at(String code, Severity severity, String layer, double x, double y,
                             String message, String... features) {
        return new Finding(code, severity, List.of(features), x, y, message, layer);
    }

    public static Finding of(String code, Severity severity, String layer, String message, String... features) {
        return new Finding(code, severity, List.of(features), Double.NaN, Double.NaN, message, layer);
    }

    /**
     * A hazard of the state after plan step {@code step} (0 = the network as recorded), with
     * the action to take; x, y NaN when it has no position.
     */
    public static Finding hazard(String code, Severity severity, int step, List<String> features, double x, double y,
                                 String message, String action) {
        return new Finding(code, severity, features, x, y, message, null, step, action, null);
    }

    public boolean hasLocation() {
        return !Double.isNaN(x) && !Double.isNaN(y);
    }

    /** True when the finding belongs to a plan step (0 = the network as recorded). */
    public boolean hasStep() {
        return step != NO_STEP;
    }

    /** The same finding, mitigated by {@code by}. */
    public Finding withMitigation(String by) {
        return new Finding(code, severity, features, x, y, message, layer, step, action, by);
    }

    public boolean mitigated() {
        return mitigatedBy != null;
    }

    /** True for an unmitigated critical finding. */
    public boolean critical() {
        return severity == Severity.CRITICAL && mitigatedBy == null;
    }

    /** Identity of the condition (code and features), used to tell a new finding from one continuing from an earlier step. */
    public String key() {
        return code + "|" + String.join(",", features);
    }
}
