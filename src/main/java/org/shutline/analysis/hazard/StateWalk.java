package org.shutline.analysis.hazard;

import java.util.BitSet;
import org.shutline.topology.EdgeKind;
import org.shutline.trace.NetworkState;

/**
 * Plain reachability over a state's pipe: from start nodes through present pipe of
 * active mains and open valves, never through stations. O(nodes + edges), iterative.
 */
final class StateWalk {
    private StateWalk() {}

    static BitSet reach(NetworkState s, int... starts) {
        BitSet seen = new BitSet(s.nodeCount());
        int[] stack = new int[Math.max(16, starts.length)];
        int top = 0;
        for (int v : starts) {
            if (v < 0 || seen.get(v)) continue;
            seen.set(v);
            if (top == stack.length) stack = java.util.Arrays.copyOf(stack, top * 2);
            stack[top++] = v;
        }
        int[] buf = s.adjacencyBuffer();
        while (top > 0) {
            int v = stack[--top];
            int n = s.incidentEdges(v, buf);
            for (int i = 0; i < n; i++) {
                int e = buf[i];
                if (!passable(s, e)) continue;
                int w = s.opposite(e, v);
                if (seen.get(w)) continue;
                seen.set(w);
                if (top == stack.length) stack = java.util.Arrays.copyOf(stack, top * 2);
                stack[top++] = w;
            }
        }
        return seen;
    }

    static boolean passable(NetworkState s, int e) {
        byte k = s.edgeKind(e);
        if (k == EdgeKind.PIPE) return s.pipeLive(e);
        if (k == EdgeKind.VALVE) return !s.isRemoved(e) && !s.valveClosed(s.edgeFeature(e));
        return false;
    }

    /** True when pipe edge e is reached: one of its ends is in {@code nodes} and the edge itself is passable. */
    static boolean edgeReached(NetworkState s, BitSet nodes, int e) {
        return passable(s, e) && (nodes.get(s.edgeFrom(e)) || nodes.get(s.edgeTo(e)));
    }
}
