package org.shutline.topology;

import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Main;
import org.shutline.model.Severity;

/**
 * Finds interior vertices (not first or last of a part) that two or more different
 * mains share at exactly the same coordinates: a {@code shared-interior-vertex} note,
 * one per location, naming the mains (sorted). Mains are never joined there.
 *
 * <p>Method: a hash of each interior vertex's coordinates packed with its index into
 * a long, one primitive sort, then exact comparison within equal-hash runs:
 * O(V log V) for V interior vertices, no all-pairs scan.
 */
final class SharedVertexCheck {
    private SharedVertexCheck() {}

    static void run(List<Main> mains, LineSet lines, Findings out) {
        int total = 0;
        for (int l = 0; l < lines.count(); l++) {
            if (lines.length(l) > 0) total += Math.max(0, lines.vertexCount(l) - 2);
        }
        double[] vx = new double[total];
        double[] vy = new double[total];
        int[] vl = new int[total];
        long[] keys = new long[total];
        int k = 0;
        for (int l = 0; l < lines.count(); l++) {
            if (lines.length(l) == 0) continue;
            for (int i = 1; i < lines.vertexCount(l) - 1; i++) {
                vx[k] = lines.x(l, i) + 0.0; // turns -0.0 into 0.0
                vy[k] = lines.y(l, i) + 0.0;
                vl[k] = l;
                keys[k] = ((long) hash(vx[k], vy[k]) << 32) | k;
                k++;
            }
        }
        Arrays.sort(keys);
        boolean[] done = new boolean[total];
        int i = 0;
        while (i < total) {
            int j = i;
            while (j < total && (keys[j] >>> 32) == (keys[i] >>> 32)) j++;
            for (int a = i; a < j; a++) {
                int va = (int) keys[a];
                if (done[va]) continue;
                TreeSet<String> ids = null;
                int mainA = lines.main(vl[va]);
                for (int b = a + 1; b < j; b++) {
                    int vb = (int) keys[b];
                    if (done[vb] || vx[vb] != vx[va] || vy[vb] != vy[va]) continue;
                    done[vb] = true;
                    int mainB = lines.main(vl[vb]);
                    if (mainB == mainA && ids == null) continue;
                    if (ids == null) {
                        ids = new TreeSet<>();
                        ids.add(mains.get(mainA).id());
                    }
                    ids.add(mains.get(mainB).id());
                }
                if (ids != null && ids.size() > 1) {
                    out.add(Finding.at(FindingCodes.SHARED_INTERIOR_VERTEX, Severity.NOTE, FindingCodes.MAINS,
                            vx[va], vy[va], "Mains " + String.join(", ", ids) + " share a vertex here, away from"
                                    + " their ends; mains join only at their ends, so they are not joined here"
                                    + " (a crossing). Confirm.", ids.toArray(new String[0])));
                }
            }
            i = j;
        }
    }

    private static int hash(double x, double y) {
        long h = Double.doubleToLongBits(x) * 0x9E3779B97F4A7C15L + Double.doubleToLongBits(y);
        h ^= h >>> 29;
        h *= 0xBF58476D1CE4E5B9L;
        h ^= h >>> 32;
        return (int) h;
    }
}
