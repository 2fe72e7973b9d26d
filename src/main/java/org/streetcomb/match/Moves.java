package org.streetcomb.match;

import java.util.Arrays;

/**
 * The scored moves from the states of one fix to the states of the next, in primitive arrays: for each,
 * the two states, the log-probability of the best drive that ends with it, and how it went: on along one
 * edge, turning back on one edge, or through the nodes. A scratch list collects every believable move of a step;
 * {@link #within} keeps only those a drive within the margin of the best could use.
 */
final class Moves {

    static final Moves NONE = new Moves(0);

    int size;
    int[] from;
    int[] to;
    double[] score;
    byte[] kind;

    Moves(int capacity) {
        from = new int[capacity];
        to = new int[capacity];
        score = new double[capacity];
        kind = new byte[capacity];
    }

    void clear() {
        size = 0;
    }

    void add(int fromState, int toState, double moveScore, byte how) {
        if (size == from.length) {
            int grown = Math.max(16, 2 * size);
            from = Arrays.copyOf(from, grown);
            to = Arrays.copyOf(to, grown);
            score = Arrays.copyOf(score, grown);
            kind = Arrays.copyOf(kind, grown);
        }
        from[size] = fromState;
        to[size] = toState;
        score[size] = moveScore;
        kind[size] = how;
        size++;
    }

    /**
     * The moves whose score is within {@code margin} of the best score of the state they reach: a move
     * farther below cannot lie on any drive within the margin of the best, since every drive through it
     * could swap it for the state's best move and gain more than the margin.
     */
    Moves within(double[] best, double margin) {
        Moves kept = new Moves(0);
        for (int m = 0; m < size; m++) {
            if (score[m] >= best[to[m]] - margin) {
                kept.add(from[m], to[m], score[m], kind[m]);
            }
        }
        return kept;
    }
}
