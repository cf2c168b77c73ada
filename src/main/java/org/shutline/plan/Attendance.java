package org.shutline.plan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Which stations a qualified person attends at each step, from the plan's {@code attend}
 * steps: an attend step at step k covers steps k to its {@code until} (inclusive), or to
 * the last step of its phase when {@code until} is not given. O(steps x attend steps).
 */
public final class Attendance {
    /** Station id to the number of the attend step that covers it, per step (index = step number - 1). */
    private final List<Map<String, Integer>> byStep;

    private Attendance(List<Map<String, Integer>> byStep) {
        this.byStep = byStep;
    }

    public static Attendance of(Plan plan) {
        List<Step> steps = plan.steps();
        List<Map<String, Integer>> by = new ArrayList<>();
        for (int i = 0; i < steps.size(); i++) by.add(new LinkedHashMap<>());
        for (Step s : steps) {
            if (!(s.action() instanceof StepAction.Attend a)) continue;
            int end = a.until() != null ? a.until() : lastOfPhase(steps, s.phase());
            for (int n = s.number(); n <= Math.min(end, steps.size()); n++) by.get(n - 1).putIfAbsent(a.station(), s.number());
        }
        return new Attendance(by);
    }

    private static int lastOfPhase(List<Step> steps, int phase) {
        int last = 0;
        for (Step s : steps) if (s.phase() == phase) last = s.number();
        return last;
    }

    /** The attend step covering station {@code stationId} at step {@code step}, or 0 when it is not attended. */
    public int attendStep(int step, String stationId) {
        if (step < 1 || step > byStep.size()) return 0;
        return byStep.get(step - 1).getOrDefault(stationId, 0);
    }
}
