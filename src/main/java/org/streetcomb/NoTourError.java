package org.streetcomb;

/**
 * The input was read correctly but no tour can be planned on it (no street left after reading, a street
 * that can be entered but never left). The message says which streets and why; the command line exits
 * with {@link ExitCode#NO_TOUR}.
 */
public final class NoTourError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public NoTourError(String message) {
        super(message, null, false, false);
    }
}
