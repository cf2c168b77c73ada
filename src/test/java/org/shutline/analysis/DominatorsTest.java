package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.shutline.topology.Csr;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class DominatorsTest {

    private static Dominators of(int n, int[][] arcs) {
        Csr g = Csr.build(n, sink -> {
            for (int[] arc : arcs) sink.add(arc[0], arc[1]);
        });
        return new Dominators(n, g.start(), g.items());
    }

    /*
     * A small irreducible graph: the loop 1 <-> 3 <-> 4 is entered both at 1 and at 4.
     * Answers by hand:
     *
     *        0
     *       / \
     *      1   2        1 <-> 3 <-> 4 <- 2 and 2 -> 5 -> 4: every node's idom is 0
     *      |   | \      except 5 (idom 2).
     *      3 - 4 - 5
     */
    @Test
    void irreducibleGraphWorkedByHand() {
        Dominators d = of(6, new int[][] {{0, 1}, {0, 2}, {1, 3}, {3, 1}, {3, 4}, {4, 3}, {2, 4}, {2, 5}, {5, 4}});
        assertThat(d.idom).containsExactly(0, 0, 0, 0, 0, 2);
        assertThat(d.dominates(2, 5)).isTrue();
        assertThat(d.dominates(2, 4)).isFalse();
        assertThat(d.nearestCommonDominator(5, 3)).isEqualTo(0);
    }

    static long[] seeds() {
        long[] s = new long[200];
        for (int i = 0; i < s.length; i++) s[i] = 300 + i;
        return s;
    }

    /** Against the definition: a dominates b iff b is unreachable from 0 once a is removed. */
    @ParameterizedTest
    @MethodSource("seeds")
    void matchesTheDefinitionOnRandomDigraphs(long seed) {
        Random rnd = new Random(seed);
        int n = 2 + rnd.nextInt(12);
        List<int[]> arcs = new ArrayList<>();
        int m = rnd.nextInt(3 * n);
        for (int i = 0; i < m; i++) arcs.add(new int[] {rnd.nextInt(n), rnd.nextInt(n)});
        int[][] a = arcs.toArray(new int[0][]);
        Dominators d = of(n, a);
        BitSet all = reach(n, a, -1);
        for (int x = 0; x < n; x++) {
            assertThat(d.isReachable(x)).as("seed %d node %d", seed, x).isEqualTo(all.get(x));
            if (!all.get(x) || x == 0) continue;
            BitSet without = reach(n, a, x);
            for (int y = 0; y < n; y++) {
                if (!all.get(y)) continue;
                boolean dominated = y == x || !without.get(y);
                assertThat(d.dominates(x, y)).as("seed %d: %d dom %d", seed, x, y).isEqualTo(dominated);
            }
        }
    }

    private static BitSet reach(int n, int[][] arcs, int removed) {
        BitSet seen = new BitSet(n);
        if (removed == 0) return seen;
        seen.set(0);
        boolean grew = true;
        while (grew) {
            grew = false;
            for (int[] e : arcs) {
                if (seen.get(e[0]) && e[1] != removed && !seen.get(e[1])) {
                    seen.set(e[1]);
                    grew = true;
                }
            }
        }
        return seen;
    }
}
