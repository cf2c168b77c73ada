package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.shutline.model.Service;
import org.shutline.plan.PlanStates;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.Passage;
import org.shutline.trace.ValveSegments;

/**
 * The check every instruction passes before it is shown: apply it to the network
 * state and trace again, by a path independent of the one that computed it.
 *
 * <p>Applying an instruction: a {@link NetworkState} overlay with its valves closed
 * ({@link NetworkState#withValveClosed}) and the stations it says to stop out of
 * service ({@link NetworkState#withStationInService}); the sources it says to shut are
 * left out of the start of the trace. The trace is {@link FeedTrace#liveNodes}, a
 * search of the node graph (the answers themselves come from the valve-segment graph).
 * Then:
 * <ul>
 * <li>an isolation: every node of its region (the zone grown across inoperable valves)
 *     is dead, and the services off (fed before, not after) are exactly
 *     {@code servicesOff}, their meters {@code metersOff};</li>
 * <li>each fallback (its valve left open, its full valve set closed): the region is
 *     still dead, the failed valve is not in the set, and the services off are exactly
 *     the plan's plus {@code addedServices} (none of them already off), meters likewise;
 *     the alternative the same way;</li>
 * <li>a station stop: its isolation as above, and the station's inlet node dead (so
 *     the station passes no gas), after the stop and after each fallback; every stop
 *     an isolation names is checked too;</li>
 * <li>an over-pressure shut-off: every feeding station's stop, and all of them done
 *     together with the system's sources shut: every node of the system's pipe dead and
 *     the services off exactly {@code off};</li>
 * <li>a plan step's suggested order: the same valves as the step, and each fallback's
 *     valves leave the step's cut-off segments dead and put off exactly the step's
 *     outcome plus what the fallback says it adds.</li>
 * </ul>
 * A mismatch throws {@link UnverifiedInstructionException} naming the query. Cost per
 * checked valve set: O(nodes + edges + services).
 */
public final class InstructionCheck {
    private final ValveSegments segs;
    private final NetworkState state;
    private final BitSet fedBefore;
    private final Map<String, List<Integer>> valves = new HashMap<>();
    private final Map<String, Integer> stations = new HashMap<>();
    private final Map<String, Integer> sources = new HashMap<>();

    public InstructionCheck(ValveSegments segs) {
        this.segs = segs;
        this.state = segs.state();
        this.fedBefore = FeedTrace.fedServices(state, FeedTrace.liveNodes(state, null));
        for (int v = 0; v < state.valveCount(); v++) valves.computeIfAbsent(state.valveId(v), k -> new ArrayList<>()).add(v);
        for (int st = 0; st < state.stationCount(); st++) stations.putIfAbsent(state.stationId(st), st);
        for (int i = 0; i < state.network().sources().size(); i++) sources.putIfAbsent(state.network().sources().get(i).id(), i);
    }

    /** Checks an isolation with its fallbacks, alternative and station stops. */
    public static void verify(ValveSegments segs, Isolation.Result r, String query) {
        new InstructionCheck(segs).isolation(r, query);
    }

    /** Checks a leak response's isolation. */
    public static void verify(ValveSegments segs, IncidentResponse.Result r, String query) {
        new InstructionCheck(segs).isolation(r.isolation(), query);
    }

    /** Checks an over-pressure shut-off: every stop, then all of them together. */
    public static void verify(ValveSegments segs, OverpressureShutoff.Result r, String query) {
        new InstructionCheck(segs).overpressure(r, query);
    }

    /** Checks every card: the excavation isolation and each over-pressure shut-off, in the state after its phase. */
    public static void verify(PlanStates ps, List<EmergencyCards.Card> cards, String query) {
        for (EmergencyCards.Card c : cards) {
            if (c.site() == null && c.overpressure().isEmpty()) continue;
            InstructionCheck k = new InstructionCheck(ValveSegments.build(ps.afterPhase(c.phase())));
            String q = query + ", phase " + (c.phase() + 1);
            if (c.site() != null) k.isolation(c.site().isolation(), q + " excavation");
            for (OverpressureShutoff.Result op : c.overpressure()) k.overpressure(op, q + " over-pressure of " + op.systemId());
        }
    }

    /** The outcome of one instruction applied to the state. */
    private record Outcome(BitSet live, BitSet off) {}

    /**
     * The state with the instruction done. A station to stop is stopped the way the
     * instruction says: by closing its stop's valves when {@code stops} has a stop of it
     * that valves do, else at the station itself (out of service).
     */
    private Outcome apply(Collection<Integer> valveIdx, Collection<String> valveIds, Collection<String> stop,
                          Collection<StationStop.Result> stops, Collection<String> shut, String query) {
        NetworkState t = state;
        for (int v : valveIdx) t = t.withValveClosed(v, true);
        for (String id : valveIds) t = close(t, id, query);
        for (String id : stop) {
            Integer st = stations.get(id);
            if (st == null) throw new UnverifiedInstructionException(query, "station " + id + " is not in the network");
            StationStop.Result how = StationStop.Result.of(List.copyOf(stops), id);
            if (how != null && how.byValves()) {
                for (String v : how.valves()) t = close(t, v, query);
            } else {
                t = t.withStationInService(st, false);
            }
        }
        BitSet shutSources = new BitSet();
        for (String id : shut) {
            Integer i = sources.get(id);
            if (i == null) throw new UnverifiedInstructionException(query, "source " + id + " is not in the network");
            shutSources.set(i);
        }
        BitSet live = FeedTrace.liveNodes(t, shutSources);
        BitSet off = (BitSet) fedBefore.clone();
        off.andNot(FeedTrace.fedServices(t, live));
        return new Outcome(live, off);
    }

    private NetworkState close(NetworkState t, String id, String query) {
        List<Integer> vs = valves.get(id);
        if (vs == null) throw new UnverifiedInstructionException(query, "valve " + id + " is not in the network");
        for (int v : vs) t = t.withValveClosed(v, true);
        return t;
    }

    void isolation(Isolation.Result r, String query) {
        List<Integer> idx = new ArrayList<>();
        for (Isolation.ValveStep v : r.valves()) idx.add(v.valve());
        String what = "valves " + r.valveIds();
        Outcome o = apply(idx, List.of(), r.stationsToStop(), r.stationStops(), r.sourcesInRegion(), query);
        deadRegion(o, r.region(), query, what);
        sameServices(o.off, ids(r.servicesOff()), query, what);
        sameMeters(o.off, r.metersOff(), query, what);
        Set<String> base = ids(r.servicesOff());
        for (Isolation.Fallback f : r.fallbacks()) {
            String fw = "fallback for " + f.valveId() + " (valves " + f.valves() + ")";
            if (f.valves().contains(f.valveId())) throw new UnverifiedInstructionException(query, fw + " closes the valve that failed");
            Outcome fo = apply(List.of(), f.valves(), f.stationsToStop(), f.stationStops(), f.sourcesInRegion(), query);
            deadRegion(fo, r.region(), query, fw);
            added(fo, base, f.addedServices(), f.stayOnServices(), r.metersOff() + f.addedMeters() - f.stayOnMeters(), query, fw);
        }
        if (r.alternative().isPresent()) {
            Isolation.Alternative a = r.alternative().get();
            String aw = "alternative (valves " + a.valves() + ")";
            Outcome ao = apply(List.of(), a.valves(), a.stationsToStop(), a.stationStops(), a.sourcesInRegion(), query);
            deadRegion(ao, r.region(), query, aw);
            added(ao, base, a.addedServices(), a.stayOnServices(), r.metersOff() + a.addedMeters() - a.stayOnMeters(), query, aw);
        }
        for (StationStop.Result stop : r.stationStops()) stationStop(stop, query + ", stop of station " + stop.stationId());
    }

    void stationStop(StationStop.Result r, String query) {
        int e = state.stationEdge(r.station());
        int inlet = e < 0 || state.isRemoved(e) ? -1 : state.edgeFrom(e);
        if (r.isolation() == null) {
            Outcome o = apply(List.of(), List.of(), List.of(), List.of(), List.of(), query);
            if (Passage.stationPasses(state, r.station(), o.live)) {
                throw new UnverifiedInstructionException(query, "station " + r.stationId() + " is said to pass no gas (" + r.note() + ") but its inlet is live");
            }
            return;
        }
        isolation(r.isolation(), query);
        List<Integer> idx = new ArrayList<>();
        for (Isolation.ValveStep v : r.isolation().valves()) idx.add(v.valve());
        if (!r.valves().equals(r.isolation().valveIds())) {
            throw new UnverifiedInstructionException(query, "stop valves " + r.valves() + " differ from its isolation's " + r.isolation().valveIds());
        }
        Outcome o = apply(idx, List.of(), r.isolation().stationsToStop(), r.isolation().stationStops(), r.isolation().sourcesInRegion(), query);
        if (inlet >= 0 && o.live.get(inlet)) {
            throw new UnverifiedInstructionException(query, "station " + r.stationId() + " still has gas at its inlet with " + r.valves() + " closed");
        }
        for (Isolation.Fallback f : r.isolation().fallbacks()) {
            Outcome fo = apply(List.of(), f.valves(), f.stationsToStop(), f.stationStops(), f.sourcesInRegion(), query);
            if (inlet >= 0 && fo.live.get(inlet)) {
                throw new UnverifiedInstructionException(query, "station " + r.stationId() + " still has gas at its inlet with the fallback for "
                        + f.valveId() + " (" + f.valves() + ") closed");
            }
        }
        BitSet other = r.isolation().servicesOff();
        other.andNot(r.ownDistrict());
        if (!other.equals(r.otherOff())) throw new UnverifiedInstructionException(query, "station " + r.stationId() + ": other customers off do not add up");
    }

    void overpressure(OverpressureShutoff.Result r, String query) {
        List<Integer> idx = new ArrayList<>();
        Set<String> stop = new HashSet<>(), shut = new HashSet<>();
        for (OverpressureShutoff.Feed f : r.feeds()) {
            if (!f.isStation()) {
                shut.add(f.id());
                continue;
            }
            stationStop(f.stop(), query + ", stop of station " + f.id());
            if (!f.inletValves().equals(f.stop().valves())) {
                throw new UnverifiedInstructionException(query, "station " + f.id() + ": inlet valves shown " + f.inletValves() + " are not its stop " + f.stop().valves());
            }
            for (Isolation.ValveStep v : f.upstream().valves()) idx.add(v.valve());
            if (!f.upstream().isolable()) {
                stop.add(f.id());
                stop.addAll(f.upstream().stationsToStop());
                shut.addAll(f.upstream().sourcesInRegion());
            }
        }
        Outcome o = apply(idx, List.of(), stop, List.of(), shut, query);
        deadSystem(o, r.systemId(), query, "the over-pressure shut-off of " + r.systemId());
        sameServices(o.off, ids(r.off()), query, "the over-pressure shut-off of " + r.systemId());
        sameMeters(o.off, r.metersOff(), query, "the over-pressure shut-off of " + r.systemId());
        Set<String> base = ids(r.off());
        for (OverpressureShutoff.Feed f : r.feeds()) {
            if (!f.isStation()) continue;
            List<Integer> others = new ArrayList<>();
            for (OverpressureShutoff.Feed g : r.feeds()) {
                if (g != f && g.isStation()) for (Isolation.ValveStep v : g.upstream().valves()) others.add(v.valve());
            }
            for (Isolation.Fallback fb : f.fallbacks()) {
                String fw = "over-pressure of " + r.systemId() + ", station " + f.id() + ", fallback for " + fb.valveId() + " (valves " + fb.valves() + ")";
                if (fb.valves().contains(fb.valveId())) throw new UnverifiedInstructionException(query, fw + " closes the valve that failed");
                Set<String> st = new HashSet<>(stop);
                st.addAll(fb.stationsToStop());
                Outcome fo = apply(others, fb.valves(), st, List.of(), shut, query);
                deadSystem(fo, r.systemId(), query, fw);
                added(fo, base, fb.addedServices(), fb.stayOnServices(), r.metersOff() + fb.addedMeters() - fb.stayOnMeters(), query, fw);
            }
        }
    }

    private void deadSystem(Outcome o, String systemId, String query, String what) {
        int sys = state.graph().systemIndex(systemId);
        if (sys < 0) return;
        for (int n = 0; n < state.nodeCount(); n++) {
            int seg = segs.nodeSegment(n);
            if (seg >= 0 && o.live.get(n) && Restoration.segmentSystem(segs, seg) == sys) {
                throw new UnverifiedInstructionException(query, what + ": system " + systemId + " still has gas (node at "
                        + state.nodeX(n) + ", " + state.nodeY(n) + ")");
            }
        }
    }

    /**
     * A plan step's suggested order and fallbacks, in the state before the step:
     * {@code stepValves} are the step's valves.
     */
    void suggestion(List<String> stepValves, PlanEvaluation.Suggestion sug, String query) {
        if (!new HashSet<>(sug.order()).equals(new HashSet<>(stepValves)) || sug.order().size() != stepValves.size()) {
            throw new UnverifiedInstructionException(query, "suggested order " + sug.order() + " is not the step's valves " + stepValves);
        }
        if (sug.fallbacks().isEmpty()) return;
        Outcome step = apply(List.of(), stepValves, List.of(), List.of(), List.of(), query);
        BitSet cutOff = new BitSet();
        BitSet liveBefore = FeedTrace.liveNodes(state, null);
        for (int n = liveBefore.nextSetBit(0); n >= 0; n = liveBefore.nextSetBit(n + 1)) if (!step.live.get(n)) cutOff.set(n);
        Set<String> base = ids(step.off);
        long baseMeters = meters(step.off);
        for (Isolation.Fallback f : sug.fallbacks()) {
            String fw = "fallback for " + f.valveId() + " (valves " + f.valves() + ")";
            if (f.valves().contains(f.valveId())) throw new UnverifiedInstructionException(query, fw + " closes the valve that failed");
            Outcome fo = apply(List.of(), f.valves(), f.stationsToStop(), f.stationStops(), f.sourcesInRegion(), query);
            for (int n = cutOff.nextSetBit(0); n >= 0; n = cutOff.nextSetBit(n + 1)) {
                if (fo.live.get(n)) throw new UnverifiedInstructionException(query, fw + " leaves gas in what the step cuts off");
            }
            added(fo, base, f.addedServices(), f.stayOnServices(), baseMeters + f.addedMeters() - f.stayOnMeters(), query, fw);
        }
    }

    private void deadRegion(Outcome o, BitSet region, String query, String what) {
        if (region.isEmpty()) return;
        for (int n = o.live.nextSetBit(0); n >= 0; n = o.live.nextSetBit(n + 1)) {
            int seg = segs.nodeSegment(n);
            if (seg >= 0 && region.get(seg)) {
                throw new UnverifiedInstructionException(query, what + " leave gas in the isolated area (node at "
                        + state.nodeX(n) + ", " + state.nodeY(n) + ", segment " + seg + ")");
            }
        }
    }

    private void added(Outcome o, Set<String> base, List<String> addedIds, List<String> stayOnIds, long meters, String query, String what) {
        Set<String> expected = new HashSet<>(base);
        for (String id : addedIds) {
            if (!expected.add(id)) throw new UnverifiedInstructionException(query, what + ": service " + id + " is said to be added but is off already");
        }
        for (String id : stayOnIds) {
            if (!expected.remove(id)) throw new UnverifiedInstructionException(query, what + ": service " + id + " is said to stay on but the plan does not put it off");
        }
        sameServices(o.off, expected, query, what);
        sameMeters(o.off, meters, query, what);
    }

    private void sameServices(BitSet off, Set<String> expected, String query, String what) {
        Set<String> actual = ids(off);
        if (actual.equals(expected)) return;
        Set<String> extra = new HashSet<>(actual);
        extra.removeAll(expected);
        Set<String> missing = new HashSet<>(expected);
        missing.removeAll(actual);
        throw new UnverifiedInstructionException(query, what + ": re-trace puts off " + actual.size() + " services, the answer says "
                + expected.size() + " (off but not shown: " + first(extra) + "; shown but not off: " + first(missing) + ")");
    }

    private void sameMeters(BitSet off, long expected, String query, String what) {
        long m = meters(off);
        if (m != expected) throw new UnverifiedInstructionException(query, what + ": re-trace puts off " + m + " meters, the answer says " + expected);
    }

    private long meters(BitSet set) {
        List<Service> all = state.network().services();
        long m = 0;
        for (int i = set.nextSetBit(0); i >= 0; i = set.nextSetBit(i + 1)) m += all.get(i).meters();
        return m;
    }

    private Set<String> ids(BitSet set) {
        List<Service> all = state.network().services();
        Set<String> out = new HashSet<>();
        for (int i = set.nextSetBit(0); i >= 0; i = set.nextSetBit(i + 1)) out.add(all.get(i).id());
        return out;
    }

    private static String first(Set<String> ids) {
        List<String> l = new ArrayList<>(ids);
        l.sort(null);
        return l.isEmpty() ? "none" : String.join(", ", l.subList(0, Math.min(5, l.size()))) + (l.size() > 5 ? ", ..." : "");
    }
}
