package org.shutline.plan;

import java.time.LocalDateTime;
import java.util.List;

/** A phase: name, planned start and end (null when not given), its steps in order, its line in the file. */
public record Phase(String name, LocalDateTime start, LocalDateTime end, List<Step> steps, int line) {
    public Phase {
        steps = List.copyOf(steps);
    }

    /** Planned hours between start and end, or NaN when either is missing. */
    public double plannedHours() {
        if (start == null || end == null) return Double.NaN;
        return java.time.Duration.between(start, end).toMinutes() / 60.0;
    }
}
