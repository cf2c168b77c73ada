package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The one CSR builder: small cases worked by hand, and seeded random ones against lists of lists. */
class CsrTest {

    @Test
    void groupKeepsItemOrderAndLeavesOutNegativeKeys() {
        // item:   0  1   2  3  4  5
        // key:    2  0  -1  2  0  2   -> key 0: 1 4; key 1: none; key 2: 0 3 5
        Csr c = Csr.group(new int[] {2, 0, -1, 2, 0, 2}, 3);
        assertThat(c.start()).containsExactly(0, 2, 2, 5);
        assertThat(c.items()).containsExactly(1, 4, 0, 3, 5);
        assertThat(c.keyCount()).isEqualTo(3);
        assertThat(c.count(1)).isZero();
        assertThat(c.count(2)).isEqualTo(3);
    }

    /*
     * Links 0..3 between nodes 0..2, link 3 a loop at node 2:
     *
     *    0 --0-- 1 --1-- 2 (loop 3)
     *     \______2______/
     */
    @Test
    void incidenceListsALinkAtBothEndsAndALoopOnce() {
        Csr c = Csr.incidence(3, new int[] {0, 1, 0, 2}, new int[] {1, 2, 2, 2}, 4);
        assertThat(c.start()).containsExactly(0, 2, 4, 7);
        assertThat(c.items()).containsExactly(0, 2, 0, 1, 1, 2, 3);
    }

    @Test
    void reverseGivesPredecessorsAscending() {
        // arcs 0->1, 0->2, 1->2, 2->0
        Csr succ = Csr.build(3, sink -> {
            sink.add(0, 1);
            sink.add(0, 2);
            sink.add(1, 2);
            sink.add(2, 0);
        });
        Csr pred = Csr.reverse(succ.start(), succ.items());
        assertThat(pred.start()).containsExactly(0, 1, 2, 4);
        assertThat(pred.items()).containsExactly(2, 0, 0, 1);
    }

    @Test
    void emptyInputsGiveEmptyLists() {
        Csr c = Csr.group(new int[0], 0);
        assertThat(c.start()).containsExactly(0);
        assertThat(c.items()).isEmpty();
        assertThat(Csr.incidence(2, new int[0], new int[0], 0).start()).containsExactly(0, 0, 0);
    }

    @Test
    void randomPairsMatchListsOfLists() {
        for (long seed = 1; seed <= 200; seed++) {
            Random rnd = new Random(seed);
            int keys = 1 + rnd.nextInt(20), n = rnd.nextInt(80);
            int[] key = new int[n], item = new int[n];
            List<List<Integer>> expected = new ArrayList<>();
            for (int k = 0; k < keys; k++) expected.add(new ArrayList<>());
            for (int i = 0; i < n; i++) {
                key[i] = rnd.nextInt(keys);
                item[i] = rnd.nextInt(1000);
                expected.get(key[i]).add(item[i]);
            }
            Csr c = Csr.build(keys, sink -> {
                for (int i = 0; i < n; i++) sink.add(key[i], item[i]);
            });
            for (int k = 0; k < keys; k++) {
                List<Integer> got = new ArrayList<>();
                for (int i = c.start()[k]; i < c.start()[k + 1]; i++) got.add(c.items()[i]);
                assertThat(got).as("seed %d key %d", seed, k).isEqualTo(expected.get(k));
            }
        }
    }
}
