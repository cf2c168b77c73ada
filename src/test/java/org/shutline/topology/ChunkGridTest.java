package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.shutline.topology.LineSet.IntList;

/**
 * The grid index answers exactly what a scan of every box answers: the boxes meeting
 * the closed query rectangle, each once, ascending. Random boxes of mixed sizes (points,
 * short chunks, a few very long ones that go to the separate list), queries inside,
 * across the edges and outside the extent, and queries that touch a box exactly.
 */
class ChunkGridTest {

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12})
    void sameAsAScanOfAllBoxes(long seed) {
        Random rnd = new Random(seed);
        int n = 1 + rnd.nextInt(400);
        double[] ax = new double[n], ay = new double[n], bx = new double[n], by = new double[n];
        for (int i = 0; i < n; i++) {
            double x = rnd.nextDouble() * 1000, y = rnd.nextDouble() * 1000;
            double kind = rnd.nextDouble();
            double w = kind < 0.1 ? 0 : kind < 0.95 ? rnd.nextDouble() * 40 : rnd.nextDouble() * 900;
            double h = kind < 0.1 ? 0 : kind < 0.95 ? rnd.nextDouble() * 40 : rnd.nextDouble() * 900;
            ax[i] = x;
            ay[i] = y;
            bx[i] = x + w;
            by[i] = y + h;
        }
        ChunkGrid grid = new ChunkGrid(ax, ay, bx, by, n);
        IntList got = new IntList();
        for (int q = 0; q < 300; q++) {
            double x0, y0, x1, y1;
            if (q % 10 == 0) {
                int i = rnd.nextInt(n); // touching box i exactly at its corner
                x0 = bx[i];
                y0 = by[i];
                x1 = x0 + rnd.nextDouble() * 5;
                y1 = y0 + rnd.nextDouble() * 5;
            } else {
                x0 = rnd.nextDouble() * 1400 - 200;
                y0 = rnd.nextDouble() * 1400 - 200;
                double d = rnd.nextDouble() < 0.8 ? rnd.nextDouble() * 10 : rnd.nextDouble() * 500;
                x1 = x0 + d;
                y1 = y0 + d;
            }
            grid.query(x0, y0, x1, y1, got);
            List<Integer> expected = new ArrayList<>();
            for (int i = 0; i < n; i++) if (!(ax[i] > x1 || bx[i] < x0 || ay[i] > y1 || by[i] < y0)) expected.add(i);
            List<Integer> actual = new ArrayList<>();
            for (int i = 0; i < got.size(); i++) actual.add(got.get(i));
            assertThat(actual).as("seed %d query %d", seed, q).isEqualTo(expected);
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1})
    void emptyAndSinglePointSets(int n) {
        double[] a = new double[n];
        for (int i = 0; i < n; i++) a[i] = 5;
        ChunkGrid grid = new ChunkGrid(a, a, a, a, n);
        IntList got = new IntList();
        grid.query(4, 4, 6, 6, got);
        assertThat(got.size()).isEqualTo(n);
        grid.query(6.5, 6.5, 7, 7, got);
        assertThat(got.size()).isZero();
    }
}
