package org.streetcomb.cli;

import org.streetcomb.network.LonLat;
import org.streetcomb.plan.ServiceOptions;
import org.streetcomb.solve.KerbMode;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** Options saying which streets need which passes (with the {@link ScopeOptions}) and where the route ends. */
public final class ServiceMixin {

    @Option(names = "--both-kerbs",
            description = "Service each two-way street once in each direction (both kerbs) and each one-way street "
                    + "once along it.")
    boolean bothKerbs;

    @Option(names = "--one-way-twice",
            description = "With --both-kerbs: service each one-way street twice along it, once per kerb.")
    boolean oneWayTwice;

    @Option(names = "--end", paramLabel = "LON,LAT", converter = LonLatConverter.class,
            description = "End the depot's tour at the street node nearest this point instead of returning to the "
                    + "depot (an open route).")
    LonLat end;

    @CommandLine.Mixin
    ScopeOptions scope;

    @Option(names = "--prove", paramLabel = "SECONDS",
            description = "After planning, spend at most SECONDS seeking a proof that the tour is the shortest "
                    + "(or a shorter one) with an exact integer program; the summary then says 'optimal, proved' or "
                    + "gives the certified gap reached. Progress on stderr.")
    double proveSeconds;

    ServiceOptions options(CommandLine commandLine) {
        if (!(proveSeconds >= 0) || proveSeconds > 86_400) {
            throw new CommandLine.ParameterException(commandLine, "--prove takes seconds from 0 to 86400, not "
                    + proveSeconds);
        }
        if (oneWayTwice && !bothKerbs) {
            throw new CommandLine.ParameterException(commandLine, "--one-way-twice needs --both-kerbs");
        }
        KerbMode kerbs = !bothKerbs ? KerbMode.ONE_PASS
                : oneWayTwice ? KerbMode.BOTH_KERBS_ONE_WAY_TWICE : KerbMode.BOTH_KERBS;
        return new ServiceOptions(kerbs, scope.serviceIds, end, scope.leaveOutCutOff, proveSeconds);
    }
}
