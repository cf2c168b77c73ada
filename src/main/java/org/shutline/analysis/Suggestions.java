package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.plan.StepAction;
import org.shutline.plan.StepState;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * Suggested operating order for a {@code close} step whose valves are listed without
 * order ({@code ordered: false}): upstream feeds first, by the hop distance from the
 * sources, in the segment graph of the state before the step, of the nearer side of
 * each valve; ties by valve id. For each listed valve that is doubtful by
 * {@link ValveDoubt}, the fallback: the segments the step cuts off, grown across that
 * valve to its far side, isolated again with {@link Isolation}; its extra valves and
 * the services this adds. The suggestion is checked by {@link InstructionCheck} before
 * it is returned (a mismatch throws {@link UnverifiedInstructionException}).
 */
final class Suggestions {
    private Suggestions() {}

    /** {@code beforeSegments}: the valve segments of the state before the step. */
    static PlanEvaluation.Suggestion forStep(StepState st, ValveSegments beforeSegments, StepContext.Settings settings) {
        if (!(st.step().action() instanceof StepAction.CloseValves cv) || cv.ordered()) return null;
        NetworkState s = st.before();
        ValveSegments segs = beforeSegments;
        SegmentGraph sg = segs.graph();
        int[] hops = sg.hopsFromSources();
        List<Integer> valves = new ArrayList<>();
        BitSet links = new BitSet();
        for (String id : cv.valves()) {
            int v = valveIndex(s, id);
            if (v < 0) continue;
            valves.add(v);
            if (sg.valveLink(v) >= 0) links.set(sg.valveLink(v));
        }
        valves.sort(Comparator.<Integer>comparingInt(v -> hop(sg, hops, v)).thenComparing(v -> s.valveId(v)));
        List<String> order = new ArrayList<>();
        for (int v : valves) order.add(s.valveId(v));

        BitSet fedBefore = sg.reachFromSources(null, null);
        BitSet fedAfter = sg.reachFromSources(null, links);
        BitSet zone = (BitSet) fedBefore.clone();
        zone.andNot(fedAfter);
        List<Isolation.Fallback> fallbacks = new ArrayList<>();
        if (!zone.isEmpty()) {
            BitSet offStep = segs.servicesOf(zone);
            Isolation iso = new Isolation(segs, settings.doubt());
            for (int v : valves) {
                int l = sg.valveLink(v);
                if (l < 0) continue;
                ValveDoubt.Verdict doubt = ValveDoubt.of(s, v, settings.doubt());
                if (!doubt.doubtful()) continue;
                BitSet grown = (BitSet) zone.clone();
                grown.set(sg.linkA(l));
                grown.set(sg.linkB(l));
                Isolation.Result r = iso.isolate(new Zone.OfSegments(grown.stream().toArray()));
                List<String> thenClose = new ArrayList<>(r.valveIds());
                thenClose.removeAll(cv.valves());
                BitSet adds = r.servicesOff();
                adds.andNot(offStep);
                List<String> addIds = new ArrayList<>();
                long meters = 0;
                for (int i = adds.nextSetBit(0); i >= 0; i = adds.nextSetBit(i + 1)) {
                    addIds.add(s.network().services().get(i).id());
                    meters += s.network().services().get(i).meters();
                }
                BitSet stays = (BitSet) offStep.clone();
                stays.andNot(r.servicesOff());
                List<String> stayIds = new ArrayList<>();
                long stayMeters = 0;
                for (int i = stays.nextSetBit(0); i >= 0; i = stays.nextSetBit(i + 1)) {
                    stayIds.add(s.network().services().get(i).id());
                    stayMeters += s.network().services().get(i).meters();
                }
                String why = doubt.why();
                fallbacks.add(new Isolation.Fallback(s.valveId(v), why, r.isolable(), r.valveIds(), thenClose, addIds, meters,
                        r.stationsToStop(), r.sourcesInRegion(), r.stationStops(), stayIds, stayMeters));
            }
        }
        PlanEvaluation.Suggestion sug = new PlanEvaluation.Suggestion(order, fallbacks);
        new InstructionCheck(segs).suggestion(order, sug, "plan step " + st.step().number() + " (" + st.step().describe() + ")");
        return sug;
    }

    private static int valveIndex(NetworkState s, String id) {
        for (int v = 0; v < s.valveCount(); v++) if (s.valveId(v).equals(id)) return v;
        return -1;
    }

    private static int hop(SegmentGraph sg, int[] hops, int v) {
        int l = sg.valveLink(v);
        if (l < 0) return Integer.MAX_VALUE;
        return Math.min(hops[sg.linkA(l)], hops[sg.linkB(l)]);
    }
}
