package org.streetcomb;

/**
 * Bad input from the user: a file that cannot be read or makes no sense, an option out of range, a depot
 * off the network. The message is one line that names the file and the place and says what to do; the
 * command line prints it without a stack trace and exits with {@link ExitCode#BAD_INPUT}.
 * Internal bugs are never wrapped in this type.
 */
public final class InputError extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public InputError(String message) {
        super(message, null, false, false);
    }

    /** A message of the form {@code file: place: problem}. */
    public static InputError at(Object file, String place, String problem) {
        return new InputError(place == null || place.isEmpty()
                ? file + ": " + problem
                : file + ": " + place + ": " + problem);
    }

    /**
     * A library's exception in the user's words: the first line of its message with Java class names taken
     * out, or a plain phrase when the message is empty.
     */
    public static String inWords(Throwable e) {
        String message = e.getMessage() == null ? "" : e.getMessage().lines().findFirst().orElse("");
        String plain = message.replaceAll("\\b(?:[a-z_][a-z0-9_]*\\.)+[A-Z]\\w*(?:Exception|Error)\\b:?\\s*", "")
                .replaceAll("\\b[A-Z]\\w*(?:Exception|Error)\\b:?\\s*", "").strip();
        return plain.isEmpty() ? "the data make no sense at this point" : plain;
    }
}
