package org.shutline.ui;

import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import org.shutline.plan.PlanReader;

/**
 * File &gt; Open work plan... (Ctrl+P): after asking about unsaved changes, asks for a
 * plan file, reads it in a background task and shows it in the Work plan panel (which
 * evaluates it); the network + plan pair goes first in the recent list.
 */
final class OpenPlanAction extends WindowAction {
    private final WindowContext ctx;
    private final FileAsk ask;
    private final BooleanSupplier mayDiscard;
    private final PlanPanel plan;
    private final RecentFiles recent;

    OpenPlanAction(WindowContext ctx, FileAsk ask, BooleanSupplier mayDiscard, PlanPanel plan, RecentFiles recent) {
        super("Open work plan...", menuKey(KeyEvent.VK_P));
        this.ctx = ctx;
        this.ask = ask;
        this.mayDiscard = mayDiscard;
        this.plan = plan;
        this.recent = recent;
    }

    @Override public void actionPerformed(ActionEvent e) {
        if (ctx.workspace() == null || !mayDiscard.getAsBoolean()) return;
        Path f = ask.ask("lastPlanDir", "Open work plan (.yaml)", FileAsk.Mode.OPEN_FILE, null);
        if (f == null) return;
        ctx.run(new Task<>("read plan", p -> PlanReader.read(f), pl -> {
            plan.open(pl, f);
            ctx.showPanel(plan);
            recent.add(ctx.workspace().file(), f);
        }, t -> ctx.failed("Cannot read plan " + f.getFileName(), t)));
    }
}
