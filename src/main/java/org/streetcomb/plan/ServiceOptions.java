package org.streetcomb.plan;

import java.nio.file.Path;
import org.streetcomb.network.LonLat;
import org.streetcomb.scope.ServiceArea;
import org.streetcomb.solve.KerbMode;

/**
 * Which streets need which passes, and where the depot's tour ends.
 *
 * @param kerbs      passes per street
 * @param serviceIds a file of feature ids, one per line, that are the only streets to service; null to use
 *                   the layer's required flags (all streets unless the layer marks some)
 * @param end        where the depot's tour ends (an open route), or null to return to the depot
 * @param leaveOutCutOff leave out, with a warning, streets that one-way streets cut off from the tour's
 *                   start or end, instead of refusing to plan
 * @param proveSeconds  when above zero, seek a proof of optimality (or a shorter tour) for at most this many
 *                   seconds after the heuristic ({@code CirculationSearch})
 * @param area       service only the streets inside this area, travelling on the roads around it; null for
 *                   the whole layer
 */
public record ServiceOptions(KerbMode kerbs, Path serviceIds, LonLat end, boolean leaveOutCutOff,
                             double proveSeconds, ServiceArea area) {

    public static final ServiceOptions DEFAULTS = new ServiceOptions(KerbMode.ONE_PASS, null, null, false);

    public ServiceOptions(KerbMode kerbs, Path serviceIds, LonLat end, boolean leaveOutCutOff, double proveSeconds) {
        this(kerbs, serviceIds, end, leaveOutCutOff, proveSeconds, null);
    }

    /** These options with the service scoped to an area. */
    public ServiceOptions withArea(ServiceArea scoped) {
        return new ServiceOptions(kerbs, serviceIds, end, leaveOutCutOff, proveSeconds, scoped);
    }

    public ServiceOptions(KerbMode kerbs, Path serviceIds, LonLat end, boolean leaveOutCutOff) {
        this(kerbs, serviceIds, end, leaveOutCutOff, 0);
    }
}
