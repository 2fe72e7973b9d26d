package org.streetcomb.match;

import java.util.Arrays;
import org.streetcomb.network.StreetNetwork;

/**
 * The stretches of each edge that a matched track drove, kept apart by direction: along the edge's
 * digitised direction or against it. Stretches are offsets in metres from the edge's first point. They are
 * collected in any order (primitive arrays, amortised O(1) per stretch) and merged once into sorted,
 * disjoint intervals per edge and direction by {@link #merge}, O(s log s).
 */
public final class DrivenIntervals {

    private final StreetNetwork network;
    private int[] key = new int[1024];
    private double[] start = new double[1024];
    private double[] end = new double[1024];
    private int size;
    private int[] first;
    private double[] mergedStart;
    private double[] mergedEnd;

    public DrivenIntervals(StreetNetwork network) {
        this.network = network;
    }

    /** Records that {@code edge} was driven between offsets {@code from} and {@code to}, in one direction. */
    public void add(int edge, boolean along, double from, double to) {
        double a = Math.max(0, Math.min(from, to));
        double b = Math.min(network.length(edge), Math.max(from, to));
        if (!(b > a)) {
            return;
        }
        if (size == key.length) {
            key = Arrays.copyOf(key, 2 * size);
            start = Arrays.copyOf(start, 2 * size);
            end = Arrays.copyOf(end, 2 * size);
        }
        key[size] = 2 * edge + (along ? 0 : 1);
        start[size] = a;
        end[size] = b;
        size++;
        first = null;
    }

    /** Records the whole edge as driven in one direction. */
    public void addWhole(int edge, boolean along) {
        add(edge, along, 0, network.length(edge));
    }

    /** Sorts and unites the stretches; call before reading, after the last {@link #add}. */
    public void merge() {
        Integer[] order = new Integer[size];
        Arrays.setAll(order, i -> i);
        Arrays.sort(order, (i, j) -> key[i] != key[j] ? Integer.compare(key[i], key[j]) : Double.compare(start[i], start[j]));
        int keys = 2 * network.edgeCount();
        first = new int[keys + 1];
        mergedStart = new double[size];
        mergedEnd = new double[size];
        int count = 0;
        int lastKey = -1;
        for (int r = 0; r < size; r++) {
            int i = order[r];
            if (key[i] == lastKey && start[i] <= mergedEnd[count - 1]) {
                mergedEnd[count - 1] = Math.max(mergedEnd[count - 1], end[i]);
                continue;
            }
            mergedStart[count] = start[i];
            mergedEnd[count] = end[i];
            count++;
            first[key[i] + 1] = count;
            lastKey = key[i];
        }
        // keys without intervals start where the previous key ended
        for (int k = 1; k <= keys; k++) {
            first[k] = Math.max(first[k], first[k - 1]);
        }
    }

    /** The merged intervals of an edge in one direction, as {from0, to0, from1, to1, ...}. */
    public double[] of(int edge, boolean along) {
        if (first == null) {
            throw new IllegalStateException("merge() before reading");
        }
        int k = 2 * edge + (along ? 0 : 1);
        int from = k == 0 ? 0 : first[k];
        int to = first[k + 1];
        double[] result = new double[2 * (to - from)];
        for (int i = from; i < to; i++) {
            result[2 * (i - from)] = mergedStart[i];
            result[2 * (i - from) + 1] = mergedEnd[i];
        }
        return result;
    }
}
