package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Random;
import java.util.function.Consumer;
import java.util.function.IntPredicate;
import java.util.function.Supplier;
import java.util.function.ToDoubleFunction;
import java.util.stream.IntStream;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.network.TurnCostPath;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.EarliestService;
import org.streetcomb.tour.EdgeBearings;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourValidator;
import org.streetcomb.tour.TrafficSide;
import org.streetcomb.tour.Turn;
import org.streetcomb.tour.TurnKind;

/**
 * Cuts a tour into trips that each start and end at the depot, fit a limit (length, duration or
 * capacity) or, for k vehicles, keep the longest trip as short as possible.
 *
 * <p>Route first, cluster second: the tour's order of services is the first giant tour, cut optimally by
 * {@link GiantTourSplit} (or {@link MinMaxSplit} for k vehicles), then improved by
 * {@link TripLocalSearch}, first letting trips overfill at a price and cutting the result again (which
 * restores the limit), then within the limit; the improved trips, joined end to end, are cut again while
 * that helps. That decoder drives a {@link MemeticSearch} over giant tours (Lacomme, Prins &amp;
 * Ramdane-Chérif 2004) whose first population is the tour's order and giant tours drawn alternately by a
 * randomised nearest-task rule and at random, seeded so runs repeat exactly; the cheapest result wins. Trips are driven between services by shortest paths, a street driven
 * twice in one trip is serviced on the first pass ({@link EarliestService}), and every trip is checked by
 * {@link TourValidator}. Local improvement needs a distance table over the task ends
 * ({@link NodeDistances}); on networks whose tasks have more ends than it holds, the tour is only cut.
 */
public final class TripPlanner {

    /**
     * @param limit    what one trip may use; for k vehicles, the measure that is balanced
     * @param vehicles k for the min-max cut into at most k trips, or 0 to cut by the limit alone
     * @param restarts search effort: 0 only cuts and improves the tour's order; each unit breeds
     *                 {@link #CHILDREN_PER_RESTART} children of the memetic search; {@link #AUTO} for
     *                 {@link #SMALL_RESTARTS} up to {@link #SMALL_TASKS} tasks, {@link #DEFAULT_RESTARTS} up to
     *                 {@link #LARGE_TASKS} tasks and 0 beyond
     * @param seed     seed of the randomised giant tours
     */
    public record Settings(TripLimit limit, int vehicles, int restarts, long seed, double turnBackMetres) {

        public Settings(TripLimit limit, int vehicles, int restarts, long seed) {
            this(limit, vehicles, restarts, seed, 0);
        }
    }

    /**
     * @param trips    the trips in order
     * @param improved whether local improvement ran
     * @param searched whether the memetic search ran
     * @param tasks    the number of services cut into trips
     */
    public record Result(List<Trip> trips, boolean improved, int tasks, boolean searched) {

        public double length() {
            return trips.stream().mapToDouble(Trip::length).sum();
        }
    }

    /** {@link Settings#restarts()} that picks the effort by size. */
    public static final int AUTO = -1;
    /** The effort {@link #AUTO} gives from {@link #SMALL_TASKS} up to {@link #LARGE_TASKS} tasks. */
    public static final int DEFAULT_RESTARTS = 20;
    /**
     * Tasks up to which {@link #AUTO} searches harder ({@link #SMALL_RESTARTS}): a round of a hundred streets
     * then still plans in seconds (the egl instances in 6 s on average, the largest, 98 tasks, in 11 s on the
     * shared 2-core machine), and the mean gaps to the published values fall to 0.05 %, 0.22 % and 0.58 % on
     * gdb, val and egl (docs/quality.md).
     */
    public static final int SMALL_TASKS = 100;
    /** The effort {@link #AUTO} gives up to {@link #SMALL_TASKS} tasks. */
    public static final int SMALL_RESTARTS = 80;
    /**
     * Tasks beyond which {@link #AUTO} only cuts and improves the tour's own order: on Aurich (1,966 streets)
     * the memetic search took 47-73 s and shortened the trips by 0.26 %; a town of that size is planned in
     * seconds without it (docs/benchmarks.md). Every gdb, val and egl instance is far below.
     */
    public static final int LARGE_TASKS = 500;

    /** Children the memetic search breeds per unit of {@link Settings#restarts()}. */
    static final int CHILDREN_PER_RESTART = 25;

    /**
     * Price of overfilling a trip in the penalised local search, relative to the solution's cost per unit of
     * use (0.25 to 4 were tried on the benchmark sets; 1 did best over gdb, val and egl together, see
     * docs/quality.md).
     */
    static final double PENALTY = 1;

    private final StreetNetwork network;
    private final int depot;
    private final Settings settings;
    /** Told of the memetic search's progress (for the command line's stderr). */
    private Consumer<String> progress = message -> { };
    /** The depot, then the reload points. */
    private final int[] homes;
    /** The distance table over the ends of {@link #tableOf}'s services, or null where it would not fit. */
    private NodeDistances table;
    private Tour tableOf;

    public TripPlanner(StreetNetwork network, int depot, Settings settings) {
        this(network, depot, settings, new int[0]);
    }

    /**
     * @param reloads nodes besides the depot where a trip may start and end (reload points); each trip then
     *                leaves from the home nearest its first service and ends at the home nearest its last
     *                ({@link NearestHome})
     */
    public TripPlanner(StreetNetwork network, int depot, Settings settings, int[] reloads) {
        this.network = network;
        this.depot = depot;
        this.settings = settings;
        this.homes = IntStream.concat(IntStream.of(depot),
                Arrays.stream(reloads).filter(r -> r != depot)).distinct().toArray();
    }

    /** This planner, telling {@code listener} of the search's progress. */
    public TripPlanner withProgress(Consumer<String> listener) {
        this.progress = listener;
        return this;
    }

    /**
     * @param tour          a tour from the depot
     * @param demandPerEdge capacity each edge's service uses, or null
     */
    public Result plan(Tour tour, double[] demandPerEdge) {
        return plan(tour, demandPerEdge, step -> true);
    }

    /**
     * Trips over some of the tour's services only (a vehicle's area): the tour's order of those services is
     * the first giant tour.
     *
     * @param steps the tour's service steps to cut into trips, by step index
     */
    public Result plan(Tour tour, double[] demandPerEdge, IntPredicate steps) {
        return plan(tour, demandPerEdge, steps, settings.restarts());
    }

    /**
     * As {@link #plan(Tour, double[], IntPredicate)} at another search effort. Calls on the same tour share
     * one distance table over all its services' ends, so planning its parts again (a fleet's balancing
     * rounds) costs no further shortest-path searches.
     */
    public Result plan(Tour tour, double[] demandPerEdge, IntPredicate steps, int effort) {
        if (tour.start() != depot) {
            throw new IllegalArgumentException("the tour must start at the depot");
        }
        Tasks tasks = Tasks.of(network, tour, demandPerEdge, steps);
        if (tasks.size() == 0) {
            return new Result(List.of(), false, 0, false);
        }
        int[] order = new int[tasks.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        if (tableOf != tour) {
            int[] ends = IntStream.concat(Arrays.stream(Tasks.of(network, tour, demandPerEdge)
                    .endpoints()), Arrays.stream(homes)).distinct().sorted().toArray();
            table = NodeDistances.fits(ends.length) ? NodeDistances.among(network, ends) : null;
            tableOf = tour;
        }
        boolean improve = table != null;
        Distances direct = improve ? table : new LazyDistances(network, depot);
        Distances distances = homes.length > 1 ? new NearestHome(direct, depot, homes) : direct;
        // one vehicle's trips through reload points: the day is priced and cut as a chain of homes
        boolean chained = homes.length > 1 && settings.vehicles() == 0;
        int[][] neighbours = improve ? TripLocalSearch.neighbours(tasks, distances) : null;
        List<int[]> best = solve(tasks, distances, neighbours, order, improve);
        int restarts = effort != AUTO ? effort : tasks.size() <= SMALL_TASKS ? SMALL_RESTARTS
                : tasks.size() <= LARGE_TASKS ? DEFAULT_RESTARTS : 0;
        // one trip holds everything: the giant tours' search has nothing to cut and the local search has ordered it
        if (best.size() == 1) {
            restarts = 0;
        }
        if (improve && restarts > 0) {
            TripLocalSearch measure = new TripLocalSearch(tasks, distances, depot, settings.limit(), neighbours);
            Random random = new Random(settings.seed());
            int[] drawn = {0};
            Supplier<int[]> orders = () -> drawn[0]++ % 2 == 0 ? nearestTaskOrder(tasks, distances, random)
                    : shuffled(tasks.size(), random);
            ToDoubleFunction<List<int[]>> scored = chained ? trips -> ReloadChainSplit.split(tasks, direct, homes,
                    settings.limit(), trips).cost() : trips -> score(tasks, distances, trips, measure);
            best = new MemeticSearch((giant, improveIt) -> solve(tasks, distances, neighbours, giant, improveIt),
                    scored, random, progress).run(best, orders, restarts * CHILDREN_PER_RESTART);
        }
        if (chained) {
            ReloadChainSplit.Chain chain = ReloadChainSplit.split(tasks, direct, homes, settings.limit(), best);
            return new Result(trips(tasks, chain.trips(), distances, chain.homes()), improve, tasks.size(),
                    improve && restarts > 0);
        }
        return new Result(trips(tasks, best, distances, null), improve, tasks.size(), improve && restarts > 0);
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
                    longest(tasks, distances, trips), bound.capacity());
        }
        TripLocalSearch search = new TripLocalSearch(tasks, distances, depot, bound, neighbours);
        if (settings.vehicles() == 0) {
            double perUse = search.cost(trips) / Math.max(1e-9, totalUse(tasks, distances, trips));
            List<int[]> loose = new TripLocalSearch(tasks, distances, depot, bound, neighbours, PENALTY * perUse).improve(trips);
            trips = cut(tasks, distances, concatenate(loose)).trips();
        }
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

    private double totalUse(Tasks tasks, Distances distances, List<int[]> trips) {
        double use = 0;
        for (int[] trip : trips) {
            double[] t = TripLocalSearch.totals(tasks, distances, depot, trip);
            use += settings.limit().use(t[1], t[0] - t[1], t[2]);
        }
        return use;
    }

    private GiantTourSplit.Result cut(Tasks tasks, Distances distances, int[] order) {
        return settings.vehicles() > 0
                ? MinMaxSplit.split(tasks, distances, depot, settings.limit(), settings.vehicles(), order)
                : GiantTourSplit.split(tasks, distances, depot, settings.limit(), order);
    }

    static int[] concatenate(List<int[]> trips) {
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

    /** A random giant tour (Fisher-Yates shuffle). */
    private static int[] shuffled(int n, Random random) {
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            int j = random.nextInt(i + 1);
            order[i] = order[j];
            order[j] = i;
        }
        return order;
    }

    /**
     * The trips as tours: shortest paths between the services, every trip checked. Where a path between
     * services drives a street the trip services later, that street is serviced on the first pass
     * ({@link EarliestService}) and the trip is driven again between its services in their new order,
     * while that shortens it.
     */
    private List<Trip> trips(Tasks tasks, List<int[]> refs, Distances distances, List<int[]> ends) {
        TurnCostPath shortest = new TurnCostPath(network, (in, node, out) -> 0);
        TurnCostPath turning = settings.turnBackMetres() > 0 ? turnBackPricing() : shortest;
        List<Trip> trips = new ArrayList<>();
        for (int r = 0; r < refs.size(); r++) {
            int[] trip = refs.get(r);
            int[][] services = new int[trip.length][];
            double service = 0;
            double demand = 0;
            int[] mustCover = new int[trip.length];
            for (int k = 0; k < trip.length; k++) {
                int ref = trip[k];
                services[k] = new int[] {tasks.edge[ref >> 1], tasks.start(ref), tasks.end(ref)};
                service += tasks.cost(ref);
                demand += tasks.demand(ref);
                mustCover[k] = services[k][0];
            }
            int from = depot;
            int to = depot;
            if (ends != null) {
                from = ends.get(r)[0];
                to = ends.get(r)[1];
            } else if (distances instanceof NearestHome home) {
                from = home.nearestFrom(services[0][1]);
                to = home.nearestTo(services[services.length - 1][2]);
            }
            Tour tour = driven(turning, services, from, to);
            double length = tour.length(network);
            if (turning != shortest && !settings.limit().allows(service, length - service, demand)) {
                // the detours that spare U-turns must not break the trip's limit: then drive it shortest
                tour = driven(shortest, services, from, to);
                length = tour.length(network);
            }
            List<String> problems = TourValidator.problems(network, tour, ServiceDemand.everyEdge(network), mustCover, to);
            if (!problems.isEmpty()) {
                throw new IllegalStateException("invalid trip: " + problems);
            }
            boolean over = !settings.limit().allows(service, length - service, demand);
            trips.add(new Trip(tour, length, service, demand, over));
        }
        return trips;
    }

    /** Drives that charge {@link Settings#turnBackMetres()} for each U-turn where another street goes on. */
    private TurnCostPath turnBackPricing() {
        EdgeBearings bearings = EdgeBearings.of(network);
        return new TurnCostPath(network, (in, node, out) -> network.degree(node) > 1
                && Turn.between(bearings, TrafficSide.RIGHT, in >> 1, (in & 1) == 0, out >> 1, (out & 1) == 0).kind()
                == TurnKind.U_TURN ? settings.turnBackMetres() : 0);
    }

    /** The trip driven through its services, again in the order first serviced while that shortens it. */
    private Tour driven(TurnCostPath paths, int[][] services, int from, int to) {
        Tour tour = EarliestService.of(drive(paths, services, from, to));
        while (true) {
            Tour again = EarliestService.of(drive(paths, servicesOf(tour), from, to));
            if (again.length(network) >= tour.length(network) - 1e-9) {
                return tour;
            }
            tour = again;
        }
    }

    /**
     * The trip's services, in their order, driven from {@code from} and ending at {@code to} by shortest
     * paths (a trip that starts or ends at a reload point instead of the depot), checked like every trip.
     */
    public Trip redriven(Trip trip, int from, int to) {
        int[][] services = servicesOf(trip.tour());
        Tour tour = drive(new TurnCostPath(network, (in, node, out) -> 0), services, from, to);
        int[] mustCover = new int[services.length];
        for (int k = 0; k < services.length; k++) {
            mustCover[k] = services[k][0];
        }
        List<String> problems = TourValidator.problems(network, tour, ServiceDemand.everyEdge(network), mustCover, to);
        if (!problems.isEmpty()) {
            throw new IllegalStateException("invalid trip: " + problems);
        }
        double length = tour.length(network);
        boolean over = !settings.limit().allows(trip.service(), length - trip.service(), trip.demand());
        return new Trip(tour, length, trip.service(), trip.demand(), over);
    }

    /** The services of a tour in driving order, each as {edge, entry node, exit node}. */
    private int[][] servicesOf(Tour tour) {
        List<int[]> services = new ArrayList<>();
        for (int i = 0; i < tour.steps(); i++) {
            if (tour.service()[i]) {
                services.add(new int[] {tour.edges()[i], tour.entry(network, i), tour.exit(network, i)});
            }
        }
        return services.toArray(int[][]::new);
    }

    /**
     * A walk from {@code from} through the services in order to {@code to}, each connection the cheapest drive
     * that {@code paths} finds, turning back included: arriving at a service by the street it services, or
     * leaving the end of one by that street, is a U-turn too.
     */
    private Tour drive(TurnCostPath paths, int[][] services, int from, int to) {
        List<int[]> steps = new ArrayList<>();
        int at = from;
        int arrivedBy = -1;
        for (int[] s : services) {
            int serviceArc = TurnCostPath.arcFrom(network, s[0], s[1]);
            connect(paths, arrivedBy, at, s[1], serviceArc, steps);
            steps.add(new int[] {s[0], (serviceArc & 1) == 0 ? 1 : 0, 1});
            at = s[2];
            arrivedBy = serviceArc;
        }
        connect(paths, arrivedBy, at, to, -1, steps);
        return toTour(steps, from);
    }

    private void connect(TurnCostPath paths, int arrivedBy, int from, int to, int leaveBy, List<int[]> steps) {
        int[] arcs = paths.arcs(arrivedBy, from, to, leaveBy);
        if (arcs == null) {
            throw new IllegalStateException("no path from node " + from + " to node " + to);
        }
        for (int arc : arcs) {
            steps.add(new int[] {arc >> 1, (arc & 1) == 0 ? 1 : 0, 0});
        }
    }

    private Tour toTour(List<int[]> steps, int start) {
        int[] edges = new int[steps.size()];
        boolean[] forward = new boolean[steps.size()];
        boolean[] service = new boolean[steps.size()];
        for (int i = 0; i < edges.length; i++) {
            edges[i] = steps.get(i)[0];
            forward[i] = steps.get(i)[1] == 1;
            service[i] = steps.get(i)[2] == 1;
        }
        return new Tour(start, edges, forward, service);
    }
}
