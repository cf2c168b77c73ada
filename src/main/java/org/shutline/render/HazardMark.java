package org.shutline.render;

import java.util.Objects;
import org.shutline.model.Severity;

/**
 * A hazard to mark on the map at a position in the network CRS, with its severity and a
 * short text (may be empty) drawn beside the marker.
 */
public interface HazardMark {
    double x();

    double y();

    Severity severity();

    String text();

    static HazardMark of(double x, double y, Severity severity, String text) {
        return new Plain(x, y, severity, text);
    }

    /** The plain implementation used by {@link #of}. */
    record Plain(double x, double y, Severity severity, String text) implements HazardMark {
        public Plain {
            Objects.requireNonNull(severity, "severity");
            text = text == null ? "" : text;
        }
    }
}
