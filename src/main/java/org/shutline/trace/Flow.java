package org.shutline.trace;

import java.util.BitSet;
import org.shutline.model.Progress;
import org.shutline.topology.EdgeKind;
import org.shutline.topology.Graph;

/**
 * Breadth-first gas flow over one {@link NetworkState} by the {@link Passage} rule:
 * through pipe edges of active mains, open valves, and in-service stations from inlet to
 * outlet only. The state's flags are read once ({@link Passage#of}); the queue and adjacency buffer are reused, so one
 * flow costs O(nodes + edges) and allocates only its result BitSet.
 */
final class Flow {
    private final NetworkState s;
    private final Passage passage;
    private final int[] queue;
    private final int[] buf;
    private final Progress progress;

    Flow(NetworkState s, Progress progress) {
        this.s = s;
        this.progress = progress;
        passage = Passage.of(s);
        queue = new int[Math.max(1, s.nodeCount())];
        buf = s.adjacencyBuffer();
    }

    boolean mainActive(int main) {
        return passage.mainActive(main);
    }

    /** True when gas can pass edge e starting at node v ({@link Passage}). */
    boolean passes(int e, int v) {
        return passage.passes(e, v);
    }

    /**
     * Nodes reached from the given start nodes (negative entries ignored), never passing
     * station {@code blockedStation} (-1 for none).
     */
    BitSet reach(int[] starts, int blockedStation) {
        if (s.isBase()) return reachBase(starts, blockedStation);
        BitSet seen = new BitSet(s.nodeCount());
        int head = 0, tail = 0;
        for (int v : starts) {
            if (v >= 0 && !seen.get(v)) {
                seen.set(v);
                queue[tail++] = v;
            }
        }
        int steps = 0;
        while (head < tail) {
            int v = queue[head++];
            if ((++steps & 0xFFF) == 0) progress.checkCancelled();
            int c = s.incidentEdges(v, buf);
            for (int i = 0; i < c; i++) {
                int e = buf[i];
                if (!passes(e, v)) continue;
                if (blockedStation >= 0 && s.edgeKind(e) == EdgeKind.STATION && s.edgeFeature(e) == blockedStation) {
                    continue;
                }
                int w = s.opposite(e, v);
                if (!seen.get(w)) {
                    seen.set(w);
                    queue[tail++] = w;
                }
            }
        }
        return seen;
    }

    /**
     * {@link #reach} on a state with no overlay: reads the base's packed flow adjacency
     * ({@link NetworkState#baseFlowAdjacency()}, one sequential array per node) with a
     * boolean array for the visited nodes; same rules and same result.
     */
    private BitSet reachBase(int[] starts, int blockedStation) {
        Graph g = s.graph();
        long[] adj = s.baseFlowAdjacency();
        if (adj == null) return reachBaseEdges(starts, blockedStation);
        int n = g.nodeCount();
        boolean[] seen = new boolean[n];
        int head = 0, tail = 0;
        for (int v : starts) {
            if (v >= 0 && !seen[v]) {
                seen[v] = true;
                queue[tail++] = v;
            }
        }
        while (head < tail) {
            int v = queue[head++];
            if ((head & 0xFFF) == 0) progress.checkCancelled();
            for (int i = g.adjStart(v), end = g.adjEnd(v); i < end; i++) {
                long c = adj[i];
                int w = (int) c;
                if (seen[w]) continue;
                int f = (int) (c >>> 34);
                int code = (int) (c >>> 32) & 3;
                // the direction part of the rule is in the code (a station only from its inlet); the open part here
                boolean pass = code != NetworkState.FLOW_NONE && passage.isOpen(NetworkState.FLOW_KIND[code], f)
                        && (code != NetworkState.FLOW_STATION_OUT || f != blockedStation);
                if (pass) {
                    seen[w] = true;
                    queue[tail++] = w;
                }
            }
        }
        BitSet out = new BitSet(n);
        for (int i = 0; i < tail; i++) out.set(queue[i]);
        return out;
    }

    /**
     * {@link #reachBase} reading the frozen graph's edge arrays, for a graph whose
     * features do not fit the packed adjacency.
     */
    private BitSet reachBaseEdges(int[] starts, int blockedStation) {
        Graph g = s.graph();
        BitSet seen = new BitSet(g.nodeCount());
        int head = 0, tail = 0;
        for (int v : starts) {
            if (v >= 0 && !seen.get(v)) {
                seen.set(v);
                queue[tail++] = v;
            }
        }
        int steps = 0;
        while (head < tail) {
            int v = queue[head++];
            if ((++steps & 0xFFF) == 0) progress.checkCancelled();
            for (int i = g.adjStart(v), end = g.adjEnd(v); i < end; i++) {
                int e = g.adjEdge(i);
                int f = g.edgeFeature(e);
                byte k = g.edgeKind(e);
                if (!Passage.passes(k, passage.isOpen(k, f), g.edgeFrom(e), g.edgeTo(e), v)) continue;
                if (k == EdgeKind.STATION && f == blockedStation) continue;
                int w = g.opposite(e, v);
                if (!seen.get(w)) {
                    seen.set(w);
                    queue[tail++] = w;
                }
            }
        }
        return seen;
    }

    /** Services fed when {@code live} is the set of live nodes: on a live pipe edge with live ends. */
    BitSet fedServices(BitSet live) {
        BitSet fed = new BitSet(s.serviceCount());
        if (s.isBase()) {
            Graph g = s.graph();
            for (int i = 0, n = g.serviceCount(); i < n; i++) {
                int e = g.serviceEdge(i);
                if (e >= 0 && g.edgeKind(e) == EdgeKind.PIPE && passage.mainActive(g.edgeFeature(e)) && live.get(g.edgeFrom(e))) fed.set(i);
            }
            return fed;
        }
        for (int i = 0; i < s.serviceCount(); i++) {
            int e = s.serviceEdge(i);
            if (e < 0 || s.isRemoved(e) || s.edgeKind(e) != EdgeKind.PIPE) continue;
            if (passage.mainActive(s.edgeFeature(e)) && live.get(s.edgeFrom(e))) fed.set(i);
        }
        return fed;
    }

    int[] sourceNodes() {
        int[] a = new int[s.sourceCount()];
        for (int i = 0; i < a.length; i++) a[i] = s.sourceNode(i);
        return a;
    }
}
