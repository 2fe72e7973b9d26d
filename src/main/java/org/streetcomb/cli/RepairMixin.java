package org.streetcomb.cli;

import org.streetcomb.check.RepairOptions;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** The repairs a user may ask the planner to make, each listed in the plan summary when made. */
final class RepairMixin {

    @Option(names = "--close-gaps", paramLabel = "METRES", defaultValue = "0", order = 200,
            description = "Extend dead ends that stop at most this far short of another street to meet it "
                    + "(the health check's undershoots; default: off).")
    double closeGaps;

    @Option(names = "--drop-duplicates", order = 201,
            description = "Plan each street drawn twice once (the health check's duplicates).")
    boolean dropDuplicates;

    @CommandLine.Spec(CommandLine.Spec.Target.MIXEE)
    CommandLine.Model.CommandSpec mixee;

    RepairOptions options() {
        if (!(closeGaps >= 0) || closeGaps > 100) {
            throw new CommandLine.ParameterException(mixee.commandLine(), "--close-gaps must be between 0 and 100 metres");
        }
        return new RepairOptions(closeGaps, dropDuplicates);
    }
}
