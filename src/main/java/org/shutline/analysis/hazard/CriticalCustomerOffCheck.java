package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Service;
import org.shutline.model.Severity;

/** (f) A critical customer (clinic, school, care home...) fed as recorded and off gas after the step. Warning. */
public final class CriticalCustomerOffCheck implements HazardCheck {
    @Override public String code() { return "critical-customer-off"; }

    @Override public String description() {
        return "critical customer off gas";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        List<Finding> out = new ArrayList<>();
        List<Service> svc = ctx.network().services();
        for (int i = 0; i < svc.size(); i++) {
            Service s = svc.get(i);
            if (!s.isCritical() || !ctx.baseTrace().isFed(i) || ctx.afterTrace().isFed(i)) continue;
            String kind = s.critical() == null || s.critical().isBlank() ? "critical customer" : s.critical();
            out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), List.of(s.id()), s.geometry().getX(), s.geometry().getY(),
                    "At " + ctx.stepLabel() + ", " + kind + " " + s.id() + (s.address() == null ? "" : " at " + s.address())
                            + " is off gas (" + s.meters() + " meter" + (s.meters() == 1 ? "" : "s") + ").",
                    "Notify the customer before the step and arrange temporary supply or timing; relight it first when gas returns."));
        }
        return out;
    }
}
