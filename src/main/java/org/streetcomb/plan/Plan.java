package org.streetcomb.plan;

import java.util.List;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.ReadReport;
import org.streetcomb.report.MappedTours;
import org.streetcomb.scope.ServiceArea;
import org.streetcomb.solve.Augmentation;
import org.streetcomb.tour.Tour;

/**
 * A planned set of tours and everything the summary reports about how they were made.
 *
 * @param request       what was asked
 * @param read          the reader's account of the layer
 * @param network       the noded network
 * @param components    its connected components
 * @param depot         the depot node
 * @param depotDistance metres from the requested depot position to the depot node (0 for the default)
 * @param augmentation  the deadhead the solver added
 * @param tours         the tours, depot's component first
 * @param warnings      things the user should know about this plan, one line each
 * @param leftOut       edges asked for but left out because one-way streets cut them off, in id order
 * @param arranged      how the tours were cut into trips and ordered for driving, or null before that stage
 */
public record Plan(PlanRequest request, ReadReport read, StreetNetwork network, Components components, int depot,
                   double depotDistance, Augmentation augmentation, List<Tour> tours, List<String> warnings, int[] leftOut,
                   Arranged arranged)
        implements MappedTours {

    public Plan(PlanRequest request, ReadReport read, StreetNetwork network, Components components, int depot,
                double depotDistance, Augmentation augmentation, List<Tour> tours, List<String> warnings,
                int[] leftOut) {
        this(request, read, network, components, depot, depotDistance, augmentation, tours, warnings, leftOut, null);
    }

    public Plan(PlanRequest request, ReadReport read, StreetNetwork network, Components components, int depot,
                double depotDistance, Augmentation augmentation, List<Tour> tours, List<String> warnings) {
        this(request, read, network, components, depot, depotDistance, augmentation, tours, warnings, new int[0]);
    }

    @Override
    public ServiceArea area() {
        return request.service().area();
    }

    /** The same plan with its tours replaced (reordered, or cut into trips). */
    public Plan withTours(List<Tour> replaced) {
        return new Plan(request, read, network, components, depot, depotDistance, augmentation, List.copyOf(replaced),
                warnings, leftOut, arranged);
    }

    /** The same plan with its tours arranged for driving. */
    Plan arranged(List<Tour> driven, Arranged how) {
        return new Plan(request, read, network, components, depot, depotDistance, augmentation, List.copyOf(driven),
                warnings, leftOut, how);
    }

    @Override
    public int vehicleOf(int tour) {
        if (!hasTrips() || arranged.fleet().vehicles().size() < 2) {
            return 0;
        }
        int from = 0;
        for (int v = 0; v < arranged.fleet().vehicles().size(); v++) {
            from += arranged.fleet().vehicles().get(v).trips().size();
            if (tour < from) {
                return v + 1;
            }
        }
        return 0;
    }

    @Override
    public int[] reloads() {
        return hasTrips() ? arranged.fleet().settings().reloads().stream().mapToInt(Integer::intValue)
                .filter(node -> node != depot).distinct().toArray() : new int[0];
    }

    /** Whether the tours are trips of a fleet (then written and labelled as trips). */
    public boolean hasTrips() {
        return arranged != null && arranged.fleet() != null;
    }

    /** Total length of the streets the tours cover, metres. */
    public double serviceLength() {
        return tours.stream().mapToDouble(t -> t.length(network) - t.deadhead(network)).sum();
    }

    public double tourLength() {
        return tours.stream().mapToDouble(t -> t.length(network)).sum();
    }

    /** Hours to drive the tours at the arrangement's service and travel speeds. */
    public double hours() {
        Arrangement arrangement = request.arrangement();
        return serviceLength() / (1000 * arrangement.serviceKmh()) + deadheadLength() / (1000 * arrangement.travelKmh());
    }

    public double deadheadLength() {
        return tours.stream().mapToDouble(t -> t.deadhead(network)).sum();
    }
}
