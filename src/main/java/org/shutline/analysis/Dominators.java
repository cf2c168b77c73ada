package org.shutline.analysis;

import org.shutline.topology.Csr;
import java.util.Arrays;

/**
 * Dominator tree of a directed graph given as CSR successor lists, from root 0, by the
 * iterative algorithm of Cooper, Harvey and Kennedy, "A Simple, Fast Dominance
 * Algorithm" (Software Practice and Experience, 2001): nodes in reverse postorder,
 * {@code idom} refined by intersecting predecessors' dominator chains by postorder
 * number until nothing changes. O(N + E) per pass; a few passes on network graphs
 * (the paper's bound is O(N^2) in the worst case). Iterative DFS, int arrays only.
 *
 * <p>After the tree: preorder numbers and subtree sizes, so "a dominates b" is an
 * interval test, and depths for nearest common dominators. Unreachable nodes have
 * {@code idom = -1} and belong to no subtree.
 */
final class Dominators {
    final int n;
    final int[] idom;
    final int[] pre;
    final int[] size;
    final int[] depth;
    /** Nodes in preorder of the dominator tree (reachable ones only). */
    final int[] preorder;
    final int reachable;

    Dominators(int n, int[] succStart, int[] succ) {
        this.n = n;
        Csr preds = Csr.reverse(succStart, succ);
        int[] predStart = preds.start(), pred = preds.items();
        int[] post = new int[n];
        Arrays.fill(post, -1);
        int[] order = new int[n];
        int count = postorder(succStart, succ, post, order);
        reachable = count;
        idom = new int[n];
        Arrays.fill(idom, -1);
        idom[0] = 0;
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int k = count - 2; k >= 0; k--) { // reverse postorder, root (last) skipped
                int b = order[k];
                int nd = -1;
                for (int i = predStart[b]; i < predStart[b + 1]; i++) {
                    int p = pred[i];
                    if (idom[p] < 0) continue;
                    nd = nd < 0 ? p : intersect(p, nd, post);
                }
                if (idom[b] != nd) {
                    idom[b] = nd;
                    changed = true;
                }
            }
        }
        pre = new int[n];
        size = new int[n];
        depth = new int[n];
        Arrays.fill(pre, -1);
        preorder = new int[count];
        treeOrder();
    }

    private int intersect(int a, int b, int[] post) {
        while (a != b) {
            while (post[a] < post[b]) a = idom[a];
            while (post[b] < post[a]) b = idom[b];
        }
        return a;
    }

    /** Iterative DFS from 0: post[v] numbers, order[post] = v; returns the count reached. */
    private static int postorder(int[] start, int[] succ, int[] post, int[] order) {
        int n = post.length;
        int[] stack = new int[n];
        int[] next = new int[n];
        boolean[] seen = new boolean[n];
        int top = 0, c = 0;
        stack[top++] = 0;
        seen[0] = true;
        next[0] = start[0];
        while (top > 0) {
            int v = stack[top - 1];
            if (next[v] < start[v + 1]) {
                int w = succ[next[v]++];
                if (!seen[w]) {
                    seen[w] = true;
                    next[w] = start[w];
                    stack[top++] = w;
                }
            } else {
                top--;
                post[v] = c;
                order[c++] = v;
            }
        }
        return c;
    }

    /** Preorder, subtree sizes and depths of the dominator tree; iterative. */
    private void treeOrder() {
        Csr tree = Csr.group(idom, n);
        int[] kidStart = tree.start(), kids = tree.items();
        int[] stack = new int[Math.max(1, reachable)];
        int top = 0, c = 0;
        stack[top++] = 0;
        while (top > 0) {
            int v = stack[--top];
            pre[v] = c;
            preorder[c++] = v;
            for (int i = kidStart[v]; i < kidStart[v + 1]; i++) {
                int w = kids[i];
                if (w == v) continue;
                depth[w] = depth[v] + 1;
                stack[top++] = w;
            }
        }
        for (int k = c - 1; k >= 0; k--) {
            int v = preorder[k];
            size[v] += 1;
            if (v != 0) size[idom[v]] += size[v];
        }
    }

    boolean isReachable(int v) {
        return idom[v] >= 0;
    }

    /** True when a dominates b (a node dominates itself); both must be reachable. */
    boolean dominates(int a, int b) {
        return pre[a] <= pre[b] && pre[b] < pre[a] + size[a];
    }

    int nearestCommonDominator(int a, int b) {
        while (depth[a] > depth[b]) a = idom[a];
        while (depth[b] > depth[a]) b = idom[b];
        while (a != b) {
            a = idom[a];
            b = idom[b];
        }
        return a;
    }

    /** Sums of a per-node weight over each dominator subtree. */
    long[] subtreeSums(long[] weight) {
        long[] s = new long[n];
        for (int k = reachable - 1; k >= 0; k--) {
            int v = preorder[k];
            s[v] += weight[v];
            if (v != 0) s[idom[v]] += s[v];
        }
        return s;
    }
}
