package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Random;
import org.streetcomb.network.DijkstraSearch;
import org.streetcomb.network.Heading;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.EarliestService;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourValidator;

/**
 * Cuts a tour into trips that each start and end at the depot, fit a limit (length, duration or
 * capacity) or, for k vehicles, keep the longest trip as short as possible.
 *
 * <p>Route first, cluster second: the tour's order of services is the first giant tour, cut optimally by
 * {@link GiantTourSplit} (or {@link MinMaxSplit} for k vehicles), then improved by
 * {@link TripLocalSearch}; the improved trips, joined end to end, are cut again while that helps. Further
 * giant tours, treated the same way, are drawn alternately by a randomised nearest-task rule and by
 * shaking the best solution's giant tour (iterated local search), seeded so runs repeat exactly; the
 * cheapest result wins. Trips are driven between services by shortest paths, a street driven
 * twice in one trip is serviced on the first pass ({@link EarliestService}), and every trip is checked by
 * {@link TourValidator}. Local improvement needs a distance table over the task ends
 * ({@link NodeDistances}); on networks whose tasks have more ends than it holds, the tour is only cut.
 */
public final class TripPlanner {

    /**
     * @param limit    what one trip may use; for k vehicles, the measure that is balanced
     * @param vehicles k for the min-max cut into at most k trips, or 0 to cut by the limit alone
     * @param restarts further randomised giant tours to try
     * @param seed     seed of the randomised giant tours
     */
    public record Settings(TripLimit limit, int vehicles, int restarts, long seed) {
    }

    /**
     * @param trips    the trips in order
     * @param improved whether local improvement ran
     * @param tasks    the number of services cut into trips
     */
    public record Result(List<Trip> trips, boolean improved, int tasks) {

        public double length() {
            return trips.stream().mapToDouble(Trip::length).sum();
        }
    }

    private final StreetNetwork network;
    private final int depot;
    private final Settings settings;

    public TripPlanner(StreetNetwork network, int depot, Settings settings) {
        this.network = network;
        this.depot = depot;
        this.settings = settings;
    }

    /**
     * @param tour          a tour from the depot
     * @param demandPerEdge capacity each edge's service uses, or null
     */
    public Result plan(Tour tour, double[] demandPerEdge) {
        if (tour.start() != depot) {
            throw new IllegalArgumentException("the tour must start at the depot");
        }
        Tasks tasks = Tasks.of(network, tour, demandPerEdge);
        if (tasks.size() == 0) {
            return new Result(List.of(), false, 0);
        }
        int[] order = new int[tasks.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        int[] ends = withDepot(tasks.endpoints());
        boolean improve = NodeDistances.fits(ends.length);
        Distances distances = improve ? NodeDistances.among(network, ends) : new LazyDistances(network, depot);
        int[][] neighbours = improve ? TripLocalSearch.neighbours(tasks, distances) : null;
        List<int[]> best = solve(tasks, distances, neighbours, order, improve);
        if (improve) {
            TripLocalSearch measure = new TripLocalSearch(tasks, distances, depot, settings.limit(), neighbours);
            Random random = new Random(settings.seed());
            double bestScore = score(tasks, distances, best, measure);
            for (int r = 0; r < settings.restarts(); r++) {
                int[] giant = r % 4 == 0 ? nearestTaskOrder(tasks, distances, random) : perturbed(concatenate(best), random);
                List<int[]> candidate = solve(tasks, distances, neighbours, giant, true);
                double score = score(tasks, distances, candidate, measure);
                if (score < bestScore - 1e-7) {
                    best = candidate;
                    bestScore = score;
                }
            }
        }
        return new Result(trips(tasks, best), improve, tasks.size());
    }

    /** Total cost, or for k vehicles the longest trip's measure first (scaled to dominate), then total cost. */
    private double score(Tasks tasks, Distances distances, List<int[]> trips, TripLocalSearch totals) {
        double total = totals.cost(trips);
        if (settings.vehicles() == 0) {
            return total;
        }
        return longest(tasks, distances, trips) * 1e6 + total;
    }

    private double longest(Tasks tasks, Distances distances, List<int[]> trips) {
        double longest = 0;
        for (int[] trip : trips) {
            double[] t = TripLocalSearch.totals(tasks, distances, depot, trip);
            longest = Math.max(longest, settings.limit().use(t[1], t[0] - t[1], t[2]));
        }
        return longest;
    }

    /** Cut, then improve and cut the improved order again while the cost falls. */
    private List<int[]> solve(Tasks tasks, Distances distances, int[][] neighbours, int[] order, boolean improve) {
        List<int[]> trips = cut(tasks, distances, order).trips();
        if (!improve) {
            return trips;
        }
        TripLimit bound = settings.limit();
        if (settings.vehicles() > 0) {
            bound = new TripLimit(bound.perServiceMetre(), bound.perDeadheadMetre(), bound.perDemand(),
                    longest(tasks, distances, trips));
        }
        TripLocalSearch search = new TripLocalSearch(tasks, distances, depot, bound, neighbours);
        double cost = search.cost(trips);
        while (true) {
            List<int[]> improved = search.improve(trips);
            double improvedCost = search.cost(improved);
            List<int[]> recut = cut(tasks, distances, concatenate(improved)).trips();
            boolean recutHelps = search.cost(recut) < improvedCost - 1e-7
                    && (settings.vehicles() == 0 || recut.size() <= settings.vehicles());
            List<int[]> next = recutHelps ? recut : improved;
            double nextCost = search.cost(next);
            if (nextCost >= cost - 1e-7) {
                return nextCost < cost ? next : (improvedCost < cost ? improved : trips);
            }
            trips = next;
            cost = nextCost;
        }
    }

    private GiantTourSplit.Result cut(Tasks tasks, Distances distances, int[] order) {
        return settings.vehicles() > 0
                ? MinMaxSplit.split(tasks, distances, depot, settings.limit(), settings.vehicles(), order)
                : GiantTourSplit.split(tasks, distances, depot, settings.limit(), order);
    }

    private static int[] concatenate(List<int[]> trips) {
        return trips.stream().flatMapToInt(java.util.Arrays::stream).map(ref -> ref >> 1).toArray();
    }

    /** A giant tour by the nearest unserved task, choosing at random among the three nearest. */
    private int[] nearestTaskOrder(Tasks tasks, Distances distances, Random random) {
        int n = tasks.size();
        BitSet done = new BitSet(n);
        int[] order = new int[n];
        int at = depot;
        for (int k = 0; k < n; k++) {
            int[] nearest = {-1, -1, -1};
            double[] gap = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
            for (int t = done.nextClearBit(0); t < n; t = done.nextClearBit(t + 1)) {
                double g = distances.between(at, tasks.tail[t]);
                if (tasks.flippable[t]) {
                    g = Math.min(g, distances.between(at, tasks.head[t]));
                }
                for (int s = 0; s < 3; s++) {
                    if (g < gap[s]) {
                        for (int u = 2; u > s; u--) {
                            gap[u] = gap[u - 1];
                            nearest[u] = nearest[u - 1];
                        }
                        gap[s] = g;
                        nearest[s] = t;
                        break;
                    }
                }
            }
            int choices = nearest[2] >= 0 ? 3 : nearest[1] >= 0 ? 2 : 1;
            int t = nearest[random.nextInt(choices)];
            done.set(t);
            order[k] = t;
            boolean flip = tasks.flippable[t] && distances.between(at, tasks.head[t]) < distances.between(at, tasks.tail[t]);
            at = flip ? tasks.tail[t] : tasks.head[t];
        }
        return order;
    }

    /**
     * The best solution's giant tour shaken: a few runs of it reversed or moved elsewhere, so the next cut
     * and improvement search near it (iterated local search).
     */
    private static int[] perturbed(int[] order, Random random) {
        int n = order.length;
        int[] result = order.clone();
        if (n < 4) {
            return result;
        }
        for (int k = 0; k < 3; k++) {
            int i = random.nextInt(n);
            int j = random.nextInt(n);
            int from = Math.min(i, j);
            int to = Math.max(i, j);
            if (random.nextBoolean()) {
                for (int a = from, b = to; a < b; a++, b--) {
                    int t = result[a];
                    result[a] = result[b];
                    result[b] = t;
                }
            } else {
                int t = result[from];
                System.arraycopy(result, from + 1, result, from, to - from);
                result[to] = t;
            }
        }
        return result;
    }

    private int[] withDepot(int[] ends) {
        int[] all = java.util.Arrays.copyOf(ends, ends.length + 1);
        all[ends.length] = depot;
        return java.util.Arrays.stream(all).distinct().sorted().toArray();
    }

    /** The trips as tours: shortest paths between the services, every trip checked. */
    private List<Trip> trips(Tasks tasks, List<int[]> refs) {
        DijkstraSearch search = new DijkstraSearch(network, Heading.OUTBOUND);
        List<Trip> trips = new ArrayList<>();
        for (int[] trip : refs) {
            List<int[]> steps = new ArrayList<>();
            int at = depot;
            double service = 0;
            double demand = 0;
            int[] mustCover = new int[trip.length];
            for (int k = 0; k < trip.length; k++) {
                int ref = trip[k];
                at = connect(search, at, tasks.start(ref), steps);
                int e = tasks.edge[ref >> 1];
                steps.add(new int[] {e, network.from(e) == tasks.start(ref) ? 1 : 0, 1});
                at = tasks.end(ref);
                service += tasks.cost(ref);
                demand += tasks.demand(ref);
                mustCover[k] = e;
            }
            connect(search, at, depot, steps);
            Tour tour = EarliestService.of(toTour(steps));
            List<String> problems = TourValidator.problems(network, tour, mustCover);
            if (!problems.isEmpty()) {
                throw new IllegalStateException("invalid trip: " + problems);
            }
            double length = tour.length(network);
            boolean over = !settings.limit().allows(service, length - service, demand);
            trips.add(new Trip(tour, length, service, demand, over));
        }
        return trips;
    }

    private int connect(DijkstraSearch search, int from, int to, List<int[]> steps) {
        if (from == to) {
            return to;
        }
        search.start(from);
        if (search.runTo(to) == Double.POSITIVE_INFINITY) {
            throw new IllegalStateException("no path from node " + from + " to node " + to);
        }
        int at = from;
        for (int e : search.pathTo(to)) {
            steps.add(new int[] {e, network.from(e) == at ? 1 : 0, 0});
            at = network.other(e, at);
        }
        return to;
    }

    private Tour toTour(List<int[]> steps) {
        int[] edges = new int[steps.size()];
        boolean[] forward = new boolean[steps.size()];
        boolean[] service = new boolean[steps.size()];
        for (int i = 0; i < edges.length; i++) {
            edges[i] = steps.get(i)[0];
            forward[i] = steps.get(i)[1] == 1;
            service[i] = steps.get(i)[2] == 1;
        }
        return new Tour(depot, edges, forward, service);
    }
}
