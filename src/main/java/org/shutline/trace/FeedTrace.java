package org.shutline.trace;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.shutline.model.Progress;
import org.shutline.topology.EdgeKind;

/**
 * Feed trace of one {@link NetworkState}: which nodes carry gas, which services are
 * fed, and what each district regulator station feeds.
 *
 * <p>Rules: gas starts at every source node and passes a {@link EdgeKind#PIPE} edge only
 * when the edge's main is {@code ACTIVE} in the state; a {@link EdgeKind#VALVE} edge only
 * when the valve is open; a {@link EdgeKind#STATION} edge only from inlet to outlet and
 * only when the station is in service (so only while its inlet node is live). Removed
 * edges do not exist. A source node is live even when no live pipe touches it.
 *
 * <p>A service is fed when it sits on a live pipe edge (present, main active) whose ends
 * are live. Unattached services are never fed.
 *
 * <p>Per station (in service, inlet live): {@code servicesFed} are the services reached
 * from its outlet through the live network, transitively across cascades; in a grid a
 * service counts for every station that reaches it. {@code servicesExclusive} are the
 * services that lose gas when that station alone is taken out (every feeding path
 * passes it). A service is <em>multi-fed</em> when two or more stations whose outlet
 * system is the service's own system reach it (stations upstream in a cascade do not
 * count twice). <em>Dead mains</em> are active mains with no live pipe edge (active
 * mains that have no edge at all included).
 *
 * <p>Cost: {@link #fedServices} is one search from the sources, O(nodes + edges), reading
 * the frozen graph's arrays directly when the state has no overlay. {@link #run} builds
 * the valve segments once, O(nodes + edges + services), then does two searches of the
 * much smaller segment graph per live station (reach, and the trace with that station
 * out) plus the output sets ({@link StationAttribution}). Cancellation is checked every
 * 4096 nodes and once per station.
 */
public final class FeedTrace {
    private FeedTrace() {}

    /**
     * The result. BitSets are indexed by node, service, main or station index of the
     * state; accessors return copies.
     */
    public record Result(BitSet liveNodes, BitSet fedServices, BitSet liveEdges, List<BitSet> stationServices,
                         List<BitSet> stationExclusive, List<BitSet> stationEdges, long[] stationMeters,
                         long[] stationExclusiveMeters, BitSet multiFed, BitSet unfedServices, BitSet deadMains, long metersFed) {
        public Result {
            liveNodes = (BitSet) liveNodes.clone();
            fedServices = (BitSet) fedServices.clone();
            liveEdges = (BitSet) liveEdges.clone();
            stationServices = copyAll(stationServices);
            stationExclusive = copyAll(stationExclusive);
            stationEdges = copyAll(stationEdges);
            stationMeters = stationMeters.clone();
            stationExclusiveMeters = stationExclusiveMeters.clone();
            multiFed = (BitSet) multiFed.clone();
            unfedServices = (BitSet) unfedServices.clone();
            deadMains = (BitSet) deadMains.clone();
        }

        private static List<BitSet> copyAll(List<BitSet> in) {
            List<BitSet> out = new ArrayList<>(in.size());
            for (BitSet b : in) out.add((BitSet) b.clone());
            return List.copyOf(out);
        }

        @Override public BitSet liveNodes() { return (BitSet) liveNodes.clone(); }
        @Override public BitSet fedServices() { return (BitSet) fedServices.clone(); }
        /** Pipe edges carrying gas (present, main active, ends live). */
        @Override public BitSet liveEdges() { return (BitSet) liveEdges.clone(); }
        @Override public List<BitSet> stationServices() { return copyAll(stationServices); }
        @Override public List<BitSet> stationExclusive() { return copyAll(stationExclusive); }
        /** Per station, the live pipe edges reached from its outlet. */
        @Override public List<BitSet> stationEdges() { return copyAll(stationEdges); }
        @Override public long[] stationMeters() { return stationMeters.clone(); }
        @Override public long[] stationExclusiveMeters() { return stationExclusiveMeters.clone(); }
        @Override public BitSet multiFed() { return (BitSet) multiFed.clone(); }
        @Override public BitSet deadMains() { return (BitSet) deadMains.clone(); }

        public boolean isLive(int node) { return liveNodes.get(node); }
        public boolean isFed(int service) { return fedServices.get(service); }
        public boolean isEdgeLive(int edge) { return liveEdges.get(edge); }
        public boolean isMultiFed(int service) { return multiFed.get(service); }
        /** Whether station {@code st} of state s passes gas in this trace ({@link Passage#stationPasses}: in service, inlet live). */
        public boolean stationPasses(NetworkState s, int st) { return Passage.stationPasses(s, st, liveNodes); }
        public boolean isDeadMain(int main) { return deadMains.get(main); }
        public int stationCount() { return stationServices.size(); }
        public BitSet servicesFedThrough(int station) { return (BitSet) stationServices.get(station).clone(); }
        public BitSet servicesExclusiveTo(int station) { return (BitSet) stationExclusive.get(station).clone(); }
        public boolean isFedThrough(int service, int station) { return stationServices.get(station).get(service); }
        public boolean isExclusiveTo(int service, int station) { return stationExclusive.get(station).get(service); }

        /** Services not fed (unattached ones included). */
        @Override public BitSet unfedServices() { return (BitSet) unfedServices.clone(); }

        /** Stations that reach a service, in index order. */
        public int[] stationsFeeding(int service) {
            int c = 0;
            for (BitSet b : stationServices) if (b.get(service)) c++;
            int[] out = new int[c];
            c = 0;
            for (int st = 0; st < stationServices.size(); st++) if (stationServices.get(st).get(service)) out[c++] = st;
            return out;
        }
    }

    /**
     * Only which services have gas: one search from the sources through live pipe, open
     * valves and in-service stations, O(nodes + edges), without the per-station
     * attribution of {@link #run}. For what-if checks that need no more.
     */
    public static BitSet fedServices(NetworkState s) {
        Flow flow = new Flow(s, Progress.NONE);
        return flow.fedServices(flow.reach(flow.sourceNodes(), -1));
    }

    /**
     * Live nodes by one search of the node graph (not the segment graph) from the
     * sources not in {@code shutSources} (source indices; may be null): the independent
     * path the instruction check re-traces with. O(nodes + edges).
     */
    public static BitSet liveNodes(NetworkState s, BitSet shutSources) {
        Flow flow = new Flow(s, Progress.NONE);
        int[] starts = flow.sourceNodes();
        if (shutSources != null) for (int i = 0; i < starts.length; i++) if (shutSources.get(i)) starts[i] = -1;
        return flow.reach(starts, -1);
    }

    /** Services fed when {@code liveNodes} are the live nodes of the state (on a live pipe edge with live ends). */
    public static BitSet fedServices(NetworkState s, BitSet liveNodes) {
        return new Flow(s, Progress.NONE).fedServices(liveNodes);
    }

    public static Result run(NetworkState s) {
        return run(s, Progress.NONE);
    }

    /**
     * The full trace with per-station attribution, computed on the valve-segment graph
     * ({@link StationAttribution}): O(nodes + edges + services) once, then per live
     * station two searches of the segment graph plus its output sets.
     */
    public static Result run(NetworkState s, Progress progress) {
        return StationAttribution.run(s, progress);
    }

    /** The same as {@link #run(NetworkState, Progress)} on valve segments already built for the state. */
    public static Result run(ValveSegments segments, Progress progress) {
        return StationAttribution.run(segments, progress);
    }

    static BitSet deadMains(NetworkState s, BitSet liveEdges) {
        BitSet hasLive = new BitSet(s.mainCount());
        for (int e = liveEdges.nextSetBit(0); e >= 0; e = liveEdges.nextSetBit(e + 1)) hasLive.set(s.edgeFeature(e));
        BitSet dead = new BitSet(s.mainCount());
        for (int i = 0; i < s.mainCount(); i++) if (s.mainActive(i) && !hasLive.get(i)) dead.set(i);
        return dead;
    }
}
