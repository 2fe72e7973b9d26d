package org.streetcomb.cli;

import org.streetcomb.network.LonLat;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** Where the depot is: one option group, one validation rule, for every command that takes a depot. */
final class DepotOptions {

    @Option(names = "--depot", paramLabel = "LON,LAT", converter = LonLatConverter.class,
            description = "The depot, as longitude,latitude in degrees (WGS84): where tours start and end (for audit, "
                    + "where the mop-up tour ends; for health, where streets are checked for a legal route from and "
                    + "back). Default: the node nearest the layer's first point among the largest set of streets "
                    + "that can all reach each other.")
    LonLat position;

    @Option(names = "--depot-reach", paramLabel = "METRES", defaultValue = "500",
            description = "Refuse a depot farther than this from the nearest street node (default: ${DEFAULT-VALUE} m).")
    double reach;

    /** Checks the values before anything is read (a usage error, exit 2). */
    void check(CommandLine commandLine) {
        if (!(reach >= 0) || !Double.isFinite(reach)) {
            throw new CommandLine.ParameterException(commandLine, "--depot-reach must be 0 or more metres");
        }
    }
}
