package org.shutline.app;

import org.shutline.analysis.GasOffExtent;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.analysis.hazard.HazardChecks;
import org.shutline.model.Progress;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanApplier;
import org.shutline.plan.PlanException;
import org.shutline.plan.PlanStates;

/**
 * A work plan evaluated on a workspace with one set of settings, the same for the
 * window, {@code plan}, {@code export --plan}: the plan applied to the network as
 * recorded ({@link PlanApplier}: ids checked first, then each step in order), every
 * step's state traced and checked by the hazard rules found on the class path
 * ({@link HazardChecks#discover()}), with the valve-doubt rule, pressure unit (the
 * settings', else the plan's), low-pressure limit and sensing-line distance of
 * {@link AnalysisSettings}, gas-off extents drawn {@link GasOffExtent#DEFAULT_BUFFER_M}
 * around the pipe. Cost: that of {@link PlanEvaluation#evaluate}.
 */
public final class PlanStudy {
    private PlanStudy() {}

    /** Applies and evaluates {@code plan} (read from a file named {@code fileName}, for messages); the first problem is a {@link PlanException}. */
    public static PlanEvaluation.Result evaluate(Workspace ws, Plan plan, String fileName, AnalysisSettings settings, Progress progress)
            throws PlanException {
        PlanStates ps = PlanApplier.apply(plan, ws.base(), fileName);
        progress.checkCancelled();
        return PlanEvaluation.evaluate(ps, HazardChecks.discover(), settings.stepSettings(plan.pressureUnit()),
                GasOffExtent.DEFAULT_BUFFER_M, progress);
    }
}
