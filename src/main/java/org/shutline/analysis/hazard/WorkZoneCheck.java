package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.shutline.model.Severity;
import org.shutline.plan.WorkPoint;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.Passage;

/**
 * (e) A work point (a cut or a tie-in) that is still live when the step is carried out
 * (in the state before the step): cutting a live main is critical; a tie-in on a live
 * main is an error (it needs a live-insertion procedure). When the point is dead, the
 * closed valves that keep gas off it are found (the closed valves on the edge of the
 * dead pipe around the point whose far side is live); relying on an inoperable one is
 * an error, on any other doubtful one ({@link org.shutline.analysis.ValveDoubt}) a warning.
 */
public final class WorkZoneCheck implements HazardCheck {
    @Override public String code() { return "work-zone"; }

    @Override public String description() {
        return "cut or tie-in point live, or kept dead only by doubtful valves";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        List<Finding> out = new ArrayList<>();
        if (ctx.step() == null) return out;
        NetworkState s = ctx.before();
        FeedTrace.Result tr = ctx.beforeTrace();
        for (WorkPoint wp : ctx.step().workPoints()) {
            if (tr.isEdgeLive(wp.edge())) {
                boolean cut = wp.kind().equals("cut");
                out.add(Finding.hazard(code(), cut ? Severity.CRITICAL : Severity.ERROR, ctx.stepNumber(), List.of(wp.mainId()), wp.x(), wp.y(),
                        "At " + ctx.stepLabel() + ", the " + wp.kind() + " point on main " + wp.mainId() + " is still live: "
                                + (cut ? "cutting it releases gas." : "tying in there means working on a live main."),
                        cut ? "Close the valves that isolate this point first (see the isolation of main " + wp.mainId() + ")."
                                : "Isolate the tie-in point first, or plan a live-insertion procedure with its own controls."));
                continue;
            }
            relied(ctx, s, tr, wp, out);
        }
        return out;
    }

    private void relied(StepContext ctx, NetworkState s, FeedTrace.Result tr, WorkPoint wp, List<Finding> out) {
        BitSet seen = new BitSet(s.nodeCount());
        int[] stack = new int[64];
        int top = 0;
        stack[top++] = s.edgeFrom(wp.edge());
        stack[top++] = s.edgeTo(wp.edge());
        seen.set(s.edgeFrom(wp.edge()));
        seen.set(s.edgeTo(wp.edge()));
        Set<Integer> closed = new LinkedHashSet<>();
        int[] buf = s.adjacencyBuffer();
        while (top > 0) {
            int v = stack[--top];
            int n = s.incidentEdges(v, buf);
            for (int i = 0; i < n; i++) {
                int e = buf[i];
                byte k = s.edgeKind(e);
                if (k == EdgeKind.VALVE && s.valveClosed(s.edgeFeature(e))) {
                    if (tr.isLive(s.opposite(e, v))) closed.add(s.edgeFeature(e));
                    continue;
                }
                if (!Passage.passesBothWays(s, e)) continue; // stations and dead pipe: the dead area does not spread across them
                int w = s.opposite(e, v);
                if (seen.get(w)) continue;
                seen.set(w);
                if (top == stack.length) stack = java.util.Arrays.copyOf(stack, top * 2);
                stack[top++] = w;
            }
        }
        for (int v : closed) {
            String id = s.valveId(v);
            var doubt = ctx.doubt(s, v);
            if (doubt.inoperable()) {
                out.add(Finding.hazard(code(), Severity.ERROR, ctx.stepNumber(), List.of(wp.mainId(), id), wp.x(), wp.y(),
                        "At " + ctx.stepLabel() + ", the " + wp.kind() + " point on main " + wp.mainId() + " is kept dead by valve " + id
                                + ", which is recorded inoperable and may not hold.",
                        "Do not rely on " + id + ": close the next valve beyond it, or repair it before the step."));
            } else if (doubt.doubtful()) {
                String why = doubt.why();
                out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), List.of(wp.mainId(), id), wp.x(), wp.y(),
                        "At " + ctx.stepLabel() + ", the " + wp.kind() + " point on main " + wp.mainId() + " is kept dead by valve " + id
                                + ", which is " + why + ".",
                        "Operate and check " + id + " before the step, staff it while the work is open, and have its fallback valves ready."));
            }
        }
    }
}
