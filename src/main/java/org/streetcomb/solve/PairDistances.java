package org.streetcomb.solve;

import java.util.Arrays;

/**
 * Candidate pairs of the matching and their distances: an open-addressing hash map from non-negative long
 * keys to doubles (linear probing, load at most a half). A {@code HashMap<Long, Double>} boxes both and
 * spent a tenth of the solve on town-like grids in hashing and resizing.
 */
final class PairDistances {

    private static final long EMPTY = -1;

    private long[] keys = newKeys(1 << 10);
    private double[] values = new double[1 << 10];
    private int size;

    /** Adds the pair unless present; true if it was added. */
    boolean putIfAbsent(long key, double value) {
        if (2 * (size + 1) > keys.length) {
            grow();
        }
        int slot = find(keys, key);
        if (keys[slot] == key) {
            return false;
        }
        keys[slot] = key;
        values[slot] = value;
        size++;
        return true;
    }

    /** The distance of a present pair. */
    double get(long key) {
        int slot = find(keys, key);
        if (keys[slot] != key) {
            throw new IllegalArgumentException("no candidate pair " + key);
        }
        return values[slot];
    }

    int size() {
        return size;
    }

    /** Every key, ascending. */
    long[] sortedKeys() {
        long[] sorted = new long[size];
        int n = 0;
        for (long key : keys) {
            if (key != EMPTY) {
                sorted[n++] = key;
            }
        }
        Arrays.sort(sorted);
        return sorted;
    }

    /** The key's slot, or the empty slot where it would go. */
    private static int find(long[] table, long key) {
        int mask = table.length - 1;
        int slot = (int) mix(key) & mask;
        while (table[slot] != EMPTY && table[slot] != key) {
            slot = (slot + 1) & mask;
        }
        return slot;
    }

    private void grow() {
        long[] oldKeys = keys;
        double[] oldValues = values;
        keys = newKeys(2 * oldKeys.length);
        values = new double[keys.length];
        for (int s = 0; s < oldKeys.length; s++) {
            if (oldKeys[s] != EMPTY) {
                int slot = find(keys, oldKeys[s]);
                keys[slot] = oldKeys[s];
                values[slot] = oldValues[s];
            }
        }
    }

    private static long[] newKeys(int capacity) {
        long[] table = new long[capacity];
        Arrays.fill(table, EMPTY);
        return table;
    }

    /** A 64-bit finaliser (Stafford's variant 13, as in SplitMix64) so that keys i * T + j spread over the table. */
    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
