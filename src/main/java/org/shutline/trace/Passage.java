package org.shutline.trace;

import java.util.BitSet;
import org.shutline.model.MainStatus;
import org.shutline.topology.EdgeKind;

/**
 * The one rule for whether gas passes an edge of a {@link NetworkState} (or a link of its
 * {@link SegmentGraph}), used by every trace: the node-graph searches ({@link Flow},
 * {@link FeedTrace#liveNodes}), the packed base adjacency of {@link NetworkState}, the
 * valve segments and segment graph, and the engine's analyses and hazard checks.
 *
 * <ul>
 * <li>A removed edge passes nothing.</li>
 * <li>An edge is <em>open</em> when: a {@link EdgeKind#PIPE} edge's main is
 *     {@link MainStatus#ACTIVE}; a {@link EdgeKind#VALVE}'s valve is not closed; a
 *     {@link EdgeKind#STATION}'s station is in service ({@link #isOpen(NetworkState, byte, int)}).</li>
 * <li>Gas passes an open pipe or valve either way; an open station only from its inlet
 *     (the edge's from node, the link's A segment) to an outlet that is not the inlet
 *     itself ({@link #entersFrom}).</li>
 * </ul>
 *
 * <p>An instance reads the open facts of one state once into arrays
 * ({@link #of(NetworkState)}, O(mains + valves + stations + changes)) for searches that
 * test many edges; the static methods read the state directly (O(log k) for k changes),
 * for the few edges a hazard rule looks at. Both give the same answers (tested).
 */
public final class Passage {
    private final NetworkState s;
    private final boolean[] mainActive;
    private final BitSet closed;
    private final boolean[] stationOn;

    private Passage(NetworkState s) {
        this.s = s;
        byte[] st = s.mainStatusOrdinals();
        mainActive = new boolean[st.length];
        for (int i = 0; i < st.length; i++) mainActive[i] = st[i] == MainStatus.ACTIVE.ordinal();
        closed = s.closedValves();
        stationOn = new boolean[s.stationCount()];
        for (int i = 0; i < stationOn.length; i++) stationOn[i] = s.stationInService(i);
    }

    /** The open facts of state s, read once. */
    public static Passage of(NetworkState s) {
        return new Passage(s);
    }

    // ---- the rule ----

    /**
     * The direction part of the rule: whether gas can enter an edge or link of kind
     * {@code kind} with ends {@code from} and {@code to} at end {@code at}. Pipes and
     * valves: either end. Stations: only at the inlet {@code from}, and never when the
     * outlet is the inlet itself. Other kinds: never.
     */
    public static boolean entersFrom(byte kind, int from, int to, int at) {
        if (kind == EdgeKind.PIPE || kind == EdgeKind.VALVE) return true;
        return kind == EdgeKind.STATION && from == at && to != at;
    }

    /** The whole rule for a present edge or link: open, and entered at {@code at} by {@link #entersFrom}. */
    public static boolean passes(byte kind, boolean open, int from, int to, int at) {
        return open && entersFrom(kind, from, to, at);
    }

    /** True for the kinds gas passes either way (pipe and valve; a station passes one way only). */
    public static boolean twoWay(byte kind) {
        return kind == EdgeKind.PIPE || kind == EdgeKind.VALVE;
    }

    /** Whether the feature of an edge of kind {@code kind} is open in state s: main active, valve open, station in service. */
    public static boolean isOpen(NetworkState s, byte kind, int feature) {
        switch (kind) {
            case EdgeKind.PIPE:
                return s.mainActive(feature);
            case EdgeKind.VALVE:
                return !s.valveClosed(feature);
            case EdgeKind.STATION:
                return s.stationInService(feature);
            default:
                return false;
        }
    }

    /** Whether gas passes edge e of state s entering at node {@code at} (removed edges: no). */
    public static boolean passes(NetworkState s, int e, int at) {
        if (s.isRemoved(e)) return false;
        byte k = s.edgeKind(e);
        return passes(k, isOpen(s, k, s.edgeFeature(e)), s.edgeFrom(e), s.edgeTo(e), at);
    }

    /** Whether gas passes edge e of state s either way: a present, open pipe or valve (never a station). */
    public static boolean passesBothWays(NetworkState s, int e) {
        byte k = s.edgeKind(e);
        return twoWay(k) && !s.isRemoved(e) && isOpen(s, k, s.edgeFeature(e));
    }

    /**
     * Whether station {@code st} passes gas in state s when {@code liveNodes} are the live
     * nodes: attached, its edge present, in service, its inlet live.
     */
    public static boolean stationPasses(NetworkState s, int st, BitSet liveNodes) {
        int e = s.stationEdge(st);
        return e >= 0 && !s.isRemoved(e) && isOpen(s, EdgeKind.STATION, st) && liveNodes.get(s.edgeFrom(e));
    }

    // ---- the same rule on the facts read once ----

    /** {@link #isOpen(NetworkState, byte, int)} from the arrays read once. */
    public boolean isOpen(byte kind, int feature) {
        switch (kind) {
            case EdgeKind.PIPE:
                return mainActive[feature];
            case EdgeKind.VALVE:
                return !closed.get(feature);
            case EdgeKind.STATION:
                return stationOn[feature];
            default:
                return false;
        }
    }

    /** {@link #passes(NetworkState, int, int)} from the arrays read once. */
    public boolean passes(int e, int at) {
        if (s.isRemoved(e)) return false;
        byte k = s.edgeKind(e);
        return passes(k, isOpen(k, s.edgeFeature(e)), s.edgeFrom(e), s.edgeTo(e), at);
    }

    /** {@link #passesBothWays(NetworkState, int)} from the arrays read once. */
    public boolean passesBothWays(int e) {
        byte k = s.edgeKind(e);
        return twoWay(k) && !s.isRemoved(e) && isOpen(k, s.edgeFeature(e));
    }

    /** True when main {@code main} is active (its pipe edges are open). */
    public boolean mainActive(int main) {
        return mainActive[main];
    }

    public NetworkState state() {
        return s;
    }
}
