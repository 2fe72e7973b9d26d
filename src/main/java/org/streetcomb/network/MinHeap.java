package org.streetcomb.network;

import java.util.Arrays;

/**
 * A binary min-heap of (key, value) pairs in primitive arrays, ordered by key then value so equal keys
 * come out in a fixed order. Entries are never decreased in place: searches push a new entry and skip
 * stale ones, which on sparse street graphs is faster than an indexed heap.
 */
public final class MinHeap {

    private double[] keys = new double[64];
    private int[] values = new int[64];
    private int size;

    public boolean isEmpty() {
        return size == 0;
    }

    public void clear() {
        size = 0;
    }

    public void push(double key, int value) {
        if (size == keys.length) {
            keys = Arrays.copyOf(keys, 2 * size);
            values = Arrays.copyOf(values, 2 * size);
        }
        int i = size++;
        while (i > 0) {
            int parent = (i - 1) >>> 1;
            if (!less(key, value, keys[parent], values[parent])) {
                break;
            }
            keys[i] = keys[parent];
            values[i] = values[parent];
            i = parent;
        }
        keys[i] = key;
        values[i] = value;
    }

    public double peekKey() {
        return keys[0];
    }

    public int peekValue() {
        return values[0];
    }

    /** Removes the smallest entry; read it first with {@link #peekKey} and {@link #peekValue}. */
    public void pop() {
        double key = keys[--size];
        int value = values[size];
        int i = 0;
        while (true) {
            int child = 2 * i + 1;
            if (child >= size) {
                break;
            }
            if (child + 1 < size && less(keys[child + 1], values[child + 1], keys[child], values[child])) {
                child++;
            }
            if (!less(keys[child], values[child], key, value)) {
                break;
            }
            keys[i] = keys[child];
            values[i] = values[child];
            i = child;
        }
        keys[i] = key;
        values[i] = value;
    }

    private static boolean less(double k1, int v1, double k2, int v2) {
        return k1 < k2 || (k1 == k2 && v1 < v2);
    }
}
