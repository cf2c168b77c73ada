package org.shutline.ui;

import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import javax.swing.KeyStroke;

/**
 * Plan &gt; Next step (Alt+Down) and Previous step (Alt+Up), also on the toolbar: select
 * the neighbouring step of the open plan (stopping at the first and the last) and bring
 * the Work plan panel to the front. Alt+arrows because F6 and F8 belong to Swing's split
 * panes and Ctrl+Page Up / Down to the tabs.
 */
final class PlanStepActions {
    final WindowAction next;
    final WindowAction previous;
    private final WindowContext ctx;
    private final PlanPanel plan;

    PlanStepActions(WindowContext ctx, PlanPanel plan) {
        this.ctx = ctx;
        this.plan = plan;
        next = WindowAction.of("Next step", KeyStroke.getKeyStroke(KeyEvent.VK_DOWN, InputEvent.ALT_DOWN_MASK), () -> stepBy(1));
        previous = WindowAction.of("Previous step", KeyStroke.getKeyStroke(KeyEvent.VK_UP, InputEvent.ALT_DOWN_MASK), () -> stepBy(-1));
    }

    /** Moves the step selection by {@code d} (clamped to the plan's steps). */
    void stepBy(int d) {
        if (!plan.hasPlan()) return;
        ctx.showPanel(plan);
        int i = plan.selectedStep() + d;
        plan.selectStep(Math.max(0, Math.min(plan.stepCount() - 1, i)));
    }
}
