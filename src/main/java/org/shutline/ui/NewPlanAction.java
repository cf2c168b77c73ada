package org.shutline.ui;

import java.awt.event.ActionEvent;
import java.util.function.BooleanSupplier;

/** File &gt; New work plan: after asking about unsaved changes, starts an empty plan for the open network. */
final class NewPlanAction extends WindowAction {
    private final WindowContext ctx;
    private final BooleanSupplier mayDiscard;
    private final PlanPanel plan;

    NewPlanAction(WindowContext ctx, BooleanSupplier mayDiscard, PlanPanel plan) {
        super("New work plan", null);
        this.ctx = ctx;
        this.mayDiscard = mayDiscard;
        this.plan = plan;
    }

    @Override public void actionPerformed(ActionEvent e) {
        if (!mayDiscard.getAsBoolean()) return;
        plan.newPlan();
        ctx.showPanel(plan);
    }
}
