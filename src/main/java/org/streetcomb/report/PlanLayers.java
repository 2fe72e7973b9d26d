package org.streetcomb.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.streetcomb.network.StreetNetwork;

import org.streetcomb.read.RoadFeature;
import org.streetcomb.tour.Tour;

/**
 * The map layers of a plan: the street network, the service and deadhead passes of each tour, the
 * direction of travel, step numbers and the depot. Consecutive steps of a tour on the same street with
 * the same kind of pass are drawn as one run (the network is drawn one street at a time by
 * {@link NetworkLayer}), so a street split at every junction is still one line to point at, and a large plan
 * stays quick to draw.
 */
public final class PlanLayers {

    /** Above this many runs, step labels would hide the map and slow it: the step-number layer is left out. */
    static final int MAX_STEP_LABELS = 2000;
    /** Above this many arrows the layer starts switched off, so a large plan opens quickly. */
    static final int MAX_ARROWS_SHOWN = 20_000;
    /** Length of an arrowhead, metres, and the shortest step that carries one. */
    private static final double ARROW_METRES = 12;
    private static final double MIN_ARROW_STEP = 2 * ARROW_METRES;
    private static final double METRES_PER_DEGREE = Math.PI / 180 * 6_371_008.8;

    private final MappedTours plan;
    private final StreetNetwork network;
    private final String noun;

    private PlanLayers(MappedTours plan) {
        this.plan = plan;
        this.network = plan.network();
        this.noun = noun(plan);
    }

    public static List<MapLayer> of(MappedTours plan) {
        List<MapLayer> layers = new ArrayList<>();
        layers.add(NetworkLayer.of(plan.network()));
        layers.addAll(tourLayers(plan));
        layers.addAll(scopeLayers(plan));
        return layers;
    }

    /** The area's outline, and the streets asked for that one-way streets cut off, each a layer of its own. */
    static List<MapLayer> scopeLayers(MappedTours plan) {
        List<MapLayer> layers = new ArrayList<>();
        if (plan.area() != null) {
            List<MapFeature> outline = new ArrayList<>();
            org.locationtech.jts.geom.Geometry rings = plan.area().polygon().getBoundary();
            for (int g = 0; g < rings.getNumGeometries(); g++) {
                org.locationtech.jts.geom.Coordinate[] c = rings.getGeometryN(g).getCoordinates();
                double[] flat = new double[2 * c.length];
                for (int i = 0; i < c.length; i++) {
                    flat[2 * i] = c[i].x;
                    flat[2 * i + 1] = c[i].y;
                }
                outline.add(new MapFeature(new double[][] {flat}, null, null, plan.area().label(), Map.of()));
            }
            layers.add(new MapLayer("area", "Service area", "streets inside are serviced, roads around it only travelled",
                    MapLayer.Kind.LINES, new MapStyle(MapPalette.AREA, 2, 0.8, "8 4"), true, outline));
        }
        if (plan.leftOut().length > 0) {
            List<MapFeature> left = new ArrayList<>();
            double metres = 0;
            for (int e : plan.leftOut()) {
                metres += plan.network().length(e);
                left.add(new MapFeature(new double[][] {NetworkLayer.edgePoints(plan.network(), e, true)}, null, null,
                        NetworkLayer.streetName(plan.network().feature(e)), details(
                        plan.network().feature(e).id(), String.format(Locale.ROOT, "%.0f m", plan.network().length(e)))));
            }
            layers.add(new MapLayer("left-out", String.format(Locale.ROOT, "Left out (%.2f km)", metres / 1000),
                    "streets asked for that one-way streets cut off: not planned", MapLayer.Kind.LINES,
                    MapStyle.solid(MapPalette.LEFT_OUT, 5, 0.9), true, left));
        }
        return layers;
    }

    /** The layers of the tours alone, without the street network: for a map that draws the streets its own way. */
    public static List<MapLayer> tourLayers(MappedTours plan) {
        return new PlanLayers(plan).layers();
    }

    /**
     * One group per tour, so each tour can be shown alone; with a fleet of several vehicles, titled by vehicle
     * and trip and coloured by vehicle, so each vehicle's area reads as one colour.
     */
    public static List<MapGroup> groups(MappedTours plan) {
        String noun = noun(plan);
        List<MapGroup> groups = new ArrayList<>();
        int trip = 0;
        for (int t = 0; t < plan.tours().size(); t++) {
            double km = plan.tours().get(t).length(plan.network()) / 1000;
            int vehicle = plan.vehicleOf(t);
            trip = t > 0 && vehicle == plan.vehicleOf(t - 1) ? trip + 1 : 1;
            String title = vehicle > 0 ? String.format(Locale.ROOT, "Vehicle %d, trip %d (%.2f km)", vehicle, trip, km)
                    : String.format(Locale.ROOT, "%s %d (%.2f km)", noun, t + 1, km);
            groups.add(new MapGroup(groupId(t), title, colour(plan, t)));
        }
        return groups;
    }

    /** A tour's colour: its own, or its vehicle's when a fleet of several vehicles was planned. */
    static String colour(MappedTours plan, int tour) {
        int vehicle = plan.vehicleOf(tour);
        return tourColour(vehicle > 0 ? vehicle - 1 : tour);
    }

    /**
     * "Trip" when the plan's walks are trips cut from one tour (more than one leaves the depot), else "Tour"
     * (one walk, or one per separate part of the network, each from its own start).
     */
    static String noun(MappedTours plan) {
        long fromDepot = plan.tours().stream().filter(t -> t.start() == plan.depot()).count();
        return fromDepot > 1 ? "Trip" : "Tour";
    }

    static String tourColour(int tour) {
        return MapPalette.tour(tour);
    }

    private static String groupId(int tour) {
        return "tour-" + (tour + 1);
    }

    private List<MapLayer> layers() {
        List<MapFeature> service = new ArrayList<>();
        List<MapFeature> deadhead = new ArrayList<>();
        List<MapFeature> arrows = new ArrayList<>();
        List<MapFeature> labels = new ArrayList<>();
        int arrowCount = 0;
        for (int t = 0; t < plan.tours().size(); t++) {
            Tour tour = plan.tours().get(t);
            for (Run run : runs(tour)) {
                MapFeature feature = run.feature(t);
                (run.service ? service : deadhead).add(feature);
                labels.add(run.label(t));
                double[][] heads = arrows(tour, run);
                arrowCount += heads.length;
                if (heads.length > 0) {
                    arrows.add(new MapFeature(heads, groupId(t), null, "", Map.of()));
                }
            }
        }
        List<MapLayer> layers = new ArrayList<>();
        layers.add(new MapLayer("service", "Service passes", "streets driven to service them, in the colour of their " + (plan.vehicleOf(0) > 0 ? "vehicle" : noun.toLowerCase(Locale.ROOT)),
                MapLayer.Kind.LINES, MapStyle.solid(MapPalette.tour(0), 4, 0.85), true, service));
        layers.add(new MapLayer("deadhead", "Deadhead passes", "streets driven again without servicing",
                MapLayer.Kind.LINES, new MapStyle(MapPalette.DEADHEAD, 4, 1, "2 6"), true, deadhead));
        boolean arrowsShown = arrowCount <= MAX_ARROWS_SHOWN;
        layers.add(new MapLayer("arrows", "Direction of travel", arrowsShown ? "one arrow per step, visible when zoomed in"
                : "one arrow per step, visible when zoomed in; off at start on a plan this large",
                MapLayer.Kind.ARROWS, MapStyle.solid(MapPalette.ARROWS, 1, 0.9), arrowsShown, arrows));
        if (labels.size() <= MAX_STEP_LABELS) {
            layers.add(new MapLayer("steps", "Step numbers", "the first step of each run on one street",
                    MapLayer.Kind.LABELS, MapStyle.solid(MapPalette.ARROWS, 1, 1), false, labels));
        }
        List<MapFeature> reloads = reloadPoints();
        if (!reloads.isEmpty()) {
            layers.add(new MapLayer("reloads", "Reload points", "where a trip may end to reload and the next one leave",
                    MapLayer.Kind.POINTS, MapStyle.solid(MapPalette.RELOADS, 12, 1), true, reloads));
        }
        List<MapFeature> otherStarts = starts(false);
        if (!otherStarts.isEmpty()) {
            layers.add(new MapLayer("starts", "Tour starts", "where each separate part's tour starts and ends",
                    MapLayer.Kind.POINTS, MapStyle.solid(MapPalette.STARTS, 10, 1), true, otherStarts));
        }
        layers.add(new MapLayer("depot", "Depot", "", MapLayer.Kind.POINTS, MapStyle.solid(MapPalette.DEPOT, 16, 1), true,
                starts(true)));
        return layers;
    }

    /** Each reload point, with the trips that end and leave there. */
    private List<MapFeature> reloadPoints() {
        List<MapFeature> points = new ArrayList<>();
        for (int node : plan.reloads()) {
            List<String> ending = new ArrayList<>();
            List<String> leaving = new ArrayList<>();
            for (int t = 0; t < plan.tours().size(); t++) {
                if (plan.tours().get(t).end(network) == node) {
                    ending.add(String.valueOf(t + 1));
                }
                if (plan.tours().get(t).start() == node) {
                    leaving.add(String.valueOf(t + 1));
                }
            }
            Map<String, String> details = new LinkedHashMap<>();
            details.put("Node", String.valueOf(node));
            details.put("Position", String.format(Locale.ROOT, "%.7f, %.7f", network.lon(node), network.lat(node)));
            details.put("Trips ending here", ending.isEmpty() ? "none" : String.join(", ", ending));
            details.put("Trips leaving here", leaving.isEmpty() ? "none" : String.join(", ", leaving));
            points.add(MapFeature.point(network.lon(node), network.lat(node), null, "Reload point", details));
        }
        return points;
    }

    /** The depot, or the start of every tour but the depot's, each a point with its node and position. */
    private List<MapFeature> starts(boolean depot) {
        List<MapFeature> starts = new ArrayList<>();
        for (int t = 0; t < plan.tours().size(); t++) {
            int node = plan.tours().get(t).start();
            if ((node == plan.depot()) != depot || !depot && isReload(node)) {
                continue;
            }
            Map<String, String> details = new LinkedHashMap<>();
            details.put("Node", String.valueOf(node));
            details.put("Position", String.format(Locale.ROOT, "%.7f, %.7f", network.lon(node), network.lat(node)));
            String walk = noun.toLowerCase(Locale.ROOT) + " " + (t + 1);
            boolean back = plan.tours().get(t).end(network) == node;
            String label = depot ? (back ? "Depot: start and end of " : "Depot: start of ") + walk : "Start and end of " + walk;
            starts.add(MapFeature.point(network.lon(node), network.lat(node), groupId(t), label, details));
        }
        return starts;
    }

    private boolean isReload(int node) {
        for (int r : plan.reloads()) {
            if (r == node) {
                return true;
            }
        }
        return false;
    }

    /** Splits a tour into runs of consecutive steps on one street with one kind of pass. */
    private List<Run> runs(Tour tour) {
        List<Run> runs = new ArrayList<>();
        Run current = null;
        for (int i = 0; i < tour.steps(); i++) {
            int e = tour.edges()[i];
            String street = streetKey(network.feature(e));
            if (current == null || current.service != tour.service()[i] || !current.street.equals(street)) {
                current = new Run(street, streetName(network.feature(e)), tour.service()[i], i);
                runs.add(current);
            }
            current.add(tour, i);
        }
        return runs;
    }

    private static String streetKey(RoadFeature feature) {
        return NetworkLayer.streetKey(feature);
    }

    private static String streetName(RoadFeature feature) {
        return NetworkLayer.streetName(feature);
    }

    private double[] edgePoints(int e, boolean forward) {
        return NetworkLayer.edgePoints(network, e, forward);
    }

    /** An arrowhead at the middle of each step of the run long enough to carry one, pointing the way it is driven. */
    private double[][] arrows(Tour tour, Run run) {
        List<double[]> heads = new ArrayList<>();
        for (int i = run.first; i <= run.last; i++) {
            int e = tour.edges()[i];
            if (network.length(e) >= MIN_ARROW_STEP) {
                heads.add(arrowhead(edgePoints(e, tour.forward()[i]), ARROW_METRES));
            }
        }
        return heads.toArray(new double[0][]);
    }

    /**
     * A closed triangle {@code size} metres long whose tip is halfway along the line, pointing along it, set
     * beside the line on the right of the direction of travel: a street driven both ways then shows two heads
     * side by side, one per direction, instead of two crossed ones.
     */
    static double[] arrowhead(double[] line, double size) {
        double xScale = METRES_PER_DEGREE * Math.cos(Math.toRadians(line[1]));
        int n = line.length / 2;
        double total = 0;
        for (int k = 1; k < n; k++) {
            total += Math.hypot((line[2 * k] - line[2 * k - 2]) * xScale, (line[2 * k + 1] - line[2 * k - 1]) * METRES_PER_DEGREE);
        }
        double half = total / 2 + size / 2;
        double walked = 0;
        for (int k = 1; k < n; k++) {
            double dx = (line[2 * k] - line[2 * k - 2]) * xScale;
            double dy = (line[2 * k + 1] - line[2 * k - 1]) * METRES_PER_DEGREE;
            double segment = Math.hypot(dx, dy);
            if (segment > 0 && (walked + segment >= half || k == n - 1)) {
                double f = Math.min(1, (half - walked) / segment);
                double ux = dx / segment;
                double uy = dy / segment;
                // the right-hand normal of the direction of travel (x east, y north)
                double side = 0.55 * size;
                double tipX = line[2 * k - 2] * xScale + f * dx + side * uy;
                double tipY = line[2 * k - 1] * METRES_PER_DEGREE + f * dy - side * ux;
                double baseX = tipX - size * ux;
                double baseY = tipY - size * uy;
                double halfWidth = size * 0.4;
                double[] m = {baseX + halfWidth * uy, baseY - halfWidth * ux, tipX, tipY, baseX - halfWidth * uy,
                    baseY + halfWidth * ux};
                return new double[] {m[0] / xScale, m[1] / METRES_PER_DEGREE, m[2] / xScale, m[3] / METRES_PER_DEGREE,
                    m[4] / xScale, m[5] / METRES_PER_DEGREE, m[0] / xScale, m[1] / METRES_PER_DEGREE};
            }
            walked += segment;
        }
        return new double[] {line[0], line[1], line[0], line[1]};
    }

    private static String metres(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }

    /** Consecutive steps of one tour on one street with one kind of pass. */
    private final class Run {
        final String street;
        final String name;
        final boolean service;
        final int first;
        int last;
        double length;
        final List<Double> points = new ArrayList<>();

        Run(String street, String name, boolean service, int first) {
            this.street = street;
            this.name = name;
            this.service = service;
            this.first = first;
        }

        void add(Tour tour, int step) {
            int e = tour.edges()[step];
            double[] edge = edgePoints(e, tour.forward()[step]);
            int skip = points.isEmpty() ? 0 : 2;
            for (int k = skip; k < edge.length; k++) {
                points.add(edge[k]);
            }
            last = step;
            length += network.length(e);
        }

        String steps() {
            return first == last ? String.valueOf(first + 1) : (first + 1) + "\u2013" + (last + 1);
        }

        double[] line() {
            double[] line = new double[points.size()];
            for (int k = 0; k < line.length; k++) {
                line[k] = points.get(k);
            }
            return line;
        }

        MapFeature feature(int tour) {
            double[] line = line();
            Map<String, String> details = new LinkedHashMap<>();
            details.put(noun, String.valueOf(tour + 1));
            details.put(first == last ? "Step" : "Steps", steps());
            details.put("Street", name);
            details.put("Pass", service ? "service" : "deadhead");
            details.put("Length (m)", metres(length));
            String label = String.format(Locale.ROOT, "%s %d, step %s: %s (%s)", noun, tour + 1, steps(), name,
                    service ? "service" : "deadhead");
            return new MapFeature(new double[][] {line}, groupId(tour), service ? colour(plan, tour) : null, label, details);
        }

        MapFeature label(int tour) {
            Map<String, String> details = new LinkedHashMap<>();
            details.put("Street", name);
            double[] middle = arrowhead(line(), 0);
            return MapFeature.point(middle[2], middle[3], groupId(tour), steps(), details);
        }
    }

    /** A left-out street's details in a fixed order (Map.of iterates in an order that changes run to run). */
    private static Map<String, String> details(String feature, String length) {
        Map<String, String> details = new java.util.LinkedHashMap<>();
        details.put("Feature", feature);
        details.put("Length", length);
        return details;
    }
}
