package org.shutline.ui;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Finding;
import org.shutline.app.AnalysisSettings;
import org.shutline.app.PlanStudy;
import org.shutline.app.Workspace;
import org.shutline.model.Progress;
import org.shutline.model.Valve;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanException;
import org.shutline.plan.PlanValidator;
import org.shutline.plan.StepAction;
import org.shutline.render.GasOffArea;
import org.shutline.render.HazardMark;
import org.shutline.render.MapOverlays;
import org.shutline.render.ValveToOperate;

/**
 * Validates, applies and evaluates a work plan on a workspace (run in a worker), and
 * turns one step's result into map overlays: the gas-off extent, the step's valves
 * numbered in operating order (the suggested order for an unordered close), and the
 * hazards of the step (new and continuing) at their positions.
 */
public final class PlanRun {
    private PlanRun() {}

    /** Validates ids, applies and evaluates; the first problem is a {@link PlanException} ("file:line: reason"). */
    public static PlanEvaluation.Result evaluate(Workspace ws, Plan plan, String fileName, LocalDate asOf, Progress progress)
            throws PlanException {
        List<PlanException> problems = PlanValidator.validate(plan, ws.network(), fileName);
        if (!problems.isEmpty()) throw problems.get(0);
        progress.checkCancelled();
        return PlanStudy.evaluate(ws, plan, fileName, AnalysisSettings.defaults(asOf), progress);
    }

    /** The overlays that show step result {@code s} on the map. */
    public static MapOverlays overlays(Workspace ws, PlanEvaluation.StepResult s) {
        List<GasOffArea> off = new ArrayList<>();
        if (s.gasOff() != null && !s.gasOff().isEmpty()) off.add(GasOffArea.of(s.gasOff()));
        List<ValveToOperate> valves = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        boolean close = false;
        if (s.step().action() instanceof StepAction.CloseValves c) {
            ids = s.suggestion() != null && !s.suggestion().order().isEmpty() ? s.suggestion().order() : c.valves();
            close = true;
        } else if (s.step().action() instanceof StepAction.OpenValves o) {
            ids = o.valves();
        }
        int order = 0;
        for (String id : ids) {
            int v = ws.valveIndex(id);
            if (v < 0) continue;
            Valve valve = ws.network().valves().get(v);
            if (valve.geometry() == null) continue;
            valves.add(ValveToOperate.of(++order, id, valve.geometry().getX(), valve.geometry().getY(), close));
        }
        List<HazardMark> marks = new ArrayList<>();
        for (Finding h : s.hazards()) if (!Double.isNaN(h.x())) marks.add(HazardMark.of(h.x(), h.y(), h.severity(), h.code()));
        for (Finding h : s.continuing()) {
            if (!Double.isNaN(h.x()) && h.severity() == org.shutline.model.Severity.CRITICAL) {
                marks.add(HazardMark.of(h.x(), h.y(), h.severity(), h.code()));
            }
        }
        return MapOverlays.NONE.withGasOff(off).withValvesToOperate(valves).withHazards(marks);
    }
}
