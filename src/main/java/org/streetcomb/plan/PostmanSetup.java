package org.streetcomb.plan;

import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.TourPlanner;

/** Turns a request into the postman problem to solve: which streets need which passes, and where tours start and end. */
final class PostmanSetup {

    private PostmanSetup() {
    }

    static PostmanProblem problem(PlanRequest request, StreetNetwork network, Components components, int depot) {
        int m = network.edgeCount();
        boolean[] required = new boolean[m];
        int depotPart = components.of(depot);
        boolean any = false;
        for (int e = 0; e < m; e++) {
            required[e] = network.required(e)
                    && (!request.depotOnly() || components.of(network.from(e)) == depotPart);
            any |= required[e];
        }
        if (!any) {
            throw new NoTourError(request.input() + ": no street is marked to be serviced");
        }
        ServiceDemand demand = ServiceDemand.of(network, required, KerbMode.ONE_PASS);
        int[] starts = TourPlanner.starts(network, components, demand, depot, request.depotOnly());
        return new PostmanProblem(network, demand, starts, depot);
    }
}
