package org.streetcomb.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/**
 * Which streets a plan asks for: one option group for {@code plan}, which plans them, and {@code audit}, which
 * reports the others as left out of the plan rather than missed.
 */
final class ScopeOptions {

    @Option(names = "--depot-part-only",
            description = "When the network falls apart into separate parts, plan only the part that holds the depot "
                    + "(default: one tour per part); audit then reports streets on other parts as left out of the "
                    + "plan, not missed.")
    boolean depotOnly;

    @Option(names = "--leave-out-cut-off",
            description = "Leave out, with a warning that names them, streets that one-way streets cut off from the "
                    + "depot (typical at the edge of an extract); by default the plan is refused. Audit reports them "
                    + "as left out of the plan, not missed, and its mop-up leaves them out too.")
    boolean leaveOutCutOff;

    @Option(names = "--service-ids", paramLabel = "FILE",
            description = "Service only the streets whose feature ids are listed in FILE (one per line, # starts a "
                    + "comment); other streets are used only to travel between them (audit reports them as left out "
                    + "of the plan).")
    Path serviceIds;

    /** Whether any option narrows the plan's scope. */
    boolean narrowed() {
        return depotOnly || leaveOutCutOff || serviceIds != null;
    }
}
