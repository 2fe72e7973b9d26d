package org.streetcomb.cli;

import java.nio.file.Path;
import org.streetcomb.read.PlaceLayerReader;
import org.streetcomb.scope.AreaChoice;
import org.streetcomb.scope.ServiceArea;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** Options scoping the service to an area drawn as a polygon. */
public final class AreaOptions {

    @Option(names = "--area", paramLabel = "FILE",
            description = "Service only the streets inside a polygon of this layer (GeoJSON, shapefile or GeoPackage); "
                    + "streets crossing its edge are cut there. Roads outside it within --area-margin are used only "
                    + "to travel.")
    Path area;

    @Option(names = "--area-pick", paramLabel = "FIELD=VALUE",
            description = "With --area: the polygon whose attribute FIELD holds VALUE, when the layer holds several.")
    String pick;

    @Option(names = "--area-margin", paramLabel = "METRES", defaultValue = "1000",
            description = "With --area: how far outside it roads are kept to travel on (default: ${DEFAULT-VALUE} m, "
                    + "enough for a one-way street leading out of the area to find its way back).")
    double margin;

    @Option(names = "--area-crs", paramLabel = "CRS",
            description = "With --area: the area layer's coordinate reference system (EPSG:code or a WKT file), "
                    + "when it states none.")
    String crs;

    @Option(names = "--area-table", paramLabel = "NAME",
            description = "With --area: the table to read from a GeoPackage holding several.")
    String table;

    /** The area asked for, or null; checks the options first. */
    ServiceArea area(CommandLine commandLine) {
        if (!(margin >= 0) || Double.isInfinite(margin)) {
            throw new CommandLine.ParameterException(commandLine, "--area-margin must be 0 or more metres");
        }
        String field = null;
        String value = null;
        if (pick != null) {
            int eq = pick.indexOf('=');
            if (eq <= 0) {
                throw new CommandLine.ParameterException(commandLine, "--area-pick takes FIELD=VALUE, not " + pick);
            }
            field = pick.substring(0, eq).strip();
            value = pick.substring(eq + 1);
        }
        if (area == null) {
            if (pick != null || crs != null || table != null) {
                throw new CommandLine.ParameterException(commandLine, "--area-pick, --area-crs and --area-table need --area");
            }
            return null;
        }
        return AreaChoice.pick(PlaceLayerReader.read(area, crs, table), area, field, value, margin);
    }
}
