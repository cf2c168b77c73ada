package org.shutline.analysis;

import java.util.Arrays;

/** Small CSR helper: group items 0..n-1 by an int key (negative keys left out). */
final class Csr {
    private Csr() {}

    static int[][] group(int[] keyOf, int keys) {
        int[] start = new int[keys + 1];
        for (int k : keyOf) if (k >= 0) start[k + 1]++;
        for (int i = 0; i < keys; i++) start[i + 1] += start[i];
        int[] list = new int[start[keys]];
        int[] fill = Arrays.copyOf(start, keys);
        for (int i = 0; i < keyOf.length; i++) if (keyOf[i] >= 0) list[fill[keyOf[i]]++] = i;
        return new int[][] {start, list};
    }
}
