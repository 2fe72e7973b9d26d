package org.streetcomb.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.streetcomb.ExitCode;
import org.streetcomb.batch.DistrictBatch;
import org.streetcomb.read.PlaceLayerReader;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code streetcomb districts}: one plan per area of an area layer, all cores by default. */
@Command(name = "districts",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Plans every area of an area layer on one road layer: each area's streets are serviced, the roads "
                + "around it used to travel. Writes a folder per area (tour.geojson, tour.gpx, directions.html) and "
                + "summary.csv; an area that cannot be planned is reported and the rest go on.",
            "",
            "Plans are advice: obey traffic law and signs, never handle a device while driving, and check the "
                + "route against local rules and your own risk assessment; map data may be out of date."})
public final class DistrictsCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "ROADS", description = "Road centrelines (any layer `plan` reads).")
    Path roads;

    @Parameters(index = "1", paramLabel = "AREAS", description = "Area polygons: GeoJSON, shapefile or GeoPackage.")
    Path areas;

    @Option(names = {"-o", "--out"}, paramLabel = "FOLDER", required = true,
            description = "Folder for the per-area folders and summary.csv.")
    @Writes(folder = true)
    Path out;

    @Option(names = "--depot-field", paramLabel = "FIELD",
            description = "Attribute of each area holding its depot as longitude,latitude (it must lie in the area). "
                    + "Default: a node of the main network nearest the middle of the area.")
    String depotField;

    @Option(names = "--depots", paramLabel = "FILE",
            description = "A point layer of depots (GeoJSON, a shapefile or a GeoPackage): each area's depot is the "
                    + "first point that lies in it; an area with none fails with a line of its own.")
    Path depots;

    @Option(names = "--area-margin", paramLabel = "METRES", defaultValue = "1000",
            description = "How far outside each area roads are kept to travel on (default: ${DEFAULT-VALUE} m).")
    double margin;

    @Option(names = "--area-crs", paramLabel = "CRS", description = "The area layer's CRS when it states none.")
    String areaCrs;

    @Option(names = "--area-table", paramLabel = "NAME", description = "The GeoPackage table holding the areas.")
    String areaTable;

    @Option(names = "--leave-out-cut-off",
            description = "Leave out, and measure, streets one-way streets cut off, instead of failing the area.")
    boolean leaveOutCutOff;

    @Option(names = "--threads", paramLabel = "N",
            description = "Areas planned at once (default: every core).")
    Integer threads;

    @Option(names = {"-q", "--quiet"}, description = "No progress lines on stderr.")
    boolean quiet;

    @CommandLine.Mixin
    LayerOptions layer;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /**
     * The batch that {@code args} (this command's arguments) ask for, validated as the command line does: for
     * another runner of the same batch (a cluster job), so both plan exactly the same areas the same way.
     */
    public static DistrictBatch.Request request(String... args) {
        CommandLine line = new CommandLine(new DistrictsCommand());
        line.parseArgs(args);
        return ((DistrictsCommand) line.getCommand()).request();
    }

    private DistrictBatch.Request request() {
        if (!(margin >= 0) || Double.isInfinite(margin)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--area-margin must be 0 or more metres");
        }
        int cores = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (cores < 1) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--threads must be 1 or more");
        }
        if (depots != null && depotField != null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give --depots or --depot-field, not both");
        }
        return new DistrictBatch.Request(roads, layer.readOptions(), areas, PlaceLayerReader.read(areas, areaCrs, areaTable),
                depotField, margin, leaveOutCutOff, out, cores,
                depots == null ? null : PlaceLayerReader.points(depots, "--depots"));
    }

    @Override
    public Integer call() {
        DistrictBatch.Request request = request();
        long start = System.nanoTime();
        // progress names areas from the user's data: it goes through the command's terminal-safe stream
        PrintWriter err = spec.commandLine().getErr();
        List<DistrictBatch.Row> rows = DistrictBatch.run(request, quiet ? line -> { } : line -> {
            err.println(line);
            err.flush();
        });
        PrintWriter stdout = spec.commandLine().getOut();
        long failed = rows.stream().filter(r -> !r.status().equals("planned")).count();
        double service = rows.stream().mapToDouble(DistrictBatch.Row::serviceKm).sum();
        stdout.printf(Locale.ROOT, "Areas     %d planned, %d failed (listed in %s)%n", rows.size() - failed, failed,
                out.resolve("summary.csv"));
        stdout.printf(Locale.ROOT, "Service   %.3f km in all areas%n", service);
        stdout.printf(Locale.ROOT, "Time      %.2f s on %d threads%n", (System.nanoTime() - start) / 1e9, request.threads());
        stdout.println("Caution   Plans are advice: obey traffic law and signs, never handle a device while driving, "
                + "follow local rules and your own risk assessment; map data may be out of date.");
        stdout.flush();
        return failed == 0 ? ExitCode.OK : ExitCode.NO_TOUR;
    }
}
