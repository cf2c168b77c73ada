package org.shutline.topology;

import java.util.Arrays;

/**
 * Disjoint sets over ints {@code 0..size()-1} that can grow, with path halving and
 * union by size: near-constant amortised time per operation (Tarjan, 1975). Iterative,
 * no recursion.
 */
final class UnionFind {
    private int[] parent;
    private int[] size;
    private int count;

    UnionFind(int initial) {
        parent = new int[Math.max(16, initial)];
        size = new int[parent.length];
        for (int i = 0; i < initial; i++) add();
    }

    /** Adds a new singleton set and returns its element. */
    int add() {
        if (count == parent.length) {
            parent = Arrays.copyOf(parent, count * 2);
            size = Arrays.copyOf(size, count * 2);
        }
        parent[count] = count;
        size[count] = 1;
        return count++;
    }

    int size() {
        return count;
    }

    int find(int a) {
        while (parent[a] != a) {
            parent[a] = parent[parent[a]];
            a = parent[a];
        }
        return a;
    }

    void union(int a, int b) {
        int ra = find(a);
        int rb = find(b);
        if (ra == rb) return;
        if (size[ra] < size[rb]) {
            int t = ra;
            ra = rb;
            rb = t;
        }
        parent[rb] = ra;
        size[ra] += size[rb];
    }

    /** Number of elements in the set of {@code a}. */
    int setSize(int a) {
        return size[find(a)];
    }
}
