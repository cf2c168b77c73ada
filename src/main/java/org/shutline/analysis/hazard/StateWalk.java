package org.shutline.analysis.hazard;

import org.shutline.trace.Passage;
import org.shutline.trace.NetworkState;

/**
 * Connectivity over a state's pipe: present pipe of active mains and open valves, never
 * stations. O(nodes + edges) for the whole state, iterative.
 */
final class StateWalk {
    private StateWalk() {}

    /**
     * Connected pieces of a state over present pipe of active mains and open valves
     * (stations not crossed): the representative node of each node's piece, by a
     * union-find with path halving, O(edges) for the whole state.
     */
    static int[] pieces(NetworkState s) {
        int n = s.nodeCount();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;
        for (int e = 0, m = s.edgeCount(); e < m; e++) {
            if (!passable(s, e)) continue;
            int a = find(parent, s.edgeFrom(e)), b = find(parent, s.edgeTo(e));
            if (a != b) parent[Math.max(a, b)] = Math.min(a, b);
        }
        for (int i = 0; i < n; i++) parent[i] = find(parent, i);
        return parent;
    }

    static int find(int[] p, int x) {
        while (p[x] != x) {
            p[x] = p[p[x]];
            x = p[x];
        }
        return x;
    }

    /** Gas passes e either way ({@link Passage#passesBothWays}): present open pipe or valve, never a station. */
    static boolean passable(NetworkState s, int e) {
        return Passage.passesBothWays(s, e);
    }

}
