package org.shutline.ui;

import org.shutline.app.Workspace;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanReader;

/**
 * Opens a network, read through a field-mapping file or with our own names, and
 * optionally a work plan, in a background task: {@link Workspace#load(Path, Path,
 * org.shutline.model.Progress)} (reading, topology, trace and valve segments) and the plan
 * read run off the event thread with progress and cancel; the window gets the result on
 * the event thread. Unsaved plan changes are asked about first.
 */
final class NetworkOpener {
    /** What the window does with a loaded network (on the event thread). */
    @FunctionalInterface
    interface Loaded {
        /** @param plan the plan read, or null when none was asked for */
        void loaded(Workspace workspace, Path network, Plan plan, Path planFile);
    }

    private final WindowContext ctx;
    private final BooleanSupplier mayDiscard;
    private final Loaded loaded;

    /**
     * @param mayDiscard asks Save / Discard / Cancel when the open plan has unsaved changes; false stops the opening
     */
    NetworkOpener(WindowContext ctx, BooleanSupplier mayDiscard, Loaded loaded) {
        this.ctx = ctx;
        this.mayDiscard = mayDiscard;
        this.loaded = loaded;
    }

    /** Opens {@code network} read through {@code mapping} (null: our own names) and {@code planFile} (null: none). */
    void open(Path network, Path mapping, Path planFile) {
        if (!mayDiscard.getAsBoolean()) return;
        ctx.status("Opening " + network + (mapping == null ? "" : " with mapping " + mapping.getFileName()) + " ...");
        ctx.run(new Task<>("open " + network.getFileName(), p -> {
            Workspace w = Workspace.load(network, mapping, p);
            Plan pl = planFile == null ? null : PlanReader.read(planFile);
            return new Opened(w, pl);
        }, o -> loaded.loaded(o.workspace(), network, o.plan(), planFile),
                t -> ctx.failed("Cannot open " + network.getFileName(), t)));
    }

    private record Opened(Workspace workspace, Plan plan) {}
}
