package org.shutline.trace;

import java.util.Arrays;

/**
 * An immutable sorted map from int keys to an int and a double value, for the few
 * overrides of a {@link NetworkState}. {@link #with} copies the arrays (O(k) for k
 * entries), lookups are binary searches (O(log k)); no boxing.
 */
final class SparseMap {
    static final SparseMap EMPTY = new SparseMap(new int[0], new int[0], new double[0]);

    private final int[] keys;
    private final int[] ints;
    private final double[] doubles;

    private SparseMap(int[] keys, int[] ints, double[] doubles) {
        this.keys = keys;
        this.ints = ints;
        this.doubles = doubles;
    }

    int size() {
        return keys.length;
    }

    boolean isEmpty() {
        return keys.length == 0;
    }

    int indexOf(int key) {
        return keys.length == 0 ? -1 : Arrays.binarySearch(keys, key);
    }

    boolean contains(int key) {
        return indexOf(key) >= 0;
    }

    /** The int value of {@code key}, or {@code absent}. */
    int getInt(int key, int absent) {
        int i = indexOf(key);
        return i >= 0 ? ints[i] : absent;
    }

    double getDouble(int key, double absent) {
        int i = indexOf(key);
        return i >= 0 ? doubles[i] : absent;
    }

    int keyAt(int i) {
        return keys[i];
    }

    int intAt(int i) {
        return ints[i];
    }

    double doubleAt(int i) {
        return doubles[i];
    }

    SparseMap with(int key, int value) {
        return with(key, value, 0.0);
    }

    SparseMap with(int key, int value, double d) {
        int i = indexOf(key);
        if (i >= 0) {
            int[] v = ints.clone();
            double[] dv = doubles.clone();
            v[i] = value;
            dv[i] = d;
            return new SparseMap(keys, v, dv);
        }
        int at = -i - 1;
        int n = keys.length;
        int[] k = new int[n + 1];
        int[] v = new int[n + 1];
        double[] dv = new double[n + 1];
        System.arraycopy(keys, 0, k, 0, at);
        System.arraycopy(ints, 0, v, 0, at);
        System.arraycopy(doubles, 0, dv, 0, at);
        k[at] = key;
        v[at] = value;
        dv[at] = d;
        System.arraycopy(keys, at, k, at + 1, n - at);
        System.arraycopy(ints, at, v, at + 1, n - at);
        System.arraycopy(doubles, at, dv, at + 1, n - at);
        return new SparseMap(k, v, dv);
    }

    SparseMap without(int key) {
        int i = indexOf(key);
        if (i < 0) return this;
        int n = keys.length;
        int[] k = new int[n - 1];
        int[] v = new int[n - 1];
        double[] dv = new double[n - 1];
        System.arraycopy(keys, 0, k, 0, i);
        System.arraycopy(ints, 0, v, 0, i);
        System.arraycopy(doubles, 0, dv, 0, i);
        System.arraycopy(keys, i + 1, k, i, n - i - 1);
        System.arraycopy(ints, i + 1, v, i, n - i - 1);
        System.arraycopy(doubles, i + 1, dv, i, n - i - 1);
        return new SparseMap(k, v, dv);
    }
}
