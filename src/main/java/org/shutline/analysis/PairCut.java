package org.shutline.analysis;

import org.shutline.topology.Csr;
import java.util.Arrays;

/**
 * Services and meters lost when two nodes a and b of a flow graph are both removed
 * (a valve failing between two isolation units), exactly, given the graph's dominator
 * tree from root 0.
 *
 * <p>If one dominates the other, the loss is the dominator's subtree. Otherwise the
 * lost set L is sub(a) + sub(b) + E, where E are the nodes every root path reaches only
 * through a or b. E is found locally:
 * <ul>
 * <li>Only successors of lost nodes can be lost (a successor of a survivor survives), so
 *     candidates are found by a forward search from sub(a) and sub(b) that expands lost
 *     nodes only.</li>
 * <li>A candidate y is decided by a backward search from y avoiding a and b: it survives
 *     as soon as the search meets a <em>certified</em> node, one whose path in a fixed
 *     BFS spanning tree from the root passes neither a nor b (an interval test on the
 *     tree's preorder); the nodes on the path back to y survive too. If the search is
 *     exhausted, the visited set is closed under predecessors and misses the root: all
 *     of it is lost.</li>
 * </ul>
 * In meshed layouts each backward search stops within a step or two, so a case costs
 * about |sub(a)| + |sub(b)| plus their arcs. The work is capped at twice the size of
 * the subtree of c, the nearest common dominator of a and b; past the cap the case
 * falls back to one BFS from c inside c's subtree (edges enter that subtree only at c,
 * and every lost node lies in it), so a case never costs more than O(size of c's
 * subtree and its arcs), which is O(N + E) in the worst case.
 */
final class PairCut {
    private static final byte LOST = 1, SURVIVES = 2;

    private final Dominators dom;
    private final int[] start, succ, pstart, pred;
    private final long[] svc, met, subSvc, subMet;
    private final int[] tpre, tsize;
    private final long[] workPrefix;
    private final int[] statusEpoch, visitEpoch, parent;
    private final byte[] status;
    private final int[] fwd, rev;
    private int epoch, visit;
    /** False only in tests, to check the fallback against the local method. */
    boolean localAllowed = true;
    long services, meters;

    PairCut(Dominators dom, int[] start, int[] succ, long[] svc, long[] met, long[] subSvc, long[] subMet) {
        this.dom = dom;
        this.start = start;
        this.succ = succ;
        this.svc = svc;
        this.met = met;
        this.subSvc = subSvc;
        this.subMet = subMet;
        int n = dom.n;
        Csr preds = Csr.reverse(start, succ);
        pstart = preds.start();
        pred = preds.items();
        tpre = new int[n];
        tsize = new int[n];
        spanningTree();
        workPrefix = new long[dom.reachable + 1];
        for (int k = 0; k < dom.reachable; k++) {
            int v = dom.preorder[k];
            workPrefix[k + 1] = workPrefix[k] + 1 + (start[v + 1] - start[v]) + (pstart[v + 1] - pstart[v]);
        }
        statusEpoch = new int[n];
        visitEpoch = new int[n];
        parent = new int[n];
        status = new byte[n];
        fwd = new int[n];
        rev = new int[n];
    }

    /** BFS tree from the root: preorder numbers and subtree sizes (unreached nodes: size 0). */
    private void spanningTree() {
        int n = dom.n;
        int[] par = new int[n];
        Arrays.fill(par, -1);
        int[] queue = new int[n];
        boolean[] seen = new boolean[n];
        int head = 0, tail = 0;
        queue[tail++] = 0;
        seen[0] = true;
        while (head < tail) {
            int v = queue[head++];
            for (int i = start[v]; i < start[v + 1]; i++) {
                int w = succ[i];
                if (!seen[w]) {
                    seen[w] = true;
                    par[w] = v;
                    queue[tail++] = w;
                }
            }
        }
        Csr tree = Csr.group(par, n);
        int[] kidStart = tree.start(), kids = tree.items();
        Arrays.fill(tpre, -1);
        int[] stack = new int[Math.max(1, tail)];
        int[] order = new int[tail];
        int top = 0, c = 0;
        stack[top++] = 0;
        while (top > 0) {
            int v = stack[--top];
            tpre[v] = c;
            order[c++] = v;
            for (int i = kidStart[v]; i < kidStart[v + 1]; i++) stack[top++] = kids[i];
        }
        for (int k = c - 1; k >= 0; k--) {
            int v = order[k];
            tsize[v] += 1;
            if (par[v] >= 0) tsize[par[v]] += tsize[v];
        }
    }

    private boolean treeBelow(int x, int v) {
        return tpre[x] <= tpre[v] && tpre[v] < tpre[x] + tsize[x];
    }

    /** Loss when a and b are removed, into {@link #services} and {@link #meters}. */
    void compute(int a, int b) {
        boolean ra = dom.isReachable(a), rb = dom.isReachable(b);
        if (!ra && !rb) {
            services = meters = 0;
        } else if (!rb || (ra && dom.dominates(a, b))) {
            services = subSvc[a];
            meters = subMet[a];
        } else if (!ra || dom.dominates(b, a)) {
            services = subSvc[b];
            meters = subMet[b];
        } else {
            int c = dom.nearestCommonDominator(a, b);
            long cap = 2 * (workPrefix[dom.pre[c] + dom.size[c]] - workPrefix[dom.pre[c]]) + 64;
            if (!localAllowed || !local(a, b, cap)) survivorsFrom(c, a, b);
        }
    }

    private boolean inS(int v, int a, int b) {
        return dom.dominates(a, v) || dom.dominates(b, v);
    }

    private boolean decided(int v) {
        return statusEpoch[v] == epoch;
    }

    private void setStatus(int v, byte s) {
        statusEpoch[v] = epoch;
        status[v] = s;
    }

    /** The local method; false when the work cap was reached (the result is then not set). */
    private boolean local(int a, int b, long cap) {
        epoch++;
        long lostSvc = subSvc[a] + subSvc[b], lostMet = subMet[a] + subMet[b];
        long work = 0;
        int tail = 0;
        for (int root : new int[] {a, b}) {
            for (int k = dom.pre[root]; k < dom.pre[root] + dom.size[root]; k++) {
                int u = dom.preorder[k];
                for (int i = start[u]; i < start[u + 1]; i++) {
                    int w = succ[i];
                    work++;
                    if (!inS(w, a, b) && !decided(w)) {
                        setStatus(w, (byte) 0);
                        fwd[tail++] = w;
                    }
                }
            }
            if (work > cap) return false;
        }
        int head = 0;
        while (head < tail) {
            int y = fwd[head++];
            if (status[y] != 0) continue;
            int visited = backward(y, a, b, cap - work);
            if (visited < 0) return false;
            work += visited;
            if (status[y] == LOST) {
                for (int k = 0; k < visited; k++) {
                    int v = rev[k];
                    lostSvc += svc[v];
                    lostMet += met[v];
                    for (int i = start[v]; i < start[v + 1]; i++) {
                        int w = succ[i];
                        if (!inS(w, a, b) && !decided(w)) {
                            setStatus(w, (byte) 0);
                            fwd[tail++] = w;
                        }
                    }
                }
            }
            if (work > cap) return false;
        }
        services = lostSvc;
        meters = lostMet;
        return true;
    }

    /**
     * Backward search from y avoiding a, b and the subtrees of a and b. Marks y (and the
     * path to the certificate) SURVIVES, or every visited node LOST (they are left in
     * rev[0..count)). Returns the count visited, or -1 when over {@code budget}.
     */
    private int backward(int y, int a, int b, long budget) {
        visit++;
        int head = 0, tail = 0;
        rev[tail++] = y;
        visitEpoch[y] = visit;
        parent[y] = -1;
        long work = 0;
        while (head < tail) {
            int v = rev[head++];
            boolean certified = (decided(v) && status[v] == SURVIVES) || (!treeBelow(a, v) && !treeBelow(b, v));
            if (certified) {
                for (int x = v; x >= 0; x = parent[x]) setStatus(x, SURVIVES);
                return tail;
            }
            for (int i = pstart[v]; i < pstart[v + 1]; i++) {
                int p = pred[i];
                if (++work > budget) return -1;
                if (p == a || p == b || visitEpoch[p] == visit || !dom.isReachable(p)) continue;
                if (decided(p) && status[p] == LOST) continue;
                if (inS(p, a, b)) continue;
                visitEpoch[p] = visit;
                parent[p] = v;
                rev[tail++] = p;
            }
        }
        for (int k = 0; k < tail; k++) setStatus(rev[k], LOST);
        return tail;
    }

    /** Fallback: loss = c's subtree minus what a BFS from c inside it, avoiding a and b, reaches. */
    private void survivorsFrom(int c, int a, int b) {
        visit++;
        long s = 0, m = 0;
        int head = 0, tail = 0;
        rev[tail++] = c;
        visitEpoch[c] = visit;
        visitEpoch[a] = visit;
        visitEpoch[b] = visit;
        while (head < tail) {
            int v = rev[head++];
            s += svc[v];
            m += met[v];
            for (int i = start[v]; i < start[v + 1]; i++) {
                int w = succ[i];
                if (visitEpoch[w] == visit || !dom.isReachable(w) || !dom.dominates(c, w)) continue;
                visitEpoch[w] = visit;
                rev[tail++] = w;
            }
        }
        services = subSvc[c] - s;
        meters = subMet[c] - m;
    }
}
