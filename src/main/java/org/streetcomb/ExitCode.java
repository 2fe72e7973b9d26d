package org.streetcomb;

/** Process exit codes, documented in the README. */
public final class ExitCode {
    public static final int OK = 0;
    /** An internal error: a bug, reported with a stack trace. */
    public static final int INTERNAL = 1;
    /** The command line itself is wrong (unknown option, missing argument). */
    public static final int USAGE = 2;
    /** An input file or option value is bad: a one-line message names the file and the place. */
    public static final int BAD_INPUT = 3;
    /** The input is readable but no tour can be planned on it. */
    public static final int NO_TOUR = 4;

    private ExitCode() {
    }
}
