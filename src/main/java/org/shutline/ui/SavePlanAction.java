package org.shutline.ui;

import java.awt.Component;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.io.IOException;
import java.nio.file.Path;
import java.util.function.IntSupplier;
import javax.swing.JOptionPane;
import org.shutline.plan.PlanWriter;

/**
 * File &gt; Save work plan (Ctrl+S) and the plan panel's Save: writes the plan to its file
 * with {@link PlanWriter} (temporary file beside the target, then a move), asking for a
 * file when the plan is new (".yaml" added when the name has no extension). Also the
 * guard before anything replaces the open plan: {@link #mayDiscard()} asks Save /
 * Discard / Cancel when the plan has unsaved changes.
 */
final class SavePlanAction extends WindowAction {
    private final WindowContext ctx;
    private final FileAsk ask;
    private final PlanPanel plan;
    private final RecentFiles recent;
    /** Asks Save / Discard / Cancel for unsaved plan changes; a JOptionPane answer code. Replaced by the window tests. */
    private IntSupplier discardPrompt;

    SavePlanAction(WindowContext ctx, FileAsk ask, PlanPanel plan, RecentFiles recent, Component parent) {
        super("Save work plan", menuKey(KeyEvent.VK_S));
        this.ctx = ctx;
        this.ask = ask;
        this.plan = plan;
        this.recent = recent;
        this.discardPrompt = () -> JOptionPane.showConfirmDialog(parent, "The work plan has unsaved changes. Save them?", "Shutline",
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE);
    }

    @Override public void actionPerformed(ActionEvent e) {
        save();
    }

    /** Saves the plan to its file (asks for one when new); returns false when not saved. */
    boolean save() {
        if (!plan.hasPlan()) return true;
        Path f = plan.file();
        if (f == null) {
            f = ask.ask("lastPlanDir", "Save work plan", FileAsk.Mode.SAVE_FILE, null);
            if (f == null) return false;
            if (!f.getFileName().toString().contains(".")) f = f.resolveSibling(f.getFileName() + ".yaml");
        }
        try {
            PlanWriter.write(plan.plan(), f);
            plan.saved(f);
            ctx.status("Saved " + f);
            if (ctx.workspace() != null) recent.add(ctx.workspace().file(), f);
            return true;
        } catch (IOException ex) {
            ctx.failed("Cannot save " + f, ex);
            return false;
        }
    }

    /** True when the open plan may be replaced: no unsaved changes, or the user saved (successfully) or discarded them. */
    boolean mayDiscard() {
        if (!plan.isDirty()) return true;
        int a = discardPrompt.getAsInt();
        if (a == JOptionPane.YES_OPTION) return save();
        return a == JOptionPane.NO_OPTION;
    }

    void setDiscardPrompt(IntSupplier prompt) {
        discardPrompt = prompt;
    }
}
