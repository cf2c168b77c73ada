package org.shutline.plan;

import java.util.ArrayList;
import java.util.List;
import org.shutline.model.PressureUnit;

/**
 * A work plan: project name, the network file it applies to (as written, may be null),
 * the pressure unit for messages, and its phases. Steps are numbered 1.. across the plan.
 */
public record Plan(String project, String network, PressureUnit pressureUnit, List<Phase> phases) {
    public Plan {
        phases = List.copyOf(phases);
    }

    /** All steps of all phases in order. */
    public List<Step> steps() {
        List<Step> all = new ArrayList<>();
        for (Phase p : phases) all.addAll(p.steps());
        return List.copyOf(all);
    }
}
