package org.streetcomb.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.streetcomb.ExitCode;
import org.streetcomb.plan.Audit;
import org.streetcomb.plan.AuditRequest;
import org.streetcomb.write.CoverageGeoJsonWriter;
import org.streetcomb.plan.DriveAudit;
import org.streetcomb.match.MatchSettings;
import org.streetcomb.network.LonLat;
import org.streetcomb.plan.MopUpPlanning;
import org.streetcomb.plan.MopUpRequest;
import org.streetcomb.plan.Plan;
import org.streetcomb.plan.PlanFiles;
import org.streetcomb.plan.PlanScope;
import org.streetcomb.plan.ScopeRecord;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.timing.StageClock;
import org.streetcomb.report.CoverageLayers;
import org.streetcomb.report.MapGroup;
import org.streetcomb.report.MapLayer;
import org.streetcomb.report.PlanLayers;
import org.streetcomb.report.TrackLines;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code streetcomb audit}: which streets the recorded GPS tracks of a drive covered, and which they missed. */
@Command(name = "audit",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Matches recorded GPS tracks (GPX) to the streets of the layer and reports, per street, the share of its "
                + "length that was driven (for one-way streets, in the permitted direction). Prints a summary; writes "
                + "the streets with their status and the missed parts as GeoJSON, and with --report and --quicklook "
                + "a map of them.",
            "",
            "GPS tracks wander and maps age: check doubtful streets on the ground before reporting them."})
public final class AuditCommand implements Callable<Integer> {



    static final String TRACK_CAUTION = "Coverage is inferred from GPS tracks, which wander and drop out: check "
            + "doubtful streets on the ground before reporting them covered or missed.";

    @Parameters(index = "0", paramLabel = "LAYER", description = "Road centrelines, the same layer the tour was planned on: GeoJSON, a shapefile (or a .zip holding one), a GeoPackage (.gpkg) or OpenStreetMap; - reads it from standard input.")
    Path layerFile;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "TRACK", description = "GPX files of the drive (tracks, any number of segments and days); - reads one from standard input.")
    List<Path> tracks;

    @Option(names = "--covered-at", paramLabel = "SHARE", defaultValue = "0.9",
            description = "Share of a street's length that counts as covered, above 0 and at most 1 (default: ${DEFAULT-VALUE}).")
    double coveredAt;

    @Option(names = "--both-kerbs", description = "Each two-way street must be driven once in each direction.")
    boolean bothKerbs;

    @CommandLine.Mixin
    ScopeOptions scope;

    @Option(names = "--plan", paramLabel = "FILE",
            description = "The tour GeoJSON that plan --out wrote: audit what that plan asked for (its depot, "
                    + "--depot-part-only, --leave-out-cut-off, --service-ids and kerbs, which it records), "
                    + "instead of repeating those options.")
    Path plan;

    @Option(names = "--streets-out", paramLabel = "FILE", description = "Write every street with its coverage status and share as GeoJSON.")
    @Writes(standardOutput = true)
    Path streetsOut;

    @Option(names = "--missed-out", paramLabel = "FILE", description = "Write the missed parts of streets as GeoJSON lines.")
    @Writes(standardOutput = true)
    Path missedOut;

    @Option(names = "--mop-up", paramLabel = "FILE",
            description = "Plan a tour that services only the missed parts and write it as GeoJSON; --gpx, --kml, "
                    + "--directions and the trip options write the same tour for the field.")
    @Writes(standardOutput = true)
    Path mopUpOut;

    @Option(names = "--mop-up-turn-back",
            description = "Let the mop-up turn back where a missed stretch ends in the middle of a street (a car or a "
                    + "walker can); by default it drives on to the next junction, servicing only the missed stretch.")
    boolean turnBack;

    @Option(names = "--mop-up-ids", paramLabel = "FILE",
            description = "Write the ids of the streets not covered, one per line, for plan --service-ids.")
    @Writes(standardOutput = true)
    Path mopUpIds;

    @CommandLine.Mixin
    DepotOptions depot;

    @Option(names = "--start", paramLabel = "LON,LAT", converter = LonLatConverter.class,
            description = "Where the crew is now: the mop-up tour starts here and ends at the depot (within --depot-reach "
                    + "of a street node).")
    LonLat start;

    @Option(names = "--gps-sigma", paramLabel = "METRES|estimate", defaultValue = "estimate",
            description = "GPS position noise, one standard deviation, in metres; or 'estimate': for each track segment, "
                    + "from how far its fixes lie from a first match at 10 m (default: ${DEFAULT-VALUE}).")
    String sigma;

    @Option(names = "--search-radius", paramLabel = "METRES", defaultValue = "50",
            description = "Streets farther than this from a fix are not considered for it (default: ${DEFAULT-VALUE} m).")
    double radius;

    @Option(names = "--route-scale", paramLabel = "METRES", defaultValue = "5",
            description = "How far the route between fixes may differ from the straight line before it becomes "
                    + "improbable (Newson-Krumm beta; default: ${DEFAULT-VALUE} m).")
    double beta;

    @Option(names = "--doubt-odds", paramLabel = "N", defaultValue = "20",
            description = "Credit the streets of every drive that fits the fixes at most N times worse than the "
                    + "best fitting drive, as where a dropout hides which of two ways was taken; 1 credits "
                    + "the best fitting drive only (default: ${DEFAULT-VALUE}).")
    double doubtOdds;

    @Option(names = "--drift-window", paramLabel = "SECONDS", defaultValue = "0",
            description = "Take out the receiver's slowly varying error (drift), estimated as the mean offset of the "
                    + "fixes from a first match over this many seconds either side, e.g. 60 for tracks that run "
                    + "beside the streets for minutes; 0 does not (default: ${DEFAULT-VALUE}).")
    double driftWindow;

    @Option(names = "--max-gap", paramLabel = "METRES", defaultValue = "300",
            description = "The longest stretch credited between two consecutive fixes; a longer dropout is not "
                    + "counted as driven (default: ${DEFAULT-VALUE} m).")
    double maxGap;

    @Option(names = "--max-speed", paramLabel = "KM/H", defaultValue = "200",
            description = "Fixes implying a faster speed are dropped or split the track (default: ${DEFAULT-VALUE} km/h).")
    double maxSpeed;

    @Option(names = "--json", description = "Print the summary as JSON instead of text.")
    boolean json;

    @Option(names = {"-q", "--quiet"}, description = "No progress messages on stderr.")
    boolean quiet;

    @CommandLine.Mixin
    LayerOptions layer;

    @CommandLine.Mixin
    FieldOutputOptions field;

    @CommandLine.Mixin
    ReportOptions report;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** The scope read from --plan, or null. */
    private PlanScope recorded;

    /** The mop-up tour once planned, for the report's map. */
    private Plan mopUpPlan;

    @Override
    public Integer call() {
        if (!(coveredAt > 0 && coveredAt <= 1)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--covered-at must be above 0 and at most 1");
        }
        boolean estimateSigma = sigma.trim().equalsIgnoreCase("estimate");
        double sigmaMetres = estimateSigma ? MatchSettings.DEFAULT_SIGMA : number(sigma, "--gps-sigma");
        positive(sigmaMetres, "--gps-sigma");
        positive(radius, "--search-radius");
        positive(beta, "--route-scale");
        positive(maxGap, "--max-gap");
        positive(maxSpeed, "--max-speed");
        if (!(driftWindow >= 0) || !Double.isFinite(driftWindow)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--drift-window must be 0 or more seconds");
        }
        if (!(doubtOdds >= 1) || !Double.isFinite(doubtOdds)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--doubt-odds must be 1 or more");
        }
        depot.check(spec.commandLine());
        if (plan != null && (scope.narrowed() || bothKerbs || depot.position != null)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--plan brings the plan's depot and scope: "
                    + "give it without --depot, --depot-part-only, --leave-out-cut-off, --service-ids and --both-kerbs");
        }
        field.check(spec.commandLine());
        report.validate();
        if (start != null && field.tripOptions.requested()) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--start cannot be combined with the trip options: every trip starts and ends at the depot");
        }
        MatchSettings settings = new MatchSettings(sigmaMetres, radius, beta, maxGap, maxSpeed / 3.6, doubtOdds, driftWindow,
                estimateSigma);
        StageClock clock = new StageClock(TerminalProgress.forCommandLine(quiet, spec.commandLine().getErr()));
        TrackLines seen = new TrackLines();
        PlanScope asked = scope();
        if (plan != null) {
            recorded = asked;
        }
        boolean kerbs = recorded != null ? recorded.service().kerbs() != KerbMode.ONE_PASS : bothKerbs;
        Audit audit = DriveAudit.run(new AuditRequest(layerFile, tracks, layer.snap(), settings, coveredAt, kerbs,
                layer.readOptions(), asked), clock, report.requested() ? seen : segment -> { });
        if (streetsOut != null) {
            clock.run("write streets", () -> CoverageGeoJsonWriter.writeStreets(streetsOut, audit.coverage()));
        }
        if (missedOut != null) {
            clock.run("write missed", () -> CoverageGeoJsonWriter.writeMissed(missedOut, audit.coverage()));
        }
        if (mopUpIds != null) {
            clock.run("write ids", () -> NotCoveredIds.write(mopUpIds, audit));
        }
        PlanSummary.Section mopUp = mopUpRequested() ? mopUp(audit, clock) : null;
        AuditSummary summary = AuditSummary.of(audit, clock.stages(), streetsOut, missedOut);
        if (mopUp != null) {
            summary.add(mopUp);
        }
        if (report.requested()) {
            summary.add(report.section());
            writeReport(audit, seen, summary, clock);
        }
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.print(json ? summary.toJson() : summary.toText());
        stdout.flush();
        return ExitCode.OK;
    }

    /** The map of covered and missed streets, with the mop-up tour drawn as plan draws a tour. */
    private void writeReport(Audit audit, TrackLines seen, AuditSummary summary, StageClock clock) {
        List<MapLayer> layers = new ArrayList<>(CoverageLayers.of(audit.coverage(), seen));
        List<MapGroup> groups = List.of();
        List<String> cautions = new ArrayList<>(List.of(TRACK_CAUTION));
        if (mopUpPlan != null) {
            layers.addAll(PlanLayers.tourLayers(mopUpPlan));
            groups = PlanLayers.groups(mopUpPlan);
            cautions.addAll(ReportOptions.CAUTIONS);
        } else {
            cautions.addAll(ReportOptions.CHECK_CAUTIONS);
        }
        String drive = tracks.size() == 1 ? tracks.get(0).getFileName().toString() : tracks.size() + " GPX files";
        report.write("Coverage: " + drive + " on " + layerFile.getFileName(), layers, groups, summary.json(),
                summary.glance(), cautions, clock);
    }

    /** What the plan asked for, when any of the plan's scope options is given; null audits every required street. */
    private PlanScope scope() {
        if (plan != null) {
            return ScopeRecord.read(plan);
        }
        if (!scope.narrowed()) {
            return null;
        }
        return new PlanScope(depot.position, depot.reach, scope.depotOnly, new ServiceOptions(
                bothKerbs ? KerbMode.BOTH_KERBS : KerbMode.ONE_PASS, scope.serviceIds, null, scope.leaveOutCutOff));
    }

    private boolean mopUpRequested() {
        return mopUpOut != null || field.anyFile();
    }

    /** Plans the mop-up tour and writes it; returns its part of the summary. */
    private PlanSummary.Section mopUp(Audit audit, StageClock clock) {
        MopUpPlanning.Result planned = MopUpPlanning.plan(audit,
                new MopUpRequest(recorded != null ? recorded.depot() : depot.position, start,
                        recorded != null ? recorded.depotReach() : depot.reach, turnBack, field.arrangement()), clock);
        if (planned == null) {
            return MopUpSection.nothing();
        }
        mopUpPlan = planned.plan();
        PlanFiles.Written written = PlanFiles.write(mopUpPlan, field.files(mopUpOut, true, false), clock, "write mop-up");
        return MopUpSection.of(mopUpPlan, planned.planned(), field.section(mopUpPlan, written), mopUpOut);
    }

    private double number(String text, String option) {
        try {
            return Double.parseDouble(text.trim());
        } catch (NumberFormatException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), option + " must be a number of metres or 'estimate', not '"
                    + text + "'");
        }
    }

    private void positive(double value, String option) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new CommandLine.ParameterException(spec.commandLine(), option + " must be a positive number");
        }
    }
}
