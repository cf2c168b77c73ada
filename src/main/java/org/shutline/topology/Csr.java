package org.shutline.topology;

import java.util.Arrays;

/**
 * Compressed lists (CSR, "compressed sparse row"): the items of key {@code k} are
 * {@code items[start[k]] .. items[start[k + 1] - 1]}. The one builder of every
 * adjacency and grouping array in the engine: graph and segment-graph adjacency, mains'
 * edges, services and edges by segment, grid cells, dominator-tree children and
 * predecessors.
 *
 * <p>Method: counting sort, two passes over the (key, item) pairs: count per key,
 * prefix sums, then fill; items keep the order in which the pairs are given within a
 * key. O(keys + pairs) time, no boxing, no sorting.
 *
 * <p>The arrays are the builder's output, made fresh for the caller, which keeps them as
 * its own (held privately, never handed out); a {@code Csr} is not a shared value.
 */
public record Csr(int[] start, int[] items) {

    /** Receives one (key, item) pair. */
    @FunctionalInterface
    public interface Sink {
        void add(int key, int item);
    }

    /**
     * Gives the pairs to a {@link Sink}; called twice (count, then fill), so it must give
     * the same pairs in the same order each time.
     */
    @FunctionalInterface
    public interface Pairs {
        void each(Sink sink);
    }

    /** Number of keys. */
    public int keyCount() { return start.length - 1; }

    /** Number of items of key k. */
    public int count(int key) { return start[key + 1] - start[key]; }

    /** The pairs given by {@code pairs} grouped by key ({@code 0 <= key < keys}), items in the order given. */
    public static Csr build(int keys, Pairs pairs) {
        int[] start = new int[keys + 1];
        pairs.each((key, item) -> start[key + 1]++);
        for (int k = 0; k < keys; k++) start[k + 1] += start[k];
        int[] items = new int[start[keys]];
        int[] fill = Arrays.copyOf(start, keys);
        pairs.each((key, item) -> items[fill[key]++] = item);
        return new Csr(start, items);
    }

    /** Items {@code 0..keyOf.length-1} grouped by {@code keyOf[i]} (negative keys left out), ascending within a key. */
    public static Csr group(int[] keyOf, int keys) {
        return build(keys, sink -> {
            for (int i = 0; i < keyOf.length; i++) if (keyOf[i] >= 0) sink.add(keyOf[i], i);
        });
    }

    /**
     * Undirected incidence of {@code count} links between {@code nodes} nodes: link i is
     * listed at node {@code a[i]} and at node {@code b[i]} (once when they are the same
     * node), links ascending at each node.
     */
    public static Csr incidence(int nodes, int[] a, int[] b, int count) {
        return build(nodes, sink -> {
            for (int i = 0; i < count; i++) {
                sink.add(a[i], i);
                if (b[i] != a[i]) sink.add(b[i], i);
            }
        });
    }

    /** The reverse of successor lists: for every arc v -> w, v listed at w; predecessors ascending. */
    public static Csr reverse(int[] succStart, int[] succ) {
        int n = succStart.length - 1;
        return build(n, sink -> {
            for (int v = 0; v < n; v++) for (int i = succStart[v]; i < succStart[v + 1]; i++) sink.add(succ[i], v);
        });
    }
}
