package org.shutline.ui;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.PressureUnit;
import org.shutline.plan.Phase;
import org.shutline.plan.Plan;
import org.shutline.plan.Step;
import org.shutline.plan.StepAction;

/**
 * A work plan being edited in the window: the plan's header and phases, and its steps
 * as one list in plan order, each with the phase it belongs to. Edits keep the list in
 * phase order: moving the first step of a phase up puts it at the end of the previous
 * phase, moving the last one down puts it at the start of the next. {@link #plan()}
 * numbers the steps 1.. again. Not thread-safe: used on the event thread; the plan
 * it gives is immutable and goes to the evaluation worker.
 */
public final class PlanDraft {
    /** One step: its phase (index) and what it does, with its note and duration. */
    public record Entry(int phase, StepAction action, String note, Duration duration) {}

    private final String project;
    private final String network;
    private final PressureUnit unit;
    private final List<Phase> phases;
    private final List<Entry> steps = new ArrayList<>();

    public PlanDraft(Plan plan) {
        this.project = plan.project();
        this.network = plan.network();
        this.unit = plan.pressureUnit();
        this.phases = new ArrayList<>(plan.phases());
        for (Step s : plan.steps()) steps.add(new Entry(s.phase(), s.action(), s.note(), s.duration()));
    }

    /** An empty plan with one phase, for a network that has none. */
    public static PlanDraft empty(String project, String network) {
        return new PlanDraft(new Plan(project, network, PressureUnit.KPA, List.of(new Phase("1", null, null, List.of(), 0))));
    }

    public int size() {
        return steps.size();
    }

    public Entry entry(int i) {
        return steps.get(i);
    }

    /**
     * Adds a step after step {@code after} (0-based; -1 puts it first), in that step's
     * phase (the first phase when the plan has no steps); returns the new step's index.
     */
    public int add(int after, StepAction action) {
        int at = Math.max(0, Math.min(after + 1, steps.size()));
        int phase = after >= 0 && after < steps.size() ? steps.get(after).phase() : (steps.isEmpty() ? 0 : steps.get(0).phase());
        if (after >= steps.size()) phase = steps.isEmpty() ? phases.size() - 1 : steps.get(steps.size() - 1).phase();
        steps.add(at, new Entry(phase, action, null, null));
        return at;
    }

    public void remove(int i) {
        steps.remove(i);
    }

    /** Moves step i one place up; returns its new index. */
    public int moveUp(int i) {
        if (i < 0 || i >= steps.size()) return i;
        Entry e = steps.get(i);
        if (i > 0 && steps.get(i - 1).phase() == e.phase()) {
            steps.set(i, steps.get(i - 1));
            steps.set(i - 1, e);
            return i - 1;
        }
        if (e.phase() > 0) {
            steps.set(i, new Entry(e.phase() - 1, e.action(), e.note(), e.duration()));
            return i;
        }
        return i;
    }

    /** Moves step i one place down; returns its new index. */
    public int moveDown(int i) {
        if (i < 0 || i >= steps.size()) return i;
        Entry e = steps.get(i);
        if (i + 1 < steps.size() && steps.get(i + 1).phase() == e.phase()) {
            steps.set(i, steps.get(i + 1));
            steps.set(i + 1, e);
            return i + 1;
        }
        if (e.phase() + 1 < phases.size()) {
            steps.set(i, new Entry(e.phase() + 1, e.action(), e.note(), e.duration()));
            return i;
        }
        return i;
    }

    /** The plan as it stands, steps numbered 1.. in order. */
    public Plan plan() {
        List<Phase> out = new ArrayList<>();
        int number = 0;
        for (int p = 0; p < phases.size(); p++) {
            List<Step> ss = new ArrayList<>();
            for (Entry e : steps) {
                if (e.phase() == p) ss.add(new Step(++number, p, e.action(), e.note(), e.duration(), 0));
            }
            Phase ph = phases.get(p);
            out.add(new Phase(ph.name(), ph.start(), ph.end(), ss, ph.line()));
        }
        return new Plan(project, network, unit, out);
    }
}
