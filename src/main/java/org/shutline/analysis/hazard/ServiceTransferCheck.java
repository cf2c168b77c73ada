package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import org.shutline.model.Plural;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Service;
import org.shutline.model.Severity;
import org.shutline.plan.StepAction;
import org.shutline.trace.FeedTrace;

/**
 * A {@code transfer} step interrupts each service it moves: the service is shut off at
 * the meter, cut from the old main and tied onto the new one, and its appliances must be
 * relit and checked (common practice). Reports the services moved that were on gas
 * before the step (interrupted), their meters, and the relights needed at the step (the
 * meters of those on gas again after it); those the step leaves off gas are named.
 * Warning. Features: the two mains and the services moved.
 */
public final class ServiceTransferCheck implements HazardCheck {
    @Override public String code() { return "service-transfer"; }

    @Override public String description() {
        return "services interrupted and relit by a transfer";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        List<Finding> out = new ArrayList<>();
        if (ctx.step() == null || !(ctx.step().step().action() instanceof StepAction.TransferServices t)) return out;
        FeedTrace.Result before = ctx.beforeTrace(), after = ctx.afterTrace();
        List<Service> svc = ctx.network().services();
        List<String> ids = new ArrayList<>(List.of(t.from(), t.to()));
        int interrupted = 0, stayOff = 0;
        long meters = 0, relights = 0;
        double x = Double.NaN, y = Double.NaN;
        for (int i = 0; i < svc.size(); i++) {
            if (!moved(ctx, i)) continue;
            ids.add(svc.get(i).id());
            if (!before.isFed(i)) continue;
            interrupted++;
            meters += svc.get(i).meters();
            if (after.isFed(i)) relights += svc.get(i).meters();
            else stayOff++;
            if (Double.isNaN(x)) {
                x = svc.get(i).geometry().getX();
                y = svc.get(i).geometry().getY();
            }
        }
        if (interrupted == 0) return out;
        out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), ids, x, y,
                "At " + ctx.stepLabel() + ", " + Plural.of(interrupted, "service") + " (" + Plural.of(meters, "meter") + ") moved from " + t.from() + " to " + t.to()
                        + (interrupted == 1 ? " is" : " are") + " interrupted; " + Plural.of(relights, "meter") + (relights == 1 ? " needs" : " need") + " a relight at this step"
                        + (stayOff == 0 ? "." : "; " + Plural.of(stayOff, "service") + (stayOff == 1 ? " stays" : " stay") + " off gas after it (" + t.to() + " not live)."),
                "Notify the customers, shut off each meter before its service is cut, and purge, relight and leak-check each one "
                        + "when it is on the new main (common practice); critical customers first."));
        return out;
    }

    /** True when service i was on another pipe before the step and is attached elsewhere after it. */
    private static boolean moved(StepContext ctx, int i) {
        int eb = ctx.before().serviceEdge(i), ea = ctx.after().serviceEdge(i);
        return eb != ea || ctx.before().serviceMeasure(i) != ctx.after().serviceMeasure(i);
    }
}
