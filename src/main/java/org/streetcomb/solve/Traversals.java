package org.streetcomb.solve;

/**
 * How many times a solution drives each edge, service and deadhead together: along its digitised
 * direction, against it, or in either direction. Undirected solutions use only {@code either}; solutions
 * on networks with one-way streets fix every direction and use only {@code along} and {@code against}, so
 * the tour builder can run an undirected or a directed Euler walk.
 */
public record Traversals(int[] along, int[] against, int[] either) implements PassCounts {

    public static Traversals undirected(int[] either) {
        return new Traversals(new int[either.length], new int[either.length], either);
    }

    public static Traversals directed(int[] along, int[] against) {
        return new Traversals(along, against, new int[along.length]);
    }
}
