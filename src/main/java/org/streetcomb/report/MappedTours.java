package org.streetcomb.report;

import java.util.List;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;

/** What a map of tours needs: the network, the depot node and the tours (a plan, or a mop-up). */
public interface MappedTours {

    StreetNetwork network();

    int depot();

    List<Tour> tours();
}
