package org.streetcomb.cli;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.streetcomb.read.ReadOptions;
import org.streetcomb.read.ReadOptions.FieldFilter;
import org.streetcomb.read.TravelMode;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * The options that say how to read a road layer and join its lines into a network, shared by every
 * command that reads one ({@code @Mixin LayerOptions layer;}). The layer path itself stays a positional
 * parameter of each command.
 */
public final class LayerOptions {

    @Option(names = "--snap", paramLabel = "METRES", defaultValue = "0.5", order = 100,
            description = "Join line ends and vertices closer than this (default: ${DEFAULT-VALUE} m).")
    double snap;

    @Option(names = "--name-field", paramLabel = "FIELD", defaultValue = "name", order = 101,
            description = "Attribute holding the street name (default: ${DEFAULT-VALUE}).")
    String nameField;

    @Option(names = "--oneway-field", paramLabel = "FIELD", defaultValue = "oneway", order = 102,
            description = "Attribute holding the one-way flag (default: ${DEFAULT-VALUE}).")
    String onewayField;

    @Option(names = "--oneway-forward", paramLabel = "VALUES", split = ",", order = 103,
            description = "Values meaning one-way in the direction the line was drawn "
                    + "(default: yes, true, 1, y, ft, forward, fwd).")
    List<String> onewayForward;

    @Option(names = "--oneway-backward", paramLabel = "VALUES", split = ",", order = 104,
            description = "Values meaning one-way against the drawn direction (default: -1, tf, reverse, backward, back, rev).")
    List<String> onewayBackward;

    @Option(names = "--oneway-both", paramLabel = "VALUES", split = ",", order = 105,
            description = "Values meaning two-way (default: no, false, 0, n, b, both, empty). "
                    + "Other values are read as two-way and counted in the summary.")
    List<String> onewayBoth;

    @Option(names = "--keep", paramLabel = "FIELD=VALUES", converter = FieldFilterConverter.class, order = 106,
            description = "Keep only features whose FIELD holds one of the comma-separated VALUES (repeatable: all must match).")
    List<FieldFilter> keep = new ArrayList<>();

    @Option(names = "--drop", paramLabel = "FIELD=VALUES", converter = FieldFilterConverter.class, order = 107,
            description = "Leave out features whose FIELD holds one of the comma-separated VALUES (repeatable).")
    List<FieldFilter> drop = new ArrayList<>();

    @Option(names = "--required-field", paramLabel = "FIELD", order = 108,
            description = "Attribute marking the streets that must be serviced (yes, true, 1, y, t); "
                    + "default: every street is required.")
    String requiredField;

    @Option(names = "--mode", paramLabel = "MODE", defaultValue = "drive", converter = ModeConverter.class, order = 109,
            description = "Travel mode for OpenStreetMap data: drive or walk (default: ${DEFAULT-VALUE}).")
    TravelMode mode;

    @Option(names = "--service-roads", order = 110,
            description = "Include OpenStreetMap service roads (driveways, car parks, alleys) when driving.")
    boolean serviceRoads;

    @Option(names = "--private-roads", order = 111,
            description = "Include OpenStreetMap roads tagged access=private or access=no.")
    boolean privateRoads;

    @Option(names = "--crs", paramLabel = "EPSG:CODE|FILE", order = 112,
            description = "The layer's coordinate reference system, as EPSG:code or a file holding its WKT; "
                    + "needed for a shapefile without a .prj.")
    String crs;

    @Option(names = "--grade-separated", order = 113,
            description = "Join lines only where they share a vertex, never where they merely cross, so bridges and "
                    + "tunnels drawn across streets stay apart (OpenStreetMap data always works this way).")
    boolean gradeSeparated;

    @Option(names = "--level-field", paramLabel = "FIELD", order = 114,
            description = "Attribute giving each line's level (z-level, layer); implies --grade-separated: lines at "
                    + "different levels meet only where one of them ends.")
    String levelField;

    @Option(names = "--cost-field", paramLabel = "FIELD", order = 115,
            description = "Attribute giving each street's cost (travel minutes, say): tours then minimise total cost "
                    + "instead of length, and summaries report cost beside metres.")
    String costField;

    @Option(names = "--layer", paramLabel = "NAME", order = 116,
            description = "The line layer (table) to read from a GeoPackage that holds several.")
    String layer;

    @Option(names = "--id-field", paramLabel = "FIELD", order = 117,
            description = "Attribute holding each street's id, as your GIS knows it: used in messages, outputs and "
                    + "--service-ids. Default: the layer's own id (FID counted from 0 as GDAL does for shapefiles and "
                    + "GeoPackages, the GeoJSON feature id, way/N for OpenStreetMap).")
    String idField;

    @Option(names = "--crossing-limit", paramLabel = "N", order = 118, defaultValue = "-1",
            description = "Most places where lines cross mid-segment that noding may split at, a guard against "
                    + "damaged geometry whose noding would explode; default: 20 per segment of the layer plus "
                    + "10,000; 0: no limit.")
    long crossingLimit;

    @CommandLine.Spec(CommandLine.Spec.Target.MIXEE)
    CommandLine.Model.CommandSpec mixee;

    /** The snap tolerance in metres, checked. */
    public double snap() {
        if (!(snap > 0) || snap > 100) {
            throw new CommandLine.ParameterException(mixee.commandLine(), "--snap must be above 0 and at most 100 metres");
        }
        return snap;
    }

    public ReadOptions readOptions() {
        ReadOptions d = ReadOptions.DEFAULTS;
        return new ReadOptions(nameField, onewayField,
                values(onewayForward, d.onewayForward()), values(onewayBackward, d.onewayBackward()),
                values(onewayBoth, d.onewayBoth()), keep, drop, requiredField, mode, serviceRoads, privateRoads, crs,
                gradeSeparated || levelField != null, levelField, costField, layer, idField, crossingLimit);
    }

    private static Set<String> values(List<String> given, Set<String> defaults) {
        return given == null ? defaults : new LinkedHashSet<>(given);
    }

    /** Parses FIELD=V1,V2. */
    static final class FieldFilterConverter implements CommandLine.ITypeConverter<FieldFilter> {
        @Override
        public FieldFilter convert(String value) {
            int eq = value.indexOf('=');
            if (eq <= 0) {
                throw new CommandLine.TypeConversionException("expected FIELD=VALUE[,VALUE...]; got '" + value + "'");
            }
            return new FieldFilter(value.substring(0, eq), new LinkedHashSet<>(List.of(value.substring(eq + 1).split(",", -1))));
        }
    }

    /** Parses drive or walk, ignoring case. */
    static final class ModeConverter implements CommandLine.ITypeConverter<TravelMode> {
        @Override
        public TravelMode convert(String value) {
            try {
                return TravelMode.valueOf(value.trim().toUpperCase(Locale.ROOT));
            } catch (IllegalArgumentException e) {
                throw new CommandLine.TypeConversionException("expected drive or walk; got '" + value + "'");
            }
        }
    }
}
