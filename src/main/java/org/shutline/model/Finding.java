package org.shutline.model;

import java.util.List;
import java.util.Objects;

/**
 * A located statement about the data or a network state: code, severity, the ids of
 * the features concerned, a position "at or near" the problem (NaN when there is
 * none), a plain message, and the layer it came from (may be null).
 * Findings are data, shared by the command line, the window and the reports.
 */
public record Finding(String code, Severity severity, List<String> features,
                      double x, double y, String message, String layer) {
    public Finding {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(message, "message");
        features = List.copyOf(features);
    }

    public static Finding at(String code, Severity severity, String layer, double x, double y,
                             String message, String... features) {
        return new Finding(code, severity, List.of(features), x, y, message, layer);
    }

    public static Finding of(String code, Severity severity, String layer, String message, String... features) {
        return new Finding(code, severity, List.of(features), Double.NaN, Double.NaN, message, layer);
    }

    public boolean hasLocation() {
        return !Double.isNaN(x) && !Double.isNaN(y);
    }
}
