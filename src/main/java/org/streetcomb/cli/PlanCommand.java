package org.streetcomb.cli;

import java.util.List;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.streetcomb.ExitCode;
import org.streetcomb.network.LonLat;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanFiles;
import org.streetcomb.plan.PlanRequest;
import org.streetcomb.plan.Planner;
import org.streetcomb.timing.StageClock;
import org.streetcomb.report.PlanLayers;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code streetcomb plan}: the shortest closed tour over every street of a layer. */
@Command(name = "plan",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Plans the shortest closed tour from the depot that drives every street of the layer at least once. "
                + "Prints a summary; writes the tour as GeoJSON with --out.",
            "",
            "Plans are advice: obey traffic law and signs, never handle a device while driving, and check the "
                + "route against local rules and your own risk assessment; map data may be out of date."})
public final class PlanCommand implements Callable<Integer> {



    @Parameters(index = "0", paramLabel = "LAYER", description = "Road centrelines: GeoJSON (.geojson, .json), a shapefile (.shp, or a .zip holding one), a GeoPackage (.gpkg) or OpenStreetMap (.osm, .osm.gz, .osm.bz2, .osm.pbf); - reads it from standard input.")
    Path input;

    @CommandLine.Mixin
    DepotOptions depot;

    @Option(names = {"-o", "--out"}, paramLabel = "FILE", description = "Write the tours as a GeoJSON FeatureCollection (- for standard output; the summary then goes to standard error).")
    @Writes(standardOutput = true)
    Path out;

    @Option(names = "--steps", description = "Also write one GeoJSON feature per step of each tour.")
    boolean steps;

    @Option(names = "--json", description = "Print the summary as JSON instead of text.")
    boolean json;

    @Option(names = {"-q", "--quiet"}, description = "No progress messages on stderr.")
    boolean quiet;

    @CommandLine.Mixin
    LayerOptions layer;

    @CommandLine.Mixin
    RepairMixin repair;

    @CommandLine.Mixin
    FieldOutputOptions field;

    @CommandLine.Mixin
    ReportOptions report;

    @CommandLine.Mixin
    ServiceMixin service;

    @CommandLine.Mixin
    AreaOptions area;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        double snap = layer.snap();
        depot.check(spec.commandLine());
        field.check(spec.commandLine());
        report.validate();
        PrintWriter stdout = spec.commandLine().getOut();
        StageClock clock = new StageClock(TerminalProgress.forCommandLine(quiet, spec.commandLine().getErr()));
        Plan plan = Planner.plan(new PlanRequest(input, depot.position, snap, depot.reach, service.scope.depotOnly, layer.readOptions(),
                service.options(spec.commandLine()).withArea(area.area(spec.commandLine())), field.arrangement()),
                repair.options(), clock);
        PlanFiles.Written written = PlanFiles.write(plan, field.files(out, steps, true), clock);
        PlanSummary.Section fieldSection = field.section(plan, written);
        PlanSummary summary = PlanSummary.of(plan, clock.stages(), out);
        summary.add(fieldSection);
        if (report.requested()) {
            // the map's layers cost seconds on large networks: built only for a report
            summary.add(report.section());
            report.write("Plan: " + input.getFileName(), PlanLayers.of(plan), PlanLayers.groups(plan), summary.json(),
                    summary.glance(), clock);
        }
        stdout.print(json ? summary.toJson() : summary.toText());
        stdout.flush();
        return ExitCode.OK;
    }
}
