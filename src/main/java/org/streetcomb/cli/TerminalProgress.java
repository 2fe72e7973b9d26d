package org.streetcomb.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.streetcomb.timing.StageClock;

/**
 * Shows on stderr the stages that run longer than a second: the stage name once a second has passed,
 * then its time when it ends. Quick stages print nothing, so short runs stay quiet.
 */
final class TerminalProgress implements StageClock.Listener {

    private final PrintWriter err;
    private final ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(r -> {
        Thread thread = new Thread(r, "progress");
        thread.setDaemon(true);
        return thread;
    });
    private ScheduledFuture<?> pending;
    private final AtomicBoolean shown = new AtomicBoolean();

    private TerminalProgress(PrintWriter err) {
        this.err = err;
    }

    /**
     * A listener for the command line: silent when asked to be, or when stderr is not a terminal. It writes
     * through the command's own error stream, which shows control characters in data as text.
     */
    static StageClock.Listener forCommandLine(boolean quiet, PrintWriter err) {
        return quiet || !stderrIsTerminal() ? StageClock.SILENT : new TerminalProgress(err);
    }

    @Override
    public void started(String stage) {
        shown.set(false);
        pending = timer.schedule(() -> {
            shown.set(true);
            err.print(stage + " ...");
            err.flush();
        }, 1, TimeUnit.SECONDS);
    }

    @Override
    public void finished(StageClock.Stage stage) {
        pending.cancel(false);
        if (shown.get()) {
            err.printf(Locale.ROOT, " %.1f s%n", stage.seconds());
            err.flush();
        }
    }

    @Override
    public void note(String message) {
        if (shown.getAndSet(false)) {
            err.println();
        }
        err.println(message);
        err.flush();
    }

    /** On Linux, whether file descriptor 2 is a terminal; elsewhere, whether the JVM has a console. */
    private static boolean stderrIsTerminal() {
        try {
            String target = Files.readSymbolicLink(Path.of("/proc/self/fd/2")).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
        } catch (Exception notLinux) {
            return System.console() != null;
        }
    }
}
