package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.shutline.model.Severity;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.NetworkState;

/**
 * (c) Pipe of two pressure systems joined other than through a station (a tie-in or
 * bypass between systems, for instance): gas passes from the higher system into the
 * lower one unregulated. Critical. Found with a union-find over present pipe of
 * active mains and open valves: O(nodes + edges) per state.
 */
public final class SystemsJoinedCheck implements HazardCheck {
    @Override public String code() { return "systems-joined"; }

    @Override public String description() {
        return "two pressure systems joined other than through a station";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        NetworkState s = ctx.after();
        int n = s.nodeCount();
        int m = s.edgeCount();
        int[] parent = ctx.afterPieces();
        int[] sysOf = new int[n];
        int[] edgeOf = new int[n];
        java.util.Arrays.fill(sysOf, -1);
        Map<String, int[]> conflicts = new LinkedHashMap<>();
        for (int e = 0; e < m; e++) {
            if (s.edgeKind(e) != EdgeKind.PIPE || !s.pipeLive(e)) continue;
            int r = parent[s.edgeFrom(e)];
            int sys = s.mainSystem(s.edgeFeature(e));
            if (sysOf[r] < 0) {
                sysOf[r] = sys;
                edgeOf[r] = e;
            } else if (sysOf[r] != sys) {
                int a = Math.min(sysOf[r], sys), b = Math.max(sysOf[r], sys);
                conflicts.putIfAbsent(a + ":" + b, new int[] {a, b, edgeOf[r], e});
            }
        }
        List<Finding> out = new ArrayList<>();
        for (int[] c : conflicts.values()) {
            String sa = s.graph().systemId(c[0]), sb = s.graph().systemId(c[1]);
            List<String> ids = new ArrayList<>();
            if (ctx.step() != null) for (int main : ctx.step().addedMains()) ids.add(s.mainId(main));
            ids.add(s.mainId(s.edgeFeature(c[2])));
            ids.add(s.mainId(s.edgeFeature(c[3])));
            double x = s.nodeX(s.edgeFrom(c[3])), y = s.nodeY(s.edgeFrom(c[3]));
            out.add(Finding.hazard(code(), Severity.CRITICAL, ctx.stepNumber(), ids.stream().distinct().toList(), x, y,
                    "At " + ctx.stepLabel() + ", pressure systems " + Pressures.describe(ctx.network(), sa, ctx.settings().pressureUnit())
                            + " and " + Pressures.describe(ctx.network(), sb, ctx.settings().pressureUnit())
                            + " are joined without a regulator station: the lower-pressure system will be over-pressured.",
                    "Do not make this connection; join mains of one system only, or pass the gas through a regulator."));
        }
        return out;
    }
}
