package org.streetcomb.cli;

import java.io.InputStream;
import java.io.PrintWriter;
import org.streetcomb.ExitCode;
import org.streetcomb.InputError;
import org.streetcomb.NoTourError;
import org.streetcomb.write.AtomicFile;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code streetcomb} command: parses the command line and maps errors to exit codes. */
@Command(name = "streetcomb",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = "Plans the shortest tours that cover every street of a road network.",
        subcommands = {PlanCommand.class, DistrictsCommand.class, HealthCommand.class, AuditCommand.class, CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:success",
            "1:internal error (a bug: please report it with the stack trace)",
            "2:the command line is wrong on its face (unknown option, value not a number or out of range, output over an input)",
            "3:an input file is bad, or an option does not fit the data (depot far from the streets, missing field)",
            "4:no tour can be planned on this input"})
public final class Main implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the command line with the given streams and returns the exit code. */
    public static int run(String[] args, PrintWriter stdout, PrintWriter stderr) {
        return run(args, System.in, stdout, stderr);
    }

    /** Runs the command line reading {@code -} from {@code stdin}, and returns the exit code. */
    public static int run(String[] args, InputStream stdin, PrintWriter stdout, PrintWriter stderr) {
        // input data reach the terminal only with their control characters made visible, and piped files are
        // named "-" as the user named them
        StandardStreams.Naming outNames = new StandardStreams.Naming(new TerminalSafeWriter(stdout));
        StandardStreams.Naming errNames = new StandardStreams.Naming(new TerminalSafeWriter(stderr));
        PrintWriter out = new PrintWriter(outNames, true);
        PrintWriter err = new PrintWriter(errNames, true);
        CommandLine cli = new CommandLine(new Main());
        cli.setOut(out);
        cli.setErr(err);
        // every command's --help states the one exit-code rule, as the README does
        for (CommandLine sub : cli.getSubcommands().values()) {
            sub.getCommandSpec().usageMessage().exitCodeListHeading("%nExit codes:%n")
                    .exitCodeList(cli.getCommandSpec().usageMessage().exitCodeList());
        }
        // a mistake on the command line gets one line and a pointer to the help, not the whole option list
        cli.setParameterExceptionHandler((e, arguments) -> {
            err.println("streetcomb: " + oneLine(e.getMessage()));
            if (e instanceof OutputGuard.Clash) {
                return ExitCode.USAGE;
            }
            CommandLine.UnmatchedArgumentException.printSuggestions(e, err);
            err.println("Try '" + e.getCommandLine().getCommandSpec().qualifiedName() + " --help' for the options.");
            return ExitCode.USAGE;
        });
        cli.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            if (e instanceof InputError) {
                err.println("streetcomb: " + oneLine(e.getMessage()));
                return ExitCode.BAD_INPUT;
            }
            if (e instanceof NoTourError) {
                err.println("streetcomb: no tour: " + oneLine(e.getMessage()));
                return ExitCode.NO_TOUR;
            }
            err.println("streetcomb: internal error, please report it with what follows:");
            e.printStackTrace(err);
            return ExitCode.INTERNAL;
        });
        // outputs are checked against inputs and each other before anything is read or written, and moved into
        // place together only when the command has written them all
        cli.setExecutionStrategy(parsed -> {
            try (StandardStreams streams = standardStreams(cli, parsed, stdin)) {
                outNames.use(streams);
                errNames.use(streams);
                OutputGuard.check(parsed);
                try (AtomicFile.Batch outputs = AtomicFile.batch()) {
                    int code = new CommandLine.RunLast().execute(parsed);
                    try {
                        outputs.commit();
                    } catch (InputError e) {
                        throw new CommandLine.ExecutionException(cli, e.getMessage(), e);
                    }
                    streams.deliver(stdout);
                    return code;
                }
            }
        });
        try {
            return cli.execute(args);
        } catch (StackOverflowError e) {
            // last resort: readers bound nesting themselves, so this is a bug; still one line, not a trace
            err.println("streetcomb: internal error: the input is nested too deeply to handle (out of stack); "
                    + "please report it with the input");
            return ExitCode.INTERNAL;
        } catch (OutOfMemoryError e) {
            err.println("streetcomb: out of memory (" + Runtime.getRuntime().maxMemory() / (1 << 20) + " MB heap): "
                    + "give Java more with JAVA_TOOL_OPTIONS=-Xmx8g, or plan a smaller extract");
            return ExitCode.INTERNAL;
        }
    }

    private static StandardStreams standardStreams(CommandLine cli, CommandLine.ParseResult parsed, InputStream stdin) {
        try {
            return StandardStreams.attach(parsed, stdin);
        } catch (InputError | java.io.UncheckedIOException e) {
            throw new CommandLine.ExecutionException(cli, e.getMessage(), e);
        }
    }

    /** A message on one line: line breaks in data it quotes are shown as \\n, as the data has them. */
    static String oneLine(String message) {
        return String.valueOf(message).replace("\r", "\\r").replace("\n", "\\n");
    }

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is required, e.g. streetcomb plan");
    }

    /** The version from the jar manifest, or "development" when run from classes. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String version = Main.class.getPackage().getImplementationVersion();
            return new String[] {"streetcomb " + (version == null ? "development" : version)};
        }
    }
}
