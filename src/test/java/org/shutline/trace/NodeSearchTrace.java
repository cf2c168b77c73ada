package org.shutline.trace;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.shutline.model.Progress;
import org.shutline.model.Service;
import org.shutline.topology.EdgeKind;

/**
 * The reference the tests compare {@link FeedTrace#run} against: the same result by two
 * searches of the whole node graph per live station (the plain method,
 * O(stations x (nodes + edges))), with the node-graph search {@link Flow} of the main
 * code and the {@link Passage} rule. Test code only: the engine traces on the segment
 * graph ({@link StationAttribution}).
 */
final class NodeSearchTrace {
    private NodeSearchTrace() {}

    /** The full trace with per-station attribution by node-graph searches. */
    static FeedTrace.Result run(NetworkState s, Progress progress) {
        progress.begin("feed trace", s.stationCount() * 2L + 1);
        Flow flow = new Flow(s, progress);
        int[] sources = flow.sourceNodes();
        BitSet live = flow.reach(sources, -1);
        BitSet fed = flow.fedServices(live);
        BitSet liveEdges = liveEdges(s, flow, live, s.edgeCount());
        List<Service> services = s.network().services();
        int nst = s.stationCount();
        List<BitSet> stServices = new ArrayList<>(nst);
        List<BitSet> stExclusive = new ArrayList<>(nst);
        List<BitSet> stEdges = new ArrayList<>(nst);
        long[] stMeters = new long[nst];
        long[] stExMeters = new long[nst];
        int[] lastStageFeeds = new int[s.serviceCount()];
        for (int st = 0; st < nst; st++) {
            int e = s.stationEdge(st);
            boolean on = Passage.stationPasses(s, st, live);
            if (!on) {
                stServices.add(new BitSet());
                stExclusive.add(new BitSet());
                stEdges.add(new BitSet());
                continue;
            }
            BitSet reach = flow.reach(new int[] {s.edgeTo(e)}, -1);
            BitSet through = flow.fedServices(reach);
            through.and(fed);
            stServices.add(through);
            stEdges.add(liveEdges(s, flow, reach, s.edgeCount()));
            BitSet without = flow.fedServices(flow.reach(sources, st));
            BitSet exclusive = (BitSet) fed.clone();
            exclusive.andNot(without);
            stExclusive.add(exclusive);
            stMeters[st] = meters(services, through);
            stExMeters[st] = meters(services, exclusive);
            int outSys = s.graph().systemIndex(s.network().stations().get(st).outSys());
            for (int i = through.nextSetBit(0); i >= 0; i = through.nextSetBit(i + 1)) {
                if (serviceSystem(s, i) == outSys) lastStageFeeds[i]++;
            }
            progress.done(2L * st + 3);
        }
        BitSet multi = new BitSet(s.serviceCount());
        for (int i = 0; i < lastStageFeeds.length; i++) if (lastStageFeeds[i] >= 2) multi.set(i);
        BitSet unfed = new BitSet(s.serviceCount());
        unfed.set(0, s.serviceCount());
        unfed.andNot(fed);
        return new FeedTrace.Result(live, fed, liveEdges, stServices, stExclusive, stEdges, stMeters, stExMeters, multi,
                unfed, FeedTrace.deadMains(s, liveEdges), meters(services, fed));
    }

    private static BitSet liveEdges(NetworkState s, Flow flow, BitSet live, int m) {
        BitSet out = new BitSet(m);
        for (int e = 0; e < m; e++) {
            if (s.edgeKind(e) == EdgeKind.PIPE && !s.isRemoved(e) && flow.mainActive(s.edgeFeature(e))
                    && live.get(s.edgeFrom(e))) {
                out.set(e);
            }
        }
        return out;
    }

    private static int serviceSystem(NetworkState s, int service) {
        int e = s.serviceEdge(service);
        return e < 0 ? -2 : s.mainSystem(s.edgeFeature(e));
    }

    private static long meters(List<Service> services, BitSet set) {
        long m = 0;
        for (int i = set.nextSetBit(0); i >= 0; i = set.nextSetBit(i + 1)) m += services.get(i).meters();
        return m;
    }
}
