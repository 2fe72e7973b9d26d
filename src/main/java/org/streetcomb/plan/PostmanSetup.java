package org.streetcomb.plan;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.streetcomb.InputError;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.TourPlanner;

/** Turns a request into the postman problem to solve: which streets need which passes, and where tours start and end. */
final class PostmanSetup {

    private PostmanSetup() {
    }

    /** @param inside for each edge, whether it lies in the service area; null when no area is given */
    static PostmanProblem problem(PlanRequest request, StreetNetwork network, Components components, int depot,
                                  boolean[] inside, List<String> warnings) {
        ServiceOptions service = request.service();
        boolean[] required = required(request, network, warnings);
        for (int e = 0; inside != null && e < required.length; e++) {
            required[e] &= inside[e];
        }
        int depotPart = components.of(depot);
        boolean any = false;
        for (int e = 0; e < required.length; e++) {
            required[e] &= !request.depotOnly() || components.of(network.from(e)) == depotPart;
            any |= required[e];
        }
        if (!any) {
            throw new NoTourError(request.input() + ": no street is marked to be serviced");
        }
        ServiceDemand demand = ServiceDemand.of(network, required, service.kerbs());
        int[] starts = TourPlanner.starts(network, components, demand, depot, request.depotOnly());
        int end = depot;
        if (service.end() != null) {
            end = endNode(request, network, service.end());
            if (components.of(end) != depotPart) {
                throw new NoTourError(String.format(Locale.ROOT, "%s: the end %.7f,%.7f is on a part of the network "
                        + "not connected to the depot's", request.input().getFileName(), service.end().lon(), service.end().lat()));
            }
        }
        return new PostmanProblem(network, demand, starts, end);
    }

    private static int endNode(PlanRequest request, StreetNetwork network, LonLat end) {
        NearestNode.Hit hit = NearestNode.of(network, end.lon(), end.lat());
        if (hit.distance() > request.maxDepotDistance()) {
            throw new InputError(String.format(Locale.ROOT,
                    "end %.7f,%.7f is %.0f m from the nearest street node of %s (limit %.0f m): check the order "
                    + "longitude,latitude or raise the limit", end.lon(), end.lat(), hit.distance(),
                    request.input().getFileName(), request.maxDepotDistance()));
        }
        return hit.node();
    }

    /** The layer's required flags, or the streets listed in the service-ids file. */
    private static boolean[] required(PlanRequest request, StreetNetwork network, List<String> warnings) {
        boolean[] required = new boolean[network.edgeCount()];
        if (request.service().serviceIds() == null) {
            for (int e = 0; e < required.length; e++) {
                required[e] = network.required(e);
            }
            return required;
        }
        Set<String> ids = new HashSet<>();
        try {
            for (String line : Files.readAllLines(request.service().serviceIds(), StandardCharsets.UTF_8)) {
                String id = line.strip();
                if (!id.isEmpty() && !id.startsWith("#")) {
                    ids.add(id);
                }
            }
        } catch (IOException e) {
            throw new InputError(request.service().serviceIds() + ": cannot read the list of street ids ("
                    + e.getMessage() + ")");
        }
        Set<String> matched = new HashSet<>();
        for (int e = 0; e < required.length; e++) {
            String id = network.feature(e).id();
            if (ids.contains(id)) {
                required[e] = true;
                matched.add(id);
            }
        }
        if (matched.size() < ids.size()) {
            warnings.add((ids.size() - matched.size()) + " of the " + ids.size() + " ids in "
                    + request.service().serviceIds().getFileName() + " match no street of the layer");
        }
        return required;
    }
}
