package org.shutline.trace;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.shutline.model.Progress;
import org.shutline.topology.Csr;

/**
 * The feed trace of {@link FeedTrace#run} computed on the valve-segment graph
 * ({@link ValveSegments}) instead of the node graph: the same rules, the same result.
 *
 * <p>Why it is the same: a segment is a connected component of active pipe, so gas
 * reaching any node of it reaches all of it; gas leaves a segment only through an open
 * valve or an in-service station from its inlet, which are exactly the links of
 * {@link SegmentGraph} and its {@link SegmentGraph#canFlow}. A node is live exactly
 * when its segment is reached (nodes without a segment lie only on inactive pipe and
 * are never reached: source, valve and station nodes always have one); a pipe edge is
 * live exactly when its segment is reached; a service is fed exactly when its segment
 * is reached (services on inactive pipe have none).
 *
 * <p>Cost: building the segments, O(nodes + edges + services), once; then per live
 * station a search from its outlet, O(segments + links reached), and a search for the
 * segments lost without it within that reach only ({@link #lostWithout}), so the whole
 * trace costs O(network + sum of the stations' downstream reaches), plus the output sets
 * (services and pipe edges of the reached segments), instead of two searches of the
 * whole node graph per station. Meters come from the per-segment sums. Multi-fed
 * counts are kept per segment when all of a segment's pipe is of one system (always,
 * for networks from the topology builder), per service otherwise.
 */
final class StationAttribution {
    private StationAttribution() {}

    static FeedTrace.Result run(NetworkState s, Progress progress) {
        return run(ValveSegments.build(s), progress);
    }

    /** On valve segments already built for the state. */
    static FeedTrace.Result run(ValveSegments vs, Progress progress) {
        NetworkState s = vs.state();
        progress.begin("feed trace", s.stationCount() * 2L + 2);
        SegmentGraph sg = vs.graph();
        int nseg = vs.segmentCount();
        progress.done(1);
        Csr edgeCsr = Csr.group(edgeSegments(vs, s.edgeCount()), nseg);
        int[] segSys = segmentSystems(s, vs, edgeCsr);
        BitSet reachedAll = sg.reachFromSources(null, null);
        BitSet live = new BitSet(s.nodeCount());
        for (int v = 0; v < s.nodeCount(); v++) {
            int seg = vs.nodeSegment(v);
            if (seg >= 0 && reachedAll.get(seg)) live.set(v);
        }
        BitSet fed = vs.servicesOf(reachedAll);
        BitSet liveEdges = edges(edgeCsr, reachedAll, s.edgeCount());
        int nst = s.stationCount();
        List<BitSet> stServices = new ArrayList<>(nst);
        List<BitSet> stExclusive = new ArrayList<>(nst);
        List<BitSet> stEdges = new ArrayList<>(nst);
        long[] stMeters = new long[nst];
        long[] stExMeters = new long[nst];
        int[] segFeeds = new int[nseg];
        int[] serviceFeeds = null;
        int[] queue = new int[Math.max(1, nseg)];
        for (int st = 0; st < nst; st++) {
            progress.checkCancelled();
            int e = s.stationEdge(st);
            boolean on = Passage.stationPasses(s, st, live);
            if (!on) {
                stServices.add(new BitSet());
                stExclusive.add(new BitSet());
                stEdges.add(new BitSet());
                continue;
            }
            BitSet reach = reachFrom(sg, vs.nodeSegment(s.edgeTo(e)), queue);
            BitSet through = vs.servicesOf(reach);
            through.and(fed);
            stServices.add(through);
            stEdges.add(edges(edgeCsr, reach, s.edgeCount()));
            BitSet lostSegs = lostWithout(sg, reach, reachedAll, sg.stationLink(st), queue);
            BitSet exclusive = vs.servicesOf(lostSegs);
            stExclusive.add(exclusive);
            stMeters[st] = vs.metersOf(reach);
            stExMeters[st] = vs.metersOf(lostSegs);
            int outSys = s.graph().systemIndex(s.network().stations().get(st).outSys());
            for (int seg = reach.nextSetBit(0); seg >= 0; seg = reach.nextSetBit(seg + 1)) {
                if (segSys[seg] >= 0 || segSys[seg] == -1) {
                    if (segSys[seg] == outSys) segFeeds[seg]++;
                    continue;
                }
                if (serviceFeeds == null) serviceFeeds = new int[s.serviceCount()];
                for (int i = vs.serviceStart(seg); i < vs.serviceEnd(seg); i++) {
                    int sv = vs.serviceAt(i);
                    if (serviceSystem(s, sv) == outSys) serviceFeeds[sv]++;
                }
            }
            progress.done(2L * st + 4);
        }
        BitSet multi = new BitSet(s.serviceCount());
        for (int seg = 0; seg < nseg; seg++) {
            if (segSys[seg] >= 0 && segFeeds[seg] >= 2) {
                for (int i = vs.serviceStart(seg); i < vs.serviceEnd(seg); i++) multi.set(vs.serviceAt(i));
            }
        }
        if (serviceFeeds != null) {
            for (int i = 0; i < serviceFeeds.length; i++) if (serviceFeeds[i] >= 2) multi.set(i);
        }
        BitSet unfed = new BitSet(s.serviceCount());
        unfed.set(0, s.serviceCount());
        unfed.andNot(fed);
        return new FeedTrace.Result(live, fed, liveEdges, stServices, stExclusive, stEdges, stMeters, stExMeters,
                multi, unfed, FeedTrace.deadMains(s, liveEdges), vs.metersOf(reachedAll));
    }

    private static int[] edgeSegments(ValveSegments vs, int m) {
        int[] a = new int[m];
        for (int e = 0; e < m; e++) a[e] = vs.edgeSegment(e);
        return a;
    }

    /**
     * Per segment: the system of its pipe when all of it is one system (and every
     * service on it then has that system); -1 for a segment with no pipe (no services);
     * -2 when mixed.
     */
    private static int[] segmentSystems(NetworkState s, ValveSegments vs, Csr edgeCsr) {
        int n = vs.segmentCount();
        int[] sys = new int[n];
        int[] start = edgeCsr.start();
        int[] list = edgeCsr.items();
        for (int seg = 0; seg < n; seg++) {
            int v = -1;
            for (int i = start[seg]; i < start[seg + 1]; i++) {
                int ms = s.mainSystem(s.edgeFeature(list[i]));
                if (v == -1) v = ms;
                else if (v != ms) {
                    v = -2;
                    break;
                }
            }
            sys[seg] = v;
        }
        return sys;
    }

    /**
     * Segments reached from the sources that are no longer reached when link {@code cut}
     * (a station) is not crossed. Only segments of {@code downstream} (the reach from the
     * station's outlet) can be lost: a flow path through the station enters its outlet
     * segment and stays within that reach, so every reached segment outside it keeps a path
     * without the station. The search therefore seeds the segments of {@code downstream}
     * that hold a source or are entered by a flowing link (other than {@code cut}) from a
     * reached segment outside it, and spreads within {@code downstream} only: O(segments
     * and links of {@code downstream}), not of the whole network.
     */
    static BitSet lostWithout(SegmentGraph sg, BitSet downstream, BitSet reachedAll, int cut, int[] queue) {
        BitSet kept = new BitSet(sg.segmentCount());
        int tail = 0;
        for (int seg = downstream.nextSetBit(0); seg >= 0; seg = downstream.nextSetBit(seg + 1)) {
            if (!reachedAll.get(seg)) continue;
            boolean seed = sg.hasSource(seg);
            for (int i = sg.crossStart(seg); !seed && i < sg.crossEnd(seg); i++) {
                int l = sg.crossLink(i);
                if (l == cut) continue;
                int w = sg.other(l, seg);
                seed = !downstream.get(w) && reachedAll.get(w) && sg.canFlow(l, w);
            }
            if (seed) {
                kept.set(seg);
                queue[tail++] = seg;
            }
        }
        int head = 0;
        while (head < tail) {
            int u = queue[head++];
            for (int i = sg.crossStart(u); i < sg.crossEnd(u); i++) {
                int l = sg.crossLink(i);
                if (l == cut || !sg.canFlow(l, u)) continue;
                int w = sg.other(l, u);
                if (!downstream.get(w) || kept.get(w)) continue;
                kept.set(w);
                queue[tail++] = w;
            }
        }
        BitSet lost = (BitSet) downstream.clone();
        lost.and(reachedAll);
        lost.andNot(kept);
        return lost;
    }

    /** Segments reached from one segment, gas flowing by {@link SegmentGraph#canFlow}. */
    private static BitSet reachFrom(SegmentGraph sg, int start, int[] queue) {
        BitSet seen = new BitSet(sg.segmentCount());
        if (start < 0) return seen;
        int head = 0, tail = 0;
        seen.set(start);
        queue[tail++] = start;
        while (head < tail) {
            int u = queue[head++];
            for (int i = sg.adjStart(u); i < sg.adjEnd(u); i++) {
                int l = sg.adjLink(i);
                if (!sg.canFlow(l, u)) continue;
                int w = sg.other(l, u);
                if (!seen.get(w)) {
                    seen.set(w);
                    queue[tail++] = w;
                }
            }
        }
        return seen;
    }

    private static BitSet edges(Csr csr, BitSet segs, int m) {
        BitSet out = new BitSet(m);
        int[] start = csr.start();
        int[] list = csr.items();
        for (int seg = segs.nextSetBit(0); seg >= 0; seg = segs.nextSetBit(seg + 1)) {
            for (int i = start[seg]; i < start[seg + 1]; i++) out.set(list[i]);
        }
        return out;
    }

    private static int serviceSystem(NetworkState s, int service) {
        int e = s.serviceEdge(service);
        return e < 0 ? -2 : s.mainSystem(s.edgeFeature(e));
    }
}
