package org.streetcomb.report;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.CoverageStatus;
import org.streetcomb.coverage.EdgeSlice;
import org.streetcomb.coverage.MissedPart;
import org.streetcomb.coverage.StreetCoverageAccounting;
import org.streetcomb.coverage.StreetCoverage;
import org.streetcomb.coverage.WrongWayPart;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;
import org.streetcomb.read.Travel;

/**
 * The map layers of a coverage audit: every street line in the colour of its status (one layer per
 * status, so each can be switched alone), the stretches still to drive, stretches of one-way streets
 * driven the wrong way, and the recorded tracks. Covered streets and streets not required are drawn one
 * feature per street name (a street split at every junction is one thing to point at, and a large layer
 * stays small); partly covered and missed street lines are one feature each.
 *
 * <p>Colours: the four-class diverging red-blue scheme of ColorBrewer 2.0 (Brewer, Penn State), which its
 * authors mark safe for colour-blind viewers, with the light blue for covered, the dark red for missed and
 * the light red for partly covered, so "not driven" reads as the strongest colour and the scheme does not
 * rely on telling red from green. Widths differ too (missed widest), a second cue besides colour. Streets
 * that need no service are the network's grey, dashed.
 */
public final class CoverageLayers {

    static final String COVERED = MapPalette.COVERED;
    static final String PARTLY = MapPalette.PARTLY;
    static final String MISSED = MapPalette.MISSED;
    static final String NOT_REQUIRED = NetworkLayer.COLOUR;
    static final String WRONG_WAY = MapPalette.WRONG_WAY;
    private static final Map<CoverageStatus, MapStyle> STYLES = new EnumMap<>(Map.of(
            CoverageStatus.COVERED, MapStyle.solid(COVERED, 3, 0.9),
            CoverageStatus.PARTLY, MapStyle.solid(PARTLY, 4, 0.95),
            CoverageStatus.MISSED, MapStyle.solid(MISSED, 5, 0.95),
            CoverageStatus.NOT_REQUIRED, new MapStyle(NOT_REQUIRED, 2, 1, "4 4"),
            CoverageStatus.LEFT_OUT, MapStyle.solid(MapPalette.LEFT_OUT, 4, 0.9)));
    /** Statuses drawn one feature per street name. */
    private static final Set<CoverageStatus> MERGED = EnumSet.of(CoverageStatus.COVERED, CoverageStatus.NOT_REQUIRED,
            CoverageStatus.LEFT_OUT);
    /** Stretches shorter than this get no arrow: it would not be readable. */
    private static final double MIN_ARROW_PART = 6;

    private final CoverageReport coverage;
    private final StreetNetwork network;

    private CoverageLayers(CoverageReport coverage) {
        this.coverage = coverage;
        this.network = coverage.network();
    }

    /**
     * The layers, bottom first: streets by status (streets not required only if there are any), stretches
     * not driven, wrong-way stretches (if any), and the tracks.
     */
    public static List<MapLayer> of(CoverageReport coverage, TrackLines tracks) {
        return new CoverageLayers(coverage).layers(tracks);
    }

    private List<MapLayer> layers(TrackLines tracks) {
        Map<CoverageStatus, List<MapFeature>> byStatus = new EnumMap<>(CoverageStatus.class);
        Map<CoverageStatus, Integer> lines = new EnumMap<>(CoverageStatus.class);
        Map<CoverageStatus, Map<String, List<StreetCoverage>>> byName = new EnumMap<>(CoverageStatus.class);
        for (CoverageStatus status : CoverageStatus.values()) {
            byStatus.put(status, new ArrayList<>());
            lines.put(status, 0);
            byName.put(status, new LinkedHashMap<>());
        }
        for (StreetCoverage street : coverage.streets()) {
            lines.merge(street.status(), 1, Integer::sum);
            if (MERGED.contains(street.status())) {
                byName.get(street.status()).computeIfAbsent(NetworkLayer.streetKey(street.feature()), k -> new ArrayList<>())
                        .add(street);
            } else {
                byStatus.get(street.status()).add(street(street));
            }
        }
        for (CoverageStatus status : MERGED) {
            for (List<StreetCoverage> named : byName.get(status).values()) {
                byStatus.get(status).add(named.size() == 1 ? street(named.get(0)) : sameName(named));
            }
        }
        String threshold = percent(coverage.threshold());
        String missedBelow = percent(StreetCoverageAccounting.MISSED_BELOW);
        String how = coverage.bothKerbs() ? ", each side of a two-way street counted" : "";
        List<MapLayer> layers = new ArrayList<>();
        if (!byStatus.get(CoverageStatus.NOT_REQUIRED).isEmpty()) {
            layers.add(status(CoverageStatus.NOT_REQUIRED, "Not required", "streets used only to travel between others",
                    byStatus, lines));
        }
        if (!byStatus.get(CoverageStatus.LEFT_OUT).isEmpty()) {
            layers.add(status(CoverageStatus.LEFT_OUT, "Left out of the plan", "streets the plan did not ask for: cut "
                    + "off by one-way streets, on another part, or not listed", byStatus, lines));
        }
        layers.add(status(CoverageStatus.COVERED, "Covered", "at least " + threshold + " of the street driven, one-way "
                + "streets in their direction" + how, byStatus, lines));
        layers.add(status(CoverageStatus.PARTLY, "Partly covered", missedBelow + " to " + threshold + " driven" + how,
                byStatus, lines));
        layers.add(status(CoverageStatus.MISSED, "Missed", "less than " + missedBelow + " driven" + how, byStatus,
                lines));
        List<MapFeature> parts = new ArrayList<>();
        for (MissedPart part : coverage.missed()) {
            parts.add(missed(part));
        }
        layers.add(new MapLayer("not-driven", "Still to drive (" + parts.size() + ")",
                "the stretches of required streets not driven; arrows where only one direction is still needed",
                MapLayer.Kind.LINES, MapStyle.solid(MapPalette.STILL_TO_DRIVE, 2, 1), true, parts));
        if (!coverage.wrongWayParts().isEmpty()) {
            List<MapFeature> wrong = new ArrayList<>();
            for (WrongWayPart part : coverage.wrongWayParts()) {
                wrong.add(wrongWay(part));
            }
            layers.add(new MapLayer("wrong-way", "Against a one-way (" + wrong.size() + ")",
                    "stretches of one-way streets a track went along the wrong way, arrowed as driven; not counted as "
                            + "driven: check the track and the one-way data",
                    MapLayer.Kind.LINES, new MapStyle(WRONG_WAY, 4, 1, "8 4"), true, wrong));
        }
        layers.add(tracks.layer());
        return layers;
    }

    /** A status's layer, titled with its number of street lines (the summary's count). */
    private static MapLayer status(CoverageStatus status, String title, String note,
                                   Map<CoverageStatus, List<MapFeature>> byStatus, Map<CoverageStatus, Integer> lines) {
        return new MapLayer(status.label().replace(' ', '-'), title + " (" + lines.get(status) + ")", note,
                MapLayer.Kind.LINES, STYLES.get(status), true, byStatus.get(status));
    }

    /** Street lines of one name and one status, sewn together as one thing to point at. */
    private static MapFeature sameName(List<StreetCoverage> named) {
        List<LineString> lines = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        double needed = 0;
        double driven = 0;
        double wrongWay = 0;
        for (StreetCoverage street : named) {
            lines.add(street.feature().line());
            ids.add(street.feature().id());
            needed += street.needed();
            driven += street.driven();
            wrongWay += street.wrongWay();
        }
        StreetCoverage first = named.get(0);
        String name = NetworkLayer.streetName(first.feature());
        double share = needed > 0 ? Math.min(1, driven / needed) : 1;
        Map<String, String> details = new LinkedHashMap<>();
        details.put("Street", name);
        details.put("Street lines", String.valueOf(named.size()));
        details.put("Feature ids", NetworkLayer.idList(ids));
        details.put("Status", first.status().label() + " (each line)");
        details.put("Driven", share(share));
        details.put("To drive (m)", metres(needed));
        details.put("Driven (m)", metres(driven));
        if (wrongWay > 0) {
            details.put("Against its one-way (m)", metres(wrongWay));
        }
        String label = String.format(Locale.ROOT, "%s: %s, %d lines, %s driven", name, first.status().label(),
                named.size(), share(share));
        return new MapFeature(NetworkLayer.merged(lines), null, null, label, details);
    }

    private static MapFeature street(StreetCoverage street) {
        RoadFeature f = street.feature();
        Coordinate[] coordinates = f.line().getCoordinates();
        double[] line = new double[2 * coordinates.length];
        for (int k = 0; k < coordinates.length; k++) {
            line[2 * k] = coordinates[k].x;
            line[2 * k + 1] = coordinates[k].y;
        }
        Map<String, String> details = new LinkedHashMap<>();
        details.put("Street", NetworkLayer.streetName(f));
        details.put("Feature id", f.id());
        details.put("Status", street.status().label());
        details.put("Driven", share(street.fraction()));
        details.put("To drive (m)", metres(street.needed()));
        details.put("Driven (m)", metres(street.driven()));
        if (street.wrongWay() > 0) {
            details.put("Against its one-way (m)", metres(street.wrongWay()));
        }
        details.put("Travel", travel(f.travel()));
        String label = String.format(Locale.ROOT, "%s: %s, %s driven", NetworkLayer.streetName(f), street.status().label(),
                share(street.fraction()));
        return new MapFeature(new double[][] {line}, null, null, label, details);
    }

    private MapFeature missed(MissedPart part) {
        RoadFeature f = network.feature(part.edge());
        double[] line = EdgeSlice.of(network, part.edge(), part.from(), part.to(), part.way() == MissedPart.Way.AGAINST);
        String way = switch (part.way()) {
            case EITHER -> "either way";
            case ALONG -> "along the line's drawn direction (arrow)";
            case AGAINST -> "against the line's drawn direction (arrow)";
        };
        Map<String, String> details = new LinkedHashMap<>();
        details.put("Street", NetworkLayer.streetName(f));
        details.put("Feature id", f.id());
        details.put("Length (m)", metres(part.length()));
        details.put("Drive it", way);
        String label = String.format(Locale.ROOT, "Still to drive: %s, %s m", NetworkLayer.streetName(f), metres(part.length()));
        return new MapFeature(arrowed(line, part.length(), part.way() != MissedPart.Way.EITHER), null, null, label, details);
    }

    private MapFeature wrongWay(WrongWayPart part) {
        RoadFeature f = network.feature(part.edge());
        double[] line = EdgeSlice.of(network, part.edge(), part.from(), part.to(), !part.along());
        Map<String, String> details = new LinkedHashMap<>();
        details.put("Street", NetworkLayer.streetName(f));
        details.put("Feature id", f.id());
        details.put("Length (m)", metres(part.length()));
        details.put("One-way", travel(f.travel()));
        String label = String.format(Locale.ROOT, "Driven against the one-way: %s, %s m", NetworkLayer.streetName(f),
                metres(part.length()));
        return new MapFeature(arrowed(line, part.length(), true), null, null, label, details);
    }

    /** The line, with an arrowhead beside its middle pointing along it when asked and long enough to read. */
    private static double[][] arrowed(double[] line, double length, boolean arrow) {
        if (!arrow || length < MIN_ARROW_PART) {
            return new double[][] {line};
        }
        return new double[][] {line, PlanLayers.arrowhead(line, Math.min(12, Math.max(3, length * 0.12)))};
    }

    private static String travel(Travel travel) {
        return switch (travel) {
            case BOTH -> "two-way";
            case FORWARD -> "one-way, along the line's drawn direction";
            case BACKWARD -> "one-way, against the line's drawn direction";
        };
    }

    private static String percent(double share) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * share);
    }

    private static String share(double share) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * share);
    }

    private static String metres(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }
}
