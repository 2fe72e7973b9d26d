package org.streetcomb.batch;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import org.locationtech.jts.geom.Geometry;
import org.streetcomb.SafeText;
import org.streetcomb.InputError;
import org.streetcomb.NoTourError;
import org.streetcomb.check.RepairOptions;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NetworkBuilder;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.FieldFiles;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanFiles;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.read.LayerReaders;
import org.streetcomb.read.Place;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.RoadLayer;
import org.streetcomb.report.DistrictIndexLayers;
import org.streetcomb.report.HtmlReportWriter;
import org.streetcomb.report.MapReport;
import org.streetcomb.report.PlanLayers;
import org.streetcomb.report.QuickLookPng;
import org.streetcomb.report.ReportCautions;
import org.streetcomb.scope.AreaChoice;
import org.streetcomb.scope.ServiceArea;
import org.streetcomb.timing.StageClock;
import org.streetcomb.write.AtomicFile;
import org.streetcomb.write.GpxLimits;

/**
 * Plans every area of an area layer through the one planning pipeline ({@link Planner}): the road layer is
 * read and its network built once, then each area is scoped and solved on its own thread (a fixed pool,
 * every core by default). Each area gets a folder with its tour (GeoJSON), GPX and direction sheet; a
 * summary table lists every area, planned or not. An area that cannot be planned (not a polygon, no street
 * inside, depot outside, one-way cut-off) gets one line naming it, and the rest go on.
 *
 * <p>A street on a shared border, or in two overlapping areas, is serviced by the area that comes first
 * in the layer and only travelled in the others ({@link ServiceArea#earlier()}), so a tiling of areas
 * services every street once. Outputs are written in the layer's order whatever the thread count, so they
 * are the same byte for byte.
 */
public final class DistrictBatch {

    /** What to plan: every area of {@code areas}, each with its depot, on the roads of {@code roads}. */
    public record Request(Path roads, ReadOptions read, Path areasFile, List<Place> areas, String depotField,
                          double margin, boolean leaveOutCutOff, Path out, int threads, List<double[]> depots) {

        public Request(Path roads, ReadOptions read, Path areasFile, List<Place> areas, String depotField,
                       double margin, boolean leaveOutCutOff, Path out, int threads) {
            this(roads, read, areasFile, areas, depotField, margin, leaveOutCutOff, out, threads, null);
        }
    }

    /** One row of the summary (serialisable, so a cluster's workers can hand it back). */
    public record Row(int index, String id, String label, String status, double serviceKm, double deadheadKm,
                      double leftOutKm, String message) implements java.io.Serializable {
    }

    /** The road layer and its network, read and built once per process and shared by every area planned there. */
    public record Roads(RoadLayer layer, StreetNetwork network) {
    }

    private static final ObjectMapper JSON = new ObjectMapper();

    private DistrictBatch() {
    }

    public static List<Row> run(Request request, Consumer<String> progress) {
        Roads roads = roads(request);
        List<Place> areas = request.areas();
        createOut(request);
        AtomicInteger done = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, request.threads()));
        try {
            List<Future<Row>> futures = new ArrayList<>();
            for (int i = 0; i < areas.size(); i++) {
                final int index = i;
                futures.add(pool.submit(() -> {
                    Row row = planArea(request, roads, index);
                    progress.accept(String.format(Locale.ROOT, "area %d of %d (%s): %s%s", done.incrementAndGet(),
                            areas.size(), row.label(), row.status(), row.message().isEmpty() ? "" : ": " + row.message()));
                    return row;
                }));
            }
            List<Row> rows = new ArrayList<>();
            for (Future<Row> f : futures) {
                rows.add(f.get());
            }
            finish(request, rows);
            return rows;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } catch (java.util.concurrent.ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdown();
        }
    }

    /** Reads the road layer and builds its network (once per process; a cluster does it once per worker). */
    public static Roads roads(Request request) {
        RoadLayer layer = LayerReaders.read(request.roads(), request.read());
        return new Roads(layer, new NetworkBuilder(0.5).build(layer));
    }

    /** Creates the output folder. */
    public static void createOut(Request request) {
        try {
            Files.createDirectories(request.out());
        } catch (IOException e) {
            throw InputError.at(request.out(), null, "cannot create the output folder: " + e.getMessage());
        }
    }

    /** Writes summary.csv and index.html from every area's row, in the layer's order. */
    public static void finish(Request request, List<Row> rows) {
        writeSummary(request.out().resolve("summary.csv"), rows);
        writeIndex(request, rows);
    }

    /**
     * Plans area {@code index} (from 0) of the request and writes its folder; an area that cannot be planned
     * gives a failed row and no folder.
     */
    public static Row planArea(Request request, Roads roads, int index) {
        return planOne(request, roads.layer(), roads.network(), index);
    }

    private static Row planOne(Request request, RoadLayer layer, StreetNetwork network, int index) {
        Place place = request.areas().get(index);
        String label = AreaChoice.label(place, null);
        try {
            Geometry polygon = AreaChoice.polygon(place, request.areasFile());
            List<Geometry> earlier = new ArrayList<>();
            for (int j = 0; j < index; j++) {
                if (request.areas().get(j).isPolygonal() && request.areas().get(j).geometry().isValid()) {
                    earlier.add(request.areas().get(j).geometry());
                }
            }
            ServiceArea area = new ServiceArea(label, polygon, request.margin(), earlier);
            LonLat depot = depot(request, place, polygon);
            ServiceOptions service = new ServiceOptions(org.streetcomb.solve.KerbMode.ONE_PASS, null, null,
                    request.leaveOutCutOff()).withArea(area);
            PlanRequest planRequest = new PlanRequest(request.roads(), depot, 0.5, 500, false, request.read(), service);
            Plan plan = Planner.plan(planRequest, layer, network, RepairOptions.NONE, new StageClock(StageClock.SILENT));
            write(request.out().resolve(folder(index, place)), plan, label, request);
            double left = 0;
            for (int e : plan.leftOut()) {
                left += plan.network().length(e);
            }
            return new Row(index + 1, place.id(), label, "planned", plan.serviceLength() / 1000,
                    plan.deadheadLength() / 1000, left / 1000, "");
        } catch (InputError | NoTourError e) {
            return new Row(index + 1, place.id(), label, "failed", 0, 0, 0, e.getMessage());
        }
    }

    /**
     * The depot: the first point of the depot layer that lies in the area, or the area's depot attribute
     * ("lon,lat"), checked to lie in the area; null for the default.
     */
    private static LonLat depot(Request request, Place place, Geometry polygon) {
        if (request.depots() != null) {
            for (double[] point : request.depots()) {
                if (polygon.covers(polygon.getFactory().createPoint(new org.locationtech.jts.geom.Coordinate(point[0], point[1])))) {
                    return new LonLat(point[0], point[1]);
                }
            }
            throw InputError.at(request.areasFile(), "feature " + place.id(), "no point of the depot layer lies in the area");
        }
        if (request.depotField() == null) {
            return null;
        }
        String raw = place.properties().get(request.depotField());
        if (raw == null || raw.isBlank()) {
            return null;
        }
        String[] parts = raw == null ? new String[0] : raw.split(",");
        double lon, lat;
        try {
            lon = Double.parseDouble(parts[0].strip());
            lat = Double.parseDouble(parts[1].strip());
        } catch (RuntimeException e) {
            throw InputError.at(request.areasFile(), "feature " + place.id(), request.depotField() + " holds "
                    + (raw == null ? "nothing" : "'" + raw + "'") + ": expected the depot as longitude,latitude");
        }
        if (!polygon.covers(polygon.getFactory().createPoint(new org.locationtech.jts.geom.Coordinate(lon, lat)))) {
            throw InputError.at(request.areasFile(), "feature " + place.id(), String.format(Locale.ROOT,
                    "the depot %.6f,%.6f lies outside the area", lon, lat));
        }
        return new LonLat(lon, lat);
    }

    private static String folder(int index, Place place) {
        return String.format(Locale.ROOT, "%03d-%s", index + 1, place.id().replaceAll("[^A-Za-z0-9_.-]", "_"));
    }

    private static void write(Path folder, Plan plan, String label, Request request) {
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw InputError.at(folder, null, "cannot create: " + e.getMessage());
        }
        PlanFiles.write(plan, new FieldFiles(folder.resolve("tour.geojson"), false, folder.resolve("tour.gpx"),
                new GpxLimits(1, GpxLimits.DEFAULT_TRACK_POINTS, GpxLimits.DEFAULT_ROUTE_POINTS, true), null,
                folder.resolve("directions.html"), true), new StageClock(StageClock.SILENT));
        double left = 0;
        for (int e : plan.leftOut()) {
            left += plan.network().length(e);
        }
        ObjectNode summary = JSON.createObjectNode();
        summary.put("area", label);
        summary.put("tour_km", round(plan.tourLength() / 1000));
        summary.put("service_km", round(plan.serviceLength() / 1000));
        summary.put("deadhead_km", round(plan.deadheadLength() / 1000));
        summary.put("left_out_km", round(left / 1000));
        List<MapReport.Entry> glance = List.of(
                new MapReport.Entry("Distance", String.format(Locale.ROOT, "%.1f km: %.1f km service, %.1f km deadhead",
                        plan.tourLength() / 1000, plan.serviceLength() / 1000, plan.deadheadLength() / 1000)),
                new MapReport.Entry("Left out", left == 0 ? "nothing" : String.format(Locale.ROOT, "%.2f km", left / 1000)));
        MapReport report = new MapReport("Area: " + label, PlanLayers.of(plan), PlanLayers.groups(plan), summary,
                List.of(new MapReport.Entry("Roads", request.roads().toString()),
                        new MapReport.Entry("Areas", request.areasFile().toString())),
                ReportCautions.PLAN, null, 1, glance);
        new HtmlReportWriter().write(folder.resolve("report.html"), report);
        new QuickLookPng(1200, 800).write(folder.resolve("map.png"), report);
    }

    /** index.html: every area on one map, with its figures on click, and the batch's totals first. */
    private static void writeIndex(Request request, List<Row> rows) {
        List<DistrictIndexLayers.Area> areas = new ArrayList<>();
        double service = 0;
        double leftOut = 0;
        long planned = 0;
        for (Row row : rows) {
            Place place = request.areas().get(row.index() - 1);
            boolean ok = row.status().equals("planned");
            Map<String, String> figures = new LinkedHashMap<>();
            if (ok) {
                figures.put("service", String.format(Locale.ROOT, "%.2f km", row.serviceKm()));
                figures.put("deadhead", String.format(Locale.ROOT, "%.2f km", row.deadheadKm()));
                figures.put("left out", String.format(Locale.ROOT, "%.2f km", row.leftOutKm()));
                figures.put("folder", folder(row.index() - 1, place));
                service += row.serviceKm();
                leftOut += row.leftOutKm();
                planned++;
            } else {
                figures.put("failed", row.message());
            }
            areas.add(new DistrictIndexLayers.Area(row.label(), ok, place.isPolygonal() ? place.geometry() : null, figures));
        }
        ObjectNode summary = JSON.createObjectNode();
        summary.put("areas", rows.size());
        summary.put("planned", planned);
        summary.put("failed", rows.size() - planned);
        summary.put("service_km", round(service));
        summary.put("left_out_km", round(leftOut));
        List<MapReport.Entry> glance = List.of(
                new MapReport.Entry("Areas", String.format(Locale.ROOT, "%d planned, %d failed (summary.csv)", planned,
                        rows.size() - planned)),
                new MapReport.Entry("Service", String.format(Locale.ROOT, "%.1f km in all areas", service)),
                new MapReport.Entry("Left out", String.format(Locale.ROOT, "%.2f km", leftOut)));
        MapReport report = new MapReport("Districts: " + request.areasFile().getFileName(), DistrictIndexLayers.of(areas),
                List.of(), summary, List.of(new MapReport.Entry("Roads", request.roads().toString()),
                        new MapReport.Entry("Areas", request.areasFile().toString())), ReportCautions.PLAN, null, 1, glance);
        new HtmlReportWriter().write(request.out().resolve("index.html"), report);
    }

    private static double round(double value) {
        return Math.round(value * 1000) / 1000.0;
    }

    private static void writeSummary(Path file, List<Row> rows) {
        AtomicFile.write(file, out -> {
            StringBuilder csv = new StringBuilder("area,id,name,status,service_km,deadhead_km,left_out_km,message\r\n");
            for (Row r : rows) {
                csv.append(String.format(Locale.ROOT, "%d,%s,%s,%s,%.3f,%.3f,%.3f,%s\r\n", r.index(), field(r.id()),
                        field(r.label()), r.status(), r.serviceKm(), r.deadheadKm(), r.leftOutKm(), field(r.message())));
            }
            out.write(csv.toString().getBytes(StandardCharsets.UTF_8));
        });
    }

    private static String field(String value) {
        return SafeText.csvField(value);
    }
}
