package org.streetcomb.report;

import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.scope.ServiceArea;
import org.streetcomb.tour.Tour;

/** What a map of tours needs: the network, the depot node and the tours (a plan, or a mop-up). */
public interface MappedTours {

    StreetNetwork network();

    int depot();

    List<Tour> tours();

    /** Edges that were asked for but could not be planned (cut off by one-way streets), in id order. */
    default int[] leftOut() {
        return new int[0];
    }

    /** The vehicle (from 1) that drives a tour when a fleet of several vehicles was planned, else 0. */
    default int vehicleOf(int tour) {
        return 0;
    }

    /** Nodes besides the depot where a fleet's vehicles may reload between trips (a salt barn, a tip). */
    default int[] reloads() {
        return new int[0];
    }

    /** The area the streets were serviced in, or null for the whole layer. */
    default ServiceArea area() {
        return null;
    }
}
