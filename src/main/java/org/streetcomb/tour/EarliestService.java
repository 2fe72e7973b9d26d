package org.streetcomb.tour;

/**
 * Moves the service flags of a tour to the earliest passes that can carry them, so a crew services a
 * street the first time it drives it and any later pass is the deadhead: a street serviced once is
 * serviced on its first pass in either direction; a street serviced more than once (both kerbs) keeps
 * its number of service passes in each direction, on the earliest passes in that direction. The
 * traversals and the length are unchanged. O(steps + edges).
 */
public final class EarliestService {

    private EarliestService() {
    }

    public static Tour of(Tour tour) {
        int steps = tour.steps();
        int edges = 0;
        for (int e : tour.edges()) {
            edges = Math.max(edges, e + 1);
        }
        int[] perEdge = new int[edges];
        int[] perDirection = new int[2 * edges];
        for (int i = 0; i < steps; i++) {
            if (tour.service()[i]) {
                perEdge[tour.edges()[i]]++;
                perDirection[slot(tour, i)]++;
            }
        }
        boolean[] service = new boolean[steps];
        for (int i = 0; i < steps; i++) {
            int e = tour.edges()[i];
            if (perEdge[e] == 1) {
                service[i] = true;
                perEdge[e] = 0;
            } else if (perEdge[e] > 1) {
                service[i] = perDirection[slot(tour, i)]-- > 0;
            }
        }
        return new Tour(tour.start(), tour.edges(), tour.forward(), service);
    }

    private static int slot(Tour tour, int i) {
        return 2 * tour.edges()[i] + (tour.forward()[i] ? 0 : 1);
    }
}
