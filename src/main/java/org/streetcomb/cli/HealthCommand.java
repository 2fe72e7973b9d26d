package org.streetcomb.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.streetcomb.ExitCode;
import org.streetcomb.check.CheckOptions;
import org.streetcomb.check.Finding;
import org.streetcomb.check.HealthReport;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.plan.HealthCheck;
import org.streetcomb.timing.StageClock;
import org.streetcomb.report.FindingLayers;
import org.streetcomb.report.MapLayer;
import org.streetcomb.report.NetworkLayer;
import org.streetcomb.write.FindingGeoJsonWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code streetcomb health}: finds what would spoil a tour of a layer, before planning it. */
@Command(name = "health",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Checks a road layer for defects that break or lengthen a tour: separate parts, one-way traps, streets "
                + "the depot cannot reach, near misses, stubs, duplicates, crossings without a junction, degenerate "
                + "and dropped features. Prints a summary grouped by kind; writes the findings as GeoJSON with --out.",
            "Exit code 0 when nothing blocks a tour, 4 when something does, 3 when the layer cannot be read."})
public final class HealthCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "LAYER", description = "Road centrelines: GeoJSON (.geojson, .json), a shapefile (.shp, or a .zip holding one), a GeoPackage (.gpkg) or OpenStreetMap (.osm, .osm.gz, .osm.bz2, .osm.pbf); - reads it from standard input.")
    Path input;

    @CommandLine.Mixin
    DepotOptions depot;

    @CommandLine.Mixin
    LayerOptions layer;

    @Option(names = "--near-miss", paramLabel = "METRES", defaultValue = "3",
            description = "Report a dead end this close to a street it does not join (default: ${DEFAULT-VALUE} m).")
    double nearMiss;

    @Option(names = "--stub", paramLabel = "METRES", defaultValue = "3",
            description = "Report a dead end at most this long past a junction (default: ${DEFAULT-VALUE} m).")
    double stub;

    @Option(names = "--duplicate-within", paramLabel = "METRES", defaultValue = "1",
            description = "Report two streets between the same junctions that lie this close (default: ${DEFAULT-VALUE} m).")
    double duplicate;

    @Option(names = {"-o", "--out"}, paramLabel = "FILE", description = "Write the findings as a GeoJSON FeatureCollection (- for standard output).")
    @Writes(standardOutput = true)
    Path out;

    @Option(names = "--json", description = "Print the summary as JSON instead of text.")
    boolean json;

    @Option(names = {"-q", "--quiet"}, description = "No progress messages on stderr.")
    boolean quiet;

    @CommandLine.Mixin
    ReportOptions map;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        double snap = layer.snap();
        for (double threshold : new double[] {nearMiss, stub, duplicate}) {
            if (!(threshold >= 0) || threshold > 1000) {
                throw new CommandLine.ParameterException(spec.commandLine(),
                        "--near-miss, --stub and --duplicate-within must be between 0 and 1000 metres");
            }
        }
        depot.check(spec.commandLine());
        map.validate();
        CheckOptions options = new CheckOptions(snap, nearMiss, stub, duplicate);
        StageClock clock = new StageClock(TerminalProgress.forCommandLine(quiet, spec.commandLine().getErr()));
        HealthReport report = HealthCheck.run(new HealthCheck.Request(input, layer.readOptions(), options,
                depot.position, depot.reach), clock);
        List<Finding> findings = report.findings();
        StreetNetwork network = report.network();
        if (out != null) {
            clock.run("write", () -> new FindingGeoJsonWriter().write(out, findings));
        }
        HealthSummary summary = HealthSummary.of(report, clock.stages(), out);
        List<MapLayer> layers = new ArrayList<>(List.of(NetworkLayer.of(network)));
        layers.addAll(FindingLayers.of(findings));
        map.write("Health check: " + input.getFileName(), layers, FindingLayers.groups(findings), summary.json(),
                summary.glance(), ReportOptions.CHECK_CAUTIONS, clock);
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.print(json ? summary.toJson() : summary.toText());
        stdout.flush();
        return report.blocking() ? ExitCode.NO_TOUR : ExitCode.OK;
    }
}
