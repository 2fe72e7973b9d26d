package org.streetcomb.solve;

import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;

/**
 * The service passes each edge needs: along its digitised direction, against it, or in either direction.
 * A required two-way street needs one pass either way (or, for both kerbs, one each way); a required
 * one-way street needs one pass along its permitted direction (two for both kerbs of a one-way street).
 * An edge with no demand may still be driven as deadhead.
 */
public record ServiceDemand(int[] along, int[] against, int[] either) implements PassCounts {

    /** @param required which edges must be serviced */
    public static ServiceDemand of(StreetNetwork network, boolean[] required, KerbMode kerbs) {
        int m = network.edgeCount();
        int[] along = new int[m];
        int[] against = new int[m];
        int[] either = new int[m];
        int oneWayPasses = kerbs == KerbMode.BOTH_KERBS_ONE_WAY_TWICE ? 2 : 1;
        for (int e = 0; e < m; e++) {
            if (!required[e]) {
                continue;
            }
            Travel travel = network.travel(e);
            if (travel == Travel.FORWARD) {
                along[e] = oneWayPasses;
            } else if (travel == Travel.BACKWARD) {
                against[e] = oneWayPasses;
            } else if (kerbs == KerbMode.ONE_PASS) {
                either[e] = 1;
            } else {
                along[e] = 1;
                against[e] = 1;
            }
        }
        return new ServiceDemand(along, against, either);
    }

    /** Every edge once, ignoring direction: the classic undirected postman on a network without one-ways. */
    public static ServiceDemand everyEdge(StreetNetwork network) {
        boolean[] all = new boolean[network.edgeCount()];
        java.util.Arrays.fill(all, true);
        return of(network, all, KerbMode.ONE_PASS);
    }

    public boolean needs(int edge) {
        return passes(edge) > 0;
    }

    /** True when no edge has a fixed-direction demand. */
    public boolean undirected() {
        for (int e = 0; e < along.length; e++) {
            if (along[e] + against[e] > 0) {
                return false;
            }
        }
        return true;
    }

    /** This demand with the edges outside {@code keep} dropped. */
    public ServiceDemand restrictedTo(boolean[] keep) {
        int[] a = along.clone();
        int[] b = against.clone();
        int[] c = either.clone();
        for (int e = 0; e < keep.length; e++) {
            if (!keep[e]) {
                a[e] = 0;
                b[e] = 0;
                c[e] = 0;
            }
        }
        return new ServiceDemand(a, b, c);
    }
}
