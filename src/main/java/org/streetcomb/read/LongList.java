package org.streetcomb.read;

import java.util.Arrays;

/** A growable list of primitive longs, so node ids are not boxed. */
final class LongList {

    private long[] values = new long[16];
    private int size;

    void add(long value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, 2 * size);
        }
        values[size++] = value;
    }

    int size() {
        return size;
    }

    long[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
